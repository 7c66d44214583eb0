// Supply circuits for a wall: usable capacity, current and whole cabinets per circuit.
// Planning estimates only: circuits and connections are work for a licensed electrician.

/** The supply a wall is fed from. */
export interface Supply {
  /** Volts: line-to-neutral for one phase, line-to-line for three phases. */
  voltage: number;
  phases: 1 | 3;
  /** The breaker's rating in amperes. */
  breakerAmps: number;
  /**
   * Share of the breaker rating a continuous load may use: 0.8 by default (NEC 210.19(A)(1) and
   * 210.20(A) size a circuit at 125 % of the continuous load, which is loading it to 80 %).
   */
  continuousFactor: number;
  /** Power factor of the load, 1 for a resistive-looking (power-factor-corrected) supply. */
  powerFactor: number;
}

/** The continuous-load share of a breaker rating (1 ÷ 1.25, see `Supply.continuousFactor`). */
export const DEFAULT_CONTINUOUS_FACTOR = 0.8;

/**
 * Real power for a current on this supply, in watts.
 * One phase: P = V · I · PF. Three phases (balanced): P = √3 · V(line-to-line) · I · PF.
 */
export function powerForCurrent(supply: Pick<Supply, 'voltage' | 'phases' | 'powerFactor'>, amps: number): number {
  const phaseFactor = supply.phases === 3 ? Math.sqrt(3) : 1;
  return phaseFactor * supply.voltage * amps * supply.powerFactor;
}

/**
 * Current drawn by a load in amperes, per phase for three phases: the inverse of
 * `powerForCurrent`, I = P ÷ (V · PF) or I = P ÷ (√3 · V · PF).
 */
export function currentForPower(supply: Pick<Supply, 'voltage' | 'phases' | 'powerFactor'>, watts: number): number {
  return watts / powerForCurrent(supply, 1);
}

/**
 * Watts one circuit may carry continuously: the power at the breaker rating times the
 * continuous factor. 120 V × 20 A × 0.8 = 1,920 W.
 */
export function circuitCapacityW(supply: Supply): number {
  return powerForCurrent(supply, supply.breakerAmps * supply.continuousFactor);
}

/**
 * Whole units that fit under a limit: floor(capacity ÷ per unit). Used for cabinets per circuit,
 * per power chain and per data output; 0 when even one unit is over the limit.
 * A tolerance of 1e-9 on the quotient keeps a ratio that is whole on paper (1,920 W ÷ 192 W)
 * from dropping a unit to floating-point rounding.
 */
export function wholeUnitsWithin(capacity: number, perUnit: number): number {
  if (!(perUnit > 0)) throw new RangeError('The per-unit figure must be positive.');
  return Math.floor(capacity / perUnit + 1e-9);
}

/** Groups (circuits, chains, outputs) for `count` cabinets, at most `perGroup` in each: ceil(count ÷ perGroup). */
export function groupsNeeded(count: number, perGroup: number): number {
  if (!(perGroup >= 1)) throw new RangeError('Not even one cabinet fits within the limit.');
  return Math.ceil(count / perGroup);
}
