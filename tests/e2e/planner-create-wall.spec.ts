import { expect, test, type Locator } from '@playwright/test';
import { attachShot, getJson, signIn } from './support';

// The planner's result saved as a new wall: pick the client and the site, name it; the wall
// takes the plan's cabinet model and grid, and the plan's settings and runs are stored on it.

interface Model {
  id: string;
  name: string;
  widthMm: number;
}
interface Option {
  id: string;
  name: string;
}

/** Picks the first option whose label contains `containing` (a model's option also names its pitch). */
async function chooseOption(select: Locator, containing: string) {
  await select.locator('option', { hasText: containing }).first().waitFor({ state: 'attached' });
  const label = (await select.locator('option').allTextContents()).find((l) => l.includes(containing));
  expect(label, `an option containing “${containing}”`).toBeTruthy();
  await select.selectOption({ label: label! });
}

test('creates a new wall from the planner, with the plan’s model, grid and runs', async ({ browser }, testInfo) => {
  test.setTimeout(90_000);
  const { context, page } = await signIn(browser, 'office@gridkeep.test');
  const models = (await getJson<{ items: Model[] }>(page.request, '/api/cabinet-models')).items;
  const model = models.find((m) => m.widthMm === 500) ?? models[0];
  const client = (await getJson<{ items: Option[] }>(page.request, '/api/clients?limit=1&sort=name')).items[0];
  const site = (await getJson<{ items: Option[] }>(page.request, `/api/sites?clientId=${client.id}&limit=1`)).items[0];
  const name = `Planned wall ${Date.now().toString(36)}`;

  await page.goto('/planner');
  await expect(page.getByRole('heading', { name: 'Planner', level: 1 })).toBeVisible();
  await chooseOption(page.getByLabel('Cabinet model'), model.name);
  await page.getByRole('spinbutton', { name: 'Columns' }).fill('5');
  await page.getByRole('spinbutton', { name: 'Rows' }).fill('3');

  await page.getByRole('button', { name: 'Save onto a wall…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Save onto a wall' });
  // A new wall is the first choice; its model and grid are the plan's.
  await expect(dialog.getByRole('radio', { name: 'A new wall' })).toBeChecked();
  await expect(dialog.getByTestId('new-wall-plan')).toContainText(`5 × 3 cabinets of ${model.name}`);
  // The site waits for the client.
  await expect(dialog.getByLabel('Site')).toBeDisabled();
  await dialog.getByRole('button', { name: 'Create the wall' }).click();
  await expect(dialog.getByText('Choose the client.')).toBeVisible();

  await dialog.getByLabel('Client').selectOption({ label: client.name });
  await chooseOption(dialog.getByLabel('Site'), site.name);
  await dialog.getByLabel('Wall name').fill(name);
  await dialog.getByLabel('Mounting').selectOption({ label: 'Flown' });
  await attachShot(testInfo, page, 'new-wall-dialog');
  await dialog.getByRole('button', { name: 'Create the wall' }).click();
  await expect(dialog.getByText(`${name} is added`)).toBeVisible();
  await dialog.getByRole('link', { name: `Open ${name}` }).click();

  await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();
  await expect(page.getByText(`${model.name} · 5 × 3 cabinets`)).toBeVisible();
  const walls = (await getJson<{ items: Option[] }>(page.request, `/api/walls?siteId=${site.id}&limit=500`)).items;
  const created = walls.find((w) => w.name === name);
  expect(created, 'the new wall at the chosen site').toBeTruthy();
  const wall = await getJson<{
    mounting: string;
    cabinetModel: { id: string };
    planSettings: { outputCapacityPixels: number } | null;
    dataRuns: { runs: { cells: unknown[] }[] } | null;
    powerRuns: { runs: { cells: unknown[] }[] } | null;
  }>(page.request, `/api/walls/${created!.id}`);
  expect(wall.mounting).toBe('flown');
  expect(wall.cabinetModel.id).toBe(model.id);
  expect(wall.planSettings).not.toBeNull();
  // Every one of the 5 × 3 = 15 cabinets is in exactly one data run and one power run.
  expect(wall.dataRuns!.runs.reduce((n, r) => n + r.cells.length, 0)).toBe(15);
  expect(wall.powerRuns!.runs.reduce((n, r) => n + r.cells.length, 0)).toBe(15);
  await context.close();
});
