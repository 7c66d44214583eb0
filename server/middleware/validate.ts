import type { RequestHandler } from 'express';
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

type Request = import('express').Request;
