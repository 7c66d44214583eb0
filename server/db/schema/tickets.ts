import { sql } from 'drizzle-orm';
import { check, foreignKey, index, integer, jsonb, pgTable, serial, text, uniqueIndex, uuid, type AnyPgColumn } from 'drizzle-orm/pg-core';
import { at, createdAt, updatedAt } from './columns.js';
import { commentVisibilityEnum, ticketPriorityEnum, ticketScopeEnum, ticketStatusEnum } from './enums.js';
import { clients, sites } from './clients.js';
import { users } from './accounts.js';
import { walls, type RunCell } from './walls.js';
import { openStatuses } from '../../../shared/schemas/tickets.js';

/** The open statuses (openStatuses in shared/schemas/tickets.ts) as SQL literals, for partial indexes. */
const openStatusList = sql.raw(openStatuses.map((s) => `'${s}'`).join(', '));

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
    // Keyset pages sort by one of these with the id breaking ties (services/pagination.ts).
    index('tickets_created_idx').on(t.createdAt, t.id),
    index('tickets_updated_idx').on(t.updatedAt, t.id),
    // The open tickets are few among ten years of closed ones: the list's default view (open,
    // latest change first) and the open view by due time read only these.
    index('tickets_open_updated_idx')
      .on(t.updatedAt, t.id)
      .where(sql`${t.status} in (${openStatusList})`),
    index('tickets_open_due_idx')
      .on(t.resolutionDueAt, t.id)
      .where(sql`${t.status} in (${openStatusList})`),
    // A running clock (on track, at risk, breached, paused) needs a due time and no resolution:
    // the clock filter reads these rows only (clockStateSql in services/tickets.ts).
    index('tickets_running_clock_idx')
      .on(t.createdAt, t.id)
      .where(sql`${t.resolvedAt} is null and ${t.resolutionDueAt} is not null`),
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
