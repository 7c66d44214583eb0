import { useCallback, useEffect, type RefObject } from 'react';
import { scaleOf, zoomAt, type Rect, type WallLayout } from '@/components/wall-map/wall-map-geometry';
import type { SetViewBox } from '@/components/wall-map/use-wall-view-box';

/** The point in SVG user units under a point on screen, or null before the SVG is laid out. */
export function userPoint(svg: SVGSVGElement | null, clientX: number, clientY: number): { x: number; y: number } | null {
  const ctm = svg?.getScreenCTM();
  if (!svg || !ctm) return null;
  const p = new DOMPoint(clientX, clientY).matrixTransform(ctm.inverse());
  return { x: p.x, y: p.y };
}

/**
 * `zoomBy(factor, at?)` zooms about a point (the window's centre by default); the wheel zooms
 * about the pointer with Ctrl or ⌘ (and a trackpad's pinch), and without them once zoomed in:
 * until then plain scrolling keeps scrolling the page.
 */
export function useWheelZoom(
  svgRef: RefObject<SVGSVGElement | null>,
  layout: WallLayout,
  maxScale: number,
  vbRef: RefObject<Rect>,
  setVb: SetViewBox,
) {
  const zoomBy = useCallback(
    (factor: number, at?: { x: number; y: number }) =>
      setVb((current) =>
        zoomAt(current, layout.content, factor, at ?? { x: current.x + current.width / 2, y: current.y + current.height / 2 }, maxScale),
      ),
    [layout, maxScale, setVb],
  );

  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const onWheel = (e: WheelEvent) => {
      const zoomed = scaleOf(vbRef.current, layout.content) > 1.001;
      if (!e.ctrlKey && !e.metaKey && !zoomed) return;
      e.preventDefault();
      const delta = e.deltaMode === 1 ? e.deltaY * 16 : e.deltaY;
      const at = userPoint(svgRef.current, e.clientX, e.clientY);
      if (at) zoomBy(Math.exp(-delta * 0.0015), at);
    };
    svg.addEventListener('wheel', onWheel, { passive: false });
    return () => svg.removeEventListener('wheel', onWheel);
  }, [layout, svgRef, vbRef, zoomBy]);

  return zoomBy;
}
