import type { RequestHandler } from 'express';
import multer from 'multer';
import { config } from '../config.js';
import { badRequest } from '../errors.js';

/**
 * One file in the multipart field `file`, held in memory up to UPLOAD_MAX_BYTES (a larger one
 * is a 413). The content is checked by the attachments service, never trusted from the name.
 */
export function singleFile(): RequestHandler {
  // Built on first use: routes are defined at import time, before the configuration is read.
  let handler: RequestHandler | undefined;
  return (req, res, next) => {
    handler ??= multer({
      storage: multer.memoryStorage(),
      limits: { fileSize: config().UPLOAD_MAX_BYTES, files: 1, fields: 10 },
    }).single('file');
    handler(req, res, (err?: unknown) => {
      if (err) return next(err);
      if (!req.file) return next(badRequest('validation_failed', 'Choose a file to upload.', { file: 'Required.' }));
      // Browsers send the file name as raw UTF-8 bytes; the multipart parser reads them as Latin-1.
      const utf8 = Buffer.from(req.file.originalname, 'latin1').toString('utf8');
      if (!utf8.includes('\uFFFD')) req.file.originalname = utf8;
      next();
    });
  };
}
