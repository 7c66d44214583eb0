// Integration tests run against a real PostgreSQL. `npm test` starts a throwaway cluster and
// passes DATABASE_URL; run alone (`npx vitest --project integration`), this starts one itself.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { ensureDatabase, startCluster, type Cluster } from '../../scripts/lib/postgres.js';
import { runMigrations } from '../../server/db/migrate.js';

let cluster: Cluster | undefined;
let tmpDir: string | undefined;

export default async function setup(project: TestProject) {
  let url = process.env.TEST_DATABASE_URL;
  if (!url) {
    tmpDir = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-vitest-'));
    // The postgres user must be able to enter the folder (mkdtemp makes it private).
    fs.chmodSync(tmpDir, 0o755);
    cluster = await startCluster({ dataDir: path.join(tmpDir, 'pg'), fast: true, log: () => {} });
    url = cluster.url('postgres');
    await ensureDatabase(url, 'gridkeep_test');
    url = cluster.url('gridkeep_test');
  }
  await runMigrations(url);
  project.provide('databaseUrl', url);
  return async () => {
    cluster?.stop();
    if (tmpDir) fs.rmSync(tmpDir, { recursive: true, force: true });
  };
}

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}
