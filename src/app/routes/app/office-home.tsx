import { Ticket } from 'lucide-react';
import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { attentionTicketsQueryOptions } from '@/features/board/api/get-attention-tickets';
import { clockCountsQueryOptions } from '@/features/board/api/get-clock-counts';
import { waitingTicketsQueryOptions } from '@/features/board/api/get-waiting-tickets';
import { TodayBoard } from '@/features/board/components/today-board';
import { greeting } from '@/app/routes/app/home-section';
import { firstName } from '@/lib/format';
import { queryClient } from '@/lib/query-client';

/** Warms the today board's three lists. */
export async function prefetchOfficeHome() {
  await Promise.all([
    queryClient.prefetchQuery(attentionTicketsQueryOptions()),
    queryClient.prefetchQuery(waitingTicketsQueryOptions()),
    queryClient.prefetchQuery(clockCountsQueryOptions()),
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
