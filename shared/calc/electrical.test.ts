import { describe, expect, it } from 'vitest';
import { circuitCapacityW, currentForPower, DEFAULT_CONTINUOUS_FACTOR, groupsNeeded, powerForCurrent, wholeUnitsWithin, type Supply } from './electrical.js';

const us20A: Supply = { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8, powerFactor: 1 };

describe('circuit capacity', () => {
  it('gives 120 V × 20 A × 0.8 = 1,920 W for a continuous load (NEC 210.19(A)(1), 210.20(A): 125 % of continuous load)', () => {
    expect(circuitCapacityW(us20A)).toBeCloseTo(1920, 9);
  });

  it('defaults the continuous factor to 1 ÷ 1.25 = 0.8 (NEC 210.20(A))', () => {
    expect(DEFAULT_CONTINUOUS_FACTOR).toBeCloseTo(1 / 1.25, 12);
  });

  it('gives 230 V × 16 A = 3,680 W at full rating for one phase (P = V·I·PF, common practice: "3.7 kW")', () => {
    expect(powerForCurrent({ voltage: 230, phases: 1, powerFactor: 1 }, 16)).toBe(3680);
  });

  it('uses P = √3·V(line-to-line)·I·PF for three phases, the same as 3 × V(line-to-neutral) × I (wye supply, from memory)', () => {
    const threePhase208 = { voltage: 208, phases: 3 as const, powerFactor: 1 };
    // 208 V line-to-line is 120.09 V line-to-neutral; three phases of 16 A each.
    // √3 × 208 V × 20 A × 0.8 = 360.27 × 16 = 5,764.3 W.
    expect(powerForCurrent(threePhase208, 16)).toBeCloseTo(3 * (208 / Math.sqrt(3)) * 16, 9);
    expect(circuitCapacityW({ ...threePhase208, breakerAmps: 20, continuousFactor: 0.8 })).toBeCloseTo(5764.3, 1);
  });

  it('gives about 11 kW for a 16 A three-phase 400 V supply (common practice: the "11 kW" three-phase outlet)', () => {
    const watts = powerForCurrent({ voltage: 400, phases: 3, powerFactor: 1 }, 16);
    expect(watts).toBeCloseTo(11085, 0);
    expect(Math.round(watts / 1000)).toBe(11);
  });

  it('scales with the power factor', () => {
    expect(circuitCapacityW({ ...us20A, powerFactor: 0.9 })).toBeCloseTo(1728, 9);
  });
});

describe('current', () => {
  it('is the inverse of power: 1,920 W at 120 V draws 16 A; 10,800 W draws 90 A', () => {
    expect(currentForPower(us20A, 1920)).toBeCloseTo(16, 12);
    expect(currentForPower(us20A, 10_800)).toBeCloseTo(90, 12);
  });

  it('is per phase on three phases: I = P ÷ (√3·V·PF)', () => {
    const supply = { voltage: 208, phases: 3 as const, powerFactor: 0.95 };
    const amps = currentForPower(supply, 10_800);
    expect(amps).toBeCloseTo(10_800 / (Math.sqrt(3) * 208 * 0.95), 12);
    expect(powerForCurrent(supply, amps)).toBeCloseTo(10_800, 9);
  });
});

describe('whole units per limit', () => {
  it('keeps only whole cabinets: floor(1,920 ÷ 150) = 12, floor(1,920 ÷ 200) = 9', () => {
    expect(wholeUnitsWithin(1920, 150)).toBe(12);
    expect(wholeUnitsWithin(1920, 200)).toBe(9);
  });

  it('counts a ratio that is whole on paper as whole despite floating-point rounding', () => {
    expect(0.3 / 0.1).toBeLessThan(3); // 2.9999999999999996 in IEEE 754 doubles
    expect(wholeUnitsWithin(0.3, 0.1)).toBe(3);
    expect(wholeUnitsWithin(1920, 192)).toBe(10);
  });

  it('is 0 when one unit is over the limit, and refuses a non-positive unit', () => {
    expect(wholeUnitsWithin(1920, 2000)).toBe(0);
    expect(() => wholeUnitsWithin(1920, 0)).toThrow(RangeError);
  });

  it('groups cabinets: ceil(72 ÷ 12) = 6, ceil(72 ÷ 9) = 8, ceil(1 ÷ 12) = 1', () => {
    expect(groupsNeeded(72, 12)).toBe(6);
    expect(groupsNeeded(72, 9)).toBe(8);
    expect(groupsNeeded(1, 12)).toBe(1);
    expect(() => groupsNeeded(72, 0)).toThrow(RangeError);
  });
});
