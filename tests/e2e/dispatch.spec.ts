import { expect, test, type Page } from '@playwright/test';
import { attachShot, csrf, escapeRegExp, phone, signIn } from './support.js';

// Dispatch against the real app and its demo data: the office plans a visit for a ticket on the
// week view, moves it (with the edit dialog, then by dragging it), sees a double booking, and
// cancels it; each change reaches the technician as a calendar invitation in the development
// mailbox. A client then finds their completed visits, with the report, in the portal.
//
// The invitations are checked against iCalendar: RFC 5545 §3.8.4.7 (UID stays the same),
// §3.8.7.4 (SEQUENCE goes up with each revision) and RFC 5546 §3.2.2 / §3.2.5 (METHOD:REQUEST
// for a booking or a change, METHOD:CANCEL for a cancellation).

const office = 'office@gridkeep.test';
const admin = 'admin@gridkeep.test';
const technician = { name: 'Rafael Dunmore', email: 'tech2@gridkeep.test' };
const desktop = { viewport: { width: 1280, height: 800 } };
const moved = 'Moved. The technicians and the client’s contacts were sent an updated invitation.';

/** Dates of the week `ahead` weeks from this one (Monday first) in the browser's zone, as YYYY-MM-DD, with their names. */
function weekAhead(ahead: number) {
  const today = new Date();
  const monday = new Date(today.getFullYear(), today.getMonth(), today.getDate() - ((today.getDay() + 6) % 7) + 7 * ahead);
  return Array.from({ length: 7 }, (_, i) => {
    const d = new Date(monday.getFullYear(), monday.getMonth(), monday.getDate() + i);
    const ymd = `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
    return {
      ymd,
      short: d.toLocaleDateString('en-GB', { weekday: 'short' }),
      long: `${d.toLocaleDateString('en-GB', { weekday: 'long' })} ${d.getDate()} ${d.toLocaleDateString('en-GB', { month: 'long' })}`,
    };
  });
}

interface MailItem {
  id: string;
  to: string;
  subject: string;
  attachments: { filename: string; contentType: string }[];
}

/** The first mail to `to` whose subject starts with `subject`, waited for (the mail worker sends every 2 s); with its invitation. */
async function invitation(page: Page, to: string, subject: string) {
  let mail: MailItem | undefined;
  await expect
    .poll(
      async () => {
        const { items } = (await (await page.request.get('/api/dev/mailbox')).json()) as { items: MailItem[] };
        mail = items.find((m) => m.to.includes(to) && m.subject.startsWith(subject));
        return Boolean(mail);
      },
      { timeout: 45_000, message: `a mail "${subject}" to ${to}` },
    )
    .toBe(true);
  const index = mail!.attachments.findIndex((a) => a.filename.endsWith('.ics'));
  expect(index, 'the mail carries an .ics invitation').toBeGreaterThanOrEqual(0);
  const ics = (await (await page.request.get(`/api/dev/mailbox/${mail!.id}/attachments/${index}`)).text()).replace(/\r?\n[ \t]/g, '');
  const field = (name: string) => ics.match(new RegExp(`^${name}[;:](.*)$`, 'm'))?.[1] ?? '';
  return { mail: mail!, ics, uid: field('UID'), sequence: Number(field('SEQUENCE') || '0'), method: field('METHOD') };
}

interface Ticket {
  id: string;
  ref: string;
  title: string;
  site: { id: string; name: string };
}

test('the office plans a visit for a ticket, moves it, sees a double booking and cancels it; the technician gets each invitation', async ({
  browser,
}, testInfo) => {
  test.setTimeout(240_000);
  const shot = (page: Page, name: string) => attachShot(testInfo, page, name);
  const errors: string[] = [];

  const desk = await signIn(browser, office, desktop);
  const { page } = desk;
  // The development mailbox is the admin's.
  const adminSession = await signIn(browser, admin, desktop);
  const mailbox = adminSession.page;
  page.on('pageerror', (err) => errors.push(err.message));

  // An open ticket of the demo data, the newest (the picker lists the newest first).
  const tickets = (await (await page.request.get('/api/tickets?open=true&sort=createdAt&dir=desc&limit=5')).json()) as { items: Ticket[] };
  const ticket = tickets.items[0];
  expect(ticket, 'an open ticket in the demo data').toBeDefined();
  // Weeks ahead, clear of the demo data's visits around today.
  const days = weekAhead(5);
  const [wednesday, thursday, friday] = [days[2], days[3], days[4]];

  // ---- plan it from the week view ----
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Dispatch' }).click();
  await expect(page.getByRole('heading', { name: 'Dispatch', level: 1 })).toBeVisible();
  await expect(page.getByRole('table')).toBeVisible();
  await shot(page, 'this-week');
  await page.getByRole('button', { name: 'Plan a visit' }).click();
  const plan = page.getByRole('dialog', { name: 'Plan a visit' });
  await expect(plan.getByRole('radio', { name: 'For a ticket' })).toBeChecked();

  // Sent empty, the contract's messages show beside the fields.
  await plan.getByRole('button', { name: 'Book and invite' }).click();
  await expect(plan.getByText('Choose the ticket.')).toBeVisible();
  await expect(plan.getByText('Assign at least one technician.')).toBeVisible();

  await plan.getByLabel('Ticket', { exact: true }).selectOption(ticket.id);
  await expect(plan.getByText(/^Times at the site \(/)).toBeVisible();
  await plan.getByLabel('Day', { exact: true }).fill(wednesday.ymd);
  await plan.getByLabel('From', { exact: true }).fill('10:00');
  await plan.getByLabel('Until', { exact: true }).fill('12:00');
  await plan.getByRole('checkbox', { name: technician.name }).check();
  await plan.getByLabel('Internal notes').fill('Bring the long ladder.');
  await shot(page, 'plan-dialog');
  await plan.getByRole('button', { name: 'Book and invite' }).click();
  await expect(plan).toBeHidden();
  await expect(page.getByText(/^Visit booked for /)).toBeVisible();
  await expect(page).toHaveURL(new RegExp(`week=${days[0].ymd}`));

  const row = page.getByRole('row').filter({ has: page.getByRole('rowheader', { name: technician.name }) });
  const blockName = new RegExp(`, ${escapeRegExp(`${ticket.site.name}, ${ticket.ref}`)}, `);
  const block = row.getByRole('button', { name: blockName });
  const cell = (day: { long: string }) => page.getByRole('list', { name: `${technician.name}, ${day.long}` });
  await expect(block).toHaveCount(1);
  await expect(block).toHaveAccessibleName(new RegExp(`^10:00–12:00 .*, ${wednesday.short} .*, Planned$`));
  await expect(cell(wednesday).getByRole('button', { name: blockName })).toContainText(ticket.ref);
  await shot(page, 'planned');

  const booked = await invitation(mailbox, technician.email, `New visit for you: ${ticket.site.name}, ${ticket.ref}`);
  expect(booked.method).toBe('REQUEST');
  expect(booked.uid).not.toBe('');
  expect(booked.ics).toMatch(/^ATTENDEE[;:].*tech2@gridkeep\.test/im);

  // ---- move it to Thursday with the edit dialog (keyboard: Enter on the block) ----
  await block.focus();
  await page.keyboard.press('Enter');
  const edit = page.getByRole('dialog', { name: `${ticket.site.name} · ${ticket.ref}` });
  await expect(edit.getByLabel('Day', { exact: true })).toHaveValue(wednesday.ymd);
  await expect(edit.getByLabel('From', { exact: true })).toHaveValue('10:00');
  await expect(edit.getByRole('checkbox', { name: technician.name })).toBeChecked();
  await edit.getByLabel('Day', { exact: true }).fill(thursday.ymd);
  await shot(page, 'edit-dialog');
  await edit.getByRole('button', { name: 'Save and send update' }).click();
  await expect(edit).toBeHidden();
  await expect(page.getByText(moved).first()).toBeVisible();
  await expect(block).toHaveAccessibleName(new RegExp(`^10:00–12:00 .*, ${thursday.short} `));
  await expect(cell(thursday).getByRole('button', { name: blockName })).toHaveCount(1);
  await expect(cell(wednesday).getByRole('button', { name: blockName })).toHaveCount(0);

  const changed = await invitation(mailbox, technician.email, `Visit changed for you: ${ticket.site.name}, ${ticket.ref}`);
  expect(changed.method).toBe('REQUEST');
  expect(changed.uid).toBe(booked.uid);
  expect(changed.sequence).toBeGreaterThan(booked.sequence);

  // ---- drag it on to Friday, same time of day ----
  const fridayCell = cell(friday).locator('..');
  await block.dragTo(fridayCell);
  await expect(block).toHaveAccessibleName(new RegExp(`^10:00–12:00 .*, ${friday.short} `));
  await expect(cell(friday).getByRole('button', { name: blockName })).toHaveCount(1);
  const stored = (await (await page.request.get(`/api/visits?ticketId=${ticket.id}&status=planned`)).json()) as {
    items: { id: string; windowStart: string; sequence: number; site: { timeZone: string } }[];
  };
  const visit = stored.items.find((v) => v.sequence > changed.sequence);
  expect(visit, 'the visit moved a second time').toBeDefined();
  const zone = visit!.site.timeZone;
  const atSite = new Intl.DateTimeFormat('en-CA', {
    timeZone: zone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  });
  expect(atSite.format(new Date(visit!.windowStart))).toBe(`${friday.ymd}, 10:00`);

  // ---- a second visit for the same technician at the same time: booked twice ----
  const walls = (await (await page.request.get('/api/walls?limit=1')).json()) as { items: { id: string; siteName: string }[] };
  const wall = walls.items[0];
  const halfAnHourLater = Date.parse(visit!.windowStart) + 30 * 60_000;
  const second = await page.request.post('/api/visits', {
    headers: csrf,
    data: {
      kind: 'maintenance',
      wallId: wall.id,
      windowStart: new Date(halfAnHourLater).toISOString(),
      windowEnd: new Date(halfAnHourLater + 2 * 3_600_000).toISOString(),
      technicianIds: [(await technicianId(page, technician.name))!],
    },
  });
  expect(second.status()).toBe(201);
  const secondId = ((await second.json()) as { id: string }).id;
  await page.reload();
  const pair = page
    .getByRole('region', { name: 'Double bookings this week' })
    .getByRole('listitem')
    .filter({ hasText: ticket.site.name })
    .filter({ hasText: wall.siteName });
  await expect(pair).toContainText(`${technician.name}:`);
  await expect(pair).toContainText(`${friday.short} `);
  await expect(block).toContainText('Booked twice');
  await expect(block).toHaveAccessibleName(/, booked twice, /);
  await shot(page, 'booked-twice');

  // ---- cancel the ticket's visit, with a reason and a confirmation ----
  await block.click();
  await page
    .getByRole('dialog', { name: `${ticket.site.name} · ${ticket.ref}` })
    .getByRole('button', { name: 'Cancel visit…' })
    .click();
  const confirm = page.getByRole('dialog', { name: 'Cancel this visit?' });
  await confirm.getByLabel('Reason').fill('The client closed the hall for the week.');
  await confirm.getByRole('button', { name: 'Cancel the visit' }).click();
  await expect(confirm).toBeHidden();
  await expect(page.getByText(/^Visit cancelled\./)).toBeVisible();
  await expect(block).toHaveCount(0);
  // The double booking went with it.
  await expect(pair).toHaveCount(0);
  await page.getByLabel(/^Show cancelled visits/).check();
  await expect(block).toHaveAccessibleName(/, Cancelled, /);
  await shot(page, 'cancelled-shown');

  const cancelled = await invitation(mailbox, technician.email, `Visit cancelled for you: ${ticket.site.name}, ${ticket.ref}`);
  expect(cancelled.method).toBe('CANCEL');
  expect(cancelled.uid).toBe(booked.uid);
  expect(cancelled.sequence).toBeGreaterThan(changed.sequence);

  // The office's list of visits, filtered by technician and status, links to the visit.
  await page.getByRole('link', { name: 'All visits' }).click();
  await expect(page.getByRole('heading', { name: 'Visits', level: 1 })).toBeVisible();
  await page.getByLabel('Technician', { exact: true }).selectOption({ label: technician.name });
  await page.getByLabel('Status', { exact: true }).selectOption({ label: 'Cancelled' });
  await expect(page).toHaveURL(/status=cancelled/);
  await expect(page).toHaveURL(/technicianId=/);
  await expect(page.getByLabel('Technician', { exact: true }).locator('option:checked')).toHaveText(technician.name);
  const listed = page.getByRole('row').filter({ hasText: ticket.ref });
  await expect(listed).toHaveCount(1);
  await expect(listed).toContainText('Cancelled');
  await expect(listed.getByRole('link', { name: new RegExp(`^${friday.short} .*10:00–12:00 `) })).toHaveAttribute(
    'href',
    `/visits/${visit!.id}`,
  );
  await shot(page, 'office-visits');

  // The ticket's page can link to dispatch with the ticket chosen.
  await page.goto(`/dispatch?ticketId=${ticket.id}`);
  const fromTicket = page.getByRole('dialog', { name: 'Plan a visit' });
  await expect(fromTicket.getByLabel('Ticket', { exact: true })).toHaveValue(ticket.id);
  await fromTicket.getByRole('button', { name: 'Cancel' }).click();
  await expect(fromTicket).toBeHidden();
  await expect(page).not.toHaveURL(/ticketId=/);

  // The admin sees the same mails in the mailbox screen.
  await adminSession.page.goto('/admin/mailbox');
  for (const subject of ['New visit for you', 'Visit changed for you', 'Visit cancelled for you'])
    await expect(
      adminSession.page
        .getByRole('button')
        .filter({ hasText: `${subject}: ${ticket.site.name}, ${ticket.ref}` })
        .first(),
    ).toBeVisible({ timeout: 30_000 });

  // Tidy: the maintenance visit made for the double booking.
  expect((await page.request.patch(`/api/visits/${secondId}`, { headers: csrf, data: { status: 'cancelled' } })).ok()).toBe(true);
  expect(errors).toEqual([]);
  await Promise.all([desk.context.close(), adminSession.context.close()]);
});

async function technicianId(page: Page, name: string) {
  const staff = (await (await page.request.get('/api/staff')).json()) as { items: { id: string; name: string }[] };
  return staff.items.find((s) => s.name === name)?.id;
}

test('a technician does not see dispatch; a client sees their visits with the report of a completed one', async ({ browser }, testInfo) => {
  test.setTimeout(120_000);
  const tech = await signIn(browser, technician.email, phone);
  await tech.page.goto('/dispatch');
  await expect(tech.page.getByText('We could not find that page')).toBeVisible();
  await tech.context.close();

  // A client user whose organisation has a completed visit (the demo data has some).
  const adminSession = await signIn(browser, admin, desktop);
  const done = (await (await adminSession.page.request.get('/api/visits?status=completed&dir=desc&limit=100')).json()) as {
    items: { id: string; client: { id: string } }[];
  };
  const users = (await (await adminSession.page.request.get('/api/users?role=client&limit=100')).json()) as {
    items: { email: string; clientId: string | null; disabled: boolean; invitePending: boolean }[];
  };
  const user = users.items.find((u) => !u.disabled && !u.invitePending && done.items.some((v) => v.client.id === u.clientId));
  expect(user, 'a client user with a completed visit').toBeDefined();
  await adminSession.context.close();

  for (const options of [phone, desktop]) {
    const { context, page } = await signIn(browser, user!.email, options);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Visits' }).click();
    await expect(page.getByRole('heading', { name: 'Visits', level: 1 })).toBeVisible();
    const report = page.getByRole('link', { name: /^Report \(PDF\) of the visit on / }).first();
    await expect(report).toBeVisible();
    await expect(page.getByText('Completed').first()).toBeVisible();
    await attachShot(testInfo, page, `client-visits-${options === phone ? 'phone' : 'desktop'}`, { fullPage: true });
    if (options === phone) {
      // The report is made on first download, and is a PDF (ISO 32000: a file starts with "%PDF-").
      const answer = await page.request.get((await report.getAttribute('href'))!);
      expect(answer.status()).toBe(200);
      expect(answer.headers()['content-type']).toContain('application/pdf');
      expect((await answer.body()).subarray(0, 5).toString()).toBe('%PDF-');
    } else {
      // A visit's ticket is a link to the ticket, not a dead end.
      const ref = page
        .getByRole('article')
        .getByRole('link', { name: /^\d+\/\d{2}$/ })
        .first();
      const name = (await ref.textContent())!;
      await ref.click();
      await expect(page).toHaveURL(/\/tickets\/[0-9a-f-]{36}$/);
      await expect(page.getByRole('heading', { level: 1 })).toContainText(name);
    }
    await context.close();
  }
});
