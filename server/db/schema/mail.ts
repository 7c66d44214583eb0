import { sql } from 'drizzle-orm';
import { bigserial, index, integer, jsonb, pgTable, text, uniqueIndex } from 'drizzle-orm/pg-core';
import { at, createdAt } from './columns.js';
import { mailStatusEnum } from './enums.js';

export interface MailAttachmentRef {
  fileName: string;
  contentType: string;
  /** Inline content (calendar invitations) … */
  content?: string;
  /** … or an object-storage key (visit report PDFs). */
  storageKey?: string;
}

/**
 * The outbox: each message is written in the same transaction as the change that causes it and
 * sent by the mail worker with retries. `dedupeKey` makes queueing idempotent; the fixed
 * Message-ID lets receivers drop a duplicate if a crash comes between sending and marking sent.
 */
export const outboundMail = pgTable(
  'outbound_mail',
  {
    id: bigserial({ mode: 'number' }).primaryKey(),
    dedupeKey: text(),
    messageId: text().notNull(),
    to: text().array().notNull(),
    subject: text().notNull(),
    text: text().notNull(),
    html: text(),
    attachments: jsonb()
      .$type<MailAttachmentRef[]>()
      .notNull()
      .default(sql`'[]'::jsonb`),
    status: mailStatusEnum().notNull().default('queued'),
    attempts: integer().notNull().default(0),
    nextAttemptAt: at().notNull().defaultNow(),
    lockedUntil: at(),
    lastError: text(),
    sentAt: at(),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('outbound_mail_dedupe_key').on(t.dedupeKey),
    uniqueIndex('outbound_mail_message_id_key').on(t.messageId),
    index('outbound_mail_due_idx').on(t.status, t.nextAttemptAt),
  ],
);
