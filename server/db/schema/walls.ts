import { sql } from 'drizzle-orm';
import { boolean, check, date, foreignKey, index, integer, jsonb, pgTable, text, unique, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { at, createdAt, updatedAt } from './columns.js';
import { cabinetEventKindEnum, cabinetStatusEnum, mountingEnum } from './enums.js';
import { clients, sites } from './clients.js';
import { users } from './accounts.js';
import { cabinetModels } from './catalogue.js';
import { stockLocations } from './stock.js';

export interface RunCell {
  column: number;
  row: number;
}
export interface StoredRun {
  index: number;
  cells: RunCell[];
  pixels?: number;
  watts?: number;
}
export interface WallRuns {
  pattern: string;
  runs: StoredRun[];
  limit: number;
}
export interface WallPlanSettings {
  supply: { voltage: number; phases: 1 | 3; breakerAmps: number; continuousFactor: number; powerFactor?: number };
  outputCapacityPixels: number;
  chainCapacityW: number;
}

export const walls = pgTable(
  'walls',
  {
    id: uuid().primaryKey().defaultRandom(),
    clientId: uuid().notNull(),
    siteId: uuid().notNull(),
    name: text().notNull(),
    cabinetModelId: uuid()
      .notNull()
      .references(() => cabinetModels.id, { onDelete: 'restrict' }),
    columns: integer().notNull(),
    rows: integer().notNull(),
    mounting: mountingEnum().notNull().default('wall_fixed'),
    installDate: date({ mode: 'string' }),
    warrantyEnd: date({ mode: 'string' }),
    calibrationDate: date({ mode: 'string' }),
    inputNotes: text().notNull().default(''),
    /** Internal: never shown to the client's own users. */
    internalNotes: text().notNull().default(''),
    /** The supply and capacities the runs were planned with (as-built spec). */
    planSettings: jsonb().$type<WallPlanSettings>(),
    dataRuns: jsonb().$type<WallRuns>(),
    powerRuns: jsonb().$type<WallRuns>(),
    archivedAt: at(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    // The wall's client is always its site's client.
    foreignKey({ name: 'walls_site_client_fk', columns: [t.siteId, t.clientId], foreignColumns: [sites.id, sites.clientId] }),
    foreignKey({ name: 'walls_client_fk', columns: [t.clientId], foreignColumns: [clients.id] }),
    unique('walls_site_name_key').on(t.siteId, t.name),
    unique('walls_id_client_key').on(t.id, t.clientId),
    index('walls_client_idx').on(t.clientId),
    index('walls_site_idx').on(t.siteId),
    index('walls_cabinet_model_idx').on(t.cabinetModelId),
    check('walls_grid_positive', sql`${t.columns} between 1 and 500 and ${t.rows} between 1 and 500`),
  ],
);

/** The processor / sending device that drives a wall. */
export const controllers = pgTable(
  'controllers',
  {
    id: uuid().primaryKey().defaultRandom(),
    wallId: uuid().references(() => walls.id, { onDelete: 'set null' }),
    model: text().notNull(),
    serial: text().notNull(),
    firmware: text().notNull().default(''),
    outputs: integer().notNull(),
    outputsInUse: integer().notNull().default(0),
    pixelsPerOutput: integer().notNull().default(650000),
    notes: text().notNull().default(''),
    archivedAt: at(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('controllers_serial_key').on(t.serial),
    index('controllers_wall_idx').on(t.wallId),
    check('controllers_outputs', sql`${t.outputs} > 0 and ${t.outputsInUse} between 0 and ${t.outputs} and ${t.pixelsPerOutput} > 0`),
  ],
);

/**
 * A physical cabinet with a serial. Installed cabinets sit at one grid position of one wall
 * (C1·R1 is top-left as seen from the audience); spares sit in a stock location.
 */
export const cabinets = pgTable(
  'cabinets',
  {
    id: uuid().primaryKey().defaultRandom(),
    serial: text().notNull(),
    cabinetModelId: uuid()
      .notNull()
      .references(() => cabinetModels.id, { onDelete: 'restrict' }),
    wallId: uuid().references(() => walls.id, { onDelete: 'restrict' }),
    column: integer(),
    row: integer(),
    /** Production batch / bin code of the cabinet's modules. */
    batch: text().notNull().default(''),
    status: cabinetStatusEnum().notNull().default('installed'),
    stockLocationId: uuid().references(() => stockLocations.id, { onDelete: 'restrict' }),
    installedOn: date({ mode: 'string' }),
    notes: text().notNull().default(''),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('cabinets_serial_key').on(t.serial),
    // One cabinet per wall position.
    uniqueIndex('cabinets_wall_position_key').on(t.wallId, t.column, t.row),
    index('cabinets_stock_location_idx').on(t.stockLocationId),
    index('cabinets_model_idx').on(t.cabinetModelId),
    // The batch filter of a recall matches a code's start in any case: lower(batch) like 'k7-2403%'.
    index('cabinets_batch_prefix_idx').using('btree', sql`lower(${t.batch}) text_pattern_ops`),
    // The serial filter of the register and the Scan page match a serial's start (like 'HX26-2408%'):
    // the unique index above follows the database's collation and cannot serve a prefix match.
    index('cabinets_serial_prefix_idx').using('btree', sql`${t.serial} text_pattern_ops`),
    // Search by any part of a serial or batch code (LIKE '%…%'): trigram indexes (pg_trgm, migration 0007).
    index('cabinets_serial_trgm_idx').using('gin', t.serial.op('gin_trgm_ops')),
    index('cabinets_batch_trgm_idx').using('gin', t.batch.op('gin_trgm_ops')),
    check('cabinets_position_positive', sql`(${t.column} is null or ${t.column} >= 1) and (${t.row} is null or ${t.row} >= 1)`),
    check('cabinets_position_with_wall', sql`(${t.wallId} is null) = (${t.column} is null) and (${t.wallId} is null) = (${t.row} is null)`),
    check('cabinets_installed_on_wall', sql`(${t.status} = 'installed') = (${t.wallId} is not null)`),
  ],
);

/** The cabinet's history: every placement, move, swap, repair and status change. Append-only. */
export const cabinetEvents = pgTable(
  'cabinet_events',
  {
    id: uuid().primaryKey().defaultRandom(),
    cabinetId: uuid()
      .notNull()
      .references(() => cabinets.id, { onDelete: 'cascade' }),
    kind: cabinetEventKindEnum().notNull(),
    fromWallId: uuid().references(() => walls.id, { onDelete: 'set null' }),
    fromColumn: integer(),
    fromRow: integer(),
    toWallId: uuid().references(() => walls.id, { onDelete: 'set null' }),
    toColumn: integer(),
    toRow: integer(),
    /** The other cabinet of a swap. */
    otherCabinetId: uuid().references(() => cabinets.id, { onDelete: 'set null' }),
    repairId: uuid(),
    fromStatus: cabinetStatusEnum(),
    toStatus: cabinetStatusEnum(),
    note: text().notNull().default(''),
    /** Whether the client's own users may read the note; staff only unless staff chose to show it. */
    noteForClient: boolean().notNull().default(false),
    actorId: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [
    index('cabinet_events_cabinet_idx').on(t.cabinetId, t.createdAt),
    index('cabinet_events_to_wall_idx').on(t.toWallId),
    index('cabinet_events_from_wall_idx').on(t.fromWallId),
    index('cabinet_events_other_idx').on(t.otherCabinetId),
    index('cabinet_events_actor_idx').on(t.actorId),
    index('cabinet_events_repair_idx').on(t.repairId),
  ],
);

export const maintenancePlans = pgTable(
  'maintenance_plans',
  {
    id: uuid().primaryKey().defaultRandom(),
    wallId: uuid()
      .notNull()
      .references(() => walls.id, { onDelete: 'cascade' }),
    intervalMonths: integer().notNull(),
    checklist: jsonb().$type<string[]>().notNull(),
    lastDoneOn: date({ mode: 'string' }),
    nextDueOn: date({ mode: 'string' }).notNull(),
    active: boolean().notNull().default(true),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('maintenance_plans_wall_key').on(t.wallId),
    check('maintenance_plans_interval', sql`${t.intervalMonths} between 1 and 60`),
  ],
);
