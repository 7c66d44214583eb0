// The as-built plan of a demo wall: its supply and its data and power runs by whole rows, laid
// by the same shared calculations the planner uses.
import { generateRuns, type RunLimits } from '../../../shared/calc/runs.js';
import { DEFAULT_OUTPUT_CAPACITY_PIXELS } from '../../../shared/calc/video-signal.js';
import { DEFAULT_RUN_PATTERN } from '../../../shared/calc/wall-plan.js';
import { runLimitsFor, safeChainCapacityW, storedRunsOf, type PlanSettings, type RunCabinet } from '../../../shared/schemas/wall-plan.js';
import type { WallRuns } from '../schema/walls.js';
import type { WallSpec } from './register.js';

type Grid = Pick<WallSpec, 'columns' | 'rows'>;

function storedRuns(wall: Grid, limits: RunLimits): WallRuns {
  return storedRunsOf({ pattern: DEFAULT_RUN_PATTERN, runs: generateRuns(wall.columns, wall.rows, DEFAULT_RUN_PATTERN, limits) }, limits);
}

/**
 * Controller outputs the wall uses: one data line per whole row, or per whole column on a wall
 * where that takes fewer (a tall, narrow side wall), a line split only where it is over one output.
 */
export function dataLinesInUse(wall: Grid, model: RunCabinet): number {
  const limits: RunLimits = {
    kind: 'data',
    cabinetPixels: model.pixelsWide * model.pixelsHigh,
    outputCapacityPixels: DEFAULT_OUTPUT_CAPACITY_PIXELS,
  };
  return Math.min(
    generateRuns(wall.columns, wall.rows, 'rows', limits).length,
    generateRuns(wall.columns, wall.rows, 'columns', limits).length,
  );
}

/** The wall's stored plan columns: its supply and runs when the as-built plan is on file, else none. */
export function asBuiltPlan(wall: Grid & Pick<WallSpec, 'asBuilt'>, model: RunCabinet) {
  if (!wall.asBuilt) return { planSettings: null, dataRuns: null, powerRuns: null };
  const settings: PlanSettings = {
    supply: wall.asBuilt,
    outputCapacityPixels: DEFAULT_OUTPUT_CAPACITY_PIXELS,
    chainCapacityW: safeChainCapacityW(wall.asBuilt, model),
  };
  return {
    planSettings: settings,
    dataRuns: storedRuns(wall, runLimitsFor('data', model, settings)),
    powerRuns: storedRuns(wall, runLimitsFor('power', model, settings)),
  };
}
