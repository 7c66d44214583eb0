import { generateRuns, validateRuns, type RunLimits } from '@shared/calc/runs';
import { describe, expect, it } from 'vitest';
import { addRun, moveRun, removeRun, renumber, reverseRun, toggleCell } from './run-edit';

// A 4 × 2 wall of 192 × 192-pixel cabinets: 36,864 px each, so 100,000 px per output holds
// 2 whole cabinets (100,000 ÷ 36,864 = 2.7), common practice: never split a cabinet.
const limits: RunLimits = { kind: 'data', cabinetPixels: 36_864, outputCapacityPixels: 100_000 };
const c = (column: number, row: number) => ({ column, row });

describe('editing runs by hand', () => {
  it('takes a cell out of the selected run, and the check then names it as in no run', () => {
    const runs = generateRuns(4, 2, 'rows', limits);
    const edited = toggleCell(runs, 0, c(2, 1));
    expect(edited[0].cells).toEqual([c(1, 1)]);
    expect(validateRuns(4, 2, edited, limits).map((p) => p.message)).toEqual(['C2·R1 is in no run.']);
  });

  it('moves a cell of another run to the end of the selected one', () => {
    const runs = generateRuns(4, 2, 'rows', limits); // [C1,C2 R1] [C3,C4 R1] [C1,C2 R2] [C3,C4 R2]
    const edited = toggleCell(runs, 1, c(2, 1));
    expect(edited[0].cells).toEqual([c(1, 1)]);
    expect(edited[1].cells).toEqual([c(3, 1), c(4, 1), c(2, 1)]);
    const messages = validateRuns(4, 2, edited, limits).map((p) => p.message);
    // Three cabinets on one output (110,592 px) and a jump from C4 back to C2.
    expect(messages).toContain('Run 2: C2·R1 is not next to C4·R1, the cell before it.');
    expect(messages).toContain('Run 2 carries 110,592 pixels, over the output capacity of 100,000.');
  });

  it('builds a new run cell by cell into a sound set', () => {
    let runs = generateRuns(4, 2, 'rows', limits).slice(0, 3); // C3·R2 and C4·R2 left out
    runs = addRun(runs);
    expect(runs[3]).toEqual({ index: 4, cells: [] });
    runs = toggleCell(runs, 3, c(3, 2));
    runs = toggleCell(runs, 3, c(4, 2));
    expect(validateRuns(4, 2, runs, limits)).toEqual([]);
  });

  it('reverses, moves, removes and renumbers', () => {
    const runs = generateRuns(4, 2, 'rows', limits);
    expect(reverseRun(runs, 0)[0].cells).toEqual([c(2, 1), c(1, 1)]);
    const moved = moveRun(runs, 2, -1);
    expect(moved.map((r) => r.index)).toEqual([1, 3, 2, 4]);
    expect(renumber(moved).map((r) => r.index)).toEqual([1, 2, 3, 4]);
    expect(renumber(moved)[1].cells).toEqual(runs[2].cells);
    expect(moveRun(runs, 0, -1)).toBe(runs);
    const removed = removeRun(runs, 1);
    expect(removed.map((r) => r.index)).toEqual([1, 3, 4]);
    expect(validateRuns(4, 2, removed, limits).map((p) => p.message)).toEqual(['C3·R1 is in no run.', 'C4·R1 is in no run.']);
  });
});
