import fs from 'node:fs';
import { expect, test } from '@playwright/test';
import Papa from 'papaparse';

// "Export CSV" writes the whole result of a list, not only the page loaded: the demo register has
// more cabinets than one page of the cabinets list (100).

test('exporting the cabinets list writes every cabinet, past the first page', async ({ page }) => {
  test.setTimeout(90_000);
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('office@gridkeep.test');
  await page.getByLabel('Password', { exact: true }).fill('gridkeep-demo');
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));

  // The whole list as the API pages it.
  let total = 0;
  let cursor: string | null = null;
  do {
    const answer = (await (await page.request.get(`/api/cabinets?limit=500${cursor ? `&cursor=${cursor}` : ''}`)).json()) as {
      items: unknown[];
      nextCursor: string | null;
    };
    total += answer.items.length;
    cursor = answer.nextCursor;
  } while (cursor);
  expect(total).toBeGreaterThan(100);

  await page.goto('/cabinets');
  await expect(page.getByText('100 rows shown', { exact: false })).toBeVisible();
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export CSV' }).click()]);
  const text = fs.readFileSync((await download.path())!, 'utf8').replace(/^\uFEFF/, '');
  const rows = Papa.parse<string[]>(text.trim(), { skipEmptyLines: true }).data;
  expect(rows.length - 1).toBe(total);
});
