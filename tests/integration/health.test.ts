import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.js';
import { signedIn } from '../factories/index.js';

describe('GET /api/health', () => {
  it('answers ok when the database answers', async () => {
    const res = await request(createApp()).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', database: 'ok' });
    expect(res.headers['cache-control']).toBe('no-store');
  });

  it('answers a signed-in caller the same, without a Retry-After while all is up', async () => {
    const office = await signedIn('coordinator');
    const res = await office.get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', database: 'ok' });
    expect(res.headers['retry-after']).toBeUndefined();
  });

  it('answers unknown API paths with the error shape', async () => {
    const res = await request(createApp()).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: { code: 'not_found', message: 'Endpoint not found.' } });
  });

  it('refuses a state-changing request without the CSRF header', async () => {
    const res = await request(createApp()).post('/api/health').send({});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_header_missing');
  });

  it('names malformed JSON in the error shape', async () => {
    const res = await request(createApp())
      .post('/api/health')
      .set('X-Requested-With', 'gridkeep')
      .set('Content-Type', 'application/json')
      .send('{"broken":');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed_json');
    expect(res.body.error.fields).toEqual({ body: 'Not valid JSON.' });
  });
});
