import referenceCdf from '@stdlib/stats-base-dists-poisson-cdf';
import { and, eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { parts, stockBalances, stockLocations, stockMovements } from '../../server/db/schema/stock.js';
import { repairs } from '../../server/db/schema/visits.js';
import { cabinets, walls } from '../../server/db/schema/walls.js';
import { restockList } from '../../server/services/restock.js';
import { createOrganisation, signedIn, type Session } from '../factories/index.js';

const stamp = () => Math.random().toString(36).slice(2, 8);
let office: Session;
let tech: Session;
let warehouseId: string;

beforeAll(async () => {
  office = await signedIn('coordinator');
  tech = await signedIn('technician');
  [{ id: warehouseId }] = await db()
    .insert(stockLocations)
    .values({ name: `Warehouse ${stamp()}`, kind: 'warehouse' })
    .returning();
});

async function onHand(partId: string, locationId: string, batch = '') {
  const [row] = await db()
    .select({ q: stockBalances.quantity })
    .from(stockBalances)
    .where(and(eq(stockBalances.partId, partId), eq(stockBalances.locationId, locationId), eq(stockBalances.batch, batch)));
  return row?.q ?? 0;
}

describe('vendor returns', () => {
  it('sends a failed part back from a shelf, and puts the repaired one back once, each as a ledger movement', async () => {
    const [part] = await db()
      .insert(parts)
      .values({ sku: `PSU-${stamp()}`, name: 'Power supply', kind: 'power_supply' })
      .returning();
    await office.post('/api/stock-movements', { kind: 'receipt', partId: part.id, toLocationId: warehouseId, quantity: 2 }).expect(201);
    const opened = await office.post('/api/vendor-returns', {
      partId: part.id,
      serial: 'PSU-000123',
      fault: 'No output on the 5 V rail',
      fromLocationId: warehouseId,
      rmaReference: 'RMA-55120',
      sentOn: '2026-11-02',
      expectedBackOn: '2026-11-30',
    });
    expect(opened.status, JSON.stringify(opened.body)).toBe(201);
    expect(opened.body).toMatchObject({ outcome: 'pending', serial: 'PSU-000123', from: { id: warehouseId }, rmaReference: 'RMA-55120' });
    expect(await onHand(part.id, warehouseId)).toBe(1);
    const sent = await db().select().from(stockMovements).where(eq(stockMovements.vendorReturnId, opened.body.id));
    expect(sent.map((m) => [m.kind, m.quantity])).toEqual([['sent_to_vendor', 1]]);

    const back = await office.patch(`/api/vendor-returns/${opened.body.id}`, { outcome: 'repaired', backToLocationId: warehouseId });
    expect(back.status).toBe(200);
    expect(back.body).toMatchObject({ outcome: 'repaired', backTo: { id: warehouseId }, overdue: false });
    expect(back.body.backInStockOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(await onHand(part.id, warehouseId)).toBe(2);
    await office.patch(`/api/vendor-returns/${opened.body.id}`, { outcome: 'repaired', backToLocationId: warehouseId }).expect(200);
    expect(await onHand(part.id, warehouseId)).toBe(2);
  });

  it('flags a pending return past its expected date, and refuses a refused part back into stock', async () => {
    const [part] = await db()
      .insert(parts)
      .values({ sku: `RC-${stamp()}`, name: 'Receiving card', kind: 'receiving_card' })
      .returning();
    const late = await office.post('/api/vendor-returns', {
      partId: part.id,
      fault: 'Flickers',
      expectedBackOn: '2020-01-31',
      sentOn: '2020-01-02',
    });
    expect(late.body.overdue).toBe(true);
    const overdue = await tech.get('/api/vendor-returns?overdue=true');
    expect(overdue.body.items.map((r: { id: string }) => r.id)).toContain(late.body.id);
    const refused = await office.patch(`/api/vendor-returns/${late.body.id}`, { outcome: 'refused', backToLocationId: warehouseId });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields).toHaveProperty('backToLocationId');
    const order = await office.post('/api/vendor-returns', {
      partId: part.id,
      fault: 'x',
      sentOn: '2026-05-02',
      expectedBackOn: '2026-05-01',
    });
    expect(order.body.error.fields).toHaveProperty('expectedBackOn');
  });

  it('is the office’s to record: a technician reads them but may not open one; a client user gets 404', async () => {
    const [part] = await db()
      .insert(parts)
      .values({ sku: `FAN-${stamp()}`, name: 'Fan', kind: 'fan' })
      .returning();
    expect((await tech.post('/api/vendor-returns', { partId: part.id, fault: 'Noisy' })).status).toBe(403);
    const { client } = await createOrganisation();
    const clientUser = await signedIn('client', client.id);
    expect((await clientUser.get('/api/vendor-returns')).status).toBe(404);
  });
});

describe('the restock list (spares forecast per wall)', () => {
  it('forecasts a wall’s own failure rate over one lead time at 95 % and counts only its own batches in the site kit', async () => {
    const { client, site, wall } = await createOrganisation({ withWall: true });
    await db().update(walls).set({ installDate: '2024-01-01' }).where(eq(walls.id, wall!.id));
    // 72 cabinets of 2 × 2 modules = 288 modules, all of batch B1.
    await db()
      .insert(cabinets)
      .values(
        Array.from({ length: 72 }, (_, i) => ({
          serial: `R-${stamp()}-${i}`,
          cabinetModelId: wall!.cabinetModelId,
          wallId: wall!.id,
          column: (i % 12) + 1,
          row: Math.floor(i / 12) + 1,
          batch: 'B1',
        })),
      );
    // Seven module replacements (and a reseat, which is no failure of a module).
    await db()
      .insert(repairs)
      .values([
        ...Array.from({ length: 7 }, (_, i) => ({
          clientId: client.id,
          wallId: wall!.id,
          column: i + 1,
          row: 1,
          component: 'module' as const,
          fault: 'dead_module' as const,
          action: 'replaced' as const,
        })),
        {
          clientId: client.id,
          wallId: wall!.id,
          column: 1,
          row: 2,
          component: 'module' as const,
          fault: 'flicker' as const,
          action: 'reseated' as const,
        },
      ]);
    const [part] = await db()
      .insert(parts)
      .values({ sku: `MOD-${stamp()}`, name: 'Module', kind: 'module', cabinetModelId: wall!.cabinetModelId, leadTimeDays: 30 })
      .returning();
    const [kit] = await db()
      .insert(stockLocations)
      .values({ name: `Kit ${stamp()}`, kind: 'site_kit', siteId: site.id, clientId: client.id })
      .returning();
    await office
      .post('/api/stock-movements', { kind: 'receipt', partId: part.id, batch: 'B7', toLocationId: kit.id, quantity: 3 })
      .expect(201);

    // Exactly 24 mean months (24 × 365.2425 ÷ 12 days) after the install: 288 × 24 = 6,912 module-months.
    const now = new Date(Date.UTC(2024, 0, 1) + 24 * (365.2425 / 12) * 86_400_000);
    const line = (await restockList(0.95, now)).items.find((l) => l.wallId === wall!.id)!;
    expect(line).toMatchObject({ rateBasis: 'wall', modules: 288, failures: 7, kit: { id: kit.id }, part: { id: part.id }, onHand: 0 });
    expect(line.exposureModuleMonths).toBeCloseTo(6912, 6);
    // 7 ÷ 6,912 × 1,000 = 1.0127 failures per 1,000 module-months.
    expect(line.failuresPerThousandModuleMonths).toBeCloseTo(1.0127, 4);
    // λ = 288 × 7/6,912 × 30/30.436875 = 0.28748.
    const lambda = 288 * (7 / 6912) * (30 / (365.2425 / 12));
    expect(line.expectedFailures).toBeCloseTo(lambda, 9);
    // Checked against @stdlib/stats-base-dists-poisson-cdf: P(≤0) = 0.750 < 0.95 ≤ P(≤1) = 0.966, so one spare.
    expect(referenceCdf(0, lambda)).toBeLessThan(0.95);
    expect(referenceCdf(1, lambda)).toBeGreaterThanOrEqual(0.95);
    expect(line.recommended).toBe(1);
    expect(line.toSend).toBe(1);

    // A module of the wall's own batch in the kit (written in another case) covers it.
    await office
      .post('/api/stock-movements', { kind: 'receipt', partId: part.id, batch: 'b1', toLocationId: kit.id, quantity: 1 })
      .expect(201);
    const after = (await restockList(0.95, now)).items.find((l) => l.wallId === wall!.id)!;
    expect([after.onHand, after.toSend]).toEqual([1, 0]);

    // At 99.9 % the same rate asks for more: the smallest s with P(≤ s) ≥ 0.999.
    const strict = (await restockList(0.999, now)).items.find((l) => l.wallId === wall!.id)!;
    let s = 0;
    while (referenceCdf(s, lambda) < 0.999) s++;
    expect(strict.recommended).toBe(s);

    const api = await office.get('/api/stock/restock?serviceLevel=0.95');
    expect(api.status).toBe(200);
    expect(api.body.items.some((l: { wallId: string }) => l.wallId === wall!.id)).toBe(true);
    expect((await office.get('/api/stock/restock?serviceLevel=1')).status).toBe(400);
  });

  it('uses the cabinet model’s rate for a wall too new to have its own', async () => {
    const { wall } = await createOrganisation({ withWall: true });
    await db().update(walls).set({ installDate: '2026-11-01' }).where(eq(walls.id, wall!.id));
    const line = (await restockList(0.95, new Date('2026-12-05T00:00:00Z'))).items.find((l) => l.wallId === wall!.id)!;
    expect(line.rateBasis).toBe('model');
    expect(line.kit).toBeNull();
  });
});
