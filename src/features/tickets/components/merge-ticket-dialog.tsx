import type { TicketDetail } from '@shared/schemas/tickets';
import { useQuery } from '@tanstack/react-query';
import clsx from 'clsx';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog, DialogActions } from '@/components/ui/dialog';
import { FilterSearch } from '@/components/ui/filters';
import { Spinner } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { useMergeTicket } from '@/features/tickets/api/mutations';
import { TicketStatusBadge } from '@/features/tickets/components/ticket-status';
import { errorMessage } from '@/lib/errors';
import { formatAgo } from '@/lib/format';
import { ticketQueries } from '@/resources/tickets';

interface MergeTicketDialogProps {
  open: boolean;
  onClose: () => void;
  ticket: TicketDetail;
}

/** Closes this ticket as a duplicate of another open ticket of the same client. */
export function MergeTicketDialog({ open, onClose, ticket }: MergeTicketDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={`Merge ${ticket.ref} into another ticket`}
      description="This ticket closes; its cells join the other ticket when both are on the same wall, and a note goes on each."
    >
      {open ? <MergeForm ticket={ticket} onDone={onClose} /> : null}
    </Dialog>
  );
}

function MergeForm({ ticket, onDone }: { ticket: TicketDetail; onDone: () => void }) {
  const [q, setQ] = useState('');
  const [intoId, setIntoId] = useState<string | null>(null);
  const [error, setError] = useState<unknown>(null);
  const candidates = useQuery(
    ticketQueries.page({ clientId: ticket.client.id, open: 'true', q: q || undefined, sort: 'updatedAt', dir: 'desc' }, 25),
  );
  const merge = useMergeTicket();
  const toast = useToast();
  const navigate = useNavigate();
  const items = (candidates.data?.items ?? []).filter((t) => t.id !== ticket.id);
  const into = items.find((t) => t.id === intoId);

  return (
    <div className="space-y-3">
      {error ? <Alert tone="danger">{errorMessage(error)}</Alert> : null}
      <FilterSearch
        label={`Open tickets of ${ticket.client.name}`}
        placeholder="Title or number (1041/26)"
        value={q}
        onChange={setQ}
        className="w-full"
      />
      {candidates.isPending ? (
        <Spinner />
      ) : items.length === 0 ? (
        <p className="text-sm text-stone-600">No other open ticket of this client{q ? ' matches' : ''}.</p>
      ) : (
        <fieldset>
          <legend className="sr-only">Merge into</legend>
          <ul className="max-h-72 space-y-1 overflow-y-auto">
            {items.map((t) => (
              <li key={t.id}>
                <label
                  className={clsx(
                    'flex cursor-pointer items-start gap-3 rounded-md border px-3 py-2',
                    intoId === t.id ? 'border-ink-700 bg-ink-50' : 'border-stone-200 hover:bg-stone-50',
                  )}
                >
                  <input
                    type="radio"
                    name="merge-into"
                    className="mt-1 h-4 w-4 accent-ink-700"
                    checked={intoId === t.id}
                    onChange={() => setIntoId(t.id)}
                  />
                  <span className="min-w-0 flex-1">
                    <span className="flex flex-wrap items-center gap-2">
                      <span className="font-mono text-sm font-medium text-ink-700">{t.ref}</span>
                      <TicketStatusBadge status={t.status} />
                    </span>
                    <span className="block font-medium text-ink-950">{t.title}</span>
                    <span className="block text-xs text-stone-600">
                      {t.site.name}
                      {t.wall ? ` · ${t.wall.name}` : ''} · updated {formatAgo(t.updatedAt)}
                    </span>
                  </span>
                </label>
              </li>
            ))}
          </ul>
        </fieldset>
      )}
      <DialogActions>
        <Button onClick={onDone}>Cancel</Button>
        <Button
          variant="primary"
          disabled={!into}
          loading={merge.isPending}
          onClick={async () => {
            if (!into) return;
            setError(null);
            try {
              await merge.mutateAsync({ id: ticket.id, intoTicketId: into.id });
              toast(`${ticket.ref} is merged into ${into.ref}.`);
              onDone();
              navigate(paths.ticket.getHref(into.id));
            } catch (e) {
              setError(e);
            }
          }}
        >
          {into ? `Merge into ${into.ref}` : 'Merge'}
        </Button>
      </DialogActions>
    </div>
  );
}
