// `npm run restore -- <backup folder> [--replace] [--skip-queued-mail]`: puts a backup made by
// `npm run backup` back. Into an empty database by default; --replace overwrites one that holds
// data (stop the app first). See README, "Backup and restore".
import path from 'node:path';
import { parseArgs } from 'node:util';
import { restore } from './lib/backup.js';
import { openStoredData } from './lib/stored-data.js';
import { runMigrations } from '../server/db/migrate.js';

const { values, positionals } = parseArgs({
  allowPositionals: true,
  options: { replace: { type: 'boolean', default: false }, 'skip-queued-mail': { type: 'boolean', default: false } },
});
if (positionals.length !== 1) {
  console.error('Usage: npm run restore -- <backup folder> [--replace] [--skip-queued-mail]');
  process.exit(2);
}
const from = path.resolve(positionals[0]);

const data = await openStoredData();
let code = 0;
try {
  for (const line of data.summary) console.log(line);
  if (data.inUse) throw new Error('`npm start` is running on this database: stop it before a restore.');
  const started = Date.now();
  const result = await restore({
    databaseUrl: data.databaseUrl,
    storage: data.storage,
    from,
    replace: values.replace,
    skipQueuedMail: values['skip-queued-mail'],
    log: console.log,
  });
  // A backup from an older release is brought up to this one's schema now, not at the next start.
  await runMigrations(data.databaseUrl);
  const rows = Object.values(result.tables).reduce((a, b) => a + b, 0);
  console.log(
    `Restored ${from} (made ${result.manifest.createdAt}) in ${((Date.now() - started) / 1000).toFixed(1)} s: ` +
      `${rows} rows, ${result.objects} files.`,
  );
  if (result.mailSkipped) console.log(`${result.mailSkipped} queued e-mail(s) marked as not sent (--skip-queued-mail).`);
  else if (result.manifest.queuedMail) {
    console.log(`${result.manifest.queuedMail} e-mail(s) were queued at backup time: the app sends them when it starts.`);
  }
} catch (err) {
  console.error(`Restore failed: ${(err as Error).message}`);
  code = 1;
} finally {
  await data.stop();
}
process.exit(code);
