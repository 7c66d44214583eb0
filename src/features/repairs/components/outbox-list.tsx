import { useQueryClient } from '@tanstack/react-query';
import { CloudOff, Inbox, Pencil, Send, Trash2, TriangleAlert } from 'lucide-react';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { EmptyState } from '@/components/ui/empty-state';
import { PageSpinner } from '@/components/ui/spinner';
import { useToast } from '@/components/ui/toast';
import { paths } from '@/config/paths';
import { sendOutbox } from '@/features/repairs/api/send-outbox';
import { draftKey, type RepairDraft } from '@/features/repairs/utils/repair-draft';
import { saveDraft } from '@/lib/drafts';
import { formatDateTime } from '@/lib/format';
import { removeFromOutbox, useOutbox, type OutboxRepair } from '@/lib/offline-queue';
import { useOnline } from '@/features/repairs/hooks/use-online';

/**
 * The repairs kept on this phone: those waiting for the network (sent by themselves when it is
 * back, or now with "Send now") and those the server refused, to fix in the form or discard.
 */
export function OutboxList() {
  const items = useOutbox();
  const queryClient = useQueryClient();
  const toast = useToast();
  const online = useOnline();
  const [sending, setSending] = useState(false);
  const [discarding, setDiscarding] = useState<OutboxRepair | null>(null);

  if (items === null) return <PageSpinner label="Reading the outbox" />;
  const waiting = items.filter((i) => i.state === 'waiting');
  const attention = items.filter((i) => i.state === 'needs_attention');

  const sendNow = async () => {
    setSending(true);
    try {
      const result = await sendOutbox(queryClient);
      if (result.sent) toast(result.sent === 1 ? '1 repair sent.' : `${result.sent} repairs sent.`);
      else if (result.waiting) toast('Still no connection to Gridkeep: the repairs stay on this phone.', 'danger');
    } finally {
      setSending(false);
    }
  };

  if (!items.length) {
    return (
      <EmptyState icon={Inbox} title="Nothing waiting" description="Every repair logged on this phone has been sent." className="py-16" />
    );
  }

  return (
    <div className="space-y-6">
      {waiting.length ? (
        <section aria-labelledby="outbox-waiting" className="space-y-3">
          <div className="flex flex-wrap items-center justify-between gap-3">
            <h2 id="outbox-waiting" className="text-lg font-semibold">
              Waiting to be sent ({waiting.length})
            </h2>
          </div>
          {!online ? (
            <Alert tone="info" title="This phone has no network.">
              The repairs are kept here and go by themselves when the network is back.
            </Alert>
          ) : null}
          <Button
            size="lg"
            variant="primary"
            className="w-full"
            loading={sending}
            onClick={() => void sendNow()}
            icon={<Send className="h-5 w-5" aria-hidden="true" />}
          >
            Send now
          </Button>
          <ul className="space-y-3" aria-label="Repairs waiting to be sent">
            {waiting.map((item) => (
              <OutboxCard key={item.key} item={item} onDiscard={() => setDiscarding(item)} />
            ))}
          </ul>
        </section>
      ) : null}

      {attention.length ? (
        <section aria-labelledby="outbox-attention" className="space-y-3">
          <h2 id="outbox-attention" className="text-lg font-semibold text-danger-700">
            Needs your attention ({attention.length})
          </h2>
          <ul className="space-y-3" aria-label="Repairs that need your attention">
            {attention.map((item) => (
              <OutboxCard key={item.key} item={item} onDiscard={() => setDiscarding(item)} />
            ))}
          </ul>
        </section>
      ) : null}

      <ConfirmDialog
        open={discarding !== null}
        onClose={() => setDiscarding(null)}
        title={discarding?.problem?.afterSaved ? 'Discard the photos?' : 'Discard this repair?'}
        confirmLabel="Discard"
        tone="danger"
        onConfirm={async () => {
          if (discarding) await removeFromOutbox(discarding.key);
          toast('Discarded from this phone.');
        }}
      >
        {discarding?.problem?.afterSaved ? (
          <p>The repair is recorded; only its photos that were not sent are removed from this phone.</p>
        ) : (
          <p>
            {discarding?.summary.position} · {discarding?.summary.what} is removed from this phone and never sent. This cannot be undone.
          </p>
        )}
      </ConfirmDialog>
    </div>
  );
}

function OutboxCard({ item, onDiscard }: { item: OutboxRepair; onDiscard: () => void }) {
  const navigate = useNavigate();
  const { summary } = item;
  const refused = item.state === 'needs_attention';
  const canReopen = refused && !item.problem?.afterSaved && Boolean(item.draft);

  // The draft goes back into the form it came from; the item leaves the outbox (a new Save queues it again).
  const reopen = async () => {
    const draft = item.draft as RepairDraft;
    const from = draft.visitId
      ? { visitId: draft.visitId }
      : draft.ticketId
        ? { ticketId: draft.ticketId }
        : { wallId: draft.wallId ?? undefined };
    await saveDraft(draftKey(from), { ...draft, key: null });
    await removeFromOutbox(item.key);
    navigate(paths.logRepair.getHref(from));
  };

  return (
    <li className="space-y-3 rounded-md border border-stone-200 bg-white p-4 shadow-card" data-testid="outbox-item">
      <div className="space-y-1">
        <p className="font-semibold text-ink-950">
          {summary.wallName} · {summary.position} · <span className="font-mono">{summary.cabinetSerial}</span>
        </p>
        <p className="text-base text-stone-800">{summary.what}</p>
        {summary.part ? <p className="text-sm text-stone-700">{summary.part}</p> : null}
        <p className="text-sm text-stone-600">
          Logged {formatDateTime(item.input.performedAt ?? item.savedAt)}
          {summary.origin ? ` · ${summary.origin}` : ''}
          {item.photos.length ? ` · ${item.photos.length === 1 ? '1 photo' : `${item.photos.length} photos`}` : ''}
        </p>
      </div>
      {refused && item.problem ? (
        <div role="alert" className="flex gap-2 rounded border border-danger-600/40 bg-danger-50 px-3 py-2.5 text-base text-danger-700">
          <TriangleAlert className="mt-0.5 h-5 w-5 shrink-0" aria-hidden="true" />
          <p>
            {item.problem.afterSaved ? 'The repair is recorded, but its photos were refused: ' : ''}
            {item.problem.message}
          </p>
        </div>
      ) : item.attempts > 0 && item.lastError ? (
        <p className="flex items-center gap-2 text-sm text-stone-700">
          <CloudOff className="h-4 w-4" aria-hidden="true" /> Not sent yet ({item.attempts} {item.attempts === 1 ? 'try' : 'tries'}):{' '}
          {item.lastError}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        {canReopen ? (
          <Button
            size="lg"
            variant="primary"
            className="flex-1"
            onClick={() => void reopen()}
            icon={<Pencil className="h-5 w-5" aria-hidden="true" />}
          >
            Open in the form
          </Button>
        ) : null}
        <Button size="lg" className="flex-1" onClick={onDiscard} icon={<Trash2 className="h-5 w-5" aria-hidden="true" />}>
          Discard
        </Button>
      </div>
    </li>
  );
}
