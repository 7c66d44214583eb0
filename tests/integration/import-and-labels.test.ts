import { and, eq, sql } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { auditEvents } from '../../server/db/schema/accounts.js';
import { stockLocations } from '../../server/db/schema/stock.js';
import { cabinets, walls } from '../../server/db/schema/walls.js';
import { batchFamily } from '../../server/services/cabinets.js';
import { anonymous, createCabinetModel, createOrganisation, signedIn, unique, type Session } from '../factories/index.js';

// Planning and import: where a refused serial is registered, the batch family filter, a new wall
// made from the planner's result, and what a cabinet's QR label and its page say.

let office: Session;
let tech: Session;
beforeAll(async () => {
  office = await signedIn('coordinator');
  tech = await signedIn('technician');
});

async function newWall(org?: Awaited<ReturnType<typeof createOrganisation>>, columns = 3, rows = 2) {
  const { client, site } = org ?? (await createOrganisation());
  const model = await createCabinetModel();
  const res = await office.post('/api/walls', { siteId: site.id, name: unique('Wall'), cabinetModelId: model.id, columns, rows });
  expect(res.status).toBe(201);
  return { client, site, model, wall: res.body as { id: string; name: string } };
}

const csvOf = (lines: string[]) => ['serial,column,row,batch', ...lines].join('\n');
const upload = (s: Session, wallId: string, body: string) =>
  s.agent.post(`/api/walls/${wallId}/cabinets/import`).set('X-Requested-With', 'gridkeep').set('Content-Type', 'text/csv').send(body);

describe('a refused import says where each serial is registered', () => {
  it('names this wall’s position, another wall of the client, a stock location or a status; another organisation’s only “elsewhere”', async () => {
    const org = await createOrganisation();
    const target = await newWall(org);
    const sibling = await newWall(org);
    const stranger = await newWall();
    const tag = unique('WHR').toUpperCase();
    const place = async (wallId: string, suffix: string, column: number, row: number) => {
      const res = await office.post(`/api/walls/${wallId}/cabinets`, { serial: `${tag}-${suffix}`, column, row });
      expect(res.status).toBe(201);
      return res.body as { id: string };
    };
    await place(target.wall.id, 'HERE', 2, 1);
    await place(sibling.wall.id, 'SIB', 3, 2);
    await place(stranger.wall.id, 'THEIRS', 1, 1);
    const [warehouse] = await db()
      .insert(stockLocations)
      .values({ name: unique('Warehouse'), kind: 'warehouse' })
      .returning();
    const spare = await place(sibling.wall.id, 'SPARE', 1, 1);
    await office.patch(`/api/cabinets/${spare.id}`, { status: 'spare', stockLocationId: warehouse.id }).expect(200);
    const bench = await place(sibling.wall.id, 'BENCH', 2, 1);
    await office.patch(`/api/cabinets/${bench.id}`, { status: 'at_bench' }).expect(200);
    // Another organisation's on-site spare kit is theirs too.
    const [theirKit] = await db()
      .insert(stockLocations)
      .values({ name: unique('Their kit'), kind: 'site_kit', siteId: stranger.site.id, clientId: stranger.client.id })
      .returning();
    const kept = await place(stranger.wall.id, 'KIT', 2, 1);
    await office.patch(`/api/cabinets/${kept.id}`, { status: 'spare', stockLocationId: theirKit.id }).expect(200);

    const res = await upload(
      office,
      target.wall.id,
      csvOf([
        `${tag}-HERE,1,1,A`,
        `${tag}-SIB,1,2,A`,
        `${tag}-SPARE,2,2,A`,
        `${tag}-BENCH,3,1,A`,
        `${tag}-THEIRS,3,2,A`,
        `${tag}-KIT,3,2,A`,
      ]),
    );
    expect(res.status).toBe(400);
    const messages = Object.fromEntries(
      (res.body.error.details.errors as { serial: string; message: string }[])
        .filter((e) => e.message.startsWith('duplicate serial'))
        .map((e) => [e.serial.slice(tag.length + 1), e.message]),
    );
    expect(messages).toEqual({
      HERE: 'duplicate serial: already registered on this wall at C2·R1',
      SIB: `duplicate serial: already registered on ${sibling.wall.name} (${org.site.name}) at C3·R2`,
      SPARE: `duplicate serial: already registered, a spare kept at ${warehouse.name}`,
      BENCH: 'duplicate serial: already registered, off any wall (at the bench)',
      THEIRS: 'duplicate serial: already registered elsewhere',
      KIT: 'duplicate serial: already registered elsewhere',
    });
    // Nothing of the other organisation leaks into the refusal.
    const body = JSON.stringify(res.body);
    for (const secret of [stranger.wall.name, stranger.site.name, stranger.client.name, theirKit.name]) expect(body).not.toContain(secret);
  });
});

describe('the batch filter matches a batch family', () => {
  it('finds every batch that starts with the code, in any case, and takes % and _ literally', async () => {
    const { client, wall } = await newWall(undefined, 4, 1);
    const family = unique('K7').toUpperCase();
    const batches = [`${family}-A`, `${family}-B`, `${family}_C`, `X${family}`];
    for (const [i, batch] of batches.entries()) {
      await office.post(`/api/walls/${wall.id}/cabinets`, { serial: unique('FAM'), column: i + 1, row: 1, batch }).expect(201);
    }
    const batchesOf = async (q: string) => {
      const res = await office.get(`/api/cabinets?clientId=${client.id}&batch=${encodeURIComponent(q)}`);
      expect(res.status).toBe(200);
      return (res.body.items as { batch: string }[]).map((c) => c.batch).sort();
    };
    expect(await batchesOf(family.toLowerCase())).toEqual([`${family}-A`, `${family}-B`, `${family}_C`]);
    expect(await batchesOf(`${family}-`)).toEqual([`${family}-A`, `${family}-B`]);
    expect(await batchesOf(`${family}-b`)).toEqual([`${family}-B`]);
    // "_" and "%" are characters of a code, not wildcards.
    expect(await batchesOf(`${family}_`)).toEqual([`${family}_C`]);
    expect(await batchesOf(`${family.slice(0, 3)}%A`)).toEqual([]);
  });

  it('is answered from the index on lower(batch), not by reading every cabinet', async () => {
    // With sequential scans priced out, the planner uses an index if one can serve the filter
    // exactly as the list writes it; without a fitting index it still has to read the table.
    const plan = await db().transaction(async (tx) => {
      await tx.execute(sql`set local enable_seqscan = off`);
      const { rows } = await tx.execute<{ 'QUERY PLAN': string }>(
        sql`explain select ${cabinets.id} from ${cabinets} where ${batchFamily('K7-24')}`,
      );
      return rows.map((r) => r['QUERY PLAN']).join('\n');
    });
    expect(plan).toContain('cabinets_batch_prefix_idx');
  });
});

// The factory model: 500 × 500 mm, 192 × 192 pixels (36,864 each), 200 W maximum.
const settings = {
  // 120 V × 20 A × 0.8 = 1,920 W a circuit (NEC 210.19(A)(1), 210.20(A): 80 % continuous load).
  supply: { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8, powerFactor: 1 },
  outputCapacityPixels: 650_000,
  chainCapacityW: 1920,
};
const rowOf = (r: number, columns: number) => Array.from({ length: columns }, (_, i) => ({ column: i + 1, row: r }));
const rowRuns = (columns: number, rows: number) => Array.from({ length: rows }, (_, i) => ({ index: i + 1, cells: rowOf(i + 1, columns) }));

describe('POST /api/walls/from-plan', () => {
  async function planBody(overrides: Record<string, unknown> = {}) {
    const { client, site } = await createOrganisation();
    const model = await createCabinetModel();
    // 4 × 200 W = 800 W a row: one chain each; 4 × 36,864 = 147,456 px a row: one output each.
    const body = {
      siteId: site.id,
      name: unique('Chapel wall'),
      cabinetModelId: model.id,
      columns: 4,
      rows: 3,
      mounting: 'flown',
      settings,
      dataRuns: { pattern: 'rows', runs: rowRuns(4, 3) },
      powerRuns: { pattern: 'rows', runs: rowRuns(4, 3) },
      ...overrides,
    };
    return { client, site, model, body };
  }

  it('refuses the signed out (401), a bad body naming the field (400), a technician (403) and a client user (404)', async () => {
    const { client, body } = await planBody();
    expect((await anonymous().post('/api/walls/from-plan').set('X-Requested-With', 'gridkeep').send(body)).status).toBe(401);
    const bad = await office.post('/api/walls/from-plan', { ...body, siteId: 'nope', columns: 0 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['columns', 'siteId']);
    expect((await tech.post('/api/walls/from-plan', body)).status).toBe(403);
    const clientUser = await signedIn('client', client.id);
    expect((await clientUser.post('/api/walls/from-plan', body)).status).toBe(404);
    expect(await db().select().from(walls).where(eq(walls.name, body.name))).toEqual([]);
  });

  it('creates the wall at the site with the plan’s model and grid, stores the settings and runs, and audits both', async () => {
    const { client, site, model, body } = await planBody();
    const res = await office.post('/api/walls/from-plan', body);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({
      name: body.name,
      clientId: client.id,
      siteId: site.id,
      columns: 4,
      rows: 3,
      mounting: 'flown',
      cabinetModel: { id: model.id },
      planSettings: settings,
    });
    expect(res.body.dataRuns).toMatchObject({ pattern: 'rows', limit: 650_000 });
    // 4 cabinets × 192 × 192 pixels = 147,456 a row; 4 × 200 W = 800 W a chain.
    expect(res.body.dataRuns.runs[0]).toEqual({ index: 1, cells: rowOf(1, 4), pixels: 147_456 });
    expect(res.body.powerRuns.runs[2]).toEqual({ index: 3, cells: rowOf(3, 4), watts: 800 });
    const read = await office.get(`/api/walls/${res.body.id}`);
    expect(read.body.powerRuns.runs).toHaveLength(3);
    const events = await db().select({ action: auditEvents.action }).from(auditEvents).where(eq(auditEvents.entityId, res.body.id));
    expect(events.map((e) => e.action).sort()).toEqual(['created', 'plan_saved']);
  });

  it('leaves no wall behind when the plan does not fit it (one transaction)', async () => {
    // Runs for a 4 × 2 grid on a 4 × 3 wall: row 3 is in no run.
    const { body } = await planBody({ dataRuns: { pattern: 'rows', runs: rowRuns(4, 2) } });
    const res = await office.post('/api/walls/from-plan', body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('runs_invalid');
    expect(await db().select().from(walls).where(eq(walls.name, body.name))).toEqual([]);
    const created = await db()
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entity, 'wall'), eq(auditEvents.action, 'created'), eq(auditEvents.actorId, office.user.id)));
    expect(created.every((e) => (e.after as { name?: string }).name !== body.name)).toBe(true);
  });

  it('refuses a name the site already has (409 on the name) and a supply that cannot feed the cabinet', async () => {
    const { site, body } = await planBody();
    await office.post('/api/walls/from-plan', body).expect(201);
    const again = await office.post('/api/walls/from-plan', { ...body, siteId: site.id });
    expect(again.status).toBe(409);
    expect(again.body.error.fields).toEqual({ name: 'Already in use.' });
    const model = await createCabinetModel({ inputVoltageMinV: 200, inputVoltageMaxV: 240 });
    const low = await office.post('/api/walls/from-plan', { ...body, name: unique('Low'), cabinetModelId: model.id });
    expect(low.status).toBe(400);
    expect(Object.keys(low.body.error.fields)).toEqual(['settings.supply.voltage']);
  });
});

describe('what a QR label prints and what its scan shows', () => {
  it('lists a wall’s cabinets each with its own model, and the serial’s page follows a move', async () => {
    const { wall, model } = await newWall(undefined, 3, 2);
    const other = await newWall(undefined, 2, 2);
    const serial = unique('LBL').toUpperCase();
    const placed = await office.post(`/api/walls/${wall.id}/cabinets`, { serial, column: 1, row: 1 });
    expect(placed.status).toBe(201);
    // A cabinet moved in from a wall of another model keeps its own model.
    const visitor = await office.post(`/api/walls/${other.wall.id}/cabinets`, { serial: unique('VIS'), column: 1, row: 1 });
    await tech.post(`/api/cabinets/${visitor.body.id}/move`, { wallId: wall.id, column: 2, row: 1 }).expect(200);
    const onWall = await office.get(`/api/cabinets?wallId=${wall.id}&limit=500`);
    expect(onWall.status).toBe(200);
    const models = Object.fromEntries((onWall.body.items as { serial: string; modelName: string }[]).map((c) => [c.serial, c.modelName]));
    expect(models).toEqual({ [serial]: model.name, [visitor.body.serial]: other.model.name });

    const before = await tech.get(`/api/cabinets/by-serial/${serial.toLowerCase()}`);
    expect(before.body).toMatchObject({ position: 'C1·R1', wall: { id: wall.id }, model: { name: model.name } });
    await tech.post(`/api/cabinets/${placed.body.id}/move`, { wallId: wall.id, column: 3, row: 2 }).expect(200);
    const after = await tech.get(`/api/cabinets/by-serial/${serial}`);
    expect(after.body).toMatchObject({ position: 'C3·R2', wall: { id: wall.id } });
  });
});
