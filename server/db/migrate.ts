import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';

export const migrationsFolder = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../drizzle');

/** Applies every pending migration in drizzle/ (run at start; safe to run again). */
export async function runMigrations(databaseUrl: string) {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    // One migrator at a time when several app containers start together.
    await client.query('select pg_advisory_lock(72120431)');
    await migrate(drizzle(client), { migrationsFolder });
  } finally {
    await client.end();
  }
}
