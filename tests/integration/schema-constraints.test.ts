// The database is the last line of defence: these checks insert rows directly, past every
// service rule, and expect PostgreSQL itself to refuse what the register must never hold.
// SQLSTATE codes from the PostgreSQL manual, appendix A "Error Codes": 23505 unique_violation,
// 23503 foreign_key_violation, 23514 check_violation.
import { randomBytes } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as schema from '../../server/db/schema/index.js';

let pool: pg.Pool;
let db: NodePgDatabase<typeof schema>;

beforeAll(() => {
  pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 4 });
  db = drizzle(pool, { schema, casing: 'snake_case' });
});

afterAll(async () => {
  await pool?.end();
});

const suffix = () => randomBytes(5).toString('hex');

interface PgError {
  code?: string;
  constraint?: string;
}

/** The PostgreSQL error behind a refused statement (drizzle wraps it in `cause`). */
async function refusal(statement: PromiseLike<unknown>): Promise<PgError> {
  try {
    await statement;
  } catch (err) {
    return ((err as { cause?: unknown }).cause ?? err) as PgError;
  }
  throw new Error('the database accepted a row it should refuse');
}

async function makeClient() {
  const [client] = await db
    .insert(schema.clients)
    .values({ name: `Constraint test client ${suffix()}` })
    .returning();
  const [site] = await db
    .insert(schema.sites)
    .values({ clientId: client.id, name: `Site ${suffix()}`, timeZone: 'America/Denver' })
    .returning();
  return { client, site };
}

async function makeModel() {
  const [model] = await db
    .insert(schema.cabinetModels)
    .values({
      name: `Test cabinet ${suffix()}`,
      widthMm: 500,
      heightMm: 500,
      pixelPitchMm: 2.604,
      pixelsWide: 192,
      pixelsHigh: 192,
      modulesWide: 2,
      modulesHigh: 2,
      maxPowerW: 180,
      typicalPowerW: 60,
      weightKg: 7.5,
      brightnessNits: 1000,
    })
    .returning();
  return model;
}

async function makeWall(columns = 4, rows = 3) {
  const { client, site } = await makeClient();
  const model = await makeModel();
  const [wall] = await db
    .insert(schema.walls)
    .values({ clientId: client.id, siteId: site.id, name: `Wall ${suffix()}`, cabinetModelId: model.id, columns, rows })
    .returning();
  return { client, site, model, wall };
}

const cabinet = (wall: { id: string; cabinetModelId: string }, column: number, row: number, serial = `SN-${suffix()}`) => ({
  serial,
  cabinetModelId: wall.cabinetModelId,
  wallId: wall.id,
  column,
  row,
  batch: 'B1',
  status: 'installed' as const,
});

async function makePartAndLocations() {
  const [part] = await db
    .insert(schema.parts)
    .values({ sku: `TEST-${suffix()}`, name: 'Test part', kind: 'fan' })
    .returning();
  const [warehouse] = await db
    .insert(schema.stockLocations)
    .values({ name: `Warehouse ${suffix()}`, kind: 'warehouse' })
    .returning();
  const [shelf] = await db
    .insert(schema.stockLocations)
    .values({ name: `Shelf ${suffix()}`, kind: 'warehouse' })
    .returning();
  return { part, warehouse, shelf };
}

describe('cabinets', () => {
  it('refuses a second cabinet with the same serial', async () => {
    const { wall } = await makeWall();
    const serial = `DUP-${suffix()}`;
    await db.insert(schema.cabinets).values(cabinet(wall, 1, 1, serial));
    const err = await refusal(db.insert(schema.cabinets).values(cabinet(wall, 2, 1, serial)));
    expect(err).toMatchObject({ code: '23505', constraint: 'cabinets_serial_key' });
  });

  it('refuses two cabinets at one wall position', async () => {
    const { wall } = await makeWall();
    await db.insert(schema.cabinets).values(cabinet(wall, 2, 3));
    const err = await refusal(db.insert(schema.cabinets).values(cabinet(wall, 2, 3)));
    expect(err).toMatchObject({ code: '23505', constraint: 'cabinets_wall_position_key' });
  });

  it('accepts the last cell of the grid and refuses a position outside it', async () => {
    const { wall } = await makeWall(4, 3);
    await db.insert(schema.cabinets).values(cabinet(wall, 4, 3));
    expect(await refusal(db.insert(schema.cabinets).values(cabinet(wall, 5, 1)))).toMatchObject({
      code: '23514',
      constraint: 'cabinets_position_inside_grid',
    });
    expect(await refusal(db.insert(schema.cabinets).values(cabinet(wall, 1, 4)))).toMatchObject({
      code: '23514',
      constraint: 'cabinets_position_inside_grid',
    });
  });

  it('refuses moving a placed cabinet outside the grid', async () => {
    const { wall } = await makeWall(4, 3);
    const [c] = await db
      .insert(schema.cabinets)
      .values(cabinet(wall, 1, 1))
      .returning();
    const err = await refusal(db.update(schema.cabinets).set({ column: 9 }).where(eq(schema.cabinets.id, c.id)));
    expect(err).toMatchObject({ code: '23514', constraint: 'cabinets_position_inside_grid' });
  });
});

describe('walls', () => {
  it('lets the grid shrink around its cabinets but not past one', async () => {
    const { wall } = await makeWall(4, 3);
    await db.insert(schema.cabinets).values(cabinet(wall, 3, 2));
    await db.update(schema.walls).set({ columns: 3, rows: 2 }).where(eq(schema.walls.id, wall.id));
    const err = await refusal(db.update(schema.walls).set({ columns: 2 }).where(eq(schema.walls.id, wall.id)));
    expect(err).toMatchObject({ code: '23514', constraint: 'walls_grid_holds_cabinets' });
    const [after] = await db.select().from(schema.walls).where(eq(schema.walls.id, wall.id));
    expect([after.columns, after.rows]).toEqual([3, 2]);
  });

  it("refuses a wall whose client is not its site's client", async () => {
    const { site } = await makeClient();
    const { client: other } = await makeClient();
    const model = await makeModel();
    const err = await refusal(
      db
        .insert(schema.walls)
        .values({ clientId: other.id, siteId: site.id, name: `Wall ${suffix()}`, cabinetModelId: model.id, columns: 2, rows: 2 }),
    );
    expect(err).toMatchObject({ code: '23503', constraint: 'walls_site_client_fk' });
  });

  it('refuses a ticket whose wall belongs to another client', async () => {
    const { wall } = await makeWall();
    const { client: other, site: otherSite } = await makeClient();
    const err = await refusal(
      db
        .insert(schema.tickets)
        .values({ clientId: other.id, siteId: otherSite.id, wallId: wall.id, title: 'Dead module', priority: 'normal' }),
    );
    expect(err).toMatchObject({ code: '23503', constraint: 'tickets_wall_client_fk' });
  });
});

describe('stock', () => {
  it('refuses a movement of zero or a negative quantity', async () => {
    const { part, warehouse } = await makePartAndLocations();
    for (const quantity of [0, -1]) {
      const err = await refusal(
        db.insert(schema.stockMovements).values({ partId: part.id, kind: 'receipt', toLocationId: warehouse.id, quantity }),
      );
      expect(err).toMatchObject({ code: '23514', constraint: 'stock_movements_quantity_positive' });
    }
  });

  it('refuses a balance below zero, on insert and on update', async () => {
    const { part, warehouse } = await makePartAndLocations();
    const refused = await refusal(db.insert(schema.stockBalances).values({ partId: part.id, locationId: warehouse.id, quantity: -1 }));
    expect(refused).toMatchObject({ code: '23514', constraint: 'stock_balances_not_negative' });
    await db.insert(schema.stockBalances).values({ partId: part.id, locationId: warehouse.id, quantity: 1 });
    const where = eq(schema.stockBalances.partId, part.id);
    await db.update(schema.stockBalances).set({ quantity: 0 }).where(where);
    const err = await refusal(db.update(schema.stockBalances).set({ quantity: -1 }).where(where));
    expect(err).toMatchObject({ code: '23514', constraint: 'stock_balances_not_negative' });
  });

  it('refuses movement kinds with the wrong locations and accepts the right ones', async () => {
    const { part, warehouse, shelf } = await makePartAndLocations();
    const move = (kind: (typeof schema.stockMovements.$inferInsert)['kind'], from: string | null, to: string | null) =>
      db.insert(schema.stockMovements).values({ partId: part.id, kind, fromLocationId: from, toLocationId: to, quantity: 1 });
    const wrong: [Parameters<typeof move>[0], string | null, string | null][] = [
      ['receipt', shelf.id, warehouse.id], // a receipt comes from outside
      ['consumption', warehouse.id, shelf.id], // a consumption goes into a wall, not a location
      ['transfer', null, warehouse.id], // a transfer needs both ends
      ['sent_to_vendor', null, warehouse.id],
      ['back_from_vendor', shelf.id, warehouse.id],
      ['return_from_wall', warehouse.id, null],
    ];
    for (const [kind, from, to] of wrong) {
      const err = await refusal(move(kind, from, to));
      expect(err, kind).toMatchObject({ code: '23514', constraint: 'stock_movements_kind_locations' });
    }
    expect(await refusal(move('transfer', warehouse.id, warehouse.id))).toMatchObject({
      code: '23514',
      constraint: 'stock_movements_distinct_locations',
    });
    await move('receipt', null, warehouse.id);
    await move('transfer', warehouse.id, shelf.id);
    await move('consumption', shelf.id, null);
  });
});

describe('users', () => {
  it('refuses a client user without an organisation and a staff user with one', async () => {
    const { client } = await makeClient();
    const clientUser = await refusal(
      db.insert(schema.users).values({ email: `client-${suffix()}@example.test`, name: 'Client without org', role: 'client' }),
    );
    expect(clientUser).toMatchObject({ code: '23514', constraint: 'users_client_role' });
    const staff = await refusal(
      db
        .insert(schema.users)
        .values({ email: `tech-${suffix()}@example.test`, name: 'Staff with org', role: 'technician', clientId: client.id }),
    );
    expect(staff).toMatchObject({ code: '23514', constraint: 'users_client_role' });
    await db
      .insert(schema.users)
      .values({ email: `client-${suffix()}@example.test`, name: 'Client user', role: 'client', clientId: client.id });
  });

  it('refuses an e-mail address that is not lower-case', async () => {
    const err = await refusal(
      db.insert(schema.users).values({ email: `Office-${suffix()}@Example.test`, name: 'Upper case', role: 'coordinator' }),
    );
    expect(err).toMatchObject({ code: '23514', constraint: 'users_email_lower' });
  });

  it('refuses a second account with the same e-mail', async () => {
    const email = `same-${suffix()}@example.test`;
    await db.insert(schema.users).values({ email, name: 'First', role: 'coordinator' });
    const err = await refusal(db.insert(schema.users).values({ email, name: 'Second', role: 'technician' }));
    expect(err).toMatchObject({ code: '23505', constraint: 'users_email_key' });
  });
});
