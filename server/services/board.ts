// The office's Today board: the walls with open tickets, worst first, with the next visit booked
// for each; the open tickets on no wall; the counts the board's sentence is written from. Three
// queries whatever the number of walls: the open tickets (with their walls, sites and clients),
// the next visit of each of those walls, and those visits' technicians.
import { aliasedTable, and, asc, eq, gt, inArray } from 'drizzle-orm';
import type { BoardCounts, BoardLooseTicket, BoardTicket, BoardVisit, BoardWall, BoardWalls } from '../../shared/schemas/board.js';
import { openStatuses, ticketRef, type TicketClockState } from '../../shared/schemas/tickets.js';
import { db } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { clients, sites } from '../db/schema/clients.js';
import { tickets } from '../db/schema/tickets.js';
import { visits, visitTechnicians } from '../db/schema/visits.js';
import { walls } from '../db/schema/walls.js';
import type { Actor } from '../middleware/auth.js';
import { tenantWhere } from './scope.js';
import { clockStateSql } from './tickets.js';

const assignee = aliasedTable(users, 'assignee');

/** The board's order of clocks: past due first, then close to it, waiting on the client, on track, no target. */
const clockRank = (state: TicketClockState | null): number =>
  state === 'breached' || state === 'missed' ? 0 : state === 'at_risk' ? 1 : state === 'paused' ? 2 : state ? 3 : 4;

/** Soonest first; no due time last. */
const byDue = (a: string | null, b: string | null) => (a === b ? 0 : a === null ? 1 : b === null ? -1 : a < b ? -1 : 1);

const byUrgency = (a: BoardTicket, b: BoardTicket) =>
  clockRank(a.clockState) - clockRank(b.clockState) || byDue(a.dueAt, b.dueAt) || a.createdAt.localeCompare(b.createdAt);

/** Every open ticket the actor may see, with its wall, site and client. */
function openTicketRows(actor: Actor) {
  return db()
    .select({
      id: tickets.id,
      number: tickets.number,
      title: tickets.title,
      status: tickets.status,
      priority: tickets.priority,
      scope: tickets.scope,
      cells: tickets.cells,
      clockState: clockStateSql,
      acknowledgedAt: tickets.acknowledgedAt,
      responseDueAt: tickets.responseDueAt,
      resolutionDueAt: tickets.resolutionDueAt,
      createdAt: tickets.createdAt,
      assigneeId: tickets.assigneeId,
      assigneeName: assignee.name,
      clientId: tickets.clientId,
      clientName: clients.name,
      siteId: tickets.siteId,
      siteName: sites.name,
      siteTimeZone: sites.timeZone,
      wallId: tickets.wallId,
      wallName: walls.name,
      wallColumns: walls.columns,
      wallRows: walls.rows,
    })
    .from(tickets)
    .innerJoin(clients, eq(clients.id, tickets.clientId))
    .innerJoin(sites, eq(sites.id, tickets.siteId))
    .leftJoin(walls, eq(walls.id, tickets.wallId))
    .leftJoin(assignee, eq(assignee.id, tickets.assigneeId))
    .where(and(tenantWhere(actor, tickets.clientId), inArray(tickets.status, openStatuses)));
}

type TicketRow = Awaited<ReturnType<typeof openTicketRows>>[number];

function presentTicket(r: TicketRow): BoardTicket {
  // The response clock runs until someone acknowledges the ticket; the resolution clock after that.
  const response = r.acknowledgedAt === null && r.responseDueAt !== null;
  const due = response ? r.responseDueAt : r.resolutionDueAt;
  return {
    id: r.id,
    ref: ticketRef(r.number, r.createdAt),
    title: r.title,
    status: r.status,
    priority: r.priority,
    scope: r.scope,
    clockState: r.clockState,
    dueAt: due?.toISOString() ?? null,
    dueKind: due ? (response ? 'response' : 'resolution') : null,
    assignee: r.assigneeId ? { id: r.assigneeId, name: r.assigneeName ?? '' } : null,
    cells: r.cells.map((c) => ({ column: c.column, row: c.row })),
    createdAt: r.createdAt.toISOString(),
  };
}

function presentLooseTicket(r: TicketRow): BoardLooseTicket {
  return { ...presentTicket(r), client: { id: r.clientId, name: r.clientName }, site: { id: r.siteId, name: r.siteName } };
}

/** The earliest visit of each wall that is planned or under way and not yet over (cancelled and completed ones are not next). */
async function nextVisits(actor: Actor, wallIds: string[]): Promise<Map<string, BoardVisit>> {
  if (wallIds.length === 0) return new Map();
  const rows = await db()
    .selectDistinctOn([visits.wallId], {
      id: visits.id,
      wallId: visits.wallId,
      ticketId: visits.ticketId,
      status: visits.status,
      windowStart: visits.windowStart,
      windowEnd: visits.windowEnd,
    })
    .from(visits)
    .where(
      and(
        tenantWhere(actor, visits.clientId),
        inArray(visits.wallId, wallIds),
        inArray(visits.status, ['planned', 'in_progress']),
        gt(visits.windowEnd, new Date()),
      ),
    )
    .orderBy(visits.wallId, asc(visits.windowStart), asc(visits.id));
  const crews = new Map<string, { id: string; name: string }[]>();
  if (rows.length > 0) {
    const people = await db()
      .select({ visitId: visitTechnicians.visitId, id: users.id, name: users.name })
      .from(visitTechnicians)
      .innerJoin(users, eq(users.id, visitTechnicians.userId))
      .where(
        inArray(
          visitTechnicians.visitId,
          rows.map((r) => r.id),
        ),
      )
      .orderBy(asc(users.name));
    for (const p of people) crews.set(p.visitId, [...(crews.get(p.visitId) ?? []), { id: p.id, name: p.name }]);
  }
  const next = new Map<string, BoardVisit>();
  for (const r of rows) {
    if (!r.wallId) continue;
    next.set(r.wallId, {
      id: r.id,
      status: r.status,
      windowStart: r.windowStart.toISOString(),
      windowEnd: r.windowEnd.toISOString(),
      ticketId: r.ticketId,
      technicians: crews.get(r.id) ?? [],
    });
  }
  return next;
}

function countOf(rows: TicketRow[], walled: BoardWall[]): BoardCounts {
  const where = (state: TicketClockState) => rows.filter((r) => r.clockState === state).length;
  return {
    open: rows.length,
    breached: where('breached'),
    atRisk: where('at_risk'),
    paused: where('paused'),
    onTrack: where('on_track'),
    waiting: rows.filter((r) => r.status === 'new').length,
    wallsPastOrClose: walled.filter((w) => clockRank(w.clockState) <= 1).length,
  };
}

/** The board: walls with open tickets (worst clock first, then the soonest due), tickets on no wall, the counts. */
export async function boardWalls(actor: Actor): Promise<BoardWalls> {
  const rows = await openTicketRows(actor);
  const byWall = new Map<string, { first: TicketRow; tickets: BoardTicket[] }>();
  const loose: BoardLooseTicket[] = [];
  for (const r of rows) {
    if (!r.wallId) {
      loose.push(presentLooseTicket(r));
      continue;
    }
    const entry = byWall.get(r.wallId) ?? { first: r, tickets: [] };
    entry.tickets.push(presentTicket(r));
    byWall.set(r.wallId, entry);
  }
  const visitOf = await nextVisits(actor, [...byWall.keys()]);
  const wallList = [...byWall.entries()].map(([id, { first: r, tickets: list }]): BoardWall => {
    const sorted = list.sort(byUrgency);
    return {
      id,
      name: r.wallName ?? '',
      columns: r.wallColumns ?? 0,
      rows: r.wallRows ?? 0,
      client: { id: r.clientId, name: r.clientName },
      site: { id: r.siteId, name: r.siteName, timeZone: r.siteTimeZone },
      clockState: sorted[0].clockState,
      tickets: sorted,
      nextVisit: visitOf.get(id) ?? null,
    };
  });
  // The worst wall first: its worst ticket decides (the tickets are sorted), then the wall's name.
  wallList.sort((a, b) => byUrgency(a.tickets[0], b.tickets[0]) || a.name.localeCompare(b.name));
  return { walls: wallList, notOnWall: loose.sort(byUrgency), counts: countOf(rows, wallList) };
}
