// Proves the tenant tests can fail: runs tests/integration/tenant-boundary.test.ts and
// route-matrix.test.ts with the organisation filter removed from every scoped query
// (GRIDKEEP_DROP_TENANT_FILTER=1: tests/setup/without-tenant-filter.ts makes
// server/services/scope.ts's tenantWhere keep nothing out), and exits 0 only when every test
// named "[tenant filter]" then FAILS. A test that still passes could not catch a lost filter:
// it is named, and the script exits 1. Run by `npm test` after vitest; alone:
// `npx tsx scripts/check-tenant-tests.ts` (starts its own PostgreSQL unless TEST_DATABASE_URL is set).
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { projectRoot } from './lib/local-services.js';

const files = ['tests/integration/tenant-boundary.test.ts', 'tests/integration/route-matrix.test.ts'];
const TAG = '[tenant filter]';

interface Report {
  testResults?: { name: string; assertionResults: { fullName: string; status: string }[] }[];
}

function runVitest(outputFile: string): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(
      path.join(projectRoot, 'node_modules/.bin/vitest'),
      ['run', '--project', 'integration', '--reporter=json', `--outputFile.json=${outputFile}`, ...files],
      { cwd: projectRoot, env: { ...process.env, GRIDKEEP_DROP_TENANT_FILTER: '1' }, stdio: ['ignore', 'ignore', 'inherit'] },
    );
    child.on('error', () => resolve(-1));
    child.on('exit', (code) => resolve(code ?? 1));
  });
}

async function main(): Promise<number> {
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-tenant-check-'));
  try {
    const out = path.join(tmp, 'report.json');
    console.log('Tenant tests without the organisation filter (they must fail)…');
    await runVitest(out);
    if (!fs.existsSync(out)) {
      console.log('check-tenant-tests: vitest wrote no report; the tests did not run.');
      return 1;
    }
    const report = JSON.parse(fs.readFileSync(out, 'utf8')) as Report;
    let ok = true;
    for (const file of files) {
      const result = report.testResults?.find((r) => r.name.endsWith(file));
      const tagged = (result?.assertionResults ?? []).filter((t) => t.fullName.includes(TAG));
      const failed = tagged.filter((t) => t.status === 'failed');
      const stillPassing = tagged.filter((t) => t.status !== 'failed');
      console.log(`  ${file}: ${failed.length} of ${tagged.length} "${TAG}" tests failed, as they must`);
      for (const t of failed) console.log(`    failed: ${t.fullName}`);
      if (tagged.length === 0) {
        console.log(`    no "${TAG}" test ran in ${file}`);
        ok = false;
      }
      for (const t of stillPassing) {
        console.log(`    COULD NOT FAIL (${t.status}) without the filter: ${t.fullName}`);
        ok = false;
      }
    }
    console.log(ok ? 'check-tenant-tests: every tenant test failed without the filter.' : 'check-tenant-tests: FAILED');
    return ok ? 0 : 1;
  } finally {
    fs.rmSync(tmp, { recursive: true, force: true });
  }
}

main().then(
  (code) => process.exit(code),
  (err) => {
    console.error(`check-tenant-tests could not run: ${(err as Error).message}`);
    process.exit(1);
  },
);
