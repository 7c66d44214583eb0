import { eq, sql } from 'drizzle-orm';
import ICAL from 'ical.js';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { closeDb, db } from '../../server/db/client.js';
import { contacts } from '../../server/db/schema/clients.js';
import { outboundMail } from '../../server/db/schema/mail.js';
import { parts, stockLocations } from '../../server/db/schema/stock.js';
import { tickets } from '../../server/db/schema/tickets.js';
import { repairs, visits } from '../../server/db/schema/visits.js';
import { cabinets } from '../../server/db/schema/walls.js';
import { closeMail } from '../../server/integrations/mail.js';
import { createOrganisation, createServicePlan, createUser, signIn, signedIn, type Session } from '../factories/index.js';
import { deliverMail } from '../setup/deliver-mail.js';
import { createIsolatedDatabase } from '../setup/isolated-database.js';
import { setEnv, startTestSmtp, type TestSmtp } from '../setup/fakes.js';

// This file sends real mail through the outbox to the SMTP fake, so it has a database of its own.
let smtp: TestSmtp;
let database: Awaited<ReturnType<typeof createIsolatedDatabase>>;
let restoreEnv: () => void;
let office: Session;
let tech: Session;
let org: Awaited<ReturnType<typeof createOrganisation>>;
let clientUser: Session;

const HOUR = 3_600_000;

beforeAll(async () => {
  [smtp, database] = await Promise.all([startTestSmtp(), createIsolatedDatabase('gridkeep_tickets')]);
  restoreEnv = setEnv({ DATABASE_URL: database.url, ...smtp.env, OFFICE_EMAIL: 'desk@integrator.test' });
  org = await createOrganisation({ withWall: true });
  // A round-the-clock plan makes the due times exact to check.
  const plan = await createServicePlan({ clockMode: 'round_the_clock' });
  await db().execute(sql`update clients set service_plan_id = ${plan.id} where id = ${org.client.id}`);
  await db()
    .insert(contacts)
    .values([
      { clientId: org.client.id, siteId: org.site.id, name: 'Site manager', email: 'site.manager@client.test' },
      { clientId: org.client.id, name: 'Quiet person', email: 'quiet@client.test', receivesUpdates: false },
    ]);
  office = await signedIn('coordinator');
  tech = await signedIn('technician');
  clientUser = await signedIn('client', org.client.id);
});

afterAll(async () => {
  closeMail();
  await closeDb();
  await smtp.dispose();
  restoreEnv();
  await database.drop();
});

async function open(session: Session, overrides: object = {}) {
  const res = await session.post('/api/tickets', {
    siteId: org.site.id,
    wallId: org.wall!.id,
    cells: [
      { column: 4, row: 2 },
      { column: 5, row: 2 },
    ],
    title: 'Dead module at C4·R2',
    description: 'Black square lower left of centre',
    priority: 'high',
    ...overrides,
  });
  expect(res.status).toBe(201);
  return res.body;
}

const deliver = () => deliverMail(smtp);

describe('opening a ticket', () => {
  it('a client user opens a ticket on their wall with tapped cells; due times come from the plan', async () => {
    const before = Date.now();
    const t = await open(clientUser);
    expect(t).toMatchObject({
      status: 'new',
      priority: 'high',
      scope: 'cells',
      cellLabels: ['C4·R2', 'C5·R2'],
      wall: { id: org.wall!.id },
    });
    // The reference: the number and the two-digit UTC year the ticket was opened (ticketRef).
    expect(t.ref).toBe(`${t.number}/${String(new Date(t.createdAt).getUTCFullYear()).slice(-2)}`);
    // Factory plan, high priority: respond in 4 h, resolve in 24 h, round the clock.
    const created = new Date(t.createdAt).getTime();
    expect(created).toBeGreaterThanOrEqual(before - 1000);
    expect(new Date(t.responseDueAt).getTime() - created).toBe(4 * HOUR);
    expect(new Date(t.resolutionDueAt).getTime() - created).toBe(24 * HOUR);
    expect(t.clockState).toBe('on_track');
  });

  it('refuses cells outside the wall and a site of another organisation', async () => {
    const outside = await clientUser.post('/api/tickets', {
      siteId: org.site.id,
      wallId: org.wall!.id,
      cells: [{ column: 13, row: 1 }],
      title: 'x',
      priority: 'low',
    });
    expect(outside.status).toBe(400);
    expect(outside.body.error.fields).toHaveProperty('cells');
    const other = await createOrganisation({ withWall: true });
    const foreign = await clientUser.post('/api/tickets', { siteId: other.site.id, title: 'x', priority: 'low' });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.fields).toHaveProperty('siteId');
    const noTitle = await clientUser.post('/api/tickets', { siteId: org.site.id, title: '  ', priority: 'urgent' });
    expect(noTitle.status).toBe(400);
    expect(Object.keys(noTitle.body.error.fields).sort()).toEqual(['priority', 'title']);
  });

  it('counts business hours in the site’s time zone when the plan says so', async () => {
    const bOrg = await createOrganisation({ timeZone: 'America/New_York' });
    const plan = await createServicePlan({ clockMode: 'business', businessDays: [1, 2, 3, 4, 5], dayStart: '08:00', dayEnd: '18:00' });
    await db().execute(sql`update clients set service_plan_id = ${plan.id} where id = ${bOrg.client.id}`);
    // Opened on Friday 6 March 2026 at 16:30 in New York (EST, UTC−5), the weekend before US
    // daylight saving time starts (Sunday 8 March 2026, second Sunday of March: 15 U.S.C. 260a).
    vi.useFakeTimers({ toFake: ['Date'], now: new Date('2026-03-06T21:30:00Z') });
    let res;
    try {
      res = await office.post('/api/tickets', { siteId: bOrg.site.id, title: 'Controller fan noise', priority: 'normal' });
    } finally {
      vi.useRealTimers();
    }
    expect(res.status).toBe(201);
    expect(res.body.createdAt).toBe('2026-03-06T21:30:00.000Z');
    // Due times worked by hand (factory plan, normal: respond in 8 h, resolve in 72 h, business
    // hours Monday–Friday 08:00–18:00):
    // response: Friday 16:30–18:00 is 1.5 h; the other 6.5 h from Monday 9 March 08:00 (now EDT,
    // UTC−4) → 14:30 EDT = 18:30 UTC.
    expect(res.body.responseDueAt).toBe('2026-03-09T18:30:00.000Z');
    // resolution: 1.5 h on Friday leaves 70.5 h; Monday 9 to Tuesday 17 March is seven working
    // days of 10 h (70 h), leaving 0.5 h on Wednesday 18 March → 08:30 EDT = 12:30 UTC.
    expect(res.body.resolutionDueAt).toBe('2026-03-18T12:30:00.000Z');
  });
});

describe('triage and the clock', () => {
  it('moves through the statuses; acknowledging meets the response clock', async () => {
    const t = await open(clientUser);
    const ack = await office.patch(`/api/tickets/${t.id}`, { status: 'acknowledged', assigneeId: tech.user.id });
    expect(ack.status).toBe(200);
    expect(ack.body).toMatchObject({
      status: 'acknowledged',
      assignee: { id: tech.user.id },
      clocks: { response: 'met', resolution: 'on_track' },
    });
    const back = await office.patch(`/api/tickets/${t.id}`, { status: 'new' });
    expect(back.status).toBe(409);
    expect(back.body.error.code).toBe('bad_transition');
    for (const status of ['in_progress', 'waiting_parts', 'in_progress', 'resolved', 'closed']) {
      const res = await office.patch(`/api/tickets/${t.id}`, { status });
      expect(res.status).toBe(200);
      expect(res.body.status).toBe(status);
    }
    expect((await office.patch(`/api/tickets/${t.id}`, { status: 'in_progress' })).status).toBe(409);
  });

  it('waiting on the client pauses the resolution clock and resuming pushes the due time out', async () => {
    const t = await open(clientUser, { priority: 'critical' });
    const due0 = new Date(t.resolutionDueAt).getTime();
    const paused = await office.patch(`/api/tickets/${t.id}`, { status: 'waiting_client' });
    expect(paused.body.clocks.resolution).toBe('paused');
    // Two hours pass while the client is away: move the pause back in time.
    await db()
      .update(tickets)
      .set({ pausedAt: new Date(Date.now() - 2 * HOUR) })
      .where(eq(tickets.id, t.id));
    const resumed = await office.patch(`/api/tickets/${t.id}`, { status: 'in_progress' });
    const due1 = new Date(resumed.body.resolutionDueAt).getTime();
    expect(due1 - due0).toBeGreaterThanOrEqual(2 * HOUR - 1000);
    expect(due1 - due0).toBeLessThanOrEqual(2 * HOUR + 5000);
    expect(resumed.body.clocks.resolution).toBe('on_track');
    expect(resumed.body.pausedAt).toBeNull();
  });

  it('shows at-risk and breached states and filters the list by them', async () => {
    const risky = await open(clientUser, { title: 'at risk one' });
    const late = await open(clientUser, { title: 'breached one' });
    // High: 24 h to resolve; at risk when under 6 h are left.
    await db()
      .update(tickets)
      .set({ resolutionAtRiskAt: new Date(Date.now() - 1000), acknowledgedAt: new Date() })
      .where(eq(tickets.id, risky.id));
    await db()
      .update(tickets)
      .set({ resolutionDueAt: new Date(Date.now() - 1000), acknowledgedAt: new Date() })
      .where(eq(tickets.id, late.id));
    expect((await office.get(`/api/tickets/${risky.id}`)).body.clockState).toBe('at_risk');
    expect((await office.get(`/api/tickets/${late.id}`)).body.clockState).toBe('breached');
    const atRisk = await office.get(`/api/tickets?clock=at_risk&clientId=${org.client.id}&limit=100`);
    expect(atRisk.body.items.map((i: { id: string }) => i.id)).toContain(risky.id);
    expect(atRisk.body.items.map((i: { id: string }) => i.id)).not.toContain(late.id);
    const breached = await office.get(`/api/tickets?clock=breached&clientId=${org.client.id}&limit=100`);
    expect(breached.body.items.every((i: { clockState: string }) => i.clockState === 'breached')).toBe(true);
    expect(breached.body.items.map((i: { id: string }) => i.id)).toContain(late.id);
  });

  it('plans a further visit on a ticket that is already scheduled', async () => {
    const t = await open(clientUser);
    const window = (day: number) => ({ start: `2026-12-${day}T15:00:00Z`, end: `2026-12-${day}T17:00:00Z`, technicianIds: [tech.user.id] });
    expect((await office.patch(`/api/tickets/${t.id}`, { status: 'scheduled', schedule: window(14) })).status).toBe(200);
    const again = await office.patch(`/api/tickets/${t.id}`, { status: 'scheduled', schedule: window(15) });
    expect(again.status).toBe(200);
    expect(again.body.visits.map((v: { windowStart: string }) => v.windowStart)).toEqual([
      '2026-12-14T15:00:00.000Z',
      '2026-12-15T15:00:00.000Z',
    ]);
    expect(again.body.siteTimeZone).toBe('America/Chicago');
  });

  it('lists the repairs done for a ticket; the part, its fate and the notes only for staff', async () => {
    const t = await open(clientUser, { title: 'module out' });
    const wall = org.wall!;
    const [cabinet] = await db()
      .insert(cabinets)
      .values({ wallId: wall.id, cabinetModelId: wall.cabinetModelId, serial: `RP-${Date.now()}`, column: 4, row: 2, batch: 'B7' })
      .returning();
    const [part] = await db()
      .insert(parts)
      .values({ sku: `MOD-${Date.now()}`, name: 'Test module', kind: 'module' })
      .returning();
    const [van] = await db()
      .insert(stockLocations)
      .values({ name: `Van ${Date.now()}`, kind: 'van', holderId: tech.user.id })
      .returning();
    await db().insert(repairs).values({
      clientId: org.client.id,
      wallId: wall.id,
      ticketId: t.id,
      cabinetId: cabinet.id,
      column: 4,
      row: 2,
      component: 'module',
      moduleColumn: 1,
      moduleRow: 2,
      fault: 'dead_module',
      action: 'replaced',
      partId: part.id,
      partBatch: 'B7',
      fromLocationId: van.id,
      removedPartFate: 'to_bench',
      notes: 'Spare from the site kit',
      technicianId: tech.user.id,
    });

    const seen = (await office.get(`/api/tickets/${t.id}`)).body.repairs;
    expect(seen).toEqual([
      expect.objectContaining({
        position: 'C4·R2',
        module: { column: 1, row: 2 },
        component: 'module',
        fault: 'dead_module',
        action: 'replaced',
        cabinetSerial: cabinet.serial,
        technicianName: tech.user.name,
        notes: 'Spare from the site kit',
        part: { name: 'Test module', batch: 'B7' },
        removedPartFate: 'to_bench',
      }),
    ]);
    const client = (await clientUser.get(`/api/tickets/${t.id}`)).body.repairs;
    expect(client).toHaveLength(1);
    expect(client[0]).toMatchObject({ position: 'C4·R2', action: 'replaced', cabinetSerial: cabinet.serial });
    expect(client[0]).not.toHaveProperty('notes');
    expect(client[0]).not.toHaveProperty('part');
    expect(client[0]).not.toHaveProperty('removedPartFate');
  });

  it('counts open tickets by clock state for the board', async () => {
    const before = (await office.get('/api/tickets/clock-counts')).body as Record<string, number>;
    const t = await open(clientUser, { title: 'counted' });
    await db()
      .update(tickets)
      .set({ resolutionDueAt: new Date(Date.now() - 1000), acknowledgedAt: new Date() })
      .where(eq(tickets.id, t.id));
    const after = (await office.get('/api/tickets/clock-counts')).body as Record<string, number>;
    expect((after.breached ?? 0) - (before.breached ?? 0)).toBe(1);
    const theirs = await clientUser.get('/api/tickets/clock-counts');
    const total = Object.values(theirs.body as Record<string, number>).reduce((a, b) => a + b, 0);
    const own = await clientUser.get('/api/tickets?open=true&limit=500');
    expect(total).toBe(own.body.items.length);
  });

  it('recomputes due times when the priority changes', async () => {
    const t = await open(clientUser, { priority: 'low' });
    const res = await office.patch(`/api/tickets/${t.id}`, { priority: 'critical' });
    expect(new Date(res.body.resolutionDueAt).getTime() - new Date(t.createdAt).getTime()).toBe(8 * HOUR);
  });

  it('lets a client close only their own resolved ticket, and nothing else', async () => {
    const t = await open(clientUser);
    expect((await clientUser.patch(`/api/tickets/${t.id}`, { status: 'closed' })).status).toBe(409);
    expect((await clientUser.patch(`/api/tickets/${t.id}`, { assigneeId: tech.user.id })).status).toBe(403);
    expect((await clientUser.patch(`/api/tickets/${t.id}`, { status: 'in_progress' })).status).toBe(403);
    await office.patch(`/api/tickets/${t.id}`, { status: 'resolved' });
    const closed = await clientUser.patch(`/api/tickets/${t.id}`, { status: 'closed' });
    expect(closed.status).toBe(200);
    expect(closed.body.status).toBe('closed');
  });

  it('merges a duplicate into the ticket that carries on', async () => {
    const a = await open(clientUser, { cells: [{ column: 1, row: 1 }] });
    const b = await open(clientUser, { cells: [{ column: 2, row: 1 }] });
    const res = await office.post(`/api/tickets/${b.id}/merge`, { intoTicketId: a.id });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'closed', mergedInto: { id: a.id, ref: a.ref } });
    const into = await office.get(`/api/tickets/${a.id}`);
    expect(into.body.cellLabels).toEqual(['C1·R1', 'C2·R1']);
    expect((await clientUser.post(`/api/tickets/${b.id}/merge`, { intoTicketId: a.id })).status).toBe(404);
  });
});

describe('comments', () => {
  it('hides internal comments from the client, and refuses internal comments from them', async () => {
    const t = await open(clientUser);
    expect((await office.post(`/api/tickets/${t.id}/comments`, { body: 'Parts cost us a fortune', visibility: 'internal' })).status).toBe(
      201,
    );
    expect(
      (await office.post(`/api/tickets/${t.id}/comments`, { body: 'We will bring a module from batch B7.', visibility: 'public' })).status,
    ).toBe(201);
    expect((await clientUser.post(`/api/tickets/${t.id}/comments`, { body: 'Thanks!', visibility: 'public' })).status).toBe(201);
    expect((await clientUser.post(`/api/tickets/${t.id}/comments`, { body: 'sneaky', visibility: 'internal' })).status).toBe(403);
    const theirs = await clientUser.get(`/api/tickets/${t.id}/comments`);
    expect(theirs.body.items.map((c: { body: string }) => c.body)).toEqual(['We will bring a module from batch B7.', 'Thanks!']);
    const staff = await office.get(`/api/tickets/${t.id}/comments`);
    expect(staff.body.items).toHaveLength(3);
  });
});

describe('the tenant boundary on ticket routes', () => {
  it('answers 404 to another organisation’s user on every ticket route', async () => {
    const t = await open(clientUser);
    const other = await createOrganisation();
    const stranger = await signedIn('client', other.client.id);
    expect((await stranger.get(`/api/tickets/${t.id}`)).status).toBe(404);
    expect((await stranger.patch(`/api/tickets/${t.id}`, { status: 'closed' })).status).toBe(404);
    expect((await stranger.get(`/api/tickets/${t.id}/comments`)).status).toBe(404);
    expect((await stranger.post(`/api/tickets/${t.id}/comments`, { body: 'hi' })).status).toBe(404);
    expect((await stranger.get(`/api/tickets/${t.id}/attachments`)).status).toBe(404);
    const upload = await stranger.agent
      .post(`/api/tickets/${t.id}/attachments`)
      .set('X-Requested-With', 'gridkeep')
      .attach('file', Buffer.from('%PDF-1.4\n'), 'x.pdf');
    expect(upload.status).toBe(404);
    const list = await stranger.get(`/api/tickets?clientId=${org.client.id}`);
    expect(list.body.items).toEqual([]);
    const search = await stranger.get(`/api/tickets?q=${encodeURIComponent(t.ref)}`);
    expect(search.body.items).toEqual([]);
  });
});

describe('e-mail', () => {
  it('tells the office about a new ticket and the client about public changes, never internal ones', async () => {
    const reporter = await createUser({ role: 'client', clientId: org.client.id });
    const session = await signIn(reporter);
    const t = await open(session, { title: 'Flicker on the bottom row' });
    await office.patch(`/api/tickets/${t.id}`, { status: 'acknowledged' });
    await office.post(`/api/tickets/${t.id}/comments`, { body: 'INTERNAL: supplier is slow', visibility: 'internal' });
    await office.post(`/api/tickets/${t.id}/comments`, { body: 'Module ships tomorrow.', visibility: 'public' });
    await office.patch(`/api/tickets/${t.id}`, {
      status: 'scheduled',
      schedule: { start: '2026-12-10T15:00:00Z', end: '2026-12-10T17:00:00Z', technicianIds: [tech.user.id] },
    });
    await office.patch(`/api/tickets/${t.id}`, { status: 'resolved' });

    const mail = (await deliver()).filter((m) => m.mail.subject?.includes(t.ref) || m.mail.text?.includes(t.ref));
    const bySubject = (re: RegExp) => mail.filter((m) => re.test(m.mail.subject ?? ''));
    const toOf = (m: (typeof mail)[number]) => m.received.envelope.to.slice().sort();

    const opened = bySubject(/^New high ticket/);
    expect(opened).toHaveLength(1);
    expect(toOf(opened[0])).toEqual(['desk@integrator.test']);

    const clientPeople = [reporter.email, 'site.manager@client.test'].sort();
    for (const re of [/^We are on it/, /^New reply/, /^Visit scheduled/, /^Resolved/]) {
      const found = bySubject(re);
      expect(found, String(re)).toHaveLength(1);
      expect(toOf(found[0])).toEqual(clientPeople);
    }
    expect(mail.some((m) => (m.mail.text ?? '').includes('INTERNAL'))).toBe(false);
    const invite = bySubject(/^Visit scheduled/)[0].mail.attachments.find((a) => a.contentType.startsWith('text/calendar'));
    expect(invite).toBeDefined();
    // RFC 5545: a VEVENT with the visit window in UTC.
    const ics = invite!.content.toString();
    expect(ics).toMatch(/BEGIN:VEVENT/);
    expect(ics).toMatch(/DTSTART:20261210T150000Z/);
    expect(ics).toMatch(/DTEND:20261210T170000Z/);
    expect(ics).toMatch(/METHOD:REQUEST/);
    // The ticket's booking goes through the visit's invitation: RFC 5546 §3.2.2 one ATTENDEE per
    // invitee (the technician and the client's people), RFC 5545 §3.8.7.4 SEQUENCE 0 at first.
    const event = new ICAL.Component(ICAL.parse(ics)).getFirstSubcomponent('vevent')!;
    expect(event.getFirstPropertyValue('sequence')).toBe(0);
    const attendees = event.getAllProperties('attendee').map((p) => String(p.getFirstValue()).replace(/^mailto:/i, ''));
    expect(attendees.sort()).toEqual([tech.user.email, ...clientPeople].sort());
    const [visit] = await db().select().from(visits).where(eq(visits.ticketId, t.id));
    expect(event.getFirstPropertyValue('uid')).toBe(`visit-${visit.id}@gridkeep`);
    const techMail = mail.filter((m) => (m.mail.subject ?? '').startsWith('New visit for you'));
    expect(techMail.map(toOf)).toEqual([[tech.user.email]]);
    const rows = await db().select().from(outboundMail).where(eq(outboundMail.status, 'sent'));
    expect(rows.length).toBeGreaterThanOrEqual(5);
  });

  it('does not mail a client user their own comment', async () => {
    const t = await open(clientUser, { title: 'Own comment check' });
    await clientUser.post(`/api/tickets/${t.id}/comments`, { body: 'Any news?', visibility: 'public' });
    const mail = (await deliver()).filter((m) => (m.mail.subject ?? '').startsWith('New reply') && (m.mail.subject ?? '').includes(t.ref));
    expect(mail).toHaveLength(1);
    expect(mail[0].received.envelope.to).not.toContain(clientUser.user.email);
    expect(mail[0].received.envelope.to).toContain('site.manager@client.test');
  });
});
