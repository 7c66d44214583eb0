// The planner's form: the fields people fill in, checked with the same shared schema the wall-plan
// API uses (its issues land on the fields of the same name), and turned into a plan request.
import { runPatterns, type RunPattern } from '@shared/calc/runs';
import { feetToMm } from '@shared/calc/units';
import { DEFAULT_OUTPUT_CAPACITY_PIXELS, INPUT_FORMATS } from '@shared/calc/video-signal';
import { nearestGrids, type CabinetSpec, type GridOption, type WallPlanInput } from '@shared/calc/wall-plan';
import { cabinetSpecInput, supplyInput, wallPlanRequest, type WallPlanRequest } from '@shared/schemas/calc';
import type { CabinetModel } from '@shared/schemas/cabinet-models';
import type { WallDetail } from '@shared/schemas/walls';
import { z } from 'zod';

export const inputPresets = ['hd', 'uhd', 'custom'] as const;
export type InputPreset = (typeof inputPresets)[number];
export const lengthUnits = ['m', 'ft'] as const;
export type LengthUnit = (typeof lengthUnits)[number];

/** The largest grid a wall may have (the register's limit). */
export const MAX_GRID = 500;

const gridCount = (label: string) =>
  z
    .number({ error: `${label} must be a number.` })
    .int(`${label} must be a whole number.`)
    .min(1, `At least one ${label.toLowerCase().replace(/s$/, '')}.`)
    .max(MAX_GRID, `At most ${MAX_GRID} ${label.toLowerCase()}.`);
/** A number field that only matters in some modes: NaN (an empty box) is checked later, by mode. */
const maybeNumber = z.number().or(z.nan());
/** A datasheet figure that may be left empty (NaN): "not known". Checked by the plan's own schema. */
const optionalFigure = maybeNumber.optional();

// The cabinet's required figures as the API checks them; its datasheet extras may stay empty.
const {
  maxPowerVA: _va,
  inputVoltageMinV: _min,
  inputVoltageMaxV: _max,
  passThroughAmps: _pass,
  maxPerChain: _chain,
  receivingCards: _cards,
  receivingCardPixels: _cardPx,
  ...requiredCabinet
} = cabinetSpecInput.shape;
const formCabinet = z.object({
  ...requiredCabinet,
  maxPowerVA: optionalFigure,
  inputVoltageMinV: optionalFigure,
  inputVoltageMaxV: optionalFigure,
  passThroughAmps: optionalFigure,
  maxPerChain: optionalFigure,
  receivingCardPixels: optionalFigure,
});

export const plannerFormSchema = z
  .object({
    /** The catalogue model, or '' for a cabinet typed in by hand. */
    modelId: z.string(),
    cabinet: formCabinet,
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
    // Power factor left empty: the datasheet's volt-amperes, else 0.95.
    supply: supplyInput.extend({ powerFactor: optionalFigure }),
    outputCapacityPixels: z
      .number({ error: 'Output capacity must be a number.' })
      .int('Output capacity must be a whole number.')
      .positive('Output capacity must be more than zero.')
      .max(100_000_000, 'Output capacity must be at most 100,000,000.'),
    inputPreset: z.enum(inputPresets),
    input: z.object({ width: maybeNumber, height: maybeNumber }),
    /** The processor's outputs and the cable from it to the wall, when known. */
    processorOutputs: optionalFigure,
    dataCableToWallM: optionalFigure,
    dataPattern: z.enum(runPatterns),
    powerPattern: z.enum(runPatterns),
  })
  .superRefine(
    (v, ctx) => {
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
      // The API's own rules (each figure, the supply against the cabinet's input range, one cabinet
      // over an output or a chain, input sizes): the same paths here.
      const request = wallPlanRequest.safeParse(toPlanRequest(v));
      if (!request.success) {
        for (const issue of request.error.issues) {
          if (issue.path[0] === 'input' && v.inputPreset !== 'custom') continue;
          const path = issue.path[0] === 'processor' ? ['processorOutputs'] : (issue.path as (string | number)[]);
          ctx.addIssue({ code: 'custom', path, message: issue.message });
        }
      }
    },
    { when: (payload) => payload.issues.length === 0 },
  );

export type PlannerFormInput = z.input<typeof plannerFormSchema>;
export type PlannerForm = z.output<typeof plannerFormSchema>;

/** The picture the plan fits onto the wall. */
export function inputOf(v: Pick<PlannerForm, 'inputPreset' | 'input'>): { width: number; height: number } {
  return v.inputPreset === 'custom' ? { width: v.input.width, height: v.input.height } : INPUT_FORMATS[v.inputPreset];
}

/** A typed figure, or undefined for an empty box. */
const known = (v: number | undefined) => (v === undefined || Number.isNaN(v) ? undefined : v);

/** The request the wall-plan API would take for these fields (and what planWall computes). */
export function toPlanRequest(v: PlannerForm): WallPlanRequest {
  const outputs = known(v.processorOutputs);
  return {
    cabinet: cabinetOf(v),
    columns: v.columns,
    rows: v.rows,
    supply: { ...v.supply, powerFactor: known(v.supply.powerFactor) },
    outputCapacityPixels: v.outputCapacityPixels,
    input: inputOf(v),
    dataPattern: v.dataPattern,
    powerPattern: v.powerPattern,
    ...(outputs === undefined ? {} : { processor: { outputs } }),
    dataCableToWallM: known(v.dataCableToWallM),
  };
}

export function cabinetOf(v: Pick<PlannerForm, 'cabinet' | 'cardsPerCabinet'>): CabinetSpec {
  const c = v.cabinet;
  return {
    widthMm: c.widthMm,
    heightMm: c.heightMm,
    pixelsWide: c.pixelsWide,
    pixelsHigh: c.pixelsHigh,
    maxPowerW: c.maxPowerW,
    typicalPowerW: c.typicalPowerW,
    weightKg: c.weightKg,
    maxPowerVA: known(c.maxPowerVA),
    inputVoltageMinV: known(c.inputVoltageMinV),
    inputVoltageMaxV: known(c.inputVoltageMaxV),
    passThroughAmps: known(c.passThroughAmps),
    maxPerChain: known(c.maxPerChain),
    receivingCards: v.cardsPerCabinet,
    receivingCardPixels: known(c.receivingCardPixels),
  };
}

/** The validated plan input for planWall. */
export function planInputOf(v: PlannerForm): WallPlanInput {
  return wallPlanRequest.parse(toPlanRequest(v)) as WallPlanInput;
}

/** The patterns a plan's runs are laid by. */
export const patternsOf = (v: Pick<PlannerForm, 'dataPattern' | 'powerPattern'>): { data: RunPattern; power: RunPattern } => ({
  data: v.dataPattern,
  power: v.powerPattern,
});

/** A target length in mm from what was typed. */
export const targetMm = (value: number, unit: LengthUnit) => (unit === 'm' ? value * 1000 : feetToMm(value));

/**
 * The grids closest to the typed target size, within the register's limit; an empty list while
 * the cabinet or the target is not valid yet.
 */
export function gridOptions(
  cabinet: { widthMm?: number; heightMm?: number } | undefined,
  target: { unit?: LengthUnit; width?: number; height?: number } | undefined,
): GridOption[] {
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
export const defaultCustomCabinet = {
  widthMm: 500,
  heightMm: 500,
  pixelsWide: 192,
  pixelsHigh: 192,
  maxPowerW: 180,
  typicalPowerW: 60,
  weightKg: 7.5,
  maxPowerVA: Number.NaN,
  inputVoltageMinV: 100,
  inputVoltageMaxV: 240,
  passThroughAmps: Number.NaN,
  maxPerChain: Number.NaN,
  receivingCardPixels: Number.NaN,
};

export const defaultPlannerValues: PlannerFormInput = {
  modelId: '',
  cabinet: defaultCustomCabinet,
  cardsPerCabinet: 1,
  gridMode: 'grid',
  columns: 8,
  rows: 4,
  target: { unit: 'm', width: Number.NaN, height: Number.NaN },
  // A 120 V, 20 A single-phase circuit loaded to 80 % (NEC 210.19(A)(1), 210.20(A)); the power
  // factor from the datasheet, else 0.95.
  supply: { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8, powerFactor: Number.NaN },
  outputCapacityPixels: DEFAULT_OUTPUT_CAPACITY_PIXELS,
  inputPreset: 'hd',
  input: { width: 1920, height: 1080 },
  processorOutputs: Number.NaN,
  dataCableToWallM: Number.NaN,
  // Whole rows per data line and per power chain, as the trade wires them (common practice).
  dataPattern: 'rows',
  powerPattern: 'rows',
};

export const runPatternLabels: Record<(typeof runPatterns)[number], string> = {
  rows: 'Rows',
  columns: 'Columns',
  serpentine: 'Serpentine',
};

const orEmpty = (v: number | null) => v ?? Number.NaN;

/** The catalogue figures a model puts into the form (a figure the datasheet lacks stays empty). */
export function cabinetFromModel(m: CabinetModel): PlannerFormInput['cabinet'] {
  return {
    widthMm: m.widthMm,
    heightMm: m.heightMm,
    pixelsWide: m.pixelsWide,
    pixelsHigh: m.pixelsHigh,
    maxPowerW: m.maxPowerW,
    typicalPowerW: m.typicalPowerW,
    weightKg: m.weightKg,
    maxPowerVA: orEmpty(m.maxPowerVA),
    inputVoltageMinV: m.inputVoltageMinV,
    inputVoltageMaxV: m.inputVoltageMaxV,
    passThroughAmps: orEmpty(m.passThroughAmps),
    maxPerChain: orEmpty(m.maxPerChain),
    receivingCardPixels: Number.NaN,
  };
}

const patternOf = (stored: { pattern: string } | null, fallback: RunPattern): RunPattern =>
  stored && (runPatterns as readonly string[]).includes(stored.pattern) ? (stored.pattern as RunPattern) : fallback;

/** The form filled in from a wall of the register: its model, grid, stored settings and run patterns. */
export function valuesFromWall(wall: WallDetail): PlannerFormInput {
  const settings = wall.planSettings;
  const controller = wall.controllers[0];
  return {
    ...defaultPlannerValues,
    modelId: wall.cabinetModel.id,
    cabinet: cabinetFromModel(wall.cabinetModel),
    columns: wall.columns,
    rows: wall.rows,
    ...(settings
      ? {
          supply: { ...settings.supply, powerFactor: settings.supply.powerFactor ?? Number.NaN },
          outputCapacityPixels: settings.outputCapacityPixels,
        }
      : controller
        ? { outputCapacityPixels: controller.pixelsPerOutput }
        : {}),
    processorOutputs: controller?.outputs ?? Number.NaN,
    dataPattern: patternOf(wall.dataRuns, defaultPlannerValues.dataPattern as RunPattern),
    powerPattern: patternOf(wall.powerRuns, defaultPlannerValues.powerPattern as RunPattern),
  };
}
