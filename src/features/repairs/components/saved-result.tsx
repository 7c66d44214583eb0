import { CircleCheck, CloudOff, Plus, TriangleAlert } from 'lucide-react';
import { Button, ButtonLink } from '@/components/ui/button';
import { paths } from '@/config/paths';
import type { SendResult } from '@/features/repairs/api/send-outbox';
import { describeWork, type RepairDraft } from '@/features/repairs/utils/repair-draft';
import { cellLabel } from '@shared/calc/grid';
import { useOutboxCounts, type OutboxProblem } from '@/lib/offline-queue';

/** After Save: sent, kept on the phone until the network is back, or refused by the server. */
export function SavedResult({
  outcome,
  problem,
  draft,
  done,
  onAnother,
}: {
  outcome: SendResult;
  problem: OutboxProblem | null;
  draft: RepairDraft;
  done: { href: string; label: string };
  onAnother: () => void;
}) {
  const counts = useOutboxCounts();
  const what = `${draft.cell ? cellLabel(draft.cell) : ''} · ${draft.cabinet?.serial ?? ''} · ${describeWork(draft)}`;
  return (
    <div className="space-y-5">
      {outcome === 'sent' ? (
        <div role="status" className="space-y-2 rounded-md border-2 border-state-on-track/40 bg-state-on-track-bg p-4">
          <p className="flex items-center gap-2 text-xl font-semibold text-state-on-track">
            <CircleCheck className="h-6 w-6" aria-hidden="true" /> Repair recorded
          </p>
          <p className="text-base text-stone-800">{what}</p>
        </div>
      ) : outcome === 'waiting' ? (
        <div role="status" className="space-y-2 rounded-md border-2 border-amber-400 bg-amber-50 p-4" data-testid="saved-offline">
          <p className="flex items-center gap-2 text-xl font-semibold text-amber-900">
            <CloudOff className="h-6 w-6" aria-hidden="true" /> Saved on this phone, will send when the network is back
          </p>
          <p className="text-base text-stone-800">{what}</p>
          <p className="text-base font-medium text-ink-950">
            {counts.waiting === 1 ? '1 repair is waiting to be sent.' : `${counts.waiting} repairs are waiting to be sent.`}
          </p>
        </div>
      ) : (
        <div role="alert" className="space-y-2 rounded-md border-2 border-danger-600/50 bg-danger-50 p-4">
          <p className="flex items-center gap-2 text-xl font-semibold text-danger-700">
            <TriangleAlert className="h-6 w-6" aria-hidden="true" /> The server did not accept this repair
          </p>
          <p className="text-base text-stone-800">{what}</p>
          {problem ? <p className="text-base font-medium text-danger-700">{problem.message}</p> : null}
          <p className="text-base text-stone-800">
            It is kept on this phone: fix it from the outbox (it opens again in this form) or discard it.
          </p>
        </div>
      )}
      <div className="grid gap-3">
        {outcome !== 'sent' ? (
          <ButtonLink size="lg" to={paths.outbox.getHref()}>
            Open the outbox
          </ButtonLink>
        ) : null}
        <Button size="lg" variant="primary" onClick={onAnother} icon={<Plus className="h-5 w-5" aria-hidden="true" />}>
          Log another repair
        </Button>
        <ButtonLink size="lg" to={done.href}>
          {done.label}
        </ButtonLink>
      </div>
    </div>
  );
}
