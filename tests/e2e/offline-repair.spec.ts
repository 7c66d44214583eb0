import { expect, test, type APIRequestContext, type Browser, type BrowserContext, type Page, type TestInfo } from '@playwright/test';
import type { SpareCabinetGroup } from '../../shared/schemas/stock.js';
import type { WallCabinet as Cabinet } from '../../shared/schemas/walls.js';
import { attachShot, csrf, getJson, phone, signInOn, signInToApi } from './support.js';

// A repair logged on a phone with no signal, against the real app with the seeded demo data: it
// is kept on the phone (IndexedDB) and sent when the network is back, exactly once even when an
// answer is lost on the way (the Idempotency-Key); the app shell opens offline (the service
// worker); a repair the server refuses on arrival (the cabinet moved meanwhile) waits in the
// outbox for the technician to fix it in the form.

interface Repair {
  id: string;
  ticketId: string | null;
  cabinetId: string | null;
  column: number;
  row: number;
  component: string;
  fault: string;
  action: string;
  notes?: string;
}

/** A phone signed in as the demo technician; `serviceWorker` lets this test's pages register the offline shell. */
async function phoneOf(browser: Browser, options: { serviceWorker: boolean }): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext(phone);
  // The app registers its service worker in automated browsers only when asked (src/lib/service-worker.ts).
  if (options.serviceWorker) await context.addInitScript(() => localStorage.setItem('gridkeep:service-worker', 'on'));
  const page = await context.newPage();
  await signInOn(page, 'tech@gridkeep.test');
  await expect(page).toHaveURL(/\/$/);
  return { context, page };
}

/** A demo wall with two installed cabinets, read through the API. */
async function demoWall(request: APIRequestContext) {
  const walls = await getJson<{ items: { id: string; name: string }[] }>(request, '/api/walls?limit=100');
  for (const wall of walls.items) {
    const cabinets = (await getJson<{ items: Cabinet[] }>(request, `/api/walls/${wall.id}/cabinets`)).items.filter(
      (c) => c.status === 'installed',
    );
    if (cabinets.length >= 2) return { wall, cabinets };
  }
  throw new Error('The demo data has no wall with two installed cabinets.');
}

/** An open demo ticket on a wall, and an installed cabinet of that wall. */
async function demoTicket(request: APIRequestContext) {
  const tickets = await getJson<{ items: { id: string; ref: string; wall: { id: string; name: string } | null }[] }>(
    request,
    '/api/tickets?open=true&limit=50',
  );
  for (const ticket of tickets.items) {
    if (!ticket.wall) continue;
    const cabinets = (await getJson<{ items: Cabinet[] }>(request, `/api/walls/${ticket.wall.id}/cabinets`)).items.filter(
      (c) => c.status === 'installed',
    );
    if (cabinets.length) return { ticket, wall: ticket.wall, cabinet: cabinets[0] };
  }
  throw new Error('The demo data has no open ticket on a wall with cabinets.');
}

/** The signed-in technician's van. */
async function myVan(request: APIRequestContext) {
  const { user } = await getJson<{ user: { id: string } }>(request, '/api/auth/me');
  const locations = await getJson<{ items: { id: string; kind: string; holder: { id: string } | null }[] }>(
    request,
    '/api/stock-locations',
  );
  const van = locations.items.find((l) => l.kind === 'van' && l.holder?.id === user.id);
  expect(van, 'the demo technician has a van').toBeTruthy();
  return van!;
}

/** The repairs of a wall whose notes carry `marker` (this test's own). */
async function repairsMarked(request: APIRequestContext, wallId: string, marker: string): Promise<Repair[]> {
  const page = await getJson<{ items: Repair[] }>(request, `/api/repairs?wallId=${wallId}&limit=100`);
  return page.items.filter((r) => r.notes?.includes(marker));
}

/** A 1 × 1 PNG. */
const png = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==', 'base64');

const cell = (page: Page, c: { column: number; row: number }) =>
  page.getByRole('gridcell', { name: new RegExp(`^C${c.column}·R${c.row},`) });

/** On a phone the map starts zoomed to fingertip-sized cabinets: a cabinet anywhere is tapped from the whole wall. */
async function tapCell(page: Page, c: { column: number; row: number }) {
  const whole = page.getByRole('button', { name: 'Show the whole wall' });
  if (await whole.isEnabled()) await whole.click();
  await cell(page, c).click();
}

/** Map → cabinet → receiving card → no signal → reseated (no spare) → notes. */
async function logReseatedCard(page: Page, cabinet: Cabinet, notes: string, shot?: (name: string) => Promise<void>) {
  await tapCell(page, cabinet);
  await expect(page.getByTestId('repair-cabinet')).toContainText(cabinet.serial);
  await shot?.('02-cabinet');
  await page.getByRole('button', { name: 'Next' }).click();
  await page.getByRole('group', { name: 'Component' }).getByRole('button', { name: 'Receiving card' }).click();
  await shot?.('03-fault');
  await page.getByRole('group', { name: 'Fault' }).getByRole('button', { name: 'No signal' }).click();
  await page
    .getByRole('group', { name: 'Action' })
    .getByRole('button', { name: /^Reseated/ })
    .click();
  await expect(page.getByText('Step 6 of 6')).toBeVisible();
  await page.getByRole('textbox', { name: 'Notes' }).fill(notes);
  if (shot) {
    // A photo "from the camera" (the file input the phone's camera fills), kept on the phone with the repair.
    await page.getByLabel('Take a photo').setInputFiles({ name: 'receiving-card.png', mimeType: 'image/png', buffer: png });
    await expect(page.getByRole('list', { name: 'Photos of the repair' }).getByRole('img')).toHaveCount(1);
  }
  await shot?.('04-notes');
}

/** Whole-page screenshots of `page`, attached to the test's report. */
const shotsOf = (testInfo: TestInfo, page: Page) => (name: string) => attachShot(testInfo, page, name, { fullPage: true });

test('a repair logged with no signal waits on the phone and is sent once when the network is back', async ({ browser }, testInfo) => {
  const { context, page } = await phoneOf(browser, { serviceWorker: true });
  const shot = shotsOf(testInfo, page);
  const { ticket, wall, cabinet } = await demoTicket(page.request);
  const marker = `offline-${Date.now()}`;

  // From the ticket's page, where staff find "Log a repair".
  await page.goto(`/tickets/${ticket.id}`);
  await expect(page.getByRole('link', { name: 'Log a repair' })).toBeVisible();
  await shot('00-ticket');
  await page.getByRole('link', { name: 'Log a repair' }).click();
  await expect(page).toHaveURL(`/repairs/new?ticketId=${ticket.id}`);
  await expect(page.getByRole('heading', { name: 'Log a repair' })).toBeVisible();
  // The rear view first: the technician stands behind the wall.
  await expect(page.getByRole('group', { name: 'Wall view' }).getByRole('button', { name: 'Rear' })).toHaveAttribute(
    'aria-pressed',
    'true',
  );
  await expect(page.getByText('Step 1 of 6')).toBeVisible();
  await expect(cell(page, cabinet)).toBeVisible();
  // The service worker holds the app shell before the signal goes.
  const controlled = await page.evaluate(async () => {
    const registration = await navigator.serviceWorker.ready;
    return Boolean(registration.active);
  });
  expect(controlled).toBe(true);
  await shot('01-map');

  // ---- behind the wall: no signal ----
  await context.setOffline(true);
  await logReseatedCard(page, cabinet, `Reseated the card; ${marker}`, shot);
  await page.getByRole('button', { name: 'Save the repair' }).click();
  await expect(page.getByText('Saved on this phone, will send when the network is back')).toBeVisible();
  await expect(page.getByText('1 repair is waiting to be sent.')).toBeVisible();
  await shot('05-saved-offline');
  expect(await repairsMarked(context.request, wall.id, marker)).toHaveLength(0);

  await page.getByRole('link', { name: 'Open the outbox' }).click();
  await expect(page).toHaveURL(/\/outbox$/);
  const waiting = page.getByRole('list', { name: 'Repairs waiting to be sent' }).getByTestId('outbox-item');
  await expect(waiting).toHaveCount(1);
  await expect(waiting).toContainText(cabinet.serial);
  await expect(waiting).toContainText('Receiving card · No signal · Reseated');
  await expect(waiting).toContainText('1 photo');
  await expect(page.getByText('This phone has no network.')).toBeVisible();
  await shot('06-outbox-offline');

  // ---- a reload with no network: the service worker serves the app shell, and the outbox reads
  // the phone's own storage ----
  await page.reload();
  await expect(page.getByRole('heading', { name: 'Outbox' })).toBeVisible();
  await expect(page.getByRole('list', { name: 'Repairs waiting to be sent' }).getByTestId('outbox-item')).toContainText(cabinet.serial);
  await shot('07-reload-offline');

  // ---- the signal is back, but the first answer is lost on the way: the server has the repair,
  // the phone does not know; the next try sends the same key and gets the same repair back ----
  const posts: string[] = [];
  let lost = false;
  await context.route('**/api/repairs', async (route) => {
    if (route.request().method() !== 'POST') return route.fallback();
    posts.push(route.request().headers()['idempotency-key'] ?? '');
    if (lost) return route.fallback();
    await route.fetch(); // reaches the server…
    await route.abort('connectionreset'); // …and the answer never reaches the phone
    lost = true;
  });
  // The `online` event sends what waits.
  await context.setOffline(false);
  await expect.poll(() => lost).toBe(true);
  expect(await repairsMarked(context.request, wall.id, marker), 'the server has it').toHaveLength(1);
  // The app's start sends again (as would the half-minute retry or "Send now").
  await page.goto('/outbox');
  await expect(page.getByRole('heading', { name: 'Outbox' })).toBeVisible();
  await expect(page.getByText('Nothing waiting')).toBeVisible();
  await shot('08-outbox-sent');

  expect(posts.length).toBeGreaterThanOrEqual(2);
  expect(new Set(posts).size, 'every try of one repair carries the same Idempotency-Key').toBe(1);
  const sent = await repairsMarked(context.request, wall.id, marker);
  expect(sent, 'the repair is recorded exactly once').toHaveLength(1);
  const photos = await getJson<{ items: { name?: string; filename?: string }[] }>(context.request, `/api/repairs/${sent[0].id}/photos`);
  expect(photos.items, 'the photo taken offline followed the repair').toHaveLength(1);
  expect(sent[0]).toMatchObject({
    ticketId: ticket.id,
    cabinetId: cabinet.id,
    column: cabinet.column,
    row: cabinet.row,
    component: 'receiving_card',
    fault: 'no_signal',
    action: 'reseated',
  });
  await context.close();
});

test('a repair refused on arrival (the cabinet moved meanwhile) waits for the technician, who fixes it in the form', async ({
  browser,
}, testInfo) => {
  const { context, page } = await phoneOf(browser, { serviceWorker: false });
  const shot = shotsOf(testInfo, page);
  const { wall, cabinets } = await demoWall(page.request);
  const [cabinet, other] = [cabinets[cabinets.length - 1], cabinets[cabinets.length - 2]];
  const marker = `moved-${Date.now()}`;

  await page.goto(`/repairs/new?wallId=${wall.id}`);
  await expect(cell(page, cabinet)).toBeVisible();
  await context.setOffline(true);
  await logReseatedCard(page, cabinet, `Reseated; ${marker}`);
  await page.getByRole('button', { name: 'Save the repair' }).click();
  await expect(page.getByText('Saved on this phone, will send when the network is back')).toBeVisible();

  // Meanwhile the office swaps the cabinet with its neighbour.
  const office = await signInToApi(browser, 'office@gridkeep.test');
  const swapped = await office.request.post(`/api/cabinets/${cabinet.id}/swap`, {
    data: { otherCabinetId: other.id, note: 'Matched batches' },
    headers: csrf,
  });
  expect(swapped.status(), await swapped.text()).toBe(200);

  // Back online: the server refuses it (cabinet_moved); the outbox says why.
  await context.setOffline(false);
  await page.goto('/outbox');
  const refused = page.getByRole('list', { name: 'Repairs that need your attention' }).getByTestId('outbox-item');
  await expect(refused).toHaveCount(1);
  await expect(refused.getByRole('alert')).not.toBeEmpty();
  await shot('09-outbox-refused');
  expect(await repairsMarked(office.request, wall.id, marker)).toHaveLength(0);

  // Open it in the form: everything typed is there; the technician taps the cabinet where it is now.
  await refused.getByRole('button', { name: 'Open in the form' }).click();
  await expect(page).toHaveURL(new RegExp(`/repairs/new\\?wallId=${wall.id}`));
  await expect(page.getByRole('textbox', { name: 'Notes' })).toHaveValue(`Reseated; ${marker}`);
  await page
    .getByRole('navigation', { name: 'Repair steps' })
    .getByRole('button', { name: /^Position/ })
    .click();
  await tapCell(page, other); // the cabinet now sits at its neighbour's old position
  await expect(page.getByTestId('repair-cabinet')).toContainText(cabinet.serial);
  for (let i = 0; i < 4; i++) await page.getByRole('button', { name: 'Next' }).click();
  await expect(page.getByRole('textbox', { name: 'Notes' })).toHaveValue(`Reseated; ${marker}`);
  await page.getByRole('button', { name: 'Save the repair' }).click();
  await expect(page.getByText('Repair recorded')).toBeVisible();
  await shot('10-fixed-and-sent');

  const sent = await repairsMarked(office.request, wall.id, marker);
  expect(sent).toHaveLength(1);
  expect(sent[0]).toMatchObject({ cabinetId: cabinet.id, column: other.column, row: other.row });
  await office.close();
  await context.close();
});

test('a module replaced with a spare of another batch: the module grid mirrors in the rear view, and the batch mismatch needs a yes', async ({
  browser,
}, testInfo) => {
  const { context, page } = await phoneOf(browser, { serviceWorker: false });
  const shot = shotsOf(testInfo, page);
  const { wall, cabinets } = await demoWall(page.request);
  const cabinet = cabinets[Math.floor(cabinets.length / 2)];
  const detail = await getJson<{ cabinetModel: { id: string; modulesWide: number; modulesHigh: number } }>(
    page.request,
    `/api/walls/${wall.id}`,
  );
  const van = await myVan(page.request);
  const part = (
    await getJson<{ items: { id: string; kind: string; cabinetModel: { id: string } | null }[] }>(page.request, '/api/parts?limit=500')
  ).items.find((p) => p.kind === 'module' && p.cabinetModel?.id === detail.cabinetModel.id);
  expect(part, 'the wall’s model has a module part').toBeTruthy();

  // The office puts one module of a batch no wall has into the technician's van.
  const batch = `ZZ-${Date.now()}`;
  const office = await signInToApi(browser, 'office@gridkeep.test');
  const receipt = await office.request.post('/api/stock-movements', {
    data: { kind: 'receipt', partId: part!.id, batch, toLocationId: van.id, quantity: 1 },
    headers: csrf,
  });
  expect(receipt.status(), await receipt.text()).toBe(201);

  await page.goto(`/repairs/new?wallId=${wall.id}&col=${cabinet.column}&row=${cabinet.row}`);
  // The cell in the address opens on its cabinet.
  await expect(page.getByTestId('repair-cabinet')).toContainText(cabinet.serial);
  await page.getByRole('button', { name: 'Next' }).click();
  await page.getByRole('group', { name: 'Component' }).getByRole('button', { name: 'Module', exact: true }).click();

  // Rear view: the audience's rightmost column comes first, as the technician faces the back.
  const modules = page.getByRole('group', { name: /^Modules of the cabinet/ }).getByRole('button');
  const { modulesWide: wide, modulesHigh: high } = detail.cabinetModel;
  await expect(modules).toHaveCount(wide * high);
  // A reload loses nothing: the draft is on the phone, at the step it had reached.
  await expect
    .poll(() =>
      page.evaluate(
        () =>
          new Promise<string | null>((resolve) => {
            const open = indexedDB.open('gridkeep-drafts');
            open.onsuccess = () => {
              const all = open.result.transaction('drafts').objectStore('drafts').getAll();
              all.onsuccess = () =>
                resolve((all.result as { step: string; component: string }[]).map((d) => `${d.component}:${d.step}`).join());
            };
          }),
      ),
    )
    .toContain('module:module');
  await page.reload();
  await expect(modules).toHaveCount(wide * high);
  await expect(page.getByText(/^Step 4 of/)).toBeVisible();
  await expect(modules.first()).toHaveAccessibleName(`Module column ${wide}, row 1 (as the audience sees it)`);
  await expect(page.getByText('left and right are mirrored')).toBeVisible();
  await shot('11-module-grid-rear');
  await page.getByRole('group', { name: 'Wall view' }).getByRole('button', { name: 'Front' }).click();
  await expect(modules.first()).toHaveAccessibleName('Module column 1, row 1 (as the audience sees it)');
  await modules.first().click();

  await page.getByRole('group', { name: 'Fault' }).getByRole('button', { name: 'Module dark' }).click();
  await page
    .getByRole('group', { name: 'Action' })
    .getByRole('button', { name: /^Replaced/ })
    .click();

  // The van's modules, the wall's batches first.
  const spares = page.getByRole('list', { name: /^Spares in / }).getByRole('button');
  await expect(spares.filter({ hasText: batch })).toHaveCount(1);
  const tags = await spares.evaluateAll((buttons) => buttons.map((b) => (b.textContent?.includes('Wall’s batch') ? 'wall' : 'other')));
  expect(tags.indexOf('other')).toBeGreaterThanOrEqual(0);
  expect(tags.slice(tags.indexOf('other')), 'no spare of the wall’s batch after another batch').not.toContain('wall');
  await shot('12-spares');
  await spares.filter({ hasText: batch }).click();
  await expect(page.getByText(`Batch ${batch} is not the wall’s batch.`)).toBeVisible();
  await expect(page.getByRole('button', { name: 'Next' })).toBeDisabled();
  await shot('13-batch-mismatch');
  await page.getByRole('button', { name: 'Fit it anyway' }).click();
  await page
    .getByRole('group', { name: 'Removed part' })
    .getByRole('button', { name: /^To the bench/ })
    .click();
  await expect(page.getByText('(another batch, confirmed)')).toBeVisible();
  await page.getByRole('button', { name: 'Save the repair' }).click();
  await expect(page.getByText('Repair recorded')).toBeVisible();
  await shot('14-recorded');

  const recorded = (
    await getJson<{
      items: { cabinetId: string; moduleColumn: number; moduleRow: number; part: { batch: string } | null; batchMismatch?: boolean }[];
    }>(office.request, `/api/repairs?cabinetId=${cabinet.id}&limit=5`)
  ).items[0];
  expect(recorded).toMatchObject({ cabinetId: cabinet.id, moduleColumn: 1, moduleRow: 1, part: { batch }, batchMismatch: true });
  const left = await getJson<{ items: { batch: string; onHand: number }[] }>(
    office.request,
    `/api/stock?locationId=${van.id}&partId=${part!.id}&limit=100`,
  );
  expect(left.items.find((b) => b.batch === batch)?.onHand ?? 0, 'the spare left the van').toBe(0);
  await office.close();
  await context.close();
});

test('a whole cabinet swapped for a spare from the van: the spare takes the position, the removed one goes to the bench', async ({
  browser,
}, testInfo) => {
  const { context, page } = await phoneOf(browser, { serviceWorker: false });
  const shot = shotsOf(testInfo, page);
  const van = await myVan(page.request);
  const groups = (await getJson<{ items: SpareCabinetGroup[] }>(page.request, '/api/stock/spare-cabinets')).items;
  // A wall whose model has a spare cabinet on some shelf.
  const walls = await getJson<{ items: { id: string; cabinetModel: { id: string } }[] }>(page.request, '/api/walls?limit=100');
  const wall = walls.items.find((w) => groups.some((g) => g.cabinetModel.id === w.cabinetModel.id && g.cabinets.length));
  expect(wall, 'the demo data keeps a spare cabinet of some wall’s model').toBeTruthy();
  const spare = groups.find((g) => g.cabinetModel.id === wall!.cabinetModel.id && g.cabinets.length)!.cabinets[0];
  const installed = (await getJson<{ items: Cabinet[] }>(page.request, `/api/walls/${wall!.id}/cabinets`)).items.filter(
    (c) => c.status === 'installed',
  );
  // Away from the cabinets the other tests of this file work on.
  const cabinet = installed[Math.floor(installed.length / 3)];

  // The office loads that spare cabinet into the technician's van.
  const office = await signInToApi(browser, 'office@gridkeep.test');
  const loaded = await office.request.patch(`/api/cabinets/${spare.id}`, { data: { stockLocationId: van.id }, headers: csrf });
  expect(loaded.status(), await loaded.text()).toBe(200);

  await page.goto(`/repairs/new?wallId=${wall!.id}&col=${cabinet.column}&row=${cabinet.row}`);
  await expect(page.getByTestId('repair-cabinet')).toContainText(cabinet.serial);
  await page.getByRole('button', { name: 'Next' }).click();
  await page.getByRole('group', { name: 'Component' }).getByRole('button', { name: 'Whole cabinet' }).click();
  await page.getByRole('group', { name: 'Fault' }).getByRole('button', { name: 'Physical damage' }).click();
  await page
    .getByRole('group', { name: 'Action' })
    .getByRole('button', { name: /^Cabinet swapped/ })
    .click();
  await page
    .getByRole('group', { name: 'Take the spare from' })
    .getByRole('button', { name: /· van$/ })
    .click();
  await page.getByRole('button', { name: spare.serial }).click();
  await shot('15-swap-removed');
  await page
    .getByRole('group', { name: 'Removed part' })
    .getByRole('button', { name: /^To the bench/ })
    .click();
  await expect(page.getByText(`Replaced by ${spare.serial}`)).toBeVisible();
  await page.getByRole('button', { name: 'Save the repair' }).click();
  await expect(page.getByText('Repair recorded')).toBeVisible();

  // The spare sits at the position now; the removed cabinet is at the bench.
  const now = (await getJson<{ items: Cabinet[] }>(office.request, `/api/walls/${wall!.id}/cabinets`)).items;
  expect(now.find((c) => c.column === cabinet.column && c.row === cabinet.row)?.serial).toBe(spare.serial);
  expect((await getJson<{ status: string }>(office.request, `/api/cabinets/${cabinet.id}`)).status).toBe('at_bench');
  await office.close();
  await context.close();
});
