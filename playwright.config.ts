// Browser tests against the real app, started exactly as people start it (`scripts/start.ts`),
// with its own throwaway data folder and a free port. Uses Debian's Chromium (never
// `playwright install`). `npm test` runs this after vitest; `npm run test:e2e` runs it alone.
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { defineConfig, devices } from '@playwright/test';

// The runner loads this file in every worker too: the first load picks the data folder and
// the port and passes them on through the environment, which the workers inherit.
const isWorker = process.env.TEST_WORKER_INDEX !== undefined;
if (!process.env.GRIDKEEP_E2E_DATA_DIR) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-e2e-'));
  fs.chmodSync(dir, 0o755); // the postgres user must reach the cluster folder inside
  process.env.GRIDKEEP_E2E_DATA_DIR = dir;
  // Made here, so removed here: when the runner exits, after the web server has stopped.
  if (!isWorker) process.on('exit', () => fs.rmSync(dir, { recursive: true, force: true }));
}
if (!process.env.GRIDKEEP_E2E_PORT) {
  const script = "const s=require('net').createServer().listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})";
  process.env.GRIDKEEP_E2E_PORT = execFileSync(process.execPath, ['-e', script], { encoding: 'utf8' }).trim();
}
const dataDir = process.env.GRIDKEEP_E2E_DATA_DIR;
const port = Number(process.env.GRIDKEEP_E2E_PORT);
const baseURL = `http://127.0.0.1:${port}`;

export default defineConfig({
  testDir: 'tests/e2e',
  testMatch: '**/*.spec.ts',
  outputDir: 'test-results',
  fullyParallel: false,
  workers: process.env.CI ? 1 : 2,
  retries: 0,
  forbidOnly: Boolean(process.env.CI),
  // Generous: a first page load compiles nothing, but a busy 2-core machine can take seconds.
  timeout: 90_000,
  expect: { timeout: 15_000 },
  reporter: 'list',
  use: {
    baseURL,
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      // Without the background-networking flags Chromium keeps calling out to a closed network.
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
  },
  projects: [{ name: 'chromium', use: { ...devices['Desktop Chrome'], channel: undefined } }],
  webServer: {
    command: 'node_modules/.bin/tsx scripts/start.ts',
    url: `${baseURL}/api/health`,
    reuseExistingServer: false,
    // A first start builds the client and seeds the demo data.
    timeout: 300_000,
    // SIGTERM lets the start script stop its PostgreSQL cluster and fakes (the default, SIGKILL,
    // would leave the cluster running).
    gracefulShutdown: { signal: 'SIGTERM', timeout: 30_000 },
    stdout: 'ignore',
    stderr: 'pipe',
    env: {
      DATA_DIR: dataDir!,
      PORT: String(port),
      HOST: '127.0.0.1',
      LOG_LEVEL: 'warn',
      // Everything local and fresh: an empty value counts as unset for scripts/start.ts.
      DATABASE_URL: '',
      JWT_SECRET: '',
      S3_ENDPOINT: '',
      SMTP_HOST: '',
      SMTP_PORT: '',
      DEV_MAILBOX_DIR: '',
      APP_URL: '',
      SKIP_CLIENT_BUILD: '',
    },
  },
});
