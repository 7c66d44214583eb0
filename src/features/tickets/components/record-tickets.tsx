import { useQuery } from '@tanstack/react-query';
import { TicketCardList } from '@/features/tickets/components/ticket-card-list';
import { ticketQueries } from '@/resources/tickets';

/** Whose tickets: a client's, or one site's. */
export type TicketScope = { clientId: string } | { siteId: string };

/** Every open ticket is listed (up to this many); past them, the latest few resolved or closed ones. */
const openLimit = 50;
const doneLimit = 5;

/** The two reads of a record's tickets, for the page's loader to warm. */
export const recordTicketQueries = (scope: TicketScope) => [
  ticketQueries.page({ ...scope, open: 'true', sort: 'createdAt', dir: 'desc' }, openLimit),
  ticketQueries.page({ ...scope, open: 'false', sort: 'updatedAt', dir: 'desc' }, doneLimit),
];

/** A client's or a site's tickets, the open ones first (newest first), then the latest resolved or closed. */
export function RecordTickets({ scope, label, forClient }: { scope: TicketScope; label: string; forClient: boolean }) {
  const [openQuery, doneQuery] = recordTicketQueries(scope);
  const open = useQuery(openQuery);
  const done = useQuery(doneQuery);
  const items = [...(open.data?.items ?? []), ...(done.data?.items ?? [])];
  return (
    <TicketCardList
      label={label}
      items={items}
      isLoading={open.isPending || done.isPending}
      error={open.error ?? done.error}
      onRetry={() => {
        void open.refetch();
        void done.refetch();
      }}
      forClient={forClient}
      empty={{ title: 'No tickets yet' }}
    />
  );
}
