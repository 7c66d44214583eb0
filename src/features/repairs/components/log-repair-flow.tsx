import type { Position } from '@shared/schemas/cabinets';
import { createRepairInput } from '@shared/schemas/repairs';
import type { WallDetail } from '@shared/schemas/walls';
import { ArrowLeft, ArrowRight } from 'lucide-react';
import { useQuery } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { PageSpinner } from '@/components/ui/spinner';
import { useQueueRepair } from '@/features/repairs/api/mutations';
import type { SendResult } from '@/features/repairs/api/send-outbox';
import { useRepairDraft } from '@/features/repairs/hooks/use-repair-draft';
import { RepairStepBody } from '@/features/repairs/components/repair-steps';
import { SavedResult } from '@/features/repairs/components/saved-result';
import { StepIndicator } from '@/features/repairs/components/step-indicator';
import {
  draftKey,
  emptyDraft,
  isAnswered,
  stepsFor,
  toRepairInput,
  toSummary,
  type RepairDraft,
  type StepId,
} from '@/features/repairs/utils/repair-draft';
import { newIdempotencyKey, type OutboxProblem } from '@/lib/offline-queue';
import { wallQueries } from '@/resources/walls';

export interface LogRepairFlowProps {
  from: { visitId?: string; ticketId?: string; wallId?: string };
  wall: WallDetail;
  /** The ticket's reported cells, marked on the map. */
  reported: Position[];
  /** A cell named in the address (`col`, `row`): a new draft starts on it. */
  initialCell: Position | null;
  /** "Ticket T-1042", shown in the outbox. */
  origin?: string;
  userId: string;
  /** Where "Done" leads (the visit, the ticket or the wall) and its words. */
  done: { href: string; label: string };
  /** The service caution, shown above the steps. */
  notice?: ReactNode;
}

/**
 * Logging a repair in a few taps on a phone: the wall map, the cabinet, the component, the module,
 * the fault, the action, the spare, the removed part, notes and photos. Every tap is kept on the
 * phone; Save puts the repair in the outbox and sends it when there is a network.
 */
export function LogRepairFlow(props: LogRepairFlowProps) {
  const { from, wall, initialCell } = props;
  const key = draftKey(from);
  const cabinets = useQuery(wallQueries.cabinets(wall.id));
  const [draft, setDraft] = useRepairDraft(key, () => {
    // A cell named in the address (from the visit's reported cells) starts on its cabinet.
    const at = initialCell && cabinets.data?.items.find((c) => c.column === initialCell.column && c.row === initialCell.row);
    return {
      ...emptyDraft({ ...from, wallId: wall.id }),
      wallName: wall.name,
      cell: at ? { column: at.column, row: at.row } : null,
      cabinet: at ? { id: at.id, serial: at.serial, batch: at.batch } : null,
      step: at ? 'cabinet' : 'cell',
    };
  });
  const [result, setResult] = useState<{ outcome: SendResult; problem: OutboxProblem | null; draft: RepairDraft } | null>(null);

  if (!draft) return <PageSpinner label="Opening the repair" />;
  if (result) {
    return (
      <SavedResult
        outcome={result.outcome}
        problem={result.problem}
        draft={result.draft}
        done={props.done}
        onAnother={() => setResult(null)}
      />
    );
  }
  // A draft kept from another wall (the visit's wall changed): start again on this one.
  if (draft.wallId !== wall.id) {
    setDraft(() => ({ ...emptyDraft({ ...from, wallId: wall.id }), wallName: wall.name }));
    return null;
  }
  const onSaved = (outcome: SendResult, problem: OutboxProblem | null, saved: RepairDraft) => {
    setResult({ outcome, problem, draft: saved });
    // The repair is in the outbox now: the form starts afresh (same wall, same view).
    setDraft(() => ({ ...emptyDraft({ ...from, wallId: wall.id }), wallName: wall.name, view: saved.view }));
  };
  return <FlowSteps {...props} draft={draft} setDraft={setDraft} onSaved={onSaved} />;
}

function FlowSteps({
  wall,
  reported,
  origin,
  userId,
  done,
  notice,
  draft,
  setDraft,
  onSaved,
}: LogRepairFlowProps & {
  draft: RepairDraft;
  setDraft: (change: (d: RepairDraft) => RepairDraft) => void;
  onSaved: (outcome: SendResult, problem: OutboxProblem | null, draft: RepairDraft) => void;
}) {
  const queueRepair = useQueueRepair();
  const [saving, setSaving] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const steps = stepsFor(draft);
  const step: StepId = steps.includes(draft.step) ? draft.step : 'cell';
  const index = steps.indexOf(step);
  // A step can be reached when every step before it is answered.
  const reachable = (s: StepId) => steps.slice(0, steps.indexOf(s)).every((x) => isAnswered(draft, x));
  const go = (s: StepId) => {
    setProblem(null);
    setDraft((d) => ({ ...d, step: s }));
    window.scrollTo({ top: 0 });
  };
  /** After a choice: the next step of the flow as it is now (a choice can add or remove steps). */
  const choose = (change: (d: RepairDraft) => RepairDraft) => {
    setProblem(null);
    setDraft((d) => {
      const next = change(d);
      const list = stepsFor(next);
      const at = list.indexOf(step);
      return { ...next, step: list[Math.min(at + 1, list.length - 1)] };
    });
    window.scrollTo({ top: 0 });
  };
  const update = (change: (d: RepairDraft) => RepairDraft) => setDraft(change);

  const save = async () => {
    const firstOpen = steps.find((s) => !isAnswered(draft, s));
    if (firstOpen) {
      setProblem(`Something is missing: ${firstOpen === 'spare' ? 'the spare' : `the ${firstOpen}`}.`);
      go(firstOpen);
      return;
    }
    const input = toRepairInput(draft, new Date().toISOString());
    const checked = input ? createRepairInput.safeParse(input) : null;
    if (!input || !checked?.success) {
      setProblem(checked?.error?.issues[0]?.message ?? 'Something is missing.');
      return;
    }
    // The key is made once and kept with the draft: a second tap queues the same repair.
    const key = draft.key ?? newIdempotencyKey();
    const saved = { ...draft, key };
    setDraft(() => saved);
    setSaving(true);
    try {
      const { outcome, problem: refusal } = await queueRepair({
        key,
        input,
        photos: saved.photos,
        summary: toSummary(saved, origin),
        state: 'waiting',
        savedAt: new Date().toISOString(),
        attempts: 0,
        lastTriedAt: null,
        lastError: null,
        repairId: null,
        problem: null,
        draft: { ...saved, key: null, step: 'notes' },
      });
      onSaved(outcome, refusal, saved);
    } catch {
      setProblem('The repair could not be kept on this phone (its storage may be full). Nothing was lost from the form: try Save again.');
    } finally {
      setSaving(false);
    }
  };

  const previous = index > 0 ? steps[index - 1] : null;
  const next = index < steps.length - 1 ? steps[index + 1] : null;
  return (
    <div className="space-y-4">
      <StepIndicator steps={steps} current={step} reachable={reachable} onGo={go} />
      {step === 'cell' || step === 'cabinet' ? notice : null}
      {problem ? <Alert tone="danger">{problem}</Alert> : null}
      <RepairStepBody step={step} draft={draft} wall={wall} reported={reported} userId={userId} choose={choose} update={update} />
      <div className="flex gap-3 pt-2">
        {previous ? (
          <Button size="lg" className="flex-1" onClick={() => go(previous)} icon={<ArrowLeft className="h-5 w-5" aria-hidden="true" />}>
            Back
          </Button>
        ) : (
          <ButtonLink size="lg" className="flex-1" to={done.href} icon={<ArrowLeft className="h-5 w-5" aria-hidden="true" />}>
            Back
          </ButtonLink>
        )}
        {next ? (
          <Button
            size="lg"
            variant="primary"
            className="flex-1"
            disabled={!isAnswered(draft, step)}
            onClick={() => go(next)}
            icon={<ArrowRight className="h-5 w-5" aria-hidden="true" />}
          >
            Next
          </Button>
        ) : (
          <Button size="lg" variant="primary" className="flex-1" loading={saving} onClick={() => void save()}>
            Save the repair
          </Button>
        )}
      </div>
    </div>
  );
}
