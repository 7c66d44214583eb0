import { and, asc, eq, ilike, inArray, isNull, notInArray, or, sql } from 'drizzle-orm';
import type { CappedList, Page } from '../../shared/schemas/common.js';
import type { ListWallsQuery, WallInput, WallPatch } from '../../shared/schemas/walls.js';
import type { WallCabinet, WallController, WallDetail, WallSummary } from '../../shared/schemas/walls.js';
import { ticketRef } from '../../shared/schemas/tickets.js';
import { db, type DbOrTx, type Tx } from '../db/client.js';
import { cabinetModels } from '../db/schema/catalogue.js';
import { clients, sites } from '../db/schema/clients.js';
import { tickets } from '../db/schema/tickets.js';
import { cabinets, controllers, walls } from '../db/schema/walls.js';
import { badRequest } from '../errors.js';
import type { Actor } from '../middleware/auth.js';
import { recordAudit } from './audit.js';
import { wallOpenTicketCount } from './counts.js';
import { presentModel } from './catalogue.js';
import { cursorValue, likePattern, orderFor } from './clients.js';
import { afterCursor, capped, decodeCursor, pageOf } from './pagination.js';
import { found, isStaff, tenantWhere } from './scope.js';

export async function listWalls(actor: Actor, query: ListWallsQuery): Promise<Page<WallSummary>> {
  const sortColumn = query.sort === 'createdAt' ? walls.createdAt : walls.name;
  const pattern = query.q ? likePattern(query.q) : undefined;
  const rows = await db()
    .select({
      id: walls.id,
      name: walls.name,
      clientId: walls.clientId,
      clientName: clients.name,
      siteId: walls.siteId,
      siteName: sites.name,
      columns: walls.columns,
      rows: walls.rows,
      mounting: walls.mounting,
      installDate: walls.installDate,
      warrantyEnd: walls.warrantyEnd,
      cabinetModelId: cabinetModels.id,
      cabinetModelName: cabinetModels.name,
      pixelPitchMm: cabinetModels.pixelPitchMm,
      createdAt: walls.createdAt,
      openTicketCount: wallOpenTicketCount,
    })
    .from(walls)
    .innerJoin(sites, eq(sites.id, walls.siteId))
    .innerJoin(clients, eq(clients.id, walls.clientId))
    .innerJoin(cabinetModels, eq(cabinetModels.id, walls.cabinetModelId))
    .where(
      and(
        tenantWhere(actor, walls.clientId),
        isNull(walls.archivedAt),
        query.clientId ? eq(walls.clientId, query.clientId) : undefined,
        query.siteId ? eq(walls.siteId, query.siteId) : undefined,
        query.cabinetModelId ? eq(walls.cabinetModelId, query.cabinetModelId) : undefined,
        pattern ? or(ilike(walls.name, pattern), ilike(sites.name, pattern), ilike(clients.name, pattern)) : undefined,
        afterCursor(sortColumn, walls.id, decodeCursor(query.cursor, 2), query.dir),
      ),
    )
    .orderBy(...orderFor(sortColumn, walls.id, query.dir))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (r) => [cursorValue(query.sort === 'name' ? r.name : r.createdAt), r.id]);
  const installed = await installedCounts(page.items.map((r) => r.id));
  return {
    items: page.items.map((r): WallSummary => ({
      id: r.id,
      name: r.name,
      clientId: r.clientId,
      clientName: r.clientName,
      siteId: r.siteId,
      siteName: r.siteName,
      columns: r.columns,
      rows: r.rows,
      cabinetCount: r.columns * r.rows,
      installedCabinets: installed.get(r.id) ?? 0,
      freePositions: Math.max(0, r.columns * r.rows - (installed.get(r.id) ?? 0)),
      mounting: r.mounting,
      installDate: r.installDate,
      warrantyEnd: r.warrantyEnd,
      cabinetModel: { id: r.cabinetModelId, name: r.cabinetModelName, pixelPitchMm: r.pixelPitchMm },
      openTicketCount: r.openTicketCount,
    })),
    nextCursor: page.nextCursor,
  };
}

/**
 * The cabinets installed on each of a page of walls: one grouped count for the page (read from
 * the wall-position index), never one count per wall.
 */
async function installedCounts(wallIds: string[]): Promise<Map<string, number>> {
  if (wallIds.length === 0) return new Map();
  const rows = await db()
    .select({ wallId: cabinets.wallId, installed: sql<number>`count(*)::int` })
    .from(cabinets)
    .where(inArray(cabinets.wallId, wallIds))
    .groupBy(cabinets.wallId);
  return new Map(rows.map((r) => [r.wallId ?? '', r.installed]));
}

/** The wall a caller may see, or 404. */
export async function visibleWall(tx: DbOrTx, actor: Actor, id: string) {
  const [wall] = await tx
    .select()
    .from(walls)
    .where(and(eq(walls.id, id), tenantWhere(actor, walls.clientId)));
  return found(wall, 'Wall');
}

export async function getWall(actor: Actor, id: string): Promise<WallDetail> {
  const [row] = await db()
    .select({ wall: walls, model: cabinetModels, siteName: sites.name, siteTimeZone: sites.timeZone, clientName: clients.name })
    .from(walls)
    .innerJoin(cabinetModels, eq(cabinetModels.id, walls.cabinetModelId))
    .innerJoin(sites, eq(sites.id, walls.siteId))
    .innerJoin(clients, eq(clients.id, walls.clientId))
    .where(and(eq(walls.id, id), tenantWhere(actor, walls.clientId)));
  const { wall, model, siteName, siteTimeZone, clientName } = found(row, 'Wall');
  const wallControllers = await db()
    .select()
    .from(controllers)
    .where(and(eq(controllers.wallId, id), isNull(controllers.archivedAt)))
    .orderBy(asc(controllers.model));
  const [counts] = await db()
    .select({
      installed: sql<number>`count(*)::int`,
      openTickets: sql<number>`(select count(*)::int from tickets t where t.wall_id = ${id} and t.status not in ('resolved','closed'))`,
    })
    .from(cabinets)
    .where(eq(cabinets.wallId, id));
  return {
    id: wall.id,
    name: wall.name,
    clientId: wall.clientId,
    clientName,
    siteId: wall.siteId,
    siteName,
    siteTimeZone,
    columns: wall.columns,
    rows: wall.rows,
    mounting: wall.mounting,
    installDate: wall.installDate,
    warrantyEnd: wall.warrantyEnd,
    calibrationDate: wall.calibrationDate,
    inputNotes: wall.inputNotes,
    ...(isStaff(actor) ? { internalNotes: wall.internalNotes } : {}),
    cabinetModel: presentModel(model),
    controllers: wallControllers.map(presentWallController),
    planSettings: wall.planSettings,
    dataRuns: wall.dataRuns,
    powerRuns: wall.powerRuns,
    installedCabinets: counts?.installed ?? 0,
    openTicketCount: counts?.openTickets ?? 0,
    archived: wall.archivedAt !== null,
  } satisfies WallDetail;
}

/** A controller as the wall page lists it. */
function presentWallController(c: typeof controllers.$inferSelect): WallController {
  return {
    id: c.id,
    model: c.model,
    serial: c.serial,
    firmware: c.firmware,
    outputs: c.outputs,
    outputsInUse: c.outputsInUse,
    pixelsPerOutput: c.pixelsPerOutput,
  };
}

async function assertModel(tx: DbOrTx, id: string | undefined) {
  if (!id) return;
  const [model] = await tx.select({ id: cabinetModels.id }).from(cabinetModels).where(eq(cabinetModels.id, id));
  if (!model) throw badRequest('validation_failed', 'That cabinet model is not in the catalogue.', { cabinetModelId: 'Unknown model.' });
}

export async function createWall(actor: Actor, input: WallInput) {
  const id = await db().transaction((tx) => insertWall(tx, actor, input));
  return getWall(actor, id);
}

/** A new wall at a site, audited, inside the caller's transaction (the planner stores a plan on it in the same one). */
export async function insertWall(tx: Tx, actor: Actor, input: WallInput): Promise<string> {
  const [site] = await tx.select({ clientId: sites.clientId }).from(sites).where(eq(sites.id, input.siteId));
  if (!site) throw badRequest('validation_failed', 'That site does not exist.', { siteId: 'Unknown site.' });
  await assertModel(tx, input.cabinetModelId);
  const [row] = await tx
    .insert(walls)
    .values({ ...input, clientId: site.clientId })
    .returning();
  await recordAudit(tx, { actor, entity: 'wall', entityId: row.id, action: 'created', after: row });
  return row.id;
}

export async function updateWall(actor: Actor, id: string, input: WallPatch) {
  await db().transaction(async (tx) => {
    const [before] = await tx.select().from(walls).where(eq(walls.id, id)).for('update');
    found(before, 'Wall');
    await assertModel(tx, input.cabinetModelId);
    const { archived, ...fields } = input;
    const [after] = await tx
      .update(walls)
      .set({ ...fields, ...(archived === undefined ? {} : { archivedAt: archived ? (before.archivedAt ?? new Date()) : null }) })
      .where(eq(walls.id, id))
      .returning();
    await recordAudit(tx, { actor, entity: 'wall', entityId: id, action: archived ? 'archived' : 'updated', before, after });
  });
  return getWall(actor, id);
}

/**
 * The most cabinets one wall map answer carries: a whole 500 × 500 grid, the largest wall
 * (walls_grid_positive). A wall never holds more, so `truncated` is a guard, not a page.
 */
export const WALL_CABINETS_CAP = 500 * 500;

/** Every cabinet on the wall, for the wall map, with how many open tickets name its cell. */
export async function wallCabinets(actor: Actor, id: string, cap = WALL_CABINETS_CAP): Promise<CappedList<WallCabinet>> {
  await visibleWall(db(), actor, id);
  const [rows, open] = await Promise.all([
    db()
      .select({
        id: cabinets.id,
        serial: cabinets.serial,
        column: cabinets.column,
        row: cabinets.row,
        batch: cabinets.batch,
        status: cabinets.status,
        installedOn: cabinets.installedOn,
      })
      .from(cabinets)
      .where(eq(cabinets.wallId, id))
      .orderBy(asc(cabinets.row), asc(cabinets.column))
      .limit(cap + 1),
    db()
      .select({ id: tickets.id, number: tickets.number, createdAt: tickets.createdAt, cells: tickets.cells })
      .from(tickets)
      .where(and(eq(tickets.wallId, id), notInArray(tickets.status, ['resolved', 'closed'])))
      .orderBy(asc(tickets.number)),
  ]);
  // The cabinet card links each of them, so the ticket is one tap from the cell.
  const perCell = new Map<string, { id: string; ref: string }[]>();
  for (const t of open) {
    for (const c of t.cells) {
      const key = `${c.column}:${c.row}`;
      perCell.set(key, [...(perCell.get(key) ?? []), { id: t.id, ref: ticketRef(t.number, t.createdAt) }]);
    }
  }
  const kept = capped(rows, cap);
  return {
    truncated: kept.truncated,
    items: kept.items.map((r): WallCabinet => ({
      id: r.id,
      serial: r.serial,
      column: r.column!,
      row: r.row!,
      batch: r.batch,
      status: r.status,
      installedOn: r.installedOn,
      openTickets: perCell.get(`${r.column}:${r.row}`)?.length ?? 0,
      openTicketRefs: perCell.get(`${r.column}:${r.row}`) ?? [],
    })),
  };
}
