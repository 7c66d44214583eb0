// Outages answer 503, not 500: with the object store or the database down, the app says which
// service is down (a stable code), when to try again (Retry-After, RFC 9110 §10.2.3 and
// §15.6.4), leaves no half-written row, and /api/health answers without a session.
// OWASP ASVS 5.0 16.5.1 (a generic message, no stack traces or queries) and 16.5.2 (the app keeps
// operating securely when an external resource fails): checked against the ASVS 5.0.0 text.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureDatabase, startCluster, type Cluster } from '../../scripts/lib/postgres.js';
import { runMigrations } from '../../server/db/migrate.js';
import { setEnv, startTestS3, type TestS3 } from '../setup/fakes.js';
import type * as Factories from '../factories/index.js';

// A PostgreSQL cluster and an object store of this file's own, so stopping them touches no other test.
let tmp: string;
let cluster: Cluster;
let s3: TestS3;
let restoreEnv: () => void;
let f: typeof Factories;
let closeDb: () => Promise<void>;
let closeStorage: () => void;
let admin: Factories.Session;
let org: Awaited<ReturnType<typeof Factories.createOrganisation>>;

const pdf = Buffer.from('%PDF-1.4\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n');

beforeAll(async () => {
  tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-outages-'));
  fs.chmodSync(tmp, 0o755); // the postgres user must reach the cluster folder inside
  cluster = await startCluster({ dataDir: path.join(tmp, 'pg'), fast: true, log: () => {} });
  await ensureDatabase(cluster.url('postgres'), 'gridkeep');
  await runMigrations(cluster.url('gridkeep'));
  s3 = await startTestS3();
  // The server reads its settings once, on first use: point it at this cluster and store first.
  restoreEnv = setEnv({ DATABASE_URL: cluster.url('gridkeep'), ...s3.env });
  f = await import('../factories/index.js');
  ({ closeDb } = await import('../../server/db/client.js'));
  const storage = await import('../../server/integrations/s3.js');
  closeStorage = storage.closeStorage;
  await storage.ensureBucket();
  org = await f.createOrganisation({ withWall: true });
  admin = await f.signedIn('admin');
}, 120_000);

afterAll(async () => {
  closeStorage?.();
  await closeDb?.();
  cluster?.stop();
  await s3?.dispose();
  restoreEnv?.();
  if (tmp) fs.rmSync(tmp, { recursive: true, force: true });
});

/** "METHOD /path" of the request behind a response, for a failing check's message. */
function describeRequest(res: request.Response) {
  const req = (res as unknown as { req?: { method?: string; path?: string } }).req;
  return `${req?.method ?? ''} ${req?.path ?? ''}`;
}

function expectOutage(res: request.Response, code: string) {
  const what = `${describeRequest(res)} → ${res.status} ${JSON.stringify(res.body)}`;
  expect(res.status, what).toBe(503);
  expect(res.body.error.code, what).toBe(code);
  expect(res.headers['retry-after'], what).toMatch(/^\d+$/);
  expect(JSON.stringify(res.body)).not.toMatch(/ECONNREFUSED|127\.0\.0\.1|stack|Failed query/);
}

describe('object store down', () => {
  it('an upload answers 503 storage_unavailable and leaves no attachment row', async () => {
    const { db } = await import('../../server/db/client.js');
    const { attachments } = await import('../../server/db/schema/files.js');
    const upload = () =>
      admin.agent.post(`/api/walls/${org.wall!.id}/documents`).set('X-Requested-With', 'gridkeep').attach('file', pdf, 'as-built.pdf');

    // First, with the store up: the upload works (so the 503 below is the outage, nothing else).
    const ok = await upload();
    expect(ok.status).toBe(201);

    await s3.stop();
    const res = await upload();
    expectOutage(res, 'storage_unavailable');
    const rows = await db().select({ id: attachments.id }).from(attachments).where(eq(attachments.wallId, org.wall!.id));
    expect(rows.map((r) => r.id)).toEqual([ok.body.id]);
  });
});

describe('database down', () => {
  beforeAll(() => {
    cluster.stop(); // pg_ctl stop -m fast: open connections get 57P01, new ones ECONNREFUSED
  });

  it('a signed-in read answers 503 database_unavailable with Retry-After', async () => {
    expectOutage(await admin.get('/api/clients'), 'database_unavailable');
    expectOutage(await admin.get(`/api/walls/${org.wall!.id}`), 'database_unavailable');
  });

  it('a write answers 503 database_unavailable', async () => {
    expectOutage(await admin.patch(`/api/clients/${org.client.id}`, { notes: 'while the database is down' }), 'database_unavailable');
  });

  it('signing in answers 503 database_unavailable', async () => {
    const res = await f
      .anonymous()
      .post('/api/auth/login')
      .set('X-Requested-With', 'gridkeep')
      .send({ email: admin.user.email, password: f.TEST_PASSWORD });
    expectOutage(res, 'database_unavailable');
  });

  it('/api/health answers 503 naming the database, signed in or not', async () => {
    for (const res of [await admin.get('/api/health'), await f.anonymous().get('/api/health')]) {
      expect(res.status).toBe(503);
      expect(res.body).toEqual({ status: 'degraded', database: 'down' });
      expect(res.headers['retry-after']).toMatch(/^\d+$/);
    }
  });

  it('bad input is still refused as bad input, before any query', async () => {
    const res = await admin.get('/api/clients?q=a%00b');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('q');
  });
});
