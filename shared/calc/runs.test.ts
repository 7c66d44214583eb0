import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { adjacent, cellLabel, type Cell } from './grid.js';
import { cabinetsPerRun, generateRuns, runPatterns, validateRuns, type Run, type RunLimits, type RunPattern } from './runs.js';
import { planWall } from './wall-plan.js';

// The invented 500 mm cabinet of the wall-plan tests: 192 × 192 = 36,864 pixels, 150 W maximum.
const data: RunLimits = { kind: 'data', cabinetPixels: 36_864, outputCapacityPixels: 650_000 };
const power: RunLimits = { kind: 'power', cabinetMaxPowerW: 150, chainCapacityW: 1920 };
const labels = (run: Run) => run.cells.map(cellLabel).join(' ');

describe('generateRuns on the 12 × 6 wall of 500 mm cabinets', () => {
  it('gives each row its own data line: six data outputs (common practice)', () => {
    const runs = generateRuns(12, 6, 'rows', data);
    expect(runs).toHaveLength(6);
    runs.forEach((run, i) => {
      expect(run.index).toBe(i + 1);
      expect(run.cells).toEqual(Array.from({ length: 12 }, (_, c) => ({ column: c + 1, row: i + 1 })));
      expect(run.pixels).toBe(12 * 36_864); // 442,368 ≤ 650,000 (common practice capacity)
      expect(run.watts).toBeUndefined();
    });
  });

  it('gives each row its own power line at 1,920 W per chain (common practice; NEC 210.20(A) capacity)', () => {
    const runs = generateRuns(12, 6, 'rows', power);
    expect(runs).toHaveLength(6);
    expect(runs.every((r) => r.watts === 1800 && r.pixels === undefined)).toBe(true);
  });

  it('daisy-chains cabinet to cabinet from C1 (left as seen from the audience)', () => {
    expect(labels(generateRuns(12, 6, 'rows', data)[1])).toBe('C1·R2 C2·R2 C3·R2 C4·R2 C5·R2 C6·R2 C7·R2 C8·R2 C9·R2 C10·R2 C11·R2 C12·R2');
  });

  it('serpentine reaches the fewest outputs the wall plan counts: ceil(72 ÷ 17) = 5', () => {
    const runs = generateRuns(12, 6, 'serpentine', data);
    const plan = planWall({
      cabinet: { widthMm: 500, heightMm: 500, pixelsWide: 192, pixelsHigh: 192, maxPowerW: 150, typicalPowerW: 50, weightKg: 8 },
      columns: 12,
      rows: 6,
      supply: { voltage: 120, phases: 1, breakerAmps: 20, continuousFactor: 0.8, powerFactor: 1 },
      outputCapacityPixels: 650_000,
      dataPattern: 'serpentine',
    });
    expect(runs).toHaveLength(plan.outputsNeeded);
    // 72 cells in 5 runs, cut evenly: 15, 15, 14, 14, 14.
    expect(runs.map((r) => r.cells.length)).toEqual([15, 15, 14, 14, 14]);
    // Run 1 goes along row 1 and turns back along row 2: …C12·R1 C12·R2 C11·R2 C10·R2.
    expect(labels(runs[0]).endsWith('C11·R1 C12·R1 C12·R2 C11·R2 C10·R2')).toBe(true);
  });

  it('columns: one run per column top to bottom when a column fits', () => {
    const runs = generateRuns(12, 6, 'columns', data);
    expect(runs).toHaveLength(12);
    expect(labels(runs[0])).toBe('C1·R1 C1·R2 C1·R3 C1·R4 C1·R5 C1·R6');
  });

  it('cuts a row that does not fit evenly: 12 cabinets at 5 per run → 4 + 4 + 4, 18 runs', () => {
    const limits: RunLimits = { kind: 'power', cabinetMaxPowerW: 150, chainCapacityW: 750 };
    const runs = generateRuns(12, 6, 'rows', limits);
    expect(runs).toHaveLength(18);
    expect(runs.slice(0, 3).map(labels)).toEqual(['C1·R1 C2·R1 C3·R1 C4·R1', 'C5·R1 C6·R1 C7·R1 C8·R1', 'C9·R1 C10·R1 C11·R1 C12·R1']);
    expect(runs[0].watts).toBe(600);
  });

  it('refuses limits that one cabinet alone exceeds', () => {
    expect(() => generateRuns(12, 6, 'rows', { kind: 'data', cabinetPixels: 700_000, outputCapacityPixels: 650_000 })).toThrow(RangeError);
  });
});

describe('validateRuns', () => {
  it('finds nothing wrong with generated runs', () => {
    for (const pattern of runPatterns) expect(validateRuns(12, 6, generateRuns(12, 6, pattern, data), data)).toEqual([]);
  });

  it('names a cell in no run', () => {
    const runs = generateRuns(3, 2, 'rows', data);
    runs[1].cells.pop();
    expect(validateRuns(3, 2, runs, data)).toEqual([{ cell: { column: 3, row: 2 }, message: 'C3·R2 is in no run.' }]);
  });

  it('names a cell in two runs, and one listed twice in a run', () => {
    const runs: Run[] = [
      {
        index: 1,
        cells: [
          { column: 1, row: 1 },
          { column: 2, row: 1 },
          { column: 1, row: 1 },
        ],
      },
      { index: 2, cells: [{ column: 2, row: 1 }] },
    ];
    const messages = validateRuns(2, 1, runs, data).map((p) => p.message);
    expect(messages).toContain('C1·R1 appears twice in run 1.');
    expect(messages).toContain('C2·R1 is in run 1 and in run 2.');
  });

  it('names cells that are not next to the one before them', () => {
    const runs: Run[] = [
      {
        index: 1,
        cells: [
          { column: 1, row: 1 },
          { column: 2, row: 2 },
          { column: 2, row: 1 },
          { column: 1, row: 2 },
        ],
      },
    ];
    const problems = validateRuns(2, 2, runs, data);
    expect(problems).toEqual([
      { run: 1, cell: { column: 2, row: 2 }, message: 'Run 1: C2·R2 is not next to C1·R1, the cell before it.' },
      { run: 1, cell: { column: 1, row: 2 }, message: 'Run 1: C1·R2 is not next to C2·R1, the cell before it.' },
    ]);
  });

  it('names a data run over its output and a power run over its chain', () => {
    const oneRow: Run[] = [{ index: 1, cells: Array.from({ length: 18 }, (_, c) => ({ column: c + 1, row: 1 })) }];
    expect(validateRuns(18, 1, oneRow, data)).toEqual([
      { run: 1, message: 'Run 1 carries 663,552 pixels, over the output capacity of 650,000.' },
    ]);
    expect(validateRuns(18, 1, oneRow, power)).toEqual([{ run: 1, message: 'Run 1 draws 2,700 W, over the chain capacity of 1,920 W.' }]);
  });

  it('accepts a run exactly at its limit: 12 × 160 W on a 1,920 W chain', () => {
    const row: Run[] = [{ index: 1, cells: Array.from({ length: 12 }, (_, c) => ({ column: c + 1, row: 1 })) }];
    expect(validateRuns(12, 1, row, { kind: 'power', cabinetMaxPowerW: 160, chainCapacityW: 1920 })).toEqual([]);
  });

  it('names cells outside the grid, empty runs and runs with the same number', () => {
    const runs: Run[] = [
      {
        index: 1,
        cells: [
          { column: 1, row: 1 },
          { column: 2, row: 1 },
          { column: 3, row: 1 },
        ],
      },
      { index: 1, cells: [] },
    ];
    expect(validateRuns(2, 1, runs, data)).toEqual([
      { run: 1, cell: { column: 3, row: 1 }, message: 'Run 1: C3·R1 is outside the 2 × 1 grid.' },
      { run: 1, message: 'Two runs are numbered 1.' },
      { run: 1, message: 'Run 1 has no cells.' },
    ]);
  });
});

// ---- properties (fast-check): every generated layout must pass these, whatever the grid ----

const layout = fc.record({
  columns: fc.integer({ min: 1, max: 24 }),
  rows: fc.integer({ min: 1, max: 16 }),
  pattern: fc.constantFrom<RunPattern>(...runPatterns),
  perRun: fc.integer({ min: 1, max: 40 }),
  kind: fc.constantFrom('data' as const, 'power' as const),
  // Capacity anywhere between perRun and perRun + 1 cabinets, so the limit is not always exact.
  slack: fc.double({ min: 0, max: 0.99, noNaN: true }),
});

function limitsFor(kind: 'data' | 'power', perRun: number, slack: number): RunLimits {
  return kind === 'data'
    ? { kind, cabinetPixels: 36_864, outputCapacityPixels: Math.floor(36_864 * (perRun + slack)) }
    : { kind, cabinetMaxPowerW: 150, chainCapacityW: 150 * (perRun + slack) };
}

describe('generateRuns properties', () => {
  it('covers every cell exactly once, within the grid', () => {
    fc.assert(
      fc.property(layout, ({ columns, rows, pattern, perRun, kind, slack }) => {
        const runs = generateRuns(columns, rows, pattern, limitsFor(kind, perRun, slack));
        const cells = runs.flatMap((r) => r.cells);
        expect(cells).toHaveLength(columns * rows);
        expect(new Set(cells.map(cellLabel)).size).toBe(columns * rows);
        expect(cells.every((c) => c.column >= 1 && c.column <= columns && c.row >= 1 && c.row <= rows)).toBe(true);
      }),
    );
  });

  it('puts each cell next to the one before it', () => {
    fc.assert(
      fc.property(layout, ({ columns, rows, pattern, perRun, kind, slack }) => {
        for (const run of generateRuns(columns, rows, pattern, limitsFor(kind, perRun, slack))) {
          for (let i = 1; i < run.cells.length; i++) expect(adjacent(run.cells[i - 1], run.cells[i])).toBe(true);
        }
      }),
    );
  });

  it('keeps every run within its limit and reports its load', () => {
    fc.assert(
      fc.property(layout, ({ columns, rows, pattern, perRun, kind, slack }) => {
        const limits = limitsFor(kind, perRun, slack);
        expect(cabinetsPerRun(limits)).toBe(perRun);
        for (const run of generateRuns(columns, rows, pattern, limits)) {
          expect(run.cells.length).toBeGreaterThan(0);
          if (limits.kind === 'data') expect(run.pixels).toBeLessThanOrEqual(limits.outputCapacityPixels);
          else expect(run.watts).toBeLessThanOrEqual(limits.chainCapacityW);
        }
      }),
    );
  });

  it('uses as few runs as the pattern allows, numbered 1…n', () => {
    fc.assert(
      fc.property(layout, ({ columns, rows, pattern, perRun, kind, slack }) => {
        const runs = generateRuns(columns, rows, pattern, limitsFor(kind, perRun, slack));
        expect(runs.map((r) => r.index)).toEqual(runs.map((_, i) => i + 1));
        // Fewest possible: a run never leaves its row (rows) or column (columns), so each line
        // needs ceil(length ÷ per run); a serpentine may hold any cells, so ceil(all ÷ per run).
        const fewest = {
          rows: rows * Math.ceil(columns / perRun),
          columns: columns * Math.ceil(rows / perRun),
          serpentine: Math.ceil((columns * rows) / perRun),
        }[pattern];
        expect(runs).toHaveLength(fewest);
        if (pattern === 'rows') expect(runs.every((r) => r.cells.every((c) => c.row === r.cells[0].row))).toBe(true);
        if (pattern === 'columns') expect(runs.every((r) => r.cells.every((c) => c.column === r.cells[0].column))).toBe(true);
        if (pattern === 'rows' && perRun >= columns) expect(runs).toHaveLength(rows);
      }),
    );
  });

  it('passes validateRuns, which catches a cell moved out of its run', () => {
    fc.assert(
      fc.property(layout, fc.nat(), ({ columns, rows, pattern, perRun, kind, slack }, pick) => {
        const limits = limitsFor(kind, perRun, slack);
        const runs = generateRuns(columns, rows, pattern, limits);
        expect(validateRuns(columns, rows, runs, limits)).toEqual([]);
        const run = runs[pick % runs.length];
        const removed: Cell = run.cells.splice(pick % run.cells.length, 1)[0];
        expect(validateRuns(columns, rows, runs, limits)).toContainEqual({ cell: removed, message: `${cellLabel(removed)} is in no run.` });
      }),
    );
  });
});
