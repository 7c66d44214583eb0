// The planner's form: the fields people fill in, checked with the same shared schema the wall-plan
// API uses (its issues land on the fields of the same name), and turned into a plan request.
import { circuitCapacityW, wholeUnitsWithin } from '@shared/calc/electrical';
import { runPatterns } from '@shared/calc/runs';
import { feetToMm } from '@shared/calc/units';
import { DEFAULT_OUTPUT_CAPACITY_PIXELS, INPUT_FORMATS } from '@shared/calc/video-signal';
import { nearestGrids, type CabinetSpec, type GridOption, type WallPlanInput } from '@shared/calc/wall-plan';
import { cabinetSpecInput, supplyInput, wallPlanRequest } from '@shared/schemas/calc';
import { z } from 'zod';

export const inputPresets = ['hd', 'uhd', 'custom'] as const;
export type InputPreset = (typeof inputPresets)[number];
export const lengthUnits = ['m', 'ft'] as const;
export type LengthUnit = (typeof lengthUnits)[number];

/** The largest grid a wall may have (the register's limit). */
export const MAX_GRID = 500;

const count = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 });
const gridCount = (label: string) =>
  z
    .number({ error: `${label} must be a number.` })
    .int(`${label} must be a whole number.`)
    .min(1, `At least one ${label.toLowerCase().replace(/s$/, '')}.`)
    .max(MAX_GRID, `At most ${MAX_GRID} ${label.toLowerCase()}.`);
/** A number field that only matters in some modes: NaN (an empty box) is checked later, by mode. */
const maybeNumber = z.number().or(z.nan());

export const plannerFormSchema = z
  .object({
    /** The catalogue model, or '' for a cabinet typed in by hand. */
    modelId: z.string(),
    cabinet: cabinetSpecInput,
    /** Receiving cards in one cabinet: one unless the model says otherwise. */
    cardsPerCabinet: z
      .number({ error: 'Receiving cards must be a number.' })
      .int('Receiving cards must be a whole number.')
      .min(1, 'At least one receiving card.')
      .max(16, 'At most 16 receiving cards.'),
    gridMode: z.enum(['grid', 'size']),
    columns: gridCount('Columns'),
    rows: gridCount('Rows'),
    target: z.object({ unit: z.enum(lengthUnits), width: maybeNumber, height: maybeNumber }),
    supply: supplyInput,
    outputCapacityPixels: z
      .number({ error: 'Output capacity must be a number.' })
      .int('Output capacity must be a whole number.')
      .positive('Output capacity must be more than zero.')
      .max(100_000_000, 'Output capacity must be at most 100,000,000.'),
    /** One power chain per circuit (the chain carries what the circuit may), or a typed limit. */
    chainFollowsCircuit: z.boolean(),
    chainCapacityW: maybeNumber,
    inputPreset: z.enum(inputPresets),
    input: z.object({ width: maybeNumber, height: maybeNumber }),
  })
  .superRefine((v, ctx) => {
    const positive = (value: number, path: (string | number)[], label: string, whole = false) => {
      if (!Number.isFinite(value)) ctx.addIssue({ code: 'custom', path, message: `${label} must be a number.` });
      else if (value <= 0) ctx.addIssue({ code: 'custom', path, message: `${label} must be more than zero.` });
      else if (whole && !Number.isInteger(value)) ctx.addIssue({ code: 'custom', path, message: `${label} must be a whole number.` });
      else return true;
      return false;
    };
    if (v.gridMode === 'size') {
      positive(v.target.width, ['target', 'width'], 'Width');
      positive(v.target.height, ['target', 'height'], 'Height');
    }
    if (v.inputPreset === 'custom') {
      positive(v.input.width, ['input', 'width'], 'Input width', true);
      positive(v.input.height, ['input', 'height'], 'Input height', true);
    }
    if (!v.chainFollowsCircuit && positive(v.chainCapacityW, ['chainCapacityW'], 'Chain capacity')) {
      if (wholeUnitsWithin(v.chainCapacityW, v.cabinet.maxPowerW) < 1) {
        ctx.addIssue({ code: 'custom', path: ['chainCapacityW'], message: `One cabinet (${count.format(v.cabinet.maxPowerW)} W) is over the chain capacity.` });
      }
    }
    // The API's own rules (one cabinet over an output or a circuit, input sizes): same paths here.
    const request = wallPlanRequest.safeParse(toPlanRequest(v));
    if (!request.success) {
      for (const issue of request.error.issues) {
        if (issue.path[0] === 'input' && v.inputPreset !== 'custom') continue;
        ctx.addIssue({ code: 'custom', path: issue.path as (string | number)[], message: issue.message });
      }
    }
  }, { when: (payload) => payload.issues.length === 0 });

export type PlannerFormInput = z.input<typeof plannerFormSchema>;
export type PlannerForm = z.output<typeof plannerFormSchema>;

/** The picture the plan fits onto the wall. */
export function inputOf(v: Pick<PlannerForm, 'inputPreset' | 'input'>): { width: number; height: number } {
  return v.inputPreset === 'custom' ? { width: v.input.width, height: v.input.height } : INPUT_FORMATS[v.inputPreset];
}

/** The request the wall-plan API would take for these fields (and what planWall computes). */
export function toPlanRequest(v: PlannerForm) {
  return {
    cabinet: cabinetOf(v),
    columns: v.columns,
    rows: v.rows,
    supply: v.supply,
    outputCapacityPixels: v.outputCapacityPixels,
    input: inputOf(v),
  };
}

export function cabinetOf(v: Pick<PlannerForm, 'cabinet'>): CabinetSpec {
  const c = v.cabinet;
  return {
    widthMm: c.widthMm,
    heightMm: c.heightMm,
    pixelsWide: c.pixelsWide,
    pixelsHigh: c.pixelsHigh,
    maxPowerW: c.maxPowerW,
    typicalPowerW: c.typicalPowerW,
    weightKg: c.weightKg,
  };
}

/** The validated plan input for planWall. */
export function planInputOf(v: PlannerForm): WallPlanInput {
  return wallPlanRequest.parse(toPlanRequest(v)) as WallPlanInput;
}

/** Watts one power chain may carry. */
export function chainCapacityOf(v: Pick<PlannerForm, 'chainFollowsCircuit' | 'chainCapacityW' | 'supply'>): number {
  return v.chainFollowsCircuit ? circuitCapacityW(v.supply) : v.chainCapacityW;
}

/** A target length in mm from what was typed. */
export const targetMm = (value: number, unit: LengthUnit) => (unit === 'm' ? value * 1000 : feetToMm(value));

/**
 * The grids closest to the typed target size, within the register's limit; an empty list while
 * the cabinet or the target is not valid yet.
 */
export function gridOptions(cabinet: { widthMm?: number; heightMm?: number } | undefined, target: { unit?: LengthUnit; width?: number; height?: number } | undefined): GridOption[] {
  const w = Number(cabinet?.widthMm);
  const h = Number(cabinet?.heightMm);
  const tw = Number(target?.width);
  const th = Number(target?.height);
  if (!(w > 0 && h > 0 && tw > 0 && th > 0) || !target?.unit) return [];
  return nearestGrids({ widthMm: w, heightMm: h }, targetMm(tw, target.unit), targetMm(th, target.unit)).filter(
    (o) => o.columns <= MAX_GRID && o.rows <= MAX_GRID,
  );
}

/** A 500 mm indoor cabinet of the common 2.6 mm class (invented figures, typical of the class). */
export const defaultCustomCabinet = { widthMm: 500, heightMm: 500, pixelsWide: 192, pixelsHigh: 192, maxPowerW: 180, typicalPowerW: 60, weightKg: 7.5 };

export const defaultPlannerValues: PlannerFormInput = {
  modelId: '',
  cabinet: defaultCustomCabinet,
  cardsPerCabinet: 1,
  gridMode: 'grid',
  columns: 8,
  rows: 4,
  target: { unit: 'm', width: Number.NaN, height: Number.NaN },
  // A 120 V, 20 A single-phase circuit loaded to 80 % (NEC 210.19(A)(1), 210.20(A)).
  supply: { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8, powerFactor: 1 },
  outputCapacityPixels: DEFAULT_OUTPUT_CAPACITY_PIXELS,
  chainFollowsCircuit: true,
  chainCapacityW: Number.NaN,
  inputPreset: 'hd',
  input: { width: 1920, height: 1080 },
};

export const runPatternLabels: Record<(typeof runPatterns)[number], string> = {
  rows: 'Rows',
  columns: 'Columns',
  serpentine: 'Serpentine',
};
