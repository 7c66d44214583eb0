import { TriangleAlert } from 'lucide-react';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { TicketCardList } from '@/features/tickets/components/ticket-card-list';
import { WallsBySite } from '@/features/walls/components/walls-by-site';
import { HomeSection, MoreLink } from '@/app/routes/app/home-section';
import { errorMessage } from '@/lib/errors';
import { firstName } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { useQuery } from '@tanstack/react-query';
import { wallQueries } from '@/resources/walls';
import { ticketQueries, type TicketFilters } from '@/resources/tickets';

/** The client's open tickets, the latest news first. */
const clientOpenTickets: TicketFilters = { open: 'true', sort: 'updatedAt', dir: 'desc' };
const clientTicketsLimit = 5;
/** A client organisation has a handful of walls; past this many the overview links to the list. */
const clientWallsLimit = 200;

/** Warms the client's walls and open tickets. */
export async function prefetchClientHome() {
  await Promise.all([
    queryClient.prefetchQuery(wallQueries.page({}, clientWallsLimit)),
    queryClient.prefetchQuery(ticketQueries.page(clientOpenTickets, clientTicketsLimit)),
  ]);
}

const reportFaultButton = (
  <ButtonLink
    to={paths.newTicket.getHref()}
    variant="primary"
    size="lg"
    className="w-full sm:w-auto"
    icon={<TriangleAlert className="h-5 w-5" aria-hidden="true" />}
  >
    Report a fault
  </ButtonLink>
);

/** The client portal's overview: the organisation's walls by site, its open tickets, and "Report a fault". */
export function ClientHome({ name, organisation }: { name: string; organisation: string }) {
  const tickets = useQuery(ticketQueries.page(clientOpenTickets, clientTicketsLimit));
  return (
    <>
      <PageHeader
        title={`Welcome, ${firstName(name)}`}
        description={`The service overview for ${organisation}.`}
        actions={reportFaultButton}
      />
      <div className="grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <YourWalls />

        <HomeSection id="home-open-tickets" title="Open tickets" more={<MoreLink to={paths.tickets.getHref()}>All tickets</MoreLink>}>
          <TicketCardList
            label="Your open tickets"
            items={tickets.data?.items ?? []}
            isLoading={tickets.isPending}
            error={tickets.error}
            onRetry={() => tickets.refetch()}
            forClient
            clock="always"
            empty={{ title: 'No open tickets', description: 'If something is wrong with a wall, report it and we take it from there.' }}
          />
          {tickets.data?.nextCursor ? (
            <p className="mt-3 text-base text-stone-600">
              The {clientTicketsLimit} most recently updated.{' '}
              <Link to={paths.tickets.getHref()} className="link">
                See every open ticket
              </Link>
            </p>
          ) : null}
        </HomeSection>
      </div>
    </>
  );
}

/** "Your walls": the organisation's walls by site, and how many have an open ticket. */
function YourWalls() {
  const walls = useQuery(wallQueries.page({}, clientWallsLimit));
  const wallItems = walls.data?.items ?? [];
  const withTickets = wallItems.filter((w) => w.openTicketCount > 0).length;
  return (
    <HomeSection
      id="home-walls"
      title="Your walls"
      more={walls.data?.nextCursor ? <MoreLink to={paths.walls.getHref()}>All walls</MoreLink> : undefined}
    >
      {walls.isPending ? (
        <p className="flex items-center gap-2 py-8 text-stone-600">
          <Spinner label="" /> Loading your walls…
        </p>
      ) : walls.isError ? (
        <Alert tone="danger" title="Your walls could not be loaded.">
          <p>{errorMessage(walls.error)}</p>
          <Button size="sm" className="mt-2" onClick={() => walls.refetch()}>
            Try again
          </Button>
        </Alert>
      ) : wallItems.length === 0 ? (
        <div className="rounded-md border border-stone-200 bg-white shadow-card">
          <EmptyState title="No walls registered yet" description="Your walls appear here once we have registered them." />
        </div>
      ) : (
        <>
          <p className="mb-3 text-base text-stone-700">
            {wallItems.length === 1 ? '1 wall' : `${wallItems.length} walls`}
            {withTickets === 0 ? ', none with an open ticket.' : `, ${withTickets} with open tickets.`}
          </p>
          <WallsBySite walls={wallItems} />
        </>
      )}
    </HomeSection>
  );
}
