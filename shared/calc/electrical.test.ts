import { describe, expect, it } from 'vitest';
import {
  assignPhases,
  branchCurrentA,
  branchOf,
  chainLimit,
  continuousLoadNote,
  currentForPower,
  DEFAULT_CONTINUOUS_FACTOR,
  DEFAULT_POWER_FACTOR,
  groupsNeeded,
  lineCurrentsFromPairs,
  powerFactorOf,
  powerForCurrent,
  supplyVoltageProblem,
  wholeUnitsWithin,
  type Supply,
} from './electrical.js';

const us20A: Supply = { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8, powerFactor: 1 };
const universal = { inputVoltageMinV: 100, inputVoltageMaxV: 240 };

describe('one branch circuit (single phase)', () => {
  it('carries 120 V × 20 A × 0.8 = 1,920 W continuously (NEC 210.19(A)(1), 210.20(A): 125 % of the continuous load)', () => {
    const limit = chainLimit(us20A, { maxPowerW: 150, ...universal });
    expect(limit.branch).toEqual({ kind: 'single-phase', voltageV: 120 });
    expect(limit.circuitCapacityW).toBeCloseTo(1920, 9);
    expect(limit.cabinetsPerChain).toBe(12);
    // 12 × 150 W = 1,800 W at 120 V is 15 A, under the 16 A (80 % of 20 A) a continuous load may draw.
    expect(branchCurrentA(limit, 12 * 150)).toBeCloseTo(15, 9);
  });

  it('defaults the continuous factor to 1 ÷ 1.25 = 0.8 (NEC 210.20(A))', () => {
    expect(DEFAULT_CONTINUOUS_FACTOR).toBeCloseTo(1 / 1.25, 12);
  });

  it('gives 230 V × 16 A = 3,680 W at full rating for one phase (P = V·I·PF, common practice: "3.7 kW")', () => {
    expect(powerForCurrent({ voltage: 230, phases: 1, powerFactor: 1 }, 16)).toBe(3680);
  });
});

describe('three-phase supplies: each chain is one single-phase branch circuit', () => {
  const cabinet1000 = { maxPowerW: 1000, ...universal };

  it('at 208 V three-phase, 20 A: a chain gets 208 V × 20 A × 0.8 = 3,328 W (3 × 1,000 W), never the feeder’s √3 × 208 × 16 = 5,764 W (5 cabinets)', () => {
    const supply: Supply = { voltage: 208, phases: 3, breakerAmps: 20, continuousFactor: 0.8, powerFactor: 1 };
    const limit = chainLimit(supply, cabinet1000);
    expect(limit.branch).toEqual({ kind: 'line-to-line', voltageV: 208 });
    expect(limit.circuitCapacityW).toBeCloseTo(3328, 9);
    expect(limit.cabinetsPerChain).toBe(3);
    // The feeder figure P = √3·V·I·PF is what the old plan gave one chain.
    expect(powerForCurrent(supply as Required<Supply>, 16)).toBeCloseTo(5764.3, 1);
    expect(limit.chainLimitW).toBeLessThan(5764);
  });

  it('at 208 V takes line-to-line when the cabinet’s range allows it, line-to-neutral (120 V) when it does not', () => {
    expect(branchOf({ voltage: 208, phases: 3 }, universal)).toEqual({ kind: 'line-to-line', voltageV: 208 });
    const only120 = branchOf({ voltage: 208, phases: 3 }, { inputVoltageMinV: 100, inputVoltageMaxV: 130 });
    expect(only120?.kind).toBe('line-to-neutral');
    expect(only120?.voltageV).toBeCloseTo(120.09, 2);
  });

  it('at 400 V three-phase feeds 100–240 V cabinets line-to-neutral at 400 ÷ √3 = 230.9 V (the 230/400 V system, IEC 60038)', () => {
    const branch = branchOf({ voltage: 400, phases: 3 }, universal);
    expect(branch?.kind).toBe('line-to-neutral');
    expect(branch?.voltageV).toBeCloseTo(230.94, 2);
  });

  it('counts whole cabinets on one 230.9 V circuit: 400 V, 16 A, 0.8, 340 W → 8 per circuit (2,956 W), not 26 from √3 × 400 × 16 × 0.8', () => {
    const limit = chainLimit(
      { voltage: 400, phases: 3, breakerAmps: 16, continuousFactor: 0.8, powerFactor: 1 },
      { maxPowerW: 340, ...universal },
    );
    expect(limit.circuitCapacityW).toBeCloseTo((400 / Math.sqrt(3)) * 16 * 0.8, 9);
    expect(limit.circuitCapacityW).toBeCloseTo(2956.0, 1);
    expect(limit.cabinetsPerChain).toBe(8);
    expect(wholeUnitsWithin(Math.sqrt(3) * 400 * 16 * 0.8, 340)).toBe(26);
  });
});

describe('a chain’s limit is the smallest of circuit, connector and maker', () => {
  const supply32: Supply = { voltage: 230, phases: 1, breakerAmps: 32, continuousFactor: 0.8, powerFactor: 1 };

  it('a 16 A connector on a 32 A circuit holds the chain to 230 V × 16 A = 3,680 W: 10 cabinets of 340 W, not 17', () => {
    const circuitOnly = chainLimit(supply32, { maxPowerW: 340, ...universal });
    expect(circuitOnly.circuitCapacityW).toBeCloseTo(5888, 9);
    expect(circuitOnly.cabinetsPerChain).toBe(17);
    const limit = chainLimit(supply32, { maxPowerW: 340, ...universal, passThroughAmps: 16 });
    expect(limit.connectorCapacityW).toBeCloseTo(3680, 9);
    expect(limit.chainLimitW).toBeCloseTo(3680, 9);
    expect(limit.chainLimitedBy).toBe('connector');
    expect(limit.cabinetsPerChain).toBe(10);
  });

  it('a 20 A connector limits the same chain to 13 cabinets (4,600 W)', () => {
    const limit = chainLimit(supply32, { maxPowerW: 340, ...universal, passThroughAmps: 20 });
    expect(limit.chainLimitW).toBeCloseTo(4600, 9);
    expect(limit.cabinetsPerChain).toBe(13);
  });

  it('the maker’s maximum per chain binds when it is the smallest', () => {
    const limit = chainLimit(supply32, { maxPowerW: 340, ...universal, passThroughAmps: 16, maxPerChain: 8 });
    expect(limit.chainLimitedBy).toBe('maker');
    expect(limit.chainLimitW).toBe(8 * 340);
    expect(limit.cabinetsPerChain).toBe(8);
  });

  it('the circuit binds when it is the smallest', () => {
    const limit = chainLimit(us20A, { maxPowerW: 150, ...universal, passThroughAmps: 20, maxPerChain: 20 });
    expect(limit.chainLimitedBy).toBe('circuit');
    expect(limit.cabinetsPerChain).toBe(12);
  });
});

describe('supply voltage against the cabinet’s input range', () => {
  it('refuses 480 V single-phase for a 100–240 V cabinet, naming the remedy', () => {
    const supply: Supply = { voltage: 480, phases: 1, breakerAmps: 20, continuousFactor: 0.8 };
    expect(branchOf(supply, universal)).toBeNull();
    expect(supplyVoltageProblem(supply, universal)).toMatch(/outside the cabinet's 100 V–240 V input range.*line-to-neutral.*transformer/);
    expect(() => chainLimit(supply, { maxPowerW: 100, ...universal })).toThrow(RangeError);
  });

  it('refuses 480 V three-phase (277 V line-to-neutral) for a 100–240 V cabinet: only a transformer helps', () => {
    const problem = supplyVoltageProblem({ voltage: 480, phases: 3 }, universal);
    expect(problem).toContain('277.1 V line-to-neutral');
    expect(problem).toContain('step-down transformer');
  });

  it('assumes the universal 100–240 V input when the datasheet gives no range, and says so', () => {
    expect(supplyVoltageProblem({ voltage: 480, phases: 1 }, {})).not.toBeNull();
    expect(chainLimit(us20A, { maxPowerW: 100 }).inputRangeAssumed).toBe(true);
    expect(chainLimit(us20A, { maxPowerW: 100, ...universal }).inputRangeAssumed).toBe(false);
  });

  it('accepts the ends of the range', () => {
    expect(supplyVoltageProblem({ voltage: 240, phases: 1 }, universal)).toBeNull();
    expect(supplyVoltageProblem({ voltage: 100, phases: 1 }, universal)).toBeNull();
  });
});

describe('power factor', () => {
  it('defaults to 0.95, which counts more current than 1: 120 V × 20 A × 0.8 × 0.95 = 1,824 W', () => {
    const supply: Supply = { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8 };
    expect(DEFAULT_POWER_FACTOR).toBe(0.95);
    const limit = chainLimit(supply, { maxPowerW: 150, ...universal });
    expect(limit.powerFactorSource).toBe('default');
    expect(limit.circuitCapacityW).toBeCloseTo(1824, 9);
    expect(limit.cabinetsPerChain).toBe(12);
    // 1,800 W at 120 V and PF 0.95 draws 15.79 A, more than the 15 A at PF 1.
    expect(branchCurrentA(limit, 1800)).toBeCloseTo(1800 / (120 * 0.95), 9);
  });

  it('takes the datasheet’s volt-amperes when given: 180 W ÷ 190 VA = 0.947, and sizes circuits by VA', () => {
    const pf = powerFactorOf({}, { maxPowerW: 180, maxPowerVA: 190 });
    expect(pf.source).toBe('datasheet');
    expect(pf.value).toBeCloseTo(180 / 190, 12);
    // 120 V × 20 A × 0.8 = 1,920 VA ÷ 190 VA = 10.1 → 10 cabinets.
    expect(
      chainLimit({ voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8 }, { maxPowerW: 180, maxPowerVA: 190 }).cabinetsPerChain,
    ).toBe(10);
  });

  it('uses a given power factor when the datasheet has none', () => {
    expect(powerFactorOf({ powerFactor: 0.9 }, { maxPowerW: 100 })).toEqual({ value: 0.9, source: 'given' });
    expect(chainLimit({ ...us20A, powerFactor: 0.9 }, { maxPowerW: 150 }).circuitCapacityW).toBeCloseTo(1728, 9);
  });
});

describe('line currents of line-to-line circuits on a three-phase supply', () => {
  it('gives √3 × 14 A = 24.25 A on each line for three balanced 14 A loads on 208 V (published worked example: "Calculating 3-Phase Wye Leg Currents from Line-to-Line Loads", Industrial Monitor Direct knowledge base)', () => {
    const [a, b, c] = lineCurrentsFromPairs(14, 14, 14);
    for (const line of [a, b, c]) expect(line).toBeCloseTo(24.25, 2);
  });

  it('gives a load across A-B alone on lines A and B only (a single-phase load draws its current through both its lines, from memory)', () => {
    const [a, b, c] = lineCurrentsFromPairs(10, 0, 0);
    expect(a).toBeCloseTo(10, 9);
    expect(b).toBeCloseTo(10, 9);
    expect(c).toBeCloseTo(0, 9);
  });

  it('adds loads that share a line as phasors 120° apart: A-B and B-C of 10 A each give B √3 × 10 = 17.32 A (worked by hand)', () => {
    const [a, b, c] = lineCurrentsFromPairs(10, 10, 0);
    expect(a).toBeCloseTo(10, 9);
    expect(b).toBeCloseTo(17.32, 2);
    expect(c).toBeCloseTo(10, 9);
  });
});

describe('assignPhases', () => {
  it('spreads six equal line-to-neutral circuits two to a phase, A B C A B C', () => {
    const { phases, phaseCurrentsA } = assignPhases([10, 10, 10, 10, 10, 10], 'line-to-neutral');
    expect(phases).toEqual(['A', 'B', 'C', 'A', 'B', 'C']);
    expect(phaseCurrentsA).toEqual([20, 20, 20]);
  });

  it('puts the largest circuits first, each on the least-loaded phase: 10, 10, 10, 5 → the 5 A circuit on A', () => {
    const { phases, phaseCurrentsA } = assignPhases([5, 10, 10, 10], 'line-to-neutral');
    expect(phases).toEqual(['A', 'A', 'B', 'C']);
    expect(phaseCurrentsA).toEqual([15, 10, 10]);
  });

  it('spreads line-to-line circuits over the pairs and gives the lines √3 × the pair current when balanced', () => {
    const { phases, phaseCurrentsA } = assignPhases([12, 12, 12, 12, 12, 12], 'line-to-line');
    expect(phases).toEqual(['A-B', 'B-C', 'C-A', 'A-B', 'B-C', 'C-A']);
    for (const line of phaseCurrentsA!) expect(line).toBeCloseTo(24 * Math.sqrt(3), 9);
  });

  it('has no phases on a single-phase supply', () => {
    expect(assignPhases([10, 10], 'single-phase')).toEqual({ phases: [null, null], phaseCurrentsA: null });
  });
});

describe('the continuous-load rule is labelled', () => {
  it('as the NEC’s at 0.8 on a 120 V supply', () => {
    expect(continuousLoadNote({ voltage: 120, phases: 1, continuousFactor: 0.8 })).toContain('NEC 210.19(A), 210.20(A)');
  });

  it('and defers to the local code on 230/400 V supplies', () => {
    expect(continuousLoadNote({ voltage: 230, phases: 1, continuousFactor: 0.8 })).toContain(
      'On a 230/400 V supply the local wiring code, not the NEC, sets this figure.',
    );
    expect(continuousLoadNote({ voltage: 400, phases: 3, continuousFactor: 0.8 })).toContain('local wiring code');
    expect(continuousLoadNote({ voltage: 400, phases: 3, continuousFactor: 1 })).toContain('as typed');
  });
});

describe('feeder current (three phases, balanced)', () => {
  it('is the inverse of power: 1,920 W at 120 V draws 16 A; 10,800 W draws 90 A', () => {
    const supply = { voltage: 120, phases: 1 as const, powerFactor: 1 };
    expect(currentForPower(supply, 1920)).toBeCloseTo(16, 12);
    expect(currentForPower(supply, 10_800)).toBeCloseTo(90, 12);
  });

  it('is per phase on three phases: I = P ÷ (√3·V·PF); about 11 kW on a 16 A 400 V supply (common practice: the "11 kW" three-phase outlet)', () => {
    const supply = { voltage: 208, phases: 3 as const, powerFactor: 0.95 };
    const amps = currentForPower(supply, 10_800);
    expect(amps).toBeCloseTo(10_800 / (Math.sqrt(3) * 208 * 0.95), 12);
    expect(powerForCurrent(supply, amps)).toBeCloseTo(10_800, 9);
    expect(Math.round(powerForCurrent({ voltage: 400, phases: 3, powerFactor: 1 }, 16) / 1000)).toBe(11);
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
