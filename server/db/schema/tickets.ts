import { sql } from 'drizzle-orm';
import { check, foreignKey, index, integer, jsonb, pgTable, serial, text, uniqueIndex, uuid, type AnyPgColumn } from 'drizzle-orm/pg-core';
import { at, createdAt, updatedAt } from './columns.js';
import { commentVisibilityEnum, ticketPriorityEnum, ticketScopeEnum, ticketStatusEnum } from './enums.js';
import { clients, sites } from './clients.js';
import { users } from './accounts.js';
import { walls, type RunCell } from './walls.js';

export const tickets = pgTable(
  'tickets',
  {
    id: uuid().primaryKey().defaultRandom(),
    /** Unique on its own; people say it with the year it was opened: 1042/26 (ticketRef). */
    number: serial().notNull(),
    clientId: uuid().notNull(),
    siteId: uuid().notNull(),
    wallId: uuid(),
    scope: ticketScopeEnum().notNull().default('cells'),
    /** Cabinet positions reported as faulty, picked on the wall map. */
    cells: jsonb()
      .$type<RunCell[]>()
      .notNull()
      .default(sql`'[]'::jsonb`),
    title: text().notNull(),
    description: text().notNull().default(''),
    priority: ticketPriorityEnum().notNull(),
    status: ticketStatusEnum().notNull().default('new'),
    reporterId: uuid().references(() => users.id, { onDelete: 'set null' }),
    assigneeId: uuid().references(() => users.id, { onDelete: 'set null' }),
    mergedIntoId: uuid().references((): AnyPgColumn => tickets.id, { onDelete: 'set null' }),
    responseDueAt: at(),
    resolutionDueAt: at(),
    /** When less than a quarter of the allowed clock time is left (shared/calc/service-clock). */
    responseAtRiskAt: at(),
    resolutionAtRiskAt: at(),
    /** When the resolution clock was paused (status waiting_client); null while it runs. */
    pausedAt: at(),
    /** Time spent paused so far, added to the resolution due time. */
    pausedSeconds: integer().notNull().default(0),
    acknowledgedAt: at(),
    resolvedAt: at(),
    closedAt: at(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('tickets_number_key').on(t.number),
    foreignKey({ name: 'tickets_site_client_fk', columns: [t.siteId, t.clientId], foreignColumns: [sites.id, sites.clientId] }),
    foreignKey({ name: 'tickets_wall_client_fk', columns: [t.wallId, t.clientId], foreignColumns: [walls.id, walls.clientId] }),
    foreignKey({ name: 'tickets_client_fk', columns: [t.clientId], foreignColumns: [clients.id] }),
    index('tickets_client_idx').on(t.clientId, t.createdAt),
    index('tickets_site_idx').on(t.siteId),
    index('tickets_wall_idx').on(t.wallId),
    index('tickets_status_idx').on(t.status, t.createdAt),
    index('tickets_assignee_idx').on(t.assigneeId),
    index('tickets_reporter_idx').on(t.reporterId),
    index('tickets_merged_into_idx').on(t.mergedIntoId),
    index('tickets_resolution_due_idx').on(t.resolutionDueAt),
    // Search by words of the title or description: one trigram index over both (pg_trgm).
    index('tickets_text_trgm_idx').using('gin', sql`(${t.title} || ' ' || ${t.description}) gin_trgm_ops`),
    check('tickets_title_present', sql`length(trim(${t.title})) > 0`),
    check('tickets_paused_seconds', sql`${t.pausedSeconds} >= 0`),
  ],
);

export const ticketComments = pgTable(
  'ticket_comments',
  {
    id: uuid().primaryKey().defaultRandom(),
    ticketId: uuid()
      .notNull()
      .references(() => tickets.id, { onDelete: 'cascade' }),
    authorId: uuid().references(() => users.id, { onDelete: 'set null' }),
    body: text().notNull(),
    /** Internal comments are never shown or mailed to the client. */
    visibility: commentVisibilityEnum().notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    index('ticket_comments_ticket_idx').on(t.ticketId, t.createdAt),
    index('ticket_comments_author_idx').on(t.authorId),
    check('ticket_comments_body_present', sql`length(trim(${t.body})) > 0`),
  ],
);

/** A user's named ticket filters. */
export const savedViews = pgTable(
  'saved_views',
  {
    id: uuid().primaryKey().defaultRandom(),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    filters: jsonb().$type<Record<string, unknown>>().notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [uniqueIndex('saved_views_user_name_key').on(t.userId, t.name)],
);
