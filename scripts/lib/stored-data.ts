// The database and the object store that `npm run backup` / `npm run restore` work on: the ones
// configured (DATABASE_URL, S3_ENDPOINT…) or else the local ones `npm start` keeps in DATA_DIR
// (default .data/). A local cluster that `npm start` is running is used as it runs; a stopped one
// is started for the job and stopped after. The S3 fake is started on the same folder for the job.
import fs from 'node:fs';
import path from 'node:path';
import { storageFromEnv, type StorageSettings } from './backup.js';
import { projectRoot } from './local-services.js';
import { ensureDatabase, runningClusterUrl, startCluster } from './postgres.js';
import { s3FakeCredentials, startS3Fake } from './s3-fake.js';

export interface StoredData {
  databaseUrl: string;
  storage: StorageSettings;
  /** Whether the database is the local one that a running `npm start` uses right now. */
  inUse: boolean;
  /** What is where, for the script's first lines. */
  summary: string[];
  stop: () => Promise<void>;
}

export async function openStoredData(log: (line: string) => void = console.log): Promise<StoredData> {
  for (const name of ['DATABASE_URL', 'S3_ENDPOINT']) if (process.env[name] === '') delete process.env[name];
  const dataDir = path.resolve(process.env.DATA_DIR || path.join(projectRoot, '.data'));
  const stops: (() => Promise<void> | void)[] = [];
  const stop = async () => {
    for (const s of stops.reverse()) await s();
  };
  try {
    let databaseUrl = process.env.DATABASE_URL;
    let inUse = false;
    const summary: string[] = [];
    if (databaseUrl) {
      summary.push(`database  ${databaseUrl.replace(/\/\/([^:@/]+):[^@/]*@/, '//$1:***@')} (DATABASE_URL)`);
    } else {
      databaseUrl = runningClusterUrl(path.join(dataDir, 'pg'), 'gridkeep') ?? undefined;
      if (databaseUrl) {
        inUse = true;
        summary.push(`database  ${databaseUrl} (the cluster a running \`npm start\` uses)`);
      } else {
        const cluster = await startCluster({ dataDir: path.join(dataDir, 'pg'), log });
        stops.push(() => cluster.stop());
        await ensureDatabase(cluster.url('postgres'), 'gridkeep');
        databaseUrl = cluster.url('gridkeep');
        summary.push(`database  ${databaseUrl} (cluster in ${cluster.dataDir}, started for this job)`);
      }
    }
    let storage: StorageSettings;
    if (process.env.S3_ENDPOINT) {
      storage = storageFromEnv();
      summary.push(`files     ${storage.endpoint} bucket ${storage.bucket} (S3_ENDPOINT)`);
    } else {
      const dir = path.join(dataDir, 's3');
      fs.mkdirSync(dir, { recursive: true });
      const s3 = await startS3Fake({ dir });
      stops.push(() => s3.stop());
      storage = {
        ...storageFromEnv(),
        endpoint: s3.endpoint,
        forcePathStyle: true,
        accessKeyId: s3FakeCredentials.accessKeyId,
        secretAccessKey: s3FakeCredentials.secretAccessKey,
      };
      summary.push(`files     ${dir} (local store)`);
    }
    return { databaseUrl, storage, inUse, summary, stop };
  } catch (err) {
    await stop();
    throw err;
  }
}
