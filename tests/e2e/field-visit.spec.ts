import { expect, test, type APIRequestContext, type Page, type TestInfo } from '@playwright/test';
import type { WallCabinet as Cabinet } from '../../shared/schemas/walls.js';
import { attachShot, csrf, getJson, phone, signIn, signInToApi } from './support.js';

// The technician's day on a phone, against the real app with the seeded demo data: the office
// books a visit for today on a wall whose batch of spare modules is in the technician's van; the
// technician opens it from the start page, starts it, logs a module replaced with the van's
// spare, ticks the checklist, and closes it with the client's signature drawn on the screen; the
// report e-mail with its PDF reaches the development mailbox.

interface Spare {
  partId: string;
  partName: string;
  partKind: string;
  batch: string;
  locationId: string;
  locationKind: string;
  onHand: number;
  matchesWallBatch: boolean;
}

/**
 * A demo wall with an installed cabinet whose module batch is on hand at the warehouse or in the
 * van: the module spare of that batch, the cabinet, and the wall.
 */
async function wallWithMatchingSpare(request: APIRequestContext, vanId: string) {
  const walls = await getJson<{ items: { id: string; name: string; siteName: string }[] }>(request, '/api/walls?limit=100');
  for (const wall of walls.items) {
    const spares = await getJson<{ items: Spare[] }>(request, `/api/walls/${wall.id}/spares`);
    const cabinets = (await getJson<{ items: Cabinet[] }>(request, `/api/walls/${wall.id}/cabinets`)).items.filter(
      (c) => c.status === 'installed',
    );
    const fits = (s: Spare) => s.partKind === 'module' && s.matchesWallBatch && s.onHand > 0;
    for (const spare of [
      ...spares.items.filter((s) => s.locationId === vanId),
      ...spares.items.filter((s) => s.locationKind === 'warehouse'),
    ]) {
      const cabinet = cabinets.find((c) => c.batch.toLowerCase() === spare.batch.toLowerCase());
      if (fits(spare) && cabinet) return { wall, spare, cabinet };
    }
  }
  throw new Error('The demo data has no wall with a module spare of its batch in the warehouse or the van.');
}

/** The screen as the phone shows it, and the whole page scrolled through. */
async function shot(testInfo: TestInfo, page: Page, name: string) {
  await attachShot(testInfo, page, name);
  await attachShot(testInfo, page, `${name}-full`, { fullPage: true });
}

/** A stroke across the signature pad: with the mouse, or with a finger (CDP touch events). */
async function drawStroke(page: Page, how: 'mouse' | 'touch', from: [number, number], to: [number, number]) {
  const box = await page.getByTestId('signature-pad').boundingBox();
  expect(box).not.toBeNull();
  const at = (fx: number, fy: number) => ({ x: box!.x + box!.width * fx, y: box!.y + box!.height * fy });
  const steps = 12;
  const point = (i: number) => at(from[0] + ((to[0] - from[0]) * i) / steps, from[1] + ((to[1] - from[1]) * i) / steps + 0.1 * Math.sin(i));
  if (how === 'mouse') {
    await page.mouse.move(point(0).x, point(0).y);
    await page.mouse.down();
    for (let i = 1; i <= steps; i++) await page.mouse.move(point(i).x, point(i).y);
    await page.mouse.up();
    return;
  }
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: [point(0)] });
  for (let i = 1; i <= steps; i++) await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: [point(i)] });
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
  await cdp.detach();
}

test('a technician on a phone opens today’s visit, logs a module from the van, and the client signs: the report is e-mailed', async ({
  browser,
}, testInfo) => {
  test.setTimeout(240_000);
  const startedAt = new Date();

  // ---- the office: the demo technician, their van, a wall with a spare of its batch ----
  const office = await signInToApi(browser, 'office@gridkeep.test');
  const staff = await getJson<{ items: { id: string; name: string; role: string }[] }>(office.request, '/api/staff');
  const technician = staff.items.find((s) => s.role === 'technician' && s.name === 'Jonah Ellery');
  expect(technician, 'the demo technician').toBeTruthy();
  const locations = await getJson<{ items: { id: string; kind: string; holder: { id: string } | null }[] }>(
    office.request,
    '/api/stock-locations?kind=van',
  );
  const van = locations.items.find((l) => l.holder?.id === technician!.id);
  expect(van, 'the technician’s van').toBeTruthy();
  const { wall, spare, cabinet } = await wallWithMatchingSpare(office.request, van!.id);

  // The spare goes into the van when it is only in the warehouse.
  if (spare.locationId !== van!.id) {
    const moved = await office.request.post('/api/stock-movements', {
      headers: csrf,
      data: {
        kind: 'transfer',
        partId: spare.partId,
        batch: spare.batch,
        fromLocationId: spare.locationId,
        toLocationId: van!.id,
        quantity: 1,
        reason: 'Stocking the van for today’s visit',
      },
    });
    expect(moved.status(), await moved.text()).toBe(201);
  }
  const inVan = async () =>
    (await getJson<{ items: Spare[] }>(office.request, `/api/walls/${wall.id}/spares?locationId=${van!.id}`)).items.find(
      (s) => s.partId === spare.partId && s.batch === spare.batch,
    )?.onHand ?? 0;
  const vanBefore = await inVan();
  expect(vanBefore).toBeGreaterThan(0);

  const internalNotes = 'Stage door key safe: code 4411. Do not give the code to the client.';
  // Booked from half an hour ago to two hours on: today, whatever the clock says.
  const checklist = ['Isolate the wall’s supply before opening a cabinet', 'Whole wall shown on a test pattern after the work'];
  const booked = await office.request.post('/api/visits', {
    headers: csrf,
    data: {
      kind: 'maintenance',
      wallId: wall.id,
      windowStart: new Date(Date.now() - 30 * 60_000).toISOString(),
      windowEnd: new Date(Date.now() + 120 * 60_000).toISOString(),
      technicianIds: [technician!.id],
      checklist: checklist.map((label) => ({ label, done: false })),
      internalNotes,
    },
  });
  expect(booked.status(), await booked.text()).toBe(201);
  const visit = (await booked.json()) as { id: string; client: { id: string }; site: { name: string; address: string } };

  // ---- the technician's phone: today's visit on the start page ----
  const { page } = await signIn(browser, 'tech@gridkeep.test', phone);
  await expect(page).toHaveURL(/\/$/);
  const today = page.getByRole('list', { name: 'Your visits today' });
  const card = today.getByRole('listitem').filter({ has: page.locator(`a[href="/visits/${visit.id}"]`) });
  await expect(card).toBeVisible();
  await expect(card).toContainText(wall.name);
  await expect(card).toContainText('Planned maintenance');
  // The address opens the phone's maps app (a geo: URI, RFC 5870, with Android's q= query).
  await expect(card.getByRole('link', { name: /opens the maps app/ })).toHaveAttribute(
    'href',
    `geo:0,0?q=${encodeURIComponent(visit.site.address)}`,
  );
  await shot(testInfo, page, 'home');

  await card.locator(`a[href="/visits/${visit.id}"]`).click();
  await expect(page).toHaveURL(`/visits/${visit.id}`);
  await expect(page.getByRole('heading', { level: 1, name: visit.site.name })).toBeVisible();
  await expect(page.getByText('Isolate power before opening a cabinet')).toBeVisible();
  await expect(page.getByText(internalNotes)).toBeVisible();

  // ---- start the visit ----
  await page.getByRole('button', { name: 'Start visit' }).click();
  await expect(page.getByText('On site', { exact: true })).toBeVisible();
  const startButton = page.getByRole('link', { name: 'Log a repair' });
  const target = await startButton.boundingBox();
  // Bigger than the 44 × 44 CSS px of WCAG 2.2 SC 2.5.5: the field buttons are min-h-touch-lg.
  expect(target?.height, 'a target for a dusty thumb').toBeGreaterThan(44);
  await shot(testInfo, page, 'visit');

  // ---- log a module replaced with the van's spare (the repair screen's steps) ----
  await startButton.click();
  await expect(page).toHaveURL(new RegExp(`/repairs/new\\?visitId=${visit.id}`));
  // The map starts zoomed to fingertip-sized cabinets on a phone: the whole wall is one tap away.
  const whole = page.getByRole('button', { name: 'Show the whole wall' });
  if (await whole.isEnabled()) await whole.click();
  await page.getByRole('gridcell', { name: new RegExp(`^C${cabinet.column}·R${cabinet.row},`) }).click();
  await expect(page.getByTestId('repair-cabinet')).toContainText(cabinet.serial);
  await page.getByRole('button', { name: 'Next' }).click();
  await page.getByRole('group', { name: 'Component' }).getByRole('button', { name: 'Module', exact: true }).click();
  await page.getByRole('button', { name: 'Module column 1, row 1 (as the audience sees it)' }).click();
  await page.getByRole('group', { name: 'Fault' }).getByRole('button', { name: 'Module dark' }).click();
  await page
    .getByRole('group', { name: 'Action' })
    .getByRole('button', { name: /^Replaced/ })
    .click();
  const spares = page.getByRole('list', { name: /^Spares in / });
  await spares.getByRole('button').filter({ hasText: spare.batch }).filter({ hasText: 'Wall’s batch' }).click();
  await page
    .getByRole('group', { name: 'Removed part' })
    .getByRole('button', { name: /^To the bench/ })
    .click();
  await page.getByRole('button', { name: 'Save the repair' }).click();
  await expect(page.getByText('Repair recorded')).toBeVisible();
  await page.getByRole('link', { name: 'Back to the visit' }).click();

  // The repair is on the visit, with its part and batch; one unit left the van.
  const repair = page.getByTestId('visit-repair');
  await expect(repair).toHaveCount(1);
  await expect(repair).toContainText(`Module 1,1 at C${cabinet.column}·R${cabinet.row}: replaced`);
  await expect(repair).toContainText(spare.batch);
  expect(await inVan()).toBe(vanBefore - 1);

  // ---- the checklist, ticked and saved; ticked without signal, kept and sent when it is back ----
  const saveState = page.getByTestId('checklist-save-state');
  await page.context().setOffline(true);
  await page.getByRole('checkbox', { name: checklist[0] }).check();
  await expect(saveState).toContainText('Not sent yet: kept on this phone');
  await page.context().setOffline(false);
  await expect(saveState).toHaveText('Saved');
  await page.getByRole('checkbox', { name: checklist[1] }).check();
  await expect(saveState).toHaveText('Saved');
  const saved = await getJson<{ checklist: { label: string; done: boolean }[] }>(page.request, `/api/visits/${visit.id}`);
  expect(saved.checklist.map((i) => i.done)).toEqual([true, true]);

  // ---- close: a summary, the drawn signature and the signer's name ----
  await page.getByRole('link', { name: 'Close visit' }).click();
  await expect(page).toHaveURL(`/visits/${visit.id}/close`);
  await expect(page.getByRole('checkbox', { name: checklist[0] })).toBeChecked();
  const pad = await page.getByTestId('signature-pad').boundingBox();
  expect(pad!.height, 'the pad is at least 200 px tall').toBeGreaterThanOrEqual(200);
  expect(pad!.width, 'the pad runs the width of the screen').toBeGreaterThanOrEqual(300);

  const summary = 'Replaced one dark module with a spare of the wall’s batch; the whole wall checked on a test pattern.';
  await page.getByLabel('Summary of the visit').fill(summary);
  // A stroke, then Clear: the pad is empty again and the form asks for a signature.
  await drawStroke(page, 'mouse', [0.1, 0.5], [0.5, 0.4]);
  await page.getByRole('button', { name: 'Clear' }).click();
  await page.getByLabel('Name of the person signing').fill('Tobin Ashgrove');
  await page.getByRole('button', { name: 'Close visit and send the report' }).click();
  await expect(page.getByText('Ask the client’s contact to sign, or say why no one could.')).toBeVisible();
  await expect(page).toHaveURL(`/visits/${visit.id}/close`);

  // The summary survives a reload (kept on the phone until sent).
  await page.reload();
  await expect(page.getByLabel('Summary of the visit')).toHaveValue(summary);
  await page.getByLabel('Name of the person signing').fill('Tobin Ashgrove');
  await drawStroke(page, 'mouse', [0.1, 0.6], [0.45, 0.35]);
  await drawStroke(page, 'touch', [0.45, 0.35], [0.9, 0.6]);
  await shot(testInfo, page, 'close');
  await page.getByRole('button', { name: 'Close visit and send the report' }).click();

  // ---- back on the visit: completed, signed, the report ----
  await expect(page).toHaveURL(`/visits/${visit.id}`);
  await expect(page.getByText('Visit closed.')).toBeVisible();
  await expect(page.getByText('Report e-mailed to the client’s contacts')).toBeVisible();
  await expect(page.getByText('Signed by Tobin Ashgrove')).toBeVisible();
  const reportLink = page.getByRole('link', { name: 'Report (PDF)' });
  await expect(reportLink).toHaveAttribute('href', `/api/visits/${visit.id}/report.pdf`);
  await shot(testInfo, page, 'visit-closed');
  const pdf = await page.request.get(`/api/visits/${visit.id}/report.pdf`);
  expect(pdf.status()).toBe(200);
  expect(pdf.headers()['content-type']).toContain('application/pdf');
  expect((await pdf.body()).subarray(0, 5).toString('latin1')).toBe('%PDF-');
  const closed = await getJson<{ status: string; signedByName: string; signedAt: string | null }>(page.request, `/api/visits/${visit.id}`);
  expect(closed).toMatchObject({ status: 'completed', signedByName: 'Tobin Ashgrove' });
  expect(closed.signedAt).not.toBeNull();

  // ---- the report e-mail with its PDF, in the development mailbox ----
  const admin = await signInToApi(browser, 'admin@gridkeep.test');
  type Mail = { id: string; subject: string; date: string; attachments: { filename: string; contentType: string }[] };
  let mail: Mail | undefined;
  // The mail worker polls the outbox every 2 s.
  await expect
    .poll(
      async () => {
        const box = await getJson<{ items: Mail[] }>(admin.request, '/api/dev/mailbox');
        mail = box.items.find(
          (m) => m.subject === `Visit report: ${visit.site.name}` && new Date(m.date) >= new Date(startedAt.getTime() - 1000),
        );
        return mail?.attachments.map((a) => a.contentType) ?? [];
      },
      { timeout: 45_000 },
    )
    .toContain('application/pdf');
  const index = mail!.attachments.findIndex((a) => a.contentType === 'application/pdf');
  const attached = await admin.request.get(`/api/dev/mailbox/${mail!.id}/attachments/${index}`);
  expect(attached.status()).toBe(200);
  expect((await attached.body()).subarray(0, 5).toString('latin1')).toBe('%PDF-');

  // ---- the client reads the visit and its report: nothing to start or close, no internal notes ----
  const users = await getJson<{ items: { email: string; clientId: string | null; disabled: boolean; invitePending: boolean }[] }>(
    admin.request,
    '/api/users?role=client&limit=100',
  );
  const clientUser = users.items.find((u) => u.clientId === visit.client.id && !u.disabled && !u.invitePending);
  expect(clientUser, 'a client user of the visit’s organisation').toBeTruthy();
  const { page: client } = await signIn(browser, clientUser!.email, phone);
  await client.goto(`/visits/${visit.id}`);
  await expect(client.getByRole('heading', { level: 1, name: visit.site.name })).toBeVisible();
  await expect(client.getByText('Signed by Tobin Ashgrove')).toBeVisible();
  await expect(client.getByRole('link', { name: 'Report (PDF)' })).toBeVisible();
  await expect(client.getByText('The report was e-mailed to your contacts.')).toBeVisible();
  await expect(client.getByRole('checkbox', { name: checklist[0] })).toBeDisabled();
  for (const name of ['Start visit', 'Log a repair', 'Close visit'])
    await expect(client.getByRole('link', { name }).or(client.getByRole('button', { name }))).toHaveCount(0);
  await expect(client.getByText('Internal notes')).toHaveCount(0);
  await expect(client.getByText(internalNotes)).toHaveCount(0);
  await shot(testInfo, client, 'visit-client');

  await Promise.all([office.close(), admin.close(), page.context().close(), client.context().close()]);
});

test('on a ticket visit a reported cell starts its repair and any other cell opens its cabinet card, on this visit', async ({
  browser,
}, testInfo) => {
  test.setTimeout(120_000);
  // ---- the office: a ticket on one cabinet of a wall, and a visit for it today ----
  const office = await signInToApi(browser, 'office@gridkeep.test');
  const staff = await getJson<{ items: { id: string; name: string; role: string }[] }>(office.request, '/api/staff');
  const technician = staff.items.find((s) => s.role === 'technician' && s.name === 'Jonah Ellery')!;
  const walls = await getJson<{ items: { id: string; name: string; siteId: string }[] }>(office.request, '/api/walls?limit=100');
  let picked: { wall: (typeof walls.items)[number]; reported: Cabinet; other: Cabinet } | undefined;
  for (const wall of walls.items) {
    const installed = (await getJson<{ items: Cabinet[] }>(office.request, `/api/walls/${wall.id}/cabinets`)).items.filter(
      (c) => c.status === 'installed',
    );
    // Two cabinets side by side: the map, centred on the reported one, shows its neighbour too.
    const reported = installed.find((c) => installed.some((o) => o.row === c.row && o.column === c.column + 1));
    if (reported) {
      picked = { wall, reported, other: installed.find((o) => o.row === reported.row && o.column === reported.column + 1)! };
      break;
    }
  }
  expect(picked, 'a demo wall with two installed cabinets side by side').toBeDefined();
  const { wall, reported, other } = picked!;
  const opened = await office.request.post('/api/tickets', {
    headers: csrf,
    data: {
      siteId: wall.siteId,
      wallId: wall.id,
      cells: [{ column: reported.column, row: reported.row }],
      title: 'Cabinet dark after a power cut',
      priority: 'normal',
    },
  });
  expect(opened.status(), await opened.text()).toBe(201);
  const ticket = (await opened.json()) as { id: string };
  const booked = await office.request.post('/api/visits', {
    headers: csrf,
    data: {
      kind: 'ticket',
      ticketId: ticket.id,
      windowStart: new Date(Date.now() - 30 * 60_000).toISOString(),
      windowEnd: new Date(Date.now() + 120 * 60_000).toISOString(),
      technicianIds: [technician.id],
    },
  });
  expect(booked.status(), await booked.text()).toBe(201);
  const visit = (await booked.json()) as { id: string };

  // ---- the technician's phone: the visit shows the wall from behind, the reported cell marked ----
  const { page } = await signIn(browser, 'tech@gridkeep.test', phone);
  await page.goto(`/visits/${visit.id}`);
  const map = page.getByTestId('visit-wall-map');
  await expect(map.getByRole('button', { name: /^Rear/ })).toHaveAttribute('aria-pressed', 'true');
  const cell = (c: Cabinet) => map.getByRole('gridcell', { name: new RegExp(`^C${c.column}·R${c.row},`) });
  await expect(cell(reported)).toHaveAttribute('aria-selected', 'true');
  await expect(cell(other)).not.toHaveAttribute('aria-selected', 'true');
  await shot(testInfo, page, 'visit-map');

  // Another cell: its cabinet card, whose "Log repair" records the repair on this visit.
  await cell(other).click();
  const dialog = page.getByRole('dialog', { name: `Cabinet at C${other.column}·R${other.row}` });
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText(other.serial);
  const logRepair = dialog.getByRole('link', { name: /Log (a )?repair/ });
  await expect(logRepair).toHaveAttribute('href', new RegExp(`visitId=${visit.id}`));
  await expect(logRepair).toHaveAttribute('href', new RegExp(`col=${other.column}&row=${other.row}`));
  await attachShot(testInfo, page, 'visit-cabinet-card');
  await dialog.getByRole('button', { name: 'Close', exact: true }).last().click();
  await expect(dialog).toBeHidden();

  // The reported cell: straight to its repair, on this visit.
  await cell(reported).click();
  await expect(page).toHaveURL(new RegExp(`/repairs/new\\?visitId=${visit.id}.*col=${reported.column}&row=${reported.row}`));
  await expect(page.getByTestId('repair-cabinet')).toContainText(reported.serial);

  // Cancel the visit so that the demo's day stays as it was for other tests.
  await office.request.patch(`/api/visits/${visit.id}`, { headers: csrf, data: { status: 'cancelled', cancelReason: 'Test visit' } });
  await Promise.all([office.close(), page.context().close()]);
});
