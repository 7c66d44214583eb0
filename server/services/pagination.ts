import { and, asc, desc, gt, isNull, lt, or, eq, sql, type SQL } from 'drizzle-orm';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import { badRequest } from '../errors.js';

/**
 * Keyset pagination: a cursor is the sort key of the last row of the previous page (plus the
 * id to break ties), base64url-encoded. Pages stay stable while rows are added.
 */
export function encodeCursor(values: unknown[]): string {
  return Buffer.from(JSON.stringify(values)).toString('base64url');
}

export function decodeCursor(cursor: string | undefined, length: number): unknown[] | null {
  if (!cursor) return null;
  try {
    const values = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8'));
    if (Array.isArray(values) && values.length === length) return values;
  } catch {
    /* fall through to the 400 below */
  }
  throw badRequest('bad_cursor', 'The page cursor is not valid; start from the first page.', { cursor: 'Not valid.' });
}

/** Rows after the cursor for `order by sortColumn <dir>, idColumn <dir>`. */
export function afterCursor(
  sortColumn: AnyPgColumn,
  idColumn: AnyPgColumn,
  cursor: unknown[] | null,
  direction: 'asc' | 'desc' = 'asc',
): SQL | undefined {
  if (!cursor) return undefined;
  const [sortValue, idValue] = cursor;
  const beyond = direction === 'asc' ? gt : lt;
  const value = sortColumn.columnType === 'PgTimestamp' && typeof sortValue === 'string' ? new Date(sortValue) : sortValue;
  return or(beyond(sortColumn, value), and(eq(sortColumn, value), beyond(idColumn, idValue)));
}

/**
 * `order by sortColumn <dir> nulls last, idColumn <dir>`: for a sort column that may be null,
 * the rows without a value come after every value whichever the direction.
 */
export function orderNullsLast(sortColumn: AnyPgColumn, idColumn: AnyPgColumn, direction: 'asc' | 'desc' = 'asc'): SQL[] {
  return direction === 'asc' ? [sql`${sortColumn} asc nulls last`, asc(idColumn)] : [sql`${sortColumn} desc nulls last`, desc(idColumn)];
}

/** Rows after the cursor for `orderNullsLast(...)`; a cursor's sort value is null inside the tail of nulls. */
export function afterCursorNullsLast(
  sortColumn: AnyPgColumn,
  idColumn: AnyPgColumn,
  cursor: unknown[] | null,
  direction: 'asc' | 'desc' = 'asc',
): SQL | undefined {
  if (!cursor) return undefined;
  const [sortValue, idValue] = cursor;
  const beyond = direction === 'asc' ? gt : lt;
  if (sortValue === null) return and(isNull(sortColumn), beyond(idColumn, idValue));
  return or(afterCursor(sortColumn, idColumn, cursor, direction), isNull(sortColumn));
}

/** Splits `limit + 1` fetched rows into the page and the next cursor. */
export function pageOf<T>(rows: T[], limit: number, keyOf: (row: T) => unknown[]) {
  const items = rows.slice(0, limit);
  const last = items[items.length - 1];
  return { items, nextCursor: rows.length > limit && last ? encodeCursor(keyOf(last)) : null };
}
