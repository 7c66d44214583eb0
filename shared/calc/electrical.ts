// Supply circuits for a wall: the branch circuit a chain of cabinets hangs on, what one chain may
// carry, and how the circuits share the phases of a three-phase supply.
// Planning estimates only: circuits and connections are work for a licensed electrician.

/** The supply a wall is fed from, as the electrician describes it. */
export interface Supply {
  /** Volts: the circuit's voltage on a single-phase supply, line-to-line on a three-phase one. */
  voltage: number;
  phases: 1 | 3;
  /** The rating of each branch circuit's breaker, in amperes. */
  breakerAmps: number;
  /**
   * Share of the breaker rating a continuous load may use: 0.8 by default, the US National
   * Electrical Code's rule (NEC 210.19(A)(1) and 210.20(A) size a circuit at 125 % of the
   * continuous load, which is loading it to 80 %). Elsewhere the local code sets the figure.
   */
  continuousFactor: number;
  /**
   * Power factor of the cabinets' supplies. Left out: the datasheet's volt-amperes when the
   * cabinet has them, otherwise `DEFAULT_POWER_FACTOR`.
   */
  powerFactor?: number;
}

/** The electrical figures of one cabinet that decide how many share a chain. */
export interface CabinetPower {
  /** Watts at full white, full brightness: what circuits are sized for. */
  maxPowerW: number;
  /** Volt-amperes at maximum power, when the datasheet gives them (then PF = W ÷ VA). */
  maxPowerVA?: number;
  /** The cabinet's input voltage range; 100–240 V when the datasheet is not at hand. */
  inputVoltageMinV?: number;
  inputVoltageMaxV?: number;
  /** Rating of the cabinet's power input / pass-through connector, amperes. */
  passThroughAmps?: number;
  /** The most cabinets the maker allows on one power chain. */
  maxPerChain?: number;
}

/** The continuous-load share of a breaker rating (1 ÷ 1.25, see `Supply.continuousFactor`). */
export const DEFAULT_CONTINUOUS_FACTOR = 0.8;

/**
 * Power factor assumed when neither the request nor the datasheet gives one. Switch-mode
 * supplies with power-factor correction sit around 0.95 at full load (common practice); 1 would
 * under-count the current.
 */
export const DEFAULT_POWER_FACTOR = 0.95;

/** The universal input range of switch-mode cabinet supplies, assumed when none is given (common practice). */
export const ASSUMED_INPUT_RANGE = { minV: 100, maxV: 240 } as const;

/**
 * The largest share of the breaker's rating a continuous load may use under the US NEC. The
 * planner labels any other figure as the user's own.
 */
export const NEC_CONTINUOUS_FACTOR = DEFAULT_CONTINUOUS_FACTOR;

/**
 * Real power for a current on this supply, in watts.
 * One phase: P = V · I · PF. Three phases (balanced): P = √3 · V(line-to-line) · I · PF.
 * This is a feeder's figure on three phases: one chain of cabinets never gets it.
 */
export function powerForCurrent(supply: { voltage: number; phases: 1 | 3; powerFactor: number }, amps: number): number {
  const phaseFactor = supply.phases === 3 ? Math.sqrt(3) : 1;
  return phaseFactor * supply.voltage * amps * supply.powerFactor;
}

/**
 * Current drawn by a load in amperes, per phase for three phases: the inverse of
 * `powerForCurrent`, I = P ÷ (V · PF) or I = P ÷ (√3 · V · PF).
 */
export function currentForPower(supply: { voltage: number; phases: 1 | 3; powerFactor: number }, watts: number): number {
  return watts / powerForCurrent(supply, 1);
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

// ---- the branch circuit ----

/**
 * How one chain of cabinets is fed: a single-phase supply's own circuit, or on a three-phase
 * supply a circuit between two phases (line-to-line) or between a phase and neutral.
 */
export type BranchKind = 'single-phase' | 'line-to-line' | 'line-to-neutral';

export interface Branch {
  kind: BranchKind;
  voltageV: number;
}

type InputRange = Pick<CabinetPower, 'inputVoltageMinV' | 'inputVoltageMaxV'>;

const within = (v: number, min: number, max: number) => v >= min - 1e-9 && v <= max + 1e-9;

/** The cabinet's input range, or the assumed universal range when the datasheet gives none. */
export function inputRangeOf(cabinet: InputRange): { minV: number; maxV: number; assumed: boolean } {
  if (cabinet.inputVoltageMinV === undefined && cabinet.inputVoltageMaxV === undefined) return { ...ASSUMED_INPUT_RANGE, assumed: true };
  return {
    minV: cabinet.inputVoltageMinV ?? ASSUMED_INPUT_RANGE.minV,
    maxV: cabinet.inputVoltageMaxV ?? ASSUMED_INPUT_RANGE.maxV,
    assumed: false,
  };
}

/**
 * The branch circuit a chain hangs on, or null when no circuit of this supply is within the
 * cabinet's input range. Single phase: the supply's voltage. Three phases: line-to-line when that
 * voltage is within range (208 V for 100–240 V cabinets: less current per watt), otherwise
 * line-to-neutral, V ÷ √3 (400 V → 230.9 V, the 230/400 V system of IEC 60038).
 */
export function branchOf(supply: Pick<Supply, 'voltage' | 'phases'>, cabinet: InputRange): Branch | null {
  const { minV, maxV } = inputRangeOf(cabinet);
  if (supply.phases === 1) return within(supply.voltage, minV, maxV) ? { kind: 'single-phase', voltageV: supply.voltage } : null;
  if (within(supply.voltage, minV, maxV)) return { kind: 'line-to-line', voltageV: supply.voltage };
  const lineToNeutral = supply.voltage / Math.sqrt(3);
  return within(lineToNeutral, minV, maxV) ? { kind: 'line-to-neutral', voltageV: lineToNeutral } : null;
}

const volts = (v: number) => `${new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 }).format(v)} V`;

/**
 * Why this supply cannot feed the cabinet, in words an installer acts on, or null when it can.
 * The usual remedies: a circuit within the range (line-to-neutral on a three-phase supply), or a
 * step-down transformer.
 */
export function supplyVoltageProblem(supply: Pick<Supply, 'voltage' | 'phases'>, cabinet: InputRange): string | null {
  if (branchOf(supply, cabinet)) return null;
  const { minV, maxV } = inputRangeOf(cabinet);
  const range = `${volts(minV)}–${volts(maxV)}`;
  if (supply.phases === 1) {
    return `${volts(supply.voltage)} is outside the cabinet's ${range} input range: feed it from a circuit within that range (line-to-neutral on a three-phase supply) or through a step-down transformer.`;
  }
  return `Neither ${volts(supply.voltage)} line-to-line nor ${volts(supply.voltage / Math.sqrt(3))} line-to-neutral is within the cabinet's ${range} input range: feed the wall through a step-down transformer.`;
}

// ---- what one chain may carry ----

export type PowerFactorSource = 'datasheet' | 'given' | 'default';
export type ChainLimitedBy = 'circuit' | 'connector' | 'maker';

/** The power factor a plan uses and where it came from: the datasheet's VA, the request, or 0.95. */
export function powerFactorOf(supply: Pick<Supply, 'powerFactor'>, cabinet: CabinetPower): { value: number; source: PowerFactorSource } {
  if (cabinet.maxPowerVA !== undefined && cabinet.maxPowerVA > 0)
    return { value: Math.min(1, cabinet.maxPowerW / cabinet.maxPowerVA), source: 'datasheet' };
  if (supply.powerFactor !== undefined) return { value: supply.powerFactor, source: 'given' };
  return { value: DEFAULT_POWER_FACTOR, source: 'default' };
}

export interface ChainLimit {
  branch: Branch;
  powerFactor: number;
  powerFactorSource: PowerFactorSource;
  /** One branch circuit's continuous capacity: V(branch) × breaker × continuous factor × PF. */
  circuitCapacityW: number;
  /** What the cabinet's power connector may pass on: V(branch) × connector rating × PF; null when unknown. */
  connectorCapacityW: number | null;
  /** The maker's most cabinets per chain, in watts at maximum power; null when unknown. */
  makerLimitW: number | null;
  /** The smallest of the three: what one chain may carry. */
  chainLimitW: number;
  chainLimitedBy: ChainLimitedBy;
  /** Whole cabinets on one chain (and so on one circuit): 0 when one cabinet alone is over. */
  cabinetsPerChain: number;
  /** True when the cabinet's input range was assumed (100–240 V), not given. */
  inputRangeAssumed: boolean;
}

/**
 * What one chain of cabinets may carry. A chain is fed by one single-phase branch circuit, so
 * its limit is the smallest of the circuit's continuous capacity, the cabinet connector's rating
 * and the maker's most cabinets per chain. On a three-phase supply the √3 figure belongs to the
 * feeder, never to one chain: at 208 V a chain gets 208 V × 20 A × 0.8, not √3 times that.
 * Throws a RangeError naming the remedy when the supply cannot feed the cabinet.
 */
export function chainLimit(supply: Supply, cabinet: CabinetPower): ChainLimit {
  const branch = branchOf(supply, cabinet);
  if (!branch) throw new RangeError(supplyVoltageProblem(supply, cabinet) ?? 'The supply cannot feed this cabinet.');
  const pf = powerFactorOf(supply, cabinet);
  const circuitCapacityW = branch.voltageV * supply.breakerAmps * supply.continuousFactor * pf.value;
  const connectorCapacityW = cabinet.passThroughAmps === undefined ? null : branch.voltageV * cabinet.passThroughAmps * pf.value;
  const makerLimitW = cabinet.maxPerChain === undefined ? null : cabinet.maxPerChain * cabinet.maxPowerW;

  let chainLimitW = circuitCapacityW;
  let chainLimitedBy: ChainLimitedBy = 'circuit';
  if (connectorCapacityW !== null && connectorCapacityW < chainLimitW) [chainLimitW, chainLimitedBy] = [connectorCapacityW, 'connector'];
  if (makerLimitW !== null && makerLimitW < chainLimitW) [chainLimitW, chainLimitedBy] = [makerLimitW, 'maker'];

  return {
    branch,
    powerFactor: pf.value,
    powerFactorSource: pf.source,
    circuitCapacityW,
    connectorCapacityW,
    makerLimitW,
    chainLimitW,
    chainLimitedBy,
    cabinetsPerChain: wholeUnitsWithin(chainLimitW, cabinet.maxPowerW),
    inputRangeAssumed: inputRangeOf(cabinet).assumed,
  };
}

/** Current of `watts` on one branch circuit: I = P ÷ (V × PF). */
export function branchCurrentA(limit: Pick<ChainLimit, 'branch' | 'powerFactor'>, watts: number): number {
  return watts / (limit.branch.voltageV * limit.powerFactor);
}

// ---- phases ----

export type PhaseName = 'A' | 'B' | 'C' | 'A-B' | 'B-C' | 'C-A';
const LINE_TO_NEUTRAL: PhaseName[] = ['A', 'B', 'C'];
const LINE_TO_LINE: PhaseName[] = ['A-B', 'B-C', 'C-A'];

/**
 * Line currents of a three-phase supply from the currents of loads connected line-to-line.
 * Each load's current is in step with its voltage (V_AB at 30°, V_BC at −90°, V_CA at 150°; a
 * shared power-factor angle turns them all alike), and I_A = I_AB − I_CA, I_B = I_BC − I_AB,
 * I_C = I_CA − I_BC. Balanced loads of I give √3 × I on each line.
 */
export function lineCurrentsFromPairs(ab: number, bc: number, ca: number): [number, number, number] {
  const phasor = (magnitude: number, degrees: number) => {
    const r = (degrees * Math.PI) / 180;
    return { x: magnitude * Math.cos(r), y: magnitude * Math.sin(r) };
  };
  const iab = phasor(ab, 30);
  const ibc = phasor(bc, -90);
  const ica = phasor(ca, 150);
  const size = (a: { x: number; y: number }, b: { x: number; y: number }) => Math.hypot(a.x - b.x, a.y - b.y);
  return [size(iab, ica), size(ibc, iab), size(ica, ibc)];
}

export interface PhaseAssignment {
  /** The phase (line-to-neutral) or phase pair (line-to-line) of each circuit, in the order given; null on single phase. */
  phases: (PhaseName | null)[];
  /** Line currents A, B, C on a three-phase supply; null on single phase. */
  phaseCurrentsA: [number, number, number] | null;
}

/**
 * Spreads whole circuits over the phases (or phase pairs) as evenly as whole circuits allow:
 * largest circuit first, each onto the least-loaded phase, ties to the first (A, then B, then C).
 * Line-to-neutral loads add up per phase; line-to-line loads meet on each line as phasors.
 */
export function assignPhases(circuitAmps: number[], kind: BranchKind): PhaseAssignment {
  if (kind === 'single-phase') return { phases: circuitAmps.map(() => null), phaseCurrentsA: null };
  const names = kind === 'line-to-line' ? LINE_TO_LINE : LINE_TO_NEUTRAL;
  const load = [0, 0, 0];
  const phases: PhaseName[] = new Array(circuitAmps.length);
  const order = circuitAmps.map((amps, i) => ({ amps, i })).sort((a, b) => b.amps - a.amps || a.i - b.i);
  for (const { amps, i } of order) {
    let least = 0;
    for (let p = 1; p < 3; p++) if (load[p] < load[least] - 1e-9) least = p;
    load[least] += amps;
    phases[i] = names[least];
  }
  const phaseCurrentsA = kind === 'line-to-line' ? lineCurrentsFromPairs(load[0], load[1], load[2]) : (load as [number, number, number]);
  return { phases, phaseCurrentsA };
}

// ---- the words beside the figures ----

/** True for a supply of the 230/400 V family (IEC 60038), where the NEC's 80 % is not the rule. */
export function isIecVoltage(supply: Pick<Supply, 'voltage' | 'phases'>): boolean {
  return supply.phases === 1 ? within(supply.voltage, 220, 240) : within(supply.voltage, 380, 415);
}

/** Which code a continuous-load factor comes from, in one sentence for the plan. */
export function continuousLoadNote(supply: Pick<Supply, 'voltage' | 'phases' | 'continuousFactor'>): string {
  const percent = `${Math.round(supply.continuousFactor * 1000) / 10} %`;
  const basis =
    Math.abs(supply.continuousFactor - NEC_CONTINUOUS_FACTOR) < 1e-9
      ? `Circuits are loaded to ${percent} of the breaker: the US National Electrical Code's rule for continuous loads (NEC 210.19(A), 210.20(A): 125 % of the continuous load).`
      : `Circuits are loaded to ${percent} of the breaker, as typed.`;
  return isIecVoltage(supply)
    ? `${basis} On a 230/400 V supply the local wiring code, not the NEC, sets this figure.`
    : `${basis} Outside the US the local code sets the figure.`;
}
