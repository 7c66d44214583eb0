// `npm run backup [-- --out <folder>]`: the database and every stored file into one new folder.
// Safe while the app runs (pg_dump reads one consistent snapshot). See README, "Backup and restore".
import path from 'node:path';
import { parseArgs } from 'node:util';
import { backup } from './lib/backup.js';
import { openStoredData } from './lib/stored-data.js';

const { values } = parseArgs({ options: { out: { type: 'string' } } });
const stamp = new Date()
  .toISOString()
  .replace(/[:]/g, '-')
  .replace(/\.\d+Z$/, 'Z');
const out = path.resolve(values.out ?? path.join('backups', `gridkeep-${stamp}`));

const data = await openStoredData();
let code = 0;
try {
  for (const line of data.summary) console.log(line);
  const started = Date.now();
  const manifest = await backup({ databaseUrl: data.databaseUrl, storage: data.storage, out, log: console.log });
  const rows = Object.values(manifest.tables).reduce((a, b) => a + b, 0);
  const bytes = manifest.objects.reduce((a, o) => a + o.size, 0);
  console.log(
    `Backup written to ${out} in ${((Date.now() - started) / 1000).toFixed(1)} s: ` +
      `${Object.keys(manifest.tables).length} tables, ${rows} rows, ${manifest.objects.length} files (${(bytes / 1e6).toFixed(1)} MB).`,
  );
} catch (err) {
  console.error(`Backup failed: ${(err as Error).message}`);
  code = 1;
} finally {
  await data.stop();
}
process.exit(code);
