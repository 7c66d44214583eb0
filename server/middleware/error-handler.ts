import type { ErrorRequestHandler, RequestHandler } from 'express';
import { z } from 'zod';
import { fromConstraintViolation } from '../db/constraint-errors.js';
import { AppError, notFound } from '../errors.js';
import { logger } from '../logger.js';
import { fieldErrors } from './validate.js';

/** Unknown /api paths answer with the error shape, never the app's HTML. */
export const apiNotFound: RequestHandler = (_req, _res, next) => next(notFound('Endpoint'));

/** The last middleware: one error shape for every route, `{"error":{"code","message","fields"?}}`. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let error: AppError;
  const constraint = fromConstraintViolation(err);
  if (err instanceof AppError) error = err;
  else if (constraint) error = constraint;
  else if (err instanceof z.ZodError) error = new AppError(400, 'validation_failed', 'Some fields are not valid.', fieldErrors(err));
  else if (err?.type === 'entity.parse.failed') error = new AppError(400, 'malformed_json', 'The request body is not valid JSON.');
  else if (err?.type === 'entity.too.large') error = new AppError(413, 'payload_too_large', 'The request body is too large.');
  else if (err?.code === 'LIMIT_FILE_SIZE') error = new AppError(413, 'file_too_large', 'The file is larger than the upload limit.');
  else {
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
