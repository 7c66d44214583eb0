import { randomInt } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { eq } from 'drizzle-orm';
import { tickets } from '../../server/db/schema/tickets.js';
import { cabinets } from '../../server/db/schema/walls.js';
import { anonymous, createOrganisation, signedIn, unique, type Session } from '../factories/index.js';

// The top bar's search box (`GET /api/search`) and the Scan page's lookup by a serial's tail
// (`GET /api/search/serials`). Every code here is random, so rows of other tests never match.

let office: Session;
let tech: Session;
let mine: Awaited<ReturnType<typeof createOrganisation>>;
let theirs: Awaited<ReturnType<typeof createOrganisation>>;
let me: Session;

const digits = (n: number) => Array.from({ length: n }, () => randomInt(10)).join('');
const idsOf = (rows: { id: string }[]) => rows.map((r) => r.id);

beforeAll(async () => {
  [office, tech, mine, theirs] = await Promise.all([
    signedIn('coordinator'),
    signedIn('technician'),
    createOrganisation({ withWall: true }),
    createOrganisation({ withWall: true }),
  ]);
  me = await signedIn('client', mine.client.id);
});

async function openTicket(org: typeof mine, title: string, description = '') {
  const res = await office.post('/api/tickets', {
    siteId: org.site.id,
    wallId: org.wall!.id,
    scope: 'whole_wall',
    priority: 'normal',
    title,
    description,
  });
  expect(res.status).toBe(201);
  return res.body as { id: string; number: number; ref: string; createdAt: string };
}

/** The year a ticket was opened, in UTC: its two last digits are in the reference. */
const openedIn = (t: { createdAt: string }) => String(new Date(t.createdAt).getUTCFullYear());

async function place(org: typeof mine, serial: string, column: number, batch = '') {
  const res = await office.post(`/api/walls/${org.wall!.id}/cabinets`, { serial, column, row: 1, batch });
  expect(res.status).toBe(201);
  return res.body as { id: string; serial: string };
}

describe('the search box', () => {
  it('answers only a signed-in user, and asks for something to search for', async () => {
    expect((await anonymous().get('/api/search?q=wall')).status).toBe(401);
    const empty = await office.get('/api/search?q=%20%20');
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields).toHaveProperty('q');
  });

  it('finds a ticket by its number, written as it is said or typed', async () => {
    const ticket = await openTicket(mine, unique('Dark cabinet'));
    const [n, year] = [ticket.number, openedIn(ticket)];
    expect(ticket.ref).toBe(`${n}/${year.slice(2)}`);
    const forms = [ticket.ref, `${n} / ${year.slice(2)}`, `${n}/${year}`, `${n}-${year.slice(2)}`, `${n}`, `#${n}`];
    // References written before the year was part of them, as e-mails sent then still show them.
    const before = [`GK-${n}`, `gk${n}`, `GK ${n}`];
    for (const q of [...forms, ...before]) {
      const res = await office.get(`/api/search?q=${encodeURIComponent(q)}`);
      expect(res.status).toBe(200);
      expect(res.body.tickets[0], q).toMatchObject({
        id: ticket.id,
        ref: ticket.ref,
        clientName: mine.client.name,
        siteName: mine.site.name,
      });
      expect(res.body.counts.tickets).toBeGreaterThanOrEqual(1);
    }
  });

  it('finds tickets holding every word, in the title or the description, any case', async () => {
    const word = `flick${digits(8)}`;
    const other = `dock${digits(8)}`;
    const ticket = await openTicket(mine, `Left column ${word}s after a power cut`, `Seen from the ${other} side`);
    const both = await office.get(`/api/search?q=${encodeURIComponent(`${word.toUpperCase()} ${other}`)}`);
    expect(idsOf(both.body.tickets)).toEqual([ticket.id]);
    expect(both.body.counts.tickets).toBe(1);
    const missing = await office.get(`/api/search?q=${encodeURIComponent(`${word} nowhere${digits(6)}`)}`);
    expect(missing.body.tickets).toEqual([]);
    expect(missing.body.counts.tickets).toBe(0);
  });

  it('finds serials by any part, the whole serial first and those ending in it next', async () => {
    const tail = digits(9);
    const ends = await place(mine, `LX-${tail}`, 1);
    const inside = await place(mine, `LX-${tail}7`, 2);
    const whole = await place(mine, tail, 3);
    const res = await tech.get(`/api/search?q=${tail}`);
    expect(res.body.cabinets.map((c: { serial: string }) => c.serial)).toEqual([whole.serial, ends.serial, inside.serial]);
    expect(res.body.counts.cabinets).toBe(3);
    expect(res.body.cabinets[1]).toMatchObject({
      wallId: mine.wall!.id,
      wallName: mine.wall!.name,
      siteName: mine.site.name,
      column: 1,
      row: 1,
    });
    // A part from the middle, lower-case as typed on a phone.
    const middle = await tech.get(`/api/search?q=x-${tail.slice(0, 4)}`);
    expect(idsOf(middle.body.cabinets)).toEqual([ends.id, inside.id]);
  });

  it('finds batch codes by any part and counts their cabinets', async () => {
    const code = `PX${digits(8)}`;
    await place(mine, unique('B').toUpperCase(), 4, `${code}-R2`);
    await place(mine, unique('B').toUpperCase(), 5, `${code}-R2`);
    await place(mine, unique('B').toUpperCase(), 6, `${code}-R3`);
    const res = await office.get(`/api/search?q=${encodeURIComponent(code.slice(3).toLowerCase())}`);
    expect(res.body.batches).toEqual([
      { batch: `${code}-R2`, cabinetCount: 2 },
      { batch: `${code}-R3`, cabinetCount: 1 },
    ]);
    expect(res.body.counts.batches).toBe(2);
  });

  it('matches a serial only whole below three characters', async () => {
    await place(mine, `ZZ7${digits(8)}`, 10);
    const res = await office.get('/api/search?q=7');
    expect(res.status).toBe(200);
    expect(res.body.cabinets.every((c: { serial: string }) => c.serial === '7')).toBe(true);
  });

  it("shows a client user their own organisation's tickets only", async () => {
    const word = `strobe${digits(8)}`;
    const own = await openTicket(mine, `Rows ${word} at night`);
    const other = await openTicket(theirs, `Columns ${word} at night`);
    const staff = await office.get(`/api/search?q=${word}`);
    expect(idsOf(staff.body.tickets).sort()).toEqual([own.id, other.id].sort());
    const client = await me.get(`/api/search?q=${word}`);
    expect(idsOf(client.body.tickets)).toEqual([own.id]);
    expect(client.body.counts.tickets).toBe(1);
    const byNumber = await me.get(`/api/search?q=${encodeURIComponent(other.ref)}`);
    expect(byNumber.body.tickets).toEqual([]);
    expect(byNumber.body.counts.tickets).toBe(0);
  });

  it("never shows a client user another organisation's serials or batches", async () => {
    const tail = digits(9);
    await place(theirs, `MK-${tail}`, 1, `QB${tail}`);
    const res = await me.get(`/api/search?q=${tail}`);
    expect(res.body.cabinets).toEqual([]);
    expect(res.body.batches).toEqual([]);
    expect(res.body.counts).toMatchObject({ cabinets: 0, batches: 0 });
    expect((await me.get(`/api/search/serials?tail=${tail}`)).body).toEqual({ items: [], total: 0 });
  });
});

describe('the tickets list and the merge dialog, searched by number', () => {
  it('read a ticket number the same way as the search box', async () => {
    const ticket = await openTicket(mine, unique('Flicker'));
    const [n, year] = [ticket.number, openedIn(ticket)];
    for (const q of [ticket.ref, `${n} / ${year.slice(2)}`, `${n}/${year}`, `${n}`, `#${n}`, `GK-${n}`, `gk${n}`]) {
      // Other tickets may hold these digits in their words; this one holds none of the forms.
      const list = await office.get(`/api/tickets?q=${encodeURIComponent(q)}`);
      expect(list.status).toBe(200);
      expect(list.body.items, q).toContainEqual(expect.objectContaining({ id: ticket.id, ref: ticket.ref }));
      // The merge dialog asks for the client's open tickets with the same `q`.
      const candidates = await office.get(`/api/tickets?clientId=${mine.client.id}&open=true&sort=updatedAt&q=${encodeURIComponent(q)}`);
      expect(idsOf(candidates.body.items), q).toContain(ticket.id);
    }
  });

  it('writes the year the ticket was opened, not the year it is read in', async () => {
    const ticket = await openTicket(mine, unique('Old case'));
    // Opened half an hour before midnight UTC on New Year's Eve: a ticket of the old year.
    await db()
      .update(tickets)
      .set({ createdAt: new Date('2025-12-31T23:30:00Z') })
      .where(eq(tickets.id, ticket.id));
    const ref = `${ticket.number}/25`;
    expect((await office.get(`/api/tickets/${ticket.id}`)).body.ref).toBe(ref);
    const list = await office.get(`/api/tickets?q=${encodeURIComponent(ref)}`);
    expect(list.body.items).toContainEqual(expect.objectContaining({ id: ticket.id, ref }));
    const found = await office.get(`/api/search?q=${encodeURIComponent(ref)}`);
    expect(found.body.tickets[0]).toMatchObject({ id: ticket.id, ref });
  });

  it('does not take a number with a year no ticket was opened in for a reference', async () => {
    const ticket = await openTicket(mine, unique('Dim row'));
    const res = await office.get(`/api/tickets?q=${encodeURIComponent(`${ticket.number}/1999`)}`);
    expect(res.status).toBe(200);
    expect(idsOf(res.body.items)).not.toContain(ticket.id);
  });
});

describe('the lookup by the tail of a serial', () => {
  it('answers only a signed-in user, and checks the serial', async () => {
    expect((await anonymous().get('/api/search/serials?tail=00836')).status).toBe(401);
    const bad = await tech.get(`/api/search/serials?tail=${encodeURIComponent('00 836')}`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('tail');
  });

  it('finds the cabinets whose serial ends in what was read off the label', async () => {
    const tail = digits(9);
    const a = await place(mine, `LX-${tail}`, 7);
    const b = await place(mine, `MK-${tail}`, 8);
    await place(mine, `LX-${tail}1`, 9); // holds the digits, but does not end in them
    const several = await tech.get(`/api/search/serials?tail=${tail}`);
    expect(several.status).toBe(200);
    expect(idsOf(several.body.items)).toEqual([a.id, b.id]);
    expect(several.body.total).toBe(2);
    const one = await tech.get(`/api/search/serials?tail=${encodeURIComponent(`mk-${tail}`)}`);
    expect(idsOf(one.body.items)).toEqual([b.id]);
    expect(one.body.items[0]).toMatchObject({ serial: `MK-${tail}`, wallName: mine.wall!.name, column: 8, row: 1, status: 'installed' });
  });

  it('finds a spare in stock for staff', async () => {
    const tail = digits(9);
    const [spare] = await db()
      .insert(cabinets)
      .values({ serial: `SP-${tail}`, cabinetModelId: mine.wall!.cabinetModelId, status: 'spare' })
      .returning();
    const res = await tech.get(`/api/search/serials?tail=${tail}`);
    expect(res.body.items).toEqual([expect.objectContaining({ id: spare.id, wallId: null, column: null, status: 'spare' })]);
  });
});
