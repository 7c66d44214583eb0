import { aliasedTable, and, asc, desc, eq, ilike, inArray, isNull, or, sql, type SQL } from 'drizzle-orm';
import type { CappedList, Page } from '../../shared/schemas/common.js';
import type { Role, TicketPriority, TicketStatus } from '../../shared/schemas/enums.js';
import { ticketNumberIn } from '../../shared/schemas/search.js';
import {
  allowedNextStatuses,
  openClockStates,
  openStatuses,
  ticketRef,
  type CommentInput,
  type CreateTicketInput,
  type ListTicketsQuery,
  type SavedTicketView,
  type SavedViewInput,
  type TicketClockCounts,
  type TicketClockState,
  type TicketComment,
  type TicketDetail,
  type TicketListItem,
  type TicketRepair,
  type TicketVisit,
  type UpdateTicketInput,
} from '../../shared/schemas/tickets.js';
import { cellLabel } from '../../shared/calc/grid.js';
import { db, type DbOrTx, type Tx } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { clients, servicePlans, sites } from '../db/schema/clients.js';
import { savedViews, ticketComments, tickets } from '../db/schema/tickets.js';
import { parts } from '../db/schema/stock.js';
import { repairs, visits } from '../db/schema/visits.js';
import { cabinets, walls } from '../db/schema/walls.js';
import { badRequest, conflict, forbidden } from '../errors.js';
import type { Actor } from '../middleware/auth.js';
import { recordAudit } from './audit.js';
import { cursorValue, likePattern, orderFor } from './clients.js';
import { afterCursor, capped, decodeCursor, pageOf } from './pagination.js';
import { found, isStaff, tenantWhere } from './scope.js';
import { clockStateOf, pausedClockMs, planClock, ticketDueTimes, worstState } from './ticket-clock.js';
import { mailClientUpdate, mailOfficeNewTicket, type TicketForMail } from './ticket-mail.js';
import { bookVisit } from './visits.js';

const assignee = aliasedTable(users, 'assignee');
const reporter = aliasedTable(users, 'reporter');

/**
 * The state of a ticket's running clocks, in SQL so lists can filter on it. The same rules as
 * clockStateOf/worstState in ticket-clock.ts (tests hold the two together).
 */
export const clockStateSql = sql<TicketClockState | null>`case
  when ${tickets.resolutionDueAt} is null then null
  when ${tickets.resolvedAt} is not null then case when ${tickets.resolvedAt} <= ${tickets.resolutionDueAt} then 'met' else 'missed' end
  when (${tickets.pausedAt} is null and ${tickets.resolutionDueAt} < now()) or (${tickets.acknowledgedAt} is null and ${tickets.responseDueAt} < now()) then 'breached'
  when (${tickets.pausedAt} is null and ${tickets.resolutionAtRiskAt} <= now()) or (${tickets.acknowledgedAt} is null and ${tickets.responseAtRiskAt} <= now()) then 'at_risk'
  when ${tickets.pausedAt} is not null then 'paused'
  else 'on_track' end`;

const listColumns = {
  id: tickets.id,
  number: tickets.number,
  title: tickets.title,
  status: tickets.status,
  priority: tickets.priority,
  scope: tickets.scope,
  cells: tickets.cells,
  clientId: tickets.clientId,
  clientName: clients.name,
  siteId: tickets.siteId,
  siteName: sites.name,
  wallId: tickets.wallId,
  wallName: walls.name,
  assigneeId: tickets.assigneeId,
  assigneeName: assignee.name,
  reporterName: reporter.name,
  responseDueAt: tickets.responseDueAt,
  resolutionDueAt: tickets.resolutionDueAt,
  createdAt: tickets.createdAt,
  updatedAt: tickets.updatedAt,
  clockState: clockStateSql,
};

function baseQuery(tx: DbOrTx) {
  return tx
    .select(listColumns)
    .from(tickets)
    .innerJoin(clients, eq(clients.id, tickets.clientId))
    .innerJoin(sites, eq(sites.id, tickets.siteId))
    .leftJoin(walls, eq(walls.id, tickets.wallId))
    .leftJoin(assignee, eq(assignee.id, tickets.assigneeId))
    .leftJoin(reporter, eq(reporter.id, tickets.reporterId));
}

/**
 * The clock filter. A running clock (on track, at risk, breached, paused) is only ever computed
 * for a ticket with a due time and no resolution (the first two arms of clockStateSql); saying
 * so lets the planner read the few such rows from `tickets_running_clock_idx` instead of
 * computing the state of ten years of closed tickets. The rows kept are the same.
 */
function clockFilter(states: TicketClockState[]): SQL | undefined {
  const running = states.every((s) => (openClockStates as readonly string[]).includes(s));
  return and(
    inArray(clockStateSql, states),
    running ? sql`${tickets.resolvedAt} is null and ${tickets.resolutionDueAt} is not null` : undefined,
  );
}

/**
 * One page of the list: the filter, sort and limit on the tickets alone (served by the sort's
 * index), then the names of client, site, wall and people joined to that page's rows only.
 */
function listPage(where: SQL | undefined, sort: ListTicketsQuery['sort'], dir: ListTicketsQuery['dir'], limit: number) {
  const sortColumn = sort === 'resolutionDueAt' ? tickets.resolutionDueAt : sort === 'updatedAt' ? tickets.updatedAt : tickets.createdAt;
  const page = db()
    .select({
      id: tickets.id,
      number: tickets.number,
      title: tickets.title,
      status: tickets.status,
      priority: tickets.priority,
      scope: tickets.scope,
      cells: tickets.cells,
      clientId: tickets.clientId,
      siteId: tickets.siteId,
      wallId: tickets.wallId,
      assigneeId: tickets.assigneeId,
      reporterId: tickets.reporterId,
      responseDueAt: tickets.responseDueAt,
      resolutionDueAt: tickets.resolutionDueAt,
      createdAt: tickets.createdAt,
      updatedAt: tickets.updatedAt,
      clockState: sql<TicketClockState | null>`${clockStateSql}`.as('clock_state'),
    })
    .from(tickets)
    .where(where)
    .orderBy(...orderFor(sortColumn, tickets.id, dir))
    .limit(limit)
    .as('page');
  const pageSort = sort === 'resolutionDueAt' ? page.resolutionDueAt : sort === 'updatedAt' ? page.updatedAt : page.createdAt;
  return db()
    .select({
      id: page.id,
      number: page.number,
      title: page.title,
      status: page.status,
      priority: page.priority,
      scope: page.scope,
      cells: page.cells,
      clientId: page.clientId,
      clientName: clients.name,
      siteId: page.siteId,
      siteName: sites.name,
      wallId: page.wallId,
      wallName: walls.name,
      assigneeId: page.assigneeId,
      assigneeName: assignee.name,
      reporterName: reporter.name,
      responseDueAt: page.responseDueAt,
      resolutionDueAt: page.resolutionDueAt,
      createdAt: page.createdAt,
      updatedAt: page.updatedAt,
      clockState: page.clockState,
    })
    .from(page)
    .innerJoin(clients, eq(clients.id, page.clientId))
    .innerJoin(sites, eq(sites.id, page.siteId))
    .leftJoin(walls, eq(walls.id, page.wallId))
    .leftJoin(assignee, eq(assignee.id, page.assigneeId))
    .leftJoin(reporter, eq(reporter.id, page.reporterId))
    .orderBy(...orderFor(pageSort, page.id, dir));
}

const iso = (d: Date | null) => d?.toISOString() ?? null;

type ListRow = Awaited<ReturnType<ReturnType<typeof baseQuery>['execute']>>[number];

function presentListRow(r: ListRow): TicketListItem {
  return {
    id: r.id,
    number: r.number,
    ref: ticketRef(r.number, r.createdAt),
    title: r.title,
    status: r.status,
    priority: r.priority,
    scope: r.scope,
    cellCount: r.cells.length,
    client: { id: r.clientId, name: r.clientName },
    site: { id: r.siteId, name: r.siteName },
    wall: r.wallId ? { id: r.wallId, name: r.wallName ?? '' } : null,
    assignee: r.assigneeId ? { id: r.assigneeId, name: r.assigneeName ?? '' } : null,
    reporterName: r.reporterName,
    responseDueAt: iso(r.responseDueAt),
    resolutionDueAt: iso(r.resolutionDueAt),
    clockState: r.clockState,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  };
}

/** The list's query for a page, not yet run (the query-plan tests read its plan). */
export function ticketListQuery(actor: Actor, query: ListTicketsQuery) {
  const sortColumn =
    query.sort === 'resolutionDueAt' ? tickets.resolutionDueAt : query.sort === 'updatedAt' ? tickets.updatedAt : tickets.createdAt;
  const pattern = query.q ? likePattern(query.q) : undefined;
  // The same reading of a ticket number as the search box: `1041/26`, `1041`, `#1041`, the old `GK-1041`.
  const number = query.q ? ticketNumberIn(query.q) : null;
  const assigneeFilter =
    query.assigneeId === 'none'
      ? isNull(tickets.assigneeId)
      : query.assigneeId === 'me'
        ? eq(tickets.assigneeId, actor.userId)
        : query.assigneeId
          ? eq(tickets.assigneeId, query.assigneeId)
          : undefined;
  return listPage(
    and(
      tenantWhere(actor, tickets.clientId),
      query.status ? inArray(tickets.status, query.status) : undefined,
      query.open === 'true'
        ? inArray(tickets.status, openStatuses)
        : query.open === 'false'
          ? inArray(tickets.status, ['resolved', 'closed'])
          : undefined,
      query.priority ? inArray(tickets.priority, query.priority) : undefined,
      query.clock ? clockFilter(query.clock) : undefined,
      query.clientId ? eq(tickets.clientId, query.clientId) : undefined,
      query.siteId ? eq(tickets.siteId, query.siteId) : undefined,
      query.wallId ? eq(tickets.wallId, query.wallId) : undefined,
      isStaff(actor) ? assigneeFilter : undefined,
      pattern
        ? or(ilike(tickets.title, pattern), ilike(tickets.description, pattern), number !== null ? eq(tickets.number, number) : undefined)
        : undefined,
      afterCursor(sortColumn, tickets.id, decodeCursor(query.cursor, 2), query.dir),
    ),
    query.sort,
    query.dir,
    query.limit + 1,
  );
}

export async function listTickets(actor: Actor, query: ListTicketsQuery): Promise<Page<TicketListItem>> {
  const rows: ListRow[] = await ticketListQuery(actor, query);
  const key = (r: (typeof rows)[number]) => [
    cursorValue(query.sort === 'resolutionDueAt' ? r.resolutionDueAt : query.sort === 'updatedAt' ? r.updatedAt : r.createdAt),
    r.id,
  ];
  const page = pageOf(rows, query.limit, key);
  return { items: page.items.map(presentListRow), nextCursor: page.nextCursor };
}

/** The ticket row the caller may see, or 404. */
async function visibleTicket(tx: DbOrTx, actor: Actor, id: string, lock = false) {
  const q = tx
    .select()
    .from(tickets)
    .where(and(eq(tickets.id, id), tenantWhere(actor, tickets.clientId)));
  const [row] = lock ? await q.for('update') : await q;
  return found(row, 'Ticket');
}

async function clockFor(tx: DbOrTx, siteId: string) {
  const [row] = await tx
    .select({ timeZone: sites.timeZone, plan: servicePlans })
    .from(sites)
    .innerJoin(clients, eq(clients.id, sites.clientId))
    .leftJoin(servicePlans, eq(servicePlans.id, clients.servicePlanId))
    .where(eq(sites.id, siteId));
  return planClock(row.plan, row.timeZone);
}

/** The work done on the wall for this ticket, oldest first, with what the presenter needs. */
async function repairsOf(ticketId: string) {
  const technician = aliasedTable(users, 'technician');
  return db()
    .select({
      r: repairs,
      cabinetSerial: cabinets.serial,
      technicianName: technician.name,
      partName: parts.name,
    })
    .from(repairs)
    .leftJoin(cabinets, eq(cabinets.id, repairs.cabinetId))
    .leftJoin(technician, eq(technician.id, repairs.technicianId))
    .leftJoin(parts, eq(parts.id, repairs.partId))
    .where(eq(repairs.ticketId, ticketId))
    .orderBy(asc(repairs.performedAt));
}

/**
 * A repair line. Clients see what was done and where; the part taken from stock, what became of
 * the removed one and the technician's notes stay inside.
 */
function presentRepair(
  { r, cabinetSerial, technicianName, partName }: Awaited<ReturnType<typeof repairsOf>>[number],
  staff: boolean,
): TicketRepair {
  return {
    id: r.id,
    column: r.column,
    row: r.row,
    position: cellLabel(r),
    module: r.moduleColumn && r.moduleRow ? { column: r.moduleColumn, row: r.moduleRow } : null,
    component: r.component,
    fault: r.fault,
    action: r.action,
    cabinetSerial,
    technicianName,
    performedAt: r.performedAt.toISOString(),
    ...(staff
      ? { notes: r.notes, part: partName ? { name: partName, batch: r.partBatch } : null, removedPartFate: r.removedPartFate }
      : {}),
  };
}

function presentVisit(v: Pick<typeof visits.$inferSelect, 'id' | 'status' | 'kind' | 'windowStart' | 'windowEnd'>): TicketVisit {
  return { id: v.id, status: v.status, kind: v.kind, windowStart: v.windowStart.toISOString(), windowEnd: v.windowEnd.toISOString() };
}

interface TicketParts {
  row: ListRow;
  ticket: typeof tickets.$inferSelect;
  wall: { id: string; name: string; columns: number; rows: number } | null;
  siteTimeZone: string;
  merged: { id: string; number: number; createdAt: Date } | null;
  visits: TicketVisit[];
  repairs: TicketRepair[];
}

function presentTicket(
  actor: Actor,
  { row, ticket: t, wall, siteTimeZone, merged, visits: ticketVisits, repairs: ticketRepairs }: TicketParts,
): TicketDetail {
  const now = new Date();
  const response = clockStateOf(now, { dueAt: t.responseDueAt, atRiskAt: t.responseAtRiskAt, doneAt: t.acknowledgedAt });
  const resolution = clockStateOf(now, {
    dueAt: t.resolutionDueAt,
    atRiskAt: t.resolutionAtRiskAt,
    doneAt: t.resolvedAt,
    paused: t.pausedAt !== null,
  });
  return {
    ...presentListRow(row),
    description: t.description,
    cells: t.cells,
    cellLabels: t.cells.map(cellLabel),
    /** Due times and visit windows are shown in the site's own time zone. */
    siteTimeZone,
    wall,
    mergedInto: merged ? { id: merged.id, ref: ticketRef(merged.number, merged.createdAt) } : null,
    acknowledgedAt: iso(t.acknowledgedAt),
    resolvedAt: iso(t.resolvedAt),
    closedAt: iso(t.closedAt),
    pausedAt: iso(t.pausedAt),
    clocks: { response, resolution },
    clockState: worstState(response, resolution),
    visits: ticketVisits,
    repairs: ticketRepairs,
    nextStatuses: actor.role === 'client' ? (t.status === 'resolved' ? ['closed'] : []) : allowedNextStatuses(t.status),
  };
}

export async function getTicket(actor: Actor, id: string): Promise<TicketDetail> {
  const t = await visibleTicket(db(), actor, id);
  const [row] = await baseQuery(db()).where(eq(tickets.id, id));
  const wall = t.wallId
    ? (
        await db()
          .select({ id: walls.id, name: walls.name, columns: walls.columns, rows: walls.rows })
          .from(walls)
          .where(eq(walls.id, t.wallId))
      )[0]
    : null;
  const ticketVisits = await db()
    .select({ id: visits.id, status: visits.status, windowStart: visits.windowStart, windowEnd: visits.windowEnd, kind: visits.kind })
    .from(visits)
    .where(eq(visits.ticketId, id))
    .orderBy(asc(visits.windowStart));
  const ticketRepairs = await repairsOf(id);
  const [site] = await db().select({ timeZone: sites.timeZone }).from(sites).where(eq(sites.id, t.siteId));
  const merged = t.mergedIntoId
    ? (
        await db()
          .select({ id: tickets.id, number: tickets.number, createdAt: tickets.createdAt })
          .from(tickets)
          .where(eq(tickets.id, t.mergedIntoId))
      )[0]
    : null;
  return presentTicket(actor, {
    row,
    ticket: t,
    wall,
    siteTimeZone: site.timeZone,
    merged,
    visits: ticketVisits.map(presentVisit),
    repairs: ticketRepairs.map((r) => presentRepair(r, isStaff(actor))),
  });
}

async function forMail(tx: DbOrTx, id: string): Promise<TicketForMail> {
  const [r] = await tx
    .select({
      t: tickets,
      siteName: sites.name,
      wallName: walls.name,
      clientName: clients.name,
    })
    .from(tickets)
    .innerJoin(sites, eq(sites.id, tickets.siteId))
    .innerJoin(clients, eq(clients.id, tickets.clientId))
    .leftJoin(walls, eq(walls.id, tickets.wallId))
    .where(eq(tickets.id, id));
  return { ...r.t, siteName: r.siteName, wallName: r.wallName, clientName: r.clientName };
}

export async function createTicket(actor: Actor, input: CreateTicketInput): Promise<TicketDetail> {
  const id = await db().transaction(async (tx) => {
    const [site] = await tx
      .select({ id: sites.id, clientId: sites.clientId })
      .from(sites)
      .where(and(eq(sites.id, input.siteId), tenantWhere(actor, sites.clientId)));
    if (!site) throw badRequest('validation_failed', 'Choose one of your sites.', { siteId: 'Unknown site.' });
    let cells = input.cells ?? [];
    if (input.wallId) {
      const [wall] = await tx
        .select()
        .from(walls)
        .where(and(eq(walls.id, input.wallId), eq(walls.siteId, site.id)));
      if (!wall) throw badRequest('validation_failed', 'That wall is not at this site.', { wallId: 'Not a wall of this site.' });
      const outside = cells.filter((c) => c.column > wall.columns || c.row > wall.rows);
      if (outside.length) {
        throw badRequest(
          'validation_failed',
          `${outside.map(cellLabel).join(', ')} ${outside.length === 1 ? 'is' : 'are'} outside the wall.`,
          { cells: 'Outside the grid.' },
        );
      }
      const unique = new Map(cells.map((c) => [`${c.column}:${c.row}`, c]));
      cells = [...unique.values()].sort((a, b) => a.row - b.row || a.column - b.column);
    }
    const scope = input.scope ?? (input.wallId ? (cells.length ? 'cells' : 'whole_wall') : 'site');
    const openedAt = new Date();
    const clock = await clockFor(tx, site.id);
    const [row] = await tx
      .insert(tickets)
      .values({
        clientId: site.clientId,
        siteId: site.id,
        wallId: input.wallId ?? null,
        scope,
        cells,
        title: input.title,
        description: input.description ?? '',
        priority: input.priority,
        reporterId: actor.userId,
        createdAt: openedAt,
        ...ticketDueTimes(clock, input.priority, openedAt),
      })
      .returning();
    await recordAudit(tx, { actor, entity: 'ticket', entityId: row.id, action: 'created', after: row });
    await mailOfficeNewTicket(tx, await forMail(tx, row.id), actor.name);
    return row.id;
  });
  return getTicket(actor, id);
}

/** What a role may change on a ticket it can see. */
function assertMayUpdate(role: Role, current: typeof tickets.$inferSelect, input: UpdateTicketInput) {
  if (role === 'client') {
    const onlyClosing = input.status === 'closed' && Object.keys(input).every((k) => k === 'status');
    if (!onlyClosing) throw forbidden('forbidden', 'You can close a resolved ticket; the service desk changes everything else.');
    if (current.status !== 'resolved')
      throw conflict('bad_transition', 'Only a resolved ticket can be closed.', { status: 'Not resolved yet.' });
  }
  if (role === 'technician' && (input.priority || input.assigneeId !== undefined || input.schedule)) {
    throw forbidden('forbidden', 'Priority, assignment and scheduling are set by the office.');
  }
}

type Clock = Awaited<ReturnType<typeof clockFor>>;

/**
 * The columns a move to `to` changes, by the ticket's rules: only allowed moves; leaving `new`
 * acknowledges; waiting on the client pauses the resolution clock and leaving it resumes it.
 */
function statusChanges(
  before: typeof tickets.$inferSelect,
  to: TicketStatus,
  clock: Clock,
  now: Date,
  priority?: TicketPriority,
): Partial<typeof tickets.$inferInsert> {
  if (!allowedNextStatuses(before.status).includes(to)) {
    throw conflict('bad_transition', `A ${before.status.replace('_', ' ')} ticket cannot move to ${to.replace('_', ' ')}.`, {
      status: 'Not allowed from the current status.',
    });
  }
  const changes: Partial<typeof tickets.$inferInsert> = { status: to };
  if (before.status === 'new' && !before.acknowledgedAt) changes.acknowledgedAt = now;
  let pausedSeconds = before.pausedSeconds;
  if (to === 'waiting_client') changes.pausedAt = now;
  if (before.status === 'waiting_client' && before.pausedAt) {
    pausedSeconds += Math.round(pausedClockMs(clock, before.pausedAt, now) / 1000);
    changes.pausedAt = null;
    changes.pausedSeconds = pausedSeconds;
  }
  if (to === 'resolved') changes.resolvedAt = now;
  if (to === 'closed') changes.closedAt = now;
  if (before.status === 'resolved' && to === 'in_progress') changes.resolvedAt = null;
  if (changes.pausedSeconds !== undefined || priority) {
    Object.assign(changes, ticketDueTimes(clock, priority ?? before.priority, before.createdAt, pausedSeconds * 1000));
  }
  return changes;
}

/**
 * A visit moves its ticket on: booking one schedules a new or acknowledged ticket, starting one
 * puts a scheduled or acknowledged ticket in progress. Only from the statuses given; by the
 * ticket's rules, audited in the visit's transaction.
 */
export async function moveTicketForVisit(tx: Tx, actor: Actor, ticketId: string, to: TicketStatus, from: TicketStatus[]) {
  const [before] = await tx.select().from(tickets).where(eq(tickets.id, ticketId)).for('update');
  if (!before || before.mergedIntoId || !from.includes(before.status)) return;
  const now = new Date();
  const changes = statusChanges(before, to, await clockFor(tx, before.siteId), now);
  const [after] = await tx
    .update(tickets)
    .set({ ...changes, updatedAt: now })
    .where(eq(tickets.id, ticketId))
    .returning();
  await recordAudit(tx, { actor, entity: 'ticket', entityId: ticketId, action: 'updated', before, after });
}

export async function updateTicket(actor: Actor, id: string, input: UpdateTicketInput): Promise<TicketDetail> {
  await db().transaction(async (tx) => {
    const before = await visibleTicket(tx, actor, id, true);
    assertMayUpdate(actor.role, before, input);
    if (before.mergedIntoId) throw conflict('merged', 'This ticket was merged into another; work on that one.');
    const now = new Date();
    const clock = await clockFor(tx, before.siteId);
    // updatedAt always moves: scheduling a further visit changes no column of the ticket itself.
    const changes: Partial<typeof tickets.$inferInsert> = { updatedAt: now };
    if (input.title !== undefined) changes.title = input.title;
    if (input.description !== undefined) changes.description = input.description;
    if (input.assigneeId !== undefined) changes.assigneeId = await assertAssignable(tx, input.assigneeId);
    if (input.schedule && (input.status ?? before.status) !== 'scheduled')
      throw badRequest('validation_failed', 'A visit is planned with the status “scheduled”.', { status: 'Set to scheduled.' });
    if (input.status && input.status !== before.status) {
      Object.assign(changes, statusChanges(before, input.status, clock, now, input.priority));
    }
    if (input.priority && input.priority !== before.priority) {
      changes.priority = input.priority;
      Object.assign(
        changes,
        ticketDueTimes(clock, input.priority, before.createdAt, (changes.pausedSeconds ?? before.pausedSeconds) * 1000),
      );
    }
    const [after] = await tx.update(tickets).set(changes).where(eq(tickets.id, id)).returning();
    await recordAudit(tx, { actor, entity: 'ticket', entityId: id, action: 'updated', before, after });
    if (input.schedule) {
      // One path for every booking: the visit, its technicians and the invitations (visits.ts).
      await bookVisit(tx, actor, {
        kind: 'ticket',
        ticketId: id,
        windowStart: input.schedule.start,
        windowEnd: input.schedule.end,
        technicianIds: input.schedule.technicianIds,
        fieldPrefix: 'schedule.',
      });
    }

    // Tell the client what they need to know (a booking has its own invitation).
    if (after.status !== before.status && !input.schedule) {
      const mail = await forMail(tx, id);
      if (after.status === 'acknowledged') await mailClientUpdate(tx, mail, { kind: 'acknowledged' });
      else if (after.status === 'resolved') await mailClientUpdate(tx, mail, { kind: 'resolved' });
    }
  });
  return getTicket(actor, id);
}

async function assertAssignable(tx: Tx, userId: string | null) {
  if (!userId) return null;
  const [u] = await tx.select({ role: users.role, disabledAt: users.disabledAt }).from(users).where(eq(users.id, userId));
  if (!u || u.role === 'client' || u.disabledAt)
    throw badRequest('validation_failed', 'Assign the ticket to an active staff member.', { assigneeId: 'Not a staff member.' });
  return userId;
}

/** Closes a duplicate into the ticket that carries on, leaving a note on both. */
export async function mergeTicket(actor: Actor, id: string, intoId: string): Promise<TicketDetail> {
  if (id === intoId) throw badRequest('validation_failed', 'Choose another ticket to merge into.', { intoTicketId: 'The same ticket.' });
  await db().transaction(async (tx) => {
    const dup = await visibleTicket(tx, actor, id, true);
    const into = await visibleTicket(tx, actor, intoId, true);
    if (dup.clientId !== into.clientId)
      throw badRequest('validation_failed', 'Tickets of different clients cannot be merged.', { intoTicketId: 'Another client.' });
    if (into.mergedIntoId || into.status === 'closed')
      throw conflict('bad_transition', 'Merge into an open ticket.', { intoTicketId: 'Closed or merged.' });
    const now = new Date();
    const [after] = await tx
      .update(tickets)
      .set({ status: 'closed', mergedIntoId: into.id, closedAt: now, pausedAt: null })
      .where(eq(tickets.id, dup.id))
      .returning();
    const cells = new Map([...into.cells, ...dup.cells].map((c) => [`${c.column}:${c.row}`, c]));
    if (dup.wallId && dup.wallId === into.wallId)
      await tx
        .update(tickets)
        .set({ cells: [...cells.values()] })
        .where(eq(tickets.id, into.id));
    await tx.insert(ticketComments).values([
      {
        ticketId: dup.id,
        authorId: actor.userId,
        visibility: 'public',
        body: `Merged into ${ticketRef(into.number, into.createdAt)}: the same fault is followed there.`,
      },
      {
        ticketId: into.id,
        authorId: actor.userId,
        visibility: 'internal',
        body: `${ticketRef(dup.number, dup.createdAt)} was merged into this ticket.`,
      },
    ]);
    await recordAudit(tx, { actor, entity: 'ticket', entityId: dup.id, action: 'merged', before: dup, after });
  });
  return getTicket(actor, id);
}

// ---- comments ----
function presentComment(r: { c: typeof ticketComments.$inferSelect; authorName: string | null; authorRole: Role | null }): TicketComment {
  return {
    id: r.c.id,
    body: r.c.body,
    visibility: r.c.visibility,
    author: { name: r.authorName ?? 'Former user', role: r.authorRole, staff: r.authorRole !== 'client' },
    createdAt: r.c.createdAt.toISOString(),
  };
}

/** The newest comments of a conversation, shown oldest first; older ones are counted as `truncated`. */
export const COMMENTS_CAP = 1000;

export async function listComments(actor: Actor, ticketId: string): Promise<CappedList<TicketComment>> {
  await visibleTicket(db(), actor, ticketId);
  const rows = await db()
    .select({ c: ticketComments, authorName: users.name, authorRole: users.role })
    .from(ticketComments)
    .leftJoin(users, eq(users.id, ticketComments.authorId))
    .where(and(eq(ticketComments.ticketId, ticketId), isStaff(actor) ? undefined : eq(ticketComments.visibility, 'public')))
    .orderBy(desc(ticketComments.createdAt), desc(ticketComments.id))
    .limit(COMMENTS_CAP + 1);
  const newest = capped(rows, COMMENTS_CAP);
  return { items: newest.items.reverse().map(presentComment), truncated: newest.truncated };
}

export async function addComment(actor: Actor, ticketId: string, input: CommentInput): Promise<TicketComment> {
  if (actor.role === 'client' && input.visibility === 'internal') {
    throw forbidden('forbidden', 'Client comments are always visible to the service desk and to you.');
  }
  const id = await db().transaction(async (tx) => {
    const t = await visibleTicket(tx, actor, ticketId);
    const [row] = await tx
      .insert(ticketComments)
      .values({ ticketId, authorId: actor.userId, body: input.body, visibility: input.visibility })
      .returning();
    await tx.update(tickets).set({ updatedAt: new Date() }).where(eq(tickets.id, ticketId));
    await recordAudit(tx, {
      actor,
      entity: 'ticket',
      entityId: ticketId,
      action: `comment_${input.visibility}`,
      after: { commentId: row.id },
    });
    if (input.visibility === 'public') {
      const mail = await forMail(tx, t.id);
      await mailClientUpdate(tx, mail, {
        kind: 'comment',
        commentId: row.id,
        authorName: actor.name,
        body: input.body,
        excludeEmail: actor.email,
      });
    }
    return row.id;
  });
  const { items } = await listComments(actor, ticketId);
  return items.find((c) => c.id === id)!;
}

/** The ticket the caller may attach to, for the upload route (404 when not visible). */
export const ticketForUpload = (actor: Actor, id: string) => visibleTicket(db(), actor, id);

// ---- saved views ----
/** A saved view; its filters were stored from `savedViewInput`, strings only. */
function presentView(v: typeof savedViews.$inferSelect): SavedTicketView {
  const filters = Object.entries(v.filters).filter((entry): entry is [string, string] => typeof entry[1] === 'string');
  return { id: v.id, name: v.name, filters: Object.fromEntries(filters) };
}

/** A person's saved views, by name, up to this many. */
export const SAVED_VIEWS_CAP = 200;

export async function listViews(actor: Actor): Promise<CappedList<SavedTicketView>> {
  const rows = await db()
    .select()
    .from(savedViews)
    .where(eq(savedViews.userId, actor.userId))
    .orderBy(asc(savedViews.name))
    .limit(SAVED_VIEWS_CAP + 1);
  return capped(rows.map(presentView), SAVED_VIEWS_CAP);
}

export async function saveView(actor: Actor, input: SavedViewInput): Promise<SavedTicketView> {
  const [row] = await db()
    .insert(savedViews)
    .values({ userId: actor.userId, name: input.name, filters: input.filters })
    .onConflictDoUpdate({ target: [savedViews.userId, savedViews.name], set: { filters: input.filters, updatedAt: new Date() } })
    .returning();
  return presentView(row);
}

export async function deleteView(actor: Actor, id: string) {
  const [row] = await db()
    .delete(savedViews)
    .where(and(eq(savedViews.id, id), eq(savedViews.userId, actor.userId)))
    .returning();
  found(row, 'Saved view');
}

/** For the office board: counts of open tickets by clock state, every state present. */
export async function clockCounts(actor: Actor): Promise<TicketClockCounts> {
  const rows = await db()
    .select({ state: clockStateSql, n: sql<number>`count(*)::int` })
    .from(tickets)
    .where(and(tenantWhere(actor, tickets.clientId), inArray(tickets.status, openStatuses)))
    .groupBy(clockStateSql);
  const counts: TicketClockCounts = { on_track: 0, at_risk: 0, breached: 0, paused: 0, met: 0, missed: 0, none: 0 };
  for (const r of rows) counts[r.state ?? 'none'] += r.n;
  return counts;
}
