// Spare stock: parts, locations, and the movement ledger whose sums are the quantities on hand.
// Every change of stock is a movement written in one transaction with the balance it changes;
// a decrease is a conditional update, so two people taking the last unit at the same moment
// cannot both get it (PostgreSQL documentation ch. 13: the second UPDATE waits for the first and
// then re-checks its condition on the new row). The balance's CHECK (>= 0) stays as the backstop.
import { and, asc, desc, eq, ilike, inArray, isNull, lt, notInArray, or, sql, type SQL } from 'drizzle-orm';
import { officeRoles } from '../../shared/schemas/enums.js';
import type { Page } from '../../shared/schemas/common.js';
import type {
  ListPartsQuery,
  ListStockLocationsQuery,
  ListStockMovementsQuery,
  ListStockQuery,
  Part,
  StockBalance,
  StockLocation,
  StockMovement,
  SpareCabinetGroup,
  StockMovementRequest,
  WallSpare,
} from '../../shared/schemas/stock.js';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import { config } from '../config.js';
import { db, type DbOrTx } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { cabinetModels } from '../db/schema/catalogue.js';
import { clients, sites } from '../db/schema/clients.js';
import { parts, reorderPoints, stockBalances, stockLocations, stockMovements } from '../db/schema/stock.js';
import { tickets } from '../db/schema/tickets.js';
import { visits, visitTechnicians } from '../db/schema/visits.js';
import { cabinets, walls } from '../db/schema/walls.js';
import { AppError, conflict, forbidden } from '../errors.js';
import { queueMail } from '../integrations/mail.js';
import { renderMail } from './mail-layout.js';
import type { Actor } from '../middleware/auth.js';
import type { z } from 'zod';
import type { partInput, partPatch, reorderPointInput, stockLocationInput, stockLocationPatch } from '../../shared/schemas/stock.js';
import { recordAudit } from './audit.js';
import { likePattern } from './clients.js';
import { checkCursor, decodeCursor, encodeCursor } from './pagination.js';
import { found } from './scope.js';

export type Tx = Parameters<Parameters<ReturnType<typeof db>['transaction']>[0]>[0];

const isOffice = (actor: Actor) => (officeRoles as readonly string[]).includes(actor.role);

/** Client users see the counts of their own site kits and nothing else of the stock. */
function locationScope(actor: Actor): SQL | undefined {
  if (actor.role !== 'client') return undefined;
  return actor.clientId ? and(eq(stockLocations.kind, 'site_kit'), eq(stockLocations.clientId, actor.clientId)) : sql`false`;
}

// ---- parts and locations ----

function presentPart(p: typeof parts.$inferSelect, modelName: string | null): Part {
  return {
    id: p.id,
    sku: p.sku,
    name: p.name,
    kind: p.kind,
    cabinetModel: p.cabinetModelId ? { id: p.cabinetModelId, name: modelName ?? '' } : null,
    leadTimeDays: p.leadTimeDays,
    archived: p.archivedAt !== null,
  };
}

export async function listParts(query: ListPartsQuery): Promise<Page<Part>> {
  const cursor = decodeCursor(query.cursor, 2, ['text', 'uuid']) as [string, string] | null;
  const rows = await db()
    .select({ part: parts, modelName: cabinetModels.name })
    .from(parts)
    .leftJoin(cabinetModels, eq(cabinetModels.id, parts.cabinetModelId))
    .where(
      and(
        isNull(parts.archivedAt),
        query.kind ? eq(parts.kind, query.kind) : undefined,
        query.cabinetModelId ? eq(parts.cabinetModelId, query.cabinetModelId) : undefined,
        query.q ? or(ilike(parts.name, likePattern(query.q)), ilike(parts.sku, likePattern(query.q))) : undefined,
        cursor ? sql`(${parts.name}, ${parts.id}) > (${cursor[0]}, ${cursor[1]}::uuid)` : undefined,
      ),
    )
    .orderBy(asc(parts.name), asc(parts.id))
    .limit(query.limit + 1);
  const more = rows.length > query.limit;
  const items = rows.slice(0, query.limit);
  const last = items[items.length - 1];
  return {
    items: items.map((r) => presentPart(r.part, r.modelName)),
    nextCursor: more && last ? encodeCursor([last.part.name, last.part.id]) : null,
  };
}

async function locationRows(where: SQL | undefined): Promise<StockLocation[]> {
  const rows = await db()
    .select({ location: stockLocations, holderName: users.name, siteName: sites.name, clientName: clients.name })
    .from(stockLocations)
    .leftJoin(users, eq(users.id, stockLocations.holderId))
    .leftJoin(sites, eq(sites.id, stockLocations.siteId))
    .leftJoin(clients, eq(clients.id, stockLocations.clientId))
    .where(where)
    .orderBy(asc(stockLocations.kind), asc(stockLocations.name));
  return rows.map((r): StockLocation => ({
    id: r.location.id,
    name: r.location.name,
    kind: r.location.kind,
    holder: r.location.holderId ? { id: r.location.holderId, name: r.holderName ?? '' } : null,
    site: r.location.siteId ? { id: r.location.siteId, name: r.siteName ?? '', clientName: r.clientName ?? '' } : null,
    archived: r.location.archivedAt !== null,
  }));
}

export async function listStockLocations(actor: Actor, query: ListStockLocationsQuery): Promise<{ items: StockLocation[] }> {
  return {
    items: await locationRows(
      and(
        locationScope(actor),
        isNull(stockLocations.archivedAt),
        query.kind ? eq(stockLocations.kind, query.kind) : undefined,
        query.siteId ? eq(stockLocations.siteId, query.siteId) : undefined,
      ),
    ),
  };
}

// ---- quantities on hand ----

/** A part on hand at a location, all batches together: what a reorder point watches. */
const partOnHandAt = (partId: AnyPgColumn, locationId: AnyPgColumn) =>
  sql<number>`(select coalesce(sum(b.quantity), 0)::int from stock_balances b where b.part_id = ${partId} and b.location_id = ${locationId})`;

const balanceColumns = {
  partId: stockBalances.partId,
  partSku: parts.sku,
  partName: parts.name,
  partKind: parts.kind,
  batch: stockBalances.batch,
  locationId: stockBalances.locationId,
  locationName: stockLocations.name,
  locationKind: stockLocations.kind,
  onHand: stockBalances.quantity,
  partOnHandHere: partOnHandAt(stockBalances.partId, stockBalances.locationId),
  reorderAt: reorderPoints.minQuantity,
};

function balancesFrom() {
  return db()
    .select(balanceColumns)
    .from(stockBalances)
    .innerJoin(parts, eq(parts.id, stockBalances.partId))
    .innerJoin(stockLocations, eq(stockLocations.id, stockBalances.locationId))
    .leftJoin(reorderPoints, and(eq(reorderPoints.partId, stockBalances.partId), eq(reorderPoints.locationId, stockBalances.locationId)));
}

/**
 * On hand per part, batch and location (the ledger's sums), by part name, batch and location.
 * Rows at zero show where a reorder point watches them; client users get their site kits only.
 */
export async function listStock(actor: Actor, query: ListStockQuery): Promise<Page<StockBalance>> {
  // The sort key, most significant first; the part and location ids make every key unique.
  const keyColumns = {
    part: [parts.name, stockBalances.batch, stockLocations.name],
    location: [stockLocations.name, parts.name, stockBalances.batch],
    onHand: [stockBalances.quantity, parts.name, stockBalances.batch, stockLocations.name],
  }[query.sort];
  const columns = [...keyColumns, stockBalances.partId, stockBalances.locationId];
  const cursor = decodeCursor(query.cursor, columns.length);
  if (cursor) checkCursor(columns, cursor);
  const tuple = sql.join(columns, sql`, `);
  const after = cursor
    ? sql`(${tuple}) ${sql.raw(query.dir === 'desc' ? '<' : '>')} (${sql.join(
        cursor.map((v, i) => (i >= columns.length - 2 ? sql`${v}::uuid` : sql`${v}`)),
        sql`, `,
      )})`
    : undefined;
  const rows = await balancesFrom()
    .where(
      and(
        locationScope(actor),
        or(sql`${stockBalances.quantity} > 0`, sql`${reorderPoints.minQuantity} is not null`),
        query.partId ? eq(stockBalances.partId, query.partId) : undefined,
        query.locationId ? eq(stockBalances.locationId, query.locationId) : undefined,
        query.batch ? sql`lower(${stockBalances.batch}) = lower(${query.batch})` : undefined,
        query.partKind ? eq(parts.kind, query.partKind) : undefined,
        query.locationKind ? eq(stockLocations.kind, query.locationKind) : undefined,
        after,
      ),
    )
    .orderBy(...columns.map((c) => (query.dir === 'desc' ? desc(c) : asc(c))))
    .limit(query.limit + 1);
  const more = rows.length > query.limit;
  const items = rows.slice(0, query.limit);
  const last = items[items.length - 1];
  const keyOf = (r: (typeof rows)[number]) => {
    const head = {
      part: [r.partName, r.batch, r.locationName],
      location: [r.locationName, r.partName, r.batch],
      onHand: [r.onHand, r.partName, r.batch, r.locationName],
    }[query.sort];
    return [...head, r.partId, r.locationId];
  };
  return { items: items.map(presentBalance), nextCursor: more && last ? encodeCursor(keyOf(last)) : null };
}

function presentBalance(r: StockBalance): StockBalance {
  return {
    partId: r.partId,
    partSku: r.partSku,
    partName: r.partName,
    partKind: r.partKind,
    batch: r.batch,
    locationId: r.locationId,
    locationName: r.locationName,
    locationKind: r.locationKind,
    onHand: r.onHand,
    partOnHandHere: r.partOnHandHere,
    reorderAt: r.reorderAt,
  };
}

/** The module batches of a wall's cabinets: what a spare for it should match. */
async function wallBatches(tx: DbOrTx, wallId: string): Promise<string[]> {
  const rows = await tx
    .selectDistinct({ batch: cabinets.batch })
    .from(cabinets)
    .where(and(eq(cabinets.wallId, wallId), sql`${cabinets.batch} <> ''`));
  return rows.map((r) => r.batch);
}

/**
 * Spares for a wall's cabinet model on hand (staff), the wall's own batches first: modules of
 * another production batch may differ in colour and brightness.
 */
export async function wallSpares(wallId: string, locationId?: string): Promise<{ wallBatches: string[]; items: WallSpare[] }> {
  const [wall] = await db().select({ modelId: walls.cabinetModelId }).from(walls).where(eq(walls.id, wallId));
  const { modelId } = found(wall, 'Wall');
  const batches = await wallBatches(db(), wallId);
  const rows = await balancesFrom()
    .where(
      and(
        eq(parts.cabinetModelId, modelId),
        sql`${stockBalances.quantity} > 0`,
        locationId ? eq(stockBalances.locationId, locationId) : undefined,
      ),
    )
    .orderBy(asc(parts.name), asc(stockBalances.batch), asc(stockLocations.name));
  const lower = new Set(batches.map((b) => b.toLowerCase()));
  const items = rows.map((r): WallSpare => ({ ...presentBalance(r), matchesWallBatch: lower.has(r.batch.toLowerCase()) }));
  // Stable: the matching batches first, each group in the order above.
  items.sort((a, b) => Number(b.matchesWallBatch) - Number(a.matchesWallBatch));
  return { wallBatches: batches, items };
}

// ---- the ledger ----

/** Movements with their part, locations and who recorded them, newest first. */
async function movementRows(where: SQL | undefined, limit: number) {
  const from = sql.raw('from_location');
  const to = sql.raw('to_location');
  const rows = await db()
    .select({
      movement: stockMovements,
      partName: parts.name,
      fromName: sql<string | null>`(select name from stock_locations ${from} where ${from}.id = ${stockMovements.fromLocationId})`,
      toName: sql<string | null>`(select name from stock_locations ${to} where ${to}.id = ${stockMovements.toLocationId})`,
      actorName: users.name,
    })
    .from(stockMovements)
    .innerJoin(parts, eq(parts.id, stockMovements.partId))
    .leftJoin(users, eq(users.id, stockMovements.actorId))
    .where(where)
    .orderBy(desc(stockMovements.id))
    .limit(limit);
  return rows.map((r) => ({ id: r.movement.id, presented: presentMovement(r.movement, r.partName, r.fromName, r.toName, r.actorName) }));
}

export async function listMovements(query: ListStockMovementsQuery): Promise<Page<StockMovement>> {
  const cursor = decodeCursor(query.cursor, 1, ['bigint']) as [number] | null;
  const rows = await movementRows(
    and(
      query.partId ? eq(stockMovements.partId, query.partId) : undefined,
      query.locationId
        ? or(eq(stockMovements.fromLocationId, query.locationId), eq(stockMovements.toLocationId, query.locationId))
        : undefined,
      query.kind ? eq(stockMovements.kind, query.kind) : undefined,
      query.batch ? sql`lower(${stockMovements.batch}) = lower(${query.batch})` : undefined,
      cursor ? lt(stockMovements.id, Number(cursor[0])) : undefined,
    ),
    query.limit + 1,
  );
  const more = rows.length > query.limit;
  const items = rows.slice(0, query.limit);
  const last = items[items.length - 1];
  return { items: items.map((r) => r.presented), nextCursor: more && last ? encodeCursor([last.id]) : null };
}

function presentMovement(
  m: typeof stockMovements.$inferSelect,
  partName: string,
  fromName: string | null,
  toName: string | null,
  actorName: string | null,
): StockMovement {
  return {
    id: m.id,
    kind: m.kind,
    partId: m.partId,
    partName,
    batch: m.batch,
    from: m.fromLocationId ? { id: m.fromLocationId, name: fromName ?? '' } : null,
    to: m.toLocationId ? { id: m.toLocationId, name: toName ?? '' } : null,
    quantity: m.quantity,
    reason: m.reason,
    wallId: m.wallId,
    batchMismatch: m.batchMismatch,
    actorName,
    createdAt: m.createdAt.toISOString(),
  };
}

/**
 * The site kits a technician is working from: those at a site where they are on a visit planned
 * or under way within a day of now, or where an open ticket is assigned to them.
 */
async function workingSiteIds(tx: DbOrTx, technicianId: string): Promise<Set<string>> {
  const onVisit = await tx
    .selectDistinct({ siteId: visits.siteId })
    .from(visits)
    .innerJoin(visitTechnicians, eq(visitTechnicians.visitId, visits.id))
    .where(
      and(
        eq(visitTechnicians.userId, technicianId),
        inArray(visits.status, ['planned', 'in_progress']),
        sql`${visits.windowStart} < now() + interval '1 day' and ${visits.windowEnd} > now() - interval '1 day'`,
      ),
    );
  const assigned = await tx
    .selectDistinct({ siteId: tickets.siteId })
    .from(tickets)
    .where(and(eq(tickets.assigneeId, technicianId), notInArray(tickets.status, ['resolved', 'closed'])));
  return new Set([...onVisit, ...assigned].map((r) => r.siteId));
}

/**
 * A technician moves stock out of their own van and out of the site kit of a site they are
 * working at, and into their own van; counts are corrected (adjustments) by the office.
 */
async function assertMayMove(tx: Tx, actor: Actor, m: StockMovementRequest) {
  if (isOffice(actor)) return;
  if (actor.role !== 'technician') throw forbidden();
  if (m.kind === 'adjustment') throw forbidden('adjustment_office_only', 'Only the office corrects stock counts.');
  const ids = [m.fromLocationId, m.toLocationId].filter((x): x is string => Boolean(x));
  const rows = await tx.select().from(stockLocations).where(inArray(stockLocations.id, ids));
  const byId = new Map(rows.map((r) => [r.id, r]));
  const ownVan = (id?: string) => Boolean(id) && byId.get(id!)?.kind === 'van' && byId.get(id!)?.holderId === actor.userId;
  const working = await workingSiteIds(tx, actor.userId);
  const workingKit = (id?: string) => {
    const l = id ? byId.get(id) : undefined;
    return l?.kind === 'site_kit' && l.siteId !== null && working.has(l.siteId);
  };
  const fromOk = !m.fromLocationId || ownVan(m.fromLocationId) || workingKit(m.fromLocationId);
  const intoOwnVan = ownVan(m.toLocationId);
  if (m.fromLocationId ? fromOk || intoOwnVan : intoOwnVan) return;
  throw forbidden(
    'stock_not_yours',
    'A technician moves stock out of their own van or the site kit of a site they are working at, and into their own van.',
  );
}

/** Refuses (403) unless the actor may take something out of the location, a part or a spare cabinet: assertMayMove's rule. */
export async function assertMayTakeFrom(tx: Tx, actor: Actor, locationId: string) {
  await assertMayMove(tx, actor, { kind: 'consumption', partId: '', batch: '', fromLocationId: locationId, quantity: 1 });
}

/** A spare taken for a wall must be of the wall's own batch, or taken knowingly. */
async function checkBatch(tx: Tx, m: StockMovementRequest): Promise<boolean> {
  if (!m.forWallId) return false;
  const batches = await wallBatches(tx, m.forWallId);
  if (!batches.length || batches.some((b) => b.toLowerCase() === m.batch.toLowerCase())) return false;
  if (m.acceptBatchMismatch) return true;
  throw new AppError(
    409,
    'batch_mismatch',
    `Batch ${m.batch || '(none)'} is not one of the wall's own (${batches.join(', ')}): its colour and brightness may differ. Take it anyway only knowingly.`,
    undefined,
    undefined,
    { wallBatches: batches },
  );
}

/** Takes `quantity` off a balance, or refuses when fewer are on hand (never below zero). */
async function takeOff(tx: Tx, m: StockMovementRequest, locationId: string) {
  const [row] = await tx
    .update(stockBalances)
    .set({ quantity: sql`${stockBalances.quantity} - ${m.quantity}`, updatedAt: new Date() })
    .where(
      and(
        eq(stockBalances.partId, m.partId),
        eq(stockBalances.batch, m.batch),
        eq(stockBalances.locationId, locationId),
        sql`${stockBalances.quantity} >= ${m.quantity}`,
      ),
    )
    .returning({ quantity: stockBalances.quantity });
  if (!row) {
    const [have] = await tx
      .select({ quantity: stockBalances.quantity })
      .from(stockBalances)
      .where(and(eq(stockBalances.partId, m.partId), eq(stockBalances.batch, m.batch), eq(stockBalances.locationId, locationId)));
    const onHand = have?.quantity ?? 0;
    throw conflict(
      'insufficient_stock',
      `Only ${onHand} of that part${m.batch ? ` (batch ${m.batch})` : ''} ${onHand === 1 ? 'is' : 'are'} on hand there; ${m.quantity} asked.`,
      { quantity: `At most ${onHand}.` },
    );
  }
}

async function putOn(tx: Tx, m: StockMovementRequest, locationId: string) {
  await tx
    .insert(stockBalances)
    .values({ partId: m.partId, batch: m.batch, locationId, quantity: m.quantity })
    .onConflictDoUpdate({
      target: [stockBalances.partId, stockBalances.batch, stockBalances.locationId],
      set: { quantity: sql`${stockBalances.quantity} + ${m.quantity}`, updatedAt: new Date() },
    });
}

/**
 * After a change at a location: falling to or below its reorder point queues one e-mail to the
 * office (once per crossing); rising above it again re-arms the alert.
 */
async function watchReorderPoint(tx: Tx, partId: string, locationId: string, movementId: number) {
  const [point] = await tx
    .select()
    .from(reorderPoints)
    .where(and(eq(reorderPoints.partId, partId), eq(reorderPoints.locationId, locationId)))
    .for('update');
  if (!point) return;
  const [total] = await tx
    .select({ onHand: sql<number>`coalesce(sum(${stockBalances.quantity}), 0)::int` })
    .from(stockBalances)
    .where(and(eq(stockBalances.partId, partId), eq(stockBalances.locationId, locationId)));
  const onHand = total?.onHand ?? 0;
  const where = and(eq(reorderPoints.partId, partId), eq(reorderPoints.locationId, locationId));
  if (onHand > point.minQuantity) {
    if (point.alertedAt) await tx.update(reorderPoints).set({ alertedAt: null }).where(where);
    return;
  }
  if (point.alertedAt) return;
  await tx.update(reorderPoints).set({ alertedAt: new Date() }).where(where);
  const [names] = await tx
    .select({ part: parts.name, sku: parts.sku, location: stockLocations.name })
    .from(parts)
    .innerJoin(stockLocations, eq(stockLocations.id, locationId))
    .where(eq(parts.id, partId));
  await queueMail(tx, {
    to: [config().OFFICE_EMAIL],
    subject: `Low stock: ${names.part} at ${names.location} (${onHand} left)`,
    ...renderMail({
      preview: `${names.part} at ${names.location}: ${onHand} left. Reorder ${point.reorderQuantity}.`,
      heading: `Low stock: ${names.part}`,
      paragraphs: [
        `${names.part} (${names.sku}) at ${names.location} is down to ${onHand}, at or below its reorder point of ${point.minQuantity}.`,
      ],
      facts: [
        { label: 'Part', value: `${names.part} (${names.sku})` },
        { label: 'Location', value: names.location },
        { label: 'On hand', value: String(onHand) },
        { label: 'Reorder point', value: String(point.minQuantity) },
        { label: 'Reorder', value: String(point.reorderQuantity) },
      ],
      action: {
        label: 'Open the stock',
        url: `${config().APP_URL}/stock?${new URLSearchParams({ locationId, partId })}`,
      },
    }),
    dedupeKey: `low-stock:${partId}:${locationId}:${movementId}`,
  });
}

/**
 * Writes one movement in the caller's transaction: the actor's right to move it, the batch
 * check, the balances it changes (never below zero) and the reorder points it crosses.
 */
export async function applyMovement(
  tx: Tx,
  actor: Actor,
  m: StockMovementRequest,
  links: { vendorReturnId?: string; repairId?: string } = {},
): Promise<number> {
  await assertMayMove(tx, actor, m);
  const [part] = await tx.select({ id: parts.id }).from(parts).where(eq(parts.id, m.partId));
  found(part, 'Part');
  const batchMismatch = await checkBatch(tx, m);
  if (m.fromLocationId) await takeOff(tx, m, m.fromLocationId);
  if (m.toLocationId) await putOn(tx, m, m.toLocationId);
  const [row] = await tx
    .insert(stockMovements)
    .values({
      partId: m.partId,
      batch: m.batch,
      kind: m.kind,
      fromLocationId: m.fromLocationId ?? null,
      toLocationId: m.toLocationId ?? null,
      quantity: m.quantity,
      reason: m.reason ?? '',
      wallId: m.forWallId ?? null,
      vendorReturnId: links.vendorReturnId ?? null,
      repairId: links.repairId ?? null,
      batchMismatch,
      actorId: actor.userId,
    })
    .returning({ id: stockMovements.id });
  for (const locationId of [m.fromLocationId, m.toLocationId]) if (locationId) await watchReorderPoint(tx, m.partId, locationId, row.id);
  return row.id;
}

/** Records one movement and changes the balances it moves, in one transaction. */
export async function recordMovement(actor: Actor, m: StockMovementRequest): Promise<StockMovement> {
  const id = await db().transaction((tx) => applyMovement(tx, actor, m));
  const [row] = await movementRows(eq(stockMovements.id, id), 1);
  return row.presented;
}

/** Reorder points at or below their mark: the office's low-stock list. */
export async function lowStock(): Promise<{ items: (StockBalance & { reorderQuantity: number })[] }> {
  const rows = await db()
    .select({
      partId: reorderPoints.partId,
      partSku: parts.sku,
      partName: parts.name,
      partKind: parts.kind,
      locationId: reorderPoints.locationId,
      locationName: stockLocations.name,
      locationKind: stockLocations.kind,
      minQuantity: reorderPoints.minQuantity,
      reorderQuantity: reorderPoints.reorderQuantity,
      onHand: partOnHandAt(reorderPoints.partId, reorderPoints.locationId),
    })
    .from(reorderPoints)
    .innerJoin(parts, eq(parts.id, reorderPoints.partId))
    .innerJoin(stockLocations, eq(stockLocations.id, reorderPoints.locationId))
    .where(sql`${partOnHandAt(reorderPoints.partId, reorderPoints.locationId)} <= ${reorderPoints.minQuantity}`)
    .orderBy(asc(parts.name), asc(stockLocations.name));
  return {
    items: rows.map((r) => ({
      partId: r.partId,
      partSku: r.partSku,
      partName: r.partName,
      partKind: r.partKind,
      batch: '',
      locationId: r.locationId,
      locationName: r.locationName,
      locationKind: r.locationKind,
      onHand: r.onHand,
      partOnHandHere: r.onHand,
      reorderAt: r.minQuantity,
      reorderQuantity: r.reorderQuantity,
    })),
  };
}

// ---- the office's records: parts, locations, reorder points ----

export async function getPart(id: string): Promise<Part> {
  const [row] = await db()
    .select({ part: parts, modelName: cabinetModels.name })
    .from(parts)
    .leftJoin(cabinetModels, eq(cabinetModels.id, parts.cabinetModelId))
    .where(eq(parts.id, id));
  const r = found(row, 'Part');
  return presentPart(r.part, r.modelName);
}

export async function createPart(actor: Actor, input: z.output<typeof partInput>): Promise<Part> {
  const id = await db().transaction(async (tx) => {
    const [row] = await tx
      .insert(parts)
      .values({
        sku: input.sku,
        name: input.name,
        kind: input.kind,
        cabinetModelId: input.cabinetModelId ?? null,
        leadTimeDays: input.leadTimeDays,
      })
      .returning();
    await recordAudit(tx, { actor, entity: 'part', entityId: row.id, action: 'created', after: row });
    return row.id;
  });
  return getPart(id);
}

export async function updatePart(actor: Actor, id: string, patch: z.output<typeof partPatch>): Promise<Part> {
  await db().transaction(async (tx) => {
    const [before] = await tx.select().from(parts).where(eq(parts.id, id)).for('update');
    found(before, 'Part');
    const { archived, ...fields } = patch;
    const [after] = await tx
      .update(parts)
      .set({
        ...fields,
        ...(archived === undefined ? {} : { archivedAt: archived ? (before.archivedAt ?? new Date()) : null }),
        updatedAt: new Date(),
      })
      .where(eq(parts.id, id))
      .returning();
    await recordAudit(tx, { actor, entity: 'part', entityId: id, action: archived ? 'archived' : 'updated', before, after });
  });
  return getPart(id);
}

async function getLocation(id: string): Promise<StockLocation> {
  const [location] = await locationRows(eq(stockLocations.id, id));
  return found(location, 'Stock location');
}

export async function createStockLocation(actor: Actor, input: z.output<typeof stockLocationInput>): Promise<StockLocation> {
  const id = await db().transaction(async (tx) => {
    let clientId: string | null = null;
    if (input.siteId) {
      const [site] = await tx.select({ clientId: sites.clientId }).from(sites).where(eq(sites.id, input.siteId));
      clientId = found(site, 'Site').clientId;
    }
    const [row] = await tx
      .insert(stockLocations)
      .values({ name: input.name, kind: input.kind, holderId: input.holderId ?? null, siteId: input.siteId ?? null, clientId })
      .returning();
    await recordAudit(tx, { actor, entity: 'stock_location', entityId: row.id, action: 'created', after: row });
    return row.id;
  });
  return getLocation(id);
}

export async function updateStockLocation(actor: Actor, id: string, patch: z.output<typeof stockLocationPatch>): Promise<StockLocation> {
  await db().transaction(async (tx) => {
    const [before] = await tx.select().from(stockLocations).where(eq(stockLocations.id, id)).for('update');
    found(before, 'Stock location');
    const { archived, ...fields } = patch;
    const [after] = await tx
      .update(stockLocations)
      .set({
        ...fields,
        ...(archived === undefined ? {} : { archivedAt: archived ? (before.archivedAt ?? new Date()) : null }),
        updatedAt: new Date(),
      })
      .where(eq(stockLocations.id, id))
      .returning();
    await recordAudit(tx, { actor, entity: 'stock_location', entityId: id, action: archived ? 'archived' : 'updated', before, after });
  });
  return getLocation(id);
}

/** Sets a part's reorder point at a location; the alert re-arms so the new mark is watched from now on. */
export async function setReorderPoint(actor: Actor, input: z.output<typeof reorderPointInput>) {
  await db().transaction(async (tx) => {
    await tx
      .insert(reorderPoints)
      .values({ ...input, alertedAt: null })
      .onConflictDoUpdate({
        target: [reorderPoints.partId, reorderPoints.locationId],
        set: { minQuantity: input.minQuantity, reorderQuantity: input.reorderQuantity, alertedAt: null },
      });
    await recordAudit(tx, { actor, entity: 'reorder_point', entityId: input.partId, action: 'updated', after: input });
  });
  return { ...input };
}

export async function removeReorderPoint(actor: Actor, partId: string, locationId: string) {
  await db().transaction(async (tx) => {
    await tx.delete(reorderPoints).where(and(eq(reorderPoints.partId, partId), eq(reorderPoints.locationId, locationId)));
    await recordAudit(tx, { actor, entity: 'reorder_point', entityId: partId, action: 'deleted', before: { partId, locationId } });
  });
}

/**
 * Whole spare cabinets on the shelves (status `spare`, kept at a location), counted by model,
 * batch and location beside the parts; client users see those in their own site kits.
 */
export async function spareCabinets(actor: Actor, locationId?: string): Promise<{ items: SpareCabinetGroup[] }> {
  const rows = await db()
    .select({
      modelId: cabinetModels.id,
      modelName: cabinetModels.name,
      batch: cabinets.batch,
      locationId: stockLocations.id,
      locationName: stockLocations.name,
      locationKind: stockLocations.kind,
      count: sql<number>`count(*)::int`,
      cabinets: sql<
        { id: string; serial: string }[]
      >`json_agg(json_build_object('id', ${cabinets.id}, 'serial', ${cabinets.serial}) order by ${cabinets.serial})`,
    })
    .from(cabinets)
    .innerJoin(cabinetModels, eq(cabinetModels.id, cabinets.cabinetModelId))
    .innerJoin(stockLocations, eq(stockLocations.id, cabinets.stockLocationId))
    .where(and(eq(cabinets.status, 'spare'), locationScope(actor), locationId ? eq(cabinets.stockLocationId, locationId) : undefined))
    .groupBy(cabinetModels.id, cabinetModels.name, cabinets.batch, stockLocations.id, stockLocations.name, stockLocations.kind)
    .orderBy(asc(cabinetModels.name), asc(cabinets.batch), asc(stockLocations.name));
  return {
    items: rows.map((r) => ({
      cabinetModel: { id: r.modelId, name: r.modelName },
      batch: r.batch,
      location: { id: r.locationId, name: r.locationName, kind: r.locationKind },
      count: r.count,
      cabinets: r.cabinets,
    })),
  };
}
