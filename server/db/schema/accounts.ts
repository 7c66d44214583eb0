import { sql } from 'drizzle-orm';
import { bigserial, boolean, check, index, integer, jsonb, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { at, createdAt, updatedAt } from './columns.js';
import { authTokenKindEnum, roleEnum } from './enums.js';
import { clients } from './clients.js';

export const users = pgTable(
  'users',
  {
    id: uuid().primaryKey().defaultRandom(),
    /** Stored trimmed and lower-cased (the shared schema normalises it). */
    email: text().notNull(),
    name: text().notNull(),
    role: roleEnum().notNull(),
    /** The organisation a client user belongs to; null for staff. */
    clientId: uuid().references(() => clients.id, { onDelete: 'restrict' }),
    phone: text().notNull().default(''),
    /** argon2id; null until an invited user sets a password. */
    passwordHash: text(),
    passwordChangedAt: at(),
    disabledAt: at(),
    lastSignInAt: at(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex('users_email_key').on(t.email),
    index('users_client_idx').on(t.clientId),
    check('users_client_role', sql`(${t.role} = 'client') = (${t.clientId} is not null)`),
    check('users_email_lower', sql`${t.email} = lower(${t.email})`),
  ],
);

/** One row per signed-in browser; the JWT carries its id, so revoking the row ends the session. */
export const sessions = pgTable(
  'sessions',
  {
    id: uuid().primaryKey().defaultRandom(),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    createdAt: createdAt(),
    expiresAt: at().notNull(),
    revokedAt: at(),
    ip: text().notNull().default(''),
    userAgent: text().notNull().default(''),
  },
  (t) => [index('sessions_user_idx').on(t.userId)],
);

/** Single-use invite and password-reset links; only a hash of the token is stored. */
export const authTokens = pgTable(
  'auth_tokens',
  {
    id: uuid().primaryKey().defaultRandom(),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    kind: authTokenKindEnum().notNull(),
    tokenHash: text().notNull(),
    expiresAt: at().notNull(),
    usedAt: at(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('auth_tokens_hash_key').on(t.tokenHash), index('auth_tokens_user_idx').on(t.userId)],
);

/** Every sign-in attempt, kept for throttling and for the security log. */
export const signInAttempts = pgTable(
  'sign_in_attempts',
  {
    id: bigserial({ mode: 'number' }).primaryKey(),
    email: text().notNull(),
    ip: text().notNull(),
    succeeded: boolean().notNull(),
    userId: uuid().references(() => users.id, { onDelete: 'set null' }),
    /** What was tried: signing in, the current password on a change, or asking for a reset link. */
    purpose: text().notNull().default('sign_in'),
    /** The known-device cookie's id when the browser presented a valid one (OWASP device cookies). */
    deviceId: text(),
    createdAt: createdAt(),
  },
  (t) => [
    index('sign_in_attempts_email_idx').on(t.email, t.createdAt),
    index('sign_in_attempts_ip_idx').on(t.ip, t.createdAt),
    check('sign_in_attempts_purpose', sql`${t.purpose} in ('sign_in', 'password_check', 'reset')`),
  ],
);

/** Who changed what, when, with the record before and after. Append-only. */
export const auditEvents = pgTable(
  'audit_events',
  {
    id: bigserial({ mode: 'number' }).primaryKey(),
    actorId: uuid().references(() => users.id, { onDelete: 'set null' }),
    /** Table-like name of the record: client, site, wall, cabinet, ticket, user… */
    entity: text().notNull(),
    entityId: text().notNull(),
    action: text().notNull(),
    before: jsonb(),
    after: jsonb(),
    requestId: text(),
    createdAt: createdAt(),
  },
  (t) => [
    index('audit_events_entity_idx').on(t.entity, t.entityId, t.createdAt),
    index('audit_events_actor_idx').on(t.actorId),
    index('audit_events_created_idx').on(t.createdAt),
  ],
);

/** The integrator's own details: one row. */
export const companySettings = pgTable(
  'company_settings',
  {
    id: integer().primaryKey().default(1),
    name: text().notNull(),
    officeEmail: text().notNull(),
    phone: text().notNull().default(''),
    address: text().notNull().default(''),
    defaultTimeZone: text().notNull().default('America/Chicago'),
    updatedAt: updatedAt(),
  },
  (t) => [check('company_settings_single_row', sql`${t.id} = 1`)],
);
