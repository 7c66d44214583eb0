// Data and power runs: cabinets daisy-chained from one controller output (data) or one power
// feed (power). A run is an ordered list of cells, each next to the one before it.
import { adjacent, cellLabel, inGrid, type Cell } from './grid.js';
import { wholeUnitsWithin } from './electrical.js';

/**
 * How runs are laid: `rows` — each run stays in one row, left to right as seen from the
 * audience; `columns` — each run stays in one column, top to bottom; `serpentine` — one path
 * that goes along row 1 left to right, row 2 right to left, and so on, cut into runs.
 */
export const runPatterns = ['rows', 'columns', 'serpentine'] as const;
export type RunPattern = (typeof runPatterns)[number];

/** What limits a run: pixels per controller output (data) or watts per power chain (power). */
export type RunLimits =
  | { kind: 'data'; cabinetPixels: number; outputCapacityPixels: number }
  | { kind: 'power'; cabinetMaxPowerW: number; chainCapacityW: number };

export interface Run {
  /** 1-based, the number written on the cable. */
  index: number;
  cells: Cell[];
  /** Data runs: cells × cabinet pixels. */
  pixels?: number;
  /** Power runs: cells × cabinet maximum watts. */
  watts?: number;
}

/** Whole cabinets one run may carry: floor(capacity ÷ per-cabinet load); 0 if one is too many. */
export function cabinetsPerRun(limits: RunLimits): number {
  return limits.kind === 'data'
    ? wholeUnitsWithin(limits.outputCapacityPixels, limits.cabinetPixels)
    : wholeUnitsWithin(limits.chainCapacityW, limits.cabinetMaxPowerW);
}

/** The load of `cells` cabinets on one run: { pixels } for data, { watts } for power. */
export function runLoad(limits: RunLimits, cells: number): { pixels: number } | { watts: number } {
  return limits.kind === 'data' ? { pixels: cells * limits.cabinetPixels } : { watts: cells * limits.cabinetMaxPowerW };
}

/** Cuts a path into ceil(length ÷ max) consecutive pieces whose sizes differ by at most one. */
function splitEvenly(path: Cell[], max: number): Cell[][] {
  const pieces = Math.ceil(path.length / max);
  const base = Math.floor(path.length / pieces);
  const longer = path.length % pieces;
  const out: Cell[][] = [];
  let at = 0;
  for (let i = 0; i < pieces; i++) {
    const size = base + (i < longer ? 1 : 0);
    out.push(path.slice(at, at + size));
    at += size;
  }
  return out;
}

function range(n: number): number[] {
  return Array.from({ length: n }, (_, i) => i + 1);
}

/** The straight lines (rows or columns) or the single serpentine path a pattern follows. */
function patternPaths(columns: number, rows: number, pattern: RunPattern): Cell[][] {
  switch (pattern) {
    case 'rows':
      return range(rows).map((row) => range(columns).map((column) => ({ column, row })));
    case 'columns':
      return range(columns).map((column) => range(rows).map((row) => ({ column, row })));
    case 'serpentine':
      return [
        range(rows).flatMap((row) => {
          const line = range(columns).map((column) => ({ column, row }));
          return row % 2 === 1 ? line : line.reverse();
        }),
      ];
  }
}

/**
 * Lays runs over a `columns` × `rows` wall. Every cell is in exactly one run, each cell is
 * next to the one before it, and no run is over its limit. Runs are as few as the pattern
 * allows: `rows` gives rows × ceil(columns ÷ per run) (one run per row when a row fits),
 * `columns` gives columns × ceil(rows ÷ per run), `serpentine` gives ceil(cabinets ÷ per run),
 * the fewest any layout can have. A row or column that needs several runs is cut evenly.
 */
export function generateRuns(columns: number, rows: number, pattern: RunPattern, limits: RunLimits): Run[] {
  const perRun = cabinetsPerRun(limits);
  if (perRun < 1) throw new RangeError('One cabinet alone is over the run limit.');
  const pieces = patternPaths(columns, rows, pattern).flatMap((path) => splitEvenly(path, perRun));
  return pieces.map((cells, i) => ({ index: i + 1, cells, ...runLoad(limits, cells.length) }));
}

/** One thing wrong with a set of runs, in words a crew lead understands. */
export interface RunProblem {
  /** The run's index, when the problem belongs to a run. */
  run?: number;
  cell?: Cell;
  message: string;
}

const count = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 });

function overLimitMessage(index: number, cells: number, limits: RunLimits): string {
  if (limits.kind === 'data') {
    const pixels = count.format(cells * limits.cabinetPixels);
    return `Run ${index} carries ${pixels} pixels, over the output capacity of ${count.format(limits.outputCapacityPixels)}.`;
  }
  const watts = count.format(cells * limits.cabinetMaxPowerW);
  return `Run ${index} draws ${watts} W, over the chain capacity of ${count.format(limits.chainCapacityW)} W.`;
}

/**
 * Checks runs drawn or edited by hand: cells outside the grid, cells in two runs (or twice in
 * one), consecutive cells that are not neighbours, runs over their limit, empty runs, two runs
 * with one number, and cells in no run. Returns an empty list when the runs are sound.
 */
export function validateRuns(columns: number, rows: number, runs: Run[], limits: RunLimits): RunProblem[] {
  const problems: RunProblem[] = [];
  const grid = `${columns} × ${rows}`;
  const seenIndex = new Set<number>();
  // Which run (by position in the list, and its number) first took each cell.
  const runOfCell = new Map<string, { position: number; index: number }>();
  const perRun = cabinetsPerRun(limits);

  runs.forEach((run, position) => {
    if (seenIndex.has(run.index)) problems.push({ run: run.index, message: `Two runs are numbered ${run.index}.` });
    seenIndex.add(run.index);
    if (run.cells.length === 0) problems.push({ run: run.index, message: `Run ${run.index} has no cells.` });

    run.cells.forEach((cell, i) => {
      const label = cellLabel(cell);
      if (!inGrid(cell, columns, rows)) {
        problems.push({ run: run.index, cell, message: `Run ${run.index}: ${label} is outside the ${grid} grid.` });
      } else {
        const earlier = runOfCell.get(label);
        if (earlier?.position === position) {
          problems.push({ run: run.index, cell, message: `${label} appears twice in run ${run.index}.` });
        } else if (earlier !== undefined) {
          problems.push({ run: run.index, cell, message: `${label} is in run ${earlier.index} and in run ${run.index}.` });
        } else {
          runOfCell.set(label, { position, index: run.index });
        }
      }
      const before = run.cells[i - 1];
      if (before && !adjacent(before, cell)) {
        problems.push({
          run: run.index,
          cell,
          message: `Run ${run.index}: ${label} is not next to ${cellLabel(before)}, the cell before it.`,
        });
      }
    });

    // Compared as whole cabinets, like generateRuns, so rounding never flags a run at its limit.
    if (run.cells.length > perRun) problems.push({ run: run.index, message: overLimitMessage(run.index, run.cells.length, limits) });
  });

  for (let row = 1; row <= rows; row++) {
    for (let column = 1; column <= columns; column++) {
      const cell = { column, row };
      if (!runOfCell.has(cellLabel(cell))) problems.push({ cell, message: `${cellLabel(cell)} is in no run.` });
    }
  }
  return problems;
}
