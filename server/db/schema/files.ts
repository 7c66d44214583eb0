import { sql } from 'drizzle-orm';
import { bigint, boolean, check, index, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createdAt } from './columns.js';
import { attachmentKindEnum } from './enums.js';
import { clients } from './clients.js';
import { users } from './accounts.js';
import { walls } from './walls.js';
import { ticketComments, tickets } from './tickets.js';
import { repairs, visits } from './visits.js';

/**
 * A file in object storage, owned by exactly one record. The storage key is random; the original
 * name is kept only for the download's Content-Disposition.
 */
export const attachments = pgTable(
  'attachments',
  {
    id: uuid().primaryKey().defaultRandom(),
    /** The owning record's client (null for catalogue documents): the tenant boundary for files. */
    clientId: uuid().references(() => clients.id, { onDelete: 'restrict' }),
    wallId: uuid().references(() => walls.id, { onDelete: 'cascade' }),
    ticketId: uuid().references(() => tickets.id, { onDelete: 'cascade' }),
    commentId: uuid().references(() => ticketComments.id, { onDelete: 'cascade' }),
    visitId: uuid().references(() => visits.id, { onDelete: 'cascade' }),
    repairId: uuid().references(() => repairs.id, { onDelete: 'cascade' }),
    kind: attachmentKindEnum().notNull(),
    storageKey: text().notNull(),
    fileName: text().notNull(),
    contentType: text().notNull(),
    sizeBytes: bigint({ mode: 'number' }).notNull(),
    /** Internal documents are hidden from client users. */
    internal: boolean().notNull().default(false),
    uploadedById: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('attachments_storage_key').on(t.storageKey),
    index('attachments_client_idx').on(t.clientId),
    index('attachments_wall_idx').on(t.wallId),
    index('attachments_ticket_idx').on(t.ticketId),
    index('attachments_comment_idx').on(t.commentId),
    index('attachments_visit_idx').on(t.visitId),
    index('attachments_repair_idx').on(t.repairId),
    index('attachments_uploaded_by_idx').on(t.uploadedById),
    check('attachments_one_owner', sql`num_nonnulls(${t.wallId}, ${t.ticketId}, ${t.visitId}, ${t.repairId}) = 1`),
    check('attachments_size_positive', sql`${t.sizeBytes} > 0`),
  ],
);
