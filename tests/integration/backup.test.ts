// `npm run backup` / `npm run restore` (scripts/lib/backup.ts): the demo data and stored files,
// backed up and restored into a fresh database and a fresh object store, must come back whole —
// every row of every table (compared by content, not only by count) and every file byte for byte.
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { GetObjectCommand, PutObjectCommand, S3Client, CreateBucketCommand } from '@aws-sdk/client-s3';
import { drizzle } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { backup, readManifest, restore, type BackupManifest, type StorageSettings } from '../../scripts/lib/backup.js';
import { ensureDatabase } from '../../scripts/lib/postgres.js';
import * as schema from '../../server/db/schema/index.js';
import { seedIfEmpty } from '../../server/db/seed.js';
import { createIsolatedDatabase } from '../setup/isolated-database.js';
import { startTestS3, type TestS3 } from '../setup/fakes.js';

let source: Awaited<ReturnType<typeof createIsolatedDatabase>>;
let sourceS3: TestS3;
let targetS3: TestS3;
const made: string[] = [];
const work = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-backup-test-'));

const storageOf = (s3: TestS3): StorageSettings => ({
  endpoint: s3.env.S3_ENDPOINT,
  region: 'us-east-1',
  bucket: s3.env.S3_BUCKET,
  accessKeyId: s3.env.S3_ACCESS_KEY_ID,
  secretAccessKey: s3.env.S3_SECRET_ACCESS_KEY,
  forcePathStyle: true,
});
const client = (s3: TestS3) =>
  new S3Client({
    region: 'us-east-1',
    endpoint: s3.env.S3_ENDPOINT,
    forcePathStyle: true,
    credentials: { accessKeyId: s3.env.S3_ACCESS_KEY_ID, secretAccessKey: s3.env.S3_SECRET_ACCESS_KEY },
  });

/** A new, empty (not migrated) database in the test cluster. */
async function emptyDatabase(): Promise<string> {
  const admin = new URL(inject('databaseUrl'));
  admin.pathname = '/postgres';
  const name = `gridkeep_restore_${randomUUID().slice(0, 8)}`;
  await ensureDatabase(admin.toString(), name);
  made.push(name);
  const url = new URL(admin.toString());
  url.pathname = `/${name}`;
  return url.toString();
}

async function query<T extends pg.QueryResultRow>(url: string, text: string, values: unknown[] = []): Promise<T[]> {
  const c = new pg.Client({ connectionString: url });
  await c.connect();
  try {
    return (await c.query<T>(text, values)).rows;
  } finally {
    await c.end();
  }
}

/** Each table's rows as one digest of their text, in a fixed order: equal digests, equal rows. */
async function tableDigests(url: string): Promise<Record<string, string>> {
  const tables = await query<{ t: string }>(
    url,
    `select format('%I.%I', table_schema, table_name) as t from information_schema.tables
      where table_type = 'BASE TABLE' and table_schema in ('public', 'drizzle') order by 1`,
  );
  const out: Record<string, string> = {};
  for (const { t } of tables) {
    const [row] = await query<{ d: string; n: string }>(
      url,
      `select md5(coalesce(string_agg(x::text, '|' order by x::text), '')) as d, count(*) as n from ${t} x`,
    );
    out[t] = `${row.n}:${row.d}`;
  }
  return out;
}

const files = [
  { key: 'tickets/one/photo.jpg', body: Buffer.from(Array.from({ length: 70_000 }, (_, i) => (i * 31) % 256)), type: 'image/jpeg' },
  { key: 'walls/two/as-built drawing.pdf', body: Buffer.from('%PDF-1.4 as-built drawing of the lobby wall\n'), type: 'application/pdf' },
  { key: 'empty.txt', body: Buffer.alloc(0), type: 'text/plain' },
];

let manifest: BackupManifest;
let restoredUrl: string;
const backupDir = path.join(work, 'first');

beforeAll(async () => {
  source = await createIsolatedDatabase('gridkeep_backup');
  const pool = new pg.Pool({ connectionString: source.url, max: 4 });
  await seedIfEmpty(drizzle(pool, { schema, casing: 'snake_case' }));
  // A mail still waiting in the queue at backup time.
  await pool.query(
    `insert into outbound_mail (message_id, "to", subject, text) values ('<backup-test@gridkeep>', '{a@example.test}', 'Queued at backup', 'body')`,
  );
  await pool.end();

  sourceS3 = await startTestS3('gridkeep-backup-src');
  targetS3 = await startTestS3('gridkeep-backup-dst');
  const s3 = client(sourceS3);
  await s3.send(new CreateBucketCommand({ Bucket: sourceS3.env.S3_BUCKET }));
  for (const f of files)
    await s3.send(new PutObjectCommand({ Bucket: sourceS3.env.S3_BUCKET, Key: f.key, Body: f.body, ContentType: f.type }));
  s3.destroy();

  manifest = await backup({ databaseUrl: source.url, storage: storageOf(sourceS3), out: backupDir });
  restoredUrl = await emptyDatabase();
  await restore({ databaseUrl: restoredUrl, storage: storageOf(targetS3), from: backupDir });
}, 240_000);

afterAll(async () => {
  await source?.drop();
  for (const name of made) {
    const admin = new URL(inject('databaseUrl'));
    admin.pathname = '/postgres';
    await query(admin.toString(), `drop database if exists "${name}" with (force)`);
  }
  await sourceS3?.dispose();
  await targetS3?.dispose();
  fs.rmSync(work, { recursive: true, force: true });
});

describe('backup', () => {
  it('writes a manifest naming every table with its rows and every file with its checksum', () => {
    expect(readManifest(backupDir)).toEqual(manifest);
    // The demo data fills these tables; the manifest's counts come from the dump's own snapshot.
    expect(manifest.tables['public.tickets']).toBeGreaterThan(40);
    expect(manifest.tables['public.cabinets']).toBeGreaterThan(100);
    expect(manifest.tables['drizzle.__drizzle_migrations']).toBe(fs.readdirSync('drizzle').filter((f) => f.endsWith('.sql')).length);
    expect(manifest.queuedMail).toBeGreaterThanOrEqual(1);
    expect(manifest.objects.map((o) => o.key).sort()).toEqual(files.map((f) => f.key).sort());
    // SHA-256 of the empty string (FIPS 180-4 test vector, as every sha256sum prints it).
    expect(manifest.objects.find((o) => o.key === 'empty.txt')?.sha256).toBe(
      'e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855',
    );
  });

  it('refuses to write over an existing folder', async () => {
    await expect(backup({ databaseUrl: source.url, storage: storageOf(sourceS3), out: backupDir })).rejects.toThrow(/already exists/);
  });
});

describe('restore into a fresh database and object store', () => {
  it('brings back every row of every table', async () => {
    const [before, after] = await Promise.all([tableDigests(source.url), tableDigests(restoredUrl)]);
    expect(Object.keys(after).length).toBeGreaterThan(25);
    expect(after).toEqual(before);
  });

  it('brings back every file byte for byte, with its type', async () => {
    const s3 = client(targetS3);
    try {
      for (const f of files) {
        const got = await s3.send(new GetObjectCommand({ Bucket: targetS3.env.S3_BUCKET, Key: f.key }));
        expect(Buffer.from(await got.Body!.transformToByteArray())).toEqual(f.body);
        expect(got.ContentType).toBe(f.type);
      }
    } finally {
      s3.destroy();
    }
  });

  it('keeps the queued mail queued, so nothing waiting is lost', async () => {
    const rows = await query<{ status: string }>(
      restoredUrl,
      `select status from outbound_mail where message_id = '<backup-test@gridkeep>'`,
    );
    expect(rows).toEqual([{ status: 'queued' }]);
  });

  it('refuses a database that already holds data unless told to replace it', async () => {
    await expect(restore({ databaseUrl: restoredUrl, storage: storageOf(targetS3), from: backupDir })).rejects.toThrow(/--replace/);
    await query(restoredUrl, `delete from ticket_comments`);
    await restore({ databaseUrl: restoredUrl, storage: storageOf(targetS3), from: backupDir, replace: true, skipQueuedMail: true });
    expect((await tableDigests(restoredUrl))['public.ticket_comments']).toEqual((await tableDigests(source.url))['public.ticket_comments']);
    const rows = await query<{ status: string }>(
      restoredUrl,
      `select status from outbound_mail where message_id = '<backup-test@gridkeep>'`,
    );
    expect(rows).toEqual([{ status: 'failed' }]);
  });

  it('touches nothing when a stored file in the backup is damaged', async () => {
    const damaged = path.join(work, 'damaged');
    fs.cpSync(backupDir, damaged, { recursive: true });
    const file = path.join(damaged, 'objects', 'tickets/one/photo.jpg');
    const bytes = fs.readFileSync(file);
    bytes[100] ^= 0xff; // same size, one byte changed
    fs.writeFileSync(file, bytes);
    const target = await emptyDatabase();
    await expect(restore({ databaseUrl: target, storage: storageOf(targetS3), from: damaged })).rejects.toThrow(/damaged.*photo\.jpg/s);
    const tables = await query(target, `select 1 from information_schema.tables where table_schema = 'public'`);
    expect(tables).toHaveLength(0);
  });
});
