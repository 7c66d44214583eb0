import { expect, test } from '@playwright/test';

// One cache entry per resource: the catalogue and the planner read the cabinet models through the
// same query, so a model edited in the catalogue shows in the planner's list at once — within
// the same page, without a reload.

test('a cabinet model renamed in the catalogue shows in the planner without a reload', async ({ page }) => {
  test.setTimeout(90_000);
  const errors: string[] = [];
  page.on('pageerror', (err) => errors.push(err.message));
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('office@gridkeep.test');
  await page.getByLabel('Password', { exact: true }).fill('gridkeep-demo');
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));

  // A model of this test's own, so other tests' names stay as they are.
  const stamp = Date.now().toString(36);
  const name = `Test cabinet ${stamp}`;
  const created = await page.request.post('/api/cabinet-models', {
    headers: { 'X-Requested-With': 'gridkeep' },
    data: {
      name,
      widthMm: 500,
      heightMm: 500,
      pixelPitchMm: 2.604,
      pixelsWide: 192,
      pixelsHigh: 192,
      modulesWide: 2,
      modulesHigh: 2,
      maxPowerW: 180,
      typicalPowerW: 60,
      weightKg: 7.5,
      brightnessNits: 1000,
    },
  });
  expect(created.status()).toBe(201);

  await page.getByRole('navigation').getByRole('link', { name: 'Planner' }).click();
  const select = page.getByLabel('Cabinet model');
  await expect(select.locator('option', { hasText: name })).toHaveCount(1);
  // A mark on the window: it survives navigation inside the app and is gone after a reload.
  await page.evaluate(() => Object.assign(window, { gridkeepMark: 'same page' }));

  await page.getByRole('navigation').getByRole('link', { name: 'Catalogue' }).click();
  await page.getByRole('button', { name: `Edit ${name}` }).click();
  const dialog = page.getByRole('dialog', { name: `Edit ${name}` });
  await dialog.getByLabel('Model name').fill(`${name} Mk II`);
  await dialog.getByRole('button', { name: 'Save changes' }).click();
  await expect(dialog).toBeHidden();

  await page.getByRole('navigation').getByRole('link', { name: 'Planner' }).click();
  await expect(select.locator('option', { hasText: `${name} Mk II` })).toHaveCount(1);
  expect(await page.evaluate(() => (window as unknown as { gridkeepMark?: string }).gridkeepMark)).toBe('same page');
  expect(errors).toEqual([]);
});
