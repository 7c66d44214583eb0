import { useLayoutEffect, useState, type RefObject } from 'react';
import { rulerStep, scaleOf, type Rect, type WallLayout } from '@/components/wall-map/wall-map-geometry';
import { textLevelFor } from '@/components/wall-map/wall-map-row';

/**
 * The map's size on screen: it decides how much text the cells can carry. It is measured before
 * the first paint; until then it is 0 × 0 and no cell carries text (drawing 2,000 labels only to
 * remove them a moment later costs more than the whole map).
 */
export function useWallMapSize(svgRef: RefObject<SVGSVGElement | null>) {
  const [size, setSize] = useState({ width: 0, height: 0 });
  useLayoutEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const measured = (width: number, height: number) => setSize((s) => (s.width === width && s.height === height ? s : { width, height }));
    const box = svg.getBoundingClientRect();
    measured(box.width, box.height);
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => measured(entry.contentRect.width, entry.contentRect.height));
    observer.observe(svg);
    return () => observer.disconnect();
  }, [svgRef]);
  return size;
}

/** How the window is drawn at that size: text on the cells, the rulers' step and font, the zoom (1 is the whole wall). */
export function drawingScale(size: { width: number; height: number }, vb: Rect, layout: WallLayout) {
  const pxPerUnit = size.width > 0 ? Math.min(size.width / vb.width, size.height / vb.height) : 0.6;
  const cellPx = Math.min(layout.cellWidth, layout.cellHeight) * pxPerUnit;
  return {
    textLevel: size.width > 0 ? textLevelFor(cellPx) : 'none',
    step: rulerStep(layout.cellWidth * pxPerUnit),
    // About 12 px on screen, never more than the band holds (rounded: no re-render per pixel of zoom).
    rulerFont: Math.round(Math.min(layout.ruler * 0.48, 12 / pxPerUnit)),
    scale: scaleOf(vb, layout.content),
  } as const;
}
