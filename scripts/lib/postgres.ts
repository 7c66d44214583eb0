// A project-local PostgreSQL cluster from Debian's packages, on loopback.
// Used by `npm start` (a kept cluster under .data/) and by `npm test` (a throwaway one).
import { execFileSync, spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';

const isRoot = process.getuid?.() === 0;

export function findPgBin(): string {
  const candidates: string[] = [];
  try {
    candidates.push(execFileSync('pg_config', ['--bindir'], { encoding: 'utf8' }).trim());
  } catch {
    /* pg_config is absent: look for the server under /usr/lib/postgresql */
  }
  if (fs.existsSync('/usr/lib/postgresql')) {
    const versions = fs
      .readdirSync('/usr/lib/postgresql')
      .filter((v) => /^\d+$/.test(v))
      .sort((a, b) => Number(b) - Number(a));
    for (const v of versions) candidates.push(`/usr/lib/postgresql/${v}/bin`);
  }
  return candidates.find((dir) => fs.existsSync(path.join(dir, 'initdb')) && fs.existsSync(path.join(dir, 'postgres'))) ?? '';
}

/** Finds the server binaries, installing Debian's `postgresql` package when root may. */
export function ensurePostgres(log: (line: string) => void = console.log): string {
  let bin = findPgBin();
  if (bin) return bin;
  const hasApt = spawnSync('which', ['apt-get']).status === 0;
  if (!isRoot || !hasApt) {
    throw new Error(
      'PostgreSQL server binaries were not found. Install them with `sudo apt-get install postgresql` ' +
        '(Debian/Ubuntu), or set DATABASE_URL to a server you already run.',
    );
  }
  log("PostgreSQL is missing: installing Debian's postgresql package (apt-get)…");
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update'], ['install', '-y', '--no-install-recommends', 'postgresql']]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (r.status !== 0) throw new Error(`apt-get ${args.join(' ')} failed with exit code ${r.status}`);
  }
  bin = findPgBin();
  if (!bin) throw new Error('apt-get installed postgresql but initdb was not found under /usr/lib/postgresql');
  return bin;
}

/** Runs a PostgreSQL program; as root, through `runuser -u postgres`, since the server refuses root. */
function runPg(bin: string, program: string, args: string[], opts: { quiet?: boolean } = {}) {
  const exe = path.join(bin, program);
  const [cmd, full] = isRoot ? ['runuser', ['-u', 'postgres', '--', exe, ...args]] : [exe, args];
  const r = spawnSync(cmd, full, { encoding: 'utf8' });
  if (r.status !== 0) {
    const out = `${r.stdout ?? ''}${r.stderr ?? ''}`.trim();
    throw new Error(`${program} ${args.join(' ')} failed (exit ${r.status}):\n${out}`);
  }
  if (!opts.quiet && r.stdout?.trim()) return r.stdout;
  return '';
}

/** Whether the postgres user can reach `dir` (search permission on it and every folder above). */
function postgresCanEnter(dir: string): boolean {
  if (!isRoot) return true;
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir]).status === 0;
}

function chownToPostgres(dir: string) {
  if (isRoot) spawnSync('chown', ['-R', 'postgres:postgres', dir]);
}

export async function freePort(preferred?: number): Promise<number> {
  const tryPort = (port: number) =>
    new Promise<number>((resolve, reject) => {
      const srv = net.createServer();
      srv.once('error', reject);
      srv.listen(port, '127.0.0.1', () => {
        const addr = srv.address();
        srv.close(() => resolve(typeof addr === 'object' && addr ? addr.port : port));
      });
    });
  if (preferred) {
    try {
      return await tryPort(preferred);
    } catch {
      /* taken: fall through to any free port */
    }
  }
  return tryPort(0);
}

export interface Cluster {
  dataDir: string;
  port: number;
  url: (database: string) => string;
  stop: () => void;
}

export interface ClusterOptions {
  /** Where the cluster keeps its data. Moved under /tmp when the postgres user cannot enter it. */
  dataDir: string;
  port?: number;
  /** For throwaway test clusters only: fsync off and no durable commits. */
  fast?: boolean;
  log?: (line: string) => void;
}

/** Where the cluster for `dataDir` really lives: under /tmp when the postgres user cannot enter the folder. */
function clusterFolder(folder: string): { dataDir: string; relocated: boolean } {
  const dataDir = path.resolve(folder);
  if (postgresCanEnter(path.dirname(dataDir))) return { dataDir, relocated: false };
  const tag = createHash('sha1').update(dataDir).digest('hex').slice(0, 10);
  return { dataDir: path.join('/tmp', `gridkeep-pg-${tag}`, path.basename(dataDir)), relocated: true };
}

/**
 * The loopback URL of a cluster another process (a running `npm start`) has started on
 * `dataDir`, or null when none runs there. Read from its postmaster.pid (line 4: the port).
 */
export function runningClusterUrl(folder: string, database: string): string | null {
  const bin = findPgBin();
  const { dataDir } = clusterFolder(folder);
  const pidFile = path.join(dataDir, 'postmaster.pid');
  if (!bin || !fs.existsSync(pidFile)) return null;
  const exe = path.join(bin, 'pg_ctl');
  const [cmd, full] = isRoot ? ['runuser', ['-u', 'postgres', '--', exe, '-D', dataDir, 'status']] : [exe, ['-D', dataDir, 'status']];
  if (spawnSync(cmd, full).status !== 0) return null;
  const port = Number(fs.readFileSync(pidFile, 'utf8').split('\n')[3]);
  return Number.isInteger(port) && port > 0 ? `postgres://postgres@127.0.0.1:${port}/${database}` : null;
}

/** Creates the cluster when missing, starts it on 127.0.0.1 and returns how to reach it. */
export async function startCluster(options: ClusterOptions): Promise<Cluster> {
  const log = options.log ?? console.log;
  const bin = ensurePostgres(log);
  fs.mkdirSync(path.dirname(path.resolve(options.dataDir)), { recursive: true });
  const { dataDir, relocated } = clusterFolder(options.dataDir);
  if (relocated) log(`The postgres user cannot enter the project folder; keeping the cluster at ${dataDir}`);
  const tag = createHash('sha1').update(dataDir).digest('hex').slice(0, 10);
  const socketDir = path.join('/tmp', `gridkeep-sock-${tag}`);
  fs.mkdirSync(socketDir, { recursive: true });
  chownToPostgres(socketDir);

  if (!fs.existsSync(path.join(dataDir, 'PG_VERSION'))) {
    fs.mkdirSync(dataDir, { recursive: true });
    // Only the cluster's own folder changes owner (and, when relocated, the folder made for it):
    // never the project folder around it.
    chownToPostgres(relocated ? path.dirname(dataDir) : dataDir);
    fs.chmodSync(dataDir, 0o700);
    runPg(bin, 'initdb', ['-D', dataDir, '-U', 'postgres', '--auth=trust', '--encoding=UTF8', '--locale=C.UTF-8'], {
      quiet: true,
    });
  }

  // A pid file left by a run that did not stop cleanly is cleared by pg_ctl start. A server that
  // is really running belongs to another process (a second `npm start` on the same folder): stopping
  // it would pull the database from under that one, so say so instead.
  if (fs.existsSync(path.join(dataDir, 'postmaster.pid'))) {
    const exe = path.join(bin, 'pg_ctl');
    const [cmd, full] = isRoot ? ['runuser', ['-u', 'postgres', '--', exe, '-D', dataDir, 'status']] : [exe, ['-D', dataDir, 'status']];
    if (spawnSync(cmd, full).status === 0) {
      throw new Error(
        `PostgreSQL for ${dataDir} is already running, started by another process (is \`npm start\` running ` +
          `elsewhere?). Stop that one first, or use another DATA_DIR.`,
      );
    }
  }

  const port = await freePort(options.port);
  const serverOpts = [`-c listen_addresses=127.0.0.1`, `-p ${port}`, `-k ${socketDir}`];
  if (options.fast) serverOpts.push('-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off');
  const logFile = path.join(dataDir, 'server.log');
  runPg(bin, 'pg_ctl', ['-D', dataDir, '-l', logFile, '-w', '-t', '60', 'start', '-o', serverOpts.join(' ')], {
    quiet: true,
  });

  const guard = guardCluster(dataDir, options.fast && relocated ? path.dirname(dataDir) : undefined, options.fast ? socketDir : undefined);

  let stopped = false;
  const stop = () => {
    if (stopped) return;
    stopped = true;
    guard?.kill();
    try {
      runPg(bin, 'pg_ctl', ['-D', dataDir, '-m', 'fast', '-w', 'stop'], { quiet: true });
    } catch (err) {
      log(`Could not stop PostgreSQL cleanly: ${(err as Error).message}`);
      return;
    }
    // A throwaway cluster moved under /tmp lives outside the caller's folder, so the caller
    // cannot remove it: remove it here (and its socket folder) once it has stopped.
    if (options.fast && relocated) fs.rmSync(path.dirname(dataDir), { recursive: true, force: true });
    if (options.fast) fs.rmSync(socketDir, { recursive: true, force: true });
  };
  return { dataDir, port, url: (db) => `postgres://postgres@127.0.0.1:${port}/${db}`, stop };
}

/**
 * A small watcher that stops the cluster (SIGINT to the postmaster: PostgreSQL's fast shutdown,
 * what `pg_ctl stop -m fast` sends) if this process dies without stopping it, e.g. killed
 * with SIGKILL. It acts only on the postmaster this process started, and is ended by stop().
 */
function guardCluster(dataDir: string, removeDir?: string, socketDir?: string) {
  let postmasterPid: string;
  try {
    postmasterPid = fs.readFileSync(path.join(dataDir, 'postmaster.pid'), 'utf8').split('\n')[0].trim();
  } catch {
    return undefined;
  }
  if (!/^\d+$/.test(postmasterPid)) return undefined;
  const script = [
    'while kill -0 "$1" 2>/dev/null; do sleep 1; done',
    '[ -f "$3" ] && [ "$(head -n 1 "$3")" = "$2" ] || exit 0',
    'kill -INT "$2" 2>/dev/null',
    'while kill -0 "$2" 2>/dev/null; do sleep 0.2; done',
    '[ -n "$4" ] && rm -rf "$4"',
    '[ -n "$5" ] && rm -rf "$5"',
    'exit 0',
  ].join('\n');
  const child = spawn(
    'sh',
    [
      '-c',
      script,
      'gridkeep-pg-guard',
      String(process.pid),
      postmasterPid,
      path.join(dataDir, 'postmaster.pid'),
      removeDir ?? '',
      socketDir ?? '',
    ],
    { detached: true, stdio: 'ignore' },
  );
  child.on('error', () => {});
  child.unref();
  return child;
}

/** Creates a database when it does not exist yet. */
export async function ensureDatabase(adminUrl: string, name: string) {
  const { default: pg } = await import('pg');
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    const found = await client.query('select 1 from pg_database where datname = $1', [name]);
    if (found.rowCount === 0) await client.query(`create database "${name.replace(/"/g, '""')}"`);
  } finally {
    await client.end();
  }
}
