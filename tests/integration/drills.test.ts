// Outage drills on the production entry (server/index.ts), run as two processes on one
// PostgreSQL cluster, as several containers would run it: migrations applied once, a session made
// on one honoured by the other, every queued mail sent once between them, PostgreSQL restarted
// under load (503 with Retry-After while it is down, never a 500, serving again within seconds,
// without a restart of the app), and a SIGTERM that lets a request in flight finish.
// (OWASP ASVS 5.0 V16 on error handling and V13 on configuration; from memory: the drills
// themselves are this project's own.)
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureDatabase, freePort, startCluster, type Cluster } from '../../scripts/lib/postgres.js';
import { projectRoot } from '../../scripts/lib/local-services.js';
import { hashPassword } from '../../server/services/passwords.js';
import { startTestS3, startTestSmtp, type TestS3, type TestSmtp } from '../setup/fakes.js';

interface App {
  child: ChildProcess;
  base: string;
  port: number;
  output: string;
}

let tmp: string;
let cluster: Cluster;
let smtp: TestSmtp;
let s3: TestS3;
let databaseUrl: string;
const apps: App[] = [];
const email = 'drill.office@gridkeep.test';
const password = 'a long drill passphrase for the office';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

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
    await sleep(100);
  }
  throw new Error(`timed out waiting for ${what} (${String(last ?? '')}):\n${apps.map((a) => a.output).join('\n---\n')}`);
}

async function startApp(): Promise<App> {
  const port = await freePort();
  const app: App = { port, base: `http://127.0.0.1:${port}`, output: '', child: undefined as unknown as ChildProcess };
  app.child = spawn(path.join(projectRoot, 'node_modules/.bin/tsx'), ['server/index.ts'], {
    cwd: projectRoot,
    env: {
      PATH: process.env.PATH,
      HOME: process.env.HOME,
      NODE_ENV: 'production',
      LOG_LEVEL: 'warn',
      PORT: String(port),
      HOST: '127.0.0.1',
      DATABASE_URL: databaseUrl,
      JWT_SECRET: 'drill-test-secret-that-is-long-enough-for-hs256',
      ...s3.env,
      SMTP_HOST: smtp.env.SMTP_HOST,
      SMTP_PORT: smtp.env.SMTP_PORT,
      MAIL_WORKER: 'true',
      MAIL_POLL_MS: '500',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  app.child.stdout!.on('data', (d) => (app.output += d));
  app.child.stderr!.on('data', (d) => (app.output += d));
  apps.push(app);
  return app;
}

const healthy = (app: App) =>
  until(async () => ((await fetch(`${app.base}/api/health`)).status === 200 ? true : undefined), 90_000, `${app.base} to answer`);

async function sql<T extends pg.QueryResultRow>(text: string, values: unknown[] = []): Promise<T[]> {
  const c = new pg.Client({ connectionString: databaseUrl });
  await c.connect();
  try {
    return (await c.query<T>(text, values)).rows;
  } finally {
    await c.end();
  }
}

async function signIn(app: App): Promise<string> {
  const res = await fetch(`${app.base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-requested-with': 'gridkeep' },
    body: JSON.stringify({ email, password }),
  });
  expect(res.status).toBe(200);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

beforeAll(async () => {
  tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-drills-'));
  fs.chmodSync(tmp, 0o755); // the postgres user must reach the cluster folder inside
  cluster = await startCluster({ dataDir: path.join(tmp, 'pg'), fast: true, log: () => {} });
  await ensureDatabase(cluster.url('postgres'), 'gridkeep');
  databaseUrl = cluster.url('gridkeep');
  [smtp, s3] = await Promise.all([startTestSmtp(), startTestS3()]);
  // Both processes start together on an empty database: each runs the migrations at start.
  const [a, b] = await Promise.all([startApp(), startApp()]);
  await Promise.all([healthy(a), healthy(b)]);
  await sql(`insert into users (email, name, role, password_hash) values ($1, 'Drill Office', 'coordinator', $2)`, [
    email,
    await hashPassword(password),
  ]);
}, 180_000);

afterAll(async () => {
  for (const app of apps) {
    if (app.child.exitCode === null && app.child.signalCode === null) {
      app.child.kill('SIGKILL');
      await new Promise((r) => app.child.once('exit', r));
    }
  }
  await Promise.all([smtp?.dispose(), s3?.dispose()]);
  cluster?.stop();
  if (tmp) fs.rmSync(tmp, { recursive: true, force: true });
});

describe('two app processes on one database', () => {
  it('applied every migration once, though both started on an empty database together', async () => {
    const files = fs.readdirSync(path.join(projectRoot, 'drizzle')).filter((f) => f.endsWith('.sql'));
    const applied = await sql<{ n: string; distinct: string }>(
      'select count(*) as n, count(distinct hash) as distinct from drizzle.__drizzle_migrations',
    );
    expect(applied[0]).toEqual({ n: String(files.length), distinct: String(files.length) });
    for (const app of apps) expect(app.output).not.toMatch(/"level":"(error|fatal)"|object storage is not reachable/);
  });

  it('honours on one process a session made on the other', async () => {
    const cookie = await signIn(apps[0]);
    const res = await fetch(`${apps[1].base}/api/auth/me`, { headers: { cookie } });
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ user: { email, role: 'coordinator' } });
  });

  it('sends every queued mail exactly once between the two mail workers', async () => {
    const subjects = Array.from({ length: 40 }, (_, i) => `Drill mail ${i + 1}`);
    const c = new pg.Client({ connectionString: databaseUrl });
    await c.connect();
    try {
      for (const subject of subjects) {
        await c.query(`insert into outbound_mail (message_id, "to", subject, text) values ($1, $2, $3, 'x')`, [
          `<${subject.replace(/\W+/g, '-')}@gridkeep.test>`,
          ['office@example.test'],
          subject,
        ]);
        await c.query(`select pg_notify('outbound_mail', '')`);
      }
    } finally {
      await c.end();
    }
    const received = () => smtp.received().map((m) => /^Subject: (.*)$/m.exec(m.raw.toString())?.[1] ?? '');
    await until(async () => (subjects.every((s) => received().includes(s)) ? true : undefined), 60_000, 'every drill mail');
    await sleep(1500); // a second copy would arrive by now (both workers poll every 500 ms)
    for (const s of subjects) expect(received().filter((r) => r === s)).toHaveLength(1);
    const sent = await sql<{ n: string }>(`select count(*) as n from outbound_mail where status = 'sent' and subject like 'Drill mail %'`);
    expect(sent[0].n).toBe('40');
  });
});

describe('PostgreSQL restarted under load', () => {
  it('answers 503 with Retry-After while it is down, never a 500, and serves again within seconds', async () => {
    const cookie = await signIn(apps[0]);
    const statuses = new Map<number, number>();
    let missingRetryAfter = 0;
    let running = true;
    const load = (async () => {
      while (running) {
        await Promise.all(
          apps.slice(0, 2).map(async (app) => {
            const res = await fetch(`${app.base}/api/auth/me`, { headers: { cookie } });
            statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
            if (res.status === 503 && !res.headers.get('retry-after')) missingRetryAfter += 1;
            await res.arrayBuffer();
          }),
        );
      }
    })();
    await sleep(500);
    cluster.stop();
    await sleep(2000);
    cluster = await startCluster({ dataDir: cluster.dataDir, port: cluster.port, fast: true, log: () => {} });
    const back = Date.now();
    for (const app of apps.slice(0, 2)) {
      await until(
        async () => ((await fetch(`${app.base}/api/auth/me`, { headers: { cookie } })).status === 200 ? true : undefined),
        15_000,
        'the app to serve again',
      );
    }
    const recoverySeconds = (Date.now() - back) / 1000;
    running = false;
    await load;
    expect(statuses.get(503) ?? 0).toBeGreaterThan(0); // the outage was seen…
    expect(missingRetryAfter).toBe(0); // …and every 503 said when to come back (RFC 9110 §10.2.3)
    expect([...statuses.keys()].sort()).toEqual([200, 503]); // never a 500, never a 401
    expect(recoverySeconds).toBeLessThan(15);
    for (const app of apps) expect(app.child.exitCode).toBeNull();
  });
});

describe('graceful shutdown', () => {
  it('lets a request in flight finish after SIGTERM, refuses new connections, and exits 0', async () => {
    const app = apps[1];
    const body = JSON.stringify({ email, password });
    // A raw socket, so the request can be half sent when the signal arrives.
    const socket = net.connect(app.port, '127.0.0.1');
    await new Promise((r) => socket.once('connect', r));
    let answer = '';
    socket.on('data', (d) => (answer += d));
    const ended = new Promise((r) => socket.once('end', r));
    // Expect: 100-continue makes the server say when it has read the headers (RFC 9110 §10.1.1):
    // from then on the request is in flight, though its body has not been sent yet.
    socket.write(
      `POST /api/auth/login HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: application/json\r\n` +
        `X-Requested-With: gridkeep\r\nContent-Length: ${Buffer.byteLength(body)}\r\nExpect: 100-continue\r\n` +
        `Connection: close\r\n\r\n`,
    );
    await until(async () => (answer.startsWith('HTTP/1.1 100 Continue') ? true : undefined), 10_000, '100 Continue');
    answer = '';
    const exited = new Promise<number | null>((r) => app.child.once('exit', (code) => r(code)));
    app.child.kill('SIGTERM');
    await sleep(700);
    // While it drains, the process no longer takes new connections.
    await expect(fetch(`${app.base}/api/health`)).rejects.toThrow();
    // The body now, without half-closing the socket (a half-closed request is aborted).
    socket.write(body);
    await ended;
    expect(answer.replace(/^\r\n/, '')).toMatch(/^HTTP\/1\.1 200 /);
    expect(answer).toContain(`"email":"${email}"`);
    expect(await exited).toBe(0);
  });
});
