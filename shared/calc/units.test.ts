import { describe, expect, it } from 'vitest';
import {
  BTU_PER_HOUR_PER_WATT,
  feetToMm,
  formatFeetInches,
  kgToPounds,
  KG_PER_POUND,
  mmToFeet,
  MM_PER_FOOT,
  MM_PER_INCH,
  wattsToBtuPerHour,
} from './units.js';

describe('length', () => {
  it('uses 1 ft = 0.3048 m and 1 in = 25.4 mm exactly (NIST Handbook 44, Appendix C)', () => {
    expect(MM_PER_FOOT).toBe(0.3048 * 1000);
    expect(MM_PER_INCH * 12).toBeCloseTo(MM_PER_FOOT, 12);
    expect(mmToFeet(304.8)).toBe(1);
    expect(feetToMm(20)).toBeCloseTo(6096, 9);
    expect(feetToMm(10)).toBeCloseTo(3048, 9);
  });

  it('converts a 6 m wall to 19.685 ft (6 ÷ 0.3048, NIST Handbook 44, Appendix C)', () => {
    expect(mmToFeet(6000)).toBeCloseTo(19.685039, 6);
  });
});

describe('mass', () => {
  it('uses 1 lb = 0.45359237 kg exactly (NIST Handbook 44, Appendix C)', () => {
    expect(KG_PER_POUND).toBe(0.45359237);
    expect(kgToPounds(0.45359237)).toBe(1);
    // 100 kg ÷ 0.45359237 = 220.462262… lb (same source).
    expect(kgToPounds(100)).toBeCloseTo(220.462262, 6);
  });
});

describe('heat', () => {
  it('uses 1 W = 3.412142 BTU/h (NIST SP 811, Appendix B)', () => {
    expect(BTU_PER_HOUR_PER_WATT).toBe(3.412142);
    expect(wattsToBtuPerHour(1)).toBe(3.412142);
    expect(wattsToBtuPerHour(1000)).toBeCloseTo(3412.142, 9);
  });
});

describe('formatFeetInches', () => {
  // Expected texts worked by hand from 1 in = 25.4 mm (NIST Handbook 44, Appendix C).
  it('writes whole feet with 0 inches: 6,096 mm = 240 in = 20\' 0"', () => {
    expect(formatFeetInches(6096)).toBe(`20' 0"`);
  });

  it('writes reduced fractions: 236.75 in (6,013.45 mm) = 19\' 8-3/4"', () => {
    expect(formatFeetInches(236.75 * 25.4)).toBe(`19' 8-3/4"`);
  });

  it('rounds to the nearest 1/8 in: 6,000 mm = 236.22 in → 19\' 8-1/4"; 3,000 mm = 118.11 in → 9\' 10-1/8"', () => {
    expect(formatFeetInches(6000)).toBe(`19' 8-1/4"`);
    expect(formatFeetInches(3000)).toBe(`9' 10-1/8"`);
  });

  it('honours a finer denominator: 3,000 mm = 9\' 10.110" → 9\' 10-1/8" at 1/16 too, 100 mm = 3.937 in → 0\' 3-15/16"', () => {
    expect(formatFeetInches(3000, 16)).toBe(`9' 10-1/8"`);
    expect(formatFeetInches(100, 16)).toBe(`0' 3-15/16"`);
  });

  it('carries a rounded-up 12 inches into the next foot', () => {
    // 304.7 mm = 11.996 in, which rounds to 12 in = 1 ft.
    expect(formatFeetInches(304.7)).toBe(`1' 0"`);
  });

  it('handles zero, halves and negatives', () => {
    expect(formatFeetInches(0)).toBe(`0' 0"`);
    expect(formatFeetInches(12.7)).toBe(`0' 0-1/2"`);
    expect(formatFeetInches(-304.8)).toBe(`-1' 0"`);
  });

  it('refuses what is not a length', () => {
    expect(() => formatFeetInches(Number.NaN)).toThrow(RangeError);
    expect(() => formatFeetInches(100, 0)).toThrow(RangeError);
  });
});
