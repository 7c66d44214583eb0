import { describe, expect, it } from 'vitest';
import type { Supply } from './electrical.js';
import { nearestGrids, planWall, type CabinetSpec } from './wall-plan.js';

// An invented 500 × 500 mm indoor cabinet: 192 × 192 pixels (2.604 mm pitch), 150 W maximum,
// 50 W typical, 8 kg.
const cabinet: CabinetSpec = { widthMm: 500, heightMm: 500, pixelsWide: 192, pixelsHigh: 192, maxPowerW: 150, typicalPowerW: 50, weightKg: 8 };
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
    expect(plan.circuitCapacityW).toBeCloseTo(1920, 9);
    expect(plan.cabinetsPerCircuit).toBe(12);
    expect(plan.circuitsNeeded).toBe(6);
  });

  it('gives off 10,800 × 3.412142 = 36,851.13 BTU/h at maximum power (NIST SP 811)', () => {
    expect(plan.heatBtuPerHour).toBeCloseTo(36_851.1336, 4);
  });

  it('weighs 576 kg = 1,269.86 lb (1 lb = 0.45359237 kg, NIST Handbook 44, Appendix C)', () => {
    expect(plan.weightKg).toBe(576);
    expect(plan.weightLb).toBeCloseTo(1269.86, 2);
  });

  it('needs 5 outputs of 650,000 pixels (common practice): 17 whole cabinets of 36,864 pixels per output', () => {
    expect(plan.cabinetsPerOutput).toBe(17);
    expect(plan.outputsNeeded).toBe(5);
    // No output plan can beat the raw pixel count: ceil(2,654,208 ÷ 650,000) = 5.
    expect(plan.outputsNeeded).toBeGreaterThanOrEqual(Math.ceil(plan.totalPixels / 650_000));
  });

  it('is comfortable from 2.6 m (1 m per mm of pitch, common practice) and pixel-free beyond 8.95 m (pitch × 3,438, derived from 1/tan(1′))', () => {
    expect(plan.minViewingDistanceM).toBeCloseTo(2.604, 3);
    expect(plan.acuityDistanceM).toBeCloseTo((500 / 192) * 3.438, 12);
    expect(plan.acuityDistanceM).toBeCloseTo(8.953, 3);
  });

  it('fits HD (SMPTE ST 274) by default: 2048 × 1152 with bars left and right', () => {
    expect(plan.inputFit).toEqual({ scale: 1152 / 1080, scaledWidth: 2048, scaledHeight: 1152, bars: 'left-right' });
  });

  it('fits a given UHD input (SMPTE ST 2036-1) at scale 1152/2160', () => {
    const uhd = planWall({ cabinet, columns: 12, rows: 6, supply: us20A, outputCapacityPixels: 650_000, input: { width: 3840, height: 2160 } });
    expect(uhd.inputFit.scale).toBeCloseTo(1152 / 2160, 12);
    expect(uhd.inputFit.scaledWidth).toBe(2048);
  });
});

describe('planWall: supplies', () => {
  it('on 208 V three-phase, 30 A: √3 × 208 × 24 = 8,646.4 W per circuit, 57 cabinets each, 2 circuits, 29.98 A per phase (P = √3·V·I·PF)', () => {
    const plan = planWall({
      cabinet,
      columns: 12,
      rows: 6,
      supply: { voltage: 208, phases: 3, breakerAmps: 30, continuousFactor: 0.8, powerFactor: 1 },
      outputCapacityPixels: 650_000,
    });
    expect(plan.circuitCapacityW).toBeCloseTo(8646.4, 1);
    expect(plan.cabinetsPerCircuit).toBe(57);
    expect(plan.circuitsNeeded).toBe(2);
    expect(plan.maxCurrentA).toBeCloseTo(29.98, 2);
  });

  it('with a 0.9 power factor, 120 V 20 A carries 1,728 W: 11 cabinets, 7 circuits', () => {
    const plan = planWall({ cabinet, columns: 12, rows: 6, supply: { ...us20A, powerFactor: 0.9 }, outputCapacityPixels: 650_000 });
    expect(plan.circuitCapacityW).toBeCloseTo(1728, 9);
    expect(plan.cabinetsPerCircuit).toBe(11);
    expect(plan.circuitsNeeded).toBe(7);
    expect(plan.maxCurrentA).toBeCloseTo(10_800 / (120 * 0.9), 9);
  });

  it('refuses a cabinet that alone is over the circuit or the output', () => {
    expect(() => planWall({ cabinet: { ...cabinet, maxPowerW: 2000 }, columns: 1, rows: 1, supply: us20A, outputCapacityPixels: 650_000 })).toThrow(RangeError);
    expect(() => planWall({ cabinet, columns: 1, rows: 1, supply: us20A, outputCapacityPixels: 30_000 })).toThrow(RangeError);
  });

  it('plans a single cabinet', () => {
    const plan = planWall({ cabinet, columns: 1, rows: 1, supply: us20A, outputCapacityPixels: 650_000 });
    expect([plan.cabinetCount, plan.circuitsNeeded, plan.outputsNeeded, plan.totalPixels]).toEqual([1, 1, 1, 36_864]);
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
