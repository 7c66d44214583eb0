import { Ticket } from 'lucide-react';
import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { BoardSummary } from '@/features/board/components/board-sentence';
import { TodayBoard } from '@/features/board/components/today-board';
import { todaysVisits } from '@/features/board/components/visits-today';
import { greeting } from '@/app/routes/app/home-section';
import { firstName } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { boardQueries } from '@/resources/board';
import { stockQueries } from '@/resources/stock';
import { ticketQueries } from '@/resources/tickets';

/** Warms the today board: the walls with their tickets and next visits, the new tickets, today's visits and the low stock. */
export async function prefetchOfficeHome() {
  await Promise.all([
    queryClient.prefetchQuery(boardQueries.walls()),
    queryClient.prefetchQuery(ticketQueries.waiting()),
    queryClient.prefetchQuery(stockQueries.low()),
    queryClient.prefetchQuery(todaysVisits()),
  ]);
}

/** The office's start page: the counts in a sentence, then the walls that need attention and the day beside them. */
export function OfficeHome({ name }: { name: string }) {
  return (
    <>
      <PageHeader
        title={`${greeting()}, ${firstName(name)}`}
        description={<BoardSummary />}
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
