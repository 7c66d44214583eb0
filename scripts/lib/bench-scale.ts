// `npm run bench -- scale`: the API at a decade's scale (issue 17). A throwaway cluster with the
// demo data and the scale data (scripts/lib/scale-seed.ts), then in one run of this process:
//  - autocannon, 50 connections × 10 s, against a bare Express route (a tiny app in this same
//    process) and the app's routes, signed in as the office coordinator where needed;
//  - the SQL each list route sends (captured at the pool), with EXPLAIN (ANALYZE, BUFFERS);
//  - the serial search's database time: EXPLAIN ANALYZE of its serial statements, 200 runs;
//  - CPU profiles of this process under the tickets list's and the session check's load;
//  - the gzipped JavaScript each entry page loads (Chromium, scripts/lib/bench-page-js.ts).
// Writes docs/benchmarks/<YYYY-MM-DD>.md and .json with the issue's targets beside each figure.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import express from 'express';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import pg from 'pg';
import { projectRoot, startLocalServices, type Shutdown } from './local-services.js';
import { ensureDatabase, startCluster } from './postgres.js';
import { buildClientIfStale } from './client-build.js';
import { fullScale, seedAtScale, type ScaleSize } from './scale-seed.js';
import { profileWhile, type ProfileSummary } from './bench-profile.js';
import { measurePageJs, type PageJs } from './bench-page-js.js';

const CONNECTIONS = 50;
const DURATION_S = 10;
const SEARCH_RUNS = 200;

export interface RouteResult {
  key: string;
  name: string;
  url: string;
  list: boolean;
  reqPerS: number;
  p50Ms: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
  ratio: number;
}

interface Statement {
  text: string;
  values: unknown[];
}

export interface ScaleReport {
  date: string;
  machine: { cpus: number; cpuModel: string; memoryGb: number; node: string; postgres: string };
  size: ScaleSize & { walls: number; clients: number; sites: number; comments: number; seedSeconds: number };
  load: { connections: number; durationS: number };
  routes: RouteResult[];
  sessionCheck: { costShareOfBare: number; target: number; met: boolean };
  serialSearch: {
    tail: string;
    runs: number;
    statements: { sql: string; p50Ms: number; p99Ms: number }[];
    totalP99Ms: number;
    met: boolean;
  };
  pages: (PageJs & { targetBytes: number; met: boolean })[];
  profiles: { route: string; summary: ProfileSummary }[];
  plans: { route: string; sql: string; planningMs: number; executionMs: number; plan: string }[];
}

const percentile = (xs: number[], p: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)];
};
const round2 = (n: number) => Math.round(n * 100) / 100;

export async function runScaleBench(
  shutdown: Shutdown,
  options: { size?: Partial<ScaleSize>; outDir?: string; log?: (line: string) => void } = {},
): Promise<ScaleReport> {
  const log = options.log ?? console.log;
  const size = { ...fullScale, ...options.size };

  // A throwaway cluster (fsync off), the demo data, then the scale data.
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-bench-scale-'));
  process.env.DATA_DIR = dataDir;
  shutdown.add('the bench data', () => fs.rmSync(dataDir, { recursive: true, force: true }));
  process.env.LOG_LEVEL = 'error';
  process.env.MAIL_WORKER = 'false';
  const cluster = await startCluster({ dataDir: path.join(dataDir, 'pg'), fast: true, log: () => {} });
  shutdown.add('PostgreSQL', () => cluster.stop());
  await ensureDatabase(cluster.url('postgres'), 'gridkeep');
  const databaseUrl = cluster.url('gridkeep');
  process.env.DATABASE_URL = databaseUrl;
  await startLocalServices(shutdown, () => {});
  log(
    `Seeding ${size.cabinets.toLocaleString('en')} cabinets, ${size.tickets.toLocaleString('en')} tickets, ${size.events.toLocaleString('en')} events…`,
  );
  const seedStarted = performance.now();
  const seeded = await seedAtScale(databaseUrl, size, log);
  const seedSeconds = Math.round((performance.now() - seedStarted) / 1000);
  log(`Seeded in ${seedSeconds} s.`);

  await buildClientIfStale(() => {});
  const { startServer } = await import('../../server/index.js');
  const running = await startServer({ port: 0, host: '127.0.0.1' });
  shutdown.add('the web server', () => running.stop());
  const base = running.url;

  // The bare route: a tiny Express app in this same process.
  const bare = express();
  bare.get('/', (_req, res) => {
    res.json({ ok: true });
  });
  const bareServer = await new Promise<Server>((resolve) => {
    const s = bare.listen(0, '127.0.0.1', () => resolve(s));
  });
  shutdown.add('the bare app', () => new Promise<void>((resolve) => bareServer.close(() => resolve())));
  const bareUrl = `http://127.0.0.1:${(bareServer.address() as AddressInfo).port}/`;

  const account = { email: 'office@gridkeep.test', password: 'gridkeep-demo' };
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Requested-With': 'gridkeep' },
    body: JSON.stringify(account),
  });
  if (!login.ok) throw new Error(`sign-in failed: ${login.status}`);
  const cookie = login.headers.get('set-cookie')!.split(';')[0];

  const tail = seeded.serial.slice(-5);
  const batchFamily = seeded.batch.split('-').slice(0, 2).join('-');
  const routes: { key: string; name: string; url: string; list: boolean }[] = [
    { key: 'bare', name: 'bare Express `res.json`', url: bareUrl, list: false },
    { key: 'health', name: 'GET /api/health', url: '/api/health', list: false },
    { key: 'me', name: 'GET /api/auth/me (session check)', url: '/api/auth/me', list: false },
    // The same stack ending in a 401 before any session is read: what /api/auth/me costs
    // without its session check.
    { key: 'me-signed-out', name: 'GET /api/auth/me signed out (401, no session check)', url: '/api/auth/me', list: false },
    { key: 'tickets-default', name: 'tickets: default view (open)', url: '/api/tickets?limit=50&open=true', list: true },
    { key: 'tickets-all', name: 'tickets: all, newest first', url: '/api/tickets?limit=50', list: true },
    { key: 'tickets-client', name: 'tickets: one client', url: `/api/tickets?limit=50&clientId=${seeded.clientId}`, list: true },
    { key: 'tickets-status', name: 'tickets: status closed', url: '/api/tickets?limit=50&status=closed', list: true },
    { key: 'tickets-clock', name: 'tickets: clock breached or at risk', url: '/api/tickets?limit=50&clock=breached,at_risk', list: true },
    { key: 'cabinets-default', name: 'cabinets: default (by serial)', url: '/api/cabinets?limit=50', list: true },
    { key: 'cabinets-batch', name: `cabinets: batch ${batchFamily}…`, url: `/api/cabinets?limit=50&batch=${batchFamily}`, list: true },
    { key: 'cabinets-wall', name: 'cabinets: one wall', url: `/api/cabinets?limit=50&wallId=${seeded.wallId}`, list: true },
    { key: 'search', name: `serial search (tail "${tail}")`, url: `/api/search?q=${tail}`, list: true },
    { key: 'wall-2000', name: "a 2,000-cabinet wall's cabinets", url: `/api/walls/${seeded.bigWallId}/cabinets`, list: true },
  ];
  const full = (url: string) => (url.startsWith('http') ? url : `${base}${url}`);

  // The SQL each route sends, captured at the pool (drizzle's queries go through pool.query).
  const { getPool } = await import('../../server/db/client.js');
  const pool = getPool();
  let capture: Statement[] | null = null;
  const original = pool.query.bind(pool) as (...args: unknown[]) => unknown;
  (pool as unknown as { query: (...args: unknown[]) => unknown }).query = (...args: unknown[]) => {
    if (capture) {
      const [first, second] = args as [string | { text: string; values?: unknown[] }, unknown[] | undefined];
      const text = typeof first === 'string' ? first : first.text;
      const values = (Array.isArray(second) ? second : typeof first === 'object' ? first.values : undefined) ?? [];
      capture.push({ text, values });
    }
    return original(...args);
  };
  const statements = new Map<string, Statement[]>();
  for (const r of routes.filter((r) => r.list)) {
    capture = [];
    const res = await fetch(full(r.url), { headers: { Cookie: cookie, 'Accept-Encoding': 'identity' } });
    if (!res.ok) throw new Error(`${r.url}: ${res.status} ${await res.text()}`);
    await res.arrayBuffer();
    statements.set(r.key, capture);
    capture = null;
  }

  // Throughput, one route at a time, in one run.
  const results: RouteResult[] = [];
  let bareRps = 0;
  // A route that answers slower than autocannon stops leaves requests in the server's queue:
  // each run starts once the one before has drained, so no run pays for another's backlog.
  const settle = async () => {
    await new Promise((resolve) => setTimeout(resolve, 3000));
    await fetch(`${base}/api/health`).then((res) => res.arrayBuffer());
  };
  for (const r of routes) {
    await settle();
    const out = await autocannon({
      url: full(r.url),
      connections: CONNECTIONS,
      duration: DURATION_S,
      headers: r.key === 'bare' || r.key === 'me-signed-out' ? {} : { Cookie: cookie },
    });
    if (r.key === 'bare') bareRps = out.requests.average;
    const result: RouteResult = {
      ...r,
      url: r.key === 'bare' ? '(bare app)/' : r.url,
      reqPerS: Math.round(out.requests.average),
      p50Ms: out.latency.p50,
      p99Ms: out.latency.p99,
      errors: out.errors, // timeouts included
      // Signed out, every answer is a 401 by design; anything else is the error.
      non2xx: r.key === 'me-signed-out' ? out['1xx'] + out['2xx'] + out['3xx'] + out['5xx'] : out.non2xx,
      ratio: Math.round((out.requests.average / bareRps) * 100) / 100,
    };
    results.push(result);
    log(`  ${r.name}: ${result.reqPerS} req/s, p50 ${result.p50Ms} ms, p99 ${result.p99Ms} ms, ${result.ratio}× bare`);
  }
  const rps = (key: string) => results.find((r) => r.key === key)!.reqPerS;
  // The session check's cost: the time per request the signed-in /api/auth/me takes beyond the
  // same route signed out (the same middleware, a 401 before any token or session is read), as a
  // share of a bare request's time. (/api/health is no baseline: it reads the database.)
  const costShare = round2((1 / rps('me') - 1 / rps('me-signed-out')) / (1 / rps('bare')));

  // Where the time goes: CPU profiles (after the timed runs, so the profiler costs them nothing).
  const profiles: ScaleReport['profiles'] = [];
  for (const key of ['tickets-default', 'me']) {
    const r = routes.find((x) => x.key === key)!;
    await settle();
    const { summary } = await profileWhile(projectRoot, () =>
      autocannon({ url: full(r.url), connections: CONNECTIONS, duration: 5, headers: { Cookie: cookie } }),
    );
    profiles.push({ route: r.name, summary });
  }

  // EXPLAIN (ANALYZE, BUFFERS) of each statement of each list route.
  const admin = new pg.Client({ connectionString: databaseUrl });
  await admin.connect();
  shutdown.add('the bench database client', () => admin.end());
  const plans: ScaleReport['plans'] = [];
  for (const r of routes.filter((x) => x.list && x.key !== 'search')) {
    for (const s of statements.get(r.key) ?? []) {
      if (!/^\s*select/i.test(s.text)) continue;
      const out = await admin.query<{ 'QUERY PLAN': string }>(`explain (analyze, buffers) ${s.text}`, s.values);
      const plan = out.rows.map((x) => x['QUERY PLAN']).join('\n');
      plans.push({ route: r.name, sql: s.text, ...timesOf(plan), plan });
    }
  }
  // The serial search's database time: its statements that read cabinets by serial, 200 times.
  const serialStatements = (statements.get('search') ?? []).filter(
    (s) => /"cabinets"/.test(s.text) && /"serial"\s+(i?like|=)/i.test(s.text),
  );
  const perRun: number[][] = serialStatements.map(() => []);
  for (let i = 0; i < SEARCH_RUNS; i++) {
    for (const [k, s] of serialStatements.entries()) {
      const out = await admin.query<{ 'QUERY PLAN': { 'Planning Time': number; 'Execution Time': number }[] }>(
        `explain (analyze, format json) ${s.text}`,
        s.values,
      );
      const p = out.rows[0]['QUERY PLAN'][0];
      perRun[k].push(p['Planning Time'] + p['Execution Time']);
    }
  }
  for (const s of serialStatements) {
    const out = await admin.query<{ 'QUERY PLAN': string }>(`explain (analyze, buffers) ${s.text}`, s.values);
    const plan = out.rows.map((x) => x['QUERY PLAN']).join('\n');
    plans.push({ route: routes.find((x) => x.key === 'search')!.name, sql: s.text, ...timesOf(plan), plan });
  }
  const totals = Array.from({ length: SEARCH_RUNS }, (_, i) => perRun.reduce((sum, runs) => sum + runs[i], 0));
  const serialP99 = round2(percentile(totals, 99));

  // The JavaScript each entry page loads.
  const pageList = [
    { page: 'sign-in', path: '/sign-in', signedIn: false },
    { page: 'home (office)', path: '/', signedIn: true },
    { page: 'tickets', path: '/tickets', signedIn: true },
    { page: 'wall', path: `/walls/${seeded.wallId}`, signedIn: true },
    { page: 'cabinets', path: '/cabinets', signedIn: true },
    { page: 'search', path: `/search?q=${tail}`, signedIn: true },
  ];
  const pagesJs = await measurePageJs(base, path.join(projectRoot, 'dist'), account, pageList);
  const pages = pagesJs.map((p) => {
    const targetBytes = p.page === 'sign-in' ? 170 * 1024 : 300 * 1024;
    return { ...p, targetBytes, met: p.gzipBytes < targetBytes };
  });

  const pgVersion = (await admin.query<{ v: string }>(`select current_setting('server_version') as v`)).rows[0].v;
  const now = new Date();
  const report: ScaleReport = {
    date: now.toISOString(),
    machine: {
      cpus: os.cpus().length,
      cpuModel: os.cpus()[0]?.model ?? '',
      memoryGb: Math.round(os.totalmem() / 2 ** 30),
      node: process.version,
      postgres: pgVersion,
    },
    size: { ...size, walls: seeded.walls, clients: seeded.clients, sites: seeded.sites, comments: seeded.comments, seedSeconds },
    load: { connections: CONNECTIONS, durationS: DURATION_S },
    routes: results,
    sessionCheck: { costShareOfBare: costShare, target: 0.1, met: costShare < 0.1 },
    serialSearch: {
      tail,
      runs: SEARCH_RUNS,
      statements: serialStatements.map((s, k) => ({
        sql: s.text,
        p50Ms: round2(percentile(perRun[k], 50)),
        p99Ms: round2(percentile(perRun[k], 99)),
      })),
      totalP99Ms: serialP99,
      met: serialStatements.length > 0 && serialP99 < 5,
    },
    pages,
    profiles,
    plans,
  };
  const outDir = options.outDir ?? path.join(projectRoot, 'docs/benchmarks');
  fs.mkdirSync(outDir, { recursive: true });
  const day = now.toISOString().slice(0, 10);
  fs.writeFileSync(path.join(outDir, `${day}.json`), JSON.stringify(report, null, 2) + '\n');
  fs.writeFileSync(path.join(outDir, `${day}.md`), renderReport(report));
  log(`Report: ${path.relative(process.cwd(), path.join(outDir, `${day}.md`))}`);
  return report;
}

/** Planning and execution time from an EXPLAIN ANALYZE text plan. */
function timesOf(plan: string) {
  return {
    planningMs: Number(/Planning Time: ([\d.]+) ms/.exec(plan)?.[1] ?? NaN),
    executionMs: Number(/Execution Time: ([\d.]+) ms/.exec(plan)?.[1] ?? NaN),
  };
}

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;
const yes = (met: boolean) => (met ? 'met' : '**not met**');

/** Whether a route meets the list target: at least half the bare route's throughput, p99 under 50 ms. */
export function listTargetMet(r: Pick<RouteResult, 'ratio' | 'p99Ms' | 'errors' | 'non2xx'>): boolean {
  return r.ratio >= 0.5 && r.p99Ms < 50 && r.errors === 0 && r.non2xx === 0;
}

/** The plan's lines that say where the time goes: scans, sorts and the node timings at the top. */
function planGist(plan: string): string[] {
  const lines = plan.split('\n');
  const top = lines.slice(0, 2);
  const notable = lines.filter((l) =>
    /Seq Scan|Sort Method|Rows Removed|Heap Fetches|Bitmap Heap Scan|Index (Only )?Scan|Planning Time|Execution Time/.test(l),
  );
  return [...new Set([...top, ...notable])].slice(0, 10);
}

export function renderReport(r: ScaleReport): string {
  const out: string[] = [];
  out.push(`# Speed at a decade's scale — ${r.date.slice(0, 10)}`, '');
  out.push(
    `\`npm run bench -- scale\` (scripts/lib/bench-scale.ts) on this machine: ${r.machine.cpus} cores (${r.machine.cpuModel}), ` +
      `${r.machine.memoryGb} GB, Node ${r.machine.node}, PostgreSQL ${r.machine.postgres}; server, load generator and ` +
      `database share the cores. Data: the demo data plus ${r.size.cabinets.toLocaleString('en')} cabinets on ` +
      `${r.size.walls.toLocaleString('en')} walls (${r.size.sites} sites, ${r.size.clients} clients), ` +
      `${r.size.tickets.toLocaleString('en')} tickets over ten years (${r.size.comments.toLocaleString('en')} comments) and ` +
      `${r.size.events.toLocaleString('en')} cabinet events, seeded in ${r.size.seedSeconds} s. Load: autocannon, ` +
      `${r.load.connections} connections × ${r.load.durationS} s per route, signed in as the office coordinator. ` +
      `Issue 17's targets beside each figure.`,
    '',
  );
  out.push('## Throughput', '');
  out.push('| route | req/s | p50 | p99 | errors | × bare | target | |');
  out.push('|---|---:|---:|---:|---:|---:|---|---|');
  for (const x of r.routes) {
    const target = x.list ? '≥ 0.5× bare, p99 < 50 ms' : '—';
    const met = x.list ? yes(listTargetMet(x)) : '';
    out.push(
      `| ${x.name} | ${x.reqPerS.toLocaleString('en')} | ${x.p50Ms} ms | ${x.p99Ms} ms | ${x.errors + x.non2xx} | ${x.ratio.toFixed(2)} | ${target} | ${met} |`,
    );
  }
  out.push('');
  out.push(
    `Session check: ${(r.sessionCheck.costShareOfBare * 100).toFixed(0)} % of a bare request's time (the time per ` +
      `request of /api/auth/me signed in beyond the same route signed out, over a bare request's; target under 10 %): ` +
      `${yes(r.sessionCheck.met)}.`,
    '',
  );
  out.push('## Serial search in the database', '');
  out.push(
    `The statements of \`/api/search?q=${r.serialSearch.tail}\` that read cabinets by serial, planned and executed ` +
      `${r.serialSearch.runs} times each (EXPLAIN ANALYZE, planning + execution): p99 of their sum ` +
      `**${r.serialSearch.totalP99Ms} ms** (target under 5 ms): ${yes(r.serialSearch.met)}.`,
    '',
  );
  out.push('| statement | p50 | p99 |', '|---|---:|---:|');
  for (const s of r.serialSearch.statements)
    out.push(`| \`${s.sql.replace(/\s+/g, ' ').slice(0, 140)}…\` | ${s.p50Ms} ms | ${s.p99Ms} ms |`);
  out.push('');
  out.push('## JavaScript per entry page (gzip)', '');
  out.push('| page | files | raw | gzip | target | |', '|---|---:|---:|---:|---|---|');
  for (const p of r.pages)
    out.push(`| ${p.page} | ${p.files} | ${kb(p.rawBytes)} | ${kb(p.gzipBytes)} | < ${kb(p.targetBytes)} | ${yes(p.met)} |`);
  out.push('');
  out.push(
    'The first screen on an emulated slow-4G phone (target under 3 s) is measured by its own part of the bench, ' +
      'where there is one (`npm run bench -- firstscreen`).',
    '',
  );
  out.push('## Where the time goes', '');
  out.push('### CPU profiles of this process under load', '');
  out.push(
    'Self time per function, sampled with node:inspector while autocannon loaded the route for 5 s. The load ' +
      'generator runs in the same process: its frames (`autocannon`, `hdr-histogram-js`, parts of `node (internals)`) ' +
      'are part of the picture, as they are part of every figure above.',
    '',
  );
  for (const p of r.profiles) {
    out.push(`**${p.route}** (${p.summary.totalMs.toLocaleString('en')} ms sampled)`, '');
    out.push('| by package or folder | self |', '|---|---:|');
    for (const g of p.summary.groups.slice(0, 10)) out.push(`| ${g.group} | ${g.share} % |`);
    out.push('', '| function | where | self |', '|---|---|---:|');
    for (const f of p.summary.functions.slice(0, 12)) out.push(`| \`${f.name}\` | ${f.where} | ${f.share} % |`);
    out.push('');
  }
  out.push('### The list queries at scale', '');
  out.push('Each statement the route sent, with EXPLAIN (ANALYZE, BUFFERS); the full plans are in the .json.', '');
  const sessionSql = r.plans.find((p) => /from "sessions"/.test(p.sql))?.sql;
  let sessionShown = false;
  const ms = (n: number) => (Number.isFinite(n) ? n.toFixed(1) : '?');
  for (const p of r.plans) {
    if (p.sql === sessionSql) {
      if (sessionShown) continue;
      sessionShown = true;
      p.route = 'the session check (every signed-in request)';
    }
    out.push(
      `- ${p.route}: **${ms(p.executionMs)} ms** executing, ${ms(p.planningMs)} ms planning — \`${p.sql.replace(/\s+/g, ' ').slice(0, 160)}…\``,
    );
    for (const l of planGist(p.plan)) out.push(`  - \`${l.trim()}\``);
  }
  out.push('');
  return out.join('\n');
}
