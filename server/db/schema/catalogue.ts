import { sql } from 'drizzle-orm';
import { check, doublePrecision, integer, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { at, createdAt, updatedAt } from './columns.js';
import { environmentEnum } from './enums.js';

/** Manufacturer-neutral catalogue entry for a cabinet. */
export const cabinetModels = pgTable(
  'cabinet_models',
  {
    id: uuid().primaryKey().defaultRandom(),
    name: text().notNull(),
    maker: text().notNull().default(''),
    widthMm: doublePrecision().notNull(),
    heightMm: doublePrecision().notNull(),
    pixelPitchMm: doublePrecision().notNull(),
    pixelsWide: integer().notNull(),
    pixelsHigh: integer().notNull(),
    modulesWide: integer().notNull(),
    modulesHigh: integer().notNull(),
    maxPowerW: doublePrecision().notNull(),
    typicalPowerW: doublePrecision().notNull(),
    weightKg: doublePrecision().notNull(),
    brightnessNits: integer().notNull(),
    // The datasheet's power input: the voltage range its supplies take, what its power connector
    // may pass on to the next cabinet, the maker's most cabinets per chain, and VA at maximum power.
    inputVoltageMinV: integer('voltage_min').notNull().default(100),
    inputVoltageMaxV: integer('voltage_max').notNull().default(240),
    passThroughAmps: doublePrecision(),
    maxPerChain: integer(),
    maxPowerVA: doublePrecision('max_power_va'),
    environment: environmentEnum().notNull().default('indoor'),
    archivedAt: at(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique('cabinet_models_name_key').on(t.name),
    check(
      'cabinet_models_positive',
      sql`${t.widthMm} > 0 and ${t.heightMm} > 0 and ${t.pixelPitchMm} > 0 and ${t.pixelsWide} > 0 and ${t.pixelsHigh} > 0 and ${t.modulesWide} > 0 and ${t.modulesHigh} > 0 and ${t.weightKg} > 0`,
    ),
    check('cabinet_models_power', sql`${t.typicalPowerW} > 0 and ${t.typicalPowerW} <= ${t.maxPowerW}`),
    check('cabinet_models_voltage', sql`${t.inputVoltageMinV} > 0 and ${t.inputVoltageMinV} <= ${t.inputVoltageMaxV}`),
    check(
      'cabinet_models_chain',
      sql`(${t.passThroughAmps} is null or ${t.passThroughAmps} > 0) and (${t.maxPerChain} is null or ${t.maxPerChain} > 0)`,
    ),
    check('cabinet_models_va', sql`${t.maxPowerVA} is null or ${t.maxPowerVA} >= ${t.maxPowerW}`),
  ],
);
