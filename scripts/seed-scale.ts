// Adds a decade of service history (scripts/lib/scale-seed.ts) to a database with demo data.
//
//   DATABASE_URL=postgres://… npx tsx scripts/seed-scale.ts [--cabinets N] [--tickets N] [--events N]
//     into that database (migrated, with the demo data: e.g. one `npm start` has filled);
//   DATA_DIR=/tmp/gk-scale npx tsx scripts/seed-scale.ts [--cabinets 100000 …]
//     without DATABASE_URL: a cluster in DATA_DIR/pg (made when missing), migrations, demo data,
//     then the scale data; the cluster is stopped at the end and `PORT=3350 DATA_DIR=… npx tsx
//     scripts/start.ts` serves it.
// Defaults: 1,000,000 cabinets, 100,000 tickets, 1,000,000 cabinet events.
import path from 'node:path';
import { parseArgs } from 'node:util';
import { fullScale, seedAtScale } from './lib/scale-seed.js';
import { ensureDatabase, startCluster } from './lib/postgres.js';

const { values } = parseArgs({
  options: {
    cabinets: { type: 'string' },
    tickets: { type: 'string' },
    events: { type: 'string' },
  },
});
const count = (raw: string | undefined, fallback: number, name: string) => {
  if (raw === undefined) return fallback;
  const n = Number(raw.replace(/[_,]/g, ''));
  if (!Number.isInteger(n) || n < 2000) throw new Error(`--${name} takes a whole number of at least 2000`);
  return n;
};

async function main() {
  const size = {
    cabinets: count(values.cabinets, fullScale.cabinets, 'cabinets'),
    tickets: count(values.tickets, fullScale.tickets, 'tickets'),
    events: count(values.events, fullScale.events, 'events'),
  };
  let stop = () => {};
  let url = process.env.DATABASE_URL;
  if (!url) {
    const dataDir = path.resolve(process.env.DATA_DIR || '/tmp/gridkeep-scale');
    console.log(`No DATABASE_URL: a cluster in ${dataDir}/pg`);
    const cluster = await startCluster({ dataDir: path.join(dataDir, 'pg'), port: 54339 });
    stop = () => cluster.stop();
    await ensureDatabase(cluster.url('postgres'), 'gridkeep');
    url = cluster.url('gridkeep');
    process.env.DATABASE_URL = url;
    process.env.JWT_SECRET ??= 'scale-seed-only-'.padEnd(40, 'x');
    const { runMigrations } = await import('../server/db/migrate.js');
    await runMigrations(url);
    const { db, closeDb } = await import('../server/db/client.js');
    const { seedIfEmpty } = await import('../server/db/seed.js');
    if (await seedIfEmpty(db())) console.log('Demo data written.');
    await closeDb();
  }
  console.log(
    `Seeding ${size.cabinets.toLocaleString('en')} cabinets, ${size.tickets.toLocaleString('en')} tickets, ${size.events.toLocaleString('en')} events…`,
  );
  const started = performance.now();
  try {
    const out = await seedAtScale(url, size, console.log);
    console.log(
      `Done in ${((performance.now() - started) / 1000).toFixed(0)} s: ${out.walls} walls, ${out.sites} sites, ${out.clients} clients.`,
    );
    console.log(`  2,000-cabinet wall ${out.bigWallId}; 500-cabinet wall ${out.wallId}; client ${out.clientId}`);
    console.log(`  a batch ${out.batch}; a serial ${out.serial}`);
  } finally {
    stop();
  }
}

main().catch((err) => {
  console.error(`seed-scale failed: ${(err as Error).message}`);
  process.exit(1);
});
