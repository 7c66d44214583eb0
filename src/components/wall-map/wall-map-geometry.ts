// Pure geometry of the wall map: where each cell is drawn (front or rear view) and how the
// visible window (the SVG viewBox) moves when someone zooms or pans. No React, no DOM.

export interface GridPosition {
  column: number;
  row: number;
}

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

export type WallView = 'front' | 'rear';

/** One cell is 100 user units wide; its height follows the cabinet's shape. */
export const CELL_WIDTH = 100;
/** The gap between cabinets, so neighbouring outlines stay apart. */
export const CELL_GAP = 6;
/** The band for the column numbers (top) and row numbers (left), at least this wide. */
export const RULER = 44;
/** A margin on the right and bottom, so the outermost outlines are not clipped. */
export const EDGE = 8;

export interface WallLayout {
  columns: number;
  rows: number;
  view: WallView;
  cellWidth: number;
  cellHeight: number;
  /** The whole drawing, rulers included. */
  content: Rect;
  /** Where the cabinets are (without the rulers). */
  grid: Rect;
  /** The width of the number bands: it grows with big walls so the numbers stay readable whole. */
  ruler: number;
  cellRect: (p: GridPosition) => Rect;
  center: (p: GridPosition) => { x: number; y: number };
  /** The x of a column's centre, mirrored in the rear view. */
  columnCenterX: (column: number) => number;
  rowCenterY: (row: number) => number;
  /** The cell under a point in user units, or null between cells and outside the grid. */
  cellAt: (x: number, y: number) => GridPosition | null;
}

/** A cabinet's height ÷ width, kept within reason so a bad catalogue entry cannot break the map. */
export function clampAspect(aspect: number | undefined): number {
  if (!aspect || !Number.isFinite(aspect) || aspect <= 0) return 1;
  return Math.min(4, Math.max(0.25, aspect));
}

/**
 * Lays out a `columns` × `rows` grid. Positions count from C1·R1 at the top-left as the audience
 * sees the wall; the rear view (the technician behind it) mirrors left and right, so C1 is drawn
 * at the right edge and the labels stay the same.
 */
export function wallLayout(columns: number, rows: number, view: WallView = 'front', cellAspect = 1): WallLayout {
  const cellWidth = CELL_WIDTH;
  const cellHeight = CELL_WIDTH * clampAspect(cellAspect);
  const stepX = cellWidth + CELL_GAP;
  const stepY = cellHeight + CELL_GAP;
  const gridWidth = columns * stepX - CELL_GAP;
  const gridHeight = rows * stepY - CELL_GAP;
  const ruler = Math.max(RULER, Math.round(0.03 * Math.max(gridWidth, gridHeight)));
  const grid = { x: ruler, y: ruler, width: gridWidth, height: gridHeight };
  // The right margin also holds half of the last column's number.
  const edge = Math.max(EDGE, Math.round(ruler * 0.3));
  const content = { x: 0, y: 0, width: ruler + gridWidth + edge, height: ruler + gridHeight + edge };
  const slot = (column: number) => (view === 'rear' ? columns - column : column - 1);
  const cellRect = (p: GridPosition): Rect => ({
    x: grid.x + slot(p.column) * stepX,
    y: grid.y + (p.row - 1) * stepY,
    width: cellWidth,
    height: cellHeight,
  });
  const columnCenterX = (column: number) => grid.x + slot(column) * stepX + cellWidth / 2;
  const rowCenterY = (row: number) => grid.y + (row - 1) * stepY + cellHeight / 2;
  return {
    columns,
    rows,
    view,
    cellWidth,
    cellHeight,
    content,
    grid,
    ruler,
    cellRect,
    center: (p) => ({ x: columnCenterX(p.column), y: rowCenterY(p.row) }),
    columnCenterX,
    rowCenterY,
    cellAt: (x, y) => {
      const sx = Math.floor((x - grid.x) / stepX);
      const sy = Math.floor((y - grid.y) / stepY);
      if (sx < 0 || sy < 0 || sx >= columns || sy >= rows) return null;
      if (x - grid.x - sx * stepX > cellWidth || y - grid.y - sy * stepY > cellHeight) return null;
      return { column: view === 'rear' ? columns - sx : sx + 1, row: sy + 1 };
    },
  };
}

/**
 * The columns and rows a window (in user units) shows, widened by `pad` cells on each side; in
 * the rear view the columns are mirrored like the cells. Null when the window holds no cell.
 */
export function cellsInWindow(layout: WallLayout, vb: Rect, pad = 0): { columns: [number, number]; rows: [number, number] } | null {
  const stepX = layout.cellWidth + CELL_GAP;
  const stepY = layout.cellHeight + CELL_GAP;
  const firstSlot = Math.max(0, Math.floor((vb.x - layout.grid.x) / stepX) - pad);
  const lastSlot = Math.min(layout.columns - 1, Math.floor((vb.x + vb.width - layout.grid.x) / stepX) + pad);
  const firstRow = Math.max(1, Math.floor((vb.y - layout.grid.y) / stepY) + 1 - pad);
  const lastRow = Math.min(layout.rows, Math.floor((vb.y + vb.height - layout.grid.y) / stepY) + 1 + pad);
  if (firstSlot > lastSlot || firstRow > lastRow) return null;
  const columns: [number, number] =
    layout.view === 'rear' ? [layout.columns - lastSlot, layout.columns - firstSlot] : [firstSlot + 1, lastSlot + 1];
  return { columns, rows: [firstRow, lastRow] };
}

// ---- the visible window ----

/** How far one can zoom in: at least 4×, more on big walls (about 3 cells across at most zoom). */
export function maxScaleFor(columns: number, rows: number): number {
  return Math.max(4, Math.min(40, Math.max(columns, rows) / 3));
}

export const scaleOf = (vb: Rect, content: Rect) => content.width / vb.width;

/** Keeps the window inside the drawing and its zoom between 1× and `maxScale`. */
export function clampViewBox(vb: Rect, content: Rect, maxScale: number): Rect {
  const minWidth = content.width / maxScale;
  const width = Math.min(content.width, Math.max(minWidth, vb.width));
  const height = width * (content.height / content.width);
  const x = Math.min(content.x + content.width - width, Math.max(content.x, vb.x));
  const y = Math.min(content.y + content.height - height, Math.max(content.y, vb.y));
  return { x, y, width, height };
}

/** Zooms by `factor` (> 1 in, < 1 out) keeping the point `at` (user units) where it is on screen. */
export function zoomAt(vb: Rect, content: Rect, factor: number, at: { x: number; y: number }, maxScale: number): Rect {
  const width = vb.width / factor;
  const height = vb.height / factor;
  const next = {
    x: at.x - (at.x - vb.x) * (width / vb.width),
    y: at.y - (at.y - vb.y) * (height / vb.height),
    width,
    height,
  };
  // Clamp the size first, then recompute the origin around `at` so the zoom limit does not drift.
  const clamped = clampViewBox(next, content, maxScale);
  if (clamped.width !== width) {
    const ratio = clamped.width / vb.width;
    return clampViewBox(
      { x: at.x - (at.x - vb.x) * ratio, y: at.y - (at.y - vb.y) * ratio, width: clamped.width, height: clamped.height },
      content,
      maxScale,
    );
  }
  return clamped;
}

/** Moves the window by (dx, dy) user units. */
export function panBy(vb: Rect, content: Rect, dx: number, dy: number, maxScale: number): Rect {
  return clampViewBox({ ...vb, x: vb.x + dx, y: vb.y + dy }, content, maxScale);
}

/** Moves the window the least needed to show `rect` whole (with a margin). */
export function revealRect(vb: Rect, content: Rect, rect: Rect, maxScale: number, margin = CELL_GAP * 2): Rect {
  let { x, y } = vb;
  if (rect.x - margin < x) x = rect.x - margin;
  else if (rect.x + rect.width + margin > x + vb.width) x = rect.x + rect.width + margin - vb.width;
  if (rect.y - margin < y) y = rect.y - margin;
  else if (rect.y + rect.height + margin > y + vb.height) y = rect.y + rect.height + margin - vb.height;
  return clampViewBox({ ...vb, x, y }, content, maxScale);
}

/**
 * The same stretch of wall after switching front ↔ rear: the window is mirrored across the grid,
 * so the cabinets a technician was looking at stay on screen.
 */
export function mirrorViewBox(vb: Rect, from: WallLayout, to: WallLayout, maxScale: number): Rect {
  const gridLeft = from.grid.x;
  const gridRight = from.grid.x + from.grid.width;
  const mirroredLeft = gridLeft + gridRight - (vb.x + vb.width);
  return clampViewBox({ ...vb, x: mirroredLeft }, to.content, maxScale);
}

/** The next cell for an arrow key, by what is seen on screen (left is right in the rear view). */
export function stepFrom(p: GridPosition, key: string, columns: number, rows: number, view: WallView, ctrl = false): GridPosition | null {
  const towardsRight = view === 'rear' ? -1 : 1;
  const leftEdge = view === 'rear' ? columns : 1;
  const rightEdge = view === 'rear' ? 1 : columns;
  const clampC = (c: number) => Math.min(columns, Math.max(1, c));
  const clampR = (r: number) => Math.min(rows, Math.max(1, r));
  switch (key) {
    case 'ArrowRight':
      return { column: clampC(p.column + towardsRight), row: p.row };
    case 'ArrowLeft':
      return { column: clampC(p.column - towardsRight), row: p.row };
    case 'ArrowDown':
      return { column: p.column, row: clampR(p.row + 1) };
    case 'ArrowUp':
      return { column: p.column, row: clampR(p.row - 1) };
    case 'Home':
      return { column: leftEdge, row: ctrl ? 1 : p.row };
    case 'End':
      return { column: rightEdge, row: ctrl ? rows : p.row };
    case 'PageUp':
      return { column: p.column, row: 1 };
    case 'PageDown':
      return { column: p.column, row: rows };
    default:
      return null;
  }
}

/** Every n-th ruler number, so numbers are at least `minPx` apart on screen. */
export function rulerStep(cellPx: number, minPx = 28): number {
  if (cellPx >= minPx) return 1;
  for (const step of [2, 5, 10, 20, 50, 100]) if (cellPx * step >= minPx) return step;
  return 100;
}

/** The smallest cell a finger can tap on a phone, in CSS px (the product's 44 px target rule). */
export const MIN_TAP_PX = 44;

/**
 * Where the map starts, given its size on screen in CSS px. The whole wall when its cells are
 * big enough to tap; otherwise zoomed in just enough that a cell is at least `minCellPx` (as far
 * as `maxScale` allows), centred on `focus` (the reported or selected cells) or, without one, at
 * the top-left corner with the column and row numbers in view. "Show the whole wall" undoes it.
 */
export function startViewBox(
  layout: WallLayout,
  size: { width: number; height: number },
  maxScale: number,
  focus: readonly GridPosition[] = [],
  minCellPx = MIN_TAP_PX,
): Rect {
  const { content } = layout;
  if (size.width <= 0 || size.height <= 0) return content;
  // The SVG shows the whole drawing with "meet": the tighter of the two fits sets the scale.
  const pxPerUnit = Math.min(size.width / content.width, size.height / content.height);
  const cellPx = Math.min(layout.cellWidth, layout.cellHeight) * pxPerUnit;
  if (cellPx >= minCellPx) return content;
  // A hair over the minimum, so rounding on screen never leaves a cell at 43.99 px.
  const scale = Math.min(maxScale, (minCellPx / cellPx) * 1.02);
  const width = content.width / scale;
  const height = content.height / scale;
  const inGrid = focus.filter((p) => p.column >= 1 && p.column <= layout.columns && p.row >= 1 && p.row <= layout.rows);
  if (inGrid.length === 0) return clampViewBox({ x: content.x, y: content.y, width, height }, content, maxScale);
  const rects = inGrid.map(layout.cellRect);
  const left = Math.min(...rects.map((r) => r.x));
  const right = Math.max(...rects.map((r) => r.x + r.width));
  const top = Math.min(...rects.map((r) => r.y));
  const bottom = Math.max(...rects.map((r) => r.y + r.height));
  const cx = (left + right) / 2;
  const cy = (top + bottom) / 2;
  return clampViewBox({ x: cx - width / 2, y: cy - height / 2, width, height }, content, maxScale);
}
