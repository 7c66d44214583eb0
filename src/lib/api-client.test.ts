import { describe, expect, it } from 'vitest';
import { ApiError, readResponse, requestHeaders } from '@/lib/api-client';

// The contract is the server's (server/middleware/error-handler.ts and DEVELOPERS.md): every
// error answers `{"error":{"code","message","fields"?,"details"?}}`, and a state-changing
// request must carry `X-Requested-With: gridkeep`. Status classes per RFC 9110 §15.

describe('readResponse', () => {
  it('returns the JSON body of a 2xx answer, and nothing for an empty one (204)', () => {
    expect(readResponse(200, 'OK', '{"id":"a1","n":2}')).toEqual({ id: 'a1', n: 2 });
    expect(readResponse(204, 'No Content', '')).toBeUndefined();
  });

  it("turns the server's error body into an ApiError with its code, fields, details and request id", () => {
    const body = JSON.stringify({
      error: {
        code: 'validation_failed',
        message: 'Some rows are not valid.',
        fields: { serial: 'Required.' },
        details: { errors: [{ line: 3 }] },
      },
    });
    let caught: unknown;
    try {
      readResponse(400, 'Bad Request', body, 'req-7');
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(ApiError);
    const e = caught as ApiError;
    expect([e.status, e.code, e.message, e.requestId]).toEqual([400, 'validation_failed', 'Some rows are not valid.', 'req-7']);
    expect(e.fields).toEqual({ serial: 'Required.' });
    expect(e.details).toEqual({ errors: [{ line: 3 }] });
  });

  it('falls back to the status for an error without our body (a proxy page)', () => {
    expect(() => readResponse(502, 'Bad Gateway', '<html>bad gateway</html>')).toThrow(
      expect.objectContaining({ status: 502, code: 'http_502', message: 'Bad Gateway' }),
    );
  });

  it('refuses a 2xx answer that is not JSON', () => {
    expect(() => readResponse(200, 'OK', '<!doctype html>')).toThrow(expect.objectContaining({ code: 'unexpected_response' }));
  });
});

describe('requestHeaders', () => {
  it('adds the CSRF header to state-changing methods only', () => {
    expect(requestHeaders('GET')).toEqual({ Accept: 'application/json' });
    expect(requestHeaders('POST')).toEqual({ Accept: 'application/json', 'X-Requested-With': 'gridkeep' });
    expect(requestHeaders('DELETE')['X-Requested-With']).toBe('gridkeep');
  });
});
