import type { Position } from '@shared/schemas/cabinets';
import type { TicketDetail } from '@shared/schemas/tickets';
import { useQuery } from '@tanstack/react-query';
import { ArrowLeft, CircleCheck, Grid3x3, Wrench } from 'lucide-react';
import { useState } from 'react';
import { data, Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { PageSpinner } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { CabinetCellDialog } from '@/features/cabinets/components/cabinet-card';
import { useUpdateTicket } from '@/features/tickets/api/mutations';
import { AttachmentsPanel } from '@/features/tickets/components/attachments-panel';
import { HandlingStrip } from '@/features/tickets/components/handling-strip';
import { Logbook } from '@/features/tickets/components/logbook';
import { TicketStateLine } from '@/features/tickets/components/ticket-clocks';
import { InstallationLine, TicketVisits } from '@/features/tickets/components/ticket-facts';
import { TicketRepairs } from '@/features/tickets/components/ticket-repairs';
import { TicketWall } from '@/features/tickets/components/ticket-summary';
import { requireUser } from '@/app/auth-guard';
import { errorMessage } from '@/lib/errors';
import { queryClient } from '@/lib/query-client';
import { audienceOf, isOffice, useUser } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { useMediaQuery } from '@/lib/use-media-query';
import { isRecordId } from '@/lib/record-id';
import { attachmentQueries } from '@/resources/attachments';
import { ticketQueries } from '@/resources/tickets';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

export async function loader({ request, params }: LoaderFunctionArgs) {
  await requireUser(request);
  const id = params.id ?? '';
  // Not an id at all (a mistyped link): the same "not found" as a ticket that is not there.
  if (!isRecordId(id)) throw data('Not found', { status: 404 });
  // The ticket itself must load (a 404 shows "not found"); the rest may load on the page.
  await Promise.all([
    queryClient.ensureQueryData(ticketQueries.detail(id)),
    queryClient.prefetchQuery(ticketQueries.comments(id)),
    queryClient.prefetchQuery(attachmentQueries.ofTicket(id)),
  ]);
  return null;
}

export function Component() {
  const { id = '' } = useParams();
  const ticket = useQuery(ticketQueries.detail(id));
  useDocumentTitle(ticket.data ? `${ticket.data.ref} ${ticket.data.title}` : 'Ticket');
  if (ticket.isPending) return <PageSpinner label="Loading the ticket" />;
  if (ticket.isError)
    return (
      <Alert tone="danger" title="The ticket could not be loaded.">
        {errorMessage(ticket.error)}
      </Alert>
    );
  return <TicketPage ticket={ticket.data} />;
}

function TicketPage({ ticket }: { ticket: TicketDetail }) {
  const user = useUser();
  const audience = audienceOf(user);
  const forClient = audience === 'client';
  const office = isOffice(user);
  const timeZone = ticket.siteTimeZone;
  const closed = ticket.status === 'closed' || Boolean(ticket.mergedInto);
  // Two columns from 1024 px: the wall on the left, the logbook on the right. On a phone the
  // logbook comes first (what happened and the box to answer in), then the wall. The order is the
  // DOM's, so it is also the reading order; keyed, the columns move without losing a draft.
  const wide = useMediaQuery('(min-width: 1024px)');
  // A cell of the map opens its cabinet: the same card as on the wall page.
  const [openCell, setOpenCell] = useState<Position | null>(null);

  const wallColumn = (
    <section key="wall" aria-labelledby="ticket-wall-heading" className="min-w-0 space-y-4">
      <h2 id="ticket-wall-heading" className="flex items-center gap-2 text-lg font-semibold text-ink-950">
        <Grid3x3 className="h-5 w-5 text-ink-600" aria-hidden="true" />
        The wall
      </h2>
      <TicketWall ticket={ticket} onOpenCell={setOpenCell} />
      <AttachmentsPanel ticketId={ticket.id} canUpload={!closed} />
      <TicketVisits visits={ticket.visits} timeZone={timeZone} office={office} />
      <TicketRepairs repairs={ticket.repairs} timeZone={timeZone} />
    </section>
  );
  const logColumn = (
    <div key="log" className="min-w-0">
      <Logbook ticket={ticket} staff={!forClient} closed={closed} />
    </div>
  );

  return (
    <>
      <PageHeader
        className="!mb-4"
        eyebrow={
          <Link to={paths.tickets.getHref()} className="inline-flex items-center gap-1 hover:underline">
            <ArrowLeft className="h-4 w-4" aria-hidden="true" /> {audience === 'technician' ? 'My tickets' : 'Tickets'}
          </Link>
        }
        title={
          <>
            <span className="mr-2 font-mono text-xl font-medium text-ink-600">{ticket.ref}</span>
            {ticket.title}
          </>
        }
        description={<TicketStateLine ticket={ticket} forClient={forClient} />}
        actions={
          !forClient && !closed ? (
            <ButtonLink
              variant="primary"
              size="lg"
              to={paths.logRepair.getHref({ ticketId: ticket.id })}
              icon={<Wrench className="h-5 w-5" aria-hidden="true" />}
            >
              Log a repair
            </ButtonLink>
          ) : null
        }
      />

      <InstallationLine ticket={ticket} forClient={forClient} />

      {ticket.mergedInto ? (
        <Alert tone="info" title={`Merged into ${ticket.mergedInto.ref}`} className="mb-4">
          <p>
            The same fault is followed on{' '}
            <Link to={paths.ticket.getHref(ticket.mergedInto.id)} className="link">
              {ticket.mergedInto.ref}
            </Link>
            . Merged tickets take no more changes.
          </p>
        </Alert>
      ) : null}
      {forClient && ticket.nextStatuses.includes('closed') ? <CloseTicketBanner ticket={ticket} /> : null}
      {forClient ? null : <HandlingStrip ticket={ticket} office={office} timeZone={timeZone} />}

      <div className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)] lg:items-start">
        {wide ? [wallColumn, logColumn] : [logColumn, wallColumn]}
      </div>
      {ticket.wall ? (
        <CabinetCellDialog wall={ticket.wall} position={openCell} onClose={() => setOpenCell(null)} canOperate={!forClient} />
      ) : null}
    </>
  );
}

/** A resolved ticket: the client confirms the fix by closing it (or writes back if it is not fixed). */
function CloseTicketBanner({ ticket }: { ticket: TicketDetail }) {
  const update = useUpdateTicket();
  const toast = useToast();
  const [error, setError] = useState<unknown>(null);
  return (
    <div className="mb-5 flex flex-col gap-3 rounded-md border border-state-on-track/30 bg-state-on-track-bg px-4 py-3 sm:flex-row sm:items-center sm:justify-between">
      <div className="flex gap-3">
        <CircleCheck className="mt-0.5 h-5 w-5 shrink-0 text-state-on-track" aria-hidden="true" />
        <div>
          <p className="font-semibold text-state-on-track">We think this is fixed.</p>
          <p className="text-sm text-stone-800">If the wall looks right, close the ticket. If not, write to us below and we carry on.</p>
          {error ? <p className="mt-1 text-sm font-medium text-danger-700">{errorMessage(error)}</p> : null}
        </div>
      </div>
      <Button
        variant="primary"
        loading={update.isPending}
        onClick={async () => {
          setError(null);
          try {
            await update.mutateAsync({ id: ticket.id, status: 'closed' });
            toast(`${ticket.ref} is closed. Thank you.`);
          } catch (e) {
            setError(e);
          }
        }}
      >
        Close ticket
      </Button>
    </div>
  );
}
