import { sql } from 'drizzle-orm';
import {
  bigserial,
  boolean,
  check,
  date,
  index,
  integer,
  numeric,
  pgTable,
  primaryKey,
  text,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { at, createdAt, updatedAt } from './columns.js';
import { partKindEnum, stockLocationKindEnum, stockMovementKindEnum, vendorReturnOutcomeEnum } from './enums.js';
import { clients, sites } from './clients.js';
import { users } from './accounts.js';
import { cabinetModels } from './catalogue.js';

/** A stockable item type. */
export const parts = pgTable(
  'parts',
  {
    id: uuid().primaryKey().defaultRandom(),
    sku: text().notNull(),
    name: text().notNull(),
    kind: partKindEnum().notNull(),
    /** The cabinet model a module, power supply or card fits; null for generic parts. */
    cabinetModelId: uuid().references(() => cabinetModels.id, { onDelete: 'restrict' }),
    /** Internal: never shown to client users. */
    unitCost: numeric({ precision: 12, scale: 2 }),
    leadTimeDays: integer().notNull().default(30),
    archivedAt: at(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('parts_sku_key').on(t.sku), index('parts_cabinet_model_idx').on(t.cabinetModelId)],
);

/** Warehouse, a technician's van, or a client's on-site spare kit. */
export const stockLocations = pgTable(
  'stock_locations',
  {
    id: uuid().primaryKey().defaultRandom(),
    name: text().notNull(),
    kind: stockLocationKindEnum().notNull(),
    /** The technician who holds a van. */
    holderId: uuid().references(() => users.id, { onDelete: 'set null' }),
    /** The site where an on-site kit is kept, and that site's client. */
    siteId: uuid().references(() => sites.id, { onDelete: 'restrict' }),
    clientId: uuid().references(() => clients.id, { onDelete: 'restrict' }),
    archivedAt: at(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('stock_locations_name_key').on(t.name),
    index('stock_locations_holder_idx').on(t.holderId),
    index('stock_locations_site_idx').on(t.siteId),
    index('stock_locations_client_idx').on(t.clientId),
    check('stock_locations_van_holder', sql`${t.kind} <> 'van' or ${t.holderId} is not null`),
    check(
      'stock_locations_kit_site',
      sql`(${t.kind} = 'site_kit') = (${t.siteId} is not null) and (${t.siteId} is null) = (${t.clientId} is null)`,
    ),
  ],
);

/**
 * The ledger. Quantities on hand are the sum of movements per part, batch and location;
 * stock_balances holds that sum, updated in the same transaction, and cannot go below zero.
 */
export const stockMovements = pgTable(
  'stock_movements',
  {
    id: bigserial({ mode: 'number' }).primaryKey(),
    partId: uuid()
      .notNull()
      .references(() => parts.id, { onDelete: 'restrict' }),
    /** Production batch / bin code; empty for parts without batches. */
    batch: text().notNull().default(''),
    kind: stockMovementKindEnum().notNull(),
    fromLocationId: uuid().references(() => stockLocations.id, { onDelete: 'restrict' }),
    toLocationId: uuid().references(() => stockLocations.id, { onDelete: 'restrict' }),
    quantity: integer().notNull(),
    reason: text().notNull().default(''),
    repairId: uuid(),
    vendorReturnId: uuid(),
    /** The wall a spare was taken for, whose module batch it was checked against. */
    wallId: uuid(),
    /** Taken knowing that its batch differs from the wall's own (colour and brightness may show). */
    batchMismatch: boolean().notNull().default(false),
    actorId: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [
    index('stock_movements_part_idx').on(t.partId, t.createdAt),
    index('stock_movements_wall_idx').on(t.wallId),
    index('stock_movements_from_idx').on(t.fromLocationId),
    index('stock_movements_to_idx').on(t.toLocationId),
    index('stock_movements_repair_idx').on(t.repairId),
    index('stock_movements_vendor_return_idx').on(t.vendorReturnId),
    index('stock_movements_actor_idx').on(t.actorId),
    check('stock_movements_quantity_positive', sql`${t.quantity} > 0`),
    check('stock_movements_has_location', sql`${t.fromLocationId} is not null or ${t.toLocationId} is not null`),
    check('stock_movements_distinct_locations', sql`${t.fromLocationId} is distinct from ${t.toLocationId}`),
    check(
      'stock_movements_kind_locations',
      sql`case ${t.kind}
      when 'receipt' then ${t.fromLocationId} is null and ${t.toLocationId} is not null
      when 'back_from_vendor' then ${t.fromLocationId} is null and ${t.toLocationId} is not null
      when 'return_from_wall' then ${t.fromLocationId} is null and ${t.toLocationId} is not null
      when 'consumption' then ${t.fromLocationId} is not null and ${t.toLocationId} is null
      when 'sent_to_vendor' then ${t.fromLocationId} is not null and ${t.toLocationId} is null
      when 'transfer' then ${t.fromLocationId} is not null and ${t.toLocationId} is not null
      else true end`,
    ),
  ],
);

export const stockBalances = pgTable(
  'stock_balances',
  {
    partId: uuid()
      .notNull()
      .references(() => parts.id, { onDelete: 'restrict' }),
    batch: text().notNull().default(''),
    locationId: uuid()
      .notNull()
      .references(() => stockLocations.id, { onDelete: 'restrict' }),
    quantity: integer().notNull().default(0),
    updatedAt: updatedAt(),
  },
  (t) => [
    primaryKey({ name: 'stock_balances_pk', columns: [t.partId, t.batch, t.locationId] }),
    index('stock_balances_location_idx').on(t.locationId),
    check('stock_balances_not_negative', sql`${t.quantity} >= 0`),
  ],
);

export const reorderPoints = pgTable(
  'reorder_points',
  {
    partId: uuid()
      .notNull()
      .references(() => parts.id, { onDelete: 'cascade' }),
    locationId: uuid()
      .notNull()
      .references(() => stockLocations.id, { onDelete: 'cascade' }),
    /** Alert when the quantity on hand falls to or below this. */
    minQuantity: integer().notNull(),
    reorderQuantity: integer().notNull(),
    alertedAt: at(),
  },
  (t) => [
    primaryKey({ name: 'reorder_points_pk', columns: [t.partId, t.locationId] }),
    index('reorder_points_location_idx').on(t.locationId),
    check('reorder_points_quantities', sql`${t.minQuantity} >= 0 and ${t.reorderQuantity} > 0`),
  ],
);

/** A failed part sent back to its maker under warranty (RMA). */
export const vendorReturns = pgTable(
  'vendor_returns',
  {
    id: uuid().primaryKey().defaultRandom(),
    partId: uuid()
      .notNull()
      .references(() => parts.id, { onDelete: 'restrict' }),
    serial: text().notNull().default(''),
    batch: text().notNull().default(''),
    quantity: integer().notNull().default(1),
    fault: text().notNull(),
    fromLocationId: uuid().references(() => stockLocations.id, { onDelete: 'restrict' }),
    repairId: uuid(),
    /** The maker's RMA reference. */
    rmaReference: text().notNull().default(''),
    sentOn: date({ mode: 'string' }),
    expectedBackOn: date({ mode: 'string' }),
    outcome: vendorReturnOutcomeEnum().notNull().default('pending'),
    backInStockOn: date({ mode: 'string' }),
    backToLocationId: uuid().references(() => stockLocations.id, { onDelete: 'restrict' }),
    notes: text().notNull().default(''),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('vendor_returns_part_idx').on(t.partId),
    index('vendor_returns_from_location_idx').on(t.fromLocationId),
    index('vendor_returns_back_location_idx').on(t.backToLocationId),
    index('vendor_returns_repair_idx').on(t.repairId),
    index('vendor_returns_outcome_idx').on(t.outcome),
    check('vendor_returns_quantity_positive', sql`${t.quantity} > 0`),
  ],
);
