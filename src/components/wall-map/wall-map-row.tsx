// The cells: plain SVG, one memoised component per row (a tap or an arrow key redraws the one or
// two rows it touches, not the wall), no handlers of their own (the map listens once for all).
// Text is the costly part for the browser, so a cell carries it only when it is big enough on
// screen to read and inside the visible window; its accessible name is always there.
import { cellLabel } from '@shared/calc/grid';
import clsx from 'clsx';
import { memo, type ReactNode } from 'react';
import type { CellModel } from '@/components/wall-map/wall-map-cell-model';
import type { WallLayout } from '@/components/wall-map/wall-map-geometry';
import { toneStyles } from '@/components/wall-map/wall-map-tones';

/** How much text a cell can carry at its size on screen. */
export type TextLevel = 'none' | 'label' | 'full';
export const textLevelFor = (cellPx: number): TextLevel => (cellPx >= 84 ? 'full' : cellPx >= 40 ? 'label' : 'none');

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

/** The sizes every cell of a row shares (the row sits at its own y; its cells at y = 0). */
interface RowBox {
  width: number;
  height: number;
  size: number;
  labelSize: number;
  cy: number;
}

export const MapRow = memo(function MapRow({ cells, layout, textLevel, textFrom, textTo, selectedColumns, tabColumn }: MapRowProps) {
  const width = layout.cellWidth;
  const height = layout.cellHeight;
  const size = Math.min(width, height);
  const box: RowBox = { width, height, size, labelSize: size * 0.2, cy: height / 2 };
  // The row is moved down as a whole and its cells sit at y = 0 in it: then the cells of a column
  // have the same attributes in every row, and the browser styles a few dozen distinct cells
  // instead of 2,000 (it shares the computed style of elements with equal attributes).
  const top = layout.rowCenterY(cells[0]?.row ?? 1) - height / 2;
  // A cell is one element, its own outline: the marks drawn over it (repair heat, open ticket,
  // selection, labels) go in one layer of the row that neither takes the pointer nor is read out.
  // Half the elements a group per cell would need, and half the browser's work to draw them.
  const shapes: ReactNode[] = [];
  const marks: ReactNode[] = [];
  for (const cell of cells) {
    const { column } = cell;
    const cx = layout.columnCenterX(column);
    const x = cx - width / 2;
    const selected = selectedColumns !== '' && selectedColumns.includes(`|${column}|`);
    const level = column >= textFrom && column <= textTo ? textLevel : 'none';
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
        className={toneStyles[cell.tone].shape}
      />,
    );
    pushMarks(marks, cell, box, x, cx, selected, level);
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

/** The marks drawn over one cell: repair heat, the open-ticket corner, selection, position label and serial. */
function pushMarks(marks: ReactNode[], cell: CellModel, box: RowBox, x: number, cx: number, selected: boolean, level: TextLevel) {
  const { column, tone, serial, heat } = cell;
  const { width, height, size, labelSize, cy } = box;
  if (heat && heat > 0) {
    marks.push(
      <rect
        key={`h${column}`}
        x={x}
        width={width}
        height={height}
        rx={4}
        className="fill-state-breached-dot"
        fillOpacity={0.12 + 0.6 * Math.min(1, heat)}
      />,
    );
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
    marks.push(
      <rect
        key={`s${column}`}
        x={x + 5}
        y={5}
        width={width - 10}
        height={height - 10}
        rx={3}
        fill="none"
        className="stroke-amber-500"
        strokeWidth={7}
      />,
    );
  }
  if (level === 'none') return;
  const style = toneStyles[tone];
  const showSerial = level === 'full' && serial;
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
