// The demo data, written into a database of its own and checked for the invariants the product
// relies on: a complete installed base, working demo accounts, and a stock ledger that adds up.
import argon2 from 'argon2';
import { sql } from 'drizzle-orm';
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ticketPriorities, ticketStatuses } from '../../shared/schemas/enums.js';
import * as schema from '../../server/db/schema/index.js';
import { DEMO_PASSWORD, seedIfEmpty } from '../../server/db/seed.js';
import { buildDemo } from '../../server/db/seed/build.js';
import { planWall } from '../../shared/calc/wall-plan.js';
import { cabinetSpecOf } from '../../shared/schemas/wall-plan.js';
import { createIsolatedDatabase } from '../setup/isolated-database.js';

let database: Awaited<ReturnType<typeof createIsolatedDatabase>>;
let pool: pg.Pool;
let db: NodePgDatabase<typeof schema>;
let seeded: boolean;

async function rows<T>(query: ReturnType<typeof sql>): Promise<T[]> {
  return (await db.execute(query)).rows as T[];
}

beforeAll(async () => {
  database = await createIsolatedDatabase('gridkeep_seed');
  pool = new pg.Pool({ connectionString: database.url, max: 4 });
  db = drizzle(pool, { schema, casing: 'snake_case' });
  seeded = await seedIfEmpty(db);
});

afterAll(async () => {
  await pool?.end();
  await database?.drop();
});

describe('demo data', () => {
  it('seeds an empty database', () => {
    expect(seeded).toBe(true);
  });

  it('is the same on every run for the same moment', () => {
    const now = new Date('2026-03-04T15:00:00Z');
    expect(buildDemo(now, 'hash')).toEqual(buildDemo(now, 'hash'));
  });

  it('has at least four client organisations, each with a plan, notes and contacts at .test domains', async () => {
    const clients = await db.select().from(schema.clients);
    expect(clients.length).toBeGreaterThanOrEqual(4);
    const contacts = await db.select().from(schema.contacts);
    for (const c of clients) {
      expect(c.servicePlanId).not.toBeNull();
      expect(c.notes.length).toBeGreaterThan(0);
      const own = contacts.filter((x) => x.clientId === c.id && x.siteId === null);
      expect(own.length).toBeGreaterThan(0);
      // RFC 2606 reserves .test, so no demo address can reach a real mailbox.
      for (const x of own) expect(x.email).toMatch(/^[^@\s]+@[a-z0-9.-]+\.test$/);
    }
  });

  it('has at least three service plans with targets for every priority', async () => {
    const plans = await db.select().from(schema.servicePlans);
    expect(plans.length).toBeGreaterThanOrEqual(3);
    expect(new Set(plans.map((p) => p.clockMode))).toEqual(new Set(['business', 'round_the_clock']));
    for (const p of plans) {
      for (const priority of ticketPriorities) {
        const t = p.targets[priority];
        expect(t.responseHours).toBeGreaterThan(0);
        expect(t.resolutionHours).toBeGreaterThan(t.responseHours);
      }
    }
  });

  it('has at least eight sites with addresses, access notes and valid IANA time zones beyond America/Chicago', async () => {
    const sites = await db.select().from(schema.sites);
    expect(sites.length).toBeGreaterThanOrEqual(8);
    for (const s of sites) {
      expect(s.address).not.toBe('');
      expect(s.accessNotes).not.toBe('');
      // Intl rejects names that are not in the IANA time zone database.
      expect(() => new Intl.DateTimeFormat('en-US', { timeZone: s.timeZone })).not.toThrow();
    }
    const zones = new Set(sites.map((s) => s.timeZone));
    expect(zones.size).toBeGreaterThanOrEqual(3);
    expect([...zones].some((z) => z !== 'America/Chicago')).toBe(true);
    const siteContacts = await db
      .select()
      .from(schema.contacts)
      .where(sql`${schema.contacts.siteId} is not null`);
    expect(new Set(siteContacts.map((c) => c.siteId)).size).toBe(sites.length);
  });

  it('has cabinet models whose pixel counts follow from size and pitch', async () => {
    const models = await db.select().from(schema.cabinetModels);
    expect(models.length).toBeGreaterThanOrEqual(4);
    for (const m of models) {
      // Pixel pitch is the centre-to-centre distance of pixels, so pixels across = size / pitch
      // (definition of pixel pitch; common practice for LED cabinets).
      expect(m.pixelsWide).toBe(Math.round(m.widthMm / m.pixelPitchMm));
      expect(m.pixelsHigh).toBe(Math.round(m.heightMm / m.pixelPitchMm));
      expect(m.typicalPowerW).toBeLessThan(m.maxPowerW);
    }
    const sizes = new Set(models.map((m) => `${m.widthMm}x${m.heightMm}`));
    for (const size of ['500x500', '500x1000', '600x337.5']) expect(sizes).toContain(size);
    expect(models.some((m) => m.environment === 'outdoor')).toBe(true);
  });

  it('has twelve walls, one of them the 12 × 6 main hall centre wall of 500 mm cabinets', async () => {
    const walls = await db
      .select({ wall: schema.walls, model: schema.cabinetModels })
      .from(schema.walls)
      .innerJoin(schema.cabinetModels, sql`${schema.cabinetModels.id} = ${schema.walls.cabinetModelId}`);
    expect(walls).toHaveLength(12);
    const centre = walls.filter(
      ({ wall, model }) => wall.columns === 12 && wall.rows === 6 && model.widthMm === 500 && model.heightMm === 500,
    );
    expect(centre).toHaveLength(1);
    expect(centre[0].wall.name).toBe('Main hall centre wall');
    expect(new Set(walls.map(({ wall }) => wall.mounting)).size).toBeGreaterThanOrEqual(3);
    expect(new Set(walls.map(({ wall }) => wall.cabinetModelId)).size).toBeGreaterThanOrEqual(4);
    const controllers = await db.select().from(schema.controllers);
    for (const { wall, model } of walls) {
      const c = controllers.find((x) => x.wallId === wall.id);
      expect(c, wall.name).toBeDefined();
      const pixels = wall.columns * wall.rows * model.pixelsWide * model.pixelsHigh;
      expect(c!.outputsInUse * c!.pixelsPerOutput).toBeGreaterThanOrEqual(pixels);
      expect(c!.outputsInUse, wall.name).toBeLessThanOrEqual(c!.outputs);
    }
  });

  it('wires the main hall centre wall as the trade does: six data lines and six power chains, one per row (common practice, stated by a practitioner)', async () => {
    const [{ wall, model }] = await db
      .select({ wall: schema.walls, model: schema.cabinetModels })
      .from(schema.walls)
      .innerJoin(schema.cabinetModels, sql`${schema.cabinetModels.id} = ${schema.walls.cabinetModelId}`)
      .where(sql`${schema.walls.name} = 'Main hall centre wall'`);
    // Its internal note names power chain 4 for row 4.
    expect(wall.internalNotes).toContain('Row 4 is fed by power chain 4');
    const rowsOf = (runs: { runs: { index: number; cells: { row: number }[] }[] } | null) =>
      runs?.runs.map((r) => ({ index: r.index, rows: [...new Set(r.cells.map((c) => c.row))], cabinets: r.cells.length }));
    const oneRowEach = [1, 2, 3, 4, 5, 6].map((r) => ({ index: r, rows: [r], cabinets: 12 }));
    expect(rowsOf(wall.dataRuns)).toEqual(oneRowEach);
    expect(rowsOf(wall.powerRuns)).toEqual(oneRowEach);
    // The planner agrees on the stored supply: 208 V line-to-line chains of at most 12 cabinets (the
    // maker's limit, 2,160 W), six circuits, two on each phase pair, one per row.
    const plan = planWall({
      cabinet: cabinetSpecOf(model),
      columns: wall.columns,
      rows: wall.rows,
      supply: wall.planSettings!.supply,
      outputCapacityPixels: wall.planSettings!.outputCapacityPixels,
    });
    expect(plan.outputsNeeded).toBe(6);
    expect(plan.circuitsNeeded).toBe(6);
    expect(plan.chainLimitedBy).toBe('maker');
    expect(plan.circuits.map((c) => c.phase)).toEqual(['A-B', 'B-C', 'C-A', 'A-B', 'B-C', 'C-A']);
    expect(wall.planSettings!.chainCapacityW).toBe(2160);
  });

  it('fills every grid position of every wall with a cabinet that has a serial, a batch and a placed event', async () => {
    const walls = await db.select().from(schema.walls);
    const cabinets = await db.select().from(schema.cabinets);
    const placed = new Set(
      (
        await db
          .select()
          .from(schema.cabinetEvents)
          .where(sql`${schema.cabinetEvents.kind} = 'placed'`)
      ).map((e) => e.cabinetId),
    );
    for (const c of cabinets) {
      expect(c.serial.trim()).not.toBe('');
      expect(c.batch.trim()).not.toBe('');
    }
    for (const w of walls) {
      const own = cabinets.filter((c) => c.wallId === w.id);
      expect(own, w.name).toHaveLength(w.columns * w.rows);
      expect(new Set(own.map((c) => `${c.column}|${c.row}`)).size).toBe(w.columns * w.rows);
      expect(own.every((c) => c.status === 'installed' && placed.has(c.id))).toBe(true);
      const batches = new Set(own.map((c) => c.batch));
      expect(batches.size, w.name).toBeGreaterThanOrEqual(3); // two or three originals plus a later one
      expect(batches.size, w.name).toBeLessThanOrEqual(4);
    }
    expect(cabinets.filter((c) => c.status === 'spare').every((c) => c.stockLocationId !== null)).toBe(true);
    expect(cabinets.filter((c) => c.status === 'spare').length).toBeGreaterThanOrEqual(2);
    expect(cabinets.filter((c) => c.status === 'retired')).toHaveLength(1);
  });

  it('has the demo accounts with their roles, one shared password hash that verifies, and a client user per client', async () => {
    const users = await db.select().from(schema.users);
    const byEmail = new Map(users.map((u) => [u.email, u]));
    expect(byEmail.get('admin@gridkeep.test')?.role).toBe('admin');
    expect(byEmail.get('office@gridkeep.test')?.role).toBe('coordinator');
    expect(byEmail.get('tech@gridkeep.test')?.role).toBe('technician');
    expect(byEmail.get('tech2@gridkeep.test')?.role).toBe('technician');
    for (const u of users) expect(u.email).toBe(u.email.toLowerCase());
    const hashes = new Set(users.map((u) => u.passwordHash));
    expect(hashes.size).toBe(1);
    const [hash] = [...hashes];
    expect(hash).toMatch(/^\$argon2id\$/);
    expect(await argon2.verify(hash!, DEMO_PASSWORD)).toBe(true);
    expect(await argon2.verify(hash!, 'not-the-password')).toBe(false);
    const clients = await db.select().from(schema.clients);
    for (const c of clients) {
      expect(
        users.some((u) => u.role === 'client' && u.clientId === c.id),
        c.name,
      ).toBe(true);
    }
  });

  it('keeps stock balances equal to the ledger sums per part, batch and location', async () => {
    const mismatches = await rows(sql`
      with ledger as (
        select part_id, batch, location_id, sum(delta)::int as quantity from (
          select part_id, batch, to_location_id as location_id, quantity as delta from stock_movements where to_location_id is not null
          union all
          select part_id, batch, from_location_id, -quantity from stock_movements where from_location_id is not null
        ) m group by 1, 2, 3
      )
      select l.part_id, l.batch, l.location_id, l.quantity as ledger, b.quantity as balance
      from ledger l
      full join stock_balances b on b.part_id = l.part_id and b.batch = l.batch and b.location_id = l.location_id
      where coalesce(l.quantity, 0) <> coalesce(b.quantity, 0)`);
    expect(mismatches).toEqual([]);
    const [{ total }] = await rows<{ total: number }>(sql`select coalesce(sum(quantity), 0)::int as total from stock_balances`);
    expect(total).toBeGreaterThan(50);
  });

  it('never lets the ledger go below zero at any point in its history', async () => {
    const [{ lowest, moves }] = await rows<{ lowest: number; moves: number }>(sql`
      with deltas as (
        select id, created_at, part_id, batch, to_location_id as location_id, quantity as delta from stock_movements where to_location_id is not null
        union all
        select id, created_at, part_id, batch, from_location_id, -quantity from stock_movements where from_location_id is not null
      ), running as (
        select sum(delta) over (partition by part_id, batch, location_id order by created_at, id, delta desc rows unbounded preceding) as on_hand
        from deltas
      )
      select min(on_hand)::int as lowest, count(*)::int as moves from running`);
    expect(moves).toBeGreaterThan(50);
    expect(lowest).toBeGreaterThanOrEqual(0);
    const kinds = await rows<{ kind: string }>(sql`select distinct kind::text as kind from stock_movements`);
    expect(new Set(kinds.map((k) => k.kind))).toEqual(
      new Set(['receipt', 'transfer', 'consumption', 'return_from_wall', 'sent_to_vendor', 'back_from_vendor', 'adjustment']),
    );
  });

  it('books one consumption per repair that used a part, from the same part, batch and location', async () => {
    const repairs = await db.select().from(schema.repairs);
    const moves = await db
      .select()
      .from(schema.stockMovements)
      .where(sql`${schema.stockMovements.kind} = 'consumption'`);
    const withPart = repairs.filter((r) => r.partId);
    expect(withPart.length).toBeGreaterThanOrEqual(20);
    expect(moves).toHaveLength(withPart.length);
    for (const r of withPart) {
      const m = moves.filter((x) => x.repairId === r.id);
      expect(m).toHaveLength(1);
      expect(m[0]).toMatchObject({ partId: r.partId, batch: r.partBatch ?? '', fromLocationId: r.fromLocationId, quantity: 1 });
    }
    const repaired = await db
      .select()
      .from(schema.cabinetEvents)
      .where(sql`${schema.cabinetEvents.kind} = 'repaired'`);
    expect(repaired.length).toBeGreaterThanOrEqual(repairs.length - 1); // the cabinet swap is logged as removed + placed
  });

  it('has a position on one wall that keeps failing', async () => {
    const repeats = await rows<{ n: number }>(sql`
      select count(*)::int as n from repairs group by wall_id, "column", "row" having count(*) >= 3`);
    expect(repeats.length).toBeGreaterThanOrEqual(1);
  });

  it('has tickets in every status and priority, with timestamps that fit the status', async () => {
    const tickets = await db.select().from(schema.tickets);
    expect(tickets.length).toBeGreaterThanOrEqual(35);
    expect(new Set(tickets.map((t) => t.status))).toEqual(new Set(ticketStatuses));
    expect(new Set(tickets.map((t) => t.priority))).toEqual(new Set(ticketPriorities));
    const now = Date.now();
    for (const t of tickets) {
      expect(t.createdAt.getTime()).toBeLessThanOrEqual(now);
      expect(t.responseDueAt!.getTime()).toBeGreaterThan(t.createdAt.getTime());
      expect(t.resolutionDueAt!.getTime()).toBeGreaterThanOrEqual(t.responseDueAt!.getTime());
      expect(t.acknowledgedAt === null).toBe(t.status === 'new');
      expect(t.resolvedAt !== null).toBe(t.status === 'resolved' || t.status === 'closed');
      expect(t.closedAt !== null).toBe(t.status === 'closed');
      expect(t.pausedAt !== null).toBe(t.status === 'waiting_client');
      if (t.acknowledgedAt) expect(t.acknowledgedAt.getTime()).toBeGreaterThan(t.createdAt.getTime());
      if (t.resolvedAt) expect(t.resolvedAt.getTime()).toBeGreaterThan(t.acknowledgedAt!.getTime());
      if (t.closedAt) expect(t.closedAt.getTime()).toBeGreaterThan(t.resolvedAt!.getTime());
      if (t.closedAt) expect(t.closedAt.getTime()).toBeLessThan(now);
    }
    const comments = await db.select().from(schema.ticketComments);
    expect(new Set(comments.map((c) => c.visibility))).toEqual(new Set(['public', 'internal']));
    // Nobody goes out to a call before it was taken.
    const early = await rows<{ number: number }>(sql`
      select t.number from visits v join tickets t on t.id = v.ticket_id where v.window_start < t.acknowledged_at`);
    expect(early).toEqual([]);
  });

  it('has an audit trail that tells the same story as the tickets and the cabinet histories', async () => {
    // Every ticket's last recorded status is its status; every placed or moved cabinet has its entry.
    const last = await rows<{ id: string; status: string; logged: string | null }>(sql`
      select t.id, t.status,
             (select coalesce(a.after ->> 'status', 'new') from audit_events a
               where a.entity = 'ticket' and a.entity_id = t.id::text and a.action in ('created', 'updated')
               order by a.created_at desc, a.id desc limit 1) as logged
        from tickets t`);
    expect(last.length).toBeGreaterThan(0);
    for (const t of last) expect(t.logged, `ticket ${t.id}`).toBe(t.status);
    const [counts] = await rows<{ comments: number; logged: number; moves: number; movesLogged: number; unknownActors: number }>(sql`
      select (select count(*)::int from ticket_comments) as comments,
             (select count(*)::int from audit_events where action like 'comment_%') as logged,
             (select count(*)::int from cabinet_events where kind in ('placed', 'imported', 'moved', 'removed', 'swapped')) as moves,
             (select count(*)::int from audit_events where entity = 'cabinet' and action in ('placed', 'moved', 'swapped')) as "movesLogged",
             (select count(*)::int from audit_events a where a.actor_id is not null and not exists (select 1 from users u where u.id = a.actor_id)) as "unknownActors"`);
    expect(counts.logged).toBe(counts.comments);
    expect(counts.movesLogged).toBe(counts.moves);
    expect(counts.unknownActors).toBe(0);
  });

  it('plans visits this week and next for both technicians, and keeps completed visits signed off', async () => {
    const techs = await db
      .select()
      .from(schema.users)
      .where(sql`${schema.users.role} = 'technician'`);
    const planned = await rows<{ user_id: string; window_start: Date }>(sql`
      select vt.user_id, v.window_start from visits v join visit_technicians vt on vt.visit_id = v.id
      where v.status = 'planned'`);
    const fortnight = Date.now() + 15 * 24 * 3_600_000;
    for (const t of techs) {
      const own = planned.filter((p) => p.user_id === t.id);
      expect(own.length, t.email).toBeGreaterThanOrEqual(2);
      expect(own.every((p) => new Date(p.window_start).getTime() > Date.now() - 3_600_000)).toBe(true);
      expect(own.some((p) => new Date(p.window_start).getTime() < fortnight)).toBe(true);
    }
    const completed = await db
      .select()
      .from(schema.visits)
      .where(sql`${schema.visits.status} = 'completed'`);
    expect(completed.length).toBeGreaterThanOrEqual(20);
    for (const v of completed) {
      expect(v.signedAt).not.toBeNull();
      expect(v.summary).not.toBe('');
      expect(v.checklist.length).toBeGreaterThan(0);
    }
    expect(completed.some((v) => v.kind === 'maintenance')).toBe(true);
  });

  it('has maintenance plans for most walls, one of them overdue', async () => {
    const plans = await db.select().from(schema.maintenancePlans);
    expect(plans.length).toBeGreaterThanOrEqual(8);
    const today = new Date().toISOString().slice(0, 10);
    expect(plans.filter((p) => p.nextDueOn < today).length).toBeGreaterThanOrEqual(1);
  });

  it('has vendor returns sent and back, and a reorder point that is already low', async () => {
    const returns = await db.select().from(schema.vendorReturns);
    expect(returns.filter((r) => r.sentOn !== null).length).toBeGreaterThanOrEqual(2);
    expect(returns.filter((r) => r.backInStockOn !== null).length).toBeGreaterThanOrEqual(1);
    const low = await rows(sql`
      select rp.part_id from reorder_points rp
      left join stock_balances b on b.part_id = rp.part_id and b.location_id = rp.location_id
      group by rp.part_id, rp.location_id, rp.min_quantity
      having coalesce(sum(b.quantity), 0) <= rp.min_quantity`);
    expect(low.length).toBeGreaterThanOrEqual(1);
  });

  it('does nothing when seeded a second time', async () => {
    const count = async () =>
      (
        await rows<{ n: number }>(
          sql`select (select count(*) from users) + (select count(*) from cabinets) + (select count(*) from stock_movements) as n`,
        )
      )[0].n;
    const before = await count();
    expect(await seedIfEmpty(db)).toBe(false);
    expect(await count()).toBe(before);
  });
});
