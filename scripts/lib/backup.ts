// Backup and restore of everything Gridkeep keeps: the database (pg_dump's custom format, which
// holds the mail queue too) and the stored files (every object of the bucket, read through the
// S3 API, so a real S3 service is backed up the same way as the local fake). A backup is a folder:
//
//   manifest.json      what is in it: row counts per table, each object's size and SHA-256
//   database.dump      pg_dump -Fc
//   objects/<key>      the bucket's objects, byte for byte
//
// Restore checks every object against the manifest before it touches anything.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { type Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import {
  CreateBucketCommand,
  GetObjectCommand,
  HeadBucketCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import pg from 'pg';
import { findPgBin } from './postgres.js';

export const backupFormat = 'gridkeep-backup';
export const backupVersion = 1;

export interface StorageSettings {
  endpoint?: string;
  region: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  forcePathStyle: boolean;
}

export interface BackupObject {
  key: string;
  size: number;
  sha256: string;
  contentType?: string;
}

export interface BackupManifest {
  format: typeof backupFormat;
  version: number;
  createdAt: string;
  /** The newest migration applied to the database when it was backed up. */
  migration: string | null;
  /** Rows per table (schema-qualified), to check a restore against. */
  tables: Record<string, number>;
  /** Mails waiting in the queue at backup time: a restore sends them unless told not to. */
  queuedMail: number;
  objects: BackupObject[];
}

export function storageFromEnv(env: NodeJS.ProcessEnv = process.env): StorageSettings {
  return {
    endpoint: env.S3_ENDPOINT || undefined,
    region: env.S3_REGION || 'us-east-1',
    bucket: env.S3_BUCKET || 'gridkeep',
    accessKeyId: env.S3_ACCESS_KEY_ID || 'S3RVER',
    secretAccessKey: env.S3_SECRET_ACCESS_KEY || 'S3RVER',
    forcePathStyle: ['1', 'true', 'yes'].includes((env.S3_FORCE_PATH_STYLE ?? '').toLowerCase()),
  };
}

function s3Client(s: StorageSettings) {
  process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
  return new S3Client({
    region: s.region,
    ...(s.endpoint ? { endpoint: s.endpoint } : {}),
    forcePathStyle: s.forcePathStyle,
    credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey },
    // As in server/integrations/s3.ts: checksums only where S3 requires them.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}

/** A PostgreSQL client program (pg_dump, pg_restore) from the same Debian package as the server. */
function pgProgram(name: string): string {
  const bin = findPgBin();
  return bin ? path.join(bin, name) : name;
}

function run(program: string, args: string[]) {
  const r = spawnSync(pgProgram(program), args, { encoding: 'utf8' });
  if (r.error) throw new Error(`${program} could not run: ${r.error.message}`);
  if (r.status !== 0) throw new Error(`${program} failed (exit ${r.status}): ${(r.stderr || r.stdout).trim()}`);
}

async function withClient<T>(url: string, fn: (c: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/** Rows per table of the public and drizzle schemas. */
export async function tableCounts(c: pg.Client): Promise<Record<string, number>> {
  const { rows } = await c.query<{ schema: string; name: string }>(
    `select table_schema as schema, table_name as name from information_schema.tables
      where table_type = 'BASE TABLE' and table_schema in ('public', 'drizzle') order by 1, 2`,
  );
  const counts: Record<string, number> = {};
  for (const t of rows) {
    const ident = `"${t.schema}"."${t.name.replace(/"/g, '""')}"`;
    const { rows: n } = await c.query<{ n: string }>(`select count(*) as n from ${ident}`);
    counts[`${t.schema}.${t.name}`] = Number(n[0].n);
  }
  return counts;
}

async function newestMigration(c: pg.Client): Promise<string | null> {
  const { rows } = await c
    .query<{ hash: string }>(`select hash from drizzle.__drizzle_migrations order by created_at desc limit 1`)
    .catch(() => ({ rows: [] as { hash: string }[] }));
  return rows[0]?.hash ?? null;
}

async function sha256File(file: string): Promise<string> {
  const hash = createHash('sha256');
  await pipeline(fs.createReadStream(file), hash);
  return hash.digest('hex');
}

/** The object's file inside the backup; refuses a key that would leave the objects folder. */
function objectPath(dir: string, key: string): string {
  const root = path.resolve(dir, 'objects');
  const file = path.resolve(root, key);
  if (!file.startsWith(root + path.sep)) throw new Error(`Object key ${JSON.stringify(key)} would be written outside the backup.`);
  return file;
}

export interface BackupOptions {
  databaseUrl: string;
  storage: StorageSettings;
  /** The folder to write; must not exist yet. */
  out: string;
  log?: (line: string) => void;
}

export async function backup({ databaseUrl, storage, out, log = () => {} }: BackupOptions): Promise<BackupManifest> {
  if (fs.existsSync(out)) throw new Error(`${out} already exists: give a new folder for the backup.`);
  const partial = `${out}.partial`;
  fs.rmSync(partial, { recursive: true, force: true });
  fs.mkdirSync(path.join(partial, 'objects'), { recursive: true });

  // The counts and the dump see the same moment: the counts are read inside a transaction whose
  // snapshot pg_dump is given (--snapshot), so the manifest describes exactly the dump.
  const createdAt = new Date().toISOString();
  await withClient(databaseUrl, async (c) => {
    const { rows } = await c.query<{ n: string }>(`select count(*) as n from information_schema.tables where table_schema = 'public'`);
    if (Number(rows[0].n) === 0) throw new Error('The database holds no Gridkeep tables: nothing to back up.');
  });
  const { tables, migration, queuedMail } = await withClient(databaseUrl, async (c) => {
    await c.query('begin isolation level repeatable read read only');
    try {
      const { rows } = await c.query<{ id: string }>('select pg_export_snapshot() as id');
      const seen = {
        tables: await tableCounts(c),
        migration: await newestMigration(c),
        queuedMail: Number(
          (await c.query<{ n: string }>(`select count(*) as n from outbound_mail where status in ('queued', 'sending')`)).rows[0].n,
        ),
      };
      log('Dumping the database (pg_dump)…');
      run('pg_dump', [
        '--format=custom',
        '--no-owner',
        '--no-privileges',
        `--snapshot=${rows[0].id}`,
        `--file=${path.join(partial, 'database.dump')}`,
        databaseUrl,
      ]);
      return seen;
    } finally {
      await c.query('rollback');
    }
  });

  log(`Copying the stored files from bucket ${storage.bucket}…`);
  const s3 = s3Client(storage);
  const objects: BackupObject[] = [];
  try {
    let token: string | undefined;
    do {
      const page = await s3.send(new ListObjectsV2Command({ Bucket: storage.bucket, ContinuationToken: token }));
      for (const item of page.Contents ?? []) {
        if (!item.Key) continue;
        const file = objectPath(partial, item.Key);
        fs.mkdirSync(path.dirname(file), { recursive: true });
        const got = await s3.send(new GetObjectCommand({ Bucket: storage.bucket, Key: item.Key }));
        const hash = createHash('sha256');
        let size = 0;
        const body = got.Body as Readable;
        body.on('data', (chunk: Buffer) => {
          hash.update(chunk);
          size += chunk.length;
        });
        await pipeline(body, fs.createWriteStream(file));
        objects.push({ key: item.Key, size, sha256: hash.digest('hex'), ...(got.ContentType ? { contentType: got.ContentType } : {}) });
      }
      token = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (token);
  } finally {
    s3.destroy();
  }

  const manifest: BackupManifest = { format: backupFormat, version: backupVersion, createdAt, migration, tables, queuedMail, objects };
  fs.writeFileSync(path.join(partial, 'manifest.json'), JSON.stringify(manifest, null, 2) + '\n');
  // Only a finished backup carries the final name.
  fs.renameSync(partial, out);
  return manifest;
}

export function readManifest(dir: string): BackupManifest {
  const file = path.join(dir, 'manifest.json');
  if (!fs.existsSync(file)) throw new Error(`${dir} is not a Gridkeep backup: manifest.json is missing.`);
  const manifest = JSON.parse(fs.readFileSync(file, 'utf8')) as BackupManifest;
  if (manifest.format !== backupFormat) throw new Error(`${dir} is not a Gridkeep backup (format ${String(manifest.format)}).`);
  if (manifest.version > backupVersion) throw new Error(`${dir} was written by a newer Gridkeep (backup version ${manifest.version}).`);
  if (!fs.existsSync(path.join(dir, 'database.dump'))) throw new Error(`${dir} has no database.dump.`);
  return manifest;
}

/** Every object present with the size and SHA-256 the manifest names; the problems found. */
export async function verifyBackup(dir: string, manifest = readManifest(dir)): Promise<string[]> {
  const problems: string[] = [];
  for (const o of manifest.objects) {
    const file = objectPath(dir, o.key);
    if (!fs.existsSync(file)) {
      problems.push(`${o.key}: missing`);
      continue;
    }
    const size = fs.statSync(file).size;
    if (size !== o.size) problems.push(`${o.key}: ${size} bytes, the manifest says ${o.size}`);
    else if ((await sha256File(file)) !== o.sha256) problems.push(`${o.key}: its content differs from the manifest (SHA-256)`);
  }
  return problems;
}

export interface RestoreOptions {
  databaseUrl: string;
  storage: StorageSettings;
  from: string;
  /** Overwrite a database that already holds data (the app must be stopped). */
  replace?: boolean;
  /** Mark the mail still queued at backup time as not sent, instead of sending it. */
  skipQueuedMail?: boolean;
  log?: (line: string) => void;
}

export interface RestoreResult {
  manifest: BackupManifest;
  tables: Record<string, number>;
  objects: number;
  mailSkipped: number;
}

export async function restore({
  databaseUrl,
  storage,
  from,
  replace = false,
  skipQueuedMail = false,
  log = () => {},
}: RestoreOptions): Promise<RestoreResult> {
  const manifest = readManifest(from);
  log(`Checking ${manifest.objects.length} stored files against the manifest…`);
  const problems = await verifyBackup(from, manifest);
  if (problems.length) throw new Error(`The backup is damaged; nothing was restored:\n  ${problems.slice(0, 20).join('\n  ')}`);

  await withClient(databaseUrl, async (c) => {
    const { rows } = await c.query<{ n: string }>(`select count(*) as n from information_schema.tables where table_schema = 'public'`);
    if (Number(rows[0].n) === 0) return;
    if (!replace) {
      throw new Error(
        'The database already holds tables. Restore into an empty database, or pass --replace to overwrite it (stop the app first).',
      );
    }
    const others = await c.query<{ n: string }>(
      `select count(*) as n from pg_stat_activity where datname = current_database() and pid <> pg_backend_pid()`,
    );
    if (Number(others.rows[0].n) > 0) {
      throw new Error(`${others.rows[0].n} other connection(s) use the database: stop the app before a restore with --replace.`);
    }
    log('Clearing the database…');
    await c.query('drop schema if exists drizzle cascade');
    await c.query('drop schema public cascade');
    await c.query('create schema public');
  });

  log('Restoring the database (pg_restore)…');
  run('pg_restore', [
    '--no-owner',
    '--no-privileges',
    '--single-transaction',
    '--exit-on-error',
    `--dbname=${databaseUrl}`,
    path.join(from, 'database.dump'),
  ]);

  let mailSkipped = 0;
  if (skipQueuedMail) {
    mailSkipped = await withClient(databaseUrl, async (c) => {
      const r = await c.query(
        `update outbound_mail set status = 'failed', locked_until = null, last_error = 'Not sent: skipped when the backup was restored'
          where status in ('queued', 'sending')`,
      );
      return r.rowCount ?? 0;
    });
  }

  log(`Restoring ${manifest.objects.length} stored files to bucket ${storage.bucket}…`);
  const s3 = s3Client(storage);
  try {
    try {
      await s3.send(new HeadBucketCommand({ Bucket: storage.bucket }));
    } catch {
      await s3.send(new CreateBucketCommand({ Bucket: storage.bucket }));
    }
    for (const o of manifest.objects) {
      const file = objectPath(from, o.key);
      await s3.send(
        new PutObjectCommand({
          Bucket: storage.bucket,
          Key: o.key,
          Body: fs.createReadStream(file),
          ContentLength: o.size,
          ...(o.contentType ? { ContentType: o.contentType } : {}),
        }),
      );
    }
  } finally {
    s3.destroy();
  }

  const tables = await withClient(databaseUrl, tableCounts);
  const differ = Object.entries(manifest.tables).filter(([t, n]) => tables[t] !== n);
  if (differ.length) throw new Error(`Restored tables differ from the backup's counts: ${differ.map(([t]) => t).join(', ')}`);
  return { manifest, tables, objects: manifest.objects.length, mailSkipped };
}
