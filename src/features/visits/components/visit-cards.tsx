import type { VisitListItem } from '@shared/schemas/visits';
import { CalendarDays, ChevronRight, Grid3x3, Ticket, Wrench } from 'lucide-react';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { ListStates } from '@/components/ui/list-states';
import { paths } from '@/config/paths';
import { AddressLink } from '@/features/visits/components/address-link';
import { VisitStatusBadge } from '@/features/visits/components/visit-status';
import { formatSiteWindow } from '@/lib/site-time';

interface VisitCardsProps {
  label: string;
  items: VisitListItem[];
  isLoading: boolean;
  error: unknown;
  onRetry: () => void;
  /** Today's cards leave out the day; the coming days need it. */
  withDay: boolean;
  empty: { title: string; description?: ReactNode };
}

/** Visits as big cards for the technician's phone: the card opens the visit, the address opens the maps app. */
export function VisitCards({ label, items, isLoading, error, onRetry, withDay, empty }: VisitCardsProps) {
  return (
    <ListStates
      noun="visits"
      icon={CalendarDays}
      count={items.length}
      isLoading={isLoading}
      error={error}
      onRetry={onRetry}
      empty={empty}
      compact
    >
      <ul aria-label={label} className="space-y-3">
        {items.map((v) => (
          <li key={v.id} className="rounded-md border border-stone-200 bg-white shadow-card">
            <VisitCard visit={v} withDay={withDay} />
          </li>
        ))}
      </ul>
    </ListStates>
  );
}

function VisitCard({ visit: v, withDay }: { visit: VisitListItem; withDay: boolean }) {
  return (
    <>
      <Link to={paths.visit.getHref(v.id)} className="group flex min-h-touch-lg items-start gap-3 rounded-t-md p-4 hover:bg-ink-50/40">
        <div className="min-w-0 flex-1 space-y-1.5">
          <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
            <span className="text-md font-semibold tabular-nums text-ink-900">
              {formatSiteWindow(v.windowStart, v.windowEnd, v.site.timeZone, { withDay })}
            </span>
            <VisitStatusBadge status={v.status} />
          </div>
          <p className="text-lg font-semibold leading-snug text-ink-950 group-hover:underline">{v.site.name}</p>
          <p className="flex items-start gap-1.5 text-base text-stone-800">
            {v.ticket ? (
              <>
                <Ticket className="mt-1 h-4 w-4 shrink-0 text-ink-600" aria-hidden="true" />
                <span>
                  <span className="font-mono text-sm font-medium text-ink-600">{v.ticket.ref}</span> {v.ticket.title}
                </span>
              </>
            ) : (
              <>
                <Wrench className="mt-1 h-4 w-4 shrink-0 text-ink-600" aria-hidden="true" />
                Planned maintenance
              </>
            )}
          </p>
          {v.wall ? (
            <p className="flex items-center gap-1.5 text-sm text-stone-600">
              <Grid3x3 className="h-4 w-4 shrink-0" aria-hidden="true" />
              {v.wall.name}
            </p>
          ) : null}
        </div>
        <ChevronRight className="mt-1 h-6 w-6 shrink-0 text-stone-400 group-hover:text-ink-700" aria-hidden="true" />
      </Link>
      <div className="border-t border-stone-200 px-4">
        <AddressLink address={v.site.address} />
      </div>
    </>
  );
}

/** Other technicians' visits of the day, read-only: who is where. */
export function TeamVisits({ items }: { items: VisitListItem[] }) {
  if (items.length === 0) return <p className="text-base text-stone-600">No one else is booked today.</p>;
  return (
    <ul aria-label="The team's visits today" className="divide-y divide-stone-200 rounded-md border border-stone-200 bg-white">
      {items.map((v) => (
        <li key={v.id}>
          <Link to={paths.visit.getHref(v.id)} className="flex min-h-touch items-center gap-3 px-4 py-2.5 hover:bg-ink-50/40">
            <span className="min-w-0 flex-1">
              <span className="block text-sm font-medium tabular-nums text-ink-800">
                {formatSiteWindow(v.windowStart, v.windowEnd, v.site.timeZone, { withDay: false })}
              </span>
              <span className="block truncate text-base text-ink-950">{v.site.name}</span>
              <span className="block truncate text-sm text-stone-600">{v.technicians.map((t) => t.name).join(', ')}</span>
            </span>
            <VisitStatusBadge status={v.status} />
          </Link>
        </li>
      ))}
    </ul>
  );
}
