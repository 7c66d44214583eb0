import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, jsonb, pgTable, text, unique, uuid, type AnyPgColumn } from 'drizzle-orm/pg-core';
import type { TicketPriority } from '../../../shared/schemas/enums.js';
import { users } from './accounts.js';
import { at, createdAt, updatedAt } from './columns.js';
import { clockModeEnum } from './enums.js';

export type PlanTargets = Record<TicketPriority, { responseHours: number; resolutionHours: number }>;

/** Response and resolution targets per priority, counted in business hours or round the clock. */
export const servicePlans = pgTable(
  'service_plans',
  {
    id: uuid().primaryKey().defaultRandom(),
    name: text().notNull().unique('service_plans_name_key'),
    clockMode: clockModeEnum().notNull().default('business'),
    /** ISO weekdays the business clock runs on (1 = Monday … 7 = Sunday). */
    businessDays: integer()
      .array()
      .notNull()
      .default(sql`'{1,2,3,4,5}'::integer[]`),
    dayStart: text().notNull().default('08:00'),
    dayEnd: text().notNull().default('18:00'),
    targets: jsonb().$type<PlanTargets>().notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    check(
      'service_plans_day_window',
      sql`${t.dayStart} ~ '^[0-2][0-9]:[0-5][0-9]$' and ${t.dayEnd} ~ '^[0-2][0-9]:[0-5][0-9]$' and ${t.dayStart} < ${t.dayEnd}`,
    ),
  ],
);

export const clients = pgTable(
  'clients',
  {
    id: uuid().primaryKey().defaultRandom(),
    name: text().notNull(),
    servicePlanId: uuid().references(() => servicePlans.id, { onDelete: 'restrict' }),
    /** Internal: never shown to the client's own users. */
    notes: text().notNull().default(''),
    archivedAt: at(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [unique('clients_name_key').on(t.name), index('clients_service_plan_idx').on(t.servicePlanId)],
);

export const sites = pgTable(
  'sites',
  {
    id: uuid().primaryKey().defaultRandom(),
    clientId: uuid()
      .notNull()
      .references(() => clients.id, { onDelete: 'restrict' }),
    name: text().notNull(),
    address: text().notNull().default(''),
    city: text().notNull().default(''),
    region: text().notNull().default(''),
    postalCode: text().notNull().default(''),
    country: text().notNull().default(''),
    /** IANA time zone the service clock runs in, e.g. America/Chicago. */
    timeZone: text().notNull(),
    /** Loading dock, who holds the keys, parking, service-entry hours: shown to technicians and the client. */
    accessNotes: text().notNull().default(''),
    /** Internal: never shown to the client's own users. */
    internalNotes: text().notNull().default(''),
    archivedAt: at(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique('sites_client_name_key').on(t.clientId, t.name),
    // Lets child tables prove with a composite foreign key that they belong to the site's client.
    unique('sites_id_client_key').on(t.id, t.clientId),
    index('sites_client_idx').on(t.clientId),
  ],
);

export const contacts = pgTable(
  'contacts',
  {
    id: uuid().primaryKey().defaultRandom(),
    clientId: uuid()
      .notNull()
      .references(() => clients.id, { onDelete: 'cascade' }),
    /** A site contact when set; an organisation-wide contact otherwise. */
    siteId: uuid().references(() => sites.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    title: text().notNull().default(''),
    email: text(),
    phone: text().notNull().default(''),
    /** Receives ticket updates and visit reports by e-mail. */
    receivesUpdates: boolean().notNull().default(true),
    /** The client user this contact signs in as (their sign-in address may differ from `email`). */
    userId: uuid().references((): AnyPgColumn => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('contacts_client_idx').on(t.clientId),
    index('contacts_site_idx').on(t.siteId),
    index('contacts_user_idx').on(t.userId),
    unique('contacts_client_user_key').on(t.clientId, t.userId),
  ],
);
