import { describe, expect, it } from 'vitest';
import { adjacent, cellLabel, inGrid } from './grid.js';

// The product's own convention (design: "Grid positions are written C{column}·R{row}").
describe('grid', () => {
  it('labels cells C{column}·R{row}', () => {
    expect(cellLabel({ column: 3, row: 2 })).toBe('C3·R2');
  });

  it('knows what lies inside a grid (1-based)', () => {
    expect(inGrid({ column: 1, row: 1 }, 12, 6)).toBe(true);
    expect(inGrid({ column: 12, row: 6 }, 12, 6)).toBe(true);
    expect(inGrid({ column: 13, row: 1 }, 12, 6)).toBe(false);
    expect(inGrid({ column: 1, row: 7 }, 12, 6)).toBe(false);
    expect(inGrid({ column: 0, row: 1 }, 12, 6)).toBe(false);
    expect(inGrid({ column: 1.5, row: 1 }, 12, 6)).toBe(false);
  });

  it('counts only side-by-side neighbours as adjacent, never diagonals or the same cell', () => {
    expect(adjacent({ column: 2, row: 2 }, { column: 3, row: 2 })).toBe(true);
    expect(adjacent({ column: 2, row: 2 }, { column: 2, row: 1 })).toBe(true);
    expect(adjacent({ column: 2, row: 2 }, { column: 3, row: 3 })).toBe(false);
    expect(adjacent({ column: 2, row: 2 }, { column: 4, row: 2 })).toBe(false);
    expect(adjacent({ column: 2, row: 2 }, { column: 2, row: 2 })).toBe(false);
  });
});
