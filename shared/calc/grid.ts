// Grid positions: columns and rows count from 1, C1·R1 is top-left as seen from the audience.

/** One cabinet position in a wall's grid (1-based). */
export interface Cell {
  column: number;
  row: number;
}

/** The label people write and say for a position: `C3·R2` (column 3, row 2). */
export function cellLabel(cell: Cell): string {
  return `C${cell.column}·R${cell.row}`;
}

/** True when the cell lies inside a `columns` × `rows` grid. */
export function inGrid(cell: Cell, columns: number, rows: number): boolean {
  return (
    Number.isInteger(cell.column) &&
    Number.isInteger(cell.row) &&
    cell.column >= 1 &&
    cell.column <= columns &&
    cell.row >= 1 &&
    cell.row <= rows
  );
}

/** True when two cells share a side (a cable between neighbouring cabinets); diagonals do not count. */
export function adjacent(a: Cell, b: Cell): boolean {
  return Math.abs(a.column - b.column) + Math.abs(a.row - b.row) === 1;
}
