import { visitStatusLabels, type VisitListItem } from '@shared/schemas/visits';
import type { VisitStatus } from '@shared/schemas/enums';
import clsx from 'clsx';
import { TriangleAlert } from 'lucide-react';
import type { DragEvent, KeyboardEvent } from 'react';
import { canChange } from '@/features/dispatch/components/edit-visit-dialog';
import { formatSiteTime, formatSiteWindow } from '@/lib/site-time';

// Written out in full so Tailwind finds every class name. Colour is never the only signal: the status is written too.
const statusLook: Record<VisitStatus, string> = {
  planned: 'border-l-ink-600 bg-ink-50',
  in_progress: 'border-l-state-at-risk-dot bg-state-at-risk-bg',
  completed: 'border-l-state-on-track-dot bg-state-on-track-bg',
  cancelled: 'border-l-stone-400 bg-stone-100 opacity-70',
};

interface VisitBlockProps {
  visit: VisitListItem;
  /** The row's technician: the conflicts shown are theirs. */
  technicianId: string;
  onOpen: (visit: VisitListItem) => void;
  onDragStart: (visit: VisitListItem, technicianId: string) => void;
  onDragEnd: () => void;
}

/** One visit in a technician's day: the time at the site, the site, the ticket, the status, and a double booking. */
export function VisitBlock({ visit, technicianId, onOpen, onDragStart, onDragEnd }: VisitBlockProps) {
  const bookedTwice = visit.status !== 'cancelled' && visit.conflicts.some((c) => c.technician.id === technicianId);
  const cancelled = visit.status === 'cancelled';
  const movable = canChange(visit) && visit.status === 'planned';
  // The name starts with the words the block shows, in their order (WCAG 2.5.3, label in name),
  // then the day and the status where the block does not show them.
  const statusShown = visit.status !== 'planned';
  const label = [
    formatSiteWindow(visit.windowStart, visit.windowEnd, visit.site.timeZone, { withDay: false }),
    visit.site.name,
    visit.ticket ? visit.ticket.ref : 'Maintenance',
    statusShown ? visitStatusLabels[visit.status] : '',
    bookedTwice ? 'booked twice' : '',
    formatSiteTime(visit.windowStart, visit.site.timeZone, 'EEE d MMM'),
    statusShown ? '' : visitStatusLabels[visit.status],
  ]
    .filter(Boolean)
    .join(', ');
  return (
    // A div acting as a button: some browsers never start a drag on a <button>.
    <div
      role="button"
      tabIndex={0}
      draggable={movable}
      onKeyDown={(e: KeyboardEvent<HTMLDivElement>) => {
        if (e.key === 'Enter' || e.key === ' ') {
          e.preventDefault();
          onOpen(visit);
        }
      }}
      onDragStart={(e: DragEvent<HTMLDivElement>) => {
        e.dataTransfer.effectAllowed = 'move';
        e.dataTransfer.setData('text/plain', visit.id);
        onDragStart(visit, technicianId);
      }}
      onDragEnd={onDragEnd}
      onClick={() => onOpen(visit)}
      aria-label={label}
      title={movable ? 'Drag to another day or technician, or click to change' : undefined}
      className={clsx(
        'block w-full rounded border border-l-4 border-stone-200 px-1.5 py-1 text-left text-xs leading-tight text-stone-900 shadow-sm',
        'hover:border-ink-300 focus-visible:outline focus-visible:outline-2 focus-visible:outline-ink-600',
        movable ? 'cursor-grab active:cursor-grabbing' : 'cursor-pointer',
        bookedTwice ? 'ring-2 ring-inset ring-danger-600' : null,
        statusLook[visit.status],
      )}
    >
      <span className={clsx('block font-semibold tabular-nums', cancelled && 'line-through')}>
        {formatSiteWindow(visit.windowStart, visit.windowEnd, visit.site.timeZone, { withDay: false })}
      </span>{' '}
      <span className={clsx('block truncate', cancelled && 'line-through')}>{visit.site.name}</span>{' '}
      <span className={clsx('block truncate', visit.ticket ? 'font-mono' : 'italic')}>
        {visit.ticket ? visit.ticket.ref : 'Maintenance'}
      </span>{' '}
      {statusShown ? <span className="block text-2xs font-semibold uppercase">{visitStatusLabels[visit.status]}</span> : null}{' '}
      {bookedTwice ? (
        <span className="mt-0.5 flex items-center gap-1 font-semibold text-danger-700">
          <TriangleAlert className="h-3.5 w-3.5 shrink-0" aria-hidden="true" />
          Booked twice
        </span>
      ) : null}
    </div>
  );
}
