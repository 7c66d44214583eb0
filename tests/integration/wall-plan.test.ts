import { and, eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { generateRuns } from '../../shared/calc/runs.js';
import { db } from '../../server/db/client.js';
import { auditEvents } from '../../server/db/schema/accounts.js';
import { walls } from '../../server/db/schema/walls.js';
import { anonymous, createOrganisation, signedIn, type Session } from '../factories/index.js';

// The factory wall: 12 × 6 cabinets of 500 × 500 mm, 192 × 192 pixels (36,864 each), 200 W maximum.
const settings = {
  // 120 V × 20 A × 0.8 = 1,920 W a circuit (NEC 210.19(A)(1), 210.20(A): 80 % continuous load).
  supply: { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8, powerFactor: 1 },
  outputCapacityPixels: 650_000,
  chainCapacityW: 1920,
};
// 650,000 ÷ 36,864 = 17.6 → 17 whole cabinets per output; 1,920 ÷ 200 = 9.6 → 9 per chain.
const row = (r: number, from = 1, to = 12) => Array.from({ length: to - from + 1 }, (_, i) => ({ column: from + i, row: r }));
const rowRuns = () => Array.from({ length: 6 }, (_, i) => ({ index: i + 1, cells: row(i + 1) }));

let office: Session;
let tech: Session;
beforeAll(async () => {
  office = await signedIn('coordinator');
  tech = await signedIn('technician');
});

async function wallOf(model?: NonNullable<Parameters<typeof createOrganisation>[0]>['model']) {
  const org = await createOrganisation({ withWall: true, model });
  return { ...org, wall: org.wall! };
}

describe('PUT /api/walls/:id/plan', () => {
  it('saves settings and runs with their loads and limits, returns them on the wall, and audits', async () => {
    const { wall } = await wallOf();
    // Power by rows does not fit (12 × 200 W = 2,400 W > 1,920 W), so each row takes two chains.
    const powerRuns = generateRuns(12, 6, 'rows', { kind: 'power', cabinetMaxPowerW: 200, chainCapacityW: 1920 });
    const res = await office.put(`/api/walls/${wall.id}/plan`, {
      settings,
      dataRuns: { pattern: 'rows', runs: rowRuns() },
      powerRuns: { pattern: 'rows', runs: powerRuns.map(({ index, cells }) => ({ index, cells })) },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.planSettings).toEqual(settings);
    expect(res.body.dataRuns.pattern).toBe('rows');
    expect(res.body.dataRuns.limit).toBe(650_000);
    expect(res.body.dataRuns.runs).toHaveLength(6);
    // 12 cabinets × 192 × 192 pixels = 442,368 per row.
    expect(res.body.dataRuns.runs[0]).toEqual({ index: 1, cells: row(1), pixels: 442_368 });
    expect(res.body.powerRuns.limit).toBe(1920);
    expect(res.body.powerRuns.runs).toHaveLength(12);
    // Six cabinets × 200 W on each half row.
    expect(res.body.powerRuns.runs[0]).toEqual({ index: 1, cells: row(1, 1, 6), watts: 1200 });

    const read = await tech.get(`/api/walls/${wall.id}`);
    expect(read.body.dataRuns.runs[5].cells).toEqual(row(6));
    const [stored] = await db().select().from(walls).where(eq(walls.id, wall.id));
    expect(stored.planSettings?.chainCapacityW).toBe(1920);

    const events = await db()
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entityId, wall.id), eq(auditEvents.action, 'plan_saved')));
    expect(events).toHaveLength(1);
    expect((events[0].after as { dataRuns: { runs: unknown[] } }).dataRuns.runs).toHaveLength(6);
    expect(events[0].actorId).toBe(office.user.id);
  });

  it('keeps runs left out of the request, and clears runs sent as null', async () => {
    const { wall } = await wallOf();
    await office.put(`/api/walls/${wall.id}/plan`, { settings, dataRuns: { pattern: 'rows', runs: rowRuns() } }).expect(200);
    // A chain capacity of the crew's own, below the circuit's 1,920 W, is kept.
    const kept = await office.put(`/api/walls/${wall.id}/plan`, { settings: { ...settings, chainCapacityW: 1800 } });
    expect(kept.status).toBe(200);
    expect(kept.body.dataRuns.runs).toHaveLength(6);
    expect(kept.body.planSettings.chainCapacityW).toBe(1800);
    const cleared = await office.put(`/api/walls/${wall.id}/plan`, { settings, dataRuns: null });
    expect(cleared.status).toBe(200);
    expect(cleared.body.dataRuns).toBeNull();
  });

  it('refuses a run over the output limit, naming it', async () => {
    const { wall } = await wallOf();
    // Rows 1 and 2 joined into one run: 24 cabinets × 36,864 = 884,736 pixels > 650,000.
    const runs = [
      { index: 1, cells: [...row(1), ...row(2).reverse()] },
      ...rowRuns()
        .slice(2)
        .map((r, i) => ({ ...r, index: i + 2 })),
    ];
    const res = await office.put(`/api/walls/${wall.id}/plan`, { settings, dataRuns: { pattern: 'custom', runs } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('runs_invalid');
    expect(res.body.error.details.problems).toEqual([
      { kind: 'data', run: 1, message: 'Run 1 carries 884,736 pixels, over the output capacity of 650,000.' },
    ]);
  });

  it('refuses a power run over the chain limit', async () => {
    const { wall } = await wallOf();
    // A whole row on one chain: 12 × 200 W = 2,400 W > 1,920 W.
    const res = await office.put(`/api/walls/${wall.id}/plan`, { settings, powerRuns: { pattern: 'rows', runs: rowRuns() } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('runs_invalid');
    const messages = res.body.error.details.problems.map((p: { message: string }) => p.message);
    expect(messages).toHaveLength(6);
    expect(messages[0]).toBe('Run 1 draws 2,400 W, over the chain capacity of 1,920 W.');
    expect(res.body.error.details.problems.every((p: { kind: string }) => p.kind === 'power')).toBe(true);
  });

  it('refuses a missing cell and non-adjacent cells, naming each', async () => {
    const { wall } = await wallOf();
    const runs = rowRuns();
    // Run 1 skips C5·R1 (C4 → C6 are not neighbours), so C5·R1 is in no run.
    runs[0] = { index: 1, cells: row(1).filter((c) => c.column !== 5) };
    const res = await office.put(`/api/walls/${wall.id}/plan`, { settings, dataRuns: { pattern: 'custom', runs } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('runs_invalid');
    expect(res.body.error.details.problems).toEqual([
      { kind: 'data', run: 1, cell: { column: 6, row: 1 }, message: 'Run 1: C6·R1 is not next to C4·R1, the cell before it.' },
      { kind: 'data', cell: { column: 5, row: 1 }, message: 'C5·R1 is in no run.' },
    ]);
  });

  it('refuses cells outside the grid and stored runs that no longer fit new settings', async () => {
    const { wall } = await wallOf();
    const outside = rowRuns();
    outside[0] = { index: 1, cells: [...row(1), { column: 13, row: 1 }] };
    const res = await office.put(`/api/walls/${wall.id}/plan`, { settings, dataRuns: { pattern: 'custom', runs: outside } });
    expect(res.status).toBe(400);
    expect(res.body.error.details.problems[0].message).toBe('Run 1: C13·R1 is outside the 12 × 6 grid.');

    await office.put(`/api/walls/${wall.id}/plan`, { settings, dataRuns: { pattern: 'rows', runs: rowRuns() } }).expect(200);
    // 400,000 pixels per output holds 10 cabinets (400,000 ÷ 36,864 = 10.85): a 12-cabinet row no longer fits.
    const tighter = await office.put(`/api/walls/${wall.id}/plan`, { settings: { ...settings, outputCapacityPixels: 400_000 } });
    expect(tighter.status).toBe(400);
    expect(tighter.body.error.details.problems).toHaveLength(6);
  });

  it('names the field when one cabinet is over a capacity, and checks the body', async () => {
    const { wall } = await wallOf();
    const res = await office.put(`/api/walls/${wall.id}/plan`, { settings: { ...settings, chainCapacityW: 150 } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields).toEqual({ 'settings.chainCapacityW': 'One cabinet (200 W) is over the chain capacity.' });
    const bad = await office.put(`/api/walls/${wall.id}/plan`, { settings: { ...settings, supply: { ...settings.supply, phases: 2 } } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty(['settings.supply.phases']);
    const pattern = await office.put(`/api/walls/${wall.id}/plan`, { settings, dataRuns: { pattern: 'zigzag', runs: [] } });
    expect(pattern.status).toBe(400);
    expect(pattern.body.error.fields).toHaveProperty(['dataRuns.pattern']);
  });

  it('refuses a chain capacity over what one branch circuit may carry: the three-phase feeder figure is never a chain’s', async () => {
    const { wall } = await wallOf();
    // 208 V three-phase, 20 A: a chain is one 208 V line-to-line circuit, 208 × 20 × 0.8 = 3,328 W;
    // √3 × 208 × 20 × 0.8 = 5,764 W is the feeder's figure, which the old plan gave one chain.
    const supply = { voltage: 208, phases: 3, breakerAmps: 20, continuousFactor: 0.8, powerFactor: 1 };
    const res = await office.put(`/api/walls/${wall.id}/plan`, { settings: { ...settings, supply, chainCapacityW: 5764 } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      'settings.chainCapacityW': 'A chain on this supply may carry at most 3,328 W, set by its circuit.',
    });
    // Left out, the chain capacity is the chain's limit.
    const ok = await office.put(`/api/walls/${wall.id}/plan`, { settings: { supply, outputCapacityPixels: 650_000 } });
    expect(ok.status).toBe(200);
    expect(ok.body.planSettings.chainCapacityW).toBeCloseTo(3328, 9);
  });

  it('holds a chain to the cabinet model’s connector and maker’s count', async () => {
    // A 10 A connector passes 120 V × 10 A = 1,200 W (6 cabinets of 200 W), under the circuit's 1,920 W.
    const { wall } = await wallOf({ passThroughAmps: 10 });
    const res = await office.put(`/api/walls/${wall.id}/plan`, { settings: { ...settings, chainCapacityW: undefined } });
    expect(res.status).toBe(200);
    expect(res.body.planSettings.chainCapacityW).toBeCloseTo(1200, 9);
    expect((await office.put(`/api/walls/${wall.id}/plan`, { settings })).body.error.fields).toEqual({
      'settings.chainCapacityW': "A chain on this supply may carry at most 1,200 W, set by the cabinet's power connector.",
    });
    // Seven cabinets on one chain are over the connector: refused, naming the run.
    const seven = [
      { index: 1, cells: row(1, 1, 7) },
      { index: 2, cells: row(1, 8, 12) },
      ...rowRuns()
        .slice(1)
        .flatMap((r) => [
          { index: 0, cells: r.cells.slice(0, 6) },
          { index: 0, cells: r.cells.slice(6) },
        ]),
    ].map((r, i) => ({ ...r, index: i + 1 }));
    const over = await office.put(`/api/walls/${wall.id}/plan`, {
      settings: { ...settings, chainCapacityW: undefined },
      powerRuns: { pattern: 'custom', runs: seven },
    });
    expect(over.status).toBe(400);
    expect(over.body.error.details.problems).toEqual([
      { kind: 'power', run: 1, message: 'Run 1 draws 1,400 W, over the chain capacity of 1,200 W.' },
    ]);
    const maker = await wallOf({ maxPerChain: 4 });
    const limited = await office.put(`/api/walls/${maker.wall.id}/plan`, { settings: { ...settings, chainCapacityW: undefined } });
    expect(limited.body.planSettings.chainCapacityW).toBe(800);
  });

  it('refuses a supply outside the cabinet’s input range, naming the voltage and the remedy', async () => {
    const { wall } = await wallOf();
    const res = await office.put(`/api/walls/${wall.id}/plan`, { settings: { ...settings, supply: { ...settings.supply, voltage: 480 } } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['settings.supply.voltage']).toMatch(
      /^480 V is outside the cabinet's 100 V–240 V input range.*step-down transformer\.$/,
    );
  });

  it('is the office’s: anonymous 401, technician 403, client users 404 (their own wall and another organisation’s)', async () => {
    const { wall, client } = await wallOf();
    const body = { settings, dataRuns: { pattern: 'rows', runs: rowRuns() } };
    const anon = await anonymous().put(`/api/walls/${wall.id}/plan`).set('X-Requested-With', 'gridkeep').send(body);
    expect(anon.status).toBe(401);
    expect((await tech.put(`/api/walls/${wall.id}/plan`, body)).status).toBe(403);
    const other = await createOrganisation();
    const outsider = await signedIn('client', other.client.id);
    const res = await outsider.put(`/api/walls/${wall.id}/plan`, body);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    const own = await signedIn('client', client.id);
    expect((await own.put(`/api/walls/${wall.id}/plan`, body)).status).toBe(404);
    // Nothing was stored by any of them.
    const [stored] = await db().select().from(walls).where(eq(walls.id, wall.id));
    expect(stored.dataRuns).toBeNull();
    // Without the CSRF header the write is refused before anything else.
    expect((await office.agent.put(`/api/walls/${wall.id}/plan`).send(body)).status).toBe(403);
  });

  it('answers 404 for a wall that does not exist', async () => {
    const res = await office.put('/api/walls/00000000-0000-4000-8000-000000000000/plan', { settings });
    expect(res.status).toBe(404);
  });
});
