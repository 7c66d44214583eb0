// Poisson distribution for counts of independent failures. Written to stay accurate for large
// means: every term is taken relative to the most likely count (the mode) by the recurrence
// p(k+1) = p(k) · λ ÷ (k+1), so nothing underflows, even where e^-λ does (λ > 745).

/** Upper-tail terms below this share of the total are dropped: they cannot move the sum. */
const NEGLIGIBLE = 1e-20;
/**
 * Lower-tail terms are kept down to this weight (relative to the mode), near the smallest
 * normal double, so that P(X ≤ k) far below the mean keeps its relative accuracy.
 */
const SMALLEST_WEIGHT = 1e-300;

/** The distribution as weights relative to its mode: weight k = p(k) ÷ p(mode), for k ≥ `first`. */
interface Weights {
  first: number;
  weights: number[];
  total: number;
}

function weights(lambda: number): Weights {
  const mode = Math.floor(lambda);
  const below: number[] = [];
  const above: number[] = [1];
  let total = 1;
  // Down from the mode: p(k-1) = p(k) · k ÷ λ.
  let w = 1;
  for (let k = mode; k > 0; k--) {
    w *= k / lambda;
    if (w < SMALLEST_WEIGHT) break;
    below.push(w);
    total += w;
  }
  // Up from the mode: p(k+1) = p(k) · λ ÷ (k+1); terms only shrink from here on.
  w = 1;
  for (let k = mode; ; k++) {
    w *= lambda / (k + 1);
    if (w < NEGLIGIBLE * total) break;
    above.push(w);
    total += w;
  }
  return { first: mode - below.length, weights: [...below.reverse(), ...above], total };
}

function checkMean(lambda: number) {
  if (!(lambda >= 0) || !Number.isFinite(lambda)) throw new RangeError('The mean must be a finite number ≥ 0.');
}

/** P(X = k) for X ~ Poisson(λ): e^-λ · λ^k ÷ k!, computed without overflow or underflow. */
export function poissonPmf(k: number, lambda: number): number {
  checkMean(lambda);
  if (!Number.isInteger(k) || k < 0) return 0;
  if (lambda === 0) return k === 0 ? 1 : 0;
  const { first, weights: w, total } = weights(lambda);
  const i = k - first;
  return i >= 0 && i < w.length ? w[i] / total : 0;
}

/** P(X ≤ k) for X ~ Poisson(λ): Σ e^-λ · λ^j ÷ j! for j = 0…floor(k). */
export function poissonCdf(k: number, lambda: number): number {
  checkMean(lambda);
  if (k < 0) return 0;
  if (lambda === 0) return 1;
  const { first, weights: w, total } = weights(lambda);
  const last = Math.floor(k) - first;
  let sum = 0;
  for (let i = 0; i <= last && i < w.length; i++) sum += w[i];
  return Math.min(1, sum / total);
}

/**
 * The smallest count k with P(X ≤ k) ≥ `probability` for X ~ Poisson(λ) (the quantile),
 * together with the probability that count reaches. The probability must lie in (0, 1);
 * counts far below the mean, whose weight is negligible, are never the answer.
 */
export function poissonQuantile(probability: number, lambda: number): { count: number; probability: number } {
  checkMean(lambda);
  if (!(probability > 0 && probability < 1)) throw new RangeError('The probability must lie between 0 and 1.');
  if (lambda === 0) return { count: 0, probability: 1 };
  const { first, weights: w, total } = weights(lambda);
  // Every count below `first` is negligible, so the answer is at least `first`.
  let sum = 0;
  for (let i = 0; i < w.length; i++) {
    sum += w[i];
    if (sum / total >= probability) return { count: first + i, probability: Math.min(1, sum / total) };
  }
  return { count: first + w.length - 1, probability: 1 };
}
