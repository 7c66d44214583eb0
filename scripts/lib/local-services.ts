// What `npm start` and `npm run dev` run beside the app: PostgreSQL (a project-local cluster
// unless DATABASE_URL is set), migrations and demo data, and the S3 and SMTP fakes (unless real
// endpoints are configured). Fills process.env with the settings the server reads.
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { ensureDatabase, freePort, startCluster, type Cluster } from './postgres.js';
import { s3FakeCredentials, startS3Fake, type S3Fake } from './s3-fake.js';
import { startSmtpFake, type SmtpFake } from './smtp-fake.js';

export const projectRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

/** Every setting the server reads (server/config.ts); an empty value counts as unset. */
const settingNames = [
  'NODE_ENV',
  'PORT',
  'HOST',
  'DATABASE_URL',
  'DATABASE_POOL_SIZE',
  'APP_URL',
  'JWT_SECRET',
  'SESSION_HOURS',
  'COOKIE_SECURE',
  'TRUST_PROXY',
  'S3_ENDPOINT',
  'S3_REGION',
  'S3_BUCKET',
  'S3_ACCESS_KEY_ID',
  'S3_SECRET_ACCESS_KEY',
  'S3_FORCE_PATH_STYLE',
  'UPLOAD_MAX_BYTES',
  'SMTP_HOST',
  'SMTP_PORT',
  'SMTP_SECURE',
  'SMTP_USER',
  'SMTP_PASS',
  'MAIL_FROM',
  'OFFICE_EMAIL',
  'DEV_MAILBOX_DIR',
  'MAIL_WORKER',
  'MAIL_POLL_MS',
];

export const demoPassword = 'gridkeep-demo';
const demoStaff = [
  ['admin@gridkeep.test', 'admin'],
  ['office@gridkeep.test', 'coordinator'],
  ['tech@gridkeep.test', 'technician'],
  ['tech2@gridkeep.test', 'technician'],
] as const;

export interface LocalServices {
  dataDir: string;
  databaseUrl: string;
  /** Lines describing what runs where, for the start banner. */
  summary: string[];
  /** Demo accounts found in the database (empty when there is no demo data). */
  accounts: { email: string; role: string }[];
}

/**
 * The stop steps of everything started so far, run in reverse order: a Ctrl-C in the middle of
 * starting stops what already runs, and nothing twice.
 */
export class Shutdown {
  private steps: { name: string; run: () => Promise<void> | void }[] = [];
  private running: Promise<void> | undefined;
  private exiting = false;

  constructor(private log: (line: string) => void = console.log) {}

  /** Whether the process has begun to stop: a start still under way gives up. */
  get stopping(): boolean {
    return this.exiting;
  }

  /** Runs the stop steps, then exits with `code`. A stuck step cannot keep the process alive. */
  exit(code: number, why?: string) {
    if (this.exiting) return;
    this.exiting = true;
    if (why) this.log(why);
    const force = setTimeout(() => {
      this.log('Stopping took too long: exiting.');
      process.exit(code || 1);
    }, 30_000);
    force.unref();
    void this.run().then(() => {
      clearTimeout(force);
      process.exit(code);
    });
  }

  /** Ctrl-C, a kill or a closed terminal stops everything, once. */
  exitOnSignals(what: string) {
    for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
      process.on(signal, () => {
        if (this.exiting) return;
        this.log(`\n${signal}: stopping ${what}…`);
        this.exit(0);
      });
    }
  }

  add(name: string, run: () => Promise<void> | void) {
    this.steps.push({ name, run });
  }

  run(): Promise<void> {
    this.running ??= (async () => {
      while (this.steps.length) {
        const step = this.steps.pop()!;
        try {
          await step.run();
        } catch (err) {
          this.log(`Could not stop ${step.name}: ${(err as Error).message}`);
        }
      }
    })();
    return this.running;
  }
}

function readOrCreateSecret(file: string): string {
  if (fs.existsSync(file)) {
    const secret = fs.readFileSync(file, 'utf8').trim();
    if (secret.length >= 32) return secret;
  }
  const secret = randomBytes(48).toString('base64url');
  fs.writeFileSync(file, secret + '\n', { mode: 0o600 });
  return secret;
}

function shortPath(p: string) {
  const rel = path.relative(process.cwd(), p);
  return rel && !rel.startsWith('..') ? rel : p;
}

async function seedDemoData(log: (line: string) => void): Promise<void> {
  const seedFile = path.join(projectRoot, 'server/db/seed.ts');
  if (!fs.existsSync(seedFile)) {
    log('Warning: server/db/seed.ts is not there yet: starting without demo data.');
    return;
  }
  const mod = (await import(pathToFileURL(seedFile).href)) as { seedIfEmpty?: (db: unknown) => Promise<boolean> };
  if (typeof mod.seedIfEmpty !== 'function') {
    log('Warning: server/db/seed.ts has no seedIfEmpty(): starting without demo data.');
    return;
  }
  const { db } = await import('../../server/db/client.js');
  const started = Date.now();
  const seeded = await mod.seedIfEmpty(db());
  if (seeded) log(`Demo data written (${((Date.now() - started) / 1000).toFixed(1)} s).`);
}

async function demoAccounts(): Promise<{ email: string; role: string }[]> {
  const { getPool } = await import('../../server/db/client.js');
  const staff = demoStaff.map(([email]) => email);
  const { rows } = await getPool().query<{ email: string; role: string }>(
    `select email, role::text as role from users
      where disabled_at is null and (email = any($1::text[]) or role = 'client')
      order by coalesce(array_position($1::text[], email), 1000), email`,
    [staff],
  );
  return rows;
}

export async function startLocalServices(shutdown: Shutdown, log: (line: string) => void = console.log): Promise<LocalServices> {
  for (const name of settingNames) if (process.env[name] === '') delete process.env[name];
  const dataDir = path.resolve(process.env.DATA_DIR || path.join(projectRoot, '.data'));
  fs.mkdirSync(dataDir, { recursive: true });
  const summary: string[] = [];

  process.env.JWT_SECRET ??= readOrCreateSecret(path.join(dataDir, 'jwt-secret'));

  // PostgreSQL
  let databaseUrl = process.env.DATABASE_URL;
  if (databaseUrl) {
    summary.push(`database  ${databaseUrl.replace(/\/\/([^:@/]+):[^@/]*@/, '//$1:***@')} (DATABASE_URL)`);
  } else {
    log('Starting PostgreSQL…');
    const cluster: Cluster = await startCluster({ dataDir: path.join(dataDir, 'pg'), port: 54329, log });
    shutdown.add('PostgreSQL', () => cluster.stop());
    await ensureDatabase(cluster.url('postgres'), 'gridkeep');
    databaseUrl = cluster.url('gridkeep');
    process.env.DATABASE_URL = databaseUrl;
    summary.push(`database  ${databaseUrl} (cluster in ${shortPath(cluster.dataDir)})`);
  }

  // Object storage
  if (process.env.S3_ENDPOINT) {
    summary.push(`files     ${process.env.S3_ENDPOINT} bucket ${process.env.S3_BUCKET ?? 'gridkeep'} (S3_ENDPOINT)`);
  } else {
    const s3: S3Fake = await startS3Fake({ dir: path.join(dataDir, 's3'), port: await freePort(4569) });
    shutdown.add('the S3 fake', () => s3.stop());
    Object.assign(process.env, {
      S3_ENDPOINT: s3.endpoint,
      S3_FORCE_PATH_STYLE: 'true',
      S3_ACCESS_KEY_ID: s3FakeCredentials.accessKeyId,
      S3_SECRET_ACCESS_KEY: s3FakeCredentials.secretAccessKey,
    });
    summary.push(`files     S3 fake at ${s3.endpoint} (objects in ${shortPath(s3.dir)})`);
  }
  // Mail
  if (process.env.SMTP_HOST) {
    summary.push(`mail      SMTP ${process.env.SMTP_HOST}:${process.env.SMTP_PORT ?? 2525} (SMTP_HOST)`);
  } else {
    const smtp: SmtpFake = await startSmtpFake({ dir: path.join(dataDir, 'mailbox'), port: await freePort(2525) });
    shutdown.add('the SMTP fake', () => smtp.stop());
    Object.assign(process.env, { SMTP_HOST: smtp.host, SMTP_PORT: String(smtp.port), DEV_MAILBOX_DIR: smtp.dir });
    summary.push(
      `mail      SMTP fake at ${smtp.host}:${smtp.port} (messages in ${shortPath(smtp.dir)}, readable by admins in the development mailbox)`,
    );
  }

  // The server reads its configuration once, on first use: every setting is in place now.
  const { runMigrations } = await import('../../server/db/migrate.js');
  await runMigrations(databaseUrl);
  const { closeDb } = await import('../../server/db/client.js');
  shutdown.add('the database pool', () => closeDb());
  await seedDemoData(log);
  const accounts = await demoAccounts();

  const { ensureBucket, closeStorage } = await import('../../server/integrations/s3.js');
  await ensureBucket();
  closeStorage();

  return { dataDir, databaseUrl, summary, accounts };
}

/** The demo accounts block of the start banner. */
export function accountLines(accounts: { email: string; role: string }[]): string[] {
  if (accounts.length === 0) return ['No demo accounts in the database.'];
  const width = Math.max(...accounts.map((a) => a.email.length));
  return [`Demo accounts (password ${demoPassword}):`, ...accounts.map((a) => `  ${a.email.padEnd(width)}  ${a.role}`)];
}
