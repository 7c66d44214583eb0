import { keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import { Plus } from 'lucide-react';
import clsx from 'clsx';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ButtonLink } from '@/components/ui/button';
import { pagedQueryProps } from '@/components/ui/data-table';
import { FilterSearch } from '@/components/ui/filters';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { SavedViews } from '@/features/tickets/components/saved-views';
import { TicketCardList } from '@/features/tickets/components/ticket-card-list';
import { filtersFromParams, filtersToRecord } from '@/features/tickets/components/ticket-filters';
import { TicketsTable } from '@/features/tickets/components/tickets-table';
import { requireUser } from '@/app/auth-guard';
import { useLeavingPage } from '@/lib/list-filters';
import { queryClient } from '@/lib/query-client';
import { audienceOf, useUser, type Audience } from '@/lib/session';
import { useDocumentTitle } from '@/lib/use-document-title';
import { ticketQueries, type TicketFilters } from '@/resources/tickets';
export { RouteErrorBoundary as ErrorBoundary } from '@/app/route-error';

type Show = 'open' | 'done' | 'all';
const showOf = (params: URLSearchParams): Show => {
  const v = params.get('show');
  return v === 'done' || v === 'all' ? v : 'open';
};

/** What each audience's list asks the API for. Office filters live in the address as they are. */
function filtersFor(audience: Audience, params: URLSearchParams): TicketFilters {
  if (audience === 'office') return filtersFromParams(params);
  const show = showOf(params);
  return {
    open: show === 'open' ? 'true' : show === 'done' ? 'false' : undefined,
    assigneeId: audience === 'technician' ? 'me' : undefined,
    q: params.get('q')?.trim().slice(0, 100) || undefined,
    sort: 'updatedAt',
    dir: 'desc',
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  const user = await requireUser(request);
  const filters = filtersFor(audienceOf(user), new URL(request.url).searchParams);
  // Warm the cache; a failure shows in the list (with a retry) rather than instead of the page.
  await queryClient.ensureInfiniteQueryData(ticketQueries.list(filters)).catch(() => undefined);
  return null;
}

export function Component() {
  const user = useUser();
  const audience = audienceOf(user);
  useDocumentTitle(audience === 'technician' ? 'My tickets' : 'Tickets');
  return audience === 'office' ? <OfficeTickets /> : <PortalTickets audience={audience} />;
}

const newTicketButton = (
  <ButtonLink to={paths.newTicket.getHref()} variant="primary" icon={<Plus className="h-4 w-4" aria-hidden="true" />}>
    Open a ticket
  </ButtonLink>
);

function OfficeTickets() {
  const [params, setParams] = useSearchParams();
  const leaving = useLeavingPage();
  const filters = filtersFromParams(params);
  const apply = (next: TicketFilters) => {
    if (!leaving.current) setParams(new URLSearchParams(filtersToRecord(next)), { replace: true });
  };
  return (
    <>
      <PageHeader
        title="Tickets"
        description="Open service requests with their service-plan clock; the Status filter brings back resolved and closed ones."
        actions={newTicketButton}
      />
      <SavedViews filters={filters} onApply={apply} />
      <TicketsTable filters={filters} onFiltersChange={apply} />
    </>
  );
}

const showChoices: { value: Show; label: string }[] = [
  { value: 'open', label: 'Open' },
  { value: 'done', label: 'Done' },
  { value: 'all', label: 'All' },
];

function PortalTickets({ audience }: { audience: 'client' | 'technician' }) {
  const [params, setParams] = useSearchParams();
  const leaving = useLeavingPage();
  const show = showOf(params);
  const filters = filtersFor(audience, params);
  const query = useInfiniteQuery({ ...ticketQueries.list(filters), placeholderData: keepPreviousData });
  const items = query.data?.pages.flatMap((p) => p.items) ?? [];
  const isClient = audience === 'client';
  const update = (key: string, value: string | undefined) => {
    if (leaving.current) return;
    setParams(
      (prev) => {
        const p = new URLSearchParams(prev);
        if (value) p.set(key, value);
        else p.delete(key);
        return p;
      },
      { replace: true },
    );
  };

  return (
    <>
      <PageHeader
        title={isClient ? 'Tickets' : 'My tickets'}
        description={
          isClient
            ? 'What your organisation reported, and where each request stands.'
            : 'Tickets assigned to you, most recently updated first.'
        }
        actions={isClient ? newTicketButton : undefined}
      />
      <div className="mb-4 flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
        <div
          role="group"
          aria-label="Which tickets"
          className="inline-flex w-full rounded-md border border-stone-300 bg-white p-0.5 shadow-sm sm:w-auto"
        >
          {showChoices.map((c) => (
            <button
              key={c.value}
              type="button"
              aria-pressed={show === c.value}
              onClick={() => update('show', c.value === 'open' ? undefined : c.value)}
              className={clsx(
                'min-h-touch flex-1 rounded px-3 text-sm font-medium md:min-h-9',
                show === c.value ? 'bg-ink-700 text-white' : 'text-ink-800 hover:bg-stone-100',
              )}
            >
              {c.label}
            </button>
          ))}
        </div>
        <FilterSearch
          label="Search"
          placeholder="Title or number (1041/26)"
          value={params.get('q') ?? ''}
          onChange={(q) => update('q', q || undefined)}
        />
      </div>
      <TicketCardList
        label={isClient ? 'Your tickets' : 'Tickets assigned to you'}
        items={items}
        forClient={isClient}
        {...pagedQueryProps(query)}
        empty={
          filters.q
            ? { title: 'No tickets match this search', description: 'Try another word or the ticket number.' }
            : isClient
              ? show === 'open'
                ? { title: 'No open tickets', description: 'If something is wrong with a wall, tell us here.', action: newTicketButton }
                : { title: 'No tickets here yet' }
              : {
                  title: show === 'open' ? 'Nothing assigned to you is open' : 'No tickets here',
                  description: 'The office assigns tickets; they appear here.',
                }
        }
      />
    </>
  );
}
