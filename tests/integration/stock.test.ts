import { and, eq, like, sql } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { outboundMail } from '../../server/db/schema/mail.js';
import { parts, reorderPoints, stockBalances, stockLocations, stockMovements } from '../../server/db/schema/stock.js';
import { tickets } from '../../server/db/schema/tickets.js';
import { cabinets } from '../../server/db/schema/walls.js';
import { anonymous, createOrganisation, signedIn, type Session } from '../factories/index.js';

// The ledger: every change of stock is a movement, on hand is the movements' sum per part, batch
// and location, and it never goes below zero (PostgreSQL documentation ch. 13: a conditional
// UPDATE waits for a concurrent one and re-checks its condition).

const stamp = () => Math.random().toString(36).slice(2, 8);

async function createPart(cabinetModelId?: string) {
  const [part] = await db()
    .insert(parts)
    .values({ sku: `MOD-${stamp()}`, name: `Test module ${stamp()}`, kind: 'module', cabinetModelId: cabinetModelId ?? null })
    .returning();
  return part;
}

async function createLocation(values: Partial<typeof stockLocations.$inferInsert> & Pick<typeof stockLocations.$inferInsert, 'kind'>) {
  const [location] = await db()
    .insert(stockLocations)
    .values({ name: `${values.kind} ${stamp()}`, ...values })
    .returning();
  return location;
}

async function onHand(partId: string, locationId: string, batch = '') {
  const [row] = await db()
    .select({ quantity: stockBalances.quantity })
    .from(stockBalances)
    .where(and(eq(stockBalances.partId, partId), eq(stockBalances.locationId, locationId), eq(stockBalances.batch, batch)));
  return row?.quantity ?? 0;
}

/** On hand as the ledger adds it up: into the location minus out of it. */
async function ledgerSum(partId: string, locationId: string, batch = '') {
  const [row] = await db()
    .select({
      sum: sql<number>`coalesce(sum(case when ${stockMovements.toLocationId} = ${locationId} then ${stockMovements.quantity} else -${stockMovements.quantity} end), 0)::int`,
    })
    .from(stockMovements)
    .where(
      and(
        eq(stockMovements.partId, partId),
        eq(stockMovements.batch, batch),
        sql`(${stockMovements.toLocationId} = ${locationId} or ${stockMovements.fromLocationId} = ${locationId})`,
      ),
    );
  return row.sum;
}

let office: Session;
let tech: Session;
let otherTech: Session;
let warehouseId: string;
let vanId: string;
let otherVanId: string;

beforeAll(async () => {
  office = await signedIn('coordinator');
  tech = await signedIn('technician');
  otherTech = await signedIn('technician');
  warehouseId = (await createLocation({ kind: 'warehouse' })).id;
  vanId = (await createLocation({ kind: 'van', holderId: tech.user.id })).id;
  otherVanId = (await createLocation({ kind: 'van', holderId: otherTech.user.id })).id;
});

describe('POST /api/stock-movements: every kind', () => {
  it('receives, transfers, consumes, returns from a wall, sends to and gets back from the maker, and adjusts; the balances are the ledger sums', async () => {
    const part = await createPart();
    const move = (body: object) => office.post('/api/stock-movements', { partId: part.id, batch: 'B1', ...body });
    expect((await move({ kind: 'receipt', toLocationId: warehouseId, quantity: 20 })).status).toBe(201);
    const transfer = await move({ kind: 'transfer', fromLocationId: warehouseId, toLocationId: vanId, quantity: 6 });
    expect(transfer.status).toBe(201);
    expect(transfer.body).toMatchObject({
      kind: 'transfer',
      quantity: 6,
      batch: 'B1',
      from: { id: warehouseId },
      to: { id: vanId },
      batchMismatch: false,
    });
    expect((await move({ kind: 'consumption', fromLocationId: vanId, quantity: 2 })).status).toBe(201);
    expect((await move({ kind: 'return_from_wall', toLocationId: vanId, quantity: 1 })).status).toBe(201);
    expect((await move({ kind: 'sent_to_vendor', fromLocationId: warehouseId, quantity: 3 })).status).toBe(201);
    expect((await move({ kind: 'back_from_vendor', toLocationId: warehouseId, quantity: 2 })).status).toBe(201);
    expect((await move({ kind: 'adjustment', fromLocationId: warehouseId, quantity: 1, reason: 'Counted one short' })).status).toBe(201);
    expect((await move({ kind: 'adjustment', toLocationId: vanId, quantity: 1, reason: 'Found one behind the seat' })).status).toBe(201);

    // Warehouse: 20 − 6 − 3 + 2 − 1 = 12. Van: 6 − 2 + 1 + 1 = 6 (worked by hand).
    expect(await onHand(part.id, warehouseId, 'B1')).toBe(12);
    expect(await onHand(part.id, vanId, 'B1')).toBe(6);
    expect(await ledgerSum(part.id, warehouseId, 'B1')).toBe(12);
    expect(await ledgerSum(part.id, vanId, 'B1')).toBe(6);

    const listed = await tech.get(`/api/stock?partId=${part.id}`);
    expect(listed.status).toBe(200);
    expect(listed.body.items.map((b: { locationId: string; onHand: number }) => [b.locationId, b.onHand]).sort()).toEqual(
      [
        [warehouseId, 12],
        [vanId, 6],
      ].sort(),
    );
    const movements = await tech.get(`/api/stock-movements?partId=${part.id}&limit=3`);
    expect(movements.body.items.map((m: { kind: string }) => m.kind)).toEqual(['adjustment', 'adjustment', 'back_from_vendor']);
    const next = await tech.get(`/api/stock-movements?partId=${part.id}&limit=10&cursor=${movements.body.nextCursor}`);
    expect(next.body.items).toHaveLength(5);
  });

  it('refuses to take more than is on hand with 409 insufficient_stock, and writes nothing', async () => {
    const part = await createPart();
    await office.post('/api/stock-movements', { kind: 'receipt', partId: part.id, toLocationId: warehouseId, quantity: 2 }).expect(201);
    const res = await office.post('/api/stock-movements', {
      kind: 'consumption',
      partId: part.id,
      fromLocationId: warehouseId,
      quantity: 3,
    });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('insufficient_stock');
    expect(res.body.error.message).toContain('Only 2');
    expect(await onHand(part.id, warehouseId)).toBe(2);
    const other = await office.post('/api/stock-movements', {
      kind: 'consumption',
      partId: part.id,
      batch: 'NOPE',
      fromLocationId: warehouseId,
      quantity: 1,
    });
    expect(other.status).toBe(409);
  });

  it('answers 400 naming the field for a movement that names the wrong locations, or an adjustment without a reason', async () => {
    const part = await createPart();
    const receipt = await office.post('/api/stock-movements', {
      kind: 'receipt',
      partId: part.id,
      fromLocationId: warehouseId,
      quantity: 1,
    });
    expect(receipt.status).toBe(400);
    expect(Object.keys(receipt.body.error.fields).sort()).toEqual(['fromLocationId', 'toLocationId']);
    const adjust = await office.post('/api/stock-movements', {
      kind: 'adjustment',
      partId: part.id,
      toLocationId: warehouseId,
      quantity: 1,
    });
    expect(adjust.body.error.fields).toEqual({ reason: 'Say why the count is corrected.' });
    const same = await office.post('/api/stock-movements', {
      kind: 'transfer',
      partId: part.id,
      fromLocationId: vanId,
      toLocationId: vanId,
      quantity: 1,
    });
    expect(same.body.error.fields).toHaveProperty('toLocationId');
    const zero = await office.post('/api/stock-movements', { kind: 'receipt', partId: part.id, toLocationId: vanId, quantity: 0 });
    expect(zero.body.error.fields).toEqual({ quantity: 'At least one.' });
  });

  it('takes the last unit only once when many take it at the same moment: 100 consumptions of 1 from 10', async () => {
    const part = await createPart();
    await office.post('/api/stock-movements', { kind: 'receipt', partId: part.id, toLocationId: warehouseId, quantity: 10 }).expect(201);
    const answers = await Promise.all(
      Array.from({ length: 100 }, () =>
        office.post('/api/stock-movements', { kind: 'consumption', partId: part.id, fromLocationId: warehouseId, quantity: 1 }),
      ),
    );
    const statuses = answers.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(10);
    expect(statuses.filter((s) => s === 409)).toHaveLength(90);
    expect(answers.filter((r) => r.status === 409).every((r) => r.body.error.code === 'insufficient_stock')).toBe(true);
    expect(await onHand(part.id, warehouseId)).toBe(0);
    expect(await ledgerSum(part.id, warehouseId)).toBe(0);
  });
});

describe('who may move stock', () => {
  it('lets a technician take stock into their van and out of it, but not out of another van or between other places', async () => {
    const part = await createPart();
    await office.post('/api/stock-movements', { kind: 'receipt', partId: part.id, toLocationId: warehouseId, quantity: 10 }).expect(201);
    await office.post('/api/stock-movements', { kind: 'receipt', partId: part.id, toLocationId: otherVanId, quantity: 2 }).expect(201);
    const take = (body: object) => tech.post('/api/stock-movements', { partId: part.id, quantity: 1, ...body });
    expect((await take({ kind: 'transfer', fromLocationId: warehouseId, toLocationId: vanId })).status).toBe(201);
    expect((await take({ kind: 'consumption', fromLocationId: vanId })).status).toBe(201);
    const theirs = await take({ kind: 'consumption', fromLocationId: otherVanId });
    expect(theirs.status).toBe(403);
    expect(theirs.body.error.code).toBe('stock_not_yours');
    expect((await take({ kind: 'transfer', fromLocationId: warehouseId, toLocationId: otherVanId })).status).toBe(403);
    const adjust = await take({ kind: 'adjustment', toLocationId: vanId, reason: 'found one' });
    expect(adjust.status).toBe(403);
    expect(adjust.body.error.code).toBe('adjustment_office_only');
    expect(await onHand(part.id, otherVanId)).toBe(2);
  });

  it('lets a technician take from the site kit of a site they are working at (an open ticket assigned to them), and not from another', async () => {
    const { client, site } = await createOrganisation();
    const kit = await createLocation({ kind: 'site_kit', siteId: site.id, clientId: client.id });
    const part = await createPart();
    await office.post('/api/stock-movements', { kind: 'receipt', partId: part.id, toLocationId: kit.id, quantity: 3 }).expect(201);
    const fromKit = () => tech.post('/api/stock-movements', { kind: 'consumption', partId: part.id, fromLocationId: kit.id, quantity: 1 });
    expect((await fromKit()).status).toBe(403);
    await db().insert(tickets).values({
      clientId: client.id,
      siteId: site.id,
      title: 'Dead module',
      priority: 'high',
      status: 'scheduled',
      assigneeId: tech.user.id,
    });
    expect((await fromKit()).status).toBe(201);
    expect(await onHand(part.id, kit.id)).toBe(2);
  });

  it('shows client users their own site kits’ counts and nothing else; the ledger is staff only', async () => {
    const own = await createOrganisation();
    const other = await createOrganisation();
    const ownKit = await createLocation({ kind: 'site_kit', siteId: own.site.id, clientId: own.client.id });
    const otherKit = await createLocation({ kind: 'site_kit', siteId: other.site.id, clientId: other.client.id });
    const part = await createPart();
    for (const id of [ownKit.id, otherKit.id, warehouseId]) {
      await office.post('/api/stock-movements', { kind: 'receipt', partId: part.id, toLocationId: id, quantity: 4 }).expect(201);
    }
    const clientUser = await signedIn('client', own.client.id);
    const seen = await clientUser.get(`/api/stock?partId=${part.id}`);
    expect(seen.status).toBe(200);
    expect(seen.body.items.map((b: { locationId: string }) => b.locationId)).toEqual([ownKit.id]);
    expect(JSON.stringify(seen.body)).not.toMatch(/cost/i);
    const locations = await clientUser.get('/api/stock-locations');
    expect(locations.body.items.map((l: { id: string }) => l.id)).toEqual([ownKit.id]);
    // Staff-only routes answer a client user as if they did not exist (the product's rule).
    expect((await clientUser.get('/api/stock-movements')).status).toBe(404);
    expect((await clientUser.get('/api/parts')).status).toBe(404);
    const take = await clientUser.post('/api/stock-movements', {
      kind: 'consumption',
      partId: part.id,
      fromLocationId: ownKit.id,
      quantity: 1,
    });
    expect(take.status).toBe(404);
    expect(await onHand(part.id, ownKit.id)).toBe(4);
    expect((await anonymous().get('/api/stock')).status).toBe(401);
  });
});

describe('batch matching', () => {
  it('proposes the wall’s own batch first, and takes another batch only when the mismatch is accepted, recording it', async () => {
    const { wall } = await createOrganisation({ withWall: true });
    await db()
      .insert(cabinets)
      .values([
        { serial: `S-${stamp()}`, cabinetModelId: wall!.cabinetModelId, wallId: wall!.id, column: 1, row: 1, batch: 'H26-2401-A' },
        { serial: `S-${stamp()}`, cabinetModelId: wall!.cabinetModelId, wallId: wall!.id, column: 2, row: 1, batch: 'H26-2401-A' },
      ]);
    const part = await createPart(wall!.cabinetModelId);
    for (const batch of ['H26-2309-C', 'H26-2401-A']) {
      await office.post('/api/stock-movements', { kind: 'receipt', partId: part.id, batch, toLocationId: vanId, quantity: 2 }).expect(201);
    }
    const spares = await tech.get(`/api/walls/${wall!.id}/spares?locationId=${vanId}`);
    expect(spares.status).toBe(200);
    expect(spares.body.wallBatches).toEqual(['H26-2401-A']);
    expect(spares.body.items.map((s: { batch: string; matchesWallBatch: boolean }) => [s.batch, s.matchesWallBatch])).toEqual([
      ['H26-2401-A', true],
      ['H26-2309-C', false],
    ]);

    const take = (batch: string, accept?: boolean) =>
      tech.post('/api/stock-movements', {
        kind: 'consumption',
        partId: part.id,
        batch,
        fromLocationId: vanId,
        quantity: 1,
        forWallId: wall!.id,
        acceptBatchMismatch: accept,
      });
    const refused = await take('H26-2309-C');
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('batch_mismatch');
    expect(refused.body.error.details).toEqual({ wallBatches: ['H26-2401-A'] });
    expect(await onHand(part.id, vanId, 'H26-2309-C')).toBe(2);
    const accepted = await take('H26-2309-C', true);
    expect(accepted.status).toBe(201);
    expect(accepted.body).toMatchObject({ batchMismatch: true, wallId: wall!.id });
    const matching = await take('h26-2401-a'.toUpperCase());
    expect(matching.body.batchMismatch).toBe(false);
  });
});

describe('reorder points', () => {
  it('mails the office once when a location falls to its reorder point, and again only after it was restocked above it', async () => {
    const part = await createPart();
    await db().insert(reorderPoints).values({ partId: part.id, locationId: vanId, minQuantity: 2, reorderQuantity: 5 });
    const move = (body: object) => office.post('/api/stock-movements', { partId: part.id, quantity: 1, ...body }).expect(201);
    await move({ kind: 'receipt', toLocationId: vanId, quantity: 4 });
    const mails = () =>
      db()
        .select()
        .from(outboundMail)
        .where(like(outboundMail.dedupeKey, `low-stock:${part.id}:%`));
    await move({ kind: 'consumption', fromLocationId: vanId }); // 3 left: above the mark
    expect(await mails()).toHaveLength(0);
    await move({ kind: 'consumption', fromLocationId: vanId }); // 2 left: at the mark
    const first = await mails();
    expect(first).toHaveLength(1);
    expect(first[0].subject).toContain('(2 left)');
    await move({ kind: 'consumption', fromLocationId: vanId }); // 1 left: still low, no second mail
    expect(await mails()).toHaveLength(1);
    const low = await office.get('/api/stock/low');
    expect(low.body.items.find((i: { partId: string }) => i.partId === part.id)).toMatchObject({
      onHand: 1,
      reorderAt: 2,
      reorderQuantity: 5,
    });
    await move({ kind: 'receipt', toLocationId: vanId, quantity: 5 }); // 6: re-armed
    await move({ kind: 'consumption', fromLocationId: vanId, quantity: 4 }); // 2 again
    expect(await mails()).toHaveLength(2);
  });
});

describe('parts, locations and reorder points', () => {
  it('lets the office add and archive a part, a van and a site kit, and set a reorder point; a technician may not', async () => {
    const sku = `fan-${stamp()}`;
    const created = await office.post('/api/parts', { sku, name: 'Cabinet fan 60 mm', kind: 'fan', leadTimeDays: 14 });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body).toMatchObject({ sku: sku.toUpperCase(), kind: 'fan', leadTimeDays: 14, archived: false });
    expect((await office.post('/api/parts', { sku, name: 'Again', kind: 'fan' })).body.error.code).toBe('sku_taken');
    expect((await tech.post('/api/parts', { sku: `x-${stamp()}`, name: 'No', kind: 'fan' })).status).toBe(403);

    const van = await office.post('/api/stock-locations', { name: `Van ${stamp()}`, kind: 'van', holderId: otherTech.user.id });
    expect(van.status).toBe(201);
    expect(van.body).toMatchObject({ kind: 'van', holder: { id: otherTech.user.id } });
    const noHolder = await office.post('/api/stock-locations', { name: `Van ${stamp()}`, kind: 'van' });
    expect(noHolder.body.error.fields).toEqual({ holderId: 'A van is held by a technician.' });
    const { site } = await createOrganisation();
    const kit = await office.post('/api/stock-locations', { name: `Kit ${stamp()}`, kind: 'site_kit', siteId: site.id });
    expect(kit.body).toMatchObject({ kind: 'site_kit', site: { id: site.id } });

    const point = await office.put('/api/reorder-points', {
      partId: created.body.id,
      locationId: van.body.id,
      minQuantity: 1,
      reorderQuantity: 4,
    });
    expect(point.status).toBe(200);
    const [stored] = await db()
      .select()
      .from(reorderPoints)
      .where(and(eq(reorderPoints.partId, created.body.id), eq(reorderPoints.locationId, van.body.id)));
    expect(stored).toMatchObject({ minQuantity: 1, reorderQuantity: 4 });
    expect(
      (await tech.put('/api/reorder-points', { partId: created.body.id, locationId: van.body.id, minQuantity: 1, reorderQuantity: 4 }))
        .status,
    ).toBe(403);

    const archived = await office.patch(`/api/parts/${created.body.id}`, { archived: true });
    expect(archived.body.archived).toBe(true);
    const listed = await office.get(`/api/parts?q=${encodeURIComponent('Cabinet fan 60 mm')}`);
    expect(listed.body.items.map((p: { id: string }) => p.id)).not.toContain(created.body.id);
    const gone = await office.patch(`/api/stock-locations/${kit.body.id}`, { archived: true });
    expect(gone.body.archived).toBe(true);
  });
});

describe('spare cabinets in the stock views', () => {
  it('counts whole spare cabinets by model, batch and location; a client user sees those in their own site kit only', async () => {
    const own = await createOrganisation({ withWall: true });
    const kit = await createLocation({ kind: 'site_kit', siteId: own.site.id, clientId: own.client.id });
    const modelId = own.wall!.cabinetModelId;
    const serials = [`SP-${stamp()}`, `SP-${stamp()}`, `SP-${stamp()}`];
    await db()
      .insert(cabinets)
      .values([
        { serial: serials[0], cabinetModelId: modelId, status: 'spare', stockLocationId: kit.id, batch: 'K1' },
        { serial: serials[1], cabinetModelId: modelId, status: 'spare', stockLocationId: kit.id, batch: 'K1' },
        { serial: serials[2], cabinetModelId: modelId, status: 'spare', stockLocationId: warehouseId, batch: 'K1' },
      ]);
    const all = await office.get('/api/stock/spare-cabinets');
    const mine = all.body.items.filter((g: { cabinetModel: { id: string } }) => g.cabinetModel.id === modelId);
    expect(mine.map((g: { location: { id: string }; count: number; batch: string }) => [g.location.id, g.count, g.batch]).sort()).toEqual(
      [
        [kit.id, 2, 'K1'],
        [warehouseId, 1, 'K1'],
      ].sort(),
    );
    const clientUser = await signedIn('client', own.client.id);
    const seen = await clientUser.get('/api/stock/spare-cabinets');
    expect(seen.body.items.map((g: { location: { id: string } }) => g.location.id)).toEqual([kit.id]);
    expect(seen.body.items[0].cabinets.map((c: { serial: string }) => c.serial).sort()).toEqual(serials.slice(0, 2).sort());
  });
});

describe('GET /api/stock: sorting and pages', () => {
  it('sorts by part, location or quantity on hand either way, page by page with the keyset cursor', async () => {
    const location = await createLocation({ kind: 'warehouse' });
    const a = await createPart();
    const b = await createPart();
    for (const [part, batch, quantity] of [
      [a, 'A1', 5],
      [a, 'A2', 1],
      [b, 'B1', 3],
    ] as const) {
      await office
        .post('/api/stock-movements', { kind: 'receipt', partId: part.id, batch, toLocationId: location.id, quantity })
        .expect(201);
    }
    const walk = async (query: string) => {
      const seen: number[] = [];
      let cursor: string | null = null;
      do {
        const page: { body: { items: { onHand: number }[]; nextCursor: string | null } } = await office.get(
          `/api/stock?locationId=${location.id}&limit=2&${query}${cursor ? `&cursor=${cursor}` : ''}`,
        );
        seen.push(...page.body.items.map((i) => i.onHand));
        cursor = page.body.nextCursor;
      } while (cursor);
      return seen;
    };
    expect(await walk('sort=onHand&dir=desc')).toEqual([5, 3, 1]);
    expect(await walk('sort=onHand&dir=asc')).toEqual([1, 3, 5]);
    // By part: part a's two batches together (A1, A2), part b's after or before them by name.
    const byPart = await walk('sort=part');
    expect(byPart.length).toBe(3);
    expect(byPart.indexOf(5)).toBe(byPart.indexOf(1) - 1);
    expect((await office.get('/api/stock?sort=weight')).status).toBe(400);
  });
});
