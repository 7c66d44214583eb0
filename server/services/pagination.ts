import { and, asc, desc, gt, isNull, lt, or, sql, type SQL } from 'drizzle-orm';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import { badRequest } from '../errors.js';

/**
 * Keyset pagination: a cursor is the sort key of the last row of the previous page (plus the
 * id to break ties), base64url-encoded. Pages stay stable while rows are added.
 */
export function encodeCursor(values: unknown[]): string {
  return Buffer.from(JSON.stringify(values)).toString('base64url');
}

export const badCursor = () =>
  badRequest('bad_cursor', 'The page cursor is not valid; start from the first page.', { cursor: 'Not valid.' });

/** What a cursor value may be: checked before it reaches a query, so a crafted cursor is a 400, never a 500. */
export type CursorKind = 'text' | 'uuid' | 'timestamp' | 'date' | 'integer' | 'bigint' | 'number';

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const isoDatePattern = /^\d{4}-\d{2}-\d{2}$/;
const isoTimestampPattern = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(?:\.\d{1,6})?(?:Z|[+-]\d{2}:\d{2})$/;
/** PostgreSQL `integer` (4 bytes): -2,147,483,648 to 2,147,483,647 (PostgreSQL manual, 8.1.1). */
export const PG_INT_MIN = -2_147_483_648;
export const PG_INT_MAX = 2_147_483_647;

function validDate(text: string) {
  const d = new Date(text);
  return !Number.isNaN(d.getTime()) && d.getUTCFullYear() >= 1 && d.getUTCFullYear() <= 9999;
}

/** True when a cursor value fits its kind. */
export function cursorValueFits(kind: CursorKind, value: unknown): boolean {
  switch (kind) {
    case 'uuid':
      return typeof value === 'string' && uuidPattern.test(value);
    case 'timestamp':
      return typeof value === 'string' && isoTimestampPattern.test(value) && validDate(value);
    case 'date':
      return typeof value === 'string' && isoDatePattern.test(value) && validDate(value);
    case 'integer':
      return typeof value === 'number' && Number.isInteger(value) && value >= PG_INT_MIN && value <= PG_INT_MAX;
    case 'bigint':
      return typeof value === 'number' && Number.isSafeInteger(value);
    case 'number':
      return (
        (typeof value === 'number' && Number.isFinite(value)) || (typeof value === 'string' && /^-?\d{1,30}(?:\.\d{1,30})?$/.test(value))
      );
    case 'text':
      return typeof value === 'string' && value.length <= 1000 && !value.includes('\0');
  }
}

/** The kind of cursor value a column takes, from its Drizzle column type. */
function kindOf(column: AnyPgColumn): CursorKind {
  switch (column.columnType) {
    case 'PgUUID':
      return 'uuid';
    case 'PgTimestamp':
    case 'PgTimestampString':
      return 'timestamp';
    case 'PgDate':
    case 'PgDateString':
      return 'date';
    case 'PgInteger':
    case 'PgSerial':
    case 'PgSmallInt':
    case 'PgSmallSerial':
      return 'integer';
    case 'PgNumeric':
    case 'PgNumericNumber':
    case 'PgReal':
    case 'PgDoublePrecision':
      return 'number';
    case 'PgBigInt53':
    case 'PgBigSerial53':
      return 'bigint';
    default:
      return 'text';
  }
}

/** Checks a decoded cursor against the columns it pages by: a value of the wrong kind is a 400 `bad_cursor`. */
export function checkCursor(columns: AnyPgColumn[], cursor: unknown[]) {
  columns.forEach((column, i) => {
    const value = cursor[i];
    if (value === null && !column.notNull) return;
    if (!cursorValueFits(kindOf(column), value)) throw badCursor();
    if (column.columnType === 'PgEnumColumn' && column.enumValues && !column.enumValues.includes(value as string)) throw badCursor();
  });
}

/**
 * The cursor's values, or null on the first page. A cursor that is not base64url JSON, has the
 * wrong length, or (given `kinds`) holds a value of the wrong kind is a 400 `bad_cursor`.
 */
export function decodeCursor(cursor: string | undefined, length: number, kinds?: CursorKind[]): unknown[] | null {
  if (!cursor) return null;
  let values: unknown;
  try {
    values = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8'));
  } catch {
    throw badCursor();
  }
  if (!Array.isArray(values) || values.length !== length) throw badCursor();
  if (kinds && !kinds.every((kind, i) => cursorValueFits(kind, values[i]))) throw badCursor();
  return values;
}

/**
 * Rows after the cursor for `order by sortColumn <dir>, idColumn <dir>`: the row comparison
 * `(sort, id) > (value, id)`, which a btree index on (sort, id) reads as a range (PostgreSQL
 * manual, 9.24.5 "Row Constructor Comparison"; 11.3 on multicolumn indexes). It keeps the same
 * rows as `sort > value or (sort = value and id > id)`: a null sort value passes neither.
 */
export function afterCursor(
  sortColumn: AnyPgColumn,
  idColumn: AnyPgColumn,
  cursor: unknown[] | null,
  direction: 'asc' | 'desc' = 'asc',
): SQL | undefined {
  if (!cursor) return undefined;
  checkCursor([sortColumn, idColumn], cursor);
  const [sortValue, idValue] = cursor;
  const value = sortColumn.columnType === 'PgTimestamp' && typeof sortValue === 'string' ? new Date(sortValue) : sortValue;
  const op = sql.raw(direction === 'asc' ? '>' : '<');
  return sql`(${sortColumn}, ${idColumn}) ${op} (${sql.param(value, sortColumn)}, ${sql.param(idValue, idColumn)})`;
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
  checkCursor([sortColumn, idColumn], cursor);
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

/** `cap + 1` fetched rows as a capped list: at most `cap` items, and whether there were more. */
export function capped<T>(rows: T[], cap: number) {
  return { items: rows.slice(0, cap), truncated: rows.length > cap };
}
