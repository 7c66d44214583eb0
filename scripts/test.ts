// `npm test`: a throwaway PostgreSQL cluster (never the demo one), vitest (unit + integration),
// then the browser tests when tests/e2e has specs. Prints `N passed, N failed` over both and
// exits non-zero on any failure. Arguments go to vitest (`npm test -- tests/unit`), and then
// the browser tests are left out.
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { projectRoot } from './lib/local-services.js';
import { ensureDatabase, startCluster, type Cluster } from './lib/postgres.js';

const bin = (name: string) => path.join(projectRoot, 'node_modules/.bin', name);
const args = process.argv.slice(2);

let tmp: string | undefined;
let cluster: Cluster | undefined;
let current: ChildProcess | undefined;
let interrupted = false;

function cleanUp() {
  cluster?.stop();
  cluster = undefined;
  if (tmp) fs.rmSync(tmp, { recursive: true, force: true });
  tmp = undefined;
}

for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
  process.on(signal, () => {
    if (interrupted) return;
    interrupted = true;
    console.log(`\n${signal}: stopping the tests…`);
    current?.kill('SIGTERM');
    // The runner's own exit (below) finishes the clean-up; this is the backstop.
    setTimeout(() => {
      current?.kill('SIGKILL');
      cleanUp();
      process.exit(130);
    }, 20_000).unref();
  });
}

function run(command: string, commandArgs: string[], env: NodeJS.ProcessEnv): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(command, commandArgs, { cwd: projectRoot, env, stdio: 'inherit' });
    current = child;
    child.on('error', (err) => {
      console.error(`Could not run ${command}: ${err.message}`);
      resolve(1);
    });
    child.on('exit', (code, signal) => {
      current = undefined;
      resolve(code ?? (signal ? 1 : 0));
    });
  });
}

function readJson(file: string): Record<string, unknown> | undefined {
  try {
    return JSON.parse(fs.readFileSync(file, 'utf8'));
  } catch {
    return undefined;
  }
}

function hasSpecs(dir: string): boolean {
  if (!fs.existsSync(dir)) return false;
  return fs.readdirSync(dir, { withFileTypes: true, recursive: true }).some((e) => e.isFile() && /\.spec\.ts$/.test(e.name));
}

interface Tally {
  name: string;
  passed: number;
  failed: number;
  skipped: number;
  code: number;
}

async function main(): Promise<number> {
  tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-test-'));
  fs.chmodSync(tmp, 0o755); // the postgres user must reach the cluster folder inside
  const tallies: Tally[] = [];

  console.log('Starting a throwaway PostgreSQL cluster…');
  cluster = await startCluster({ dataDir: path.join(tmp, 'pg'), fast: true, log: () => {} });
  await ensureDatabase(cluster.url('postgres'), 'gridkeep_test');
  const baseEnv: NodeJS.ProcessEnv = { ...process.env, TEST_DATABASE_URL: cluster.url('gridkeep_test') };
  // The tests bring their own services: settings meant for a running app must not reach them.
  for (const name of ['DATABASE_URL', 'S3_ENDPOINT', 'SMTP_HOST', 'SMTP_PORT', 'DEV_MAILBOX_DIR', 'DATA_DIR', 'PORT']) {
    delete baseEnv[name];
  }

  // vitest: unit and integration projects
  const vitestJson = path.join(tmp, 'vitest.json');
  const vitestCode = await run(
    bin('vitest'),
    ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${vitestJson}`, ...args],
    baseEnv,
  );
  const v = readJson(vitestJson) as
    { numPassedTests?: number; numFailedTests?: number; numPendingTests?: number; numTodoTests?: number } | undefined;
  tallies.push({
    name: 'vitest',
    passed: v?.numPassedTests ?? 0,
    failed: v?.numFailedTests ?? 0,
    skipped: (v?.numPendingTests ?? 0) + (v?.numTodoTests ?? 0),
    code: vitestCode,
  });

  // The tenant tests must fail without the organisation filter (scripts/check-tenant-tests.ts).
  if (!interrupted && args.length === 0) {
    const code = await run(bin('tsx'), [path.join(projectRoot, 'scripts/check-tenant-tests.ts')], baseEnv);
    tallies.push({ name: 'tenant', passed: code === 0 ? 1 : 0, failed: code === 0 ? 0 : 1, skipped: 0, code });
  }

  // Playwright: against the app started by its webServer, exactly as `npm start` runs it
  if (!interrupted && args.length === 0 && hasSpecs(path.join(projectRoot, 'tests/e2e'))) {
    if (!fs.existsSync('/usr/bin/chromium')) {
      console.log("The browser tests need Debian's Chromium: apt-get install chromium (never `playwright install`).");
    }
    const pwJson = path.join(tmp, 'playwright.json');
    const e2eDataDir = path.join(tmp, 'e2e-data');
    fs.mkdirSync(e2eDataDir);
    const pwCode = await run(bin('playwright'), ['test', '--reporter=list,json'], {
      ...baseEnv,
      PLAYWRIGHT_JSON_OUTPUT_FILE: pwJson,
      GRIDKEEP_E2E_DATA_DIR: e2eDataDir,
    });
    const p = readJson(pwJson) as { stats?: { expected?: number; unexpected?: number; flaky?: number; skipped?: number } } | undefined;
    tallies.push({
      name: 'playwright',
      passed: (p?.stats?.expected ?? 0) + (p?.stats?.flaky ?? 0),
      failed: p?.stats?.unexpected ?? 0,
      skipped: p?.stats?.skipped ?? 0,
      code: pwCode,
    });
  }

  let passed = 0;
  let failed = 0;
  let skipped = 0;
  for (const t of tallies) {
    passed += t.passed;
    failed += t.failed;
    skipped += t.skipped;
    console.log(`  ${t.name.padEnd(10)} passed ${t.passed} · failed ${t.failed} · skipped ${t.skipped} · exit code ${t.code}`);
    // A runner that failed outside any test (a file that does not load, a crashed web server)
    // counts as one failure, so the total never reads as all green.
    if (t.code !== 0 && t.failed === 0) {
      failed += 1;
      console.log(`${t.name} exited with code ${t.code} without a failed test: counted as one failure.`);
    }
  }
  console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
  return failed > 0 || interrupted ? 1 : 0;
}

main()
  .catch((err) => {
    console.error(`npm test could not run: ${(err as Error).message}`);
    console.log('0 passed, 1 failed');
    return 1;
  })
  .then((code) => {
    cleanUp();
    process.exit(interrupted ? 130 : code);
  });
