import { describe, expect, it } from 'vitest';
import type { Supply } from './electrical.js';
import { nearestGrids, planWall, type CabinetSpec } from './wall-plan.js';

// An invented 500 × 500 mm indoor cabinet: 192 × 192 pixels (2.604 mm pitch), 150 W maximum,
// 50 W typical, 8 kg.
const cabinet: CabinetSpec = {
  widthMm: 500,
  heightMm: 500,
  pixelsWide: 192,
  pixelsHigh: 192,
  maxPowerW: 150,
  typicalPowerW: 50,
  weightKg: 8,
};
const us20A: Supply = { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8, powerFactor: 1 };

describe('planWall: 12 × 6 of 500 mm cabinets', () => {
  const plan = planWall({ cabinet, columns: 12, rows: 6, supply: us20A, outputCapacityPixels: 650_000 });

  it('is 72 cabinets, about 20 ft wide and 10 ft tall (common practice)', () => {
    expect(plan.cabinetCount).toBe(72);
    expect(plan.widthMm).toBe(6000);
    expect(plan.heightMm).toBe(3000);
    // 1 ft = 0.3048 m (NIST Handbook 44, Appendix C): 6 m = 19.685 ft, 3 m = 9.843 ft.
    expect(plan.widthFt).toBeCloseTo(19.685, 3);
    expect(plan.heightFt).toBeCloseTo(9.843, 3);
    expect(Math.round(plan.widthFt)).toBe(20);
    expect(Math.round(plan.heightFt)).toBe(10);
    expect(plan.widthFeetInches).toBe(`19' 8-1/4"`);
    expect(plan.heightFeetInches).toBe(`9' 10-1/8"`);
    expect(plan.areaM2).toBeCloseTo(18, 12);
  });

  it('adds up pixels: 2304 × 1152 = 2,654,208, pitch 500 ÷ 192 mm, 2:1 (worked by hand)', () => {
    expect(plan.pixelsWide).toBe(2304);
    expect(plan.pixelsHigh).toBe(1152);
    expect(plan.totalPixels).toBe(2_654_208);
    expect(plan.pixelPitchMm).toBeCloseTo(500 / 192, 12);
    expect(plan.pixelsPerM2).toBeCloseTo(2_654_208 / 18, 6);
    expect(plan.aspectRatio).toBe(2);
  });

  it('draws 10,800 W maximum (90 A at 120 V) and 3,600 W typical', () => {
    expect(plan.maxPowerW).toBe(10_800);
    expect(plan.typicalPowerW).toBe(3_600);
    expect(plan.maxCurrentA).toBeCloseTo(90, 9);
    expect(plan.typicalCurrentA).toBeCloseTo(30, 9);
  });

  it('puts 12 cabinets on each 1,920 W circuit (NEC 210.19(A)(1) / 210.20(A)): six circuits, one power line per row (common practice)', () => {
    expect(plan.branchKind).toBe('single-phase');
    expect(plan.branchVoltageV).toBe(120);
    expect(plan.circuitCapacityW).toBeCloseTo(1920, 9);
    expect(plan.chainLimitW).toBeCloseTo(1920, 9);
    expect(plan.cabinetsPerCircuit).toBe(12);
    expect(plan.circuitsNeeded).toBe(6);
    expect(plan.circuits.map((c) => [c.from, c.to])).toEqual([1, 2, 3, 4, 5, 6].map((r) => [`C1·R${r}`, `C12·R${r}`]));
    // 12 × 150 W = 1,800 W at 120 V is 15 A a circuit, within the 16 A a 20 A breaker may carry continuously.
    for (const c of plan.circuits) expect(c).toMatchObject({ phase: null, cabinets: 12, watts: 1800, amps: 15 });
    expect(plan.phaseCurrentsA).toBeNull();
  });

  it('gives off 10,800 × 3.412142 = 36,851.13 BTU/h at maximum power (NIST SP 811)', () => {
    expect(plan.heatBtuPerHour).toBeCloseTo(36_851.1336, 4);
  });

  it('weighs 576 kg = 1,269.86 lb (1 lb = 0.45359237 kg, NIST Handbook 44, Appendix C)', () => {
    expect(plan.weightKg).toBe(576);
    expect(plan.weightLb).toBeCloseTo(1269.86, 2);
  });

  it('gives each row its own data line by default: six outputs of 442,368 px, one per row (common practice, stated by a practitioner)', () => {
    expect(plan.dataPattern).toBe('rows');
    expect(plan.cabinetsPerOutput).toBe(17);
    expect(plan.outputsNeeded).toBe(6);
    expect(plan.outputs.map((o) => o.pixels)).toEqual(Array(6).fill(12 * 192 * 192));
    expect(plan.outputs[2]).toMatchObject({ output: 3, cabinets: 12, from: 'C1·R3', to: 'C12·R3', homeRunM: null });
  });

  it('counts outputs for the pattern chosen: serpentine packs 17 cabinets an output, 5 outputs, the raw-pixel minimum (650,000 px per output, common practice)', () => {
    const serpentine = planWall({ cabinet, columns: 12, rows: 6, supply: us20A, outputCapacityPixels: 650_000, dataPattern: 'serpentine' });
    expect(serpentine.outputsNeeded).toBe(5);
    expect(serpentine.outputsNeeded).toBe(Math.ceil(serpentine.totalPixels / 650_000));
    const columns = planWall({ cabinet, columns: 12, rows: 6, supply: us20A, outputCapacityPixels: 650_000, dataPattern: 'columns' });
    expect(columns.outputsNeeded).toBe(12);
  });

  it('is comfortable from 2.6 m (1 m per mm of pitch, common practice) and pixel-free beyond 8.95 m (pitch × 3,438, derived from 1/tan(1′))', () => {
    expect(plan.minViewingDistanceM).toBeCloseTo(2.604, 3);
    expect(plan.acuityDistanceM).toBeCloseTo((500 / 192) * 3.438, 12);
    expect(plan.acuityDistanceM).toBeCloseTo(8.953, 3);
  });

  it('fits HD (SMPTE ST 274) by default: 2048 × 1152 with bars left and right', () => {
    expect(plan.inputFit).toEqual({ scaleX: 1152 / 1080, scaleY: 1152 / 1080, scaledWidth: 2048, scaledHeight: 1152, bars: 'left-right' });
  });

  it('fits a given UHD input (SMPTE ST 2036-1) at scale 1152/2160', () => {
    const uhd = planWall({
      cabinet,
      columns: 12,
      rows: 6,
      supply: us20A,
      outputCapacityPixels: 650_000,
      input: { width: 3840, height: 2160 },
    });
    expect(uhd.inputFit.scaleY).toBeCloseTo(1152 / 2160, 12);
    expect(uhd.inputFit.scaledWidth).toBe(2048);
  });
});

describe('planWall: supplies', () => {
  const base = { cabinet, columns: 12, rows: 6, outputCapacityPixels: 650_000 };

  it('on 208 V three-phase, 30 A: each row is one 208 V line-to-line circuit (208 × 30 × 0.8 = 4,992 W), two circuits per phase pair, 29.98 A per line', () => {
    const plan = planWall({ ...base, supply: { voltage: 208, phases: 3, breakerAmps: 30, continuousFactor: 0.8, powerFactor: 1 } });
    expect(plan.branchKind).toBe('line-to-line');
    expect(plan.branchVoltageV).toBe(208);
    expect(plan.circuitCapacityW).toBeCloseTo(4992, 9);
    expect(plan.cabinetsPerCircuit).toBe(33);
    expect(plan.circuitsNeeded).toBe(6);
    expect(plan.circuits.map((c) => c.phase)).toEqual(['A-B', 'B-C', 'C-A', 'A-B', 'B-C', 'C-A']);
    // Each circuit 1,800 W ÷ 208 V = 8.654 A; two per pair = 17.31 A; balanced pairs give √3 × that on each line.
    expect(plan.circuits[0].amps).toBeCloseTo(8.654, 3);
    for (const line of plan.phaseCurrentsA!) expect(line).toBeCloseTo(29.98, 2);
    // The same as the balanced three-phase formula P ÷ (√3 · V · PF) for the whole wall.
    expect(plan.maxCurrentA).toBeCloseTo(10_800 / (Math.sqrt(3) * 208), 9);
  });

  it('on 400 V three-phase, 16 A: 230.9 V circuits line-to-neutral, whole rows spread over A, B and C', () => {
    const plan = planWall({ ...base, supply: { voltage: 400, phases: 3, breakerAmps: 16, continuousFactor: 0.8, powerFactor: 1 } });
    expect(plan.branchKind).toBe('line-to-neutral');
    expect(plan.branchVoltageV).toBeCloseTo(230.94, 2);
    expect(plan.cabinetsPerCircuit).toBe(19);
    expect(plan.circuits.map((c) => c.phase)).toEqual(['A', 'B', 'C', 'A', 'B', 'C']);
    // Two 1,800 W circuits per phase: 3,600 W ÷ 230.94 V = 15.59 A on each line.
    for (const line of plan.phaseCurrentsA!) expect(line).toBeCloseTo(3600 / (400 / Math.sqrt(3)), 9);
  });

  it('balances an odd count of whole circuits as well as whole circuits allow: 7 rows at 400 V → A gets three', () => {
    const plan = planWall({
      ...base,
      rows: 7,
      supply: { voltage: 400, phases: 3, breakerAmps: 16, continuousFactor: 0.8, powerFactor: 1 },
    });
    expect(plan.circuits.map((c) => c.phase)).toEqual(['A', 'B', 'C', 'A', 'B', 'C', 'A']);
    const [a, b, c] = plan.phaseCurrentsA!;
    expect(a).toBeCloseTo(1.5 * b, 9);
    expect(b).toBeCloseTo(c, 9);
  });

  it('with the default power factor of 0.95, 120 V 20 A carries 1,824 W; a row of 12 × 180 W = 2,160 W takes two circuits', () => {
    const plan = planWall({
      ...base,
      cabinet: { ...cabinet, maxPowerW: 180 },
      supply: { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8 },
    });
    expect(plan.powerFactor).toBe(0.95);
    expect(plan.powerFactorSource).toBe('default');
    expect(plan.circuitCapacityW).toBeCloseTo(1824, 9);
    expect(plan.cabinetsPerCircuit).toBe(10);
    expect(plan.circuitsNeeded).toBe(12);
    expect(plan.circuits.slice(0, 2).map((c) => c.cabinets)).toEqual([6, 6]);
    expect(plan.maxCurrentA).toBeCloseTo((72 * 180) / (120 * 0.95), 9);
  });

  it('lays power runs by the pattern chosen: serpentine, 0.9 power factor → ceil(72 ÷ 11) = 7 circuits', () => {
    const plan = planWall({ ...base, supply: { ...us20A, powerFactor: 0.9 }, powerPattern: 'serpentine' });
    expect(plan.circuitCapacityW).toBeCloseTo(1728, 9);
    expect(plan.cabinetsPerCircuit).toBe(11);
    expect(plan.circuitsNeeded).toBe(7);
    expect(plan.circuits.reduce((n, c) => n + c.cabinets, 0)).toBe(72);
  });

  it('holds a chain to the connector and to the maker’s count', () => {
    const supply = { voltage: 230, phases: 1 as const, breakerAmps: 32, continuousFactor: 0.8, powerFactor: 1 };
    const connector = planWall({ ...base, cabinet: { ...cabinet, maxPowerW: 340, typicalPowerW: 100, passThroughAmps: 16 }, supply });
    expect(connector.chainLimitedBy).toBe('connector');
    expect(connector.cabinetsPerCircuit).toBe(10);
    expect(Math.max(...connector.circuits.map((c) => c.watts))).toBeLessThanOrEqual(3680);
    const maker = planWall({ ...base, cabinet: { ...cabinet, maxPerChain: 4 }, supply });
    expect(maker.chainLimitedBy).toBe('maker');
    expect(maker.circuitsNeeded).toBe(18);
  });

  it('refuses a supply outside the cabinet’s input range, and a cabinet alone over the circuit or the output', () => {
    expect(() => planWall({ ...base, supply: { ...us20A, voltage: 480 } })).toThrow(/outside the cabinet's 100 V–240 V input range/);
    expect(() =>
      planWall({ cabinet: { ...cabinet, maxPowerW: 2000 }, columns: 1, rows: 1, supply: us20A, outputCapacityPixels: 650_000 }),
    ).toThrow(RangeError);
    expect(() => planWall({ cabinet, columns: 1, rows: 1, supply: us20A, outputCapacityPixels: 30_000 })).toThrow(RangeError);
  });

  it('plans a single cabinet', () => {
    const plan = planWall({ cabinet, columns: 1, rows: 1, supply: us20A, outputCapacityPixels: 650_000 });
    expect([plan.cabinetCount, plan.circuitsNeeded, plan.outputsNeeded, plan.totalPixels]).toEqual([1, 1, 1, 36_864]);
  });
});

describe('planWall: non-square pixels', () => {
  // 500 × 500 mm with 192 × 96 pixels: 2.604 mm across, 5.208 mm down.
  const plan = planWall({ cabinet: { ...cabinet, pixelsHigh: 96 }, columns: 12, rows: 6, supply: us20A, outputCapacityPixels: 650_000 });

  it('gives both pitches and the viewing distances of the coarser one (1 m per mm, common practice)', () => {
    expect(plan.pixelPitchMm).toBeCloseTo(500 / 192, 12);
    expect(plan.pixelPitchVerticalMm).toBeCloseTo(500 / 96, 12);
    expect(plan.minViewingDistanceM).toBeCloseTo(5.208, 3);
  });

  it('fits HD keeping its shape on the wall: 2048 × 576 px, not 1024 × 576', () => {
    expect(plan.inputFit).toMatchObject({ scaledWidth: 2048, scaledHeight: 576, bars: 'left-right' });
  });
});

describe('planWall: the installer’s checks', () => {
  const base = { cabinet, columns: 12, rows: 6, supply: us20A, outputCapacityPixels: 650_000 };
  const check = (plan: ReturnType<typeof planWall>, code: string) => plan.checks.find((c) => c.code === code);

  it('names the code behind the continuous-load factor, the power factor, the binding limit and the inrush', () => {
    const plan = planWall(base);
    expect(check(plan, 'continuous_load')?.message).toContain('NEC 210.19(A), 210.20(A)');
    expect(check(plan, 'power_factor')?.message).toContain('as given');
    expect(check(plan, 'chain_limit')?.message).toContain('the 20 A circuit at 80 %');
    expect(check(plan, 'inrush')?.message).toContain('IEC 60898-1');
    expect(check(plan, 'input_range')?.message).toContain('100–240 V (universal input) is assumed');
    expect(check(plan, 'phase_balance')).toBeUndefined();
  });

  it('checks the processor: outputs for the chosen pattern, total pixels and canvas size', () => {
    const small = planWall({ ...base, processor: { outputs: 4, maxWidth: 1920, maxHeight: 1200 } });
    expect(check(small, 'processor_outputs')).toMatchObject({ status: 'fail' });
    expect(check(small, 'processor_outputs')?.message).toContain('need 6 outputs; the processor has 4');
    // 4 × 650,000 = 2,600,000 < 2,654,208 pixels.
    expect(check(small, 'processor_pixels')?.status).toBe('fail');
    expect(check(small, 'processor_size')?.status).toBe('fail');
    const big = planWall({ ...base, processor: { outputs: 8, pixelCapacity: 8_800_000, maxWidth: 4096, maxHeight: 2160 } });
    expect(['processor_outputs', 'processor_pixels', 'processor_size'].map((c) => check(big, c)?.status)).toEqual(['pass', 'pass', 'pass']);
  });

  it('checks pixels per receiving card against the cabinet', () => {
    expect(check(planWall({ ...base, cabinet: { ...cabinet, receivingCardPixels: 65_536 } }), 'receiving_card')?.status).toBe('pass');
    const over = planWall({ ...base, cabinet: { ...cabinet, receivingCardPixels: 32_768 } });
    expect(check(over, 'receiving_card')).toMatchObject({ status: 'fail' });
    expect(check(over, 'receiving_card')?.message).toContain('needs 2 cards');
    const two = planWall({ ...base, cabinet: { ...cabinet, receivingCards: 2, receivingCardPixels: 32_768 } });
    expect(two.receivingCards).toBe(144);
    expect(check(two, 'receiving_card')?.status).toBe('pass');
  });

  it('checks each home run against 100 m of twisted pair (TIA-568 channel)', () => {
    // Row 1's first cabinet centre is 0.25 m in and 2.75 m up from the bottom-left corner; row 6's 0.25 m up.
    const near = planWall({ ...base, dataCableToWallM: 60 });
    expect(near.outputs[0].homeRunM).toBeCloseTo(63, 9);
    expect(near.outputs[5].homeRunM).toBeCloseTo(60.5, 9);
    expect(check(near, 'data_cable_length')?.status).toBe('pass');
    // 98 m to the wall: rows 1 and 2 at 101 m and 100.5 m are over, row 3 at exactly 100 m is not.
    const far = planWall({ ...base, dataCableToWallM: 98 });
    expect(check(far, 'data_cable_length')).toMatchObject({ status: 'fail' });
    expect(check(far, 'data_cable_length')?.message).toMatch(/^2 outputs have home runs over 100 m.*fibre/);
  });

  it('gives the phase currents on a three-phase supply', () => {
    const plan = planWall({ ...base, supply: { voltage: 208, phases: 3, breakerAmps: 20, continuousFactor: 0.8 } });
    expect(check(plan, 'phase_balance')?.message).toMatch(/^Line currents at maximum power: A \d/);
    expect(check(plan, 'supply_branch')?.message).toContain('208 V line-to-line');
  });
});

describe('nearestGrids', () => {
  it('finds 12 × 6 first for a 20 ft × 10 ft wall of 500 mm cabinets (common practice)', () => {
    // 20 ft = 6,096 mm, 10 ft = 3,048 mm (NIST Handbook 44, Appendix C); 6,096 ÷ 500 = 12.19, 3,048 ÷ 500 = 6.10.
    const options = nearestGrids(cabinet, 6096, 3048);
    expect(options[0]).toMatchObject({ columns: 12, rows: 6, widthMm: 6000, heightMm: 3000, widthErrorMm: -96, heightErrorMm: -48 });
    expect(options[0].errorMm).toBeCloseTo(Math.hypot(96, 48), 9);
    // By hand: 12×6 √(96² + 48²) = 107; 13×6 √(404² + 48²) = 407; 12×7 √(96² + 452²) = 462; 13×7 √(404² + 452²) = 606.
    expect(options.map((o) => `${o.columns}×${o.rows}`)).toEqual(['12×6', '13×6', '12×7', '13×7']);
  });

  it('ranks by distance to the target: 13 × 7 is 404 × 452 mm over, the farthest', () => {
    const options = nearestGrids(cabinet, 6096, 3048);
    const errors = options.map((o) => o.errorMm);
    expect(errors).toEqual([...errors].sort((a, b) => a - b));
    expect(options[3]).toMatchObject({ widthErrorMm: 404, heightErrorMm: 452 });
  });

  it('gives one exact option when the target is a whole number of cabinets', () => {
    expect(nearestGrids(cabinet, 6000, 3000)).toEqual([
      { columns: 12, rows: 6, widthMm: 6000, heightMm: 3000, widthErrorMm: 0, heightErrorMm: 0, errorMm: 0 },
    ]);
  });

  it('never offers fewer than one cabinet', () => {
    expect(nearestGrids(cabinet, 100, 100).map((o) => [o.columns, o.rows])).toEqual([[1, 1]]);
  });

  it('refuses non-positive sizes', () => {
    expect(() => nearestGrids(cabinet, 0, 3000)).toThrow(RangeError);
  });
});
