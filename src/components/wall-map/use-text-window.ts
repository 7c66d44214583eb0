import { useMemo } from 'react';
import { cellsInWindow, type Rect, type WallLayout } from '@/components/wall-map/wall-map-geometry';
import type { TextLevel } from '@/components/wall-map/wall-map-row';

const block = (from: number, to: number, max: number): [number, number] => [
  Math.floor((from - 1) / 8) * 8 + 1,
  Math.min(max, Math.ceil(to / 8) * 8),
];

/**
 * The columns and rows whose cells carry text: those in view (and a margin), in blocks of 8 so
 * that panning a little does not redraw any row. All 0 when no cell carries text.
 */
export function useTextWindow(textLevel: TextLevel, layout: WallLayout, vb: Rect, columns: number, rows: number) {
  const textWindow = useMemo(() => {
    if (textLevel === 'none') return null;
    const span = cellsInWindow(layout, vb, 1);
    if (!span) return null;
    return { columns: block(...span.columns, columns), rows: block(...span.rows, rows) };
  }, [textLevel, layout, vb, columns, rows]);
  const [textFrom, textTo] = textWindow?.columns ?? [0, 0];
  const [textRowFrom, textRowTo] = textWindow?.rows ?? [0, 0];
  return { textFrom, textTo, textRowFrom, textRowTo };
}
