import { useCallback, useRef, useState } from 'react';
import {
  mirrorViewBox,
  startViewBox,
  type GridPosition,
  type Rect,
  type WallLayout,
  type WallView,
} from '@/components/wall-map/wall-map-geometry';

export type SetViewBox = (next: Rect | ((current: Rect) => Rect)) => void;

interface ViewState {
  key: string;
  layout: WallLayout;
  vb: Rect;
  /** The start zoom was decided (it needs the map's size on screen, known after the first layout). */
  started: boolean;
  /** Someone zoomed or panned this grid: its window is theirs. */
  touched: boolean;
}

const gridOf = (key: string) => key.split('x').slice(0, 2).join('x');

/**
 * The visible window of the map (the SVG viewBox). It follows the layout: a new grid starts
 * whole, then — once the map's size is known, on a touch screen — zoomed so a cell can be tapped
 * (`startViewBox`, centred on the cells in `focus`); a view switch mirrors it, so the same cabinets stay on screen.
 * `vbRef` holds the current window for event handlers.
 */
export function useWallViewBox(
  layout: WallLayout,
  shapeKey: string,
  view: WallView,
  maxScale: number,
  size: { width: number; height: number },
  focus?: readonly GridPosition[],
  /** A phone or another touch screen: start zoomed to cells a finger can tap. With a mouse, the whole wall. */
  touchFirst = true,
) {
  const start = () => (touchFirst ? startViewBox(layout, size, maxScale, focus) : layout.content);
  const [viewState, setViewState] = useState<ViewState>({
    key: `${shapeKey}:${view}`,
    layout,
    vb: layout.content,
    started: false,
    touched: false,
  });
  let vb = viewState.vb;
  if (viewState.key !== `${shapeKey}:${view}`) {
    const sameShape = viewState.key.startsWith(`${shapeKey}:`);
    // The cabinets' shape arriving late (same columns and rows) keeps a window someone chose.
    const kept = !sameShape && viewState.touched && gridOf(viewState.key) === gridOf(shapeKey);
    vb = sameShape ? mirrorViewBox(viewState.vb, viewState.layout, layout, maxScale) : layout.content;
    if (kept && viewState.vb.width < viewState.layout.content.width - 0.001) vb = start();
    setViewState({
      key: `${shapeKey}:${view}`,
      layout,
      vb,
      started: (sameShape && viewState.started) || kept,
      touched: (sameShape || kept) && viewState.touched,
    });
  } else if (!viewState.started && size.width > 0) {
    vb = start();
    setViewState({ ...viewState, vb, started: true });
  }
  const vbRef = useRef(vb);
  vbRef.current = vb;
  const setVb = useCallback<SetViewBox>(
    (next) => setViewState((s) => ({ ...s, vb: typeof next === 'function' ? next(s.vb) : next, started: true, touched: true })),
    [],
  );
  return { vb, vbRef, setVb };
}
