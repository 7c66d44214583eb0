import { eq, inArray } from 'drizzle-orm';
import { cellLabel } from '../../shared/calc/grid.js';
import { ticketRef } from '../../shared/schemas/tickets.js';
import type { AuditRecordRef } from '../../shared/schemas/users.js';
import { db, type DbOrTx } from '../db/client.js';
import { auditEvents, users } from '../db/schema/accounts.js';
import { cabinetModels } from '../db/schema/catalogue.js';
import { clients, contacts, servicePlans, sites } from '../db/schema/clients.js';
import { attachments } from '../db/schema/files.js';
import { parts, stockLocations, vendorReturns } from '../db/schema/stock.js';
import { ticketComments, tickets } from '../db/schema/tickets.js';
import { repairs, visits } from '../db/schema/visits.js';
import { cabinets, controllers, maintenancePlans, walls } from '../db/schema/walls.js';
import type { Actor } from '../middleware/auth.js';

const secretKeys = new Set(['passwordHash', 'tokenHash', 'password']);

/** Copies a record for the log: dates as ISO strings, secrets dropped. */
function snapshot(value: unknown): unknown {
  if (value === null || value === undefined) return null;
  if (value instanceof Date) return value.toISOString();
  if (Array.isArray(value)) return value.map(snapshot);
  if (typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) if (!secretKeys.has(k)) out[k] = snapshot(v);
    return out;
  }
  return value;
}

/** Keeps only what changed between two snapshots of a record (both sides). */
function changedOnly(before: Record<string, unknown>, after: Record<string, unknown>) {
  const b: Record<string, unknown> = {};
  const a: Record<string, unknown> = {};
  for (const key of new Set([...Object.keys(before), ...Object.keys(after)])) {
    if (key === 'updatedAt') continue;
    if (JSON.stringify(before[key]) !== JSON.stringify(after[key])) {
      b[key] = before[key];
      a[key] = after[key];
    }
  }
  return { before: b, after: a };
}

export interface AuditInput {
  actor: Actor | null;
  entity: string;
  entityId: string;
  action: string;
  before?: unknown;
  after?: unknown;
  requestId?: string;
}

/**
 * Records one change, in the caller's transaction so the log and the change land together.
 * Updates keep only the fields that changed.
 */
export async function recordAudit(tx: DbOrTx, input: AuditInput) {
  let before = snapshot(input.before);
  let after = snapshot(input.after);
  if (before && after && typeof before === 'object' && typeof after === 'object' && !Array.isArray(before)) {
    ({ before, after } = changedOnly(before as Record<string, unknown>, after as Record<string, unknown>));
  }
  await tx.insert(auditEvents).values({
    actorId: input.actor?.userId ?? null,
    entity: input.entity,
    entityId: input.entityId,
    action: input.action,
    before,
    after,
    requestId: input.requestId ?? input.actor?.requestId ?? null,
  });
}

// ---- reading: the log names its records ----

/** The kinds of record the log can name. */
type Kind =
  | 'client'
  | 'site'
  | 'wall'
  | 'cabinet'
  | 'ticket'
  | 'visit'
  | 'part'
  | 'stock_location'
  | 'user'
  | 'cabinet_model'
  | 'controller'
  | 'contact'
  | 'repair'
  | 'maintenance_plan'
  | 'vendor_return'
  | 'attachment'
  | 'comment'
  | 'service_plan';

/** An event's entity → the kind of record its id is (a reorder point is logged under its part's id). */
const entityKinds: Record<string, Kind> = {
  client: 'client',
  site: 'site',
  wall: 'wall',
  cabinet: 'cabinet',
  ticket: 'ticket',
  visit: 'visit',
  part: 'part',
  reorder_point: 'part',
  stock_location: 'stock_location',
  user: 'user',
  cabinet_model: 'cabinet_model',
  controller: 'controller',
  contact: 'contact',
  repair: 'repair',
  maintenance_plan: 'maintenance_plan',
  vendor_return: 'vendor_return',
  attachment: 'attachment',
};

/** A changed field that holds another record's id → the kind of that record. */
const referenceKinds: Record<string, Kind> = {
  clientId: 'client',
  siteId: 'site',
  wallId: 'wall',
  fromWallId: 'wall',
  toWallId: 'wall',
  cabinetId: 'cabinet',
  otherCabinetId: 'cabinet',
  replacementCabinetId: 'cabinet',
  ticketId: 'ticket',
  mergedIntoId: 'ticket',
  visitId: 'visit',
  partId: 'part',
  stockLocationId: 'stock_location',
  locationId: 'stock_location',
  fromLocationId: 'stock_location',
  toLocationId: 'stock_location',
  backToLocationId: 'stock_location',
  holderId: 'user',
  assigneeId: 'user',
  reporterId: 'user',
  authorId: 'user',
  uploadedById: 'user',
  technicianId: 'user',
  technicianIds: 'user',
  cabinetModelId: 'cabinet_model',
  controllerId: 'controller',
  repairId: 'repair',
  maintenancePlanId: 'maintenance_plan',
  vendorReturnId: 'vendor_return',
  commentId: 'comment',
  servicePlanId: 'service_plan',
};

/**
 * Never shown, whatever an older row holds: secrets, where files sit in storage, and the
 * record's own id and timestamps (the log's row says which record and when).
 */
const hiddenFields = new Set([...secretKeys, 'storageKey', 'signatureKey', 'reportKey', 'id', 'createdAt', 'updatedAt']);

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const isUuid = (v: unknown): v is string => typeof v === 'string' && uuidPattern.test(v);

type Named = [id: string, ref: AuditRecordRef];
type Resolver = (ids: string[]) => Promise<Named[]>;

const dayIn = (at: Date, timeZone: string) =>
  new Intl.DateTimeFormat('en-GB', { timeZone, day: 'numeric', month: 'short', year: 'numeric' }).format(at);
const snippet = (text: string, max = 60) => (text.length > max ? `${text.slice(0, max - 1).trimEnd()}…` : text);
const locationKindWords: Record<string, string> = { warehouse: 'Warehouse', van: 'Van', site_kit: 'Site kit' };

/** One query per kind of record, for every id of that kind on the page. */
const resolvers: Record<Kind, Resolver> = {
  client: async (ids) =>
    (await db().select({ id: clients.id, name: clients.name }).from(clients).where(inArray(clients.id, ids))).map((r) => [
      r.id,
      { name: r.name, context: null, page: { kind: 'client', id: r.id } },
    ]),
  site: async (ids) =>
    (
      await db()
        .select({ id: sites.id, name: sites.name, clientName: clients.name })
        .from(sites)
        .innerJoin(clients, eq(clients.id, sites.clientId))
        .where(inArray(sites.id, ids))
    ).map((r) => [r.id, { name: r.name, context: r.clientName, page: { kind: 'site', id: r.id } }]),
  wall: async (ids) =>
    (
      await db()
        .select({ id: walls.id, name: walls.name, siteName: sites.name })
        .from(walls)
        .innerJoin(sites, eq(sites.id, walls.siteId))
        .where(inArray(walls.id, ids))
    ).map((r) => [r.id, { name: r.name, context: r.siteName, page: { kind: 'wall', id: r.id } }]),
  cabinet: async (ids) =>
    (
      await db()
        .select({ id: cabinets.id, serial: cabinets.serial, column: cabinets.column, row: cabinets.row, wallName: walls.name })
        .from(cabinets)
        .leftJoin(walls, eq(walls.id, cabinets.wallId))
        .where(inArray(cabinets.id, ids))
    ).map((r) => [
      r.id,
      {
        name: r.serial,
        context: r.wallName && r.column && r.row ? `${r.wallName}, ${cellLabel({ column: r.column, row: r.row })}` : null,
        page: { kind: 'cabinet', serial: r.serial },
      },
    ]),
  ticket: async (ids) =>
    (
      await db()
        .select({ id: tickets.id, number: tickets.number, createdAt: tickets.createdAt, title: tickets.title })
        .from(tickets)
        .where(inArray(tickets.id, ids))
    ).map((r) => [r.id, { name: ticketRef(r.number, r.createdAt), context: r.title, page: { kind: 'ticket', id: r.id } }]),
  visit: async (ids) =>
    (
      await db()
        .select({ id: visits.id, windowStart: visits.windowStart, siteName: sites.name, timeZone: sites.timeZone })
        .from(visits)
        .innerJoin(sites, eq(sites.id, visits.siteId))
        .where(inArray(visits.id, ids))
    ).map((r) => [r.id, { name: `Visit to ${r.siteName}`, context: dayIn(r.windowStart, r.timeZone), page: { kind: 'visit', id: r.id } }]),
  part: async (ids) =>
    (await db().select({ id: parts.id, sku: parts.sku, name: parts.name }).from(parts).where(inArray(parts.id, ids))).map((r) => [
      r.id,
      { name: r.name, context: r.sku, page: { kind: 'part', id: r.id } },
    ]),
  stock_location: async (ids) =>
    (
      await db()
        .select({ id: stockLocations.id, name: stockLocations.name, kind: stockLocations.kind })
        .from(stockLocations)
        .where(inArray(stockLocations.id, ids))
    ).map((r) => [r.id, { name: r.name, context: locationKindWords[r.kind] ?? null, page: { kind: 'stock_location', id: r.id } }]),
  user: async (ids) =>
    (await db().select({ id: users.id, name: users.name, email: users.email }).from(users).where(inArray(users.id, ids))).map((r) => [
      r.id,
      { name: r.name, context: r.email, page: { kind: 'user', email: r.email } },
    ]),
  cabinet_model: async (ids) =>
    (await db().select({ id: cabinetModels.id, name: cabinetModels.name }).from(cabinetModels).where(inArray(cabinetModels.id, ids))).map(
      (r) => [r.id, { name: r.name, context: null, page: { kind: 'catalogue', tab: 'models' } }],
    ),
  controller: async (ids) =>
    (
      await db()
        .select({ id: controllers.id, model: controllers.model, serial: controllers.serial })
        .from(controllers)
        .where(inArray(controllers.id, ids))
    ).map((r) => [r.id, { name: r.serial, context: r.model, page: { kind: 'catalogue', tab: 'controllers' } }]),
  contact: async (ids) =>
    (
      await db()
        .select({ id: contacts.id, name: contacts.name, clientId: contacts.clientId, clientName: clients.name })
        .from(contacts)
        .innerJoin(clients, eq(clients.id, contacts.clientId))
        .where(inArray(contacts.id, ids))
    ).map((r) => [r.id, { name: r.name, context: r.clientName, page: { kind: 'client', id: r.clientId } }]),
  repair: async (ids) =>
    (
      await db()
        .select({
          id: repairs.id,
          column: repairs.column,
          row: repairs.row,
          visitId: repairs.visitId,
          ticketId: repairs.ticketId,
          wallId: repairs.wallId,
          wallName: walls.name,
        })
        .from(repairs)
        .innerJoin(walls, eq(walls.id, repairs.wallId))
        .where(inArray(repairs.id, ids))
    ).map((r) => [
      r.id,
      {
        name: `Repair at ${cellLabel(r)}`,
        context: r.wallName,
        page: r.visitId
          ? { kind: 'visit', id: r.visitId }
          : r.ticketId
            ? { kind: 'ticket', id: r.ticketId }
            : { kind: 'wall', id: r.wallId },
      },
    ]),
  maintenance_plan: async (ids) =>
    (
      await db()
        .select({ id: maintenancePlans.id, wallId: walls.id, wallName: walls.name })
        .from(maintenancePlans)
        .innerJoin(walls, eq(walls.id, maintenancePlans.wallId))
        .where(inArray(maintenancePlans.id, ids))
    ).map((r) => [r.id, { name: `Maintenance of ${r.wallName}`, context: null, page: { kind: 'wall', id: r.wallId } }]),
  vendor_return: async (ids) =>
    (
      await db()
        .select({ id: vendorReturns.id, rma: vendorReturns.rmaReference, serial: vendorReturns.serial, partName: parts.name })
        .from(vendorReturns)
        .innerJoin(parts, eq(parts.id, vendorReturns.partId))
        .where(inArray(vendorReturns.id, ids))
    ).map((r) => [
      r.id,
      {
        name: `Return of ${r.partName}`,
        context: [r.serial, r.rma && `RMA ${r.rma}`].filter(Boolean).join(', ') || null,
        page: { kind: 'vendor_returns' },
      },
    ]),
  attachment: async (ids) =>
    (
      await db()
        .select({
          id: attachments.id,
          fileName: attachments.fileName,
          wallId: attachments.wallId,
          ticketId: attachments.ticketId,
          visitId: attachments.visitId,
        })
        .from(attachments)
        .where(inArray(attachments.id, ids))
    ).map((r) => [
      r.id,
      {
        name: r.fileName,
        context: null,
        page: r.ticketId
          ? { kind: 'ticket', id: r.ticketId }
          : r.visitId
            ? { kind: 'visit', id: r.visitId }
            : r.wallId
              ? { kind: 'wall', id: r.wallId }
              : null,
      },
    ]),
  comment: async (ids) =>
    (
      await db()
        .select({
          id: ticketComments.id,
          body: ticketComments.body,
          ticketId: tickets.id,
          number: tickets.number,
          createdAt: tickets.createdAt,
        })
        .from(ticketComments)
        .innerJoin(tickets, eq(tickets.id, ticketComments.ticketId))
        .where(inArray(ticketComments.id, ids))
    ).map((r) => [
      r.id,
      { name: `“${snippet(r.body)}”`, context: ticketRef(r.number, r.createdAt), page: { kind: 'ticket', id: r.ticketId } },
    ]),
  service_plan: async (ids) =>
    (await db().select({ id: servicePlans.id, name: servicePlans.name }).from(servicePlans).where(inArray(servicePlans.id, ids))).map(
      (r) => [r.id, { name: r.name, context: null, page: null }],
    ),
};

/** A snapshot as the log shows it: an object without the hidden fields; anything else as it is. */
function shown(value: unknown): unknown {
  if (!value || typeof value !== 'object' || Array.isArray(value)) return value;
  return Object.fromEntries(Object.entries(value).filter(([key]) => !hiddenFields.has(key)));
}

/** The ids a snapshot's reference fields hold, by kind. */
function referencesIn(value: unknown, into: Map<Kind, Set<string>>) {
  if (!value || typeof value !== 'object' || Array.isArray(value)) return;
  for (const [key, v] of Object.entries(value)) {
    const kind = referenceKinds[key];
    if (!kind) continue;
    for (const id of Array.isArray(v) ? v : [v]) if (isUuid(id)) add(into, kind, id);
  }
}

function add(into: Map<Kind, Set<string>>, kind: Kind, id: string) {
  const ids = into.get(kind) ?? new Set<string>();
  ids.add(id);
  into.set(kind, ids);
}

/** A ticket's snapshot names it by its reference; a partial one without its opening time, by its number. */
function ticketNameIn(s: Record<string, unknown>): string | null {
  if (typeof s.number !== 'number') return null;
  return typeof s.createdAt === 'string' && !Number.isNaN(Date.parse(s.createdAt))
    ? ticketRef(s.number, s.createdAt)
    : `Ticket ${s.number}`;
}

/** What a removed record's last snapshot still says it was called. */
function nameFromSnapshot(snapshot: unknown): AuditRecordRef | null {
  if (!snapshot || typeof snapshot !== 'object') return null;
  const s = snapshot as Record<string, unknown>;
  const name = [s.name, s.serial, s.fileName, ticketNameIn(s)].find((v): v is string => typeof v === 'string' && v.length > 0);
  return name ? { name, context: null, page: null } : null;
}

export interface StoredAuditEvent {
  entity: string;
  entityId: string;
  before: unknown;
  after: unknown;
}

export interface NamedAuditEvent {
  record: AuditRecordRef | null;
  before: unknown;
  after: unknown;
  references: Record<string, AuditRecordRef>;
}

/**
 * Names a page of the log: each event's record (a client's name, a cabinet's serial, a
 * ticket's reference…) with its page, and the records its changed fields point at. One query
 * per kind of record on the page. A record since removed keeps the name its snapshot holds.
 */
export async function nameAuditEvents(events: StoredAuditEvent[]): Promise<NamedAuditEvent[]> {
  const wanted = new Map<Kind, Set<string>>();
  for (const e of events) {
    const kind = entityKinds[e.entity];
    if (kind && isUuid(e.entityId)) add(wanted, kind, e.entityId);
    referencesIn(e.before, wanted);
    referencesIn(e.after, wanted);
  }
  const named = new Map<string, AuditRecordRef>();
  const found = await Promise.all(
    [...wanted].map(([kind, ids]) => resolvers[kind]([...ids]).then((rows) => rows.map((r) => [kind, r] as const))),
  );
  for (const [kind, [id, ref]] of found.flat()) named.set(`${kind}:${id}`, ref);

  return events.map((e) => {
    const kind = entityKinds[e.entity];
    const record = (kind && named.get(`${kind}:${e.entityId}`)) || nameFromSnapshot(e.before) || nameFromSnapshot(e.after);
    const references: Record<string, AuditRecordRef> = {};
    const mine = new Map<Kind, Set<string>>();
    referencesIn(e.before, mine);
    referencesIn(e.after, mine);
    for (const [k, ids] of mine)
      for (const id of ids) {
        const ref = named.get(`${k}:${id}`);
        if (ref) references[id] = ref;
      }
    return { record, before: shown(e.before), after: shown(e.after), references };
  });
}
