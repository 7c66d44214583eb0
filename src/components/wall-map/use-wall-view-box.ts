import { useCallback, useRef, useState } from 'react';
import { mirrorViewBox, type Rect, type WallLayout, type WallView } from '@/components/wall-map/wall-map-geometry';

export type SetViewBox = (next: Rect | ((current: Rect) => Rect)) => void;

interface ViewState {
  key: string;
  layout: WallLayout;
  vb: Rect;
}

/**
 * The visible window of the map (the SVG viewBox). It follows the layout: a new grid starts
 * whole; a view switch mirrors it, so the same cabinets stay on screen. `vbRef` holds the
 * current window for event handlers.
 */
export function useWallViewBox(layout: WallLayout, shapeKey: string, view: WallView, maxScale: number) {
  const [viewState, setViewState] = useState<ViewState>({ key: `${shapeKey}:${view}`, layout, vb: layout.content });
  let vb = viewState.vb;
  if (viewState.key !== `${shapeKey}:${view}`) {
    const sameShape = viewState.key.startsWith(`${shapeKey}:`);
    vb = sameShape ? mirrorViewBox(viewState.vb, viewState.layout, layout, maxScale) : layout.content;
    setViewState({ key: `${shapeKey}:${view}`, layout, vb });
  }
  const vbRef = useRef(vb);
  vbRef.current = vb;
  const setVb = useCallback<SetViewBox>((next) => setViewState((s) => ({ ...s, vb: typeof next === 'function' ? next(s.vb) : next })), []);
  return { vb, vbRef, setVb };
}
