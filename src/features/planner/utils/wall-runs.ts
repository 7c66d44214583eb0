// A wall's runs as the runs page and the print view show them: the stored ones, or a proposal
// generated from the wall's model and default settings when none are stored yet.
import { cellLabel } from '@shared/calc/grid';
import { cabinetsPerRun, generateRuns, runLoad, type Run, type RunLimits, type RunPattern } from '@shared/calc/runs';
import { DEFAULT_RUN_PATTERN } from '@shared/calc/wall-plan';
import {
  defaultPlanSettings,
  runLimitsFor,
  storedRunPatterns,
  type PlanSettings,
  type RunKind,
  type StoredRunPattern,
} from '@shared/schemas/wall-plan';
import type { WallDetail } from '@shared/schemas/walls';

export interface RunSet {
  pattern: StoredRunPattern;
  runs: Run[];
  /** False for a proposal that was never saved. */
  stored: boolean;
}

/**
 * The pattern a proposal uses: whole rows per data line and per power chain, as the trade wires
 * them and as the wall plan counts its outputs and circuits by default.
 */
export const PROPOSAL_PATTERN: RunPattern = DEFAULT_RUN_PATTERN;

/** The settings the wall was planned with, or the defaults (for its cabinet model, with its controller's output capacity). */
export function settingsOfWall(wall: Pick<WallDetail, 'planSettings' | 'controllers' | 'cabinetModel'>): {
  settings: PlanSettings;
  stored: boolean;
} {
  if (wall.planSettings) return { settings: wall.planSettings, stored: true };
  const controller = wall.controllers[0];
  return { settings: defaultPlanSettings(wall.cabinetModel, controller?.pixelsPerOutput), stored: false };
}

export const limitsOfWall = <K extends RunKind>(wall: Pick<WallDetail, 'cabinetModel'>, kind: K, settings: PlanSettings) =>
  runLimitsFor(kind, wall.cabinetModel, settings);

/** Runs with their loads recomputed (pixels or watts), as the legend and the print show them. */
export function withLoads(runs: Run[], limits: RunLimits): Run[] {
  return runs.map((r) => ({ index: r.index, cells: r.cells, ...runLoad(limits, r.cells.length) }));
}

/** Generated runs, or none when one cabinet alone is over the limit. */
export function proposeRuns(columns: number, rows: number, pattern: RunPattern, limits: RunLimits): Run[] {
  return cabinetsPerRun(limits) >= 1 ? generateRuns(columns, rows, pattern, limits) : [];
}

const asPattern = (p: string): StoredRunPattern =>
  (storedRunPatterns as readonly string[]).includes(p) ? (p as StoredRunPattern) : 'custom';

/** The wall's data or power runs: stored, or proposed. */
export function runSetOfWall(wall: WallDetail, kind: RunKind, settings: PlanSettings): RunSet {
  const stored = kind === 'data' ? wall.dataRuns : wall.powerRuns;
  const limits = limitsOfWall(wall, kind, settings);
  if (stored) return { pattern: asPattern(stored.pattern), runs: withLoads(stored.runs, limits), stored: true };
  return { pattern: PROPOSAL_PATTERN, runs: proposeRuns(wall.columns, wall.rows, PROPOSAL_PATTERN, limits), stored: false };
}

/** "C1·R1 → C2·R1 → C3·R1" */
export const pathText = (run: Run) => run.cells.map(cellLabel).join(' → ');

export const kindLabels: Record<RunKind, { title: string; unit: string; limitLabel: string }> = {
  data: { title: 'Data runs', unit: 'px', limitLabel: 'per output' },
  power: { title: 'Power runs', unit: 'W', limitLabel: 'per chain' },
};
