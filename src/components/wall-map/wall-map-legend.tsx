import clsx from 'clsx';
import type { LegendCounts } from '@/components/wall-map/wall-map-cell-model';
import { cellTones, toneStyles } from '@/components/wall-map/wall-map-tones';

/** Under the map: each tone on the wall (installed always) with its count, selection and repair heat when shown. */
export function Legend({ counts, heat, selected }: LegendCounts & { selected: boolean }) {
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
