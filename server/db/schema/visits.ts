import { sql } from 'drizzle-orm';
import { boolean, check, foreignKey, index, integer, jsonb, pgTable, primaryKey, text, uuid } from 'drizzle-orm/pg-core';
import { at, createdAt, updatedAt } from './columns.js';
import { removedPartFateEnum, repairActionEnum, repairComponentEnum, repairFaultEnum, visitKindEnum, visitStatusEnum } from './enums.js';
import { clients, sites } from './clients.js';
import { users } from './accounts.js';
import { cabinets, maintenancePlans, walls } from './walls.js';
import { tickets } from './tickets.js';
import { parts, stockLocations } from './stock.js';

export interface ChecklistItem {
  label: string;
  done: boolean;
  note?: string;
}

/** A technician's trip to a site, for a ticket or for planned maintenance. */
export const visits = pgTable(
  'visits',
  {
    id: uuid().primaryKey().defaultRandom(),
    clientId: uuid().notNull(),
    siteId: uuid().notNull(),
    wallId: uuid().references(() => walls.id, { onDelete: 'set null' }),
    ticketId: uuid().references(() => tickets.id, { onDelete: 'set null' }),
    maintenancePlanId: uuid().references(() => maintenancePlans.id, { onDelete: 'set null' }),
    kind: visitKindEnum().notNull(),
    status: visitStatusEnum().notNull().default('planned'),
    windowStart: at().notNull(),
    windowEnd: at().notNull(),
    checklist: jsonb()
      .$type<ChecklistItem[]>()
      .notNull()
      .default(sql`'[]'::jsonb`),
    /** Shown to the client in the visit report. */
    summary: text().notNull().default(''),
    internalNotes: text().notNull().default(''),
    /** Bumped on each move, reassignment or cancellation the invitees hear of: the invitation's SEQUENCE (RFC 5545). */
    sequence: integer().notNull().default(0),
    cancelReason: text().notNull().default(''),
    cancelledAt: at(),
    signedByName: text(),
    signedAt: at(),
    /** The signature pad's PNG in object storage. */
    signatureKey: text(),
    /** Why no one signed, when no one could. */
    unsignedReason: text(),
    /** The visit report PDF in object storage, kept once made. */
    reportKey: text(),
    reportSentAt: at(),
    startedAt: at(),
    completedAt: at(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    foreignKey({ name: 'visits_site_client_fk', columns: [t.siteId, t.clientId], foreignColumns: [sites.id, sites.clientId] }),
    foreignKey({ name: 'visits_client_fk', columns: [t.clientId], foreignColumns: [clients.id] }),
    index('visits_client_idx').on(t.clientId),
    index('visits_site_idx').on(t.siteId),
    index('visits_wall_idx').on(t.wallId),
    index('visits_ticket_idx').on(t.ticketId),
    index('visits_maintenance_plan_idx').on(t.maintenancePlanId),
    index('visits_window_idx').on(t.windowStart),
    check('visits_window_order', sql`${t.windowStart} < ${t.windowEnd}`),
  ],
);

export const visitTechnicians = pgTable(
  'visit_technicians',
  {
    visitId: uuid()
      .notNull()
      .references(() => visits.id, { onDelete: 'cascade' }),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'restrict' }),
  },
  (t) => [primaryKey({ name: 'visit_technicians_pk', columns: [t.visitId, t.userId] }), index('visit_technicians_user_idx').on(t.userId)],
);

/** One line of work on one wall. */
export const repairs = pgTable(
  'repairs',
  {
    id: uuid().primaryKey().defaultRandom(),
    clientId: uuid().notNull(),
    wallId: uuid().notNull(),
    visitId: uuid().references(() => visits.id, { onDelete: 'set null' }),
    ticketId: uuid().references(() => tickets.id, { onDelete: 'set null' }),
    cabinetId: uuid().references(() => cabinets.id, { onDelete: 'set null' }),
    column: integer().notNull(),
    row: integer().notNull(),
    component: repairComponentEnum().notNull(),
    /** Module position inside the cabinet (1-based, as seen from the audience) for module work. */
    moduleColumn: integer(),
    moduleRow: integer(),
    fault: repairFaultEnum().notNull(),
    action: repairActionEnum().notNull(),
    partId: uuid().references(() => parts.id, { onDelete: 'restrict' }),
    partBatch: text(),
    fromLocationId: uuid().references(() => stockLocations.id, { onDelete: 'restrict' }),
    removedPartFate: removedPartFateEnum().notNull().default('none'),
    /** A cabinet swap's spare cabinet that took the position. */
    replacementCabinetId: uuid().references(() => cabinets.id, { onDelete: 'set null' }),
    /** The spare fitted was of another batch than the wall's, and the technician accepted it. */
    batchMismatch: boolean().notNull().default(false),
    notes: text().notNull().default(''),
    technicianId: uuid().references(() => users.id, { onDelete: 'set null' }),
    performedAt: at().notNull().defaultNow(),
    createdAt: createdAt(),
  },
  (t) => [
    foreignKey({ name: 'repairs_wall_client_fk', columns: [t.wallId, t.clientId], foreignColumns: [walls.id, walls.clientId] }),
    index('repairs_client_idx').on(t.clientId),
    index('repairs_wall_idx').on(t.wallId, t.performedAt),
    index('repairs_visit_idx').on(t.visitId),
    index('repairs_ticket_idx').on(t.ticketId),
    index('repairs_cabinet_idx').on(t.cabinetId),
    index('repairs_part_idx').on(t.partId),
    index('repairs_from_location_idx').on(t.fromLocationId),
    index('repairs_technician_idx').on(t.technicianId),
    index('repairs_replacement_cabinet_idx').on(t.replacementCabinetId),
    check('repairs_position_positive', sql`${t.column} >= 1 and ${t.row} >= 1`),
    check(
      'repairs_module_position',
      sql`(${t.moduleColumn} is null or ${t.moduleColumn} >= 1) and (${t.moduleRow} is null or ${t.moduleRow} >= 1)`,
    ),
    check('repairs_part_with_location', sql`(${t.partId} is null) = (${t.fromLocationId} is null)`),
  ],
);

/**
 * A write sent with an `Idempotency-Key` header: the first request's answer, kept so the same key
 * again returns it and writes nothing (a double tap, a retry after a lost answer, a phone's queue).
 * The key is the sender's own, so it is unique per user.
 */
export const idempotentRequests = pgTable(
  'idempotent_requests',
  {
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    key: text().notNull(),
    /** `POST /api/repairs`: a key used on one route cannot be replayed on another. */
    route: text().notNull(),
    /** SHA-256 of the request body: the same key with another body is refused. */
    requestHash: text().notNull(),
    statusCode: integer().notNull(),
    response: jsonb().notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    primaryKey({ name: 'idempotent_requests_pk', columns: [t.userId, t.key] }),
    index('idempotent_requests_created_idx').on(t.createdAt),
  ],
);
