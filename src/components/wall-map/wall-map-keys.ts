import { stepFrom, type GridPosition, type WallView } from '@/components/wall-map/wall-map-geometry';

/** What a key pressed on a cell does. */
export type CellKeyAction =
  { kind: 'activate' } | { kind: 'zoom'; factor: number } | { kind: 'whole' } | { kind: 'move'; to: GridPosition };

/**
 * Enter or Space activate the cell; + (or =) and − zoom about it; 0 shows the whole wall; arrow
 * keys, Home, End, Page Up and Page Down move by what is seen (see `stepFrom`). Null: not the
 * map's key.
 */
export function cellKeyAction(
  key: string,
  from: GridPosition,
  columns: number,
  rows: number,
  view: WallView,
  ctrl: boolean,
): CellKeyAction | null {
  if (key === 'Enter' || key === ' ') return { kind: 'activate' };
  if (key === '+' || key === '=') return { kind: 'zoom', factor: 1.5 };
  if (key === '-') return { kind: 'zoom', factor: 1 / 1.5 };
  if (key === '0') return { kind: 'whole' };
  const to = stepFrom(from, key, columns, rows, view, ctrl);
  return to ? { kind: 'move', to } : null;
}
