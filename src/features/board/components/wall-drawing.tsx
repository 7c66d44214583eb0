import type { Position } from '@shared/schemas/cabinets';
import clsx from 'clsx';

/** The drawing fits in this box (CSS px); cabinets are drawn square. */
const maxWidth = 112;
const maxHeight = 64;
/** Below this many px per cabinet the grid lines would merge into a grey block: only the outline is drawn. */
const minLinePitch = 3;

/** The distinct cabinets named, inside the grid. */
export function reportedCells(columns: number, rows: number, cells: Position[]): Position[] {
  const seen = new Map<string, Position>();
  for (const c of cells) {
    if (c.column >= 1 && c.column <= columns && c.row >= 1 && c.row <= rows) seen.set(`${c.column}:${c.row}`, c);
  }
  return [...seen.values()];
}

/** "6 × 4 cabinets, 2 reported" — the drawing's name for screen readers (columns × rows, as the trade says a wall's size). */
export function drawingLabel(columns: number, rows: number, reported: number, wholeWall: boolean): string {
  const size = `${columns} × ${rows} cabinets`;
  if (wholeWall) return `${size}, the whole wall reported`;
  return reported === 0 ? `${size}, no cabinet named` : `${size}, ${reported} reported`;
}

/**
 * A small drawing of a wall's grid as seen from the audience, the cabinets its open tickets name
 * filled in: a picture, not a map (the wall's page has the map).
 */
export function WallDrawing({
  columns,
  rows,
  cells,
  wholeWall = false,
  className,
}: {
  columns: number;
  rows: number;
  cells: Position[];
  wholeWall?: boolean;
  className?: string;
}) {
  const pitch = Math.min(maxWidth / Math.max(columns, 1), maxHeight / Math.max(rows, 1), 14);
  const width = pitch * columns;
  const height = pitch * rows;
  const marked = reportedCells(columns, rows, cells);
  const lines = pitch >= minLinePitch;
  return (
    <svg
      role="img"
      aria-label={drawingLabel(columns, rows, marked.length, wholeWall)}
      viewBox={`-1 -1 ${width + 2} ${height + 2}`}
      width={width + 2}
      height={height + 2}
      className={clsx('shrink-0 overflow-visible', className)}
    >
      <rect x={0} y={0} width={width} height={height} className={wholeWall ? 'fill-state-open-ticket-bg' : 'fill-stone-100'} />
      {marked.map((c) => (
        <rect
          key={`${c.column}:${c.row}`}
          x={(c.column - 1) * pitch}
          y={(c.row - 1) * pitch}
          width={pitch}
          height={pitch}
          className="fill-state-open-ticket-dot"
        />
      ))}
      {lines ? (
        <path
          d={[
            ...Array.from({ length: columns - 1 }, (_, i) => `M${(i + 1) * pitch} 0V${height}`),
            ...Array.from({ length: rows - 1 }, (_, i) => `M0 ${(i + 1) * pitch}H${width}`),
          ].join('')}
          className="stroke-white"
          strokeWidth={pitch >= 6 ? 1 : 0.5}
          fill="none"
        />
      ) : null}
      <rect
        x={0}
        y={0}
        width={width}
        height={height}
        fill="none"
        className={wholeWall ? 'stroke-state-open-ticket-dot' : 'stroke-stone-400'}
        strokeWidth={wholeWall ? 2 : 1}
      />
    </svg>
  );
}
