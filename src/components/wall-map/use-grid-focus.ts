import { useEffect, useRef, useState, type FocusEvent, type RefObject } from 'react';
import { cellElement } from '@/components/wall-map/wall-map-dom';
import type { GridPosition } from '@/components/wall-map/wall-map-geometry';

/**
 * The roving tab stop: one cell is in the tab order (the first selected cell at first), kept
 * inside the grid. `moveFocus` moves it and focuses that cell once it is drawn. The keyboard
 * ring shows while focus is inside the map and the last move was by keyboard.
 */
export function useGridFocus(
  columns: number,
  rows: number,
  selected: GridPosition[] | undefined,
  cellLayerRef: RefObject<SVGGElement | null>,
) {
  const [focusPos, setFocusPos] = useState<GridPosition>(() => selected?.[0] ?? { column: 1, row: 1 });
  const column = Math.min(columns, Math.max(1, focusPos.column));
  const row = Math.min(rows, Math.max(1, focusPos.row));
  const [keyboardRing, setKeyboardRing] = useState(false);
  const [focusWithin, setFocusWithin] = useState(false);
  const pendingFocus = useRef(false);

  useEffect(() => {
    if (!pendingFocus.current) return;
    pendingFocus.current = false;
    cellElement(cellLayerRef.current, { column, row })?.focus({ preventScroll: true });
  }, [cellLayerRef, column, row]);

  const moveFocus = (p: GridPosition) => {
    pendingFocus.current = true;
    setFocusPos(p);
  };
  const focusHandlers = {
    onFocus: () => setFocusWithin(true),
    onBlur: (e: FocusEvent<SVGSVGElement>) => {
      if (!e.currentTarget.contains(e.relatedTarget as Node | null)) setFocusWithin(false);
    },
  };
  return { focus: { column, row }, setFocusPos, moveFocus, showRing: focusWithin && keyboardRing, setKeyboardRing, focusHandlers };
}
