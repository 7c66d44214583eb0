import { Ticket } from 'lucide-react';
import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { TodayBoard } from '@/features/board/components/today-board';
import { todaysVisits } from '@/features/board/components/visits-today';
import { greeting } from '@/app/routes/app/home-section';
import { firstName } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { stockQueries } from '@/resources/stock';
import { ticketQueries } from '@/resources/tickets';

/** Warms the today board: its ticket lists, the clock counts, today's visits and the low stock. */
export async function prefetchOfficeHome() {
  await Promise.all([
    queryClient.prefetchQuery(ticketQueries.attention()),
    queryClient.prefetchQuery(ticketQueries.waiting()),
    queryClient.prefetchQuery(ticketQueries.clockCounts()),
    queryClient.prefetchQuery(stockQueries.low()),
    queryClient.prefetchQuery(todaysVisits()),
  ]);
}

/** The office's start page: the today board, what needs attention first. */
export function OfficeHome({ name }: { name: string }) {
  return (
    <>
      <PageHeader
        title={`${greeting()}, ${firstName(name)}`}
        description="Your today board: what needs attention first."
        actions={
          <ButtonLink to={paths.tickets.getHref({ open: 'true' })} icon={<Ticket className="h-4 w-4" aria-hidden="true" />}>
            Open tickets
          </ButtonLink>
        }
      />
      <TodayBoard />
    </>
  );
}
