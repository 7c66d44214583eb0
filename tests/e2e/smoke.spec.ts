import { expect, test } from '@playwright/test';

test('the app loads and renders', async ({ page }) => {
  const errors: string[] = [];
  page.on('pageerror', (err) => errors.push(err.message));
  const response = await page.goto('/');
  expect(response?.status()).toBe(200);
  // index.html names the product; the client then mounts into #root.
  await expect(page).toHaveTitle(/Gridkeep/);
  await expect(page.locator('#root > *').first()).toBeVisible();
  expect(errors).toEqual([]);
});

test('the health endpoint reports the app and its database up', async ({ request }) => {
  const res = await request.get('/api/health');
  expect(res.status()).toBe(200);
  expect(await res.json()).toEqual({ status: 'ok', database: 'ok' });
});

test('a client route deep link is served the app, not a 404', async ({ page }) => {
  // The server answers every non-API GET with index.html so React Router can take over
  // (a QR label opens /c/<serial> directly).
  const response = await page.goto('/c/NO-SUCH-SERIAL');
  expect(response?.status()).toBe(200);
  await expect(page).toHaveTitle(/Gridkeep/);
});
