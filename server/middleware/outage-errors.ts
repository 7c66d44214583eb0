import { databaseUnavailable, storageUnavailable, type AppError } from '../errors.js';

/**
 * Tells an outage of a service the app depends on from a fault of its own: the database or the
 * object store not answering is a 503 with Retry-After and a code naming the service, never a
 * 500 `internal_error` (RFC 9110 §15.6.4; OWASP ASVS 5.0 16.5.2: degrade gracefully when an
 * external resource fails).
 */

/** Socket errors of a connection that could not be made or was lost. */
const networkCodes = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ECONNABORTED',
  'ETIMEDOUT',
  'ENOTFOUND',
  'EAI_AGAIN',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'EHOSTDOWN',
  'ENETDOWN',
  'EPIPE',
]);

/**
 * PostgreSQL SQLSTATEs of a server that cannot serve (PostgreSQL manual, Appendix A): class 08
 * connection exception, 57P01 admin_shutdown, 57P02 crash_shutdown, 57P03 cannot_connect_now,
 * 53300 too_many_connections.
 */
const pgUnavailable = (code: string) => /^08/.test(code) || ['57P01', '57P02', '57P03', '53300'].includes(code);

/** What node-postgres says when a connection ends, times out in the pool, or the pool has closed. */
const pgConnectionMessage =
  /connection terminated|timeout exceeded when trying to connect|connection timeout|not queryable|cannot use a pool after calling end|terminating connection/i;

interface Shaped {
  code?: unknown;
  syscall?: unknown;
  message?: unknown;
  name?: unknown;
  cause?: unknown;
  errors?: unknown;
  $metadata?: { httpStatusCode?: number };
  $fault?: unknown;
}

/** The errors of a chain: the error, its `cause`s (Drizzle wraps pg errors) and an AggregateError's members. */
function* chain(err: unknown, depth = 0): Generator<Shaped> {
  if (!err || typeof err !== 'object' || depth > 4) return;
  const e = err as Shaped;
  yield e;
  if (Array.isArray(e.errors)) for (const inner of e.errors) yield* chain(inner, depth + 1);
  yield* chain(e.cause, depth + 1);
}

function isNetworkError(e: Shaped) {
  return typeof e.code === 'string' && (networkCodes.has(e.code) || (e.code === 'ENOENT' && e.syscall === 'connect'));
}

/** True when the AWS SDK could not reach the object store or the store answered that it cannot serve. */
function isStorageOutage(err: unknown): boolean {
  const top = err as Shaped | undefined;
  // The AWS SDK puts $metadata on every error it throws, network errors included.
  if (!top || typeof top !== 'object' || !('$metadata' in top)) return false;
  if (top.$fault === 'server' || (top.$metadata?.httpStatusCode ?? 0) >= 500) return true;
  if (['TimeoutError', 'RequestTimeout', 'NetworkingError'].includes(String(top.name))) return true;
  return [...chain(err)].some(isNetworkError);
}

function isDatabaseOutage(err: unknown): boolean {
  for (const e of chain(err)) {
    if (typeof e.code === 'string' && pgUnavailable(e.code)) return true;
    if (isNetworkError(e)) return true;
    if (typeof e.message === 'string' && pgConnectionMessage.test(e.message)) return true;
  }
  return false;
}

/** The 503 for an outage, or undefined when the error is something else. */
export function fromOutage(err: unknown): AppError | undefined {
  if (isStorageOutage(err)) return storageUnavailable();
  if (isDatabaseOutage(err)) return databaseUnavailable();
  return undefined;
}
