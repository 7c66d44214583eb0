import { eq, sql, type SQL } from 'drizzle-orm';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import type { Actor } from '../middleware/auth.js';
import { notFound } from '../errors.js';

/**
 * The tenant boundary, in one place. Every table a client user may read carries `client_id`;
 * every service query over such a table adds `tenantWhere(actor, table.clientId)` to its where.
 * For staff it adds nothing; for a client user it keeps only their organisation's rows, so
 * another organisation's record is simply not found (404), by id, list, filter or search.
 */
export function tenantWhere(actor: Actor, clientIdColumn: AnyPgColumn): SQL | undefined {
  if (actor.role !== 'client') return undefined;
  // A client user without an organisation sees nothing (the database forbids that state anyway).
  return actor.clientId ? eq(clientIdColumn, actor.clientId) : sql`false`;
}

export const isStaff = (actor: Actor) => actor.role !== 'client';
export const isOffice = (actor: Actor) => actor.role === 'admin' || actor.role === 'coordinator';

/** Throws the 404 a missing or out-of-scope record gets. */
export function found<T>(row: T | undefined | null, what = 'Record'): T {
  if (row === undefined || row === null) throw notFound(what);
  return row;
}
