// The wall plan: what a grid of identical cabinets adds up to (size, pixels, power, heat,
// weight, outputs, viewing distances, how an input maps onto it). Planning estimates only.
import { circuitCapacityW, currentForPower, groupsNeeded, wholeUnitsWithin, type Supply } from './electrical.js';
import { formatFeetInches, kgToPounds, mmToFeet, wattsToBtuPerHour } from './units.js';
import { fitInput, INPUT_FORMATS, type InputFit } from './video-signal.js';
import { acuityDistanceM, minViewingDistanceM, pixelPitchMm } from './viewing-distance.js';

/** The catalogue figures of one cabinet model that the plan needs. */
export interface CabinetSpec {
  widthMm: number;
  heightMm: number;
  pixelsWide: number;
  pixelsHigh: number;
  /** Watts at full white, full brightness: what circuits are sized for. */
  maxPowerW: number;
  /** Watts with ordinary video content. */
  typicalPowerW: number;
  weightKg: number;
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
  pixelsPerM2: number;
  /** Physical width ÷ height. */
  aspectRatio: number;
  maxPowerW: number;
  typicalPowerW: number;
  /** Current at maximum power, per phase on a three-phase supply. */
  maxCurrentA: number;
  typicalCurrentA: number;
  circuitCapacityW: number;
  cabinetsPerCircuit: number;
  circuitsNeeded: number;
  /** Heat at maximum power. */
  heatBtuPerHour: number;
  weightKg: number;
  weightLb: number;
  cabinetsPerOutput: number;
  outputsNeeded: number;
  minViewingDistanceM: number;
  acuityDistanceM: number;
  inputFit: InputFit;
}

/**
 * Plans a `columns` × `rows` wall of one cabinet model.
 *
 * - size: width = columns × cabinet width, height = rows × cabinet height (mm); area in m².
 * - power: cabinets × max (or typical) W; current I = P ÷ (V·PF), or ÷ (√3·V·PF) per phase.
 * - circuits: whole cabinets per circuit = floor(circuit capacity ÷ cabinet max W), circuits =
 *   ceil(cabinets ÷ that); the capacity is V·I(breaker)·continuous factor·PF (×√3 for 3 phases).
 * - heat: max W × 3.412142 BTU/h; weight in kg and lb.
 * - outputs: a cabinet is never split between outputs, so whole cabinets per output =
 *   floor(capacity ÷ cabinet pixels) and outputs = ceil(cabinets ÷ that).
 * - viewing: 1 m per mm of pitch (closest), pitch × 3,438 (acuity limit).
 *
 * Throws when one cabinet alone is over the circuit or output capacity; the request schema
 * refuses those inputs first, naming the field.
 */
export function planWall(plan: WallPlanInput): WallPlan {
  const { cabinet, columns, rows, supply } = plan;
  const cabinetCount = columns * rows;
  const widthMm = columns * cabinet.widthMm;
  const heightMm = rows * cabinet.heightMm;
  const areaM2 = (widthMm / 1000) * (heightMm / 1000);
  const pixelsWide = columns * cabinet.pixelsWide;
  const pixelsHigh = rows * cabinet.pixelsHigh;
  const totalPixels = pixelsWide * pixelsHigh;
  const maxPowerW = cabinetCount * cabinet.maxPowerW;
  const typicalPowerW = cabinetCount * cabinet.typicalPowerW;
  const capacityW = circuitCapacityW(supply);
  const cabinetsPerCircuit = wholeUnitsWithin(capacityW, cabinet.maxPowerW);
  const cabinetsPerOutput = wholeUnitsWithin(plan.outputCapacityPixels, cabinet.pixelsWide * cabinet.pixelsHigh);
  const pitch = pixelPitchMm(cabinet.widthMm, cabinet.pixelsWide);
  const input = plan.input ?? INPUT_FORMATS.hd;
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
    pixelPitchMm: pitch,
    pixelsPerM2: totalPixels / areaM2,
    aspectRatio: widthMm / heightMm,
    maxPowerW,
    typicalPowerW,
    maxCurrentA: currentForPower(supply, maxPowerW),
    typicalCurrentA: currentForPower(supply, typicalPowerW),
    circuitCapacityW: capacityW,
    cabinetsPerCircuit,
    circuitsNeeded: groupsNeeded(cabinetCount, cabinetsPerCircuit),
    heatBtuPerHour: wattsToBtuPerHour(maxPowerW),
    weightKg: cabinetCount * cabinet.weightKg,
    weightLb: kgToPounds(cabinetCount * cabinet.weightKg),
    cabinetsPerOutput,
    outputsNeeded: groupsNeeded(cabinetCount, cabinetsPerOutput),
    minViewingDistanceM: minViewingDistanceM(pitch),
    acuityDistanceM: acuityDistanceM(pitch),
    inputFit: fitInput(input, { width: pixelsWide, height: pixelsHigh }),
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
export function nearestGrids(cabinet: Pick<CabinetSpec, 'widthMm' | 'heightMm'>, targetWidthMm: number, targetHeightMm: number): GridOption[] {
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
