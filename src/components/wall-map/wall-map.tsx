import { cellLabel } from '@shared/calc/grid';
import clsx from 'clsx';
import { Maximize2, Minus, Plus } from 'lucide-react';
import {
  memo,
  useCallback,
  useEffect,
  useLayoutEffect,
  useMemo,
  useRef,
  useState,
  type KeyboardEvent as ReactKeyboardEvent,
  type MouseEvent as ReactMouseEvent,
  type PointerEvent as ReactPointerEvent,
  type ReactNode,
} from 'react';
import {
  cellsInWindow,
  maxScaleFor,
  mirrorViewBox,
  panBy,
  revealRect,
  rulerStep,
  scaleOf,
  stepFrom,
  wallLayout,
  zoomAt,
  type GridPosition,
  type Rect,
  type WallLayout,
  type WallView,
} from '@/components/wall-map/wall-map-geometry';
import { cellTones, toneStyles, type CellTone } from '@/components/wall-map/wall-map-tones';

export type { GridPosition } from '@/components/wall-map/wall-map-geometry';
export type { CellTone } from '@/components/wall-map/wall-map-tones';

export interface WallMapCell extends GridPosition {
  /** Shown under the position label when the zoom allows. */
  serial?: string;
  /** Default 'installed' when a serial is given, else 'empty'. */
  tone?: CellTone;
  /** 0..1: repair heat (reports), drawn as a tint over the cell. */
  heat?: number;
}

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

const viewCaptions: Record<WallView, string> = {
  front: 'Front view (as seen by the audience)',
  rear: 'Rear view (as seen by the technician behind the wall)',
};

const keyOf = (p: GridPosition) => `${p.column}:${p.row}`;

/** How much text a cell can carry at its size on screen. */
type TextLevel = 'none' | 'label' | 'full';
const textLevelFor = (cellPx: number): TextLevel => (cellPx >= 84 ? 'full' : cellPx >= 40 ? 'label' : 'none');

function toneOf(cell: WallMapCell | undefined): CellTone {
  if (!cell) return 'empty';
  return cell.tone ?? (cell.serial ? 'installed' : 'empty');
}

/** A cell's state in its accessible name: "installed", "open ticket", "empty"… */
const toneWords = Object.fromEntries(
  cellTones.map((tone) => [tone, tone === 'empty' ? 'empty' : toneStyles[tone].label.toLowerCase()]),
) as Record<CellTone, string>;

/** The accessible name of a cell: "C4·R2, serial ABC123, installed". */
export function cellName(p: GridPosition, cell: WallMapCell | undefined): string {
  const tone = toneOf(cell);
  const parts = [cellLabel(p)];
  if (cell?.serial) parts.push(`serial ${cell.serial}`);
  parts.push(toneWords[tone]);
  if (cell?.heat && cell.heat > 0) parts.push(`repair heat ${Math.round(Math.min(1, cell.heat) * 100)} %`);
  return parts.join(', ');
}

// ---------------------------------------------------------------------------------------------
// The cells: plain SVG, one memoised component per row (a tap or an arrow key redraws the one or
// two rows it touches, not the wall), no handlers of their own (the map listens once for all).
// Text is the costly part for the browser, so a cell carries it only when it is big enough on
// screen to read and inside the visible window; its accessible name is always there.
// ---------------------------------------------------------------------------------------------

/** What a cell shows, independent of the view and the zoom (computed once per data change). */
interface CellModel {
  column: number;
  row: number;
  tone: CellTone;
  serial?: string;
  heat?: number;
  name: string;
}

interface MapRowProps {
  cells: readonly CellModel[];
  layout: WallLayout;
  /** 'none' for rows outside the visible window. */
  textLevel: TextLevel;
  /** The columns of this row that carry text (inside the visible window). */
  textFrom: number;
  textTo: number;
  /** The selected columns of this row, written "|3|7|" (a string, so the row's memo holds). */
  selectedColumns: string;
  /** The column that holds the tab stop, 0 when it is in another row. */
  tabColumn: number;
}

const MapRow = memo(function MapRow({ cells, layout, textLevel, textFrom, textTo, selectedColumns, tabColumn }: MapRowProps) {
  const width = layout.cellWidth;
  const height = layout.cellHeight;
  const size = Math.min(width, height);
  const labelSize = size * 0.2;
  // The row is moved down as a whole and its cells sit at y = 0 in it: then the cells of a column
  // have the same attributes in every row, and the browser styles a few dozen distinct cells
  // instead of 2,000 (it shares the computed style of elements with equal attributes).
  const top = layout.rowCenterY(cells[0]?.row ?? 1) - height / 2;
  const cy = height / 2;
  // A cell is one element, its own outline: the marks drawn over it (repair heat, open ticket,
  // selection, labels) go in one layer of the row that neither takes the pointer nor is read out.
  // Half the elements a group per cell would need, and half the browser's work to draw them.
  const shapes: ReactNode[] = [];
  const marks: ReactNode[] = [];
  for (const cell of cells) {
    const { column, tone, serial, heat } = cell;
    const style = toneStyles[tone];
    const cx = layout.columnCenterX(column);
    const x = cx - width / 2;
    const selected = selectedColumns !== '' && selectedColumns.includes(`|${column}|`);
    const level = column >= textFrom && column <= textTo ? textLevel : 'none';
    const showSerial = level === 'full' && serial;
    shapes.push(
      <rect
        key={column}
        role="gridcell"
        tabIndex={column === tabColumn ? 0 : -1}
        aria-label={cell.name}
        aria-selected={selected}
        x={x}
        width={width}
        height={height}
        className={style.shape}
      />,
    );
    if (heat && heat > 0) {
      marks.push(<rect key={`h${column}`} x={x} width={width} height={height} rx={4} className="fill-state-breached-dot" fillOpacity={0.12 + 0.6 * Math.min(1, heat)} />);
    }
    if (tone === 'open_ticket') {
      // A mark as well as a colour: colour is never the only signal.
      marks.push(
        <path
          key={`t${column}`}
          d={`M ${x + width - size * 0.3} 2 L ${x + width - 2} 2 L ${x + width - 2} ${size * 0.3} Z`}
          className="fill-state-open-ticket-dot"
        />,
      );
    }
    if (selected) {
      marks.push(<rect key={`s${column}`} x={x + 5} y={5} width={width - 10} height={height - 10} rx={3} fill="none" className="stroke-amber-500" strokeWidth={7} />);
    }
    if (level !== 'none') {
      marks.push(
        <text
          key={`l${column}`}
          x={cx}
          y={showSerial ? cy - labelSize * 0.25 : cy}
          textAnchor="middle"
          dominantBaseline="central"
          fontSize={labelSize}
          fontWeight={600}
          className={style.text}
        >
          {cellLabel(cell)}
        </text>,
      );
    }
    if (showSerial) {
      // Long serials shrink to fit the cell (about 0.6 em per character in the UI font).
      const serialSize = Math.min(size * 0.15, (width * 0.88) / (0.62 * serial.length));
      marks.push(
        <text
          key={`n${column}`}
          x={cx}
          y={cy + labelSize * 0.95}
          textAnchor="middle"
          dominantBaseline="central"
          fontSize={serialSize}
          className={clsx(style.text, 'font-mono')}
        >
          {serial}
        </text>,
      );
    }
  }
  return (
    <g role="row" transform={`translate(0 ${top})`}>
      {shapes}
      {marks.length > 0 ? (
        <g aria-hidden="true" pointerEvents="none">
          {marks}
        </g>
      ) : null}
    </g>
  );
});

/**
 * Where a cell sits is where its element sits: the cell layer holds one group per row (row 1
 * first), and a row group holds its cells in column order (column 1 first), then the layer of
 * marks. Two attributes fewer on each of 2,000 cells.
 */
function positionOfCell(el: Element | null, layer: SVGGElement | null): GridPosition | null {
  const rowEl = el?.parentNode as Element | null | undefined;
  if (!el || !rowEl || !layer || el.getAttribute('role') !== 'gridcell' || rowEl.parentNode !== layer) return null;
  return { column: Array.prototype.indexOf.call(rowEl.children, el) + 1, row: Array.prototype.indexOf.call(layer.children, rowEl) + 1 };
}

function cellElement(layer: SVGGElement | null, p: GridPosition): SVGElement | null {
  const el = layer?.children[p.row - 1]?.children[p.column - 1];
  return el instanceof SVGElement && el.getAttribute('role') === 'gridcell' ? el : null;
}

const Rulers = memo(function Rulers({ layout, step, fontSize }: { layout: WallLayout; step: number; fontSize: number }) {
  const numbers: ReactNode[] = [];
  for (let c = 1; c <= layout.columns; c += 1) {
    if (c !== 1 && c % step !== 0) continue;
    numbers.push(
      <text key={`c${c}`} x={layout.columnCenterX(c)} y={layout.grid.y / 2} textAnchor="middle" dominantBaseline="central" fontSize={fontSize}>
        C{c}
      </text>,
    );
  }
  for (let r = 1; r <= layout.rows; r += 1) {
    if (r !== 1 && r % step !== 0) continue;
    numbers.push(
      <text key={`r${r}`} x={layout.grid.x / 2} y={layout.rowCenterY(r)} textAnchor="middle" dominantBaseline="central" fontSize={fontSize}>
        R{r}
      </text>,
    );
  }
  return (
    <g aria-hidden="true" className="pointer-events-none select-none fill-stone-600 font-medium">
      {numbers}
    </g>
  );
});

// ---------------------------------------------------------------------------------------------
// The map
// ---------------------------------------------------------------------------------------------
interface ViewState {
  key: string;
  layout: WallLayout;
  vb: Rect;
}

/**
 * The wall's grid of cabinets as an SVG: front or rear view, zoom (wheel with Ctrl or when
 * zoomed in, pinch, + − buttons) and pan (drag), one tab stop with arrow keys between cells.
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
  const shapeKey = `${columns}x${rows}x${cellAspect}`;

  // The visible window follows the layout: a new grid starts whole; a view switch mirrors it.
  const [viewState, setViewState] = useState<ViewState>({ key: `${shapeKey}:${view}`, layout, vb: layout.content });
  let vb = viewState.vb;
  if (viewState.key !== `${shapeKey}:${view}`) {
    const sameShape = viewState.key.startsWith(`${shapeKey}:`);
    vb = sameShape ? mirrorViewBox(viewState.vb, viewState.layout, layout, maxScale) : layout.content;
    setViewState({ key: `${shapeKey}:${view}`, layout, vb });
  }
  const vbRef = useRef(vb);
  vbRef.current = vb;
  const setVb = useCallback(
    (next: Rect | ((current: Rect) => Rect)) =>
      setViewState((s) => ({ ...s, vb: typeof next === 'function' ? next(s.vb) : next })),
    [],
  );

  // The map's size on screen decides how much text the cells can carry. It is measured before
  // the first paint; until then no cell carries text (drawing 2,000 labels only to remove them
  // a moment later costs more than the whole map).
  const [size, setSize] = useState({ width: 0, height: 0 });
  useLayoutEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const measured = (width: number, height: number) =>
      setSize((s) => (s.width === width && s.height === height ? s : { width, height }));
    const box = svg.getBoundingClientRect();
    measured(box.width, box.height);
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => measured(entry.contentRect.width, entry.contentRect.height));
    observer.observe(svg);
    return () => observer.disconnect();
  }, []);
  const pxPerUnit = size.width > 0 ? Math.min(size.width / vb.width, size.height / vb.height) : 0.6;
  const cellPx = Math.min(layout.cellWidth, layout.cellHeight) * pxPerUnit;
  const textLevel = size.width > 0 ? textLevelFor(cellPx) : 'none';
  const step = rulerStep(layout.cellWidth * pxPerUnit);
  // About 12 px on screen, never more than the band holds (rounded: no re-render per pixel of zoom).
  const rulerFont = Math.round(Math.min(layout.ruler * 0.48, 12 / pxPerUnit));
  const scale = scaleOf(vb, layout.content);

  // What every cell shows, row by row, and the legend's counts: only new data changes them (not
  // the view, the zoom or the focus).
  const { cellRows, legend } = useMemo(() => {
    const byPosition: (WallMapCell | undefined)[] = new Array(columns * rows);
    for (const cell of cells ?? []) {
      if (Number.isInteger(cell.column) && Number.isInteger(cell.row) && cell.column >= 1 && cell.row >= 1 && cell.column <= columns && cell.row <= rows) {
        byPosition[(cell.row - 1) * columns + cell.column - 1] = cell;
      }
    }
    const counts = new Map<CellTone, number>();
    let heat = false;
    const result: CellModel[][] = [];
    for (let r = 1; r <= rows; r += 1) {
      const row: CellModel[] = [];
      for (let c = 1; c <= columns; c += 1) {
        const p = { column: c, row: r };
        const cell = byPosition[(r - 1) * columns + c - 1];
        const tone = toneOf(cell);
        counts.set(tone, (counts.get(tone) ?? 0) + 1);
        if (cell?.heat && cell.heat > 0) heat = true;
        row.push({ column: c, row: r, tone, serial: cell?.serial, heat: cell?.heat, name: cellName(p, cell) });
      }
      result.push(row);
    }
    return { cellRows: result, legend: { counts, heat } };
  }, [cells, columns, rows]);
  const selectedKeys = useMemo(() => new Set((selected ?? []).map(keyOf)), [selected]);
  const selectedByRow = useMemo(() => {
    const byRow = new Map<number, string>();
    for (const p of selected ?? []) byRow.set(p.row, `${byRow.get(p.row) ?? '|'}${p.column}|`);
    return byRow;
  }, [selected]);

  // Text only on the cells in view (and a margin), in blocks of 8 so that panning a little does
  // not redraw any row.
  const textWindow = useMemo(() => {
    if (textLevel === 'none') return null;
    const span = cellsInWindow(layout, vb, 1);
    if (!span) return null;
    const block = (from: number, to: number, max: number): [number, number] => [
      Math.floor((from - 1) / 8) * 8 + 1,
      Math.min(max, Math.ceil(to / 8) * 8),
    ];
    return { columns: block(...span.columns, columns), rows: block(...span.rows, rows) };
  }, [textLevel, layout, vb, columns, rows]);
  const [textFrom, textTo] = textWindow?.columns ?? [0, 0];
  const [textRowFrom, textRowTo] = textWindow?.rows ?? [0, 0];

  // Roving tab stop: one cell is in the tab order; arrow keys move it.
  const [focusPos, setFocusPos] = useState<GridPosition>(() => selected?.[0] ?? { column: 1, row: 1 });
  const focus = {
    column: Math.min(columns, Math.max(1, focusPos.column)),
    row: Math.min(rows, Math.max(1, focusPos.row)),
  };
  const [keyboardRing, setKeyboardRing] = useState(false);
  const pendingFocus = useRef(false);

  useEffect(() => {
    if (!pendingFocus.current) return;
    pendingFocus.current = false;
    const el = cellElement(cellLayerRef.current, focus);
    el?.focus({ preventScroll: true });
  }, [focus.column, focus.row]);

  const interactive = Boolean(onCellActivate);
  const cellLayer = cellRows.map((rowCells, i) => {
    const r = i + 1;
    const withText = textLevel !== 'none' && r >= textRowFrom && r <= textRowTo;
    return (
      <MapRow
        key={r}
        cells={rowCells}
        layout={layout}
        textLevel={withText ? textLevel : 'none'}
        textFrom={withText ? textFrom : 0}
        textTo={withText ? textTo : 0}
        selectedColumns={selectedByRow.get(r) ?? ''}
        tabColumn={focus.row === r ? focus.column : 0}
      />
    );
  });

  const geometry = useMemo<WallMapGeometry>(() => ({ cellRect: layout.cellRect, center: layout.center }), [layout]);

  // ---- zoom and pan ----
  const toUser = useCallback((clientX: number, clientY: number) => {
    const svg = svgRef.current;
    const ctm = svg?.getScreenCTM();
    if (!svg || !ctm) return null;
    const p = new DOMPoint(clientX, clientY).matrixTransform(ctm.inverse());
    return { x: p.x, y: p.y };
  }, []);

  const zoomBy = useCallback(
    (factor: number, at?: { x: number; y: number }) =>
      setVb((current) => zoomAt(current, layout.content, factor, at ?? { x: current.x + current.width / 2, y: current.y + current.height / 2 }, maxScale)),
    [layout, maxScale, setVb],
  );

  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const onWheel = (e: WheelEvent) => {
      // Plain scrolling keeps scrolling the page until the map is zoomed in.
      const zoomed = scaleOf(vbRef.current, layout.content) > 1.001;
      if (!e.ctrlKey && !e.metaKey && !zoomed) return;
      e.preventDefault();
      const delta = e.deltaMode === 1 ? e.deltaY * 16 : e.deltaY;
      const at = toUser(e.clientX, e.clientY);
      if (at) zoomBy(Math.exp(-delta * 0.0015), at);
    };
    svg.addEventListener('wheel', onWheel, { passive: false });
    return () => svg.removeEventListener('wheel', onWheel);
  }, [layout, toUser, zoomBy]);

  const pointers = useRef(new Map<number, { x: number; y: number }>());
  const gesture = useRef<{
    startX: number;
    startY: number;
    vb: Rect;
    pxPerUnit: number;
    moved: boolean;
    pinch?: { distance: number; at: { x: number; y: number }; vb: Rect };
  } | null>(null);
  const suppressClick = useRef(false);

  const onPointerDown = (e: ReactPointerEvent<SVGSVGElement>) => {
    if (e.pointerType === 'mouse' && e.button !== 0) return;
    setKeyboardRing(false);
    pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
    suppressClick.current = false;
    const ctm = svgRef.current?.getScreenCTM();
    if (pointers.current.size === 1) {
      gesture.current = { startX: e.clientX, startY: e.clientY, vb: vbRef.current, pxPerUnit: ctm?.a ?? 1, moved: false };
    } else if (pointers.current.size === 2 && gesture.current) {
      const [a, b] = [...pointers.current.values()];
      const at = toUser((a.x + b.x) / 2, (a.y + b.y) / 2);
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

  const activate = (p: GridPosition) => {
    setFocusPos(p);
    onCellActivate?.(p);
  };

  const cellFromTarget = (target: EventTarget | null) => positionOfCell(target as Element | null, cellLayerRef.current);

  const onClick = (e: ReactMouseEvent<SVGSVGElement>) => {
    if (suppressClick.current) {
      suppressClick.current = false;
      return;
    }
    const p = cellFromTarget(e.target);
    if (p) activate(p);
  };

  const onKeyDown = (e: ReactKeyboardEvent<SVGSVGElement>) => {
    const target = cellFromTarget(e.target);
    if (!target) return;
    setKeyboardRing(true);
    if (e.key === 'Enter' || e.key === ' ') {
      e.preventDefault();
      activate(target);
      return;
    }
    if (e.key === '+' || e.key === '=') {
      e.preventDefault();
      zoomBy(1.5, layout.center(target));
      return;
    }
    if (e.key === '-') {
      e.preventDefault();
      zoomBy(1 / 1.5, layout.center(target));
      return;
    }
    if (e.key === '0') {
      e.preventDefault();
      setVb(layout.content);
      return;
    }
    const next = stepFrom(target, e.key, columns, rows, view, e.ctrlKey || e.metaKey);
    if (!next) return;
    e.preventDefault();
    pendingFocus.current = true;
    setFocusPos(next);
    setVb((current) => revealRect(current, layout.content, layout.cellRect(next), maxScale));
  };

  const [focusWithin, setFocusWithin] = useState(false);
  const ring = focusWithin && keyboardRing ? layout.cellRect(focus) : null;


  const zoomPercent = Math.round(scale * 100);

  return (
    <div className={clsx('space-y-2', className)}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm font-medium text-stone-700" data-testid="wall-map-caption">
          {viewCaptions[view]}
        </p>
        <div className="ml-auto flex items-center gap-1" role="group" aria-label="Zoom">
          <span className="mr-1 min-w-[3.5rem] text-right text-xs tabular-nums text-stone-600" aria-live="polite">
            {zoomPercent} %
          </span>
          <MapButton label="Zoom out" onClick={() => zoomBy(1 / 1.5)} disabled={scale <= 1.001}>
            <Minus className="h-4 w-4" aria-hidden="true" />
          </MapButton>
          <MapButton label="Zoom in" onClick={() => zoomBy(1.5)} disabled={scale >= maxScale - 0.001}>
            <Plus className="h-4 w-4" aria-hidden="true" />
          </MapButton>
          <MapButton label="Show the whole wall" onClick={() => setVb(layout.content)} disabled={scale <= 1.001}>
            <Maximize2 className="h-4 w-4" aria-hidden="true" />
          </MapButton>
        </div>
      </div>
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
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={onPointerEnd}
          onPointerCancel={onPointerEnd}
          onClick={onClick}
          onKeyDown={onKeyDown}
          onFocus={() => setFocusWithin(true)}
          onBlur={(e) => {
            if (!e.currentTarget.contains(e.relatedTarget as Node | null)) setFocusWithin(false);
          }}
        >
          <Rulers layout={layout} step={step} fontSize={rulerFont} />
          <g
            ref={cellLayerRef}
            className={clsx(
              // The cells' rounded corners: one rule rather than an attribute on each of 2,000 cells
              // (a browser without the SVG 2 geometry properties draws square corners, nothing worse).
              '[&>g>rect]:outline-none [&>g>rect]:[rx:4px]',
              interactive && '[&>g>rect:hover]:stroke-ink-800 [&>g>rect]:cursor-pointer',
            )}
          >
            {cellLayer}
          </g>
          {overlay ? <g pointerEvents="none">{overlay(geometry)}</g> : null}
          {ring ? (
            <rect
              x={ring.x - 5}
              y={ring.y - 5}
              width={ring.width + 10}
              height={ring.height + 10}
              rx={6}
              fill="none"
              strokeWidth={4}
              className="pointer-events-none stroke-ink-700"
            />
          ) : null}
        </svg>
      </div>
      <p className="text-xs text-stone-600">
        {scale > 1.001 ? 'Drag to move around. ' : ''}Pinch, Ctrl + scroll or the + − buttons zoom; arrow keys move between cells.
      </p>
      {showLegend ? <Legend counts={legend.counts} heat={legend.heat} selected={selectedKeys.size > 0} /> : null}
    </div>
  );
}

function MapButton({ label, onClick, disabled, children }: { label: string; onClick: () => void; disabled?: boolean; children: ReactNode }) {
  return (
    <button
      type="button"
      onClick={onClick}
      disabled={disabled}
      aria-label={label}
      title={label}
      className="flex h-touch w-touch items-center justify-center rounded border border-stone-300 bg-white text-ink-800 shadow-sm hover:bg-stone-50 disabled:cursor-not-allowed disabled:opacity-50 md:h-9 md:w-9"
    >
      {children}
    </button>
  );
}

function Legend({ counts, heat, selected }: { counts: Map<CellTone, number>; heat: boolean; selected: boolean }) {
  const shown = cellTones.filter((t) => (counts.get(t) ?? 0) > 0 || t === 'installed');
  return (
    <ul className="flex flex-wrap gap-x-4 gap-y-1.5 text-sm text-stone-700" aria-label="Legend">
      {shown.map((tone) => (
        <li key={tone} className="flex items-center gap-1.5">
          <span className={clsx('relative h-4 w-4 shrink-0 rounded-sm border-2', toneStyles[tone].swatch)} aria-hidden="true">
            {tone === 'open_ticket' ? (
              <span className="absolute right-0 top-0 h-0 w-0 border-l-[7px] border-t-[7px] border-l-transparent border-t-state-open-ticket-dot" />
            ) : null}
          </span>
          {toneStyles[tone].label}
          <span className="tabular-nums text-stone-500">{counts.get(tone) ?? 0}</span>
        </li>
      ))}
      {selected ? (
        <li className="flex items-center gap-1.5">
          <span className="h-4 w-4 shrink-0 rounded-sm border-[3px] border-amber-500 bg-white" aria-hidden="true" />
          Selected
        </li>
      ) : null}
      {heat ? (
        <li className="flex items-center gap-1.5">
          <span className="h-4 w-8 shrink-0 rounded-sm bg-gradient-to-r from-state-breached-bg to-state-breached-dot" aria-hidden="true" />
          Repair heat (low → high)
        </li>
      ) : null}
    </ul>
  );
}

/** Front / rear switch for a wall map. */
export function WallViewToggle({ view, onChange }: { view: WallView; onChange: (v: WallView) => void }) {
  const option = (value: WallView, label: string, hint: string) => (
    <button
      type="button"
      aria-pressed={view === value}
      title={hint}
      onClick={() => onChange(value)}
      className={clsx(
        'min-h-touch rounded px-3.5 text-base font-medium transition-colors md:min-h-9',
        view === value ? 'bg-ink-800 text-white shadow-sm' : 'text-ink-800 hover:bg-stone-100',
      )}
    >
      {label}
    </button>
  );
  return (
    <div role="group" aria-label="Wall view" className="inline-flex rounded-md border border-stone-300 bg-white p-0.5">
      {option('front', 'Front', 'As the audience sees it')}
      {option('rear', 'Rear', 'As the technician behind the wall sees it')}
    </div>
  );
}
