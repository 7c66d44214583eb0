import type { CabinetDetail, CabinetEvent, CabinetSummary } from '../../shared/schemas/cabinets.js';
import type { CabinetStatus } from '../../shared/schemas/enums.js';
import type { Page } from '../../shared/schemas/common.js';
import Papa from 'papaparse';
import { aliasedTable, and, desc, eq, gte, inArray, like, or, sql } from 'drizzle-orm';
import type { PgSelect } from 'drizzle-orm/pg-core';
import {
  importRow,
  type CabinetPatch,
  type ImportResult,
  type ImportRowError,
  type ListCabinetsQuery,
  type MoveCabinetInput,
  type PlaceCabinetInput,
  type SwapCabinetInput,
} from '../../shared/schemas/cabinets.js';
import { cellLabel } from '../../shared/calc/grid.js';
import { db, type DbOrTx, type Tx } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { clients, sites } from '../db/schema/clients.js';
import { cabinetModels } from '../db/schema/catalogue.js';
import { stockLocations } from '../db/schema/stock.js';
import { cabinetEvents, cabinets, walls } from '../db/schema/walls.js';
import { AppError, badRequest, conflict } from '../errors.js';
import type { Actor } from '../middleware/auth.js';
import { fieldErrors } from '../middleware/validate.js';
import { recordAudit } from './audit.js';
import { orderFor } from './clients.js';
import { afterCursor, afterCursorNullsLast, decodeCursor, orderNullsLast, pageOf } from './pagination.js';
import { found, isStaff, tenantWhere } from './scope.js';
import { visibleWall } from './walls.js';

const escapeLike = (s: string) => s.replace(/[%_\\]/g, '\\$&');

/**
 * A recall names a batch family ("K7-2403" for K7-2403-A, -B…): the codes that start with it, in
 * any case (typed from a maker's letter as often as copied). The index on lower(batch) with
 * text_pattern_ops serves this prefix match over a million cabinets.
 */
export const batchFamily = (prefix: string) => sql`lower(${cabinets.batch}) like ${`${escapeLike(prefix.toLowerCase())}%`}`;

/**
 * Serials starting with a prefix, for a list sorted by serial. `like 'x%'` reads the pattern
 * index (cabinets_serial_prefix_idx); `serial >= 'x'` (true of every serial that starts with x:
 * a string sorts no earlier than its own start) lets the sorted walk of the serial index begin
 * at the prefix instead of at the first serial of the register, when many serials match.
 */
const serialPrefix = (prefix: string) => and(like(cabinets.serial, `${escapeLike(prefix)}%`), gte(cabinets.serial, prefix));

/** Cabinets a caller may see: client users only those on their own walls. */
function visibleCabinets(actor: Actor) {
  return actor.role === 'client' ? tenantWhere(actor, walls.clientId) : undefined;
}

/** A cabinet's model and whereabouts: its wall, site and client, or its stock location. */
function withWhereabouts<T extends PgSelect>(query: T) {
  return query
    .innerJoin(cabinetModels, eq(cabinetModels.id, cabinets.cabinetModelId))
    .leftJoin(walls, eq(walls.id, cabinets.wallId))
    .leftJoin(sites, eq(sites.id, walls.siteId))
    .leftJoin(clients, eq(clients.id, walls.clientId))
    .leftJoin(stockLocations, eq(stockLocations.id, cabinets.stockLocationId));
}

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const isoDatePattern = /^\d{4}-\d{2}-\d{2}$/;

/** The page cursor of a cabinet list, checked against its sort: [serial | batch | installedOn (or null), id]. */
function cabinetCursor(query: ListCabinetsQuery) {
  const cursor = decodeCursor(query.cursor, 2);
  if (!cursor) return null;
  const [value, id] = cursor;
  const valueOk =
    query.sort === 'installedOn' ? value === null || (typeof value === 'string' && isoDatePattern.test(value)) : typeof value === 'string';
  if (!valueOk || typeof id !== 'string' || !uuidPattern.test(id)) {
    throw badRequest('bad_cursor', 'The page cursor is not valid; start from the first page.', { cursor: 'Not valid.' });
  }
  return cursor;
}

/**
 * The cabinets of the register, on walls and (for staff) in stock. Sorted by serial, batch or
 * install date (cabinets never installed come last either way), the id breaking ties.
 */
export async function listCabinets(actor: Actor, query: ListCabinetsQuery): Promise<Page<CabinetSummary>> {
  const rows = await cabinetListQuery(actor, query);
  const page = pageOf(rows, query.limit, (r) => [
    query.sort === 'batch' ? r.batch : query.sort === 'installedOn' ? r.installedOn : r.serial,
    r.id,
  ]);
  const staff = isStaff(actor);
  return {
    items: page.items.map((r): CabinetSummary => ({
      id: r.id,
      serial: r.serial,
      status: r.status,
      batch: r.batch,
      installedOn: r.installedOn,
      wallId: r.wallId,
      wallName: r.wallName,
      column: r.column,
      row: r.row,
      siteId: r.siteId,
      siteName: r.siteName,
      clientId: r.clientId,
      clientName: r.clientName,
      modelId: r.modelId,
      modelName: r.modelName,
      // Where the company keeps its stock is the staff's business.
      locationName: staff ? r.locationName : null,
    })),
    nextCursor: page.nextCursor,
  };
}

/** The register's query for a page, not yet run (the query-plan tests read its plan). */
export function cabinetListQuery(actor: Actor, query: ListCabinetsQuery) {
  const cursor = cabinetCursor(query);
  const sortColumn = query.sort === 'batch' ? cabinets.batch : query.sort === 'installedOn' ? cabinets.installedOn : cabinets.serial;
  return withWhereabouts(
    db()
      .select({
        id: cabinets.id,
        serial: cabinets.serial,
        status: cabinets.status,
        batch: cabinets.batch,
        installedOn: cabinets.installedOn,
        column: cabinets.column,
        row: cabinets.row,
        wallId: cabinets.wallId,
        wallName: walls.name,
        siteId: walls.siteId,
        siteName: sites.name,
        clientId: walls.clientId,
        clientName: clients.name,
        modelId: cabinets.cabinetModelId,
        modelName: cabinetModels.name,
        locationName: stockLocations.name,
      })
      .from(cabinets)
      .$dynamic(),
  )
    .where(
      and(
        visibleCabinets(actor),
        query.serial ? serialPrefix(query.serial.toUpperCase()) : undefined,
        query.wallId ? eq(cabinets.wallId, query.wallId) : undefined,
        query.clientId ? eq(walls.clientId, query.clientId) : undefined,
        query.siteId ? eq(walls.siteId, query.siteId) : undefined,
        query.modelId ? eq(cabinets.cabinetModelId, query.modelId) : undefined,
        query.status ? eq(cabinets.status, query.status) : undefined,
        query.batch ? batchFamily(query.batch) : undefined,
        query.sort === 'installedOn'
          ? afterCursorNullsLast(sortColumn, cabinets.id, cursor, query.dir)
          : afterCursor(sortColumn, cabinets.id, cursor, query.dir),
      ),
    )
    .orderBy(
      ...(query.sort === 'installedOn' ? orderNullsLast(sortColumn, cabinets.id, query.dir) : orderFor(sortColumn, cabinets.id, query.dir)),
    )
    .limit(query.limit + 1);
}

/** A cabinet with its model, where it is, and its whole history. By id or by serial. */
export async function getCabinet(actor: Actor, by: { id: string } | { serial: string }): Promise<CabinetDetail> {
  const [row] = await withWhereabouts(
    db()
      .select({
        cabinet: cabinets,
        model: {
          id: cabinetModels.id,
          name: cabinetModels.name,
          pixelPitchMm: cabinetModels.pixelPitchMm,
          modulesWide: cabinetModels.modulesWide,
          modulesHigh: cabinetModels.modulesHigh,
        },
        wallName: walls.name,
        wallColumns: walls.columns,
        wallRows: walls.rows,
        siteId: walls.siteId,
        siteName: sites.name,
        clientName: clients.name,
        locationName: stockLocations.name,
      })
      .from(cabinets)
      .$dynamic(),
  ).where(and('id' in by ? eq(cabinets.id, by.id) : eq(cabinets.serial, by.serial.trim().toUpperCase()), visibleCabinets(actor)));
  const r = found(row, 'Cabinet');
  const fromWall = aliasedTable(walls, 'from_wall');
  const toWall = aliasedTable(walls, 'to_wall');
  const other = aliasedTable(cabinets, 'other_cabinet');
  const events = await db()
    .select({
      id: cabinetEvents.id,
      kind: cabinetEvents.kind,
      fromWallId: cabinetEvents.fromWallId,
      fromWallName: fromWall.name,
      fromColumn: cabinetEvents.fromColumn,
      fromRow: cabinetEvents.fromRow,
      toWallId: cabinetEvents.toWallId,
      toWallName: toWall.name,
      toColumn: cabinetEvents.toColumn,
      toRow: cabinetEvents.toRow,
      otherSerial: other.serial,
      repairId: cabinetEvents.repairId,
      fromStatus: cabinetEvents.fromStatus,
      toStatus: cabinetEvents.toStatus,
      note: cabinetEvents.note,
      noteForClient: cabinetEvents.noteForClient,
      actorName: users.name,
      createdAt: cabinetEvents.createdAt,
      fromOwn: ownWall(actor, fromWall.clientId),
      toOwn: ownWall(actor, toWall.clientId),
    })
    .from(cabinetEvents)
    .leftJoin(fromWall, eq(fromWall.id, cabinetEvents.fromWallId))
    .leftJoin(toWall, eq(toWall.id, cabinetEvents.toWallId))
    .leftJoin(other, eq(other.id, cabinetEvents.otherCabinetId))
    .leftJoin(users, eq(users.id, cabinetEvents.actorId))
    .where(
      and(
        eq(cabinetEvents.cabinetId, r.cabinet.id),
        // A client user sees what happened on its own walls only: a cabinet moved or swapped in
        // from another organisation brings none of that organisation's history with it.
        actor.role === 'client' ? or(tenantWhere(actor, fromWall.clientId), tenantWhere(actor, toWall.clientId)) : undefined,
      ),
    )
    .orderBy(desc(cabinetEvents.createdAt), desc(cabinetEvents.id))
    .limit(HISTORY_CAP + 1);
  const c = r.cabinet;
  return {
    id: c.id,
    serial: c.serial,
    status: c.status,
    batch: c.batch,
    installedOn: c.installedOn,
    ...(isStaff(actor) ? { notes: c.notes } : {}),
    model: r.model,
    wall: c.wallId
      ? {
          id: c.wallId,
          name: r.wallName!,
          columns: r.wallColumns!,
          rows: r.wallRows!,
          siteId: r.siteId!,
          siteName: r.siteName!,
          clientName: r.clientName!,
        }
      : null,
    column: c.column,
    row: c.row,
    position: c.column && c.row ? cellLabel({ column: c.column, row: c.row }) : null,
    stockLocation: isStaff(actor) && c.stockLocationId ? { id: c.stockLocationId, name: r.locationName ?? '' } : null,
    // Client users see what happened, not who on the staff did it.
    history: events.slice(0, HISTORY_CAP).map((e) => presentEvent(e, isStaff(actor))),
    historyTruncated: events.length > HISTORY_CAP,
  } satisfies CabinetDetail;
}

/** The newest events a cabinet card shows; older ones stay in the database (and the audit log). */
export const HISTORY_CAP = 200;

/** Whether a wall of an event is the client user's own (always true for staff). */
function ownWall(actor: Actor, clientId: typeof walls.clientId) {
  const own = tenantWhere(actor, clientId);
  return own ? sql<boolean>`coalesce(${own}, false)` : sql<boolean>`true`;
}

type EventRow = Omit<CabinetEvent, 'createdAt'> & { createdAt: Date; fromOwn: boolean; toOwn: boolean };

/**
 * One event of a cabinet's history. Staff get it whole. A client user gets the actor's name
 * never, the note only when staff chose to show it, and of a move or swap across organisations
 * only its own side: the other organisation's wall, position and cabinet are left out.
 */
function presentEvent(e: EventRow, staff: boolean): CabinetEvent {
  const from = staff || e.fromOwn;
  const to = staff || e.toOwn;
  return {
    id: e.id,
    kind: e.kind,
    fromWallId: from ? e.fromWallId : null,
    fromWallName: from ? e.fromWallName : null,
    fromColumn: from ? e.fromColumn : null,
    fromRow: from ? e.fromRow : null,
    toWallId: to ? e.toWallId : null,
    toWallName: to ? e.toWallName : null,
    toColumn: to ? e.toColumn : null,
    toRow: to ? e.toRow : null,
    // The other cabinet of a swap came from (and went to) the other side: named only when every
    // wall the event names is the reader's (a spare placed from stock names one wall only).
    otherSerial: staff || ((e.fromWallId === null || e.fromOwn) && (e.toWallId === null || e.toOwn)) ? e.otherSerial : null,
    repairId: e.repairId,
    fromStatus: e.fromStatus,
    toStatus: e.toStatus,
    note: staff || e.noteForClient ? e.note : '',
    noteForClient: e.noteForClient,
    actorName: staff ? e.actorName : null,
    createdAt: e.createdAt.toISOString(),
  };
}

async function lockCabinet(tx: Tx, id: string) {
  const [row] = await tx.select().from(cabinets).where(eq(cabinets.id, id)).for('update');
  return found(row, 'Cabinet');
}

function assertInsideGrid(wall: { columns: number; rows: number }, column: number, row: number) {
  if (column > wall.columns || row > wall.rows) {
    throw new AppError(400, 'outside_grid', `${cellLabel({ column, row })} is outside the wall’s ${wall.columns} × ${wall.rows} grid.`, {
      ...(column > wall.columns ? { column: `At most ${wall.columns}.` } : {}),
      ...(row > wall.rows ? { row: `At most ${wall.rows}.` } : {}),
    });
  }
}

async function occupant(tx: DbOrTx, wallId: string, column: number, row: number) {
  const [row_] = await tx
    .select({ id: cabinets.id, serial: cabinets.serial })
    .from(cabinets)
    .where(and(eq(cabinets.wallId, wallId), eq(cabinets.column, column), eq(cabinets.row, row)));
  return row_;
}

function positionTaken(serialThere: string, column: number, row: number) {
  return conflict(
    'position_taken',
    `${cellLabel({ column, row })} already holds cabinet ${serialThere}. Swap them instead, or move that one first.`,
    {
      column: 'Occupied.',
      row: 'Occupied.',
    },
  );
}

/** Registers a new cabinet at a position of the wall. */
export async function placeCabinet(actor: Actor, wallId: string, input: PlaceCabinetInput) {
  const id = await db().transaction(async (tx) => {
    const wall = await visibleWall(tx, actor, wallId);
    assertInsideGrid(wall, input.column, input.row);
    const there = await occupant(tx, wallId, input.column, input.row);
    if (there) throw positionTaken(there.serial, input.column, input.row);
    const [row] = await tx
      .insert(cabinets)
      .values({
        serial: input.serial,
        cabinetModelId: input.cabinetModelId ?? wall.cabinetModelId,
        wallId,
        column: input.column,
        row: input.row,
        batch: input.batch ?? '',
        status: 'installed',
        installedOn: input.installedOn ?? null,
        notes: input.notes ?? '',
      })
      .returning();
    await tx.insert(cabinetEvents).values({
      cabinetId: row.id,
      kind: 'placed',
      toWallId: wallId,
      toColumn: input.column,
      toRow: input.row,
      toStatus: 'installed',
      actorId: actor.userId,
    });
    await recordAudit(tx, { actor, entity: 'cabinet', entityId: row.id, action: 'placed', after: row });
    return row.id;
  });
  return getCabinet(actor, { id });
}

/** Moves a cabinet to a free position (or from stock onto a wall). Recorded, never overwritten. */
export async function moveCabinet(actor: Actor, id: string, input: MoveCabinetInput) {
  await db().transaction(async (tx) => {
    const before = await lockCabinet(tx, id);
    const wall = await visibleWall(tx, actor, input.wallId);
    assertInsideGrid(wall, input.column, input.row);
    if (before.wallId === input.wallId && before.column === input.column && before.row === input.row) return;
    const there = await occupant(tx, input.wallId, input.column, input.row);
    if (there) throw positionTaken(there.serial, input.column, input.row);
    const [after] = await tx
      .update(cabinets)
      .set({ wallId: input.wallId, column: input.column, row: input.row, status: 'installed', stockLocationId: null })
      .where(eq(cabinets.id, id))
      .returning();
    await tx.insert(cabinetEvents).values({
      cabinetId: id,
      kind: before.wallId ? 'moved' : 'placed',
      fromWallId: before.wallId,
      fromColumn: before.column,
      fromRow: before.row,
      toWallId: input.wallId,
      toColumn: input.column,
      toRow: input.row,
      fromStatus: before.status,
      toStatus: 'installed',
      note: input.note ?? '',
      noteForClient: input.noteForClient ?? false,
      actorId: actor.userId,
    });
    await recordAudit(tx, { actor, entity: 'cabinet', entityId: id, action: 'moved', before, after });
  });
  return getCabinet(actor, { id });
}

/** Exchanges the positions of two installed cabinets (on one wall or two). */
export async function swapCabinets(actor: Actor, id: string, input: SwapCabinetInput) {
  if (id === input.otherCabinetId)
    throw badRequest('validation_failed', 'Choose another cabinet to swap with.', { otherCabinetId: 'The same cabinet.' });
  await db().transaction(async (tx) => {
    // Lock in id order so two swaps of the same pair cannot deadlock.
    const [firstId, secondId] = [id, input.otherCabinetId].sort();
    const locked = [await lockCabinet(tx, firstId), await lockCabinet(tx, secondId)];
    const a = locked.find((c) => c.id === id)!;
    const b = locked.find((c) => c.id === input.otherCabinetId)!;
    if (!a.wallId || !b.wallId) throw conflict('not_installed', 'Both cabinets must be on a wall to swap them. Use move for a spare.');
    await visibleWall(tx, actor, a.wallId);
    await visibleWall(tx, actor, b.wallId);
    // The one-cabinet-per-position rule is checked row by row, so free A's cell first.
    await tx.update(cabinets).set({ wallId: null, column: null, row: null, status: 'at_bench' }).where(eq(cabinets.id, a.id));
    await tx.update(cabinets).set({ wallId: a.wallId, column: a.column, row: a.row }).where(eq(cabinets.id, b.id));
    await tx.update(cabinets).set({ wallId: b.wallId, column: b.column, row: b.row, status: 'installed' }).where(eq(cabinets.id, a.id));
    const note = input.note ?? '';
    const noteForClient = input.noteForClient ?? false;
    await tx.insert(cabinetEvents).values([
      {
        cabinetId: a.id,
        kind: 'swapped',
        fromWallId: a.wallId,
        fromColumn: a.column,
        fromRow: a.row,
        toWallId: b.wallId,
        toColumn: b.column,
        toRow: b.row,
        otherCabinetId: b.id,
        note,
        noteForClient,
        actorId: actor.userId,
      },
      {
        cabinetId: b.id,
        kind: 'swapped',
        fromWallId: b.wallId,
        fromColumn: b.column,
        fromRow: b.row,
        toWallId: a.wallId,
        toColumn: a.column,
        toRow: a.row,
        otherCabinetId: a.id,
        note,
        noteForClient,
        actorId: actor.userId,
      },
    ]);
    await recordAudit(tx, {
      actor,
      entity: 'cabinet',
      entityId: a.id,
      action: 'swapped',
      before: a,
      after: { ...a, wallId: b.wallId, column: b.column, row: b.row },
    });
    await recordAudit(tx, {
      actor,
      entity: 'cabinet',
      entityId: b.id,
      action: 'swapped',
      before: b,
      after: { ...b, wallId: a.wallId, column: a.column, row: a.row },
    });
  });
  return getCabinet(actor, { id });
}

/** Batch, notes and status. A status other than installed takes the cabinet off its wall. */
export async function updateCabinet(actor: Actor, id: string, input: CabinetPatch) {
  await db().transaction(async (tx) => {
    const before = await lockCabinet(tx, id);
    if (before.wallId) await visibleWall(tx, actor, before.wallId);
    const status = input.status ?? before.status;
    if (status === 'installed' && !before.wallId) {
      throw badRequest('validation_failed', 'Use “move” to put a cabinet on a wall.', { status: 'Move it onto a wall instead.' });
    }
    const leavesWall = before.wallId && status !== 'installed';
    if (input.stockLocationId) {
      const [loc] = await tx.select({ id: stockLocations.id }).from(stockLocations).where(eq(stockLocations.id, input.stockLocationId));
      if (!loc) throw badRequest('validation_failed', 'That stock location does not exist.', { stockLocationId: 'Unknown location.' });
    }
    const [after] = await tx
      .update(cabinets)
      .set({
        batch: input.batch ?? before.batch,
        notes: input.notes ?? before.notes,
        status,
        ...(leavesWall ? { wallId: null, column: null, row: null } : {}),
        stockLocationId: status === 'spare' ? (input.stockLocationId ?? before.stockLocationId) : null,
      })
      .where(eq(cabinets.id, id))
      .returning();
    if (status !== before.status) {
      await tx.insert(cabinetEvents).values({
        cabinetId: id,
        kind: leavesWall ? 'removed' : 'status_changed',
        fromWallId: before.wallId,
        fromColumn: before.column,
        fromRow: before.row,
        fromStatus: before.status,
        toStatus: status,
        note: input.note ?? '',
        noteForClient: input.noteForClient ?? false,
        actorId: actor.userId,
      });
    }
    await recordAudit(tx, { actor, entity: 'cabinet', entityId: id, action: 'updated', before, after });
  });
  return getCabinet(actor, { id });
}

const statusWords: Record<CabinetStatus, string> = {
  installed: 'installed',
  spare: 'a spare',
  at_bench: 'at the bench',
  returned_to_vendor: 'returned to the vendor',
  retired: 'retired',
};

/**
 * Where a serial the import names is registered now, for the import's wall: its wall and
 * position, or where it is kept, or its status. Another organisation's wall or on-site kit is
 * only "elsewhere": a refusal (which the office may forward to the client) never tells one
 * client what another has.
 */
function whereRegistered(
  found: {
    status: CabinetStatus;
    wallId: string | null;
    wallName: string | null;
    siteName: string | null;
    wallClientId: string | null;
    column: number | null;
    row: number | null;
    locationName: string | null;
    locationClientId: string | null;
  },
  importing: { wallId: string; clientId: string },
): string {
  const position = found.column && found.row ? cellLabel({ column: found.column, row: found.row }) : null;
  if (found.wallId) {
    if (found.wallId === importing.wallId) return ` on this wall at ${position}`;
    if (found.wallClientId !== importing.clientId) return ' elsewhere';
    return ` on ${found.wallName} (${found.siteName}) at ${position}`;
  }
  if (found.locationName) {
    if (found.locationClientId && found.locationClientId !== importing.clientId) return ' elsewhere';
    return `, ${statusWords[found.status]} kept at ${found.locationName}`;
  }
  return `, off any wall (${statusWords[found.status]})`;
}

// ---------------------------------------------------------------------------------------------
// CSV import: serial, column, row, batch. Every bad row is reported with its line number and
// reason; nothing is written unless the whole file is good.
// ---------------------------------------------------------------------------------------------
const MAX_IMPORT_ROWS = 50_000;
const IMPORT_CHUNK = 5000;

export async function importCabinets(actor: Actor, wallId: string, csv: string): Promise<ImportResult> {
  const wall = await visibleWall(db(), actor, wallId);
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  const headers = parsed.meta.fields ?? [];
  const missing = ['serial', 'column', 'row'].filter((h) => !headers.includes(h));
  if (missing.length) {
    throw badRequest(
      'import_bad_header',
      `The first line must name the columns serial, column, row and batch (missing: ${missing.join(', ')}).`,
    );
  }
  if (parsed.data.length === 0) throw badRequest('import_empty', 'The file has no cabinet rows.');
  if (parsed.data.length > MAX_IMPORT_ROWS)
    throw badRequest('import_too_large', `At most ${MAX_IMPORT_ROWS.toLocaleString('en')} rows per file.`);

  const errors: ImportRowError[] = [];
  const rows: { line: number; serial: string; column: number; row: number; batch: string }[] = [];
  // Line numbers count the header as line 1, as a spreadsheet shows them.
  const lineOf = (index: number) => index + 2;
  for (const error of parsed.errors) {
    if (error.row !== undefined) errors.push({ line: lineOf(error.row), message: error.message });
  }
  parsed.data.forEach((raw, index) => {
    const result = importRow.safeParse(raw);
    if (!result.success) {
      const fields = fieldErrors(result.error);
      errors.push({
        line: lineOf(index),
        serial: raw.serial,
        message: Object.entries(fields)
          .map(([k, v]) => `${k}: ${v}`)
          .join('; '),
      });
      return;
    }
    const r = result.data;
    if (r.column > wall.columns || r.row > wall.rows) {
      errors.push({
        line: lineOf(index),
        serial: r.serial,
        message: `position ${cellLabel(r)} is outside the wall’s ${wall.columns} × ${wall.rows} grid`,
      });
      return;
    }
    rows.push({ line: lineOf(index), ...r });
  });

  const bySerial = new Map<string, number>();
  const byCell = new Map<string, { line: number; serial: string }>();
  for (const r of rows) {
    const seen = bySerial.get(r.serial);
    if (seen) errors.push({ line: r.line, serial: r.serial, message: `duplicate serial: already on line ${seen}` });
    else bySerial.set(r.serial, r.line);
    const cell = `${r.column}:${r.row}`;
    const other = byCell.get(cell);
    if (other)
      errors.push({
        line: r.line,
        serial: r.serial,
        message: `two serials in one cell: ${cellLabel(r)} is also given to ${other.serial} on line ${other.line}`,
      });
    else byCell.set(cell, { line: r.line, serial: r.serial });
  }

  // Against what is already registered, saying where each serial is now.
  const serials = [...bySerial.keys()];
  for (let i = 0; i < serials.length; i += 5000) {
    const existing = await db()
      .select({
        serial: cabinets.serial,
        status: cabinets.status,
        wallId: cabinets.wallId,
        wallName: walls.name,
        siteName: sites.name,
        wallClientId: walls.clientId,
        column: cabinets.column,
        row: cabinets.row,
        locationName: stockLocations.name,
        locationClientId: stockLocations.clientId,
      })
      .from(cabinets)
      .leftJoin(walls, eq(walls.id, cabinets.wallId))
      .leftJoin(sites, eq(sites.id, walls.siteId))
      .leftJoin(stockLocations, eq(stockLocations.id, cabinets.stockLocationId))
      .where(inArray(cabinets.serial, serials.slice(i, i + 5000)));
    for (const e of existing) {
      errors.push({
        line: bySerial.get(e.serial)!,
        serial: e.serial,
        message: `duplicate serial: already registered${whereRegistered(e, { wallId, clientId: wall.clientId })}`,
      });
    }
  }
  const occupied = await db()
    .select({ serial: cabinets.serial, column: cabinets.column, row: cabinets.row })
    .from(cabinets)
    .where(eq(cabinets.wallId, wallId));
  for (const o of occupied) {
    const incoming = byCell.get(`${o.column}:${o.row}`);
    if (incoming && incoming.serial !== o.serial) {
      errors.push({
        line: incoming.line,
        serial: incoming.serial,
        message: `two serials in one cell: ${cellLabel({ column: o.column!, row: o.row! })} already holds ${o.serial}`,
      });
    }
  }

  if (errors.length) {
    errors.sort((a, b) => a.line - b.line);
    throw new AppError(
      400,
      'import_rejected',
      `${errors.length} ${errors.length === 1 ? 'row has a problem' : 'rows have problems'}; nothing was imported. Fix them and upload the file again.`,
      undefined,
      undefined,
      { errors },
    );
  }

  await db().transaction(async (tx) => {
    // Chunks stay under PostgreSQL's 65,535 bind parameters per statement.
    for (let i = 0; i < rows.length; i += IMPORT_CHUNK) {
      const chunk = rows.slice(i, i + IMPORT_CHUNK);
      const inserted = await tx
        .insert(cabinets)
        .values(
          chunk.map((r) => ({
            serial: r.serial,
            cabinetModelId: wall.cabinetModelId,
            wallId,
            column: r.column,
            row: r.row,
            batch: r.batch,
            status: 'installed' as const,
          })),
        )
        .returning({ id: cabinets.id, column: cabinets.column, row: cabinets.row });
      await tx.insert(cabinetEvents).values(
        inserted.map((c) => ({
          cabinetId: c.id,
          kind: 'imported' as const,
          toWallId: wallId,
          toColumn: c.column,
          toRow: c.row,
          toStatus: 'installed' as const,
          actorId: actor.userId,
        })),
      );
    }
    await recordAudit(tx, { actor, entity: 'wall', entityId: wallId, action: 'cabinets_imported', after: { count: rows.length } });
  });
  return { imported: rows.length, errors: [] };
}
