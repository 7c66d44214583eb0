// Repairs: one line of work on one cabinet of a wall, logged from a visit or a ticket. Logging
// one writes the repair, its stock movement, the cabinet's history event and the ticket's
// activity in one transaction; a whole-cabinet swap puts a spare cabinet from a van or a site kit
// in the position and sends the removed one to the bench.
import { randomUUID } from 'node:crypto';
import { aliasedTable, and, asc, desc, eq, gte, lt, or, type SQL } from 'drizzle-orm';
import type { Page } from '../../shared/schemas/common.js';
import {
  actionLabels,
  componentLabels,
  fateLabels,
  faultLabels,
  partKindFor,
  type CreateRepairRequest,
  type ListRepairsQuery,
  type RepairItem,
} from '../../shared/schemas/repairs.js';
import { cellLabel } from '../../shared/calc/grid.js';
import { db, type DbOrTx, type Tx } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { sites } from '../db/schema/clients.js';
import { parts, stockLocations, stockMovements, vendorReturns } from '../db/schema/stock.js';
import { ticketComments, tickets } from '../db/schema/tickets.js';
import { repairs, visits, visitTechnicians } from '../db/schema/visits.js';
import { cabinetEvents, cabinets, walls } from '../db/schema/walls.js';
import { AppError, conflict, forbidden, validationFailed } from '../errors.js';
import type { Actor } from '../middleware/auth.js';
import { recordAudit } from './audit.js';
import { oncePerKey } from './idempotency.js';
import { afterCursor, decodeCursor, pageOf } from './pagination.js';
import { found, isStaff, tenantWhere } from './scope.js';
import { applyMovement, assertMayTakeFrom } from './stock.js';
import { visibleWall } from './walls.js';

const replacement = aliasedTable(cabinets, 'replacement_cabinet');

/** A repair with the names its presenter needs. */
function repairRows(tx: DbOrTx) {
  return tx
    .select({
      repair: repairs,
      wallName: walls.name,
      cabinetSerial: cabinets.serial,
      replacementSerial: replacement.serial,
      technicianName: users.name,
      partName: parts.name,
      partSku: parts.sku,
      locationName: stockLocations.name,
    })
    .from(repairs)
    .innerJoin(walls, eq(walls.id, repairs.wallId))
    .leftJoin(cabinets, eq(cabinets.id, repairs.cabinetId))
    .leftJoin(replacement, eq(replacement.id, repairs.replacementCabinetId))
    .leftJoin(users, eq(users.id, repairs.technicianId))
    .leftJoin(parts, eq(parts.id, repairs.partId))
    .leftJoin(stockLocations, eq(stockLocations.id, repairs.fromLocationId))
    .$dynamic();
}
type RepairRow = Awaited<ReturnType<ReturnType<typeof repairRows>['execute']>>[number];

/** One repair; where the spare came from, the batch mismatch and the notes are the staff's business. */
export function presentRepair(r: RepairRow, staff: boolean): RepairItem {
  const x = r.repair;
  return {
    id: x.id,
    wallId: x.wallId,
    wallName: r.wallName,
    cabinetId: x.cabinetId,
    cabinetSerial: r.cabinetSerial,
    column: x.column,
    row: x.row,
    position: cellLabel({ column: x.column, row: x.row }),
    component: x.component,
    moduleColumn: x.moduleColumn,
    moduleRow: x.moduleRow,
    fault: x.fault,
    action: x.action,
    visitId: x.visitId,
    ticketId: x.ticketId,
    technicianName: r.technicianName,
    performedAt: x.performedAt.toISOString(),
    part: x.partId ? { id: x.partId, name: r.partName ?? '', sku: r.partSku ?? '', batch: x.partBatch } : null,
    replacementCabinet: x.replacementCabinetId ? { id: x.replacementCabinetId, serial: r.replacementSerial ?? '' } : null,
    removedPartFate: x.removedPartFate,
    ...(staff
      ? {
          notes: x.notes,
          fromLocation: x.fromLocationId ? { id: x.fromLocationId, name: r.locationName ?? '' } : null,
          batchMismatch: x.batchMismatch,
        }
      : {}),
  };
}

async function presentedWhere(tx: DbOrTx, actor: Actor, where: SQL | undefined, order: 'oldest' | 'latest' = 'latest') {
  const rows = await repairRows(tx)
    .where(and(tenantWhere(actor, repairs.clientId), where))
    .orderBy(...(order === 'oldest' ? [asc(repairs.performedAt), asc(repairs.id)] : []));
  return rows.map((r) => presentRepair(r, isStaff(actor)));
}

/** The repairs logged on a visit, oldest first (the visit screen and its report). */
export async function visitRepairs(tx: DbOrTx, actor: Actor, visitId: string): Promise<RepairItem[]> {
  return presentedWhere(tx, actor, eq(repairs.visitId, visitId), 'oldest');
}

/** One repair as the actor may see it. */
export async function getRepair(actor: Actor, id: string, tx: DbOrTx = db()): Promise<RepairItem | undefined> {
  const [item] = await presentedWhere(tx, actor, eq(repairs.id, id));
  return item;
}

// ---- the list ----

/** Repairs, latest first, a page at a time; client users see their own organisation's. */
export async function listRepairs(actor: Actor, query: ListRepairsQuery): Promise<Page<RepairItem>> {
  const cursor = decodeCursor(query.cursor, 2);
  const rows = await repairRows(db())
    .where(
      and(
        tenantWhere(actor, repairs.clientId),
        query.wallId ? eq(repairs.wallId, query.wallId) : undefined,
        // A cabinet's repairs include the swap that put it on the wall.
        query.cabinetId ? or(eq(repairs.cabinetId, query.cabinetId), eq(repairs.replacementCabinetId, query.cabinetId)) : undefined,
        query.ticketId ? eq(repairs.ticketId, query.ticketId) : undefined,
        query.visitId ? eq(repairs.visitId, query.visitId) : undefined,
        query.from ? gte(repairs.performedAt, new Date(query.from)) : undefined,
        query.to ? lt(repairs.performedAt, new Date(query.to)) : undefined,
        afterCursor(repairs.performedAt, repairs.id, cursor, 'desc'),
      ),
    )
    .orderBy(desc(repairs.performedAt), desc(repairs.id))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (r) => [r.repair.performedAt.toISOString(), r.repair.id]);
  return { items: page.items.map((r) => presentRepair(r, isStaff(actor))), nextCursor: page.nextCursor };
}

/** The repair a photo is attached to (404 when the actor may not see it), with its organisation. */
export async function repairForPhotos(actor: Actor, id: string) {
  const [row] = await db()
    .select({ id: repairs.id, clientId: repairs.clientId })
    .from(repairs)
    .where(and(eq(repairs.id, id), tenantWhere(actor, repairs.clientId)));
  return found(row, 'Repair');
}

// ---- logging a repair ----

/** How far a queued repair's time may lie from now: a phone's clock a little fast, a queue a month old. */
const FUTURE_SLACK_MS = 5 * 60_000;
const OLDEST_MS = 30 * 24 * 3600_000;

function performedAtOf(input: CreateRepairRequest, now: Date): Date {
  if (!input.performedAt) return now;
  const at = new Date(input.performedAt);
  if (at.getTime() > now.getTime() + FUTURE_SLACK_MS) {
    throw validationFailed({ performedAt: 'Later than now: check the phone’s clock.' }, 'The repair’s time lies in the future.');
  }
  if (at.getTime() < now.getTime() - OLDEST_MS) {
    throw validationFailed({ performedAt: 'More than 30 days ago.' }, 'A repair older than 30 days is recorded by the office.');
  }
  return at;
}

/** The calendar day of a moment where the wall is (`YYYY-MM-DD`). */
function dayAt(at: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(at);
}

/** What was worked on, as people say it: "Module M2·1", "Power supply". */
function workedOn(input: CreateRepairRequest): string {
  return input.component === 'module' ? `Module M${input.moduleColumn}·${input.moduleRow}` : componentLabels[input.component];
}

/** The cabinet event's note: "Module M2·1 replaced (module dark)". */
function eventNote(input: CreateRepairRequest): string {
  return `${workedOn(input)} ${actionLabels[input.action].toLowerCase()} (${faultLabels[input.fault].toLowerCase()})`;
}

type CabinetRow = typeof cabinets.$inferSelect;
type WallRow = typeof walls.$inferSelect;

/** Where a cabinet is now, in words, for the `cabinet_moved` answer. */
async function whereNow(tx: Tx, cabinet: CabinetRow): Promise<string> {
  if (!cabinet.wallId || !cabinet.column || !cabinet.row) return `it has left the wall (${cabinet.status.replace(/_/g, ' ')})`;
  const [wall] = await tx.select({ name: walls.name }).from(walls).where(eq(walls.id, cabinet.wallId));
  return `it is now at ${cellLabel({ column: cabinet.column, row: cabinet.row })} of ${wall?.name ?? 'another wall'}`;
}

/** The cabinet worked on: locked, on a wall the actor may see, and where the phone saw it. */
async function cabinetAtWork(tx: Tx, actor: Actor, input: CreateRepairRequest) {
  const [cabinet] = await tx.select().from(cabinets).where(eq(cabinets.id, input.cabinetId)).for('update');
  found(cabinet, 'Cabinet');
  const seen = input.seenAt;
  if (seen && (cabinet.wallId !== seen.wallId || cabinet.column !== seen.column || cabinet.row !== seen.row)) {
    // Only say where it went when the actor may see that wall.
    const visible = cabinet.wallId ? await visibleWall(tx, actor, cabinet.wallId).catch(() => null) : null;
    const now = cabinet.wallId && !visible ? 'it is no longer there' : await whereNow(tx, cabinet);
    throw new AppError(
      409,
      'cabinet_moved',
      `Cabinet ${cabinet.serial} is no longer at ${cellLabel(seen)}: ${now}. Check the wall and log the repair again.`,
      undefined,
      undefined,
      {
        cabinetId: cabinet.id,
        serial: cabinet.serial,
        now: visible ? { wallId: cabinet.wallId, column: cabinet.column, row: cabinet.row } : null,
      },
    );
  }
  if (!cabinet.wallId || !cabinet.column || !cabinet.row) {
    throw conflict('not_installed', `Cabinet ${cabinet.serial} is not on a wall (${cabinet.status.replace(/_/g, ' ')}).`, {
      cabinetId: 'Not on a wall.',
    });
  }
  const wall = await visibleWall(tx, actor, cabinet.wallId);
  return { cabinet, wall, column: cabinet.column, row: cabinet.row };
}

/** The visit the repair is logged on: at the wall's site, still open, and (for a technician) theirs. */
async function openVisit(tx: Tx, actor: Actor, visitId: string, wall: WallRow) {
  const [visit] = await tx
    .select()
    .from(visits)
    .where(and(eq(visits.id, visitId), tenantWhere(actor, visits.clientId)));
  found(visit, 'Visit');
  if (visit.siteId !== wall.siteId) throw validationFailed({ visitId: 'That visit is at another site.' });
  if (visit.status === 'completed' || visit.status === 'cancelled') {
    throw conflict('visit_closed', `That visit is ${visit.status}: log the repair on an open visit or on the ticket.`, {
      visitId: `The visit is ${visit.status}.`,
    });
  }
  if (actor.role === 'technician') {
    const [mine] = await tx
      .select({ userId: visitTechnicians.userId })
      .from(visitTechnicians)
      .where(and(eq(visitTechnicians.visitId, visitId), eq(visitTechnicians.userId, actor.userId)));
    if (!mine) throw forbidden('not_on_visit', 'You are not one of this visit’s technicians.');
  }
  return visit;
}

/** The ticket the repair answers: the same client's, and about this wall when about one. */
async function ticketFor(tx: Tx, actor: Actor, ticketId: string, wall: WallRow) {
  const [ticket] = await tx
    .select()
    .from(tickets)
    .where(and(eq(tickets.id, ticketId), tenantWhere(actor, tickets.clientId)));
  found(ticket, 'Ticket');
  if (ticket.clientId !== wall.clientId) throw validationFailed({ ticketId: 'That ticket is another client’s.' });
  if (ticket.wallId && ticket.wallId !== wall.id) throw validationFailed({ ticketId: 'That ticket is about another wall.' });
  return ticket;
}

/** Fits the spare: one unit leaves the van or site kit, checked against the wall's batch. */
async function fitSpare(
  tx: Tx,
  actor: Actor,
  input: CreateRepairRequest,
  spare: NonNullable<CreateRepairRequest['spare']>,
  at: { wall: WallRow; cabinet: CabinetRow; position: string; repairId: string },
) {
  const [part] = await tx.select().from(parts).where(eq(parts.id, spare.partId));
  found(part, 'Part');
  const kind = partKindFor[input.component];
  if (part.kind !== kind) {
    throw validationFailed({
      'spare.partId': `A ${part.kind.replace(/_/g, ' ')} does not fit a ${componentLabels[input.component].toLowerCase()}.`,
    });
  }
  if (part.cabinetModelId && part.cabinetModelId !== at.cabinet.cabinetModelId) {
    throw validationFailed({ 'spare.partId': 'That spare is made for another cabinet model.' });
  }
  const movementId = await applyMovement(
    tx,
    actor,
    {
      kind: 'consumption',
      partId: spare.partId,
      batch: spare.batch,
      fromLocationId: spare.locationId,
      quantity: 1,
      reason: `Repair on ${at.wall.name} ${at.position}`,
      forWallId: at.wall.id,
      acceptBatchMismatch: input.acceptBatchMismatch,
    },
    { repairId: at.repairId },
  );
  const [movement] = await tx
    .select({ batchMismatch: stockMovements.batchMismatch })
    .from(stockMovements)
    .where(eq(stockMovements.id, movementId));
  return { part, batchMismatch: movement.batchMismatch };
}

/** The spare cabinet of a swap: a spare of the wall's model in a van or site kit the actor may take from. */
async function spareCabinet(tx: Tx, actor: Actor, id: string, wall: WallRow) {
  const [row] = await tx
    .select({ cabinet: cabinets, location: stockLocations })
    .from(cabinets)
    .leftJoin(stockLocations, eq(stockLocations.id, cabinets.stockLocationId))
    .where(eq(cabinets.id, id))
    // Locked after the cabinet worked on; a spare is never worked on, so two swaps cannot lock crosswise.
    .for('update', { of: cabinets });
  const { cabinet, location } = found(row, 'Spare cabinet');
  if (cabinet.status !== 'spare' || !location) {
    throw conflict('not_a_spare', `Cabinet ${cabinet.serial} is not a spare on a shelf.`, { replacementCabinetId: 'Not a spare.' });
  }
  if (location.kind !== 'van' && location.kind !== 'site_kit') {
    throw conflict('spare_not_at_hand', `Spare cabinet ${cabinet.serial} is in ${location.name}: take it to a van or a site kit first.`, {
      replacementCabinetId: 'Not in a van or site kit.',
    });
  }
  if (cabinet.cabinetModelId !== wall.cabinetModelId) {
    throw conflict('model_mismatch', `Spare cabinet ${cabinet.serial} is another model than the wall’s cabinets.`, {
      replacementCabinetId: 'Another model.',
    });
  }
  await assertMayTakeFrom(tx, actor, location.id);
  return { cabinet, location };
}

const removedStatus: Record<CreateRepairRequest['removedPartFate'], 'at_bench' | 'retired' | 'returned_to_vendor'> = {
  none: 'at_bench',
  to_bench: 'at_bench',
  scrapped: 'retired',
  to_vendor_return: 'returned_to_vendor',
};

/**
 * The spare cabinet takes the position; the removed one leaves the wall for the bench (or is
 * retired, or goes back to its maker). Both histories record it with the repair.
 */
async function swapInSpare(
  tx: Tx,
  actor: Actor,
  input: CreateRepairRequest,
  at: { wall: WallRow; old: CabinetRow; column: number; row: number; repairId: string; performedAt: Date },
) {
  const { cabinet: spare, location } = await spareCabinet(tx, actor, input.replacementCabinetId!, at.wall);
  const [site] = await tx.select({ timeZone: sites.timeZone }).from(sites).where(eq(sites.id, at.wall.siteId));
  const toStatus = removedStatus[input.removedPartFate];
  // One cabinet per position: free the cell before the spare fills it.
  await tx
    .update(cabinets)
    .set({ wallId: null, column: null, row: null, status: toStatus, stockLocationId: null })
    .where(eq(cabinets.id, at.old.id));
  await tx
    .update(cabinets)
    .set({
      wallId: at.wall.id,
      column: at.column,
      row: at.row,
      status: 'installed',
      stockLocationId: null,
      installedOn: dayAt(at.performedAt, site.timeZone),
    })
    .where(eq(cabinets.id, spare.id));
  const fault = faultLabels[input.fault].toLowerCase();
  await tx.insert(cabinetEvents).values([
    {
      cabinetId: at.old.id,
      kind: 'removed',
      fromWallId: at.wall.id,
      fromColumn: at.column,
      fromRow: at.row,
      otherCabinetId: spare.id,
      repairId: at.repairId,
      fromStatus: 'installed',
      toStatus,
      note: `Swapped out for spare cabinet ${spare.serial} (${fault}); ${fateLabels[input.removedPartFate === 'none' ? 'to_bench' : input.removedPartFate].toLowerCase()}.`,
      actorId: actor.userId,
      createdAt: at.performedAt,
    },
    {
      cabinetId: spare.id,
      kind: 'placed',
      toWallId: at.wall.id,
      toColumn: at.column,
      toRow: at.row,
      otherCabinetId: at.old.id,
      repairId: at.repairId,
      fromStatus: 'spare',
      toStatus: 'installed',
      note: `Swapped in from ${location.name} for cabinet ${at.old.serial}.`,
      actorId: actor.userId,
      createdAt: at.performedAt,
    },
  ]);
  await recordAudit(tx, {
    actor,
    entity: 'cabinet',
    entityId: at.old.id,
    action: 'removed',
    before: at.old,
    after: { ...at.old, wallId: null, column: null, row: null, status: toStatus },
  });
  await recordAudit(tx, {
    actor,
    entity: 'cabinet',
    entityId: spare.id,
    action: 'placed',
    before: spare,
    after: { ...spare, wallId: at.wall.id, column: at.column, row: at.row, status: 'installed', stockLocationId: null },
  });
  return spare;
}

/** The failed part goes back to its maker: a pending return, linked to the repair. */
async function openReturnForRemoved(
  tx: Tx,
  actor: Actor,
  input: CreateRepairRequest,
  at: { partId: string; wall: WallRow; cabinet: CabinetRow; position: string; repairId: string },
) {
  const [row] = await tx
    .insert(vendorReturns)
    .values({
      partId: at.partId,
      // A module carries the cabinet's production batch; other parts have none.
      batch: input.component === 'module' ? at.cabinet.batch : '',
      quantity: 1,
      fault: `${faultLabels[input.fault]}: ${workedOn(input)} of cabinet ${at.cabinet.serial}`,
      repairId: at.repairId,
      notes: `Removed from ${at.wall.name}, ${at.position}.`,
    })
    .returning();
  await recordAudit(tx, { actor, entity: 'vendor_return', entityId: row.id, action: 'created', after: row });
}

/** The ticket's activity: a public comment in the actor's name (no costs, no internal notes; the visit report mails the client). */
async function noteOnTicket(tx: Tx, actor: Actor, ticketId: string, body: string) {
  const [comment] = await tx.insert(ticketComments).values({ ticketId, authorId: actor.userId, body, visibility: 'public' }).returning();
  await tx.update(tickets).set({ updatedAt: new Date() }).where(eq(tickets.id, ticketId));
  await recordAudit(tx, { actor, entity: 'ticket', entityId: ticketId, action: 'comment_public', after: { commentId: comment.id } });
}

function ticketText(
  input: CreateRepairRequest,
  at: {
    wall: WallRow;
    cabinet: CabinetRow;
    position: string;
    part: { name: string } | null;
    batch: string | null;
    spare: CabinetRow | null;
  },
) {
  const where = `${at.wall.name} ${at.position}`;
  if (at.spare) {
    return `Repair at ${where}: cabinet ${at.cabinet.serial} swapped for spare cabinet ${at.spare.serial} (${faultLabels[input.fault].toLowerCase()}).`;
  }
  const fitted = at.part ? ` Fitted: ${at.part.name}${at.batch ? `, batch ${at.batch}` : ''}.` : '';
  return `Repair at ${where} (cabinet ${at.cabinet.serial}): ${eventNote(input)}.${fitted}`;
}

/**
 * Logs one repair in the caller's transaction: the repair, the spare's stock movement (or the
 * cabinet swap), the cabinet's history, any vendor return, and the ticket's activity.
 */
export async function logRepair(tx: Tx, actor: Actor, input: CreateRepairRequest): Promise<RepairItem> {
  const performedAt = performedAtOf(input, new Date());
  const { cabinet, wall, column, row } = await cabinetAtWork(tx, actor, input);
  const position = cellLabel({ column, row });
  const visit = input.visitId ? await openVisit(tx, actor, input.visitId, wall) : null;
  const ticketId = input.ticketId ?? visit?.ticketId ?? null;
  if (ticketId) await ticketFor(tx, actor, ticketId, wall);
  const repairId = randomUUID();

  const fitted = input.spare ? await fitSpare(tx, actor, input, input.spare, { wall, cabinet, position, repairId }) : null;
  const spare =
    input.action === 'cabinet_swapped'
      ? await swapInSpare(tx, actor, input, { wall, old: cabinet, column, row, repairId, performedAt })
      : null;

  const [repair] = await tx
    .insert(repairs)
    .values({
      id: repairId,
      clientId: wall.clientId,
      wallId: wall.id,
      visitId: visit?.id ?? null,
      ticketId,
      cabinetId: cabinet.id,
      column,
      row,
      component: input.component,
      moduleColumn: input.moduleColumn ?? null,
      moduleRow: input.moduleRow ?? null,
      fault: input.fault,
      action: input.action,
      partId: input.spare?.partId ?? null,
      partBatch: input.spare ? input.spare.batch : null,
      fromLocationId: input.spare?.locationId ?? null,
      removedPartFate: input.removedPartFate,
      replacementCabinetId: spare?.id ?? null,
      batchMismatch: fitted?.batchMismatch ?? false,
      notes: input.notes ?? '',
      technicianId: actor.userId,
      performedAt,
    })
    .returning();

  if (!spare) {
    await tx.insert(cabinetEvents).values({
      cabinetId: cabinet.id,
      kind: 'repaired',
      repairId,
      note: eventNote(input),
      actorId: actor.userId,
      createdAt: performedAt,
    });
    if (input.removedPartFate === 'to_vendor_return' && input.spare) {
      await openReturnForRemoved(tx, actor, input, { partId: input.spare.partId, wall, cabinet, position, repairId });
    }
  }
  if (ticketId) {
    await noteOnTicket(
      tx,
      actor,
      ticketId,
      ticketText(input, { wall, cabinet, position, part: fitted?.part ?? null, batch: input.spare?.batch ?? null, spare }),
    );
  }
  await recordAudit(tx, { actor, entity: 'repair', entityId: repairId, action: 'created', after: repair });
  return found(await getRepair(actor, repairId, tx), 'Repair');
}

/** `POST /api/repairs`: logs the repair once per Idempotency-Key; the same key again answers the same. */
export function createRepair(actor: Actor, key: string, input: CreateRepairRequest) {
  return oncePerKey(actor, { key, route: 'POST /api/repairs', body: input }, async (tx) => ({
    statusCode: 201,
    body: await logRepair(tx, actor, input),
  }));
}
