import type { Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import { validationFailed, type FieldErrors } from '../errors.js';

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
  const fields: FieldErrors = {};
  const input: { body?: unknown; query?: unknown; params?: unknown } = {};
  for (const part of ['params', 'query', 'body'] as const) {
    const schema = schemas[part];
    if (!schema) continue;
    const result = schema.safeParse(req[part] ?? {});
    if (result.success) input[part] = result.data;
    else Object.assign(fields, fieldErrors(result.error));
  }
  if (Object.keys(fields).length) return { fields };
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
