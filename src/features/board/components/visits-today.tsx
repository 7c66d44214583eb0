import { visitStatusLabels, type VisitListItem } from '@shared/schemas/visits';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { ArrowRight, CalendarCheck, TriangleAlert } from 'lucide-react';
import { Link } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { LoadError } from '@/components/ui/load-error';
import { paths } from '@/config/paths';
import { formatSiteWindow } from '@/lib/site-time';
import { visitQueries } from '@/resources/visits';

/** The office's day, midnight to midnight where the office is: the same strings all day, so the loader's answer is the page's. */
export function todaysVisits(now = new Date()) {
  const day = (offset: number) => new Date(now.getFullYear(), now.getMonth(), now.getDate() + offset).toISOString();
  return visitQueries.range({ from: day(0), to: day(1), status: 'planned,in_progress,completed' });
}

/** The mark on the time line: filled while someone is on site, hollow when planned, ticked off when done. */
const marks: Record<VisitListItem['status'], string> = {
  planned: 'border-ink-500 bg-white',
  in_progress: 'border-amber-500 bg-amber-400',
  completed: 'border-ink-600 bg-ink-600',
  cancelled: 'border-stone-400 bg-stone-200',
};

/** Today's visits as a time line, the soonest first: when (at the site), where, who, and how far along; who is booked twice. */
export function VisitsToday() {
  const query = useQuery(todaysVisits());
  const items = query.data?.items ?? [];
  return (
    <Card
      title="Visits today"
      description="Times at each site."
      actions={
        <Link
          to={paths.dispatch.getHref()}
          className="inline-flex min-h-touch items-center gap-1 text-sm font-medium text-ink-700 hover:underline md:min-h-0"
        >
          Dispatch <ArrowRight className="h-4 w-4" aria-hidden="true" />
        </Link>
      }
    >
      {query.isError ? (
        <LoadError title="Today’s visits could not be loaded." error={query.error} onRetry={() => void query.refetch()} />
      ) : query.isPending ? null : items.length === 0 ? (
        <p className="flex items-center gap-2 text-stone-700">
          <CalendarCheck className="h-4 w-4 text-stone-500" aria-hidden="true" /> No visits booked today.
        </p>
      ) : (
        <ol className="relative ml-1.5 border-l-2 border-stone-200" aria-label="Visits today">
          {items.map((v) => (
            <VisitStop key={v.id} visit={v} />
          ))}
        </ol>
      )}
    </Card>
  );
}

function VisitStop({ visit: v }: { visit: VisitListItem }) {
  const crew = v.technicians.map((t) => t.name).join(', ') || 'No technician';
  return (
    <li className="relative pb-4 pl-5 last:pb-0">
      <span className={clsx('absolute -left-[7px] top-1.5 h-3 w-3 rounded-full border-2', marks[v.status])} aria-hidden="true" />
      <Link to={paths.visit.getHref(v.id)} className="group block min-h-touch md:min-h-0">
        <span className="flex flex-wrap items-baseline gap-x-2">
          <span className="font-semibold tabular-nums text-ink-950">
            {formatSiteWindow(v.windowStart, v.windowEnd, v.site.timeZone, { withDay: false })}
          </span>
          <span className={clsx('text-sm', v.status === 'in_progress' ? 'font-medium text-amber-800' : 'text-stone-600')}>
            {visitStatusLabels[v.status]}
          </span>
        </span>
        <span className="block font-medium text-ink-800 group-hover:underline">{v.site.name}</span>
      </Link>
      <p className="text-sm text-stone-600">
        {crew} · {v.ticket ? `${v.ticket.ref} ${v.ticket.title}` : 'Planned maintenance'}
      </p>
      {v.conflicts.length ? (
        <p className="flex items-center gap-1 text-sm font-medium text-danger-700">
          <TriangleAlert className="h-4 w-4" aria-hidden="true" /> Booked twice:{' '}
          {[...new Set(v.conflicts.map((c) => c.technician.name))].join(', ')}
        </p>
      ) : null}
    </li>
  );
}
