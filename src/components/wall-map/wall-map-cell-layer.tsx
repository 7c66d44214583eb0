import clsx from 'clsx';
import type { Ref } from 'react';
import type { CellModel } from '@/components/wall-map/wall-map-cell-model';
import type { GridPosition, WallLayout } from '@/components/wall-map/wall-map-geometry';
import { MapRow, type TextLevel } from '@/components/wall-map/wall-map-row';

interface CellLayerProps {
  ref: Ref<SVGGElement>;
  cellRows: CellModel[][];
  layout: WallLayout;
  textLevel: TextLevel;
  /** The window of cells that carry text (see `useTextWindow`). */
  textWindow: { textFrom: number; textTo: number; textRowFrom: number; textRowTo: number };
  /** The selected columns per row, written "|3|7|". */
  selectedByRow: Map<number, string>;
  /** The cell with the tab stop. */
  focus: GridPosition;
  interactive: boolean;
}

/** The cells, one memoised row at a time: a row redraws only when its own text, selection or tab stop changes. */
export function CellLayer({ ref, cellRows, layout, textLevel, textWindow, selectedByRow, focus, interactive }: CellLayerProps) {
  const { textFrom, textTo, textRowFrom, textRowTo } = textWindow;
  return (
    <g
      ref={ref}
      className={clsx(
        // The cells' rounded corners: one rule rather than an attribute on each of 2,000 cells
        // (a browser without the SVG 2 geometry properties draws square corners, nothing worse).
        '[&>g>rect]:outline-none [&>g>rect]:[rx:4px]',
        interactive && '[&>g>rect:hover]:stroke-ink-800 [&>g>rect]:cursor-pointer',
      )}
    >
      {cellRows.map((rowCells, i) => {
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
      })}
    </g>
  );
}
