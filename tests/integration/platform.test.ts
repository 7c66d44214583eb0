// The production entry (server/index.ts) as its own process, on a PostgreSQL cluster of its own
// that the test stops and starts again: the server must answer 503 while the database is down,
// recover by itself, keep its mail worker listening, and stop cleanly on SIGTERM.
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureDatabase, freePort, startCluster, type Cluster } from '../../scripts/lib/postgres.js';
import { projectRoot } from '../../scripts/lib/local-services.js';
import { startTestS3, startTestSmtp, type TestS3, type TestSmtp } from '../setup/fakes.js';

let tmp: string;
let cluster: Cluster;
let smtp: TestSmtp;
let s3: TestS3;
let child: ChildProcess;
let output = '';
let base: string;
let databaseUrl: string;

async function health() {
  const res = await fetch(`${base}/api/health`);
  return { status: res.status, body: await res.json() };
}

async function until<T>(probe: () => Promise<T | undefined>, timeoutMs: number, what: string): Promise<T> {
  const end = Date.now() + timeoutMs;
  let last: unknown;
  while (Date.now() < end) {
    try {
      const value = await probe();
      if (value !== undefined) return value;
    } catch (err) {
      last = err;
    }
    if (child.exitCode !== null) throw new Error(`server exited (${child.exitCode}) while waiting for ${what}:\n${output}`);
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`timed out waiting for ${what} (${String(last ?? '')}):\n${output}`);
}

beforeAll(async () => {
  tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-platform-'));
  fs.chmodSync(tmp, 0o755); // the postgres user must reach the cluster folder inside
  cluster = await startCluster({ dataDir: path.join(tmp, 'pg'), fast: true, log: () => {} });
  await ensureDatabase(cluster.url('postgres'), 'gridkeep');
  databaseUrl = cluster.url('gridkeep');
  [smtp, s3] = await Promise.all([startTestSmtp(), startTestS3()]);

  const port = await freePort();
  base = `http://127.0.0.1:${port}`;
  const env: NodeJS.ProcessEnv = {
    PATH: process.env.PATH,
    HOME: process.env.HOME,
    NODE_ENV: 'production',
    LOG_LEVEL: 'warn',
    PORT: String(port),
    HOST: '127.0.0.1',
    DATABASE_URL: databaseUrl,
    JWT_SECRET: 'platform-test-secret-that-is-long-enough-for-hs256',
    ...s3.env,
    SMTP_HOST: smtp.env.SMTP_HOST,
    SMTP_PORT: smtp.env.SMTP_PORT,
    MAIL_WORKER: 'true',
    // Polling this rarely means only NOTIFY can explain a prompt delivery.
    MAIL_POLL_MS: '600000',
  };
  child = spawn(path.join(projectRoot, 'node_modules/.bin/tsx'), ['server/index.ts'], {
    cwd: projectRoot,
    env,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout!.on('data', (d) => (output += d));
  child.stderr!.on('data', (d) => (output += d));
  // The entry applies the migrations before it listens.
  await until(async () => ((await health()).status === 200 ? true : undefined), 60_000, 'the server to answer');
});

afterAll(async () => {
  if (child && child.exitCode === null) {
    child.kill('SIGKILL');
    await new Promise((r) => child.once('exit', r));
  }
  await Promise.all([smtp?.dispose(), s3?.dispose()]);
  cluster?.stop();
  if (tmp) fs.rmSync(tmp, { recursive: true, force: true });
});

async function queueRawMail(subject: string) {
  // What queueMail() writes, by hand: this test checks the server process, not the module.
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    await client.query('begin');
    await client.query(`insert into outbound_mail (message_id, "to", subject, text) values ($1, $2, $3, 'x')`, [
      `<${subject.replace(/\W+/g, '-')}@gridkeep.test>`,
      ['office@example.test'],
      subject,
    ]);
    await client.query(`select pg_notify('outbound_mail', '')`);
    await client.query('commit');
  } finally {
    await client.end();
  }
}

const subjects = () => smtp.received().map((m) => /^Subject: (.*)$/m.exec(m.raw.toString())?.[1]);

describe('the server process and its database', () => {
  it('answers health 200 with the database up, having applied the migrations', async () => {
    expect(await health()).toEqual({ status: 200, body: { status: 'ok', database: 'ok' } });
    const client = new pg.Client({ connectionString: databaseUrl });
    await client.connect();
    const { rows } = await client.query(`select count(*)::int as n from drizzle.__drizzle_migrations`);
    await client.end();
    const journal = JSON.parse(fs.readFileSync(path.join(projectRoot, 'drizzle/meta/_journal.json'), 'utf8'));
    expect(rows[0].n).toBe(journal.entries.length);
  });

  it('sends queued mail at once when notified', async () => {
    await queueRawMail('Before the restart');
    await until(async () => (subjects().includes('Before the restart') ? true : undefined), 10_000, 'the first message');
  });

  it('has no development mailbox when real SMTP is configured', async () => {
    const res = await fetch(`${base}/api/dev/mailbox`);
    expect(res.status).toBe(404);
    expect(await res.json()).toMatchObject({ error: { code: 'not_found' } });
  });

  it('answers 503 "database down" while PostgreSQL is stopped, and keeps running', async () => {
    cluster.stop();
    const down = await health();
    expect(down).toEqual({ status: 503, body: { status: 'degraded', database: 'down' } });
    // A few more requests and a pause, so lost idle connections have surfaced as errors.
    await new Promise((r) => setTimeout(r, 1500));
    expect((await health()).status).toBe(503);
    expect(child.exitCode).toBeNull();
  });

  it('answers 200 again after PostgreSQL is back, without a restart of its own', async () => {
    cluster = await startCluster({ dataDir: cluster.dataDir, port: cluster.port, fast: true, log: () => {} });
    const back = await until(
      async () => {
        const h = await health();
        return h.status === 200 ? h : undefined;
      },
      15_000,
      'health 200 after the restart',
    );
    expect(back.body).toEqual({ status: 'ok', database: 'ok' });
    expect(child.exitCode).toBeNull();
  });

  it('listens for new mail again after the database restart', async () => {
    // With polling every ten minutes, a prompt delivery means the LISTEN connection came back.
    const subject = 'After the restart';
    await queueRawMail(subject);
    await until(async () => (subjects().includes(subject) ? true : undefined), 15_000, 'mail after the restart');
    expect(subjects().filter((s) => s === subject)).toHaveLength(1);
  });

  it('stops cleanly on SIGTERM', async () => {
    const exited = new Promise<number | null>((r) => child.once('exit', (code) => r(code)));
    child.kill('SIGTERM');
    expect(await exited).toBe(0);
    expect(output).not.toMatch(/"level":"error"/);
  });
});
