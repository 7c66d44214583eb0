// The plan stored on a wall (PUT /api/walls/:id/plan): the supply and capacities it was planned
// with, and its data and power runs. The planner, the runs page and the server share these.
import { z } from 'zod';
import { branchOf, chainLimit, type CabinetPower, type Supply } from '../calc/electrical.js';
import { runLoad, runPatterns, type Run, type RunLimits, type RunProblem } from '../calc/runs.js';
import { DEFAULT_OUTPUT_CAPACITY_PIXELS } from '../calc/video-signal.js';
import type { CabinetSpec } from '../calc/wall-plan.js';
import { supplyInput } from './calc.js';
import { wallInput } from './walls.js';

/** How a set of runs was laid: by one of the generator's patterns, or by hand. */
export const storedRunPatterns = [...runPatterns, 'custom'] as const;
export type StoredRunPattern = (typeof storedRunPatterns)[number];

export const runKinds = ['data', 'power'] as const;
export type RunKind = (typeof runKinds)[number];

export const planSettingsInput = z.object({
  supply: supplyInput,
  outputCapacityPixels: z
    .number({ error: 'Output capacity must be a number.' })
    .int('Output capacity must be a whole number.')
    .positive('Output capacity must be more than zero.')
    .max(100_000_000, 'Output capacity must be at most 100,000,000.'),
  /**
   * Watts one power chain may carry. Left out: the chain's limit for this supply and the wall's
   * cabinet model (`safeChainCapacityW`); a lower figure of the crew's own is kept, a higher one
   * refused.
   */
  chainCapacityW: z
    .number({ error: 'Chain capacity must be a number.' })
    .positive('Chain capacity must be more than zero.')
    .max(1_000_000, 'Chain capacity must be at most 1,000,000 W.')
    .optional(),
});
export type PlanSettingsInput = z.input<typeof planSettingsInput>;
/** Settings as stored on a wall: the chain capacity always filled in. */
export type PlanSettings = z.output<typeof planSettingsInput> & { chainCapacityW: number };

const cellInput = z.object({
  column: z.number({ error: 'Column must be a number.' }).int('Column must be a whole number.'),
  row: z.number({ error: 'Row must be a number.' }).int('Row must be a whole number.'),
});

export const wallRunsInput = z.object({
  pattern: z.enum(storedRunPatterns, { error: 'Pattern must be rows, columns, serpentine or custom.' }),
  runs: z
    .array(
      z.object({
        index: z
          .number({ error: 'Run number must be a number.' })
          .int('Run number must be a whole number.')
          .min(1, 'Run numbers start at 1.')
          .max(1_000_000),
        cells: z.array(cellInput).max(250_000, 'Too many cells in one run.'),
      }),
    )
    .max(250_000, 'Too many runs.'),
});
export type WallRunsInput = z.infer<typeof wallRunsInput>;

/**
 * Saves a plan onto a wall. A set of runs left out stays as stored (and is checked again against
 * the new settings); `null` clears it.
 */
export const saveWallPlanRequest = z.object({
  settings: planSettingsInput,
  dataRuns: wallRunsInput.nullable().optional(),
  powerRuns: wallRunsInput.nullable().optional(),
});
export type SaveWallPlanRequest = z.input<typeof saveWallPlanRequest>;

/**
 * A new wall made from the planner's result (POST /api/walls/from-plan): its site and name, the
 * plan's catalogue model and grid, and the plan's settings and runs, stored in one transaction.
 */
export const createWallFromPlanRequest = wallInput
  .pick({ siteId: true, name: true, cabinetModelId: true, columns: true, rows: true, mounting: true })
  .extend(saveWallPlanRequest.shape);
export type CreateWallFromPlanRequest = z.input<typeof createWallFromPlanRequest>;

/** A problem of a saved plan: which set of runs it belongs to, and what is wrong. */
export interface WallRunProblem extends RunProblem {
  kind: RunKind;
}

/** Runs as a wall stores them: each with its load (pixels or watts), and the limit they were laid against. */
export function storedRunsOf(
  input: { pattern: string; runs: { index: number; cells: { column: number; row: number }[] }[] },
  limits: RunLimits,
): StoredWallRuns {
  return {
    pattern: input.pattern,
    runs: input.runs.map((r) => ({
      index: r.index,
      cells: r.cells.map((c) => ({ column: c.column, row: c.row })),
      ...runLoad(limits, r.cells.length),
    })),
    limit: limits.kind === 'data' ? limits.outputCapacityPixels : limits.chainCapacityW,
  };
}

/** As stored on the wall and returned by GET /api/walls/:id. */
export interface StoredWallRuns {
  pattern: string;
  runs: Run[];
  /** Pixels per output (data) or watts per chain (power) the runs were laid against. */
  limit: number;
}
export interface StoredPlanSettings {
  supply: { voltage: number; phases: 1 | 3; breakerAmps: number; continuousFactor: number; powerFactor?: number };
  outputCapacityPixels: number;
  chainCapacityW: number;
}

/** What a run limit needs to know about the cabinet: its pixels and its power connection. */
export interface RunCabinet {
  pixelsWide: number;
  pixelsHigh: number;
  maxPowerW: number;
  maxPowerVA?: number | null;
  inputVoltageMinV?: number | null;
  inputVoltageMaxV?: number | null;
  passThroughAmps?: number | null;
  maxPerChain?: number | null;
}

/** A catalogue model's power figures as the calculations take them (null: not known). */
export function cabinetPowerOf(cabinet: RunCabinet): CabinetPower {
  const known = (v: number | null | undefined) => (v === null || v === undefined ? undefined : v);
  return {
    maxPowerW: cabinet.maxPowerW,
    maxPowerVA: known(cabinet.maxPowerVA),
    inputVoltageMinV: known(cabinet.inputVoltageMinV),
    inputVoltageMaxV: known(cabinet.inputVoltageMaxV),
    passThroughAmps: known(cabinet.passThroughAmps),
    maxPerChain: known(cabinet.maxPerChain),
  };
}

/** A catalogue model as the wall plan takes it: its size, pixels, power, weight and power input. */
export function cabinetSpecOf(m: RunCabinet & { widthMm: number; heightMm: number; typicalPowerW: number; weightKg: number }): CabinetSpec {
  return {
    widthMm: m.widthMm,
    heightMm: m.heightMm,
    pixelsWide: m.pixelsWide,
    pixelsHigh: m.pixelsHigh,
    typicalPowerW: m.typicalPowerW,
    weightKg: m.weightKg,
    ...cabinetPowerOf(m),
  };
}

/**
 * The most one power chain may carry on this supply with this cabinet (the smallest of circuit,
 * connector and maker's limit), or 0 when the supply's voltage cannot feed the cabinet at all.
 */
export function safeChainCapacityW(supply: Supply, cabinet: RunCabinet): number {
  const power = cabinetPowerOf(cabinet);
  return branchOf(supply, power) ? chainLimit(supply, power).chainLimitW : 0;
}

/**
 * The limits of a data or a power run for this cabinet and these settings. A power chain gets
 * the stored capacity only up to the safe limit: settings saved under older, looser rules never
 * let a chain carry more than its circuit, connector or maker allow.
 */
export function runLimitsFor<K extends RunKind>(
  kind: K,
  cabinet: RunCabinet,
  settings: Pick<PlanSettings, 'supply' | 'outputCapacityPixels' | 'chainCapacityW'>,
): Extract<RunLimits, { kind: K }> {
  const limits: RunLimits =
    kind === 'data'
      ? { kind: 'data', cabinetPixels: cabinet.pixelsWide * cabinet.pixelsHigh, outputCapacityPixels: settings.outputCapacityPixels }
      : {
          kind: 'power',
          cabinetMaxPowerW: cabinet.maxPowerW,
          chainCapacityW: Math.min(settings.chainCapacityW, safeChainCapacityW(settings.supply, cabinet)),
        };
  return limits as Extract<RunLimits, { kind: K }>;
}

/**
 * Settings a wall is planned with when none are stored: a 20 A single-phase circuit loaded to
 * 80 % (NEC 210.19(A)(1), 210.20(A)) at 120 V, or at 230 V for a cabinet that does not take
 * 120 V; one power chain per circuit at its safe limit; 650,000 pixels per output (1 Gbit/s at
 * 24 bit, 60 Hz).
 */
export function defaultPlanSettings(cabinet: RunCabinet, outputCapacityPixels = DEFAULT_OUTPUT_CAPACITY_PIXELS): PlanSettings {
  const at120 = { voltage: 120, phases: 1 as const, breakerAmps: 20, continuousFactor: 0.8 };
  const supply = branchOf(at120, cabinetPowerOf(cabinet)) ? at120 : { ...at120, voltage: 230 };
  return { supply, outputCapacityPixels, chainCapacityW: safeChainCapacityW(supply, cabinet) };
}
