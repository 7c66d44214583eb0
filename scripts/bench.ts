// `npm run bench`: speed targets, measured on a throwaway copy of the app with demo data.
//  - import of a 10,000-row cabinet CSV (target: under 3 s)
//  - the wall map of a 2,000-cabinet wall in Chromium (target: interactive under 200 ms)
//  - API throughput of the busiest reads (autocannon; reported, no target)
// Prints one line per measurement and exits non-zero when a target is missed.
// `npm run bench -- map` (or `import`, `api`) runs only those parts.
// `npm run bench -- scale` (never part of the default run: five to ten minutes) seeds a decade of
// service history and measures the API at that scale (scripts/lib/bench-scale.ts); it writes
// docs/benchmarks/<date>.md and .json. `-- scale --cabinets 100000` for a quick try.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import { sql } from 'drizzle-orm';
import { Shutdown, startLocalServices } from './lib/local-services.js';
import { buildClientIfStale } from './lib/client-build.js';

const log = (line: string) => console.log(line);
const shutdown = new Shutdown(() => {});
/** `target`: at most; `atLeast`: a floor (a throughput). */
const results: { name: string; value: number; unit: string; target?: number; atLeast?: number }[] = [];
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const parts = ['import', 'map', 'api', 'firstscreen', 'scale'] as const;
/** Parts that run only when named. */
const onDemand: readonly string[] = ['scale'];
const argv = process.argv.slice(2);
/** The parts named (`--cabinets 100000` and the like are options of `scale`). */
const chosen = argv.filter((a, i) => !a.startsWith('--') && !argv[i - 1]?.startsWith('--'));
for (const name of chosen) {
  if (!(parts as readonly string[]).includes(name)) {
    console.error(`Unknown bench part "${name}": choose from ${parts.join(', ')} (none means all).`);
    process.exit(2);
  }
}
const runs = (part: (typeof parts)[number]) => (chosen.length === 0 && !onDemand.includes(part)) || chosen.includes(part);

async function scale() {
  const { parseArgs } = await import('node:util');
  const { values } = parseArgs({
    args: argv.filter((a) => a !== 'scale'),
    options: { cabinets: { type: 'string' }, tickets: { type: 'string' }, events: { type: 'string' } },
  });
  const size = Object.fromEntries(Object.entries(values).map(([k, v]) => [k, Number(String(v).replace(/[_,]/g, ''))]));
  const { runScaleBench } = await import('./lib/bench-scale.js');
  const report = await runScaleBench(shutdown, { size });
  for (const r of report.routes) {
    if (!r.list) continue;
    results.push({ name: `${r.name}: p99`, value: r.p99Ms, unit: 'ms', target: 50 });
    results.push({ name: `${r.name}: share of the bare route's req/s (${r.reqPerS} req/s)`, value: r.ratio * 100, unit: '%', atLeast: 50 });
  }
  results.push({ name: 'session check, share of a bare request', value: report.sessionCheck.costShareOfBare * 100, unit: '%', target: 10 });
  results.push({ name: 'serial search in the database, p99', value: report.serialSearch.totalP99Ms, unit: 'ms', target: 5 });
  for (const p of report.pages)
    results.push({ name: `${p.page} page JavaScript (gzip)`, value: p.gzipBytes / 1024, unit: 'KB', target: p.targetBytes / 1024 });
}

async function main() {
  if (chosen.includes('scale')) {
    if (chosen.length > 1) throw new Error('`scale` runs on its own: name no other part with it');
    return scale();
  }
  process.env.DATA_DIR = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-bench-'));
  shutdown.add('the bench data', () => fs.rmSync(process.env.DATA_DIR!, { recursive: true, force: true }));
  process.env.LOG_LEVEL = 'error';
  process.env.MAIL_WORKER = 'false';
  await startLocalServices(shutdown, () => {});
  await buildClientIfStale(() => {});
  const { startServer } = await import('../server/index.js');
  const running = await startServer({ port: 0, host: '127.0.0.1' });
  shutdown.add('the web server', () => running.stop());
  const base = running.url;

  // A signed-in office session.
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Requested-With': 'gridkeep' },
    body: JSON.stringify({ email: 'office@gridkeep.test', password: 'gridkeep-demo' }),
  });
  if (!login.ok) throw new Error(`sign-in failed: ${login.status}`);
  const cookie = login.headers.get('set-cookie')!.split(';')[0];
  const api = async (method: string, url: string, body?: unknown, contentType = 'application/json') => {
    const res = await fetch(`${base}${url}`, {
      method,
      headers: { Cookie: cookie, 'X-Requested-With': 'gridkeep', 'Content-Type': contentType },
      body: body === undefined ? undefined : typeof body === 'string' ? body : JSON.stringify(body),
    });
    const json = await res.json().catch(() => null);
    if (!res.ok) throw new Error(`${method} ${url}: ${res.status} ${JSON.stringify(json)}`);
    return json;
  };

  // Page weights and the first screen on a slow phone (scripts/lib/bench-first-screen.ts).
  if (runs('firstscreen')) {
    const { firstScreenResults } = await import('./lib/bench-first-screen.js');
    results.push(...(await firstScreenResults(base, { email: 'tech@gridkeep.test', password: 'gridkeep-demo' })));
  }

  const sites = await api('GET', '/api/sites?limit=1');
  const models = await api('GET', '/api/cabinet-models');
  const siteId = sites.items[0].id;
  const modelId = models.items[0].id;

  // 1. CSV import: 10,000 rows onto a 100 × 100 wall, three times on fresh walls.
  const importTimes: number[] = [];
  for (let round = 0; round < (runs('import') ? 3 : 0); round++) {
    const wall = await api('POST', '/api/walls', {
      siteId,
      name: `Bench import ${round} ${Date.now()}`,
      cabinetModelId: modelId,
      columns: 100,
      rows: 100,
    });
    const lines = ['serial,column,row,batch'];
    for (let r = 1; r <= 100; r++)
      for (let c = 1; c <= 100; c++) lines.push(`BN${round}-${Date.now() % 100000}-${c}-${r},${c},${r},B${r % 3}`);
    const started = performance.now();
    const result = await api('POST', `/api/walls/${wall.id}/cabinets/import`, lines.join('\n'), 'text/csv');
    importTimes.push(performance.now() - started);
    if (result.imported !== 10_000) throw new Error(`imported ${result.imported}, expected 10000`);
  }
  if (runs('import')) results.push({ name: 'import 10,000-row CSV (median of 3)', value: median(importTimes), unit: 'ms', target: 3000 });

  // A 2,000-cabinet wall (50 × 40) for the map and the read throughput.
  const bigWall = await api('POST', '/api/walls', {
    siteId,
    name: `Bench map ${Date.now()}`,
    cabinetModelId: modelId,
    columns: 50,
    rows: 40,
  });
  const rows = ['serial,column,row,batch'];
  for (let r = 1; r <= 40; r++) for (let c = 1; c <= 50; c++) rows.push(`MAP-${Date.now() % 100000}-${c}-${r},${c},${r},B1`);
  await api('POST', `/api/walls/${bigWall.id}/cabinets/import`, rows.join('\n'), 'text/csv');
  // The imports leave the database work to do (autovacuum, statistics): it is done now, so that
  // what follows measures the map and the reads, not that.
  const { db } = await import('../server/db/client.js');
  await db().execute(sql`vacuum analyze cabinets, cabinet_events, audit_events`);

  // 2. The wall map in Chromium.
  if (runs('map')) {
    const { measureWallMap } = await import('./lib/bench-map.js');
    const map = await measureWallMap(base, { email: 'office@gridkeep.test', password: 'gridkeep-demo' }, bigWall.id, 2000);
    results.push({ name: 'wall map, 2,000 cabinets: data to all cells drawn (median of 5)', value: map.renderMs, unit: 'ms', target: 200 });
    results.push({
      name: 'wall map, 2,000 cabinets: front/rear toggle to redrawn (median of 5)',
      value: map.toggleMs,
      unit: 'ms',
      target: 200,
    });
    results.push({ name: 'wall map, 2,000 cabinets: cell tap to cabinet card (median of 5)', value: map.cardMs, unit: 'ms', target: 200 });
  }

  // 3. Read throughput (reported only: the machine is shared by server and load generator).
  const reads: [string, string][] = [
    ['GET wall map data (2,000 cabinets)', `/api/walls/${bigWall.id}/cabinets`],
    ['GET tickets list (50 per page)', '/api/tickets?limit=50'],
    ['GET health', '/api/health'],
  ];
  for (const [name, url] of runs('api') ? reads : []) {
    const out = await autocannon({ url: `${base}${url}`, connections: 20, duration: 5, headers: { Cookie: cookie } });
    results.push({
      name: `${name}: requests/s (20 connections, 5 s; p99 ${out.latency.p99} ms)`,
      value: out.requests.average,
      unit: 'req/s',
    });
    if (out.non2xx > 0) throw new Error(`${name}: ${out.non2xx} non-2xx answers`);
  }
}

main()
  .then(async () => {
    await shutdown.run();
    let failed = 0;
    for (const r of results) {
      const ok = (r.target === undefined || r.value <= r.target) && (r.atLeast === undefined || r.value >= r.atLeast);
      if (!ok) failed++;
      log(
        `${ok ? 'ok  ' : 'SLOW'} ${r.name}: ${Math.round(r.value).toLocaleString('en')} ${r.unit}${r.target ? ` (target ≤ ${r.target} ${r.unit})` : ''}${r.atLeast ? ` (target ≥ ${r.atLeast} ${r.unit})` : ''}`,
      );
    }
    process.exit(failed ? 1 : 0);
  })
  .catch(async (err) => {
    console.error(`bench failed: ${(err as Error).stack}`);
    await shutdown.run();
    process.exit(1);
  });
