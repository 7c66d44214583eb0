import type { ReactNode } from 'react';
import { ArrowRight, Ticket, TriangleAlert } from 'lucide-react';
import { Link, type LoaderFunctionArgs } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { TodayBoard } from '@/features/board/components/today-board';
import { SerialLookupForm } from '@/features/scan/components/serial-lookup-form';
import { TicketCardList } from '@/features/tickets/components/ticket-card-list';
import { ServiceCaution } from '@/features/walls/components/service-caution';
import { WallsBySite } from '@/features/walls/components/walls-by-site';
import { requireUser } from '@/app/auth-guard';
import { errorMessage } from '@/lib/errors';
import { firstName } from '@/lib/format';
import { queryClient } from '@/lib/query-client';
import { audienceOf, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useQuery } from '@tanstack/react-query';
import { wallQueries } from '@/resources/walls';
import { ticketQueries, type TicketFilters } from '@/resources/tickets';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

/** The technician's open tickets, the soonest due first (`GET /api/tickets?assigneeId=me&open=true`). */
const myOpenTickets: TicketFilters = { assigneeId: 'me', open: 'true', sort: 'resolutionDueAt', dir: 'asc' };
const myTicketsLimit = 25;
/** The client's open tickets, the latest news first. */
const clientOpenTickets: TicketFilters = { open: 'true', sort: 'updatedAt', dir: 'desc' };
const clientTicketsLimit = 5;
/** A client organisation has a handful of walls; past this many the overview links to the list. */
const clientWallsLimit = 200;

export async function loader({ request }: LoaderFunctionArgs) {
  const user = await requireUser(request);
  // Warm what the start page shows; anything that fails shows in its own section with the error.
  const audience = audienceOf(user);
  if (audience === 'technician') {
    await queryClient.prefetchQuery(ticketQueries.page(myOpenTickets, myTicketsLimit));
  } else if (audience === 'client') {
    await Promise.all([
      queryClient.prefetchQuery(wallQueries.page({}, clientWallsLimit)),
      queryClient.prefetchQuery(ticketQueries.page(clientOpenTickets, clientTicketsLimit)),
    ]);
  } else {
    await Promise.all([
      queryClient.prefetchQuery(ticketQueries.attention()),
      queryClient.prefetchQuery(ticketQueries.waiting()),
      queryClient.prefetchQuery(ticketQueries.clockCounts()),
    ]);
  }
  return null;
}

function greeting(now = new Date()) {
  const h = now.getHours();
  return h < 5 ? 'Good evening' : h < 12 ? 'Good morning' : h < 18 ? 'Good afternoon' : 'Good evening';
}

/** The start page of each shell: the office's today board, the technician's tickets, the client's overview. */
export function Component() {
  const user = useUser();
  const audience = audienceOf(user);
  useDocumentTitle(audience === 'client' ? 'Overview' : 'Today');
  if (audience === 'technician') return <TechnicianHome name={user.name} />;
  if (audience === 'client') return <ClientHome name={user.name} organisation={user.clientName ?? 'your organisation'} />;
  return <OfficeHome name={user.name} />;
}

/** A titled part of a start page, with a link to the whole list on the right. */
function HomeSection({ id, title, more, children }: { id: string; title: ReactNode; more?: ReactNode; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="min-w-0">
      <div className="mb-3 flex items-baseline justify-between gap-3">
        <h2 id={id} className="text-lg font-semibold">
          {title}
        </h2>
        {more}
      </div>
      {children}
    </section>
  );
}

function MoreLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <Link to={to} className="inline-flex min-h-touch items-center gap-1 text-base font-medium text-ink-700 hover:underline md:min-h-0">
      {children}
      <ArrowRight className="h-4 w-4" aria-hidden="true" />
    </Link>
  );
}

function OfficeHome({ name }: { name: string }) {
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

function TechnicianHome({ name }: { name: string }) {
  const tickets = useQuery(ticketQueries.page(myOpenTickets, myTicketsLimit));
  return (
    <>
      <PageHeader title={`${greeting()}, ${firstName(name)}`} description="Your open tickets, the soonest due first." />
      <div className="space-y-6">
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
              {myTicketsLimit} shown, the soonest due. <Link to={paths.tickets.getHref()} className="link">See them all</Link>
            </p>
          ) : null}
        </HomeSection>

        <HomeSection id="home-open-cabinet" title="Open a cabinet" more={<MoreLink to={paths.scan.getHref()}>Scan</MoreLink>}>
          <Card>
            <SerialLookupForm hint="Printed on the cabinet's label, above the QR code." />
          </Card>
        </HomeSection>

        <ServiceCaution />
      </div>
    </>
  );
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

function ClientHome({ name, organisation }: { name: string; organisation: string }) {
  const walls = useQuery(wallQueries.page({}, clientWallsLimit));
  const tickets = useQuery(ticketQueries.page(clientOpenTickets, clientTicketsLimit));
  const wallItems = walls.data?.items ?? [];
  const withTickets = wallItems.filter((w) => w.openTicketCount > 0).length;
  return (
    <>
      <PageHeader title={`Welcome, ${firstName(name)}`} description={`The service overview for ${organisation}.`} actions={reportFaultButton} />
      <div className="grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
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
