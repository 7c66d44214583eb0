import clsx from 'clsx';
import { useMemo, useRef, type ReactNode } from 'react';
import { useGridFocus } from '@/components/wall-map/use-grid-focus';
import { usePointerGestures } from '@/components/wall-map/use-pointer-gestures';
import { useTextWindow } from '@/components/wall-map/use-text-window';
import { drawingScale, useWallMapSize } from '@/components/wall-map/use-wall-map-size';
import { useWallViewBox } from '@/components/wall-map/use-wall-view-box';
import { useWheelZoom } from '@/components/wall-map/use-wheel-zoom';
import { useCellModels, useSelection, type WallMapCell } from '@/components/wall-map/wall-map-cell-model';
import { cellEventHandlers } from '@/components/wall-map/wall-map-cell-events';
import { CellLayer } from '@/components/wall-map/wall-map-cell-layer';
import { maxScaleFor, wallLayout, type GridPosition, type Rect, type WallView } from '@/components/wall-map/wall-map-geometry';
import { Legend } from '@/components/wall-map/wall-map-legend';
import { Rulers } from '@/components/wall-map/wall-map-rulers';
import { viewCaptions, WallMapToolbar } from '@/components/wall-map/wall-map-toolbar';
import { useMediaQuery } from '@/lib/use-media-query';

export type { GridPosition } from '@/components/wall-map/wall-map-geometry';
export type { CellTone } from '@/components/wall-map/wall-map-tones';
export { cellName, type WallMapCell } from '@/components/wall-map/wall-map-cell-model';
export { WallViewToggle } from '@/components/wall-map/wall-view-toggle';

/** A phone's width (Tailwind's `sm` break, as the lists use) or a finger as the pointer: the map starts at tappable cells. */
const touchFirstQuery = '(max-width: 639.98px), (pointer: coarse)';

export interface WallMapGeometry {
  /** In SVG user units, already mirrored for the rear view. */
  cellRect: (p: GridPosition) => { x: number; y: number; width: number; height: number };
  center: (p: GridPosition) => { x: number; y: number };
}

export interface WallMapProps {
  columns: number;
  rows: number;
  cells?: WallMapCell[];
  /** Controlled. The rear view mirrors left ↔ right; labels stay C{col}·R{row}. */
  view?: WallView;
  /** Drawn highlighted (e.g. reported or tapped cells). */
  selected?: GridPosition[];
  /** Click or tap, Enter or Space on a focused cell. */
  onCellActivate?: (p: GridPosition) => void;
  /**
   * Drawn above the cells in the same SVG (run arrows…). It ignores the pointer so taps still
   * reach the cells; give an element `pointerEvents="auto"` to make it clickable.
   */
  overlay?: (g: WallMapGeometry) => ReactNode;
  ariaLabel: string;
  /** Default true. */
  showLegend?: boolean;
  /** A cabinet's height ÷ width (e.g. 1 for 500 × 500 mm, 2 for 500 × 1000 mm). Default 1. */
  cellAspect?: number;
  className?: string;
}

/**
 * The wall's grid of cabinets as an SVG: front or rear view, zoom (wheel with Ctrl or when
 * zoomed in, pinch, + − buttons) and pan (drag), one tab stop with arrow keys between cells.
 * On a phone it starts zoomed so a cabinet is at least 44 px (see `startViewBox`).
 * Pure presentation: the caller passes the cells and handles activation.
 */
export function WallMap({
  columns,
  rows,
  cells,
  view = 'front',
  selected,
  onCellActivate,
  overlay,
  ariaLabel,
  showLegend = true,
  cellAspect = 1,
  className,
}: WallMapProps) {
  const svgRef = useRef<SVGSVGElement>(null);
  const cellLayerRef = useRef<SVGGElement>(null);
  const layout = useMemo(() => wallLayout(columns, rows, view, cellAspect), [columns, rows, view, cellAspect]);
  const maxScale = maxScaleFor(columns, rows);
  const size = useWallMapSize(svgRef);
  const touchFirst = useMediaQuery(touchFirstQuery);
  const { vb, vbRef, setVb } = useWallViewBox(layout, `${columns}x${rows}x${cellAspect}`, view, maxScale, size, selected, touchFirst);
  const { textLevel, step, rulerFont, scale } = drawingScale(size, vb, layout);
  const { cellRows, legend } = useCellModels(cells, columns, rows);
  const { anySelected, selectedByRow } = useSelection(selected);
  const textWindow = useTextWindow(textLevel, layout, vb, columns, rows);
  const { focus, setFocusPos, moveFocus, showRing, setKeyboardRing, focusHandlers } = useGridFocus(columns, rows, selected, cellLayerRef);
  const geometry = useMemo<WallMapGeometry>(() => ({ cellRect: layout.cellRect, center: layout.center }), [layout]);
  const zoomBy = useWheelZoom(svgRef, layout, maxScale, vbRef, setVb);
  const gestures = usePointerGestures({ svgRef, layout, maxScale, vbRef, setVb, onPress: () => setKeyboardRing(false) });

  const { onClick, onKeyDown } = cellEventHandlers({
    cellLayerRef,
    layout,
    maxScale,
    onCellActivate,
    setFocusPos,
    moveFocus,
    setKeyboardRing,
    zoomBy,
    setVb,
    clickWasGesture: gestures.clickWasGesture,
  });

  return (
    <div className={clsx('space-y-2', className)}>
      <WallMapToolbar view={view} scale={scale} maxScale={maxScale} onZoomBy={zoomBy} onShowWhole={() => setVb(layout.content)} />
      <div className="overflow-hidden rounded-md border border-stone-200 bg-stone-100">
        <svg
          ref={svgRef}
          role="grid"
          aria-label={`${ariaLabel}. ${viewCaptions[view]}.`}
          aria-rowcount={rows}
          aria-colcount={columns}
          data-view={view}
          viewBox={`${vb.x} ${vb.y} ${vb.width} ${vb.height}`}
          preserveAspectRatio="xMidYMid meet"
          className={clsx('block h-auto w-full select-none', scale > 1.001 && 'cursor-grab active:cursor-grabbing')}
          style={{
            aspectRatio: `${layout.content.width} / ${layout.content.height}`,
            maxHeight: '70vh',
            // Untouched, a finger still scrolls the page; zoomed in, it pans the map.
            touchAction: scale > 1.001 ? 'none' : 'pan-y',
          }}
          {...gestures.handlers}
          onClick={onClick}
          onKeyDown={onKeyDown}
          {...focusHandlers}
        >
          <Rulers layout={layout} step={step} fontSize={rulerFont} />
          <CellLayer
            ref={cellLayerRef}
            cellRows={cellRows}
            layout={layout}
            textLevel={textLevel}
            textWindow={textWindow}
            selectedByRow={selectedByRow}
            focus={focus}
            interactive={Boolean(onCellActivate)}
          />
          {overlay ? <g pointerEvents="none">{overlay(geometry)}</g> : null}
          {showRing ? <FocusRing rect={layout.cellRect(focus)} /> : null}
        </svg>
      </div>
      <p className="text-xs text-stone-600">
        {scale > 1.001 ? 'Drag to move around. ' : ''}Pinch, Ctrl + scroll or the + − buttons zoom; arrow keys move between cells.
      </p>
      {showLegend ? <Legend counts={legend.counts} heat={legend.heat} selected={anySelected} /> : null}
    </div>
  );
}

/** The keyboard focus ring around the focused cell (drawn over the cells, so no cell needs an outline). */
function FocusRing({ rect }: { rect: Rect }) {
  return (
    <rect
      x={rect.x - 5}
      y={rect.y - 5}
      width={rect.width + 10}
      height={rect.height + 10}
      rx={6}
      fill="none"
      strokeWidth={4}
      className="pointer-events-none stroke-ink-700"
    />
  );
}
