import { randomUUID } from 'node:crypto';
import { and, eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { outboundMail } from '../../server/db/schema/mail.js';
import { parts, stockBalances, stockLocations, stockMovements, vendorReturns } from '../../server/db/schema/stock.js';
import { ticketComments, tickets } from '../../server/db/schema/tickets.js';
import { idempotentRequests, repairs, visits, visitTechnicians } from '../../server/db/schema/visits.js';
import { cabinetEvents, cabinets, walls } from '../../server/db/schema/walls.js';
import { ensureBucket } from '../../server/integrations/s3.js';
import { forgetOldKeys } from '../../server/services/idempotency.js';
import { startTestS3, type TestS3 } from '../setup/fakes.js';
import { createCabinetModel, createOrganisation, signedIn, unique, type Session } from '../factories/index.js';

// Logging a repair from the phone: one transaction writes the repair, the spare's stock movement
// (or the cabinet swap), the cabinet's history and the ticket's activity. The Idempotency-Key
// header (IETF httpapi draft "The Idempotency-Key HTTP Header Field") makes a retry harmless.

// A 1×1 PNG (RFC 2083 §3.1 signature 89 50 4E 47 0D 0A 1A 0A): what content sniffing reads.
const png = Buffer.from(
  '89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8cfc0f01f0005000201a5f1e0d10000000049454e44ae426082',
  'hex',
);

let s3: TestS3;

beforeAll(async () => {
  s3 = await startTestS3();
  Object.assign(process.env, s3.env);
  await ensureBucket();
});
afterAll(async () => {
  await s3.dispose();
});

/**
 * A wall of batch B1 cabinets with a dead module at C3·R2, a ticket about it, a technician on an
 * open visit for it, and their van holding three B1 modules and one B2 module.
 */
async function scene() {
  const org = await createOrganisation({ withWall: true });
  const wall = org.wall!;
  const tech = await signedIn('technician');
  const client = await signedIn('client', org.client.id);
  const [cabinet, neighbour] = await db()
    .insert(cabinets)
    .values([
      { serial: unique('CAB').toUpperCase(), cabinetModelId: wall.cabinetModelId, wallId: wall.id, column: 3, row: 2, batch: 'B1' },
      { serial: unique('CAB').toUpperCase(), cabinetModelId: wall.cabinetModelId, wallId: wall.id, column: 4, row: 2, batch: 'B1' },
    ])
    .returning();
  const [part] = await db()
    .insert(parts)
    .values({ sku: unique('MOD'), name: unique('Module'), kind: 'module', cabinetModelId: wall.cabinetModelId })
    .returning();
  const [van] = await db()
    .insert(stockLocations)
    .values({ name: unique('Van'), kind: 'van', holderId: tech.user.id })
    .returning();
  await db()
    .insert(stockBalances)
    .values([
      { partId: part.id, batch: 'B1', locationId: van.id, quantity: 3 },
      { partId: part.id, batch: 'B2', locationId: van.id, quantity: 1 },
    ]);
  const [ticket] = await db()
    .insert(tickets)
    .values({
      clientId: org.client.id,
      siteId: org.site.id,
      wallId: wall.id,
      title: 'Dark module at C3·R2',
      priority: 'high',
      status: 'scheduled',
      cells: [{ column: 3, row: 2 }],
      assigneeId: tech.user.id,
      updatedAt: new Date(Date.now() - 3600_000),
    })
    .returning();
  const [visit] = await db()
    .insert(visits)
    .values({
      clientId: org.client.id,
      siteId: org.site.id,
      wallId: wall.id,
      ticketId: ticket.id,
      kind: 'ticket',
      status: 'in_progress',
      windowStart: new Date(Date.now() - 3600_000),
      windowEnd: new Date(Date.now() + 3 * 3600_000),
    })
    .returning();
  await db().insert(visitTechnicians).values({ visitId: visit.id, userId: tech.user.id });
  /** The module replacement the phone sends. */
  const moduleRepair = (overrides: object = {}) => ({
    cabinetId: cabinet.id,
    component: 'module',
    moduleColumn: 2,
    moduleRow: 1,
    fault: 'dead_module',
    action: 'replaced',
    visitId: visit.id,
    spare: { partId: part.id, batch: 'B1', locationId: van.id },
    removedPartFate: 'to_bench',
    notes: 'Internal: connector pin bent',
    seenAt: { wallId: wall.id, column: 3, row: 2 },
    ...overrides,
  });
  return { ...org, wall, tech, client, cabinet, neighbour, part, van, ticket, visit, moduleRepair };
}

const post = (s: Session, body: object, key: string | null = randomUUID()) => {
  const req = s.agent.post('/api/repairs').set('X-Requested-With', 'gridkeep');
  return (key === null ? req : req.set('Idempotency-Key', key)).send(body);
};

async function onHand(partId: string, locationId: string, batch: string) {
  const [row] = await db()
    .select({ quantity: stockBalances.quantity })
    .from(stockBalances)
    .where(and(eq(stockBalances.partId, partId), eq(stockBalances.locationId, locationId), eq(stockBalances.batch, batch)));
  return row?.quantity ?? 0;
}

const repairsOf = (cabinetId: string) => db().select().from(repairs).where(eq(repairs.cabinetId, cabinetId));
const commentsOf = (ticketId: string) => db().select().from(ticketComments).where(eq(ticketComments.ticketId, ticketId));
const eventsOf = (cabinetId: string) => db().select().from(cabinetEvents).where(eq(cabinetEvents.cabinetId, cabinetId));

describe('POST /api/repairs: one transaction', () => {
  it('writes the repair, takes one spare off the van, adds a repaired event and a public ticket comment', async () => {
    const s = await scene();
    const mailBefore = await db()
      .select({ n: sql<number>`count(*)::int` })
      .from(outboundMail);
    const res = await post(s.tech, s.moduleRepair());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      wallId: s.wall.id,
      cabinetId: s.cabinet.id,
      cabinetSerial: s.cabinet.serial,
      column: 3,
      row: 2,
      position: 'C3·R2',
      component: 'module',
      moduleColumn: 2,
      moduleRow: 1,
      fault: 'dead_module',
      action: 'replaced',
      visitId: s.visit.id,
      // The visit's ticket, though the phone did not name it.
      ticketId: s.ticket.id,
      technicianName: s.tech.user.name,
      part: { id: s.part.id, batch: 'B1' },
      removedPartFate: 'to_bench',
      notes: 'Internal: connector pin bent',
      fromLocation: { id: s.van.id },
      batchMismatch: false,
    });

    expect(await onHand(s.part.id, s.van.id, 'B1')).toBe(2);
    const [movement] = await db().select().from(stockMovements).where(eq(stockMovements.repairId, res.body.id));
    expect(movement).toMatchObject({ kind: 'consumption', quantity: 1, fromLocationId: s.van.id, wallId: s.wall.id });

    const cabinet = await s.tech.get(`/api/cabinets/${s.cabinet.id}`);
    const repaired = cabinet.body.history.filter((e: { kind: string }) => e.kind === 'repaired');
    expect(repaired).toEqual([expect.objectContaining({ repairId: res.body.id, note: 'Module M2·1 replaced (module dark)' })]);

    const comments = await s.client.get(`/api/tickets/${s.ticket.id}/comments`);
    expect(comments.body.items).toHaveLength(1);
    expect(comments.body.items[0]).toMatchObject({ visibility: 'public', author: { name: s.tech.user.name, staff: true } });
    expect(comments.body.items[0].body).toContain('C3·R2');
    expect(comments.body.items[0].body).toContain('Module M2·1 replaced');
    expect(comments.body.items[0].body).not.toContain('pin bent');
    const [ticket] = await db().select().from(tickets).where(eq(tickets.id, s.ticket.id));
    expect(ticket.updatedAt.getTime()).toBeGreaterThan(s.ticket.updatedAt.getTime());
    // The visit report tells the client; the repair itself queues no mail.
    const mailAfter = await db()
      .select({ n: sql<number>`count(*)::int` })
      .from(outboundMail);
    expect(mailAfter[0].n).toBe(mailBefore[0].n);

    const listed = await s.tech.get(`/api/repairs?ticketId=${s.ticket.id}`);
    expect(listed.body.items.map((r: { id: string }) => r.id)).toEqual([res.body.id]);
    // The client sees the work and the part's batch, not the notes or where the spare came from.
    const theirs = await s.client.get(`/api/repairs?wallId=${s.wall.id}`);
    expect(theirs.status).toBe(200);
    expect(theirs.body.items).toHaveLength(1);
    expect(theirs.body.items[0].part).toMatchObject({ id: s.part.id, batch: 'B1' });
    expect(theirs.body.items[0]).not.toHaveProperty('notes');
    expect(theirs.body.items[0]).not.toHaveProperty('fromLocation');
    expect(theirs.body.items[0]).not.toHaveProperty('batchMismatch');
  });

  it('opens a pending vendor return for the removed part when it goes back to its maker', async () => {
    const s = await scene();
    const res = await post(s.tech, s.moduleRepair({ removedPartFate: 'to_vendor_return' }));
    expect(res.status).toBe(201);
    const returns = await db().select().from(vendorReturns).where(eq(vendorReturns.repairId, res.body.id));
    expect(returns).toEqual([expect.objectContaining({ partId: s.part.id, batch: 'B1', outcome: 'pending', quantity: 1 })]);
  });

  it('writes nothing when a step fails half-way (no spare of that batch left: 409)', async () => {
    const s = await scene();
    await db().update(stockBalances).set({ quantity: 0 }).where(eq(stockBalances.locationId, s.van.id));
    const key = randomUUID();
    const res = await post(s.tech, s.moduleRepair(), key);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('insufficient_stock');
    expect(await repairsOf(s.cabinet.id)).toEqual([]);
    expect(await eventsOf(s.cabinet.id)).toEqual([]);
    expect(await commentsOf(s.ticket.id)).toEqual([]);
    // The key is not spent by a failure: once the van is restocked, the same key logs the repair.
    await db()
      .update(stockBalances)
      .set({ quantity: 1 })
      .where(and(eq(stockBalances.locationId, s.van.id), eq(stockBalances.batch, 'B1')));
    expect((await post(s.tech, s.moduleRepair(), key)).status).toBe(201);
    expect(await repairsOf(s.cabinet.id)).toHaveLength(1);
  });

  it('refuses a spare of another batch than the wall’s with 409 batch_mismatch, and records it when accepted', async () => {
    const s = await scene();
    const other = s.moduleRepair({ spare: { partId: s.part.id, batch: 'B2', locationId: s.van.id } });
    const refused = await post(s.tech, other);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('batch_mismatch');
    expect(await onHand(s.part.id, s.van.id, 'B2')).toBe(1);
    expect(await repairsOf(s.cabinet.id)).toEqual([]);
    const accepted = await post(s.tech, { ...other, acceptBatchMismatch: true });
    expect(accepted.status).toBe(201);
    expect(accepted.body).toMatchObject({ batchMismatch: true, part: { batch: 'B2' } });
    expect(await onHand(s.part.id, s.van.id, 'B2')).toBe(0);
  });

  it('refuses a spare that does not fit the component (400 naming spare.partId)', async () => {
    const s = await scene();
    const res = await post(s.tech, s.moduleRepair({ component: 'power_supply', moduleColumn: undefined, moduleRow: undefined }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['spare.partId']);
    expect(await onHand(s.part.id, s.van.id, 'B1')).toBe(3);
  });
});

describe('POST /api/repairs: Idempotency-Key', () => {
  it('answers the same key again with the first answer and writes nothing; another body with that key is 422', async () => {
    const s = await scene();
    const key = randomUUID();
    const first = await post(s.tech, s.moduleRepair(), key);
    const again = await post(s.tech, s.moduleRepair(), key);
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(await repairsOf(s.cabinet.id)).toHaveLength(1);
    expect(await commentsOf(s.ticket.id)).toHaveLength(1);
    expect(await onHand(s.part.id, s.van.id, 'B1')).toBe(2);

    const reused = await post(s.tech, s.moduleRepair({ notes: 'Another repair' }), key);
    expect(reused.status).toBe(422);
    expect(reused.body.error.code).toBe('idempotency_key_reused');
    expect(await repairsOf(s.cabinet.id)).toHaveLength(1);

    // The key is the sender's own: another person's same key is another request.
    const other = await signedIn('coordinator');
    expect((await post(other, s.moduleRepair({ visitId: undefined }), key)).status).toBe(201);
    expect(await repairsOf(s.cabinet.id)).toHaveLength(2);
  });

  it('writes one repair for two posts with one key sent at the same moment', async () => {
    const s = await scene();
    const key = randomUUID();
    const [a, b] = await Promise.all([post(s.tech, s.moduleRepair(), key), post(s.tech, s.moduleRepair(), key)]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).toBe(b.body.id);
    expect(await repairsOf(s.cabinet.id)).toHaveLength(1);
    expect(await onHand(s.part.id, s.van.id, 'B1')).toBe(2);
    const keys = await db().select().from(idempotentRequests).where(eq(idempotentRequests.key, key));
    expect(keys).toHaveLength(1);
  });

  it('requires the header (400 naming it)', async () => {
    const s = await scene();
    const missing = await post(s.tech, s.moduleRepair(), null);
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toHaveProperty(['Idempotency-Key']);
    const short = await post(s.tech, s.moduleRepair(), 'abc');
    expect(short.status).toBe(400);
    expect(short.body.error.fields).toHaveProperty(['Idempotency-Key']);
    expect(await repairsOf(s.cabinet.id)).toEqual([]);
  });

  it('keeps an answer as long as a queued repair may be retried (35 days), then forgets it', async () => {
    const s = await scene();
    const key = randomUUID();
    expect((await post(s.tech, s.moduleRepair(), key)).status).toBe(201);
    const mine = and(eq(idempotentRequests.userId, s.tech.user.id), eq(idempotentRequests.key, key));
    const day = 24 * 3600_000;
    // 34 days on, a retry still finds its answer; 36 days on, the key is gone.
    await forgetOldKeys(new Date(Date.now() + 34 * day));
    expect(await db().select().from(idempotentRequests).where(mine)).toHaveLength(1);
    await forgetOldKeys(new Date(Date.now() + 36 * day));
    expect(await db().select().from(idempotentRequests).where(mine)).toHaveLength(0);
  });
});

describe('POST /api/repairs: cabinet swap from stock', () => {
  async function spareIn(locationId: string, cabinetModelId: string) {
    const [spare] = await db()
      .insert(cabinets)
      .values({ serial: unique('SPARE').toUpperCase(), cabinetModelId, status: 'spare', stockLocationId: locationId, batch: 'B1' })
      .returning();
    return spare;
  }
  const swap = (s: Awaited<ReturnType<typeof scene>>, replacementCabinetId: string, overrides: object = {}) => ({
    cabinetId: s.cabinet.id,
    component: 'whole_cabinet',
    fault: 'physical_damage',
    action: 'cabinet_swapped',
    visitId: s.visit.id,
    replacementCabinetId,
    removedPartFate: 'to_bench',
    ...overrides,
  });

  it('puts the van’s spare cabinet in the position and sends the removed one to the bench; both histories and serials follow', async () => {
    const s = await scene();
    const spare = await spareIn(s.van.id, s.wall.cabinetModelId);
    const res = await post(s.tech, swap(s, spare.id));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      action: 'cabinet_swapped',
      position: 'C3·R2',
      replacementCabinet: { id: spare.id, serial: spare.serial },
    });

    const [removed] = await db().select().from(cabinets).where(eq(cabinets.id, s.cabinet.id));
    const [placed] = await db().select().from(cabinets).where(eq(cabinets.id, spare.id));
    expect(removed).toMatchObject({ status: 'at_bench', wallId: null, column: null, row: null });
    // The day in the site's time zone (America/Chicago in the factory).
    const today = new Intl.DateTimeFormat('en-CA', { timeZone: 'America/Chicago' }).format(new Date());
    expect(placed).toMatchObject({ status: 'installed', wallId: s.wall.id, column: 3, row: 2, stockLocationId: null, installedOn: today });

    const old = await s.tech.get(`/api/cabinets/by-serial/${s.cabinet.serial}`);
    expect(old.status).toBe(200);
    expect(old.body.history).toEqual([
      expect.objectContaining({
        kind: 'removed',
        otherSerial: spare.serial,
        repairId: res.body.id,
        fromColumn: 3,
        fromRow: 2,
        toStatus: 'at_bench',
      }),
    ]);
    const fresh = await s.client.get(`/api/cabinets/by-serial/${spare.serial}`);
    expect(fresh.status).toBe(200);
    expect(fresh.body).toMatchObject({ wall: { id: s.wall.id }, position: 'C3·R2' });
    expect(fresh.body.history).toEqual([
      expect.objectContaining({ kind: 'placed', otherSerial: s.cabinet.serial, repairId: res.body.id, toColumn: 3, toRow: 2 }),
    ]);
    expect((await s.tech.get(`/api/repairs?cabinetId=${spare.id}`)).body.items.map((r: { id: string }) => r.id)).toEqual([res.body.id]);
  });

  it('retires a scrapped cabinet, and refuses a spare of another model (409) or in another technician’s van (403)', async () => {
    const s = await scene();
    const otherModel = await createCabinetModel();
    const wrong = await spareIn(s.van.id, otherModel.id);
    const refused = await post(s.tech, swap(s, wrong.id));
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('model_mismatch');

    const someoneElse = await signedIn('technician');
    const [theirVan] = await db()
      .insert(stockLocations)
      .values({ name: unique('Van'), kind: 'van', holderId: someoneElse.user.id })
      .returning();
    const notMine = await post(s.tech, swap(s, (await spareIn(theirVan.id, s.wall.cabinetModelId)).id));
    expect(notMine.status).toBe(403);
    const [still] = await db().select().from(cabinets).where(eq(cabinets.id, s.cabinet.id));
    expect(still).toMatchObject({ status: 'installed', column: 3, row: 2 });

    const ok = await post(s.tech, swap(s, (await spareIn(s.van.id, s.wall.cabinetModelId)).id, { removedPartFate: 'scrapped' }));
    expect(ok.status).toBe(201);
    const [retired] = await db().select().from(cabinets).where(eq(cabinets.id, s.cabinet.id));
    expect(retired.status).toBe('retired');
  });
});

describe('POST /api/repairs: conflicts from a queue', () => {
  it('refuses a repair for a cabinet that has moved since the phone saw it (409 cabinet_moved, saying where it is)', async () => {
    const s = await scene();
    await s.tech.post(`/api/cabinets/${s.cabinet.id}/move`, { wallId: s.wall.id, column: 5, row: 1 }).expect(200);
    const res = await post(s.tech, s.moduleRepair());
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('cabinet_moved');
    expect(res.body.error.message).toContain('C5·R1');
    expect(res.body.error.details.now).toEqual({ wallId: s.wall.id, column: 5, row: 1 });
    expect(await repairsOf(s.cabinet.id)).toEqual([]);
    expect(await onHand(s.part.id, s.van.id, 'B1')).toBe(3);

    await s.tech.patch(`/api/cabinets/${s.cabinet.id}`, { status: 'at_bench' }).expect(200);
    const gone = await post(s.tech, s.moduleRepair({ seenAt: { wallId: s.wall.id, column: 5, row: 1 } }));
    expect(gone.status).toBe(409);
    expect(gone.body.error.message).toContain('left the wall');
  });

  it('refuses a visit that is completed (409) and a time in the future (400)', async () => {
    const s = await scene();
    const future = await post(s.tech, s.moduleRepair({ performedAt: new Date(Date.now() + 3600_000).toISOString() }));
    expect(future.status).toBe(400);
    expect(future.body.error.fields).toHaveProperty('performedAt');
    await db().update(visits).set({ status: 'completed', completedAt: new Date() }).where(eq(visits.id, s.visit.id));
    const closed = await post(s.tech, s.moduleRepair());
    expect(closed.status).toBe(409);
    expect(closed.body.error.code).toBe('visit_closed');
    expect(await repairsOf(s.cabinet.id)).toEqual([]);
  });
});

describe('repairs: roles and validation', () => {
  it('answers a client user 404 on POST, a technician not on the visit 403, and another organisation 404', async () => {
    const s = await scene();
    const asClient = await post(s.client, s.moduleRepair());
    expect(asClient.status).toBe(404);
    const stranger = await signedIn('technician');
    const notOnVisit = await post(stranger, s.moduleRepair());
    expect(notOnVisit.status).toBe(403);
    expect(notOnVisit.body.error.code).toBe('not_on_visit');
    expect(await repairsOf(s.cabinet.id)).toEqual([]);

    const logged = await post(s.tech, s.moduleRepair());
    expect(logged.status).toBe(201);
    const other = await createOrganisation();
    const outsider = await signedIn('client', other.client.id);
    expect((await outsider.get(`/api/repairs?wallId=${s.wall.id}`)).body.items).toEqual([]);
    expect((await outsider.get(`/api/repairs/${logged.body.id}/photos`)).status).toBe(404);
    expect((await s.client.get(`/api/repairs/${logged.body.id}/photos`)).status).toBe(200);
  });

  it('answers 400 naming the fields: a module without its position, a replacement without the spare', async () => {
    const s = await scene();
    const noPosition = await post(s.tech, s.moduleRepair({ moduleColumn: undefined }));
    expect(noPosition.status).toBe(400);
    expect(noPosition.body.error.fields).toHaveProperty('moduleColumn');
    const noSpare = await post(s.tech, s.moduleRepair({ spare: undefined }));
    expect(noSpare.status).toBe(400);
    expect(noSpare.body.error.fields).toHaveProperty('spare');
    expect(await repairsOf(s.cabinet.id)).toEqual([]);
  });

  it('refuses a ticket about another wall or another client’s (400 naming ticketId)', async () => {
    const s = await scene();
    const [otherWall] = await db()
      .insert(walls)
      .values({
        clientId: s.wall.clientId,
        siteId: s.site.id,
        name: unique('Wall'),
        cabinetModelId: s.wall.cabinetModelId,
        columns: 4,
        rows: 2,
      })
      .returning();
    const [otherTicket] = await db()
      .insert(tickets)
      .values({ clientId: s.wall.clientId, siteId: s.site.id, wallId: otherWall.id, title: 'Flicker', priority: 'normal' })
      .returning();
    const res = await post(s.tech, s.moduleRepair({ visitId: undefined, ticketId: otherTicket.id }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('ticketId');
    const elsewhere = await scene();
    // A ticket about a whole site names no wall: its client is what tells.
    await db().update(tickets).set({ wallId: null, scope: 'site' }).where(eq(tickets.id, elsewhere.ticket.id));
    const theirs = await post(s.tech, s.moduleRepair({ visitId: undefined, ticketId: elsewhere.ticket.id }));
    expect(theirs.status).toBe(400);
    expect(theirs.body.error.fields).toHaveProperty('ticketId');
    const office = await signedIn('coordinator');
    const otherSite = await post(office, s.moduleRepair({ visitId: elsewhere.visit.id }));
    expect(otherSite.status).toBe(400);
    expect(otherSite.body.error.fields).toHaveProperty('visitId');
    expect(await repairsOf(s.cabinet.id)).toEqual([]);
  });
});

describe('GET /api/repairs and photos', () => {
  it('lists latest first a page at a time, with filters', async () => {
    const s = await scene();
    const hours = [5, 1, 3];
    for (const h of hours) {
      const res = await post(
        s.tech,
        s.moduleRepair({
          action: 'reseated',
          spare: undefined,
          removedPartFate: 'none',
          performedAt: new Date(Date.now() - h * 3600_000).toISOString(),
        }),
      );
      expect(res.status).toBe(201);
    }
    const first = await s.tech.get(`/api/repairs?cabinetId=${s.cabinet.id}&limit=2`);
    const second = await s.tech.get(`/api/repairs?cabinetId=${s.cabinet.id}&limit=2&cursor=${first.body.nextCursor}`);
    const times = [...first.body.items, ...second.body.items].map((r: { performedAt: string }) => Date.parse(r.performedAt));
    expect(times).toHaveLength(3);
    expect([...times].sort((a, b) => b - a)).toEqual(times);
    expect(second.body.nextCursor).toBeNull();
    const from = new Date(Date.now() - 2 * 3600_000).toISOString();
    const recent = await s.tech.get(`/api/repairs?cabinetId=${s.cabinet.id}&from=${encodeURIComponent(from)}`);
    expect(recent.body.items).toHaveLength(1);
  });

  it('attaches a photo to the repair (staff) that the client can see', async () => {
    const s = await scene();
    const logged = await post(s.tech, s.moduleRepair());
    const photo = await s.tech.agent
      .post(`/api/repairs/${logged.body.id}/photos`)
      .set('X-Requested-With', 'gridkeep')
      .attach('file', png, 'after.png');
    expect(photo.status).toBe(201);
    expect(photo.body).toMatchObject({ kind: 'photo', contentType: 'image/png', fileName: 'after.png' });
    const asClient = await s.client.get(`/api/repairs/${logged.body.id}/photos`);
    expect(asClient.body.items.map((a: { id: string }) => a.id)).toEqual([photo.body.id]);
    const clientUpload = await s.client.agent
      .post(`/api/repairs/${logged.body.id}/photos`)
      .set('X-Requested-With', 'gridkeep')
      .attach('file', png, 'mine.png');
    expect(clientUpload.status).toBe(404);
  });
});
