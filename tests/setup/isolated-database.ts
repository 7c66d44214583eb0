// A database of a test file's own, migrated, for tests that must not see other files' rows
// (the mail worker sends every due message in its database).
import { randomUUID } from 'node:crypto';
import pg from 'pg';
import { inject } from 'vitest';
import { ensureDatabase } from '../../scripts/lib/postgres.js';
import { runMigrations } from '../../server/db/migrate.js';

export async function createIsolatedDatabase(prefix = 'gridkeep_iso') {
  const admin = new URL(inject('databaseUrl'));
  admin.pathname = '/postgres';
  const name = `${prefix}_${randomUUID().slice(0, 8)}`;
  await ensureDatabase(admin.toString(), name);
  const url = new URL(admin.toString());
  url.pathname = `/${name}`;
  await runMigrations(url.toString());
  return {
    url: url.toString(),
    async drop() {
      const client = new pg.Client({ connectionString: admin.toString() });
      await client.connect();
      try {
        await client.query(`drop database if exists "${name}" with (force)`);
      } finally {
        await client.end();
      }
    },
  };
}
