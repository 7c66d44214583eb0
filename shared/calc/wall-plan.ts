// The wall plan: what a grid of identical cabinets adds up to (size, pixels, power, circuits and
// phases, heat, weight, outputs, viewing distances, how an input maps onto it) and the checks an
// installer makes before wiring it. Planning estimates only.
import { cellLabel } from './grid.js';
import {
  assignPhases,
  branchCurrentA,
  chainLimit,
  type BranchKind,
  type CabinetPower,
  type ChainLimit,
  type ChainLimitedBy,
  type PhaseName,
  type PowerFactorSource,
  type Supply,
  wholeUnitsWithin,
} from './electrical.js';
import { generateRuns, type Run, type RunPattern } from './runs.js';
import { formatFeetInches, kgToPounds, mmToFeet, wattsToBtuPerHour } from './units.js';
import { fitInput, INPUT_FORMATS, type InputFit } from './video-signal.js';
import { acuityDistanceM, minViewingDistanceM, pixelPitchMm } from './viewing-distance.js';
import { planChecks, type PlanCheck } from './plan-checks.js';

/** The catalogue figures of one cabinet model that the plan needs. */
export interface CabinetSpec extends CabinetPower {
  widthMm: number;
  heightMm: number;
  pixelsWide: number;
  pixelsHigh: number;
  /** Watts at full white, full brightness: what circuits are sized for. */
  maxPowerW: number;
  /** Watts with ordinary video content. */
  typicalPowerW: number;
  weightKg: number;
  /** Receiving cards in one cabinet (1 unless the model says otherwise). */
  receivingCards?: number;
  /** Pixels one receiving card can drive, when known. */
  receivingCardPixels?: number;
}

/** The processor (sending device) that drives the wall, as far as its datasheet is known. */
export interface ProcessorSpec {
  outputs?: number;
  /** Pixels it can drive in all; outputs × output capacity when left out. */
  pixelCapacity?: number;
  /** The widest and tallest canvas it can drive, pixels. */
  maxWidth?: number;
  maxHeight?: number;
}

export interface WallPlanInput {
  cabinet: CabinetSpec;
  columns: number;
  rows: number;
  supply: Supply;
  /** Pixels one controller output can drive. */
  outputCapacityPixels: number;
  /** The input signal to fit; 1920 × 1080 when not given. */
  input?: { width: number; height: number };
  /** How data and power runs are laid: whole rows by default, as the trade wires them. */
  dataPattern?: RunPattern;
  powerPattern?: RunPattern;
  processor?: ProcessorSpec;
  /** Cable length from the processor to the wall's bottom-left corner (as the audience sees it), metres. */
  dataCableToWallM?: number;
}

/** One branch circuit: one power chain of whole cabinets. */
export interface PlanCircuit {
  circuit: number;
  /** Phase (line-to-neutral) or phase pair (line-to-line) on three phases; null on single phase. */
  phase: PhaseName | null;
  cabinets: number;
  /** At the cabinets' maximum power. */
  watts: number;
  amps: number;
  /** The chain's first and last cabinet, `C1·R1`. */
  from: string;
  to: string;
}

/** One controller output: one data run of whole cabinets. */
export interface PlanOutput {
  output: number;
  cabinets: number;
  pixels: number;
  /** Cable from the processor to the run's first cabinet, metres; null when the distance to the wall is not given. */
  homeRunM: number | null;
  from: string;
  to: string;
}

export interface WallPlan {
  cabinetCount: number;
  /** Overall size, mm and feet, and as tape-measure text (`19' 8-1/4"`). */
  widthMm: number;
  heightMm: number;
  widthFt: number;
  heightFt: number;
  widthFeetInches: string;
  heightFeetInches: string;
  areaM2: number;
  pixelsWide: number;
  pixelsHigh: number;
  totalPixels: number;
  /** Horizontal pitch: cabinet width ÷ pixels across. */
  pixelPitchMm: number;
  /** Vertical pitch: cabinet height ÷ pixels down (the same as across for square pixels). */
  pixelPitchVerticalMm: number;
  pixelsPerM2: number;
  /** Physical width ÷ height. */
  aspectRatio: number;
  maxPowerW: number;
  typicalPowerW: number;
  /** Highest line current at maximum power: the circuits' sum on single phase, the busiest phase on three. */
  maxCurrentA: number;
  typicalCurrentA: number;
  branchKind: BranchKind;
  /** Voltage of one branch circuit: 208 on 208 V three-phase, 230.9 on 400 V, the supply's on single phase. */
  branchVoltageV: number;
  powerFactor: number;
  powerFactorSource: PowerFactorSource;
  continuousFactor: number;
  /** One branch circuit's continuous capacity: V(branch) × breaker × continuous factor × PF. */
  circuitCapacityW: number;
  connectorCapacityW: number | null;
  makerLimitW: number | null;
  /** What one chain may carry: the smallest of circuit, connector and maker's limit. */
  chainLimitW: number;
  chainLimitedBy: ChainLimitedBy;
  inputRangeAssumed: boolean;
  powerPattern: RunPattern;
  cabinetsPerCircuit: number;
  circuitsNeeded: number;
  circuits: PlanCircuit[];
  /** Line currents A, B, C at maximum power on a three-phase supply; null on single phase. */
  phaseCurrentsA: [number, number, number] | null;
  /** Heat at maximum power. */
  heatBtuPerHour: number;
  weightKg: number;
  weightLb: number;
  dataPattern: RunPattern;
  cabinetsPerOutput: number;
  outputsNeeded: number;
  outputs: PlanOutput[];
  receivingCards: number;
  pixelsPerReceivingCard: number;
  minViewingDistanceM: number;
  acuityDistanceM: number;
  inputFit: InputFit;
  /** The installer's checks and the notes on what the figures rest on. */
  checks: PlanCheck[];
}

/** The default run layout: each output and each circuit takes whole rows (common practice). */
export const DEFAULT_RUN_PATTERN: RunPattern = 'rows';

const ends = (run: Run) => ({ from: cellLabel(run.cells[0]), to: cellLabel(run.cells[run.cells.length - 1]) });

/** The branch circuits: the power runs of the chosen pattern, each on its phase. */
function planCircuits(plan: WallPlanInput, pattern: RunPattern, limit: ChainLimit) {
  const runs = generateRuns(plan.columns, plan.rows, pattern, {
    kind: 'power',
    cabinetMaxPowerW: plan.cabinet.maxPowerW,
    chainCapacityW: limit.chainLimitW,
  });
  const amps = runs.map((r) => branchCurrentA(limit, r.cells.length * plan.cabinet.maxPowerW));
  const { phases, phaseCurrentsA } = assignPhases(amps, limit.branch.kind);
  const circuits: PlanCircuit[] = runs.map((r, i) => ({
    circuit: r.index,
    phase: phases[i],
    cabinets: r.cells.length,
    watts: r.cells.length * plan.cabinet.maxPowerW,
    amps: amps[i],
    ...ends(r),
  }));
  return { circuits, phaseCurrentsA };
}

/**
 * The controller outputs: the data runs of the chosen pattern. A run's home run is the cable
 * from the processor to the wall's bottom-left corner (as the audience sees it) plus the path
 * along the back of the wall to the run's first cabinet (across, then up, to its centre).
 */
function planOutputs(plan: WallPlanInput, pattern: RunPattern): PlanOutput[] {
  const { cabinet, columns, rows } = plan;
  const cabinetPixels = cabinet.pixelsWide * cabinet.pixelsHigh;
  const runs = generateRuns(columns, rows, pattern, { kind: 'data', cabinetPixels, outputCapacityPixels: plan.outputCapacityPixels });
  return runs.map((r) => {
    const first = r.cells[0];
    const alongWallM = ((first.column - 0.5) * cabinet.widthMm + (rows - first.row + 0.5) * cabinet.heightMm) / 1000;
    return {
      output: r.index,
      cabinets: r.cells.length,
      pixels: r.cells.length * cabinetPixels,
      homeRunM: plan.dataCableToWallM === undefined ? null : plan.dataCableToWallM + alongWallM,
      ...ends(r),
    };
  });
}

/**
 * Plans a `columns` × `rows` wall of one cabinet model.
 *
 * - size: width = columns × cabinet width, height = rows × cabinet height (mm); area in m².
 * - power: a chain of cabinets is one single-phase branch circuit (`chainLimit`): whole cabinets
 *   per chain from the smallest of circuit, connector and maker's limit; the circuits are the
 *   power runs of the chosen pattern (whole rows by default), spread over the phases of a
 *   three-phase supply as evenly as whole circuits allow.
 * - heat: max W × 3.412142 BTU/h; weight in kg and lb.
 * - outputs: a cabinet is never split between outputs; the outputs are the data runs of the
 *   chosen pattern (whole rows by default).
 * - viewing: 1 m per mm of the coarser pitch (closest), pitch × 3,438 (acuity limit); the input
 *   is fitted with both pitches, so non-square pixels keep the picture's shape.
 *
 * Throws when the supply cannot feed the cabinet or one cabinet alone is over the chain or the
 * output; the request schema refuses those inputs first, naming the field.
 */
export function planWall(plan: WallPlanInput): WallPlan {
  const { cabinet, columns, rows, supply } = plan;
  const measured = measureWall(cabinet, columns, rows);
  const limit = chainLimit(supply, cabinet);
  const powerPattern = plan.powerPattern ?? DEFAULT_RUN_PATTERN;
  const dataPattern = plan.dataPattern ?? DEFAULT_RUN_PATTERN;
  const { circuits, phaseCurrentsA } = planCircuits(plan, powerPattern, limit);
  const outputs = planOutputs(plan, dataPattern);
  const maxCurrentA = phaseCurrentsA ? Math.max(...phaseCurrentsA) : branchCurrentA(limit, measured.maxPowerW);
  const cards = cabinet.receivingCards ?? 1;
  const input = plan.input ?? INPUT_FORMATS.hd;

  const result: Omit<WallPlan, 'checks'> = {
    ...measured,
    maxCurrentA,
    typicalCurrentA: maxCurrentA * (cabinet.typicalPowerW / cabinet.maxPowerW),
    branchKind: limit.branch.kind,
    branchVoltageV: limit.branch.voltageV,
    powerFactor: limit.powerFactor,
    powerFactorSource: limit.powerFactorSource,
    continuousFactor: supply.continuousFactor,
    circuitCapacityW: limit.circuitCapacityW,
    connectorCapacityW: limit.connectorCapacityW,
    makerLimitW: limit.makerLimitW,
    chainLimitW: limit.chainLimitW,
    chainLimitedBy: limit.chainLimitedBy,
    inputRangeAssumed: limit.inputRangeAssumed,
    powerPattern,
    cabinetsPerCircuit: limit.cabinetsPerChain,
    circuitsNeeded: circuits.length,
    circuits,
    phaseCurrentsA,
    dataPattern,
    cabinetsPerOutput: wholeUnitsWithin(plan.outputCapacityPixels, cabinet.pixelsWide * cabinet.pixelsHigh),
    outputsNeeded: outputs.length,
    outputs,
    receivingCards: measured.cabinetCount * cards,
    pixelsPerReceivingCard: (cabinet.pixelsWide * cabinet.pixelsHigh) / cards,
    inputFit: fitInput(
      input,
      { width: measured.pixelsWide, height: measured.pixelsHigh },
      { xMm: measured.pixelPitchMm, yMm: measured.pixelPitchVerticalMm },
    ),
  };
  return { ...result, checks: planChecks(plan, result) };
}

/** What a wall is by its grid alone: size, pixels, total power and heat, weight, viewing distances. */
export type WallMeasures = Pick<
  WallPlan,
  | 'cabinetCount'
  | 'widthMm'
  | 'heightMm'
  | 'widthFt'
  | 'heightFt'
  | 'widthFeetInches'
  | 'heightFeetInches'
  | 'areaM2'
  | 'pixelsWide'
  | 'pixelsHigh'
  | 'totalPixels'
  | 'pixelPitchMm'
  | 'pixelPitchVerticalMm'
  | 'pixelsPerM2'
  | 'aspectRatio'
  | 'maxPowerW'
  | 'typicalPowerW'
  | 'heatBtuPerHour'
  | 'weightKg'
  | 'weightLb'
  | 'minViewingDistanceM'
  | 'acuityDistanceM'
>;

/**
 * The figures of a `columns` × `rows` wall that need no supply: size, pixels, pitch both ways,
 * total power and heat, weight, and viewing distances from the coarser pitch.
 */
export function measureWall(
  cabinet: Pick<CabinetSpec, 'widthMm' | 'heightMm' | 'pixelsWide' | 'pixelsHigh' | 'maxPowerW' | 'typicalPowerW' | 'weightKg'>,
  columns: number,
  rows: number,
): WallMeasures {
  const cabinetCount = columns * rows;
  const widthMm = columns * cabinet.widthMm;
  const heightMm = rows * cabinet.heightMm;
  const areaM2 = (widthMm / 1000) * (heightMm / 1000);
  const pixelsWide = columns * cabinet.pixelsWide;
  const pixelsHigh = rows * cabinet.pixelsHigh;
  const totalPixels = pixelsWide * pixelsHigh;
  const maxPowerW = cabinetCount * cabinet.maxPowerW;
  const pitchX = pixelPitchMm(cabinet.widthMm, cabinet.pixelsWide);
  const pitchY = pixelPitchMm(cabinet.heightMm, cabinet.pixelsHigh);
  const coarser = Math.max(pitchX, pitchY);
  return {
    cabinetCount,
    widthMm,
    heightMm,
    widthFt: mmToFeet(widthMm),
    heightFt: mmToFeet(heightMm),
    widthFeetInches: formatFeetInches(widthMm),
    heightFeetInches: formatFeetInches(heightMm),
    areaM2,
    pixelsWide,
    pixelsHigh,
    totalPixels,
    pixelPitchMm: pitchX,
    pixelPitchVerticalMm: pitchY,
    pixelsPerM2: totalPixels / areaM2,
    aspectRatio: widthMm / heightMm,
    maxPowerW,
    typicalPowerW: cabinetCount * cabinet.typicalPowerW,
    heatBtuPerHour: wattsToBtuPerHour(maxPowerW),
    weightKg: cabinetCount * cabinet.weightKg,
    weightLb: kgToPounds(cabinetCount * cabinet.weightKg),
    minViewingDistanceM: minViewingDistanceM(coarser),
    acuityDistanceM: acuityDistanceM(coarser),
  };
}

export interface GridOption {
  columns: number;
  rows: number;
  widthMm: number;
  heightMm: number;
  /** Built size minus target size, mm (negative: smaller than asked). */
  widthErrorMm: number;
  heightErrorMm: number;
  /** √(width error² + height error²), mm: what the options are ranked by. */
  errorMm: number;
}

/** Whole cabinets below and above a length: {floor, ceil} of length ÷ cabinet, at least 1. */
function wholeCounts(targetMm: number, cabinetMm: number): number[] {
  // Rounded to 1e-9 so that 3,000 ÷ 500 stays 6 and does not offer 7 as "round up".
  const exact = Math.round((targetMm / cabinetMm) * 1e9) / 1e9;
  return [...new Set([Math.max(1, Math.floor(exact)), Math.max(1, Math.ceil(exact))])];
}

/**
 * The column × row grids closest to a target size: every round-down / round-up combination
 * of target ÷ cabinet size (up to four), closest first (by `errorMm`, then fewer cabinets).
 * 20 ft × 10 ft (6,096 × 3,048 mm) of 500 mm cabinets → 12 × 6 first.
 */
export function nearestGrids(
  cabinet: Pick<CabinetSpec, 'widthMm' | 'heightMm'>,
  targetWidthMm: number,
  targetHeightMm: number,
): GridOption[] {
  if (!(cabinet.widthMm > 0 && cabinet.heightMm > 0 && targetWidthMm > 0 && targetHeightMm > 0)) {
    throw new RangeError('Cabinet and target sizes must be positive.');
  }
  const options: GridOption[] = [];
  for (const columns of wholeCounts(targetWidthMm, cabinet.widthMm)) {
    for (const rows of wholeCounts(targetHeightMm, cabinet.heightMm)) {
      const widthMm = columns * cabinet.widthMm;
      const heightMm = rows * cabinet.heightMm;
      const widthErrorMm = widthMm - targetWidthMm;
      const heightErrorMm = heightMm - targetHeightMm;
      options.push({ columns, rows, widthMm, heightMm, widthErrorMm, heightErrorMm, errorMm: Math.hypot(widthErrorMm, heightErrorMm) });
    }
  }
  return options.sort((a, b) => a.errorMm - b.errorMm || a.columns * a.rows - b.columns * b.rows);
}
