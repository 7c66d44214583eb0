import { adjacent } from '@shared/calc/grid';
import type { Run } from '@shared/calc/runs';
import clsx from 'clsx';
import { memo } from 'react';
import type { WallMapGeometry } from '@/components/wall-map/wall-map';
import { runColour } from '@/features/planner/utils/run-colours';

interface RunArrowsProps {
  geometry: WallMapGeometry;
  runs: Run[];
  /** Position of the run being looked at or edited: the others are drawn faint. */
  highlight?: number | null;
  /** Bigger arrows and numbers (the printed sheet). */
  large?: boolean;
}

/**
 * The runs as numbered arrows over the wall map (its `overlay`): every cell of a run is tinted
 * in the run's colour, each link from one cabinet to the next is an arrow across the gap between
 * them (pointing the way the cable goes, leaving the position labels readable), and the run's
 * number sits in a disc on the top-left corner of its first cabinet. A link between cells that are not
 * neighbours is a dashed red line. Drawn in the map's units, so it follows zoom, pan and the
 * rear view.
 */
export const RunArrows = memo(function RunArrows({ geometry, runs, highlight = null, large = false }: RunArrowsProps) {
  const first = geometry.cellRect({ column: 1, row: 1 });
  const unit = Math.min(first.width, first.height);
  const k = large ? 1.3 : 1;
  const strokeWidth = unit * 0.07 * k;
  const head = unit * 0.14 * k;
  const badge = unit * (large ? 0.185 : 0.17);

  return (
    <g aria-hidden="true" pointerEvents="none" data-run-arrows="">
      {runs.map((run, position) => {
        if (run.cells.length === 0) return null;
        const colour = runColour(position);
        const isHighlight = highlight === position;
        const faint = highlight !== null && !isHighlight;
        const rects = run.cells.map((c) => geometry.cellRect(c));
        const start = rects[0];
        return (
          <g key={`${position}-${run.index}`} opacity={faint ? 0.3 : 1}>
            {rects.map((r, i) => (
              <rect
                key={`t${i}`}
                x={r.x}
                y={r.y}
                width={r.width}
                height={r.height}
                rx={4}
                className={colour.fill}
                fillOpacity={isHighlight ? 0.22 : 0.1}
              />
            ))}
            {rects.slice(1).map((b, i) => {
              const a = rects[i];
              const ax = a.x + a.width / 2;
              const ay = a.y + a.height / 2;
              const bx = b.x + b.width / 2;
              const by = b.y + b.height / 2;
              const dx = bx - ax;
              const dy = by - ay;
              const length = Math.hypot(dx, dy) || 1;
              const ux = dx / length;
              const uy = dy / length;
              // Leave the middle of each cell (its label) clear: the arrow spans the gap between the two.
              const trim = Math.min(length / 2 - head * 0.75, Math.abs(ux) * a.width * 0.37 + Math.abs(uy) * a.height * 0.3);
              const x1 = ax + ux * trim;
              const y1 = ay + uy * trim;
              const tx = bx - ux * trim;
              const ty = by - uy * trim;
              // The head's base, where the shaft ends.
              const hx = tx - ux * head;
              const hy = ty - uy * head;
              const broken = !adjacent(run.cells[i], run.cells[i + 1]);
              const tip = `${tx},${ty}`;
              const left = `${hx - uy * head * 0.62},${hy + ux * head * 0.62}`;
              const right = `${hx + uy * head * 0.62},${hy - ux * head * 0.62}`;
              return (
                <g key={i}>
                  <line
                    x1={x1}
                    y1={y1}
                    x2={hx + ux * head * 0.2}
                    y2={hy + uy * head * 0.2}
                    className={clsx(broken ? 'stroke-danger-600' : colour.stroke)}
                    strokeWidth={strokeWidth}
                    strokeLinecap="butt"
                    strokeDasharray={broken ? `${strokeWidth * 1.5} ${strokeWidth * 1.5}` : undefined}
                  />
                  <polygon points={`${tip} ${left} ${right}`} className={clsx(broken ? 'fill-danger-600' : colour.fill)} />
                </g>
              );
            })}
            <circle
              cx={start.x + badge * 0.55}
              cy={start.y + badge * 0.55}
              r={badge}
              className={clsx(colour.fill, 'stroke-white')}
              strokeWidth={strokeWidth * 0.5}
            />
            <text
              x={start.x + badge * 0.55}
              y={start.y + badge * 0.55}
              textAnchor="middle"
              dominantBaseline="central"
              className="fill-white font-sans font-semibold"
              fontSize={badge * (run.index >= 100 ? 0.85 : run.index >= 10 ? 1.05 : 1.3)}
            >
              {run.index}
            </text>
          </g>
        );
      })}
    </g>
  );
});
