import { beforeAll, describe, expect, it } from 'vitest';
import { anonymous, createOrganisation, signedIn, type Session } from '../factories/index.js';

// The invented 500 mm cabinet of the unit tests: 192 × 192 pixels, 150 W maximum, 8 kg.
const cabinet = { widthMm: 500, heightMm: 500, pixelsWide: 192, pixelsHigh: 192, maxPowerW: 150, typicalPowerW: 50, weightKg: 8 };
const wallPlan = { cabinet, columns: 12, rows: 6, supply: { voltage: 120, phases: 1, breakerAmps: 20 } };

let tech: Session;
let clientUser: Session;
beforeAll(async () => {
  tech = await signedIn('technician');
  const { client } = await createOrganisation();
  clientUser = await signedIn('client', client.id);
});

describe('/api/calc without a session', () => {
  it('answers 401 on every calculator', async () => {
    for (const path of ['wall-plan', 'runs', 'runs/validate', 'spares', 'due']) {
      const res = await anonymous().post(`/api/calc/${path}`).set('X-Requested-With', 'gridkeep').send({});
      expect(res.status, path).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
    }
  });
});

describe('POST /api/calc/wall-plan', () => {
  it('plans the 12 × 6 wall of 500 mm cabinets: 72 cabinets, about 20 ft × 10 ft (common practice)', async () => {
    const res = await tech.post('/api/calc/wall-plan', wallPlan);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      cabinetCount: 72,
      widthMm: 6000,
      heightMm: 3000,
      widthFeetInches: `19' 8-1/4"`,
      pixelsWide: 2304,
      pixelsHigh: 1152,
      totalPixels: 2_654_208,
      aspectRatio: 2,
      maxPowerW: 10_800,
      typicalPowerW: 3_600,
      cabinetsPerCircuit: 12,
      circuitsNeeded: 6,
      weightKg: 576,
      outputsNeeded: 5,
      inputFit: { scaledWidth: 2048, scaledHeight: 1152, bars: 'left-right' },
    });
    // 1 ft = 0.3048 m (NIST Handbook 44, Appendix C).
    expect(res.body.widthFt).toBeCloseTo(19.685, 3);
    // Defaults: continuous factor 0.8 → 120 V × 20 A × 0.8 = 1,920 W (NEC 210.19(A)(1), 210.20(A)).
    expect(res.body.circuitCapacityW).toBeCloseTo(1920, 6);
    expect(res.body.maxCurrentA).toBeCloseTo(90, 6);
    // 1 W = 3.412142 BTU/h (NIST SP 811).
    expect(res.body.heatBtuPerHour).toBeCloseTo(36_851.13, 2);
    // 1 lb = 0.45359237 kg (NIST Handbook 44, Appendix C).
    expect(res.body.weightLb).toBeCloseTo(1269.86, 2);
  });

  it('is open to client users too (a pure calculation, no records)', async () => {
    const res = await clientUser.post('/api/calc/wall-plan', { ...wallPlan, input: { width: 3840, height: 2160 } });
    expect(res.status).toBe(200);
    expect(res.body.inputFit.scale).toBeCloseTo(1152 / 2160, 9);
  });

  it('answers 400 naming each bad field', async () => {
    const res = await tech.post('/api/calc/wall-plan', {
      ...wallPlan,
      cabinet: { ...cabinet, widthMm: 0, pixelsHigh: -5 },
      columns: 2.5,
      supply: { voltage: 120, phases: 2, breakerAmps: 20 },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['cabinet.pixelsHigh', 'cabinet.widthMm', 'columns', 'supply.phases']);
  });

  it('answers 400 naming the capacity one cabinet is over', async () => {
    const output = await tech.post('/api/calc/wall-plan', { ...wallPlan, outputCapacityPixels: 30_000 });
    expect(output.status).toBe(400);
    expect(output.body.error.fields).toHaveProperty('outputCapacityPixels');
    const circuit = await tech.post('/api/calc/wall-plan', { ...wallPlan, supply: { voltage: 120, phases: 1, breakerAmps: 1 } });
    expect(circuit.status).toBe(400);
    expect(circuit.body.error.fields).toHaveProperty(['supply.breakerAmps']);
    const typical = await tech.post('/api/calc/wall-plan', { ...wallPlan, cabinet: { ...cabinet, typicalPowerW: 200 } });
    expect(typical.body.error.fields).toHaveProperty(['cabinet.typicalPowerW']);
    // A zero load is named as such, never divided by.
    const zero = await tech.post('/api/calc/wall-plan', { ...wallPlan, cabinet: { ...cabinet, maxPowerW: 0 } });
    expect(zero.status).toBe(400);
    expect(zero.body.error.fields).toEqual({ 'cabinet.maxPowerW': 'Maximum power must be more than zero.' });
  });
});

describe('POST /api/calc/runs', () => {
  it('gives the 12 × 6 wall six data runs, one per row (common practice)', async () => {
    const res = await tech.post('/api/calc/runs', { columns: 12, rows: 6, kind: 'data', pattern: 'rows', cabinetPixels: 36_864 });
    expect(res.status).toBe(200);
    expect(res.body.runs).toHaveLength(6);
    expect(res.body.runs[0]).toMatchObject({ index: 1, pixels: 442_368 });
    expect(res.body.runs[5].cells).toEqual(Array.from({ length: 12 }, (_, c) => ({ column: c + 1, row: 6 })));
  });

  it('lays power runs in a serpentine within the chain capacity', async () => {
    const res = await tech.post('/api/calc/runs', { columns: 12, rows: 6, kind: 'power', pattern: 'serpentine', cabinetMaxPowerW: 150, chainCapacityW: 1000 });
    expect(res.status).toBe(200);
    // 6 cabinets of 150 W per 1,000 W chain: ceil(72 ÷ 6) = 12 runs of 900 W.
    expect(res.body.runs).toHaveLength(12);
    expect(res.body.runs.every((r: { watts: number }) => r.watts === 900)).toBe(true);
  });

  it('answers 400 for an unknown pattern, a missing load and one cabinet over the limit', async () => {
    const pattern = await tech.post('/api/calc/runs', { columns: 12, rows: 6, kind: 'data', pattern: 'diagonal', cabinetPixels: 36_864 });
    expect(pattern.status).toBe(400);
    expect(pattern.body.error.fields).toHaveProperty('pattern');
    const missing = await tech.post('/api/calc/runs', { columns: 12, rows: 6, kind: 'power', pattern: 'rows', cabinetMaxPowerW: 150 });
    expect(missing.body.error.fields).toHaveProperty('chainCapacityW');
    const over = await tech.post('/api/calc/runs', { columns: 12, rows: 6, kind: 'power', pattern: 'rows', cabinetMaxPowerW: 150, chainCapacityW: 100 });
    expect(over.status).toBe(400);
    expect(over.body.error.fields).toEqual({ chainCapacityW: expect.stringContaining('over the chain capacity') });
    const data = await tech.post('/api/calc/runs', { columns: 12, rows: 6, kind: 'data', pattern: 'rows', cabinetPixels: 700_000 });
    expect(data.body.error.fields).toHaveProperty('outputCapacityPixels');
    const size = await tech.post('/api/calc/runs', { columns: 0, rows: -1, kind: 'data', pattern: 'rows', cabinetPixels: 36_864 });
    expect(Object.keys(size.body.error.fields).sort()).toEqual(['columns', 'rows']);
    // A negative load is named as such, never divided by.
    const negative = await tech.post('/api/calc/runs', { columns: 12, rows: 6, kind: 'data', pattern: 'rows', cabinetPixels: -36_864 });
    expect(negative.status).toBe(400);
    expect(negative.body.error.fields).toEqual({ cabinetPixels: 'Cabinet pixels must be more than zero.' });
  });
});

describe('POST /api/calc/runs/validate', () => {
  it('lists what is wrong with hand-edited runs', async () => {
    const res = await tech.post('/api/calc/runs/validate', {
      columns: 2,
      rows: 2,
      kind: 'data',
      cabinetPixels: 36_864,
      runs: [
        { index: 1, cells: [{ column: 1, row: 1 }, { column: 2, row: 2 }] },
        { index: 2, cells: [{ column: 2, row: 2 }, { column: 3, row: 2 }] },
      ],
    });
    expect(res.status).toBe(200);
    expect(res.body.problems.map((p: { message: string }) => p.message)).toEqual([
      'Run 1: C2·R2 is not next to C1·R1, the cell before it.',
      'C2·R2 is in run 1 and in run 2.',
      'Run 2: C3·R2 is outside the 2 × 2 grid.',
      'C2·R1 is in no run.',
      'C1·R2 is in no run.',
    ]);
  });

  it('finds nothing wrong with the runs the generator made', async () => {
    const limits = { columns: 12, rows: 6, kind: 'data', cabinetPixels: 36_864 };
    const runs = await tech.post('/api/calc/runs', { ...limits, pattern: 'serpentine' });
    const res = await tech.post('/api/calc/runs/validate', { ...limits, runs: runs.body.runs });
    expect(res.body).toEqual({ problems: [] });
  });
});

describe('POST /api/calc/spares', () => {
  it('recommends 4 spares for λ = 288 × 0.002 × 3 = 1.728 at 95 % (worked by hand in shared/calc/spares.test.ts)', async () => {
    const res = await tech.post('/api/calc/spares', { modules: 288, failuresPerModuleMonth: 0.002, leadTimeMonths: 3, serviceLevel: 0.95 });
    expect(res.status).toBe(200);
    expect(res.body.expectedFailures).toBeCloseTo(1.728, 9);
    expect(res.body.recommendedSpares).toBe(4);
  });

  it('answers 400 for a service level of 1 and no modules', async () => {
    const res = await tech.post('/api/calc/spares', { modules: 0, failuresPerModuleMonth: 0.002, leadTimeMonths: 3, serviceLevel: 1 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['modules', 'serviceLevel']);
  });
});

describe('POST /api/calc/due', () => {
  const weekdays = { days: [1, 2, 3, 4, 5], start: '08:00', end: '18:00' };

  it('counts business hours across a weekend and the spring-forward change in the site’s zone', async () => {
    // Friday 6 March 2026 16:00 CST: 2 h on Friday, then Monday 9 March from 08:00 CDT (13:00Z)
    // for 2 h → 10:00 CDT = 15:00Z (US daylight saving starts Sunday 8 March 2026).
    const res = await tech.post('/api/calc/due', { start: '2026-03-06T16:00:00-06:00', hours: 4, mode: 'business', timeZone: 'America/Chicago', calendar: weekdays });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ due: '2026-03-09T15:00:00.000Z' });
  });

  it('counts round-the-clock hours as elapsed time', async () => {
    const res = await tech.post('/api/calc/due', { start: '2026-03-07T12:00:00-06:00', hours: 24, mode: 'round-the-clock', timeZone: 'America/Chicago', calendar: weekdays });
    expect(res.body).toEqual({ due: '2026-03-08T18:00:00.000Z' });
  });

  it('answers 400 for a start without an offset, an unknown zone, a day 8, a day that ends before it starts, negative hours and an unknown mode', async () => {
    const res = await tech.post('/api/calc/due', {
      start: '2026-03-06T16:00:00',
      hours: 4,
      mode: 'business',
      timeZone: 'Mars/Olympus_Mons',
      calendar: { days: [1, 8], start: '08:00', end: '18:00' },
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['calendar.days.1', 'start', 'timeZone']);
    const window = await tech.post('/api/calc/due', { start: '2026-03-06T16:00:00Z', hours: 4, mode: 'business', timeZone: 'UTC', calendar: { days: [1], start: '18:00', end: '08:00' } });
    expect(window.body.error.fields).toHaveProperty(['calendar.end']);
    const hours = await tech.post('/api/calc/due', { start: '2026-03-06T16:00:00Z', hours: -1, mode: 'weekly', timeZone: 'UTC', calendar: weekdays });
    expect(Object.keys(hours.body.error.fields).sort()).toEqual(['hours', 'mode']);
  });
});
