import type { Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import { badRequest, validationFailed, type FieldErrors } from '../errors.js';

export const NUL_MESSAGE = 'Contains a character that is not allowed (NUL).';

/**
 * The fields of a parsed query or body whose name or text holds a NUL character, which no
 * PostgreSQL text value can store (OWASP ASVS 5.0 2.2.1: input matches its expected structure).
 */
export function nulFields(value: unknown, prefix = '', found: FieldErrors = {}, depth = 0): FieldErrors {
  if (typeof value === 'string') {
    if (value.includes('\0')) found[prefix || '_'] = NUL_MESSAGE;
  } else if (value && typeof value === 'object' && depth < 32) {
    for (const [k, v] of Object.entries(value)) {
      const key = prefix ? `${prefix}.${k}` : k;
      if (k.includes('\0')) found[key.replace(/\0/g, '\\0')] = NUL_MESSAGE;
      else nulFields(v, key, found, depth + 1);
    }
  }
  return found;
}

/**
 * Refuses, for every API request and before any route runs, a NUL character anywhere in the
 * path, the query string or a parsed body: one place, whichever schema the route uses.
 */
export const refuseNul: RequestHandler = (req, _res, next) => {
  const fields: FieldErrors = {};
  if (/%00/i.test(req.originalUrl.split('?')[0])) fields.path = NUL_MESSAGE;
  nulFields(req.query, '', fields);
  if (typeof req.body === 'string') nulFields(req.body, 'body', fields);
  else nulFields(req.body, '', fields);
  next(Object.keys(fields).length ? validationFailed(fields) : undefined);
};

/** An update that names no field: 400 `nothing_to_change`, never a silent no-op. */
const nothingToChange = () =>
  badRequest('nothing_to_change', 'Nothing to change: send at least one field to update.', { _: 'Nothing to change.' });

const namesNothing = (body: unknown) =>
  body === undefined || (!!body && typeof body === 'object' && !Array.isArray(body) && Object.values(body).every((v) => v === undefined));

/** A PATCH whose body (as sent, or once unknown keys are dropped) names no field. */
function isEmptyUpdate(req: Request, parsed: unknown) {
  return req.method === 'PATCH' && (namesNothing(req.body) || namesNothing(parsed));
}

/** Turns a zod error into `{ "field.path": "message" }`, the shape of the 400's `fields`. */
export function fieldErrors(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

/** Parses with a shared zod schema or throws the 400 that names each failing field. */
export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) throw validationFailed(fieldErrors(result.error));
  return result.data;
}

interface Schemas {
  body?: z.ZodType;
  query?: z.ZodType;
  params?: z.ZodType;
}

/** What `validated()` hands the handler: each part parsed by its schema. */
export type Parsed<S extends Schemas> = { [K in keyof S]: S[K] extends z.ZodType ? z.output<S[K]> : never };

/** A route handler that receives the request's parsed input. */
export type ValidatedHandler<S extends Schemas> = (input: Parsed<S>, req: Request, res: Response) => unknown;

/**
 * Parses the parts that have a schema (params, then query, then body; a missing part counts as
 * `{}`) and collects every failing field, so one 400 names them all.
 */
function parseParts<S extends Schemas>(schemas: S, req: Request): { input: Parsed<S> } | { fields: FieldErrors } {
  // Again here, for what a route's own parser read after refuseNul ran (a CSV body) and for path parameters.
  const fields: FieldErrors = nulFields(req.params);
  if (typeof req.body === 'string') nulFields(req.body, 'body', fields);
  if (Object.keys(fields).length) return { fields };
  const input: { body?: unknown; query?: unknown; params?: unknown } = {};
  for (const part of ['params', 'query', 'body'] as const) {
    const schema = schemas[part];
    if (!schema) continue;
    const result = schema.safeParse(req[part] ?? {});
    if (result.success) input[part] = result.data;
    else Object.assign(fields, fieldErrors(result.error));
  }
  if (Object.keys(fields).length) return { fields };
  if (schemas.body && isEmptyUpdate(req, input.body)) throw nothingToChange();
  // Each part present in S was parsed by its own schema above, so input holds exactly Parsed<S>.
  return { input: input as Parsed<S> };
}

/** What the check of a split validated() route parsed, for its handler (never read by routes). */
const parsedInput = new WeakMap<Request, unknown>();

/**
 * Validates the request against shared zod schemas: the 400 that names each failing field, or
 * the parsed (normalised) input kept for the handler of the same route (see `validated()`).
 */
function validate<S extends Schemas>(schemas: S): RequestHandler {
  return (req, _res, next) => {
    const parsed = parseParts(schemas, req);
    if ('fields' in parsed) return next(validationFailed(parsed.fields));
    parsedInput.set(req, parsed.input);
    next();
  };
}

/**
 * A route handler that receives its parsed input, typed from the shared schemas: no casts in
 * routes. Fails with the 400 that names each bad field before the handler runs.
 *
 *   router.patch('/:id', office, validated({ params: idParams, body: wallPatch }, async ({ params, body }, req, res) => {
 *     res.json(await walls.updateWall(actorOf(req), params.id, body));
 *   }));
 *
 * With a middleware between the schemas and the handler (an upload), that middleware runs after
 * the check and before the handler, so a bad id is refused before any file is read:
 *
 *   router.post('/:id/attachments', validated({ params: idParams }, singleFile(), async ({ params }, req, res) => { … }));
 */
export function validated<S extends Schemas>(schemas: S, handler: ValidatedHandler<S>): RequestHandler;
export function validated<S extends Schemas>(schemas: S, between: RequestHandler, handler: ValidatedHandler<S>): RequestHandler[];
export function validated<S extends Schemas>(
  schemas: S,
  ...rest: [ValidatedHandler<S>] | [RequestHandler, ValidatedHandler<S>]
): RequestHandler | RequestHandler[] {
  if (rest.length === 1) {
    const [handler] = rest;
    return (req, res, next) => {
      const parsed = parseParts(schemas, req);
      if ('fields' in parsed) return next(validationFailed(parsed.fields));
      return handler(parsed.input, req, res);
    };
  }
  const [between, handler] = rest;
  const run: RequestHandler = (req, res) => {
    const input = parsedInput.get(req) as Parsed<S>; // set by validate(schemas) just before
    parsedInput.delete(req);
    return handler(input, req, res);
  };
  return [validate(schemas), between, run];
}
