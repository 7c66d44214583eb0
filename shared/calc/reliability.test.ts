import { describe, expect, it } from 'vitest';
import { failuresPerModuleMonth, failuresPerThousandModuleMonths, moduleMonths, mtbfHours, mtbfModuleMonths } from './reliability.js';

// MTBF as total operating time ÷ number of failures, and the failure rate as its reciprocal,
// are the standard definitions for a constant failure rate (MIL-HDBK-338B, from memory).
describe('failure rate', () => {
  it('counts exposure in module-months: 288 modules × 12 months = 3,456', () => {
    expect(moduleMonths(288, 12)).toBe(3456);
  });

  it('gives 7 failures in 3,456 module-months = 2.0255 per 1,000 module-months (worked by hand)', () => {
    expect(failuresPerThousandModuleMonths(7, 3456)).toBeCloseTo(2.0255, 4);
    expect(failuresPerModuleMonth(7, 3456)).toBeCloseTo(0.0020255, 7);
  });

  it('refuses an empty exposure', () => {
    expect(() => failuresPerModuleMonth(1, 0)).toThrow(RangeError);
  });
});

describe('MTBF', () => {
  it('is exposure ÷ failures: 3,456 ÷ 7 = 493.71 module-months, the reciprocal of the rate', () => {
    expect(mtbfModuleMonths(7, 3456)).toBeCloseTo(493.714, 3);
    expect(mtbfModuleMonths(7, 3456)! * failuresPerModuleMonth(7, 3456)).toBeCloseTo(1, 12);
  });

  it('in hours: 288 modules × 4,380 h (12 h a day for a year) ÷ 7 = 180,206 h', () => {
    expect(mtbfHours(7, 288, 4380)).toBeCloseTo(180_205.71, 2);
  });

  it('is unknown (null) before the first failure', () => {
    expect(mtbfModuleMonths(0, 3456)).toBeNull();
    expect(mtbfHours(0, 288, 4380)).toBeNull();
    expect(() => mtbfHours(1, 0, 10)).toThrow(RangeError);
  });
});
