import { Link } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { SerialLookupForm } from '@/features/scan/components/serial-lookup-form';
import { TicketCardList } from '@/features/tickets/components/ticket-card-list';
import { myVisitQueries, TeamToday, TodayVisits, UpcomingVisits } from '@/features/visits/components/my-visits';
import { ServiceCaution } from '@/features/walls/components/service-caution';
import { greeting, HomeSection, MoreLink } from '@/app/routes/app/home-section';
import { firstName } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { useUser } from '@/lib/session';
import { useQuery } from '@tanstack/react-query';
import { ticketQueries, type TicketFilters } from '@/resources/tickets';

/** The technician's open tickets, the soonest due first (`GET /api/tickets?assigneeId=me&open=true`). */
const myOpenTickets: TicketFilters = { assigneeId: 'me', open: 'true', sort: 'resolutionDueAt', dir: 'asc' };
const myTicketsLimit = 25;

/** Warms the technician's visits and open tickets. */
export async function prefetchTechnicianHome() {
  const visits = myVisitQueries();
  await Promise.all([
    queryClient.prefetchQuery(visits.today),
    queryClient.prefetchQuery(visits.leftOpen),
    queryClient.prefetchQuery(visits.upcoming),
    queryClient.prefetchQuery(ticketQueries.page(myOpenTickets, myTicketsLimit)),
  ]);
}

/**
 * The technician's start page: today's visits and the coming ones in time order, their open
 * tickets (the soonest due first), a cabinet lookup, and who else is out today.
 */
export function TechnicianHome({ name }: { name: string }) {
  const user = useUser();
  const tickets = useQuery(ticketQueries.page(myOpenTickets, myTicketsLimit));
  return (
    <>
      <PageHeader title={`${greeting()}, ${firstName(name)}`} description="Your visits, then your open tickets, the soonest due first." />
      <div className="space-y-6">
        <HomeSection id="home-today-visits" title="Today">
          <TodayVisits />
        </HomeSection>

        <HomeSection id="home-upcoming-visits" title="Coming up">
          <UpcomingVisits />
        </HomeSection>

        <HomeSection
          id="home-my-tickets"
          title={
            <>
              My tickets
              {tickets.data && tickets.data.items.length > 0 ? (
                <span className="ml-2 rounded-full bg-ink-50 px-2 py-0.5 align-middle text-sm font-medium tabular-nums text-ink-800">
                  <span className="sr-only">: </span>
                  {tickets.data.items.length}
                  {tickets.data.nextCursor ? '+' : ''}
                  <span className="sr-only"> open</span>
                </span>
              ) : null}
            </>
          }
          more={<MoreLink to={paths.tickets.getHref()}>All</MoreLink>}
        >
          <TicketCardList
            label="Open tickets assigned to you"
            items={tickets.data?.items ?? []}
            isLoading={tickets.isPending}
            error={tickets.error}
            onRetry={() => tickets.refetch()}
            clock="always"
            empty={{ title: 'Nothing assigned to you is open', description: 'The office assigns tickets; they appear here.' }}
          />
          {tickets.data?.nextCursor ? (
            <p className="mt-3 text-base text-stone-600">
              {myTicketsLimit} shown, the soonest due.{' '}
              <Link to={paths.tickets.getHref()} className="link">
                See them all
              </Link>
            </p>
          ) : null}
        </HomeSection>

        <HomeSection id="home-open-cabinet" title="Open a cabinet" more={<MoreLink to={paths.scan.getHref()}>Scan</MoreLink>}>
          <Card>
            <SerialLookupForm hint="Printed on the cabinet's label, above the QR code." />
          </Card>
        </HomeSection>

        <HomeSection id="home-team-today" title="Team today">
          <TeamToday meId={user.id} />
        </HomeSection>

        <ServiceCaution />
      </div>
    </>
  );
}
