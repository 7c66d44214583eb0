import { expect, test } from '@playwright/test';
import { attachShot, csrf, desktop, getJson, phone, signIn } from './support';

// QR labels print what stays true of a cabinet (its serial, its model and the QR code), never
// its grid position; scanning one shows where the cabinet is now, after a swap too. And the
// Import tab says before a file is picked how many positions of the wall are free.

interface WallRow {
  id: string;
  name: string;
  columns: number;
  rows: number;
}
interface WallCabinet {
  id: string;
  serial: string;
  column: number;
  row: number;
}
interface CabinetRow {
  serial: string;
  modelName: string;
}

const position = /C\d+·R\d+/;

test('labels print serial and model only; the scanned page shows the current position, after a swap too', async ({ browser }, testInfo) => {
  test.setTimeout(90_000);
  const { context: office, page } = await signIn(browser, 'office@gridkeep.test', desktop);
  const walls = (await getJson<{ items: WallRow[] }>(page.request, '/api/walls?limit=500')).items;
  let wall: WallRow | undefined;
  let cells: WallCabinet[] = [];
  for (const w of walls) {
    cells = (await getJson<{ items: WallCabinet[] }>(page.request, `/api/walls/${w.id}/cabinets`)).items;
    if (cells.length >= 2 && cells.length <= 120) {
      wall = w;
      break;
    }
  }
  expect(wall, 'a demo wall with a few cabinets').toBeTruthy();
  const models = (await getJson<{ items: CabinetRow[] }>(page.request, `/api/cabinets?wallId=${wall!.id}&limit=500`)).items;

  await page.goto(`/walls/${wall!.id}/labels`);
  const sheet = page.getByTestId('label-sheet');
  await expect(sheet).toBeVisible();
  const labels = sheet.getByTestId('cabinet-label');
  await expect(labels).toHaveCount(cells.length);
  const [a, b] = cells;
  const labelOfA = labels.filter({ hasText: a.serial });
  await expect(labelOfA).toContainText(models.find((m) => m.serial === a.serial)!.modelName);
  await expect(labelOfA.getByRole('img', { name: new RegExp(`/c/${a.serial}$`) })).toBeVisible();
  // No label names a grid position, nor the wall: a move or a swap would make it wrong.
  await expect(sheet).not.toContainText(position);
  await expect(sheet).not.toContainText(wall!.name);
  await attachShot(testInfo, page, 'label-sheet');

  // The technician scans A's label on a phone: its position now.
  const { context: tech, page: phonePage } = await signIn(browser, 'tech@gridkeep.test', phone);
  await phonePage.goto(`/c/${encodeURIComponent(a.serial)}`);
  await expect(phonePage.getByRole('heading', { name: a.serial, level: 1 })).toBeVisible();
  await expect(phonePage.getByTestId('cabinet-model')).toHaveText(models.find((m) => m.serial === a.serial)!.modelName);
  await expect(phonePage.getByTestId('cabinet-position')).toHaveText(`C${a.column}·R${a.row}`);
  await expect(phonePage.getByText(wall!.name).first()).toBeVisible();

  // A and B swap places; the same label now opens B's old position.
  const swapped = await phonePage.request.post(`/api/cabinets/${a.id}/swap`, { data: { otherCabinetId: b.id }, headers: csrf });
  expect(swapped.status()).toBe(200);
  await phonePage.reload();
  await expect(phonePage.getByTestId('cabinet-position')).toHaveText(`C${b.column}·R${b.row}`);
  await attachShot(testInfo, phonePage, 'scanned-label');
  await tech.close();
  await office.close();
});

test('the Import tab says how many positions are free before a file is picked; a full wall is warned', async ({ browser }) => {
  const { context, page } = await signIn(browser, 'office@gridkeep.test', desktop);
  const walls = (await getJson<{ items: WallRow[] }>(page.request, '/api/walls?limit=500')).items;
  let full: WallRow | undefined;
  for (const w of walls) {
    const detail = await getJson<{ installedCabinets: number }>(page.request, `/api/walls/${w.id}`);
    if (detail.installedCabinets === w.columns * w.rows) {
      full = w;
      break;
    }
  }
  expect(full, 'a demo wall with every position taken').toBeTruthy();
  await page.goto(`/walls/${full!.id}?tab=import`);
  const total = full!.columns * full!.rows;
  await expect(page.getByText(`Every position of ${full!.name} is taken (${total} of ${total})`)).toBeVisible();
  await expect(page.getByText('any file for this wall would be refused')).toBeVisible();

  // Free a position: the warning gives way to the count of free positions.
  const cells = (await getJson<{ items: WallCabinet[] }>(page.request, `/api/walls/${full!.id}/cabinets`)).items;
  const off = await page.request.patch(`/api/cabinets/${cells[0].id}`, { data: { status: 'at_bench' }, headers: csrf });
  expect(off.status()).toBe(200);
  await page.reload();
  await expect(page.getByText(`1 position free of ${total}`)).toBeVisible();
  await expect(page.getByText(/Every position of/)).toHaveCount(0);
  await context.close();
});
