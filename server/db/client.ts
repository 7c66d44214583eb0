import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import { config } from '../config.js';
import { logger } from '../logger.js';
import * as schema from './schema/index.js';

export type Db = NodePgDatabase<typeof schema>;
/** A transaction handle; services take `Db | Tx` and pass it down explicitly. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type DbOrTx = Db | Tx;

let pool: pg.Pool | undefined;
let database: Db | undefined;

export function getPool(): pg.Pool {
  if (!pool) {
    pool = new pg.Pool({
      connectionString: config().DATABASE_URL,
      max: config().DATABASE_POOL_SIZE,
      connectionTimeoutMillis: 5000,
      idleTimeoutMillis: 30_000,
    });
    // An idle client losing its connection (a database restart) must not crash the process.
    pool.on('error', (err) => logger.warn('idle database connection lost', { err: err.message }));
  }
  return pool;
}

export function db(): Db {
  database ??= drizzle(getPool(), { schema, casing: 'snake_case' });
  return database;
}

export async function closeDb() {
  const p = pool;
  pool = undefined;
  database = undefined;
  await p?.end();
}
