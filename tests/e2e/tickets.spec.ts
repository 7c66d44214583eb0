import { expect, test, type BrowserContext, type Page } from '@playwright/test';
import { escapeRegExp, getJson, phone, signIn } from './support.js';

// The ticket journey across the three audiences, against the real app with the seeded demo
// data: a client reports a fault from a phone (two tapped cabinets and a photo), the office
// answers in public, and the e-mail to the client shows in the development mailbox.

const admin = 'admin@gridkeep.test';
const office = 'office@gridkeep.test';

// A 1 × 1 PNG (the PNG signature and IHDR/IDAT/IEND chunks, RFC 2083), so the server's
// content check sees a real image.
const png = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==', 'base64');

interface Wall {
  id: string;
  name: string;
  siteId: string;
  columns: number;
  rows: number;
}

test('a client opens a ticket with a photo and tapped cells; the office replies; the client is e-mailed', async ({ browser }, testInfo) => {
  test.setTimeout(180_000);
  // Phone pages scroll as a whole (full page); the office shell keeps its bars in place (the screen as seen).
  const shot = async (page: Page, name: string, fullPage = true) =>
    testInfo.attach(name, {
      body: await page.screenshot({ fullPage, path: testInfo.outputPath(`${name}.png`) }),
      contentType: 'image/png',
    });

  // ---- a client user of the demo data, found as the admin ----
  const adminSession = await signIn(browser, admin);
  const users = await adminSession.page.request.get('/api/users?role=client&limit=100');
  expect(users.ok()).toBe(true);
  const clientUsers = ((await users.json()) as { items: { email: string; disabled: boolean; invitePending: boolean }[] }).items.filter(
    (u) => !u.disabled && !u.invitePending,
  );
  expect(clientUsers.length).toBeGreaterThan(0);

  // The first of them whose organisation has a wall of at least 2 × 1 cabinets.
  let client: { context: BrowserContext; page: Page } | undefined;
  let clientEmail = '';
  let wall: Wall | undefined;
  for (const u of clientUsers) {
    const session = await signIn(browser, u.email, phone);
    const walls = (await (await session.page.request.get('/api/walls?limit=100')).json()) as { items: Wall[] };
    wall = walls.items.find((w) => w.columns >= 2);
    if (wall) {
      client = session;
      clientEmail = u.email;
      break;
    }
    await session.context.close();
  }
  expect(wall, 'a client organisation with a wall in the demo data').toBeDefined();
  const { page } = client!;

  // ---- the client opens a ticket on the phone ----
  const title = `Two dark cabinets top left ${Date.now().toString(36)}`;
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Tickets', exact: true }).click();
  await page.getByRole('link', { name: 'Open a ticket' }).first().click();
  await expect(page.getByRole('heading', { name: 'Open a ticket' })).toBeVisible();
  const siteSelect = page.getByLabel('Site', { exact: true });
  if (await siteSelect.count()) await siteSelect.selectOption(wall!.siteId);
  await page.getByRole('radio', { name: new RegExp(`^${escapeRegExp(wall!.name)}`) }).check({ force: true });
  await page.getByRole('gridcell', { name: /^C1·R1,/ }).click();
  await page.getByRole('gridcell', { name: /^C2·R1,/ }).click();
  await expect(page.getByText('2 cabinets selected:')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Unselect C1·R1' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Unselect C2·R1' })).toBeVisible();
  await page.getByRole('radio', { name: /^High/ }).check();
  await page.getByLabel('In a few words').fill(title);
  await page.getByLabel('What do you see?').fill('Both cabinets went black during the evening service; the rest of the wall is fine.');
  // On a phone the camera opens straight away; the other input picks photos already taken.
  const camera = page.getByLabel('Take a photo or video');
  await expect(camera).toHaveAttribute('capture', 'environment');
  await expect(camera).toHaveAttribute('accept', 'image/*,video/*');
  await expect(page.getByText('Take a photo or video')).toBeVisible();
  await page.getByLabel('Add photos or a video').setInputFiles({ name: 'fault.png', mimeType: 'image/png', buffer: png });
  await expect(page.getByRole('progressbar', { name: 'Upload of fault.png' })).toBeVisible();
  await shot(page, 'client-new-ticket-phone');
  await page.getByRole('button', { name: 'Send the ticket' }).click();

  // The ticket page, with the photo and the two cells.
  await expect(page).toHaveURL(/\/tickets\/[0-9a-f-]{36}$/, { timeout: 20_000 });
  const ticketUrl = page.url();
  await expect(page.getByRole('heading', { level: 1 })).toContainText(title);
  const ref = ((await page.getByRole('heading', { level: 1 }).textContent()) ?? '').match(/\d+\/\d{2}/)?.[0];
  expect(ref).toBeTruthy();
  await expect(page.getByText('Reported cabinets (2):')).toBeVisible();
  await expect(page.getByText('C1·R1, C2·R1')).toBeVisible();
  await expect(page.getByRole('gridcell', { name: /^C1·R1,/ })).toHaveAttribute('aria-selected', 'true');
  await expect(page.getByRole('img', { name: 'fault.png' })).toBeVisible();
  await shot(page, 'client-ticket-phone');

  // What the server stored: the two cells, the priority, and the photo on the ticket.
  const ticketId = ticketUrl.split('/').pop()!;
  const stored = await (await page.request.get(`/api/tickets/${ticketId}`)).json();
  expect(stored).toMatchObject({ status: 'new', priority: 'high', scope: 'cells', cellLabels: ['C1·R1', 'C2·R1'], wall: { id: wall!.id } });
  const files = await (await page.request.get(`/api/tickets/${ticketId}/attachments`)).json();
  expect(files.items).toHaveLength(1);
  expect(files.items[0]).toMatchObject({ fileName: 'fault.png', contentType: 'image/png', kind: 'photo', sizeBytes: png.length });

  // ---- the office finds it in the list and answers in public ----
  const desk = await signIn(browser, office);
  await desk.page.goto('/tickets');
  await desk.page.getByLabel('Search', { exact: true }).fill(ref!);
  const row = desk.page.getByRole('row').filter({ hasText: title });
  await expect(row).toBeVisible();
  await shot(desk.page, 'office-tickets-desktop', false);
  await row.getByRole('link', { name: title }).click();
  await expect(desk.page).toHaveURL(ticketUrl);
  await expect(desk.page.getByRole('heading', { level: 1 })).toContainText(ref!);

  const reply = `We will bring two cabinets from the site kit tomorrow (${ref}).`;
  await desk.page.getByLabel('Message to the client, or a note for staff').fill(reply);
  await desk.page.getByRole('button', { name: 'Send to client' }).click();
  const comment = desk.page.getByRole('article').filter({ hasText: reply });
  await expect(comment).toBeVisible();
  await expect(comment).not.toContainText('Staff note — not shown to the client');
  await shot(desk.page, 'office-ticket-desktop', false);

  // The client sees the reply on their ticket.
  await page.reload();
  await expect(page.getByRole('article').filter({ hasText: reply })).toBeVisible({ timeout: 20_000 });

  // ---- the admin finds the e-mail to the client in the development mailbox ----
  await adminSession.page.goto('/admin/mailbox');
  const subject = `New reply on ${ref}: ${title}`;
  // The mail worker polls the outbox every 2 s and the page refreshes itself every 5 s.
  const mail = adminSession.page.getByRole('button').filter({ hasText: subject }).filter({ hasText: clientEmail });
  await expect(mail).toBeVisible({ timeout: 45_000 });
  await mail.click();
  await expect(adminSession.page.getByText(reply)).toBeVisible();
  await expect(adminSession.page.getByText(new RegExp(`/tickets/${ticketId}`))).toBeVisible();

  await Promise.all([client!.context.close(), desk.context.close(), adminSession.context.close()]);
});

test('the office writes a staff note and a message to the client: the client reads the message, never the note', async ({
  browser,
}, testInfo) => {
  test.setTimeout(120_000);
  const clientEmail = 'av@cedarhollow.test';
  const client = await signIn(browser, clientEmail, phone);
  const open = await getJson<{ items: { id: string; ref: string }[] }>(client.page.request, '/api/tickets?open=true&limit=100');
  expect(open.items.length, 'an open ticket of the Cedar Hollow demo client').toBeGreaterThan(0);
  const ticket = open.items[0];
  const stamp = Date.now().toString(36);
  const note = `The spare for this wall is at the bench, not in the van (${stamp}).`;
  const message = `We come on Tuesday morning with a replacement cabinet (${stamp}).`;

  const desk = await signIn(browser, office);
  const page = desk.page;
  await page.goto(`/tickets/${ticket.id}`);
  const box = page.getByLabel('Message to the client, or a note for staff');
  // There is no public/internal switch: one box, two different buttons.
  await expect(page.getByRole('radio')).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Send to client' })).toHaveAccessibleDescription(/get an e-mail/);
  await expect(page.getByRole('button', { name: 'Save as staff note' })).toHaveAccessibleDescription(/the client never sees it/);

  // A failed send keeps what was typed.
  await page.route('**/api/tickets/*/comments', (route) => (route.request().method() === 'POST' ? route.abort() : route.fallback()));
  await box.fill(note);
  await page.getByRole('button', { name: 'Save as staff note' }).click();
  await expect(page.getByRole('form', { name: 'Write in the logbook' }).getByRole('alert')).toBeVisible();
  await expect(box).toHaveValue(note);
  await page.unroute('**/api/tickets/*/comments');

  await page.getByRole('button', { name: 'Save as staff note' }).click();
  const noteEntry = page.getByRole('article', { name: /^Staff note by / }).filter({ hasText: note });
  await expect(noteEntry).toBeVisible();
  await expect(box).toHaveValue('');
  await box.fill(message);
  await page.getByRole('button', { name: 'Send to client' }).click();
  const messageEntry = page.getByRole('article', { name: /^Message by / }).filter({ hasText: message });
  await expect(messageEntry).toBeVisible();

  // The note says what it is with a lock and words, on the same white as every entry: no amber or yellow tint.
  await expect(noteEntry).toContainText('Staff note — not shown to the client');
  await expect(noteEntry.locator('svg.lucide-lock')).toBeVisible();
  await expect(messageEntry).not.toContainText('Staff note');
  const look = async (entry: typeof noteEntry) =>
    entry.evaluate((el) => {
      const style = getComputedStyle(el);
      return { background: style.backgroundColor, borderStyle: style.borderTopStyle };
    });
  const noteLook = await look(noteEntry);
  expect(noteLook.background).toBe('rgb(255, 255, 255)');
  expect(noteLook.background).toBe((await look(messageEntry)).background);
  expect(noteLook.borderStyle).toBe('dashed');
  // Nothing around the note is tinted either (the list, the logbook).
  const tints = await noteEntry.evaluate((el) => {
    const found: string[] = [];
    for (let node: Element | null = el; node; node = node.parentElement) {
      const m = getComputedStyle(node).backgroundColor.match(/\d+/g)?.map(Number);
      // A warm tint: red and green well above blue (amber 50 is 255, 248, 234; amber 100 is 254, 237, 198).
      if (m && (m[3] ?? 1) > 0 && m[0] - m[2] > 15 && m[1] - m[2] > 10)
        found.push(`${node.tagName} ${getComputedStyle(node).backgroundColor}`);
    }
    return found;
  });
  expect(tints).toEqual([]);
  await testInfo.attach('office-logbook', { body: await page.screenshot({ fullPage: true }), contentType: 'image/png' });

  // The client reads the message and never the note.
  await client.page.goto(`/tickets/${ticket.id}`);
  await expect(client.page.getByRole('article').filter({ hasText: message })).toBeVisible();
  await expect(client.page.getByText(note)).toHaveCount(0);
  await expect(client.page.getByText('Staff note')).toHaveCount(0);
  await expect(client.page.getByRole('button', { name: 'Save as staff note' })).toHaveCount(0);
  await expect(client.page.getByRole('button', { name: 'Send', exact: true })).toBeVisible();
  await testInfo.attach('client-logbook-phone', { body: await client.page.screenshot({ fullPage: true }), contentType: 'image/png' });

  await Promise.all([client.context.close(), desk.context.close()]);
});
