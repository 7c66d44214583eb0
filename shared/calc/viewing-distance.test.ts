import { describe, expect, it } from 'vitest';
import { ACUITY_FACTOR, acuityDistanceM, farthestAnalyticalViewer, minViewingDistanceM, pixelPitchMm } from './viewing-distance.js';

describe('acuity factor', () => {
  it('is 1 ÷ tan(1 arc-minute) = 3,437.75, rounded to 3,438 (derived)', () => {
    const oneArcMinute = Math.PI / (180 * 60);
    expect(1 / Math.tan(oneArcMinute)).toBeCloseTo(3437.75, 2);
    expect(ACUITY_FACTOR).toBe(Math.round(1 / Math.tan(oneArcMinute)));
  });
});

describe('viewing distances', () => {
  it('gives the AVIXA DISCAS (V202.01:2016) analytical case: 1,500 mm high, 1,080 lines → 4,775 mm', () => {
    expect(Math.round(farthestAnalyticalViewer(1500, 1080))).toBe(4775);
  });

  it('agrees with DISCAS when the pitch is the image height ÷ its lines (derived)', () => {
    const pitch = 1500 / 1080;
    expect(acuityDistanceM(pitch) * 1000).toBeCloseTo(farthestAnalyticalViewer(1500, 1080), 9);
  });

  it('puts the acuity distance at pitch × 3,438: 2.5 mm → 8.595 m (derived from 1/tan(1′))', () => {
    expect(acuityDistanceM(2.5)).toBeCloseTo(8.595, 12);
  });

  it('puts the closest comfortable distance at 1 m per mm of pitch (common practice)', () => {
    expect(minViewingDistanceM(2.6)).toBe(2.6);
    expect(minViewingDistanceM(10)).toBe(10);
  });

  it('takes the pitch as cabinet width ÷ pixels: 500 mm ÷ 192 = 2.604 mm; 600 mm ÷ 240 = 2.5 mm (definition of pitch)', () => {
    expect(pixelPitchMm(500, 192)).toBeCloseTo(2.6042, 4);
    expect(pixelPitchMm(600, 240)).toBe(2.5);
  });
});
