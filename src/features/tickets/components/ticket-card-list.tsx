import { ChevronRight, Grid3x3, MapPin, Ticket } from 'lucide-react';
import { Link } from 'react-router-dom';
import { Pager } from '@/components/ui/data-table-pager';
import { ListStates } from '@/components/ui/list-states';
import { paths } from '@/config/paths';
import type { TicketListItem } from '@shared/schemas/tickets';
import { ClockBadge, PriorityBadge, TicketStatusBadge } from '@/features/tickets/components/ticket-status';
import { formatAgo, formatDateTime } from '@/lib/format';
import type { ReactNode } from 'react';

interface TicketCardListProps {
  label: string;
  items: TicketListItem[];
  isLoading: boolean;
  error: unknown;
  onRetry: () => void;
  /** Paging: without `onLoadMore` the list shows what it was given, with no count or "Load more". */
  hasNextPage?: boolean;
  onLoadMore?: () => void;
  isLoadingMore?: boolean;
  /** Client portal wording ("Waiting for you"). */
  forClient?: boolean;
  /**
   * The service-plan clock pill: on every ticket that has one, only when it is not on track,
   * or never. By default the client reads the status alone and staff see the clock's problems.
   */
  clock?: 'always' | 'problems' | 'never';
  empty: { title: string; description?: ReactNode; action?: ReactNode };
}

/** Tickets as cards, one per row: for the client portal and for technicians on a phone. */
export function TicketCardList({
  label,
  items,
  isLoading,
  error,
  onRetry,
  hasNextPage = false,
  onLoadMore,
  isLoadingMore = false,
  forClient = false,
  clock = forClient ? 'never' : 'problems',
  empty,
}: TicketCardListProps) {
  const list = (
    <ul aria-label={label} className="space-y-2">
      {items.map((t) => (
        <li key={t.id}>
          <Link
            to={paths.ticket.getHref(t.id)}
            className="group flex items-start gap-3 rounded-md border border-stone-200 bg-white p-4 shadow-card hover:border-ink-300 hover:bg-ink-50/40"
          >
            <div className="min-w-0 flex-1 space-y-2">
              <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
                <span className="font-mono text-sm font-medium text-ink-600">{t.ref}</span>
                <TicketStatusBadge status={t.status} forClient={forClient} />
                <PriorityBadge priority={t.priority} />
                {t.clockState && (clock === 'always' || (clock === 'problems' && t.clockState !== 'on_track')) ? (
                  <ClockBadge state={t.clockState} what="Service-plan clock" />
                ) : null}
              </div>
              <p className="text-md font-semibold leading-snug text-ink-950 group-hover:underline">{t.title}</p>
              <p className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm text-stone-600">
                <span className="inline-flex items-center gap-1">
                  <MapPin className="h-3.5 w-3.5" aria-hidden="true" />
                  {forClient ? t.site.name : `${t.client.name} · ${t.site.name}`}
                </span>
                {t.wall ? (
                  <span className="inline-flex items-center gap-1">
                    <Grid3x3 className="h-3.5 w-3.5" aria-hidden="true" />
                    {t.wall.name}
                    {t.cellCount ? ` · ${t.cellCount === 1 ? '1 cabinet' : `${t.cellCount} cabinets`}` : ''}
                  </span>
                ) : null}
                <span title={formatDateTime(t.updatedAt)}>Updated {formatAgo(t.updatedAt)}</span>
              </p>
            </div>
            <ChevronRight className="mt-1 h-5 w-5 shrink-0 text-stone-400 group-hover:text-ink-700" aria-hidden="true" />
          </Link>
        </li>
      ))}
    </ul>
  );
  return (
    <ListStates noun="tickets" icon={Ticket} count={items.length} isLoading={isLoading} error={error} onRetry={onRetry} empty={empty}>
      {onLoadMore ? (
        <div className="space-y-3">
          {list}
          <Pager
            shown={items.length}
            hasNextPage={hasNextPage}
            onLoadMore={onLoadMore}
            isLoadingMore={isLoadingMore}
            noun={['ticket', 'tickets']}
          />
        </div>
      ) : (
        list
      )}
    </ListStates>
  );
}
