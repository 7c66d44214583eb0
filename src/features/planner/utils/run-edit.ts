// Editing runs by hand: pure steps the runs page applies to its list. Each returns a new list.
import type { Cell } from '@shared/calc/grid';
import type { Run } from '@shared/calc/runs';

const same = (a: Cell, b: Cell) => a.column === b.column && a.row === b.row;

/**
 * A click on a cell while run `selected` (position in the list) is being edited: a cell of that
 * run leaves it; any other cell leaves the run it was in and joins the end of the selected run.
 */
export function toggleCell(runs: Run[], selected: number, cell: Cell): Run[] {
  const target = runs[selected];
  if (!target) return runs;
  if (target.cells.some((c) => same(c, cell))) {
    return runs.map((r, i) => (i === selected ? { ...r, cells: r.cells.filter((c) => !same(c, cell)) } : r));
  }
  return runs.map((r, i) => {
    const cells = r.cells.filter((c) => !same(c, cell));
    return i === selected
      ? { ...r, cells: [...cells, { column: cell.column, row: cell.row }] }
      : cells.length === r.cells.length
        ? r
        : { ...r, cells };
  });
}

/** A new, empty run at the end, numbered one above the highest. */
export function addRun(runs: Run[]): Run[] {
  const next = runs.reduce((max, r) => Math.max(max, r.index), 0) + 1;
  return [...runs, { index: next, cells: [] }];
}

export function removeRun(runs: Run[], position: number): Run[] {
  return runs.filter((_, i) => i !== position);
}

/** The same cells in the opposite order (the cable enters from the other end). */
export function reverseRun(runs: Run[], position: number): Run[] {
  return runs.map((r, i) => (i === position ? { ...r, cells: [...r.cells].reverse() } : r));
}

/** Moves a run up (-1) or down (+1) in the list. */
export function moveRun(runs: Run[], position: number, delta: -1 | 1): Run[] {
  const to = position + delta;
  if (to < 0 || to >= runs.length) return runs;
  const out = [...runs];
  [out[position], out[to]] = [out[to], out[position]];
  return out;
}

/** Numbers the runs 1, 2, 3… in list order. */
export function renumber(runs: Run[]): Run[] {
  return runs.map((r, i) => (r.index === i + 1 ? r : { ...r, index: i + 1 }));
}

/** Cell label → position of the run that holds it, for drawing and lookups. */
export function runOfCells(runs: Run[]): Map<string, number> {
  const out = new Map<string, number>();
  runs.forEach((r, position) => r.cells.forEach((c) => out.set(`${c.column}:${c.row}`, position)));
  return out;
}
