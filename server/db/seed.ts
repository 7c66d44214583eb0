// Demo data for a fresh installation: an invented integrator with four client organisations,
// their sites and twelve walls, every cabinet, eight months of tickets, visits and repairs, and
// a stock ledger whose balances add up. `npm start` calls seedIfEmpty() on an empty database.
import { sql } from 'drizzle-orm';
import type { PgTable } from 'drizzle-orm/pg-core';
import { hashPassword } from '../services/passwords.js';
import type { Db, Tx } from './client.js';
import * as schema from './schema/index.js';
import { buildDemo, type DemoRows } from './seed/build.js';
import { DEMO_PASSWORD } from './seed/register.js';

export { DEMO_PASSWORD };

/** Rows per INSERT statement: well under PostgreSQL's 65,535 bind parameters for every table here. */
const CHUNK = 500;

async function insertAll<T extends PgTable>(tx: Tx, table: T, values: T['$inferInsert'][]) {
  for (let i = 0; i < values.length; i += CHUNK) {
    await tx.insert(table).values(values.slice(i, i + CHUNK) as never);
  }
}

async function writeDemo(tx: Tx, rows: DemoRows) {
  await tx.insert(schema.companySettings).values(rows.companySettings).onConflictDoNothing();
  await insertAll(tx, schema.servicePlans, rows.servicePlans);
  await insertAll(tx, schema.clients, rows.clients);
  await insertAll(tx, schema.sites, rows.sites);
  await insertAll(tx, schema.users, rows.users);
  // After the users: a contact may be linked to the account it signs in as.
  await insertAll(tx, schema.contacts, rows.contacts);
  await insertAll(tx, schema.cabinetModels, rows.cabinetModels);
  await insertAll(tx, schema.parts, rows.parts);
  await insertAll(tx, schema.stockLocations, rows.stockLocations);
  await insertAll(tx, schema.walls, rows.walls);
  await insertAll(tx, schema.controllers, rows.controllers);
  await insertAll(tx, schema.cabinets, rows.cabinets);
  await insertAll(tx, schema.cabinetEvents, rows.cabinetEvents);
  await insertAll(tx, schema.maintenancePlans, rows.maintenancePlans);
  await insertAll(tx, schema.tickets, rows.tickets);
  // Ticket numbers were given explicitly; the next one a person opens follows on.
  await tx.execute(sql`select setval(pg_get_serial_sequence('tickets', 'number'), (select max(number) from tickets))`);
  await insertAll(tx, schema.ticketComments, rows.ticketComments);
  await insertAll(tx, schema.visits, rows.visits);
  await insertAll(tx, schema.visitTechnicians, rows.visitTechnicians);
  await insertAll(tx, schema.repairs, rows.repairs);
  await insertAll(tx, schema.vendorReturns, rows.vendorReturns);
  await insertAll(tx, schema.stockMovements, rows.stockMovements);
  await insertAll(tx, schema.stockBalances, rows.stockBalances);
  await insertAll(tx, schema.reorderPoints, rows.reorderPoints);
  await insertAll(tx, schema.auditEvents, rows.auditEvents);
}

async function hasNoUsers(db: Db | Tx) {
  const found = await db.select({ id: schema.users.id }).from(schema.users).limit(1);
  return found.length === 0;
}

/** Writes the whole demo in one transaction (for an empty database). */
export async function seedDemo(db: Db, now = new Date()): Promise<void> {
  const rows = buildDemo(now, await hashPassword(DEMO_PASSWORD));
  await db.transaction((tx) => writeDemo(tx, rows));
}

/**
 * Seeds only when there are no users yet; returns whether it did. An advisory lock keeps two
 * app instances starting together from both seeding.
 */
export async function seedIfEmpty(db: Db, now = new Date()): Promise<boolean> {
  if (!(await hasNoUsers(db))) return false;
  const rows = buildDemo(now, await hashPassword(DEMO_PASSWORD));
  return db.transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(72120432)`);
    if (!(await hasNoUsers(tx))) return false;
    await writeDemo(tx, rows);
    return true;
  });
}
