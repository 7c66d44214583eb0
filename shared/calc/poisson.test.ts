// Reference values come from @stdlib/stats-base-dists-poisson-cdf (a reference statistics
// library from npm, installed as a devDependency only for these checks).
import referenceCdf from '@stdlib/stats-base-dists-poisson-cdf';
import { describe, expect, it } from 'vitest';
import { poissonCdf, poissonPmf, poissonQuantile } from './poisson.js';

const means = [0.001, 0.05, 0.5, 1, 1.728, 3.7, 10, 42.5, 100, 250, 499.5, 500, 1000];

/** Counts around the mean: from 0 to mean + 8 standard deviations. */
function countsAround(lambda: number): number[] {
  const sd = Math.sqrt(lambda);
  const top = Math.ceil(lambda + 8 * sd + 5);
  const step = Math.max(1, Math.floor(top / 200));
  const ks: number[] = [];
  for (let k = 0; k <= top; k += step) ks.push(k);
  return ks;
}

describe('poissonCdf', () => {
  it('matches @stdlib/stats-base-dists-poisson-cdf for means from 0.001 to 1,000 (λ = 500 and beyond included)', () => {
    for (const lambda of means) {
      for (const k of countsAround(lambda)) {
        expect(Math.abs(poissonCdf(k, lambda) - referenceCdf(k, lambda)), `λ=${lambda}, k=${k}`).toBeLessThan(1e-12);
      }
    }
  });

  it('keeps relative accuracy deep in the lower tail at λ = 500 (against @stdlib)', () => {
    for (const k of [10, 100, 200, 300, 350, 400, 450]) {
      const ours = poissonCdf(k, 500);
      const ref = referenceCdf(k, 500);
      expect(ref).toBeGreaterThan(0);
      expect(Math.abs(ours - ref) / ref, `k=${k}`).toBeLessThan(1e-9);
    }
  });

  it('gives P(X ≤ 0) = e⁻⁵⁰⁰ for λ = 500 (the definition; about 7.1e-218)', () => {
    expect(Math.abs(poissonCdf(0, 500) / Math.exp(-500) - 1)).toBeLessThan(1e-9);
  });

  it('gives P(X ≤ 2) = 5e⁻² for λ = 2 (worked by hand: e⁻²(1 + 2 + 2))', () => {
    expect(poissonCdf(2, 2)).toBeCloseTo(5 * Math.exp(-2), 14);
  });

  it('treats counts below zero, non-integer counts and a zero mean as the definition says', () => {
    expect(poissonCdf(-1, 3)).toBe(0);
    expect(poissonCdf(2.7, 2)).toBe(poissonCdf(2, 2));
    expect(poissonCdf(0, 0)).toBe(1);
    expect(() => poissonCdf(1, -1)).toThrow(RangeError);
    expect(() => poissonCdf(1, Number.NaN)).toThrow(RangeError);
  });
});

describe('poissonPmf', () => {
  it('gives P(X = k) = e⁻λ λᵏ ÷ k! (worked by hand for λ = 2: e⁻², 2e⁻², 2e⁻², 4/3 e⁻²)', () => {
    const e2 = Math.exp(-2);
    expect(poissonPmf(0, 2)).toBeCloseTo(e2, 15);
    expect(poissonPmf(1, 2)).toBeCloseTo(2 * e2, 15);
    expect(poissonPmf(2, 2)).toBeCloseTo(2 * e2, 15);
    expect(poissonPmf(3, 2)).toBeCloseTo((4 / 3) * e2, 15);
  });

  it('agrees with differences of the @stdlib CDF at λ = 800, where e⁻λ underflows', () => {
    expect(Math.exp(-800)).toBe(0);
    for (const k of [700, 780, 800, 820, 900]) {
      const ref = referenceCdf(k, 800) - referenceCdf(k - 1, 800);
      expect(Math.abs(poissonPmf(k, 800) - ref) / ref, `k=${k}`).toBeLessThan(1e-8);
    }
  });

  it('sums to 1 and is 0 off the integers', () => {
    let total = 0;
    for (let k = 0; k < 200; k++) total += poissonPmf(k, 42.5);
    expect(total).toBeCloseTo(1, 14);
    expect(poissonPmf(1.5, 2)).toBe(0);
    expect(poissonPmf(-1, 2)).toBe(0);
  });
});

describe('poissonQuantile', () => {
  it('is the smallest k with P(X ≤ k) ≥ p, by a scan of the @stdlib CDF', () => {
    for (const lambda of means) {
      for (const p of [0.5, 0.8, 0.9, 0.95, 0.99, 0.999]) {
        let k = 0;
        while (referenceCdf(k, lambda) < p) k++;
        const q = poissonQuantile(p, lambda);
        expect(q.count, `λ=${lambda}, p=${p}`).toBe(k);
        expect(q.probability).toBeCloseTo(referenceCdf(k, lambda), 12);
      }
    }
  });

  it('needs no stock for a zero mean, and refuses probabilities outside (0, 1)', () => {
    expect(poissonQuantile(0.99, 0)).toEqual({ count: 0, probability: 1 });
    expect(() => poissonQuantile(1, 5)).toThrow(RangeError);
    expect(() => poissonQuantile(0, 5)).toThrow(RangeError);
  });
});
