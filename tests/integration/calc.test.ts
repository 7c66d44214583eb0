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
      branchKind: 'single-phase',
      branchVoltageV: 120,
      powerFactor: 0.95,
      powerFactorSource: 'default',
      cabinetsPerCircuit: 12,
      circuitsNeeded: 6,
      phaseCurrentsA: null,
      weightKg: 576,
      // Whole rows by default: one data line per row (common practice).
      dataPattern: 'rows',
      outputsNeeded: 6,
      inputFit: { scaledWidth: 2048, scaledHeight: 1152, bars: 'left-right' },
    });
    // 1 ft = 0.3048 m (NIST Handbook 44, Appendix C).
    expect(res.body.widthFt).toBeCloseTo(19.685, 3);
    // Defaults: continuous factor 0.8 (NEC 210.19(A)(1), 210.20(A)) and power factor 0.95:
    // 120 V × 20 A × 0.8 × 0.95 = 1,824 W a circuit; 10,800 W ÷ (120 V × 0.95) = 94.74 A in all.
    expect(res.body.circuitCapacityW).toBeCloseTo(1824, 6);
    expect(res.body.chainLimitW).toBeCloseTo(1824, 6);
    expect(res.body.maxCurrentA).toBeCloseTo(94.74, 2);
    expect(res.body.circuits[0]).toEqual({
      circuit: 1,
      phase: null,
      cabinets: 12,
      watts: 1800,
      amps: expect.closeTo(15.79, 2),
      from: 'C1·R1',
      to: 'C12·R1',
    });
    expect(res.body.checks.find((c: { code: string }) => c.code === 'continuous_load').message).toContain('NEC 210.19(A), 210.20(A)');
    // 1 W = 3.412142 BTU/h (NIST SP 811).
    expect(res.body.heatBtuPerHour).toBeCloseTo(36_851.13, 2);
    // 1 lb = 0.45359237 kg (NIST Handbook 44, Appendix C).
    expect(res.body.weightLb).toBeCloseTo(1269.86, 2);
  });

  it('is open to client users too (a pure calculation, no records)', async () => {
    const res = await clientUser.post('/api/calc/wall-plan', { ...wallPlan, input: { width: 3840, height: 2160 } });
    expect(res.status).toBe(200);
    expect(res.body.inputFit.scaleX).toBeCloseTo(1152 / 2160, 9);
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

describe('POST /api/calc/wall-plan: supplies, chains and phases', () => {
  const big = { ...cabinet, maxPowerW: 1000, typicalPowerW: 300, inputVoltageMinV: 100, inputVoltageMaxV: 240 };

  it('gives a chain on 208 V three-phase one 208 V line-to-line circuit: 3 × 1,000 W at 20 A, not 5', async () => {
    const res = await tech.post('/api/calc/wall-plan', {
      ...wallPlan,
      cabinet: big,
      supply: { voltage: 208, phases: 3, breakerAmps: 20, powerFactor: 1 },
    });
    expect(res.status).toBe(200);
    // 208 V × 20 A × 0.8 = 3,328 W (NEC 210.19(A)(1), 210.20(A)): three whole 1,000 W cabinets.
    expect(res.body).toMatchObject({ branchKind: 'line-to-line', branchVoltageV: 208, cabinetsPerCircuit: 3 });
    expect(res.body.circuitCapacityW).toBeCloseTo(3328, 6);
    // A row of 12 takes four chains of 3: 24 circuits over the pairs A-B, B-C, C-A, eight each.
    expect(res.body.circuitsNeeded).toBe(24);
    expect(res.body.circuits.slice(0, 3).map((c: { phase: string }) => c.phase)).toEqual(['A-B', 'B-C', 'C-A']);
    expect(res.body.phaseCurrentsA).toHaveLength(3);
    // Balanced pairs of 8 × 14.42 A = 115.4 A give √3 × that on each line (worked example: three
    // balanced line-to-line loads give √3 × the load current per leg).
    for (const line of res.body.phaseCurrentsA) expect(line).toBeCloseTo(Math.sqrt(3) * 8 * (3000 / 208), 6);
  });

  it('feeds 100–240 V cabinets on 400 V three-phase line-to-neutral at 230.9 V', async () => {
    const res = await tech.post('/api/calc/wall-plan', { ...wallPlan, cabinet: big, supply: { voltage: 400, phases: 3, breakerAmps: 16 } });
    expect(res.status).toBe(200);
    expect(res.body.branchKind).toBe('line-to-neutral');
    expect(res.body.branchVoltageV).toBeCloseTo(230.94, 2);
    // 230.94 × 16 × 0.8 × 0.95 = 2,808 W: two whole 1,000 W cabinets on each circuit.
    expect(res.body.cabinetsPerCircuit).toBe(2);
    expect(res.body.circuits[0].phase).toBe('A');
    expect(res.body.checks.find((c: { code: string }) => c.code === 'continuous_load').message).toContain('local wiring code');
  });

  it('answers 400 on supply.voltage for a supply outside the cabinet’s input range', async () => {
    const res = await tech.post('/api/calc/wall-plan', { ...wallPlan, cabinet: big, supply: { voltage: 480, phases: 1, breakerAmps: 20 } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['supply.voltage']);
    expect(res.body.error.fields['supply.voltage']).toContain("outside the cabinet's 100 V–240 V input range");
    const three = await tech.post('/api/calc/wall-plan', {
      ...wallPlan,
      cabinet: big,
      supply: { voltage: 480, phases: 3, breakerAmps: 20 },
    });
    expect(three.body.error.fields['supply.voltage']).toContain('277.1 V line-to-neutral');
  });

  it('holds a chain to the connector rating and the maker’s count', async () => {
    const supply = { voltage: 230, phases: 1, breakerAmps: 32, powerFactor: 1 };
    const connector = await tech.post('/api/calc/wall-plan', {
      ...wallPlan,
      cabinet: { ...cabinet, maxPowerW: 340, passThroughAmps: 16 },
      supply,
    });
    expect(connector.status).toBe(200);
    // 230 V × 16 A = 3,680 W through the connector, under the 32 A circuit's 5,888 W: 10 cabinets of 340 W.
    expect(connector.body).toMatchObject({ chainLimitedBy: 'connector', cabinetsPerCircuit: 10 });
    expect(connector.body.chainLimitW).toBeCloseTo(3680, 6);
    const maker = await tech.post('/api/calc/wall-plan', {
      ...wallPlan,
      cabinet: { ...cabinet, maxPowerW: 340, passThroughAmps: 16, maxPerChain: 8 },
      supply,
    });
    expect(maker.body).toMatchObject({ chainLimitedBy: 'maker', chainLimitW: 2720, cabinetsPerCircuit: 8 });
    const tooSmall = await tech.post('/api/calc/wall-plan', {
      ...wallPlan,
      cabinet: { ...cabinet, passThroughAmps: 0.5 },
      supply: { voltage: 120, phases: 1, breakerAmps: 20 },
    });
    expect(tooSmall.status).toBe(400);
    expect(tooSmall.body.error.fields).toHaveProperty(['cabinet.passThroughAmps']);
  });

  it('takes the power factor from the datasheet’s volt-amperes and says so', async () => {
    const res = await tech.post('/api/calc/wall-plan', {
      ...wallPlan,
      cabinet: { ...cabinet, maxPowerVA: 160 },
      supply: { voltage: 120, phases: 1, breakerAmps: 20 },
    });
    expect(res.body.powerFactorSource).toBe('datasheet');
    expect(res.body.powerFactor).toBeCloseTo(150 / 160, 9);
    const bad = await tech.post('/api/calc/wall-plan', { ...wallPlan, cabinet: { ...cabinet, maxPowerVA: 100 } });
    expect(bad.body.error.fields).toHaveProperty(['cabinet.maxPowerVA']);
  });

  it('checks the processor, the receiving card and the home runs when given', async () => {
    const res = await tech.post('/api/calc/wall-plan', {
      ...wallPlan,
      cabinet: { ...cabinet, receivingCardPixels: 32_768 },
      processor: { outputs: 4 },
      dataCableToWallM: 120,
    });
    expect(res.status).toBe(200);
    const status = Object.fromEntries(res.body.checks.map((c: { code: string; status: string }) => [c.code, c.status]));
    expect(status).toMatchObject({
      processor_outputs: 'fail',
      processor_pixels: 'fail',
      receiving_card: 'fail',
      data_cable_length: 'fail',
      inrush: 'note',
    });
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
    const res = await tech.post('/api/calc/runs', {
      columns: 12,
      rows: 6,
      kind: 'power',
      pattern: 'serpentine',
      cabinetMaxPowerW: 150,
      chainCapacityW: 1000,
    });
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
    const over = await tech.post('/api/calc/runs', {
      columns: 12,
      rows: 6,
      kind: 'power',
      pattern: 'rows',
      cabinetMaxPowerW: 150,
      chainCapacityW: 100,
    });
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
        {
          index: 1,
          cells: [
            { column: 1, row: 1 },
            { column: 2, row: 2 },
          ],
        },
        {
          index: 2,
          cells: [
            { column: 2, row: 2 },
            { column: 3, row: 2 },
          ],
        },
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
    const res = await tech.post('/api/calc/due', {
      start: '2026-03-06T16:00:00-06:00',
      hours: 4,
      mode: 'business',
      timeZone: 'America/Chicago',
      calendar: weekdays,
    });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ due: '2026-03-09T15:00:00.000Z' });
  });

  it('counts round-the-clock hours as elapsed time', async () => {
    const res = await tech.post('/api/calc/due', {
      start: '2026-03-07T12:00:00-06:00',
      hours: 24,
      mode: 'round-the-clock',
      timeZone: 'America/Chicago',
      calendar: weekdays,
    });
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
    const window = await tech.post('/api/calc/due', {
      start: '2026-03-06T16:00:00Z',
      hours: 4,
      mode: 'business',
      timeZone: 'UTC',
      calendar: { days: [1], start: '18:00', end: '08:00' },
    });
    expect(window.body.error.fields).toHaveProperty(['calendar.end']);
    const hours = await tech.post('/api/calc/due', {
      start: '2026-03-06T16:00:00Z',
      hours: -1,
      mode: 'weekly',
      timeZone: 'UTC',
      calendar: weekdays,
    });
    expect(Object.keys(hours.body.error.fields).sort()).toEqual(['hours', 'mode']);
  });
});
