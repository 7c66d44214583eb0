import { useInfiniteQuery } from '@tanstack/react-query';
import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { pagedQueryProps } from '@/components/ui/data-table';
import { paths } from '@/config/paths';
import { RecordTickets, recordTicketQueries, type TicketScope } from '@/features/tickets/components/record-tickets';
import { VisitCardList } from '@/features/visits/components/visit-list';
import { queryClient } from '@/lib/query-client';
import { visitQueries } from '@/resources/visits';

/** A record's visits, the latest first (the history a client and the office look back on). */
const visitsOf = (scope: TicketScope) => visitQueries.list({ ...scope, dir: 'desc' });

/** Starts the reads of a client's or site's tickets and visits; the page shows while they come. */
export function prefetchRecordWork(scope: TicketScope) {
  for (const query of recordTicketQueries(scope)) void queryClient.prefetchQuery(query);
  void queryClient.prefetchInfiniteQuery(visitsOf(scope));
}

function Section({ id, title, action, children }: { id: string; title: string; action?: ReactNode; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="min-w-0 space-y-3">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={id} className="text-lg font-semibold text-ink-950">
          {title}
        </h2>
        {action}
      </div>
      {children}
    </section>
  );
}

/**
 * The work at a client or a site, below its register facts: its tickets (open first) and its
 * visits (latest first), each opening its own page.
 */
export function RecordWork({ scope, name, staff }: { scope: TicketScope; name: string; staff: boolean }) {
  const visits = useInfiniteQuery(visitsOf(scope));
  const items = useMemo(() => visits.data?.pages.flatMap((p) => p.items) ?? [], [visits.data]);
  return (
    <div className="mt-8 grid gap-5 lg:grid-cols-2">
      <Section
        id="record-tickets"
        title="Tickets"
        action={
          staff ? (
            <Link
              to={paths.tickets.getHref(scope)}
              className="inline-flex min-h-touch items-center text-sm font-medium text-ink-700 hover:underline md:min-h-0"
            >
              All tickets of {name}
            </Link>
          ) : null
        }
      >
        <RecordTickets scope={scope} label={`Tickets of ${name}`} forClient={!staff} />
      </Section>
      <Section id="record-visits" title="Visits">
        <VisitCardList items={items} {...pagedQueryProps(visits)} linkToVisit showClient={false} empty={{ title: 'No visits yet' }} />
      </Section>
    </div>
  );
}
