import type { TicketListItem } from '@shared/schemas/tickets';
import { useQuery } from '@tanstack/react-query';
import { ArrowRight, Inbox } from 'lucide-react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { LoadError } from '@/components/ui/load-error';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useAcknowledgeTicket } from '@/features/board/api/mutations';
import { ClockWords } from '@/features/board/components/clock-words';
import { errorMessage } from '@/lib/errors';
import { formatAgo } from '@/lib/format';
import { boardListLimit, ticketQueries } from '@/resources/tickets';

/** New tickets nobody has acknowledged yet, the oldest first (their response clock runs), each with Acknowledge. */
export function WaitingList() {
  const query = useQuery(ticketQueries.waiting());
  const items = query.data?.items ?? [];
  return (
    <Card
      title="New, waiting for acknowledgement"
      actions={
        <Link
          to={paths.tickets.getHref({ status: 'new', sort: 'createdAt', dir: 'asc' })}
          className="inline-flex min-h-touch items-center gap-1 text-sm font-medium text-ink-700 hover:underline md:min-h-0"
        >
          All new <ArrowRight className="h-4 w-4" aria-hidden="true" />
        </Link>
      }
      flush
    >
      {query.isError ? (
        <div className="p-4">
          <LoadError title="The new tickets could not be loaded." error={query.error} onRetry={() => void query.refetch()} />
        </div>
      ) : query.isPending ? null : items.length === 0 ? (
        <p className="flex items-center gap-2 px-4 py-3 text-stone-700 sm:px-5">
          <Inbox className="h-4 w-4 text-stone-500" aria-hidden="true" /> Every new ticket is acknowledged.
        </p>
      ) : (
        <>
          <ul className="divide-y divide-stone-100" aria-label="New tickets waiting for acknowledgement">
            {items.map((t) => (
              <WaitingLine key={t.id} ticket={t} />
            ))}
          </ul>
          {query.data.nextCursor ? (
            <p className="border-t border-stone-100 px-4 py-2 text-sm text-stone-600 sm:px-5">The {boardListLimit} oldest are shown.</p>
          ) : null}
        </>
      )}
    </Card>
  );
}

function WaitingLine({ ticket: t }: { ticket: TicketListItem }) {
  const acknowledge = useAcknowledgeTicket();
  const toast = useToast();
  const clock = { clockState: t.clockState, dueAt: t.responseDueAt, dueKind: t.responseDueAt ? ('response' as const) : null };
  return (
    <li className="flex items-start gap-3 px-4 py-3 sm:px-5">
      <div className="min-w-0 flex-1">
        <Link to={paths.ticket.getHref(t.id)} className="group block min-h-touch py-1 md:min-h-0">
          <span className="font-mono text-sm text-ink-700">{t.ref}</span>{' '}
          <span className="font-medium text-ink-950 group-hover:underline">{t.title}</span>
        </Link>
        <p className="text-sm text-stone-600">
          {t.client.name} · {t.wall ? t.wall.name : t.site.name} · opened {formatAgo(t.createdAt)}
        </p>
        <p className="text-sm text-stone-700">
          <ClockWords ticket={clock} />
        </p>
      </div>
      <Button
        loading={acknowledge.isPending}
        onClick={async () => {
          try {
            await acknowledge.mutateAsync(t.id);
            toast(`${t.ref} is acknowledged. The client gets an e-mail.`);
          } catch (e) {
            toast(errorMessage(e), 'danger');
          }
        }}
        aria-label={`Acknowledge ${t.ref}`}
      >
        Acknowledge
      </Button>
    </li>
  );
}
