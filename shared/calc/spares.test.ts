import referenceCdf from '@stdlib/stats-base-dists-poisson-cdf';
import { describe, expect, it } from 'vitest';
import { forecastSpares } from './spares.js';

/** The smallest s with P(X ≤ s) ≥ level, by a scan of the reference CDF (@stdlib/stats-base-dists-poisson-cdf). */
function referenceSpares(lambda: number, level: number): number {
  let s = 0;
  while (referenceCdf(s, lambda) < level) s++;
  return s;
}

describe('forecastSpares', () => {
  it('covers a 72-cabinet wall (288 modules) at 2 failures per 1,000 module-months over a 3-month lead time', () => {
    // Worked by hand: λ = 288 × 0.002 × 3 = 1.728; e^-1.728 = 0.17764.
    // P(≤3) = 0.17764 × (1 + 1.728 + 1.49299 + 0.85997) = 0.17764 × 5.08096 = 0.9026 < 0.95
    // P(≤4) = 0.9026 + 0.17764 × 0.37151 = 0.9026 + 0.0660 = 0.9686 ≥ 0.95 → 4 spares.
    const forecast = forecastSpares({ modules: 288, failuresPerModuleMonth: 0.002, leadTimeMonths: 3, serviceLevel: 0.95 });
    expect(forecast.expectedFailures).toBeCloseTo(1.728, 12);
    expect(forecast.recommendedSpares).toBe(4);
    expect(forecast.coverage).toBeCloseTo(0.9686, 4);
    // And against the reference library.
    expect(forecast.recommendedSpares).toBe(referenceSpares(1.728, 0.95));
    expect(forecast.coverage).toBeCloseTo(referenceCdf(4, 1.728), 12);
  });

  it('matches the @stdlib reference for large fleets (λ = 500: 100,000 modules × 0.001 × 5 months)', () => {
    for (const level of [0.5, 0.9, 0.95, 0.99, 0.999]) {
      const forecast = forecastSpares({ modules: 100_000, failuresPerModuleMonth: 0.001, leadTimeMonths: 5, serviceLevel: level });
      expect(forecast.expectedFailures).toBeCloseTo(500, 9);
      expect(forecast.recommendedSpares, `level ${level}`).toBe(referenceSpares(500, level));
    }
  });

  it('recommends no spares when nothing fails', () => {
    expect(forecastSpares({ modules: 288, failuresPerModuleMonth: 0, leadTimeMonths: 3, serviceLevel: 0.99 })).toEqual({
      expectedFailures: 0,
      recommendedSpares: 0,
      coverage: 1,
    });
  });

  it('never recommends fewer spares for a higher service level or a longer lead time', () => {
    let before = -1;
    for (const level of [0.5, 0.75, 0.9, 0.95, 0.99, 0.999]) {
      const s = forecastSpares({ modules: 500, failuresPerModuleMonth: 0.003, leadTimeMonths: 2, serviceLevel: level }).recommendedSpares;
      expect(s).toBeGreaterThanOrEqual(before);
      before = s;
    }
    const short = forecastSpares({ modules: 500, failuresPerModuleMonth: 0.003, leadTimeMonths: 1, serviceLevel: 0.95 });
    const long = forecastSpares({ modules: 500, failuresPerModuleMonth: 0.003, leadTimeMonths: 6, serviceLevel: 0.95 });
    expect(long.recommendedSpares).toBeGreaterThan(short.recommendedSpares);
  });
});
