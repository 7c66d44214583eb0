// Spares forecast: how many spare modules to keep on site so that, with the chosen
// probability, the failures during one restock lead time are covered.
import { poissonQuantile } from './poisson.js';

export interface SparesInput {
  /** Modules installed that the spares serve. */
  modules: number;
  /** Failures per module per month (e.g. 0.002 = 2 per 1,000 module-months). */
  failuresPerModuleMonth: number;
  /** Months from ordering a spare to having it on site. */
  leadTimeMonths: number;
  /** Chance of not running out, between 0 and 1 (e.g. 0.95). */
  serviceLevel: number;
}

export interface SparesForecast {
  /** λ = modules × failures per module-month × lead time (months). */
  expectedFailures: number;
  /** The smallest s with P(failures ≤ s) ≥ service level, failures ~ Poisson(λ). */
  recommendedSpares: number;
  /** P(failures ≤ recommendedSpares): the service level the count really gives. */
  coverage: number;
}

/**
 * Failures are independent and arrive at a steady rate, so their count over the lead time is
 * Poisson with mean λ = modules × rate × lead time; keep the smallest stock that covers them
 * with the chosen probability.
 */
export function forecastSpares(input: SparesInput): SparesForecast {
  const expectedFailures = input.modules * input.failuresPerModuleMonth * input.leadTimeMonths;
  const { count, probability } = poissonQuantile(input.serviceLevel, expectedFailures);
  return { expectedFailures, recommendedSpares: count, coverage: probability };
}
