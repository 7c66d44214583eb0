import { useRef, type PointerEvent as ReactPointerEvent, type RefObject } from 'react';
import { panBy, scaleOf, zoomAt, type Rect, type WallLayout } from '@/components/wall-map/wall-map-geometry';
import type { SetViewBox } from '@/components/wall-map/use-wall-view-box';
import { userPoint } from '@/components/wall-map/use-wheel-zoom';

interface Gesture {
  startX: number;
  startY: number;
  vb: Rect;
  pxPerUnit: number;
  moved: boolean;
  pinch?: { distance: number; at: { x: number; y: number }; vb: Rect };
}

interface PointerGestureOptions {
  svgRef: RefObject<SVGSVGElement | null>;
  layout: WallLayout;
  maxScale: number;
  vbRef: RefObject<Rect>;
  setVb: SetViewBox;
  /** A press of the main button, a finger or a pen. */
  onPress: () => void;
}

/**
 * Drag to pan (once zoomed in) and pinch to zoom, with the pointer handlers for the SVG. A press
 * that became a drag or a pinch is no click on the cell under it: `clickWasGesture()` says so
 * (once).
 */
export function usePointerGestures({ svgRef, layout, maxScale, vbRef, setVb, onPress }: PointerGestureOptions) {
  const pointers = useRef(new Map<number, { x: number; y: number }>());
  const gesture = useRef<Gesture | null>(null);
  const suppressClick = useRef(false);

  const onPointerDown = (e: ReactPointerEvent<SVGSVGElement>) => {
    if (e.pointerType === 'mouse' && e.button !== 0) return;
    onPress();
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    suppressClick.current = false;
    const ctm = svgRef.current?.getScreenCTM();
    if (pointers.current.size === 1) {
      gesture.current = { startX: e.clientX, startY: e.clientY, vb: vbRef.current, pxPerUnit: ctm?.a ?? 1, moved: false };
    } else if (pointers.current.size === 2 && gesture.current) {
      const [a, b] = [...pointers.current.values()];
      const at = userPoint(svgRef.current, (a.x + b.x) / 2, (a.y + b.y) / 2);
      if (at) gesture.current.pinch = { distance: Math.hypot(a.x - b.x, a.y - b.y) || 1, at, vb: vbRef.current };
      gesture.current.moved = true;
    }
  };

  const onPointerMove = (e: ReactPointerEvent<SVGSVGElement>) => {
    const g = gesture.current;
    if (!g || !pointers.current.has(e.pointerId)) return;
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    if (g.pinch && pointers.current.size >= 2) {
      const [a, b] = [...pointers.current.values()];
      const factor = Math.hypot(a.x - b.x, a.y - b.y) / g.pinch.distance;
      setVb(zoomAt(g.pinch.vb, layout.content, factor, g.pinch.at, maxScale));
      return;
    }
    const dx = e.clientX - g.startX;
    const dy = e.clientY - g.startY;
    if (!g.moved && Math.hypot(dx, dy) > 5) {
      g.moved = true;
      svgRef.current?.setPointerCapture(e.pointerId);
    }
    if (g.moved && scaleOf(g.vb, layout.content) > 1.001) {
      setVb(panBy(g.vb, layout.content, -dx / g.pxPerUnit, -dy / g.pxPerUnit, maxScale));
    }
  };

  const onPointerEnd = (e: ReactPointerEvent<SVGSVGElement>) => {
    pointers.current.delete(e.pointerId);
    const g = gesture.current;
    if (!g) return;
    if (g.moved) suppressClick.current = true;
    if (pointers.current.size < 2) g.pinch = undefined;
    if (pointers.current.size === 0) gesture.current = null;
  };

  const clickWasGesture = () => {
    if (!suppressClick.current) return false;
    suppressClick.current = false;
    return true;
  };

  return { handlers: { onPointerDown, onPointerMove, onPointerUp: onPointerEnd, onPointerCancel: onPointerEnd }, clickWasGesture };
}
