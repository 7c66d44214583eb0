import type { KeyboardEvent as ReactKeyboardEvent, MouseEvent as ReactMouseEvent, RefObject } from 'react';
import type { SetViewBox } from '@/components/wall-map/use-wall-view-box';
import { positionOfCell } from '@/components/wall-map/wall-map-dom';
import { revealRect, type GridPosition, type WallLayout } from '@/components/wall-map/wall-map-geometry';
import { cellKeyAction } from '@/components/wall-map/wall-map-keys';

interface CellEventOptions {
  cellLayerRef: RefObject<SVGGElement | null>;
  layout: WallLayout;
  maxScale: number;
  onCellActivate?: (p: GridPosition) => void;
  /** The roving tab stop (see `useGridFocus`). */
  setFocusPos: (p: GridPosition) => void;
  moveFocus: (p: GridPosition) => void;
  setKeyboardRing: (on: boolean) => void;
  zoomBy: (factor: number, at?: { x: number; y: number }) => void;
  setVb: SetViewBox;
  /** True when the click ended a drag or a pinch (see `usePointerGestures`). */
  clickWasGesture: () => boolean;
}

/**
 * What a click or a key on a cell does, listened for once on the SVG: a click (not the end of a
 * drag) or Enter activates the cell and gives it the tab stop; the other keys zoom or move (see
 * `cellKeyAction`).
 */
export function cellEventHandlers(o: CellEventOptions) {
  const cellFromTarget = (target: EventTarget | null) => positionOfCell(target as Element | null, o.cellLayerRef.current);
  const activate = (p: GridPosition) => {
    o.setFocusPos(p);
    o.onCellActivate?.(p);
  };

  const onClick = (e: ReactMouseEvent<SVGSVGElement>) => {
    if (o.clickWasGesture()) return;
    const p = cellFromTarget(e.target);
    if (p) activate(p);
  };

  const onKeyDown = (e: ReactKeyboardEvent<SVGSVGElement>) => {
    const target = cellFromTarget(e.target);
    if (!target) return;
    o.setKeyboardRing(true);
    const { layout } = o;
    const action = cellKeyAction(e.key, target, layout.columns, layout.rows, layout.view, e.ctrlKey || e.metaKey);
    if (!action) return;
    e.preventDefault();
    if (action.kind === 'activate') activate(target);
    else if (action.kind === 'zoom') o.zoomBy(action.factor, layout.center(target));
    else if (action.kind === 'whole') o.setVb(layout.content);
    else {
      o.moveFocus(action.to);
      o.setVb((current) => revealRect(current, layout.content, layout.cellRect(action.to), o.maxScale));
    }
  };

  return { onClick, onKeyDown };
}
