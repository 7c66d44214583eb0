import type { ErrorRequestHandler, RequestHandler } from 'express';
import { z } from 'zod';
import { fromConstraintViolation } from '../db/constraint-errors.js';
import { AppError, notFound } from '../errors.js';
import { logger } from '../logger.js';
import { fromOutage } from './outage-errors.js';
import { fromUploadError } from './upload.js';
import { fieldErrors } from './validate.js';

/** Unknown /api paths answer with the error shape, never the app's HTML. */
export const apiNotFound: RequestHandler = (_req, _res, next) => next(notFound('Endpoint'));

/**
 * What the body parser (express.json, body-parser 2) refused, in the error shape: each names the
 * part of the request at fault (OWASP ASVS 5.0 2.2.1, 16.5.1: no parser internals in the answer).
 */
function fromBodyParser(err: { type?: unknown; status?: unknown; expose?: unknown }): AppError | undefined {
  switch (err.type) {
    case 'entity.parse.failed':
      return new AppError(400, 'malformed_json', 'The request body is not valid JSON.', { body: 'Not valid JSON.' });
    case 'entity.too.large':
      return new AppError(413, 'payload_too_large', 'The request body is too large.', { body: 'Too large.' });
    case 'charset.unsupported':
      return new AppError(415, 'unsupported_charset', 'Send the request body as UTF-8.', { 'content-type': 'Unsupported charset.' });
    case 'encoding.unsupported':
      return new AppError(415, 'unsupported_encoding', 'The request body’s Content-Encoding is not supported.', {
        'content-encoding': 'Use gzip, deflate, br or none.',
      });
    case 'request.aborted':
    case 'request.size.invalid':
      return new AppError(400, 'malformed_body', 'The request body did not arrive whole.', { body: 'Incomplete.' });
    case 'parameters.too.many':
      return new AppError(413, 'payload_too_large', 'The request has too many parameters.', { body: 'Too many parameters.' });
  }
  // Any other refusal of the parser (http-errors with a 4xx status, e.g. a gzip body that is not
  // gzip: the zlib error given status 400) keeps its status.
  if ((typeof err.type === 'string' || err.expose === true) && typeof err.status === 'number' && err.status >= 400 && err.status < 500) {
    return new AppError(err.status, 'malformed_body', 'The request body could not be read.', { body: 'Could not be read.' });
  }
  return undefined;
}

/** The last middleware: one error shape for every route, `{"error":{"code","message","fields"?}}`. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let error: AppError;
  const constraint = fromConstraintViolation(err);
  const parser = err && typeof err === 'object' ? fromBodyParser(err) : undefined;
  const upload = fromUploadError(err);
  const outage = err instanceof AppError ? undefined : fromOutage(err);
  if (err instanceof AppError) error = err;
  else if (constraint) error = constraint;
  else if (err instanceof z.ZodError) error = new AppError(400, 'validation_failed', 'Some fields are not valid.', fieldErrors(err));
  else if (parser) error = parser;
  else if (upload) error = upload;
  else if (outage) {
    // The service is down, not the request at fault: a short line, without the error's detail.
    logger.warn('dependency unavailable', { requestId: req.id, method: req.method, path: req.path, code: outage.code, err });
    error = outage;
  } else {
    logger.error('unhandled error', { requestId: req.id, method: req.method, path: req.path, err });
    error = new AppError(500, 'internal_error', 'Something went wrong on our side. Please try again.');
  }
  if (res.headersSent) return;
  if (error.headers) res.set(error.headers);
  res.status(error.status).json({
    error: {
      code: error.code,
      message: error.message,
      ...(error.fields ? { fields: error.fields } : {}),
      ...(error.details !== undefined ? { details: error.details } : {}),
    },
  });
};
