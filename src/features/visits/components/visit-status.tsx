import type { VisitStatus } from '@shared/schemas/enums';
import { visitStatusLabels } from '@shared/schemas/visits';
import clsx from 'clsx';

// Written out in full so Tailwind finds every class name; the word is always there, colour helps.
const tones: Record<VisitStatus, string> = {
  planned: 'bg-ink-50 text-ink-800 ring-ink-200',
  in_progress: 'bg-amber-100 text-amber-900 ring-amber-300',
  completed: 'bg-state-on-track-bg text-state-on-track ring-state-on-track/30',
  cancelled: 'bg-stone-100 text-stone-700 ring-stone-300 line-through',
};

/** A visit's status as a word on a pill: Planned, On site, Completed, Cancelled. */
export function VisitStatusBadge({ status, size = 'sm' }: { status: VisitStatus; size?: 'sm' | 'md' }) {
  return (
    <span
      className={clsx(
        'inline-flex items-center whitespace-nowrap rounded-full font-medium ring-1 ring-inset',
        size === 'md' ? 'px-2.5 py-1 text-sm' : 'px-2 py-0.5 text-xs',
        tones[status],
      )}
    >
      {visitStatusLabels[status]}
    </span>
  );
}
