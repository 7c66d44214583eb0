// Typed errors: an HTTP status and a stable code the client maps to words (src/lib/errors.ts).
export type FieldErrors = Record<string, string>;

export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldErrors,
    /** Extra response headers, e.g. Retry-After on a 429. */
    readonly headers?: Record<string, string>,
    /** Structured detail for the client, e.g. the rows an import refused. */
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const badRequest = (code: string, message: string, fields?: FieldErrors) => new AppError(400, code, message, fields);
export const validationFailed = (fields: FieldErrors, message = 'Some fields are not valid.') =>
  new AppError(400, 'validation_failed', message, fields);
export const unauthorized = (message = 'Sign in to continue.') => new AppError(401, 'unauthenticated', message);
export const forbidden = (code = 'forbidden', message = 'You do not have permission to do that.') => new AppError(403, code, message);
/** Also what a client user gets for another organisation's record: never confirm that it exists. */
export const notFound = (what = 'Record') => new AppError(404, 'not_found', `${what} not found.`);
export const conflict = (code: string, message: string, fields?: FieldErrors) => new AppError(409, code, message, fields);
export const tooManyRequests = (message: string, retryAfterSeconds: number) =>
  new AppError(429, 'too_many_requests', message, undefined, { 'Retry-After': String(retryAfterSeconds) });
/** A service the app depends on is down: 503 with Retry-After (RFC 9110 §15.6.4) and a code naming it. */
export const serviceUnavailable = (code: string, message: string, retryAfterSeconds = 5) =>
  new AppError(503, code, message, undefined, { 'Retry-After': String(retryAfterSeconds) });
export const databaseUnavailable = () =>
  serviceUnavailable('database_unavailable', 'The database is not answering. Try again in a moment.');
export const storageUnavailable = () =>
  serviceUnavailable('storage_unavailable', 'File storage is not answering, so the file was not saved. Try again in a moment.');
