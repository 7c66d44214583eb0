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

declare module 'express-serve-static-core' {
  interface Request {
    /** What validate() parsed: read it instead of req.body / req.query. */
    valid: { body?: unknown; query?: unknown; params?: unknown };
  }
}

/**
 * Validates the request against shared zod schemas. The parsed (normalised) values are put on
 * `req.valid`; use `req.valid.body as Input` or the typed helpers in each route.
 */
export function validate(schemas: Schemas): RequestHandler {
  return (req, _res, next) => {
    const fields: FieldErrors = {};
    const valid: Request['valid'] = {};
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const result = schema.safeParse(req[part] ?? {});
      if (result.success) valid[part] = result.data;
      else Object.assign(fields, fieldErrors(result.error));
    }
    if (Object.keys(fields).length) return next(validationFailed(fields));
    req.valid = valid;
    next();
  };
}


/** What `validated()` hands the handler: each part parsed by its schema. */
export type Parsed<S extends Schemas> = { [K in keyof S]: S[K] extends z.ZodType ? z.output<S[K]> : never };

/**
 * A route handler that receives its parsed input, typed from the shared schemas: no casts in
 * routes. Fails with the 400 that names each bad field before the handler runs.
 *
 *   router.patch('/:id', office, validated({ params: idParams, body: wallPatch }, async ({ params, body }, req, res) => {
 *     res.json(await walls.updateWall(actorOf(req), params.id, body));
 *   }));
 */
export function validated<S extends Schemas>(schemas: S, handler: (input: Parsed<S>, req: Request, res: Response) => unknown): RequestHandler {
  const check = validate(schemas);
  return (req, res, next) => {
    let failed: unknown;
    check(req, res, (err?: unknown) => {
      failed = err;
    });
    if (failed) return next(failed);
    // validate() parsed each part with its schema, so req.valid holds exactly Parsed<S>.
    return handler(req.valid as Parsed<S>, req, res);
  };
}
