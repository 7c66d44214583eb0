import type { RequestHandler } from 'express';
import multer from 'multer';
import { config } from '../config.js';
import { AppError, badRequest, validationFailed } from '../errors.js';
import { nulFields } from './validate.js';

/** Multer's refusals in the error shape, each naming the multipart field at fault. */
const byMulterCode: Record<string, (field: string) => AppError> = {
  LIMIT_FILE_SIZE: () => new AppError(413, 'file_too_large', 'The file is larger than the upload limit.', { file: 'Too large.' }),
  LIMIT_FILE_COUNT: () => badRequest('too_many_files', 'Send one file at a time.', { file: 'Only one file.' }),
  LIMIT_UNEXPECTED_FILE: (field) =>
    badRequest('unexpected_file_field', 'Send the file in the field named "file".', { [field || 'file']: 'Not expected here.' }),
  LIMIT_PART_COUNT: () => new AppError(413, 'too_many_fields', 'The upload has too many parts.', { body: 'Too many parts.' }),
  LIMIT_FIELD_COUNT: () => new AppError(413, 'too_many_fields', 'The upload has too many fields.', { body: 'Too many fields.' }),
  LIMIT_FIELD_KEY: (field) => new AppError(413, 'field_too_large', 'A field name is too long.', { [field || 'body']: 'Name too long.' }),
  LIMIT_FIELD_VALUE: (field) => new AppError(413, 'field_too_large', 'A field is too long.', { [field || 'body']: 'Too long.' }),
};

/** A multer error (too large, two files, a misnamed field…) as a 4xx naming the field, or undefined. */
export function fromUploadError(err: unknown): AppError | undefined {
  if (!(err instanceof multer.MulterError)) return undefined;
  const make = byMulterCode[err.code];
  return make
    ? make(err.field ?? '')
    : badRequest('malformed_upload', 'The upload could not be read.', { [err.field || 'file']: 'Not valid.' });
}

/**
 * One file in the multipart field `file`, held in memory up to UPLOAD_MAX_BYTES (a larger one
 * is a 413). The content is checked by the attachments service, never trusted from the name.
 * Whatever the parser refuses (a bad boundary, a cut-off body, two files, a misnamed field, too
 * many fields), an empty file and a NUL in a field are 4xx answers naming the field, never a 500.
 */
export function singleFile(): RequestHandler {
  // Built on first use: routes are defined at import time, before the configuration is read.
  let handler: RequestHandler | undefined;
  return (req, res, next) => {
    handler ??= multer({
      storage: multer.memoryStorage(),
      limits: { fileSize: config().UPLOAD_MAX_BYTES, files: 1, fields: 10, parts: 12, fieldSize: 10_000 },
    }).single('file');
    handler(req, res, (err?: unknown) => {
      if (err) {
        // The multipart parser's own errors (no boundary, body cut short, malformed part) are plain Errors.
        return next(
          fromUploadError(err) ?? badRequest('malformed_upload', 'The upload could not be read.', { file: 'Not a valid upload.' }),
        );
      }
      if (!req.file) return next(badRequest('validation_failed', 'Choose a file to upload.', { file: 'Required.' }));
      if (req.file.size === 0) return next(badRequest('validation_failed', 'The file is empty.', { file: 'The file is empty.' }));
      // Browsers send the file name as raw UTF-8 bytes; the multipart parser reads them as Latin-1.
      const utf8 = Buffer.from(req.file.originalname, 'latin1').toString('utf8');
      if (!utf8.includes('\uFFFD')) req.file.originalname = utf8;
      const nul = nulFields(req.body);
      if (req.file.originalname.includes('\0')) nul.file = 'The file name contains a character that is not allowed (NUL).';
      if (Object.keys(nul).length) return next(validationFailed(nul));
      next();
    });
  };
}
