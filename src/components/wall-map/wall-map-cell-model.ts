// What each cell of the wall map shows, computed from the caller's cells: its tone, serial,
// repair heat and accessible name. Independent of the view, the zoom and the focus.
import { cellLabel } from '@shared/calc/grid';
import { useMemo } from 'react';
import type { GridPosition } from '@/components/wall-map/wall-map-geometry';
import { cellTones, toneStyles, type CellTone } from '@/components/wall-map/wall-map-tones';

export interface WallMapCell extends GridPosition {
  /** Shown under the position label when the zoom allows. */
  serial?: string;
  /** Default 'installed' when a serial is given, else 'empty'. */
  tone?: CellTone;
  /** 0..1: repair heat (reports), drawn as a tint over the cell. */
  heat?: number;
}

/** What a cell shows, independent of the view and the zoom (computed once per data change). */
export interface CellModel {
  column: number;
  row: number;
  tone: CellTone;
  serial?: string;
  heat?: number;
  name: string;
}

/** The legend's counts per tone, and whether any cell carries repair heat. */
export interface LegendCounts {
  counts: Map<CellTone, number>;
  heat: boolean;
}

function toneOf(cell: WallMapCell | undefined): CellTone {
  if (!cell) return 'empty';
  return cell.tone ?? (cell.serial ? 'installed' : 'empty');
}

/** A cell's state in its accessible name: "installed", "open ticket", "empty"… */
const toneWords = Object.fromEntries(
  cellTones.map((tone) => [tone, tone === 'empty' ? 'empty' : toneStyles[tone].label.toLowerCase()]),
) as Record<CellTone, string>;

/** The accessible name of a cell: "C4·R2, serial ABC123, installed". */
export function cellName(p: GridPosition, cell: WallMapCell | undefined): string {
  const tone = toneOf(cell);
  const parts = [cellLabel(p)];
  if (cell?.serial) parts.push(`serial ${cell.serial}`);
  parts.push(toneWords[tone]);
  if (cell?.heat && cell.heat > 0) parts.push(`repair heat ${Math.round(Math.min(1, cell.heat) * 100)} %`);
  return parts.join(', ');
}

/**
 * What every cell shows, row by row, and the legend's counts: only new data changes them (not
 * the view, the zoom or the focus). Cells outside the grid are left out.
 */
export function useCellModels(
  cells: WallMapCell[] | undefined,
  columns: number,
  rows: number,
): { cellRows: CellModel[][]; legend: LegendCounts } {
  return useMemo(() => {
    const byPosition: (WallMapCell | undefined)[] = new Array(columns * rows);
    for (const cell of cells ?? []) {
      if (
        Number.isInteger(cell.column) &&
        Number.isInteger(cell.row) &&
        cell.column >= 1 &&
        cell.row >= 1 &&
        cell.column <= columns &&
        cell.row <= rows
      ) {
        byPosition[(cell.row - 1) * columns + cell.column - 1] = cell;
      }
    }
    const counts = new Map<CellTone, number>();
    let heat = false;
    const result: CellModel[][] = [];
    for (let r = 1; r <= rows; r += 1) {
      const row: CellModel[] = [];
      for (let c = 1; c <= columns; c += 1) {
        const p = { column: c, row: r };
        const cell = byPosition[(r - 1) * columns + c - 1];
        const tone = toneOf(cell);
        counts.set(tone, (counts.get(tone) ?? 0) + 1);
        if (cell?.heat && cell.heat > 0) heat = true;
        row.push({ column: c, row: r, tone, serial: cell?.serial, heat: cell?.heat, name: cellName(p, cell) });
      }
      result.push(row);
    }
    return { cellRows: result, legend: { counts, heat } };
  }, [cells, columns, rows]);
}

const keyOf = (p: GridPosition) => `${p.column}:${p.row}`;

/**
 * The selected cells: whether there are any (for the legend), and per row the selected columns
 * written "|3|7|" (a string, so a row's memo holds while its selection is the same).
 */
export function useSelection(selected: GridPosition[] | undefined) {
  const selectedKeys = useMemo(() => new Set((selected ?? []).map(keyOf)), [selected]);
  const selectedByRow = useMemo(() => {
    const byRow = new Map<number, string>();
    for (const p of selected ?? []) byRow.set(p.row, `${byRow.get(p.row) ?? '|'}${p.column}|`);
    return byRow;
  }, [selected]);
  return { anySelected: selectedKeys.size > 0, selectedByRow };
}
