import { crc32, deflateSync } from 'node:zlib';
import { and, eq, like } from 'drizzle-orm';
import ICAL from 'ical.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { defaultTicketChecklist } from '../../shared/schemas/visits.js';
import { closeDb, db } from '../../server/db/client.js';
import { contacts, sites } from '../../server/db/schema/clients.js';
import { attachments } from '../../server/db/schema/files.js';
import { outboundMail } from '../../server/db/schema/mail.js';
import { tickets } from '../../server/db/schema/tickets.js';
import { repairs, visits, visitTechnicians } from '../../server/db/schema/visits.js';
import { maintenancePlans } from '../../server/db/schema/walls.js';
import { closeMail } from '../../server/integrations/mail.js';
import { closeStorage, ensureBucket, newStorageKey, putObject } from '../../server/integrations/s3.js';
import { winAnsi } from '../../server/services/visit-report.js';
import { addMonths } from '../../server/services/visits.js';
import { anonymous, createOrganisation, createUser, signIn, signedIn, type Session } from '../factories/index.js';
import { deliverMail } from '../setup/deliver-mail.js';
import { createIsolatedDatabase } from '../setup/isolated-database.js';
import { setEnv, startTestS3, startTestSmtp, type TestS3, type TestSmtp } from '../setup/fakes.js';

// This file sends real mail through the outbox (with the report PDF read from object storage), so
// it has a database, an SMTP fake and an S3 fake of its own.
let smtp: TestSmtp;
let s3: TestS3;
let database: Awaited<ReturnType<typeof createIsolatedDatabase>>;
let restoreEnv: () => void;
let org: Awaited<ReturnType<typeof createOrganisation>>;
let office: Session;
let clientUser: Session;

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const STREET = '1200 Harbor Boulevard';
/** A small PNG drawn here (RFC 2083: signature §3.1, chunks with CRC-32 §3.2–3.4, IHDR §4.1.1, zlib IDAT §5). */
function makePng(width: number, height: number) {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const out = Buffer.alloc(12 + data.length);
    out.writeUInt32BE(data.length, 0);
    body.copy(out, 4);
    out.writeUInt32BE(crc32(body), 8 + data.length);
    return out;
  };
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 6, 0, 0, 0], 8); // 8 bits, RGBA, deflate, filter 0, no interlace
  const rows = Buffer.alloc(height * (1 + 4 * width), 0x40); // filter byte and pixels alike: grey, a quarter opaque
  for (let y = 0; y < height; y++) rows[y * (1 + 4 * width)] = 0;
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(rows)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}
const png = makePng(8, 4);
const signature = `data:image/png;base64,${png.toString('base64')}`;

beforeAll(async () => {
  [smtp, s3, database] = await Promise.all([startTestSmtp(), startTestS3(), createIsolatedDatabase('gridkeep_visits')]);
  restoreEnv = setEnv({ DATABASE_URL: database.url, ...smtp.env, ...s3.env, OFFICE_EMAIL: 'desk@integrator.test' });
  await ensureBucket();
  org = await createOrganisation({ withWall: true });
  await db()
    .update(sites)
    .set({ address: STREET, city: 'Portside', region: 'IL', postalCode: '60601', country: 'USA', accessNotes: 'Dock 3, ask security' })
    .where(eq(sites.id, org.site.id));
  await db()
    .insert(contacts)
    .values([
      { clientId: org.client.id, siteId: org.site.id, name: 'Site manager', email: 'site.manager@client.test', phone: '+1 312 555 0100' },
      { clientId: org.client.id, name: 'Quiet person', email: 'quiet@client.test', receivesUpdates: false },
    ]);
  office = await signedIn('coordinator');
  clientUser = await signedIn('client', org.client.id);
});

afterAll(async () => {
  closeMail();
  closeStorage();
  await closeDb();
  await Promise.all([smtp.dispose(), s3.dispose()]);
  restoreEnv();
  await database.drop();
});

async function technician(name: string) {
  return signIn(await createUser({ role: 'technician', name }));
}

/** A ticket reported by the client user on the organisation's wall. */
async function openTicket(title = 'Dark module') {
  const res = await clientUser.post('/api/tickets', {
    siteId: org.site.id,
    wallId: org.wall!.id,
    cells: [{ column: 4, row: 2 }],
    title,
    priority: 'high',
  });
  expect(res.status).toBe(201);
  return res.body as { id: string; ref: string };
}

const at = (ms: number) => new Date(ms).toISOString();

async function book(ticketId: string, technicianIds: string[], start: number, hours = 2, extra: object = {}) {
  const res = await office.post('/api/visits', {
    kind: 'ticket',
    ticketId,
    windowStart: at(start),
    windowEnd: at(start + hours * HOUR),
    technicianIds,
    ...extra,
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body;
}

/** The visit's queued mail, oldest first. */
const queued = (visitId: string) =>
  db()
    .select()
    .from(outboundMail)
    .where(like(outboundMail.dedupeKey, `visit:${visitId}:%`))
    .orderBy(outboundMail.id);

/** The invitation attached to a mail, parsed (RFC 5545 through ical.js). */
function invitation(mail: typeof outboundMail.$inferSelect) {
  const file = mail.attachments.find((a) => a.contentType.startsWith('text/calendar'));
  expect(file, mail.subject).toBeDefined();
  const calendar = new ICAL.Component(ICAL.parse(file!.content!));
  const event = calendar.getFirstSubcomponent('vevent')!;
  const value = (name: string) => event.getFirstPropertyValue(name);
  return {
    raw: file!.content!,
    contentType: file!.contentType,
    method: calendar.getFirstPropertyValue('method'),
    uid: value('uid'),
    sequence: value('sequence'),
    status: value('status'),
    location: value('location'),
    description: String(value('description') ?? ''),
    organizer: String(value('organizer')).toLowerCase(),
    attendees: event
      .getAllProperties('attendee')
      .map((p) => String(p.getFirstValue()).replace(/^mailto:/i, ''))
      .sort(),
    attendeeNames: event
      .getAllProperties('attendee')
      .map((p) => String(p.getParameter('cn')))
      .sort(),
  };
}

const deliver = () => deliverMail(smtp);

describe('the visits API', () => {
  it('refuses the signed out, bad bodies naming the field, and writes from outside the office', async () => {
    expect((await anonymous().get('/api/visits')).status).toBe(401);
    expect((await anonymous().post('/api/visits').set('X-Requested-With', 'gridkeep').send({})).status).toBe(401);
    const t = await openTicket();
    const bad = await office.post('/api/visits', {
      kind: 'ticket',
      ticketId: t.id,
      windowStart: at(Date.now() + 2 * HOUR),
      windowEnd: at(Date.now() + HOUR),
      technicianIds: [],
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['technicianIds', 'windowEnd']);
    const notATech = await office.post('/api/visits', {
      kind: 'ticket',
      ticketId: t.id,
      windowStart: at(Date.now() + HOUR),
      windowEnd: at(Date.now() + 2 * HOUR),
      technicianIds: [office.user.id],
    });
    expect(notATech.status).toBe(400);
    expect(notATech.body.error.fields).toHaveProperty('technicianIds');
    const tech = await technician('Tess Field');
    const body = {
      kind: 'ticket',
      ticketId: t.id,
      windowStart: at(Date.now()),
      windowEnd: at(Date.now() + HOUR),
      technicianIds: [tech.user.id],
    };
    // requireRole: client users get 404 on office areas, staff without the role 403.
    expect((await clientUser.post('/api/visits', body)).status).toBe(404);
    expect((await tech.post('/api/visits', body)).status).toBe(403);
  });

  it('books a ticket visit: default checklist, the ticket scheduled, invitations to technicians and client', async () => {
    const ada = await technician('Ada Rivet');
    const bo = await technician('Bo Solder');
    const t = await openTicket('Two dark modules');
    const start = Date.parse('2027-01-12T15:00:00Z');
    const visit = await book(t.id, [ada.user.id, bo.user.id], start, 2, { internalNotes: 'INTERNAL: bring the long ladder' });
    expect(visit).toMatchObject({
      kind: 'ticket',
      status: 'planned',
      sequence: 0,
      windowStart: '2027-01-12T15:00:00.000Z',
      site: { id: org.site.id, address: `${STREET}, Portside, IL 60601, USA`, accessNotes: 'Dock 3, ask security' },
      wall: { id: org.wall!.id, columns: 12, rows: 6 },
      ticket: { id: t.id, ref: t.ref, cells: [{ column: 4, row: 2 }] },
      internalNotes: 'INTERNAL: bring the long ladder',
      reportUrl: null,
      can: { edit: true, work: true },
    });
    expect(visit.technicians.map((x: { name: string }) => x.name)).toEqual(['Ada Rivet', 'Bo Solder']);
    expect(visit.checklist).toEqual(defaultTicketChecklist.map((label) => ({ label, done: false })));
    expect(visit.contacts.map((c: { name: string }) => c.name)).toEqual(['Site manager', 'Quiet person']);
    const [ticket] = await db().select().from(tickets).where(eq(tickets.id, t.id));
    expect(ticket.status).toBe('scheduled');

    const mail = await queued(visit.id);
    const techMail = mail.find((m) => m.dedupeKey!.endsWith(':technicians'))!;
    const clientMail = mail.find((m) => m.dedupeKey!.endsWith(':client'))!;
    expect(techMail.to.sort()).toEqual([ada.user.email, bo.user.email].sort());
    expect(clientMail.to.sort()).toEqual([clientUser.user.email, 'site.manager@client.test'].sort());
    for (const m of [techMail, clientMail]) {
      const ics = invitation(m);
      expect(ics.contentType).toBe('text/calendar; method=REQUEST; charset=UTF-8');
      expect(ics.method).toBe('REQUEST');
      // RFC 5545 §3.8.4.7: one UID for every version of the visit.
      expect(ics.uid).toBe(`visit-${visit.id}@gridkeep`);
      // RFC 5545 §3.8.7.4: the first version has SEQUENCE 0.
      expect(ics.sequence).toBe(0);
      // RFC 5546 §3.2.2: a REQUEST names the ORGANIZER and one ATTENDEE per invitee.
      expect(ics.organizer).toBe('mailto:desk@integrator.test');
      expect(ics.attendees).toEqual([ada.user.email, bo.user.email, clientUser.user.email, 'site.manager@client.test'].sort());
      // RFC 5545 §3.2.2 CN: the invitee's name as people know it.
      expect(ics.attendeeNames).toEqual(['Ada Rivet', 'Bo Solder', 'Site manager', clientUser.user.name].sort());
      // RFC 5545 §3.8.1.7 LOCATION: the street address, so a phone can route to it.
      expect(ics.location).toBe(`${STREET}, Portside, IL 60601, USA`);
      expect(ics.raw).toMatch(/DTSTART:20270112T150000Z/);
      expect(ics.description).toContain(t.ref);
      expect(ics.description).toContain('Dock 3, ask security');
    }
    expect(invitation(techMail).description).toContain('INTERNAL: bring the long ladder');
    expect(invitation(clientMail).description).not.toContain('INTERNAL');
    expect(clientMail.text).not.toContain('INTERNAL');
  });

  it('a move keeps the UID and raises SEQUENCE; a removed technician and a cancel get METHOD:CANCEL', async () => {
    const ada = await technician('Ada Move');
    const bo = await technician('Bo Move');
    const t = await openTicket();
    const start = Date.parse('2027-02-02T15:00:00Z');
    const visit = await book(t.id, [ada.user.id], start);

    const moved = await office.patch(`/api/visits/${visit.id}`, { windowStart: at(start + DAY), windowEnd: at(start + DAY + 3 * HOUR) });
    expect(moved.status).toBe(200);
    expect(moved.body.sequence).toBe(1);
    let mail = await queued(visit.id);
    const movedInvite = invitation(mail.find((m) => m.dedupeKey === `visit:${visit.id}:seq1:client`)!);
    expect(movedInvite.uid).toBe(`visit-${visit.id}@gridkeep`);
    // RFC 5545 §3.8.7.4: SEQUENCE goes up by one when the start or end changes.
    expect(movedInvite.sequence).toBe(1);
    expect(movedInvite.method).toBe('REQUEST');
    expect(movedInvite.raw).toMatch(/DTSTART:20270203T150000Z/);
    expect(mail.find((m) => m.dedupeKey === `visit:${visit.id}:seq1:client`)!.subject).toMatch(/^Visit moved/);

    // Saving the same window again changes nothing the invitees hear of.
    const same = await office.patch(`/api/visits/${visit.id}`, { windowStart: at(start + DAY), checklist: [] });
    expect(same.body.sequence).toBe(1);

    const reassigned = await office.patch(`/api/visits/${visit.id}`, { technicianIds: [bo.user.id] });
    expect(reassigned.body.sequence).toBe(2);
    mail = await queued(visit.id);
    const toBo = mail.find((m) => m.dedupeKey === `visit:${visit.id}:seq2:technicians`)!;
    expect(toBo.to).toEqual([bo.user.email]);
    expect(invitation(toBo).attendees).toContain(bo.user.email);
    expect(invitation(toBo).attendees).not.toContain(ada.user.email);
    const toAda = mail.find((m) => m.dedupeKey === `visit:${visit.id}:seq2:removed`)!;
    expect(toAda.to).toEqual([ada.user.email]);
    // RFC 5546 §3.2.5: an attendee taken off the event gets a CANCEL naming them.
    expect(invitation(toAda)).toMatchObject({ method: 'CANCEL', sequence: 2, attendees: [ada.user.email] });

    const cancelled = await office.patch(`/api/visits/${visit.id}`, { status: 'cancelled', cancelReason: 'Client closed the hall' });
    expect(cancelled.status).toBe(200);
    expect(cancelled.body).toMatchObject({ status: 'cancelled', sequence: 3, cancelReason: 'Client closed the hall' });
    mail = await queued(visit.id);
    for (const audience of ['technicians', 'client']) {
      const m = mail.find((x) => x.dedupeKey === `visit:${visit.id}:seq3:${audience}`)!;
      const ics = invitation(m);
      // RFC 5546 §3.2.5: CANCEL with the same UID, STATUS:CANCELLED and a higher SEQUENCE.
      expect(ics).toMatchObject({ method: 'CANCEL', status: 'CANCELLED', sequence: 3, uid: `visit-${visit.id}@gridkeep` });
      expect(ics.contentType).toBe('text/calendar; method=CANCEL; charset=UTF-8');
      expect(m.text).toContain('Client closed the hall');
    }
    const [row] = await db().select().from(visits).where(eq(visits.id, visit.id));
    expect(row.cancelledAt).not.toBeNull();

    const again = await office.patch(`/api/visits/${visit.id}`, {
      windowStart: at(start + 2 * DAY),
      windowEnd: at(start + 2 * DAY + HOUR),
    });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/cancelled visit cannot be moved/);
  });

  it('shows conflicts to staff (a technician booked twice), never to the client, never with a cancelled visit', async () => {
    const ada = await technician('Ada Twice');
    const t = await openTicket();
    const start = Date.parse('2027-03-03T14:00:00Z');
    const first = await book(t.id, [ada.user.id], start, 3);
    const second = await book(t.id, [ada.user.id], start + 2 * HOUR, 2);
    const apart = await book(t.id, [ada.user.id], start + 6 * HOUR, 1);
    expect(second.conflicts).toEqual([
      {
        visitId: first.id,
        technician: { id: ada.user.id, name: 'Ada Twice' },
        windowStart: first.windowStart,
        windowEnd: first.windowEnd,
        siteName: org.site.name,
      },
    ]);
    expect(apart.conflicts).toEqual([]);
    const list = await office.get(`/api/visits?technicianId=${ada.user.id}`);
    expect(list.body.items.map((v: { id: string; conflicts: { visitId: string }[] }) => [v.id, v.conflicts.map((c) => c.visitId)])).toEqual(
      [
        [first.id, [second.id]],
        [second.id, [first.id]],
        [apart.id, []],
      ],
    );
    expect((await clientUser.get(`/api/visits/${second.id}`)).body.conflicts).toEqual([]);
    await office.patch(`/api/visits/${first.id}`, { status: 'cancelled' });
    expect((await office.get(`/api/visits/${second.id}`)).body.conflicts).toEqual([]);
  });

  it('lists by window in keyset pages, soonest first or latest first', async () => {
    const ada = await technician('Ada Pages');
    const t = await openTicket();
    const start = Date.parse('2027-04-05T14:00:00Z');
    const ids = [];
    for (let i = 0; i < 3; i++) ids.push((await book(t.id, [ada.user.id], start + i * DAY)).id);
    const page1 = await office.get(`/api/visits?technicianId=${ada.user.id}&limit=2`);
    expect(page1.body.items.map((v: { id: string }) => v.id)).toEqual(ids.slice(0, 2));
    const page2 = await office.get(`/api/visits?technicianId=${ada.user.id}&limit=2&cursor=${page1.body.nextCursor}`);
    expect(page2.body).toMatchObject({ items: [{ id: ids[2] }], nextCursor: null });
    const latest = await office.get(`/api/visits?technicianId=${ada.user.id}&dir=desc`);
    expect(latest.body.items.map((v: { id: string }) => v.id)).toEqual([...ids].reverse());
    const window = await office.get(`/api/visits?technicianId=${ada.user.id}&from=${at(start + DAY)}&to=${at(start + DAY + HOUR)}`);
    expect(window.body.items.map((v: { id: string }) => v.id)).toEqual([ids[1]]);
    expect((await office.get('/api/visits?status=nope')).status).toBe(400);
  });
});

describe('who sees and changes a visit', () => {
  it('technicians: their own visits, the day’s others read-only, nothing else; the client their own without internal notes', async () => {
    const ada = await technician('Ada Own');
    const bo = await technician('Bo Other');
    const t = await openTicket();
    const today = await book(t.id, [ada.user.id], Date.now() - HOUR, 2, { internalNotes: 'INTERNAL: key at the desk' });
    const later = await book(t.id, [ada.user.id], Date.now() + 3 * DAY, 2);
    const bosOwn = await book(t.id, [bo.user.id], Date.now() + 5 * DAY, 2);

    // Ada: her own.
    expect((await ada.get(`/api/visits/${later.id}`)).body.can).toEqual({ edit: false, work: true });
    // Bo: today's visit of another, read-only; a later one is not his to see.
    const peek = await bo.get(`/api/visits/${today.id}`);
    expect(peek.status).toBe(200);
    expect(peek.body.can).toEqual({ edit: false, work: false });
    expect((await bo.patch(`/api/visits/${today.id}`, { status: 'in_progress' })).status).toBe(403);
    expect((await bo.post(`/api/visits/${today.id}/close`, { summary: 'x', checklist: [], unsignedReason: 'x' })).status).toBe(403);
    expect((await bo.get(`/api/visits/${later.id}`)).status).toBe(404);
    expect((await bo.patch(`/api/visits/${later.id}`, { summary: 'x' })).status).toBe(404);
    const bosList = (await bo.get('/api/visits?limit=500')).body.items.map((v: { id: string }) => v.id);
    expect(bosList).toContain(today.id);
    expect(bosList).toContain(bosOwn.id);
    expect(bosList).not.toContain(later.id);
    const mine = (await bo.get('/api/visits?technicianId=me')).body.items.map((v: { id: string }) => v.id);
    expect(mine).toEqual([bosOwn.id]);
    // The office's work stays the office's.
    expect((await ada.patch(`/api/visits/${today.id}`, { windowStart: at(Date.now()) })).status).toBe(403);
    expect((await ada.patch(`/api/visits/${today.id}`, { status: 'cancelled' })).status).toBe(403);

    // The client: their own visits, never internal notes or conflicts.
    const theirs = await clientUser.get(`/api/visits/${today.id}`);
    expect(theirs.status).toBe(200);
    expect(theirs.body).not.toHaveProperty('internalNotes');
    expect(JSON.stringify(theirs.body)).not.toContain('INTERNAL');
    expect((await clientUser.get(`/api/visits?clientId=${org.client.id}&limit=500`)).body.items.map((v: { id: string }) => v.id)).toContain(
      today.id,
    );
    expect((await clientUser.patch(`/api/visits/${today.id}`, { summary: 'x' })).status).toBe(404);
  });

  it('answers 404 to another organisation’s user on every visit route', async () => {
    const ada = await technician('Ada Tenant');
    const t = await openTicket();
    const visit = await book(t.id, [ada.user.id], Date.parse('2027-05-05T14:00:00Z'));
    const other = await createOrganisation();
    const stranger = await signedIn('client', other.client.id);
    expect((await stranger.get(`/api/visits/${visit.id}`)).status).toBe(404);
    expect((await stranger.patch(`/api/visits/${visit.id}`, { summary: 'x' })).status).toBe(404);
    expect((await stranger.post(`/api/visits/${visit.id}/close`, { summary: 'x', checklist: [], unsignedReason: 'x' })).status).toBe(404);
    expect((await stranger.get(`/api/visits/${visit.id}/report.pdf`)).status).toBe(404);
    expect((await stranger.get(`/api/visits?clientId=${org.client.id}`)).body.items).toEqual([]);
    expect((await stranger.get(`/api/visits?ticketId=${t.id}`)).body.items).toEqual([]);
  });
});

describe('working a visit', () => {
  it('start puts the visit and its ticket in progress; close signs, keeps and mails the report PDF', async () => {
    const ada = await technician('Ada Close');
    const t = await openTicket('Dark module at C4·R2');
    const visit = await book(t.id, [ada.user.id], Date.now() - HOUR, 3, { internalNotes: 'INTERNAL: ladder in van 2' });

    const started = await ada.patch(`/api/visits/${visit.id}`, { status: 'in_progress' });
    expect(started.status).toBe(200);
    expect(started.body.status).toBe('in_progress');
    expect(started.body.startedAt).not.toBeNull();
    expect((await db().select().from(tickets).where(eq(tickets.id, t.id)))[0].status).toBe('in_progress');
    expect((await ada.patch(`/api/visits/${visit.id}`, { status: 'in_progress' })).status).toBe(200);

    // A repair of the visit, with a photo (JPEG/PNG photos go into the report).
    const [repair] = await db()
      .insert(repairs)
      .values({
        clientId: org.client.id,
        wallId: org.wall!.id,
        visitId: visit.id,
        ticketId: t.id,
        column: 4,
        row: 2,
        component: 'module',
        moduleColumn: 1,
        moduleRow: 2,
        fault: 'dead_module',
        action: 'reseated',
        technicianId: ada.user.id,
        notes: 'INTERNAL: connector was loose',
      })
      .returning();
    const photoKey = (await putObject(newStorageKey(`repairs/${repair.id}`), png, 'image/png')).key;
    await db().insert(attachments).values({
      clientId: org.client.id,
      repairId: repair.id,
      kind: 'photo',
      storageKey: photoKey,
      fileName: 'module.png',
      contentType: 'image/png',
      sizeBytes: png.length,
    });
    const detail = await clientUser.get(`/api/visits/${visit.id}`);
    expect(detail.body.repairs.map((r: { id: string }) => r.id)).toEqual([repair.id]);
    expect(detail.body.photos).toMatchObject([{ fileName: 'module.png', repairId: repair.id }]);

    const badClose = await ada.post(`/api/visits/${visit.id}/close`, { summary: 'Done', checklist: [] });
    expect(badClose.status).toBe(400);
    expect(badClose.body.error.fields).toHaveProperty('signature');
    const notPng = await ada.post(`/api/visits/${visit.id}/close`, {
      summary: 'Done',
      checklist: [],
      signedByName: 'Sam Site',
      signature: `data:image/png;base64,${Buffer.from('GIF89a not a png').toString('base64')}`,
    });
    expect(notPng.status).toBe(400);
    expect(notPng.body.error.fields).toHaveProperty('signature');
    const damaged = Buffer.from(png);
    damaged[damaged.indexOf('IDAT') + 6] ^= 0xff; // inside the zlib stream
    const broken = await ada.post(`/api/visits/${visit.id}/close`, {
      summary: 'Done',
      checklist: [],
      signedByName: 'Sam Site',
      signature: `data:image/png;base64,${damaged.toString('base64')}`,
    });
    expect(broken.status).toBe(400);

    const closed = await ada.post(`/api/visits/${visit.id}/close`, {
      summary: 'Reseated the module at C4·R2; the wall shows a clean test pattern.',
      checklist: [
        { label: 'Isolate the supply', done: true },
        { label: 'Client shown the result', done: false, note: 'Manager away' },
      ],
      signedByName: 'Sam Site',
      signature,
    });
    expect(closed.status, JSON.stringify(closed.body)).toBe(200);
    expect(closed.body).toMatchObject({
      status: 'completed',
      signedByName: 'Sam Site',
      unsignedReason: null,
      reportUrl: `/api/visits/${visit.id}/report.pdf`,
      can: { edit: false, work: false },
    });
    expect(closed.body.completedAt).not.toBeNull();
    expect(closed.body.signedAt).not.toBeNull();
    expect(closed.body.reportSentAt).not.toBeNull();
    const [row] = await db().select().from(visits).where(eq(visits.id, visit.id));
    expect(s3.current.keys('gridkeep-test')).toEqual(expect.arrayContaining([row.signatureKey, row.reportKey]));

    expect((await ada.post(`/api/visits/${visit.id}/close`, { summary: 'again', checklist: [], unsignedReason: 'x' })).status).toBe(409);
    const move = await office.patch(`/api/visits/${visit.id}`, {
      windowStart: at(Date.now() + DAY),
      windowEnd: at(Date.now() + DAY + HOUR),
    });
    expect(move.status).toBe(409);
    expect(move.body.error.message).toMatch(/completed visit cannot be moved/);

    // The client downloads the kept report.
    const pdf = await clientUser
      .get(`/api/visits/${visit.id}/report.pdf`)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    // The ticket's reference with a dash for its slash, which a file name cannot hold: "… 12-26.pdf" for 12/26.
    expect(pdf.headers['content-disposition']).toMatch(
      new RegExp(`^attachment; filename="Visit report \\d{4}-\\d{2}-\\d{2} .+ ${t.ref.replace('/', '-')}\\.pdf"`),
    );
    expect(t.ref).toMatch(/^\d+\/\d{2}$/);
    // ISO 32000-1 §7.5.2: a PDF file begins with "%PDF-".
    const body = pdf.body as Buffer;
    expect(body.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // The signature and the repair photo are embedded as images (ISO 32000-1 §8.9.5: /Subtype /Image).
    expect(body.toString('latin1').match(/\/Subtype \/Image/g)?.length).toBeGreaterThanOrEqual(2);

    // The report mail reaches the client's people with the PDF attached.
    const [reportMail] = await db()
      .select()
      .from(outboundMail)
      .where(eq(outboundMail.dedupeKey, `visit-report:${visit.id}`));
    expect(reportMail.to.sort()).toEqual([clientUser.user.email, 'site.manager@client.test'].sort());
    expect(reportMail.attachments).toEqual([expect.objectContaining({ contentType: 'application/pdf', storageKey: row.reportKey })]);
    const delivered = (await deliver()).filter((m) => m.mail.subject?.startsWith('Visit report') && m.mail.text?.includes(t.ref));
    expect(delivered).toHaveLength(1);
    const attached = delivered[0].mail.attachments.find((a) => a.contentType === 'application/pdf')!;
    expect(attached.filename).toMatch(/^Visit report .+\.pdf$/);
    expect(attached.content.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(attached.content.equals(body)).toBe(true);
    expect(delivered[0].mail.text).not.toContain('INTERNAL');
  });

  it('makes, keeps and returns the report of a completed visit that has none (the demo’s)', async () => {
    const ada = await technician('Ada Demo');
    const [v] = await db()
      .insert(visits)
      .values({
        clientId: org.client.id,
        siteId: org.site.id,
        wallId: org.wall!.id,
        kind: 'maintenance',
        status: 'completed',
        windowStart: new Date(Date.now() - 30 * DAY),
        windowEnd: new Date(Date.now() - 30 * DAY + 2 * HOUR),
        startedAt: new Date(Date.now() - 30 * DAY),
        completedAt: new Date(Date.now() - 30 * DAY + HOUR),
        summary: 'Cleaned and checked.',
        signedByName: 'Sam Site',
        signedAt: new Date(Date.now() - 30 * DAY + HOUR),
      })
      .returning();
    await db().insert(visitTechnicians).values({ visitId: v.id, userId: ada.user.id });
    const res = await office.get(`/api/visits/${v.id}/report.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const [kept] = await db().select().from(visits).where(eq(visits.id, v.id));
    expect(kept.reportKey).not.toBeNull();
    expect(s3.current.keys('gridkeep-test')).toContain(kept.reportKey);
    const again = await office.get(`/api/visits/${v.id}/report.pdf`);
    expect(again.status).toBe(200);
    expect((await db().select().from(visits).where(eq(visits.id, v.id)))[0].reportKey).toBe(kept.reportKey);
    // A visit that is not completed has no report yet.
    const t = await openTicket();
    const planned = await book(t.id, [ada.user.id], Date.now() + 9 * DAY);
    expect((await office.get(`/api/visits/${planned.id}/report.pdf`)).status).toBe(404);
  });

  it('a maintenance visit starts from its plan’s checklist and, closed, moves the plan on', async () => {
    const ada = await technician('Ada Plan');
    const [plan] = await db()
      .insert(maintenancePlans)
      .values({ wallId: org.wall!.id, intervalMonths: 6, checklist: ['Clean the face', 'Check fans'], nextDueOn: '2026-01-01' })
      .returning();
    const res = await office.post('/api/visits', {
      kind: 'maintenance',
      wallId: org.wall!.id,
      windowStart: at(Date.now() - HOUR),
      windowEnd: at(Date.now() + HOUR),
      technicianIds: [ada.user.id],
    });
    expect(res.status).toBe(201);
    expect(res.body.ticket).toBeNull();
    expect(res.body.checklist).toEqual([
      { label: 'Clean the face', done: false },
      { label: 'Check fans', done: false },
    ]);
    const closed = await ada.post(`/api/visits/${res.body.id}/close`, {
      summary: 'Cleaned.',
      checklist: res.body.checklist,
      unsignedReason: 'No one on site after hours',
    });
    expect(closed.status).toBe(200);
    expect(closed.body).toMatchObject({ status: 'completed', signedAt: null, unsignedReason: 'No one on site after hours' });
    const [after] = await db().select().from(maintenancePlans).where(eq(maintenancePlans.id, plan.id));
    const today = new Intl.DateTimeFormat('en-CA', { timeZone: 'America/Chicago' }).format(new Date());
    expect(after.lastDoneOn).toBe(today);
    expect(after.nextDueOn).toBe(addMonths(today, 6));
    await db()
      .delete(maintenancePlans)
      .where(and(eq(maintenancePlans.id, plan.id)));
  });

  it('adds months to a date the calendar way (day clamped to the month’s end)', () => {
    expect(addMonths('2026-08-31', 6)).toBe('2027-02-28');
    expect(addMonths('2027-08-31', 6)).toBe('2028-02-29');
    expect(addMonths('2026-01-15', 12)).toBe('2027-01-15');
    expect(addMonths('2026-11-30', 3)).toBe('2027-02-28');
  });

  it('keeps report text to what the PDF standard fonts draw (WinAnsi, ISO 32000-1 Annex D.2)', () => {
    expect(winAnsi('C4·R2 — the wall’s batch, 5 €, Ørsted')).toBe('C4·R2 — the wall’s batch, 5 €, Ørsted');
    expect(winAnsi('Łódź → Kraków ≥ 2 中')).toBe('Lódz -> Kraków >= 2 ?');
  });
});
