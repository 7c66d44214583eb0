import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { BoardWall, BoardWalls } from '../../shared/schemas/board.js';
import { ticketRef } from '../../shared/schemas/tickets.js';
import { closeDb, db, getPool } from '../../server/db/client.js';
import { tickets } from '../../server/db/schema/tickets.js';
import { visits, visitTechnicians } from '../../server/db/schema/visits.js';
import { walls } from '../../server/db/schema/walls.js';
import { anonymous, createOrganisation, createUser, signedIn, unique, type Session } from '../factories/index.js';
import { createIsolatedDatabase } from '../setup/isolated-database.js';
import { setEnv } from '../setup/fakes.js';

// The office's Today board (`GET /api/board/walls`). The board lists every open ticket the office
// can see, so this file has a database of its own: the order and the counts are then exact.
let database: Awaited<ReturnType<typeof createIsolatedDatabase>>;
let restoreEnv: () => void;
let office: Session;
let org: Awaited<ReturnType<typeof createOrganisation>>;

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const ago = (ms: number) => new Date(Date.now() - ms);
const ahead = (ms: number) => new Date(Date.now() + ms);

beforeAll(async () => {
  database = await createIsolatedDatabase('gridkeep_board');
  restoreEnv = setEnv({ DATABASE_URL: database.url });
  org = await createOrganisation({ withWall: true });
  office = await signedIn('coordinator');
});

afterAll(async () => {
  await closeDb();
  restoreEnv();
  await database.drop();
});

async function addWall(name: string, columns = 6, rows = 4) {
  const [wall] = await db()
    .insert(walls)
    .values({ clientId: org.client.id, siteId: org.site.id, name, cabinetModelId: org.wall!.cabinetModelId, columns, rows })
    .returning();
  return wall;
}

type Clock = 'breached' | 'at_risk' | 'on_track' | 'paused';

/** Opens a ticket through the API, then sets its clock: `due` is its resolution due time. */
async function openTicket(wallId: string | null, clock: Clock, due: Date, extra: object = {}) {
  const res = await office.post('/api/tickets', {
    siteId: org.site.id,
    wallId,
    title: unique('Fault'),
    priority: 'normal',
    ...extra,
  });
  expect(res.status).toBe(201);
  const id = res.body.id as string;
  await db()
    .update(tickets)
    .set({
      acknowledgedAt: new Date(),
      status: clock === 'paused' ? 'waiting_client' : 'acknowledged',
      resolutionDueAt: due,
      resolutionAtRiskAt: clock === 'at_risk' || clock === 'breached' ? ago(HOUR) : ahead(HOUR),
      pausedAt: clock === 'paused' ? ago(HOUR) : null,
    })
    .where(eq(tickets.id, id));
  return res.body as { id: string; number: number; createdAt: string };
}

async function book(wallId: string, start: Date, hours: number, status: 'planned' | 'in_progress' | 'completed' | 'cancelled') {
  const [visit] = await db()
    .insert(visits)
    .values({
      clientId: org.client.id,
      siteId: org.site.id,
      wallId,
      kind: 'maintenance',
      status,
      windowStart: start,
      windowEnd: new Date(start.getTime() + hours * HOUR),
    })
    .returning();
  return visit;
}

const board = async (session: Session = office) => {
  const res = await session.get('/api/board/walls');
  expect(res.status).toBe(200);
  return res.body as BoardWalls;
};
const wallOf = (b: BoardWalls, id: string): BoardWall | undefined => b.walls.find((w) => w.id === id);

describe('who may read the board', () => {
  it('refuses the signed-out caller, a client user (404, as every staff-only area) and a technician (403)', async () => {
    expect((await anonymous().get('/api/board/walls')).status).toBe(401);
    const clientUser = await signedIn('client', org.client.id);
    expect((await clientUser.get('/api/board/walls')).status).toBe(404);
    const tech = await signedIn('technician');
    expect((await tech.get('/api/board/walls')).status).toBe(403);
    const admin = await signedIn('admin');
    expect((await admin.get('/api/board/walls')).status).toBe(200);
  });
});

describe('the walls that need attention', () => {
  let onTrack: typeof walls.$inferSelect;
  let breachedLater: typeof walls.$inferSelect;
  let breachedEarlier: typeof walls.$inferSelect;
  let atRisk: typeof walls.$inferSelect;
  let quiet: typeof walls.$inferSelect;
  let closedOnly: typeof walls.$inferSelect;

  beforeAll(async () => {
    onTrack = await addWall('On track wall');
    breachedLater = await addWall('Breached yesterday wall');
    breachedEarlier = await addWall('Breached last week wall');
    atRisk = await addWall('At risk wall');
    quiet = await addWall('Quiet wall');
    closedOnly = await addWall('Closed ticket wall');
    // Opened first, so the order cannot come from the order of opening.
    await openTicket(onTrack.id, 'on_track', ahead(3 * DAY));
    await openTicket(atRisk.id, 'at_risk', ahead(2 * HOUR));
    await openTicket(breachedLater.id, 'breached', ago(DAY));
    await openTicket(breachedEarlier.id, 'breached', ago(7 * DAY));
    const closed = await openTicket(closedOnly.id, 'breached', ago(9 * DAY));
    await db()
      .update(tickets)
      .set({ status: 'closed', resolvedAt: ago(DAY), closedAt: ago(HOUR) })
      .where(eq(tickets.id, closed.id));
  });

  it('puts past due before close to due before on track, and the older due time first', async () => {
    const ids = (await board()).walls.map((w) => w.id);
    const order = [breachedEarlier, breachedLater, atRisk, onTrack].map((w) => ids.indexOf(w.id));
    expect(order.every((i) => i >= 0)).toBe(true);
    expect(order).toEqual([...order].sort((a, b) => a - b));
    expect(ids[0]).toBe(breachedEarlier.id);
  });

  it('leaves out a wall without open tickets and a wall whose only ticket is closed', async () => {
    const b = await board();
    expect(wallOf(b, quiet.id)).toBeUndefined();
    expect(wallOf(b, closedOnly.id)).toBeUndefined();
    expect(wallOf(b, org.wall!.id)).toBeUndefined();
  });

  it('names each wall’s grid, client and site, and its open tickets with reference, clock, due time and cells', async () => {
    const wall = await addWall('Drawn wall', 8, 3);
    const t = await openTicket(wall.id, 'at_risk', ahead(HOUR), {
      cells: [
        { column: 2, row: 1 },
        { column: 8, row: 3 },
      ],
    });
    const assignee = await createUser({ role: 'technician', name: 'Board Tech' });
    await db().update(tickets).set({ assigneeId: assignee.id }).where(eq(tickets.id, t.id));
    const w = wallOf(await board(), wall.id)!;
    expect(w).toMatchObject({
      name: 'Drawn wall',
      columns: 8,
      rows: 3,
      client: { id: org.client.id, name: org.client.name },
      site: { id: org.site.id, name: org.site.name, timeZone: org.site.timeZone },
      clockState: 'at_risk',
      nextVisit: null,
    });
    expect(w.tickets).toHaveLength(1);
    expect(w.tickets[0]).toMatchObject({
      id: t.id,
      ref: ticketRef(t.number, t.createdAt),
      clockState: 'at_risk',
      dueKind: 'resolution',
      assignee: { id: assignee.id, name: 'Board Tech' },
      cells: [
        { column: 2, row: 1 },
        { column: 8, row: 3 },
      ],
    });
    expect(new Date(w.tickets[0].dueAt!).getTime()).toBeGreaterThan(Date.now());
  });

  it('orders a wall’s own tickets worst first, and the wall takes its worst ticket’s clock', async () => {
    const wall = await addWall('Two ticket wall');
    const fine = await openTicket(wall.id, 'on_track', ahead(DAY));
    const late = await openTicket(wall.id, 'breached', ago(HOUR));
    const w = wallOf(await board(), wall.id)!;
    expect(w.tickets.map((t) => t.id)).toEqual([late.id, fine.id]);
    expect(w.clockState).toBe('breached');
  });

  it('a ticket still waiting for acknowledgement runs to its response due time', async () => {
    const wall = await addWall('Unacknowledged wall');
    const t = await openTicket(wall.id, 'on_track', ahead(5 * DAY));
    const response = ahead(2 * HOUR);
    await db()
      .update(tickets)
      .set({ status: 'new', acknowledgedAt: null, responseDueAt: response, responseAtRiskAt: ahead(HOUR) })
      .where(eq(tickets.id, t.id));
    const line = wallOf(await board(), wall.id)!.tickets[0];
    expect(line.dueKind).toBe('response');
    expect(line.dueAt).toBe(response.toISOString());
  });
});

describe('the next visit of a wall', () => {
  it('is the earliest visit not cancelled, not completed and not over, with its technicians', async () => {
    const wall = await addWall('Visited wall');
    await openTicket(wall.id, 'on_track', ahead(DAY));
    await book(wall.id, ago(3 * DAY), 2, 'planned'); // over
    await book(wall.id, ago(2 * DAY), 2, 'completed'); // done
    await book(wall.id, ahead(HOUR), 2, 'cancelled'); // the earliest ahead, but cancelled
    const later = await book(wall.id, ahead(3 * DAY), 2, 'planned');
    const next = await book(wall.id, ahead(DAY), 3, 'planned');
    const tech = await createUser({ role: 'technician', name: 'Next Visit Tech' });
    await db().insert(visitTechnicians).values({ visitId: next.id, userId: tech.id });
    const w = wallOf(await board(), wall.id)!;
    expect(w.nextVisit).toEqual({
      id: next.id,
      status: 'planned',
      windowStart: next.windowStart.toISOString(),
      windowEnd: next.windowEnd.toISOString(),
      ticketId: null,
      technicians: [{ id: tech.id, name: 'Next Visit Tech' }],
    });
    expect(w.nextVisit!.id).not.toBe(later.id);
  });

  it('is a visit under way now, before one planned later', async () => {
    const wall = await addWall('On site wall');
    await openTicket(wall.id, 'on_track', ahead(DAY));
    await book(wall.id, ahead(DAY), 2, 'planned');
    const now = await book(wall.id, ago(HOUR), 3, 'in_progress');
    expect(wallOf(await board(), wall.id)!.nextVisit).toMatchObject({ id: now.id, status: 'in_progress' });
  });
});

describe('tickets on no wall, and the counts', () => {
  it('lists an open ticket without a wall apart, with its client and site', async () => {
    const t = await openTicket(null, 'on_track', ahead(4 * DAY), { title: 'Quote for a second wall', scope: 'site' });
    const loose = (await board()).notOnWall.find((x) => x.id === t.id);
    expect(loose).toMatchObject({ title: 'Quote for a second wall', client: { id: org.client.id }, site: { id: org.site.id } });
  });

  it('counts the open tickets by clock, the new ones, and the walls past or close to due (closed tickets not counted)', async () => {
    const before = (await board()).counts;
    const wall = await addWall('Counted wall');
    await openTicket(wall.id, 'breached', ago(HOUR));
    await openTicket(wall.id, 'at_risk', ahead(HOUR));
    await openTicket(wall.id, 'paused', ahead(DAY));
    const fresh = await openTicket(null, 'on_track', ahead(DAY));
    await db()
      .update(tickets)
      .set({ status: 'new', acknowledgedAt: null, responseDueAt: ahead(DAY) })
      .where(eq(tickets.id, fresh.id));
    const gone = await openTicket(wall.id, 'breached', ago(DAY));
    await db()
      .update(tickets)
      .set({ status: 'closed', resolvedAt: ago(HOUR), closedAt: ago(HOUR) })
      .where(eq(tickets.id, gone.id));
    const after = (await board()).counts;
    expect(after).toEqual({
      open: before.open + 4,
      breached: before.breached + 1,
      atRisk: before.atRisk + 1,
      paused: before.paused + 1,
      onTrack: before.onTrack + 1,
      waiting: before.waiting + 1,
      wallsPastOrClose: before.wallsPastOrClose + 1,
    });
    // Every open ticket is on a wall of the board or in the group on no wall.
    const b = await board();
    expect(b.walls.reduce((n, w) => n + w.tickets.length, 0) + b.notOnWall.length).toBe(after.open);
  });
});

describe('the cost of the board', () => {
  it('asks the database the same number of times for one wall or many', async () => {
    const spy = vi.spyOn(getPool(), 'query');
    const count = async () => {
      spy.mockClear();
      await board();
      return spy.mock.calls.length;
    };
    const few = await count();
    for (let i = 0; i < 4; i++) {
      const wall = await addWall(unique('Many wall'));
      await openTicket(wall.id, 'on_track', ahead(DAY));
      const visit = await book(wall.id, ahead(DAY), 2, 'planned');
      const tech = await createUser({ role: 'technician' });
      await db().insert(visitTechnicians).values({ visitId: visit.id, userId: tech.id });
    }
    const many = await count();
    spy.mockRestore();
    expect(few).toBeGreaterThan(0);
    expect(many).toBe(few);
  });
});
