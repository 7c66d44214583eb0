import { csrfHeader } from '@shared/schemas/auth';
import type { ApiErrorBody } from '@shared/schemas/common';

/** A failed API call: the HTTP status and the server's stable error code (see lib/errors.ts). */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    readonly requestId?: string,
    /** Structured detail some refusals carry, e.g. the rows a CSV import refused. */
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export const isApiError = (error: unknown): error is ApiError => error instanceof ApiError;

/** A query-string value; undefined, null and '' are left out. */
export type QueryValue = string | number | boolean | null | undefined;

export function withQuery(path: string, query?: Record<string, QueryValue>): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value === undefined || value === null || value === '') continue;
    params.set(key, String(value));
  }
  const qs = params.toString();
  return qs ? `${path}?${qs}` : path;
}

interface RequestOptions {
  query?: Record<string, QueryValue>;
  body?: unknown;
  signal?: AbortSignal;
  /** Extra request headers, e.g. an `Idempotency-Key`. */
  headers?: Record<string, string>;
}

function isErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null || !('error' in value)) return false;
  const error = (value as { error: unknown }).error;
  return typeof error === 'object' && error !== null && typeof (error as { code?: unknown }).code === 'string';
}

/** Headers every request carries; state-changing ones add the CSRF header the server requires. */
export function requestHeaders(method: string): Record<string, string> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  // CSRF defence: the server refuses a state-changing request without this header.
  if (method !== 'GET' && method !== 'HEAD') headers[csrfHeader.name] = csrfHeader.value;
  return headers;
}

/** A response body as JSON; undefined when it is empty or not JSON. */
function parseResponseText(text: string): unknown {
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** The typed error of a failed response: the server's `{ error }` body, or the bare status. */
function responseError(status: number, statusText: string, data: unknown, requestId?: string): ApiError {
  if (isErrorBody(data)) {
    const { code, message, fields } = data.error;
    const details = (data.error as { details?: unknown }).details;
    return new ApiError(status, code, message ?? '', fields, requestId, details);
  }
  return new ApiError(status, `http_${status}`, statusText || 'Unexpected response.', undefined, requestId);
}

/**
 * A response's JSON body (undefined when empty), or the typed error a failed or malformed
 * response means. Shared by `api` and `uploadWithProgress` (lib/upload-with-progress.ts).
 */
export function readResponse<T>(status: number, statusText: string, text: string, requestId?: string): T {
  const data = parseResponseText(text);
  if (status < 200 || status > 299) throw responseError(status, statusText, data, requestId);
  if (text && data === undefined) {
    throw new ApiError(status, 'unexpected_response', 'The server sent something that is not JSON.', undefined, requestId);
  }
  return data as T;
}

/** The request never reached the server (offline, DNS, refused). */
export const networkError = () => new ApiError(0, 'network_error', 'The server could not be reached.');

async function request<T>(method: string, path: string, options: RequestOptions = {}): Promise<T> {
  const headers = { ...requestHeaders(method), ...options.headers };
  let body: BodyInit | undefined;
  if (options.body !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(options.body);
  }

  let response: Response;
  try {
    response = await fetch(withQuery(path, options.query), {
      method,
      headers,
      body,
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw networkError();
  }

  const requestId = response.headers.get('X-Request-Id') ?? undefined;
  const text = response.status === 204 ? '' : await response.text();
  return readResponse<T>(response.status, response.statusText, text, requestId);
}

/** The one way the client talks to `/api`: JSON in and out, same-origin cookie, typed errors. */
export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'body'>) => request<T>('GET', path, options),
  post: <T = void>(path: string, body?: unknown, options?: Omit<RequestOptions, 'body'>) => request<T>('POST', path, { ...options, body }),
  patch: <T>(path: string, body: unknown, options?: Omit<RequestOptions, 'body'>) => request<T>('PATCH', path, { ...options, body }),
  put: <T>(path: string, body: unknown, options?: Omit<RequestOptions, 'body'>) => request<T>('PUT', path, { ...options, body }),
  delete: <T = void>(path: string, options?: Omit<RequestOptions, 'body'>) => request<T>('DELETE', path, options),
};
