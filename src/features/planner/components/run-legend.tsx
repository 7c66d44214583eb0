import { cabinetsPerRun, runLoad, type Run, type RunLimits } from '@shared/calc/runs';
import clsx from 'clsx';
import { runColour } from '@/features/planner/utils/run-colours';
import { num } from '@/features/planner/utils/format';

interface RunLegendProps {
  runs: Run[];
  limits: RunLimits;
  /** With `onSelect`, each run is a button that picks it for editing. */
  selected?: number | null;
  onSelect?: (position: number) => void;
  /** Shown above the list for screen readers and on screen. */
  label: string;
  className?: string;
}

/** What a run carries against its limit, in words and as a bar. */
export function loadText(cells: number, limits: RunLimits) {
  const load = runLoad(limits, cells);
  const limit = limits.kind === 'data' ? limits.outputCapacityPixels : limits.chainCapacityW;
  const used = 'pixels' in load ? load.pixels : load.watts;
  const unit = limits.kind === 'data' ? 'px' : 'W';
  return { used, limit, share: used / limit, text: `${num(used)} of ${num(limit)} ${unit}`, over: cells > cabinetsPerRun(limits) };
}

/** One line per run: its colour, number, cabinets and load against the limit (pixels or watts). */
export function RunLegend({ runs, limits, selected = null, onSelect, label, className }: RunLegendProps) {
  return (
    <div className={className}>
      <p className="sr-only">{label}</p>
      <ol className="grid gap-1.5 sm:grid-cols-2 2xl:grid-cols-3" aria-label={label}>
        {runs.map((run, position) => {
          const colour = runColour(position);
          const load = loadText(run.cells.length, limits);
          const body = (
            <>
              <span
                className={clsx(
                  'flex h-6 w-6 shrink-0 items-center justify-center rounded-full text-xs font-semibold text-white',
                  colour.swatch,
                )}
              >
                {run.index}
              </span>
              <span className="min-w-0 flex-1">
                <span className="flex items-baseline justify-between gap-2">
                  <span className="font-medium text-ink-950">
                    Run {run.index}{' '}
                    <span className="font-normal text-stone-600">
                      · {run.cells.length} {run.cells.length === 1 ? 'cabinet' : 'cabinets'}
                    </span>
                  </span>
                  <span
                    className={clsx(
                      'whitespace-nowrap text-xs tabular-nums',
                      load.over ? 'font-semibold text-danger-700' : 'text-stone-600',
                    )}
                  >
                    {Math.round(load.share * 100)} %
                  </span>
                </span>
                <span className="mt-1 block h-1.5 overflow-hidden rounded-full bg-stone-200" aria-hidden="true">
                  <span
                    className={clsx('block h-full rounded-full', load.over ? 'bg-danger-600' : colour.swatch)}
                    style={{ width: `${Math.min(100, load.share * 100)}%` }}
                  />
                </span>
                <span className={clsx('mt-0.5 block text-xs tabular-nums', load.over ? 'font-medium text-danger-700' : 'text-stone-600')}>
                  {load.text}
                  {load.over ? ' — over the limit' : ''}
                </span>
              </span>
            </>
          );
          return (
            <li key={`${position}-${run.index}`}>
              {onSelect ? (
                <button
                  type="button"
                  onClick={() => onSelect(position)}
                  aria-pressed={selected === position}
                  className={clsx(
                    'flex w-full items-start gap-2.5 rounded border px-2.5 py-2 text-left text-sm',
                    selected === position
                      ? 'border-ink-600 bg-ink-50 ring-1 ring-ink-600'
                      : 'border-stone-200 bg-white hover:border-stone-400',
                  )}
                >
                  {body}
                </button>
              ) : (
                <div className="flex items-start gap-2.5 rounded border border-stone-200 bg-white px-2.5 py-2 text-sm">{body}</div>
              )}
            </li>
          );
        })}
      </ol>
    </div>
  );
}
