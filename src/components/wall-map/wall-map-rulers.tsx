import { memo, type ReactNode } from 'react';
import type { WallLayout } from '@/components/wall-map/wall-map-geometry';

/** The column numbers above the grid and the row numbers left of it, every `step`-th (and the first). */
export const Rulers = memo(function Rulers({ layout, step, fontSize }: { layout: WallLayout; step: number; fontSize: number }) {
  const numbers: ReactNode[] = [];
  for (let c = 1; c <= layout.columns; c += 1) {
    if (c !== 1 && c % step !== 0) continue;
    numbers.push(
      <text
        key={`c${c}`}
        x={layout.columnCenterX(c)}
        y={layout.grid.y / 2}
        textAnchor="middle"
        dominantBaseline="central"
        fontSize={fontSize}
      >
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
