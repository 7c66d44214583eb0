import { visitStatusLabels, type VisitListItem } from '@shared/schemas/visits';
import { useQuery } from '@tanstack/react-query';
import { ArrowRight, CalendarCheck, TriangleAlert } from 'lucide-react';
import { Link } from 'react-router-dom';
import { Badge } from '@/components/ui/badge';
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

/** Today's visits, the soonest first: who is where, and who is booked twice. */
export function VisitsToday() {
  const query = useQuery(todaysVisits());
  const items = query.data?.items ?? [];
  return (
    <Card
      title="Visits today"
      description="Times at each site."
      actions={
        <Link to={paths.dispatch.getHref()} className="inline-flex items-center gap-1 text-sm font-medium text-ink-700 hover:underline">
          Dispatch <ArrowRight className="h-4 w-4" aria-hidden="true" />
        </Link>
      }
      flush
    >
      {query.isError ? (
        <div className="p-4">
          <LoadError title="Today’s visits could not be loaded." error={query.error} onRetry={() => void query.refetch()} />
        </div>
      ) : query.isPending ? null : items.length === 0 ? (
        <p className="flex items-center gap-2 px-4 py-3 text-stone-700 sm:px-5">
          <CalendarCheck className="h-4 w-4 text-stone-500" aria-hidden="true" /> No visits booked today.
        </p>
      ) : (
        <ul className="divide-y divide-stone-100" aria-label="Visits today">
          {items.map((v) => (
            <VisitLine key={v.id} visit={v} />
          ))}
        </ul>
      )}
    </Card>
  );
}

function VisitLine({ visit: v }: { visit: VisitListItem }) {
  return (
    <li className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-2.5 sm:px-5">
      <span className="min-w-0">
        <Link to={paths.visit.getHref(v.id)} className="font-medium text-ink-800 hover:underline">
          {formatSiteWindow(v.windowStart, v.windowEnd, v.site.timeZone, { withDay: false })} · {v.site.name}
        </Link>
        <span className="block text-sm text-stone-600">
          {v.ticket ? `${v.ticket.ref} ${v.ticket.title}` : 'Planned maintenance'} ·{' '}
          {v.technicians.map((t) => t.name).join(', ') || 'No technician'}
        </span>
        {v.conflicts.length ? (
          <span className="flex items-center gap-1 text-sm font-medium text-danger-700">
            <TriangleAlert className="h-4 w-4" aria-hidden="true" /> Booked twice:{' '}
            {[...new Set(v.conflicts.map((c) => c.technician.name))].join(', ')}
          </span>
        ) : null}
      </span>
      <Badge tone={v.status === 'in_progress' ? 'amber' : v.status === 'completed' ? 'ink' : 'neutral'}>
        {visitStatusLabels[v.status]}
      </Badge>
    </li>
  );
}
