import { expect, test, type Page } from '@playwright/test';

// Spare stock against the real app and its demo data: the office receives fans into the
// warehouse and transfers some to a van, and both counts follow; a technician on a phone sees
// their van and records a spare used.

async function signIn(page: Page, email: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill('gridkeep-demo');
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

interface Balance {
  partName: string;
  batch: string;
  locationName: string;
  onHand: number;
}

/** On hand of a part at a location, as the API adds up the ledger. */
async function onHand(page: Page, partName: string, locationName: string): Promise<number> {
  const answer = (await (await page.request.get('/api/stock?limit=500')).json()) as { items: Balance[] };
  return answer.items
    .filter((b) => b.partName === partName && b.locationName === locationName && b.batch === '')
    .reduce((n, b) => n + b.onHand, 0);
}

async function choose(select: ReturnType<Page['getByLabel']>, containing: string) {
  await select.locator('option', { hasText: containing }).first().waitFor({ state: 'attached' });
  const label = (await select.locator('option').allTextContents()).find((l) => l.includes(containing));
  await select.selectOption({ label: label! });
}

const fan = 'Cabinet fan 80 mm, sealed';
const warehouse = 'Brantley Springs warehouse';
const van = 'Van 1 (Jonah Ellery)';

test('the office receives stock into the warehouse, transfers some to a van, and both counts change', async ({ page }, testInfo) => {
  test.setTimeout(90_000);
  const errors: string[] = [];
  page.on('pageerror', (err) => errors.push(err.message));
  await page.setViewportSize({ width: 1366, height: 900 });
  await signIn(page, 'office@gridkeep.test');
  const before = { warehouse: await onHand(page, fan, warehouse), van: await onHand(page, fan, van) };

  await page.getByRole('navigation').getByRole('link', { name: 'Stock' }).click();
  await expect(page.getByRole('heading', { name: 'Stock', level: 1 })).toBeVisible();

  await page.getByRole('button', { name: 'Record a movement' }).click();
  let dialog = page.getByRole('dialog', { name: 'Record a stock movement' });
  await dialog.getByLabel('What happened').selectOption({ label: 'Receive from a supplier' });
  await choose(dialog.getByLabel('Part'), fan);
  await dialog.getByLabel('Quantity').fill('5');
  await choose(dialog.getByLabel('To', { exact: true }), warehouse);
  await dialog.getByRole('button', { name: 'Record' }).click();
  await expect(dialog).toBeHidden();

  await page.getByRole('button', { name: 'Record a movement' }).click();
  dialog = page.getByRole('dialog', { name: 'Record a stock movement' });
  await dialog.getByLabel('What happened').selectOption({ label: 'Transfer between locations' });
  await choose(dialog.getByLabel('Part'), fan);
  await dialog.getByLabel('Quantity').fill('3');
  await choose(dialog.getByLabel('From', { exact: true }), warehouse);
  await choose(dialog.getByLabel('To', { exact: true }), van);
  await dialog.getByRole('button', { name: 'Record' }).click();
  await expect(dialog).toBeHidden();

  // Warehouse + 5 − 3, van + 3: in the table (filtered to each location) and in the ledger's sums.
  const row = (location: string) => page.getByRole('row').filter({ hasText: fan }).filter({ hasText: location });
  await expect(row(warehouse).getByRole('cell').nth(4)).toHaveText(String(before.warehouse + 2));
  await expect(row(van).getByRole('cell').nth(4)).toHaveText(String(before.van + 3));
  expect(await onHand(page, fan, warehouse)).toBe(before.warehouse + 2);
  expect(await onHand(page, fan, van)).toBe(before.van + 3);
  await page.screenshot({ path: testInfo.outputPath('stock-office.png'), fullPage: true });

  // The part's ledger: the receipt and the transfer, newest first.
  await row(warehouse).getByRole('link', { name: fan }).click();
  await expect(page).toHaveURL(/tab=ledger&partId=/);
  const ledger = page.getByRole('table', { name: 'Stock ledger' });
  await expect(ledger.getByRole('row').nth(1)).toContainText('Transfer between locations');
  await expect(ledger.getByRole('row').nth(2)).toContainText('Receive from a supplier');
  await page.getByRole('link', { name: 'On hand' }).click();
  // Sorted by the server: the most on hand first.
  const header = page.getByRole('button', { name: 'On hand', exact: true });
  await header.click();
  await expect(page).toHaveURL(/sort=onHand/);
  if (!/dir=desc/.test(page.url())) await header.click();
  await expect(page).toHaveURL(/dir=desc/);
  const counts = await page.getByRole('table', { name: 'Stock on hand' }).getByRole('row').locator('td:nth-child(5)').allTextContents();
  const numbers = counts.slice(0, 10).map((t) => Number(t.replace(/\D+/g, ' ').trim().split(' ').pop()));
  expect(numbers).toEqual([...numbers].sort((x, y) => y - x));

  // Taking more than is on hand is refused, in words.
  await page.getByRole('button', { name: 'Record a movement' }).click();
  dialog = page.getByRole('dialog', { name: 'Record a stock movement' });
  await dialog.getByLabel('What happened').selectOption({ label: 'Use in a repair' });
  await choose(dialog.getByLabel('Part'), fan);
  await dialog.getByLabel('Quantity').fill('999');
  await choose(dialog.getByLabel('From', { exact: true }), van);
  await dialog.getByRole('button', { name: 'Record' }).click();
  await expect(dialog.getByText(/Only \d+ of that part/).first()).toBeVisible();
  expect(errors).toEqual([]);
});

test('a technician on a phone sees their van and records a spare used', async ({ page }, testInfo) => {
  test.setTimeout(90_000);
  await page.setViewportSize({ width: 390, height: 844 });
  await signIn(page, 'tech@gridkeep.test');
  await page.getByRole('navigation').getByRole('link', { name: 'Van' }).click();
  await expect(page.getByRole('heading', { name: 'My van', level: 1 })).toBeVisible();
  const cards = page.getByRole('list', { name: `On hand in ${van}` });
  const jumper = cards.getByRole('listitem').filter({ hasText: 'Power jumper 0.6 m, locking' });
  await expect(jumper).toBeVisible();
  const count = Number(await jumper.locator('p[aria-label$="on hand"]').textContent());
  expect(count).toBeGreaterThan(0);
  const button = jumper.getByRole('button', { name: /Use or move Power jumper/ });
  const box = await button.boundingBox();
  expect(box!.height).toBeGreaterThanOrEqual(44); // WCAG 2.5.5 target size
  await page.screenshot({ path: testInfo.outputPath('van-phone.png'), fullPage: true });

  await button.click();
  const dialog = page.getByRole('dialog', { name: 'Record a stock movement' });
  await expect(dialog.getByLabel('What happened')).toHaveValue('consumption');
  await dialog.getByRole('button', { name: 'Record' }).click();
  await expect(dialog).toBeHidden();
  await expect(jumper.locator('p[aria-label$="on hand"]')).toHaveText(String(count - 1));
});

test('the office sends a failed part to its maker and takes it back into stock; the restock list says what each site kit needs', async ({
  page,
}, testInfo) => {
  test.setTimeout(90_000);
  await page.setViewportSize({ width: 1366, height: 900 });
  await signIn(page, 'office@gridkeep.test');
  const psu = 'Power supply 5 V 200 W, indoor cabinet';
  const before = await onHand(page, psu, warehouse);

  await page.goto('/stock?tab=returns');
  await page.getByRole('button', { name: 'Send a part to its maker' }).click();
  const dialog = page.getByRole('dialog', { name: 'Send a part to its maker' });
  await choose(dialog.getByLabel('Part', { exact: true }), psu);
  await dialog.getByLabel('Serial').fill('PSU-E2E-001');
  await dialog.getByLabel('Fault').fill('No output on the 5 V rail');
  await choose(dialog.getByLabel('Leaves from'), warehouse);
  await dialog.getByLabel('Maker’s reference').fill('RMA-E2E-1');
  await dialog.getByRole('button', { name: 'Send' }).click();
  await expect(dialog).toBeHidden();
  const row = page.getByRole('row').filter({ hasText: 'PSU-E2E-001' });
  await expect(row).toContainText('With the maker');
  expect(await onHand(page, psu, warehouse)).toBe(before - 1);

  await row.getByRole('button', { name: /Record the outcome/ }).click();
  const outcome = page.getByRole('dialog', { name: 'Record what the maker did' });
  await outcome.getByLabel('Outcome').selectOption({ label: 'Repaired' });
  await choose(outcome.getByLabel('Back into stock at'), warehouse);
  await outcome.getByRole('button', { name: 'Save' }).click();
  await expect(row).toContainText(`Back in ${warehouse}`);
  expect(await onHand(page, psu, warehouse)).toBe(before);

  await page.getByRole('link', { name: 'Restock list' }).click();
  const table = page.getByRole('table', { name: 'Restock list' });
  await expect(table.getByRole('row').filter({ hasText: 'Main hall centre wall' })).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('restock.png'), fullPage: true });
});

test('the office adds a part and sets a reorder point', async ({ page }) => {
  test.setTimeout(90_000);
  await page.setViewportSize({ width: 1366, height: 900 });
  await signIn(page, 'office@gridkeep.test');
  const name = `Test receiving card ${Date.now().toString(36)}`;
  await page.goto('/stock?tab=parts');
  await page.getByRole('button', { name: 'Add a part' }).click();
  const dialog = page.getByRole('dialog', { name: 'Add a part' });
  await dialog.getByLabel('Name').fill(name);
  await dialog.getByLabel('SKU').fill(`rxc-${Date.now().toString(36)}`);
  await dialog.getByLabel('Kind').selectOption({ label: 'Receiving card' });
  await dialog.getByRole('button', { name: 'Add part' }).click();
  await expect(dialog).toBeHidden();
  await expect(page.getByRole('row').filter({ hasText: name })).toBeVisible();
  await page.getByRole('button', { name: `Edit ${name}` }).click();
  const edit = page.getByRole('dialog', { name: `Edit ${name}` });
  await edit.getByLabel('Lead time (days)').fill('45');
  await edit.getByRole('button', { name: 'Save changes' }).click();
  await expect(edit).toBeHidden();
  await expect(page.getByRole('row').filter({ hasText: name })).toContainText('45');

  await page.getByRole('link', { name: 'On hand' }).click();
  const row = page.getByRole('row').filter({ hasText: fan }).filter({ hasText: warehouse });
  await row.getByRole('button', { name: /Reorder point of/ }).click();
  const point = page.getByRole('dialog', { name: 'Reorder point' });
  await point.getByLabel('Alert at or below').fill('2');
  await point.getByLabel('Reorder', { exact: true }).fill('10');
  await point.getByRole('button', { name: 'Save' }).click();
  await expect(point).toBeHidden();
  // What the server keeps: the fan's reorder point at the warehouse is 2.
  const answer = (await (await page.request.get('/api/stock?limit=500')).json()) as { items: (Balance & { reorderAt: number | null })[] };
  expect(answer.items.find((b) => b.partName === fan && b.locationName === warehouse)?.reorderAt).toBe(2);
});
