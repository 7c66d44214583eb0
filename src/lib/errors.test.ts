import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/errors';

// The codes the server answers for outages and for input it cannot take
// (server/middleware/error-handler.ts, outage-errors.ts, upload.ts, validate.ts) get words of
// their own, never the server's technical message.

describe('errorMessage for outages and unreadable input', () => {
  it('says which service is down and that nothing was saved', () => {
    const db = errorMessage(new ApiError(503, 'database_unavailable', 'The database is not answering.'));
    expect(db).toBe('Gridkeep cannot reach its database right now, so nothing was saved. Try again in a minute.');
    const storage = errorMessage(new ApiError(503, 'storage_unavailable', 'File storage is not answering.'));
    expect(storage).toBe('File storage is not answering, so the file was not saved. Try again in a minute.');
  });

  it('words an empty update and the upload refusals', () => {
    expect(errorMessage(new ApiError(400, 'nothing_to_change', 'Nothing to change: send at least one field.'))).toBe(
      'Nothing was changed, so there was nothing to save.',
    );
    expect(errorMessage(new ApiError(400, 'too_many_files', 'x'))).toBe('Send one file at a time.');
    expect(errorMessage(new ApiError(400, 'malformed_upload', 'x'))).toBe('The file did not arrive whole. Choose it again and retry.');
    expect(errorMessage(new ApiError(415, 'unsupported_charset', 'Send the request body as UTF-8.'))).toBe(
      'The request could not be read. Reload the page and try again.',
    );
  });

  it('still falls back on the status for a 503 without a known code', () => {
    expect(errorMessage(new ApiError(503, 'something_else', ''))).toBe('Gridkeep is busy or being updated. Try again in a moment.');
  });
});
