import type { ChecklistItem } from '@shared/schemas/visits';
import { Check, CloudOff, ListChecks } from 'lucide-react';
import { useId } from 'react';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Spinner } from '@/components/ui/spinner';
import type { ChecklistSaveState } from '@/features/visits/hooks/use-visit-checklist';
import { errorMessage } from '@/lib/errors';

interface VisitChecklistProps {
  items: ChecklistItem[];
  /** Without `onToggle` the list is read-only (a closed visit, someone not on it). */
  onToggle?: (index: number) => void;
  state?: ChecklistSaveState;
  error?: unknown;
  onRetry?: () => void;
}

/** The visit's checklist: one big row per item, the whole row is the target. */
export function VisitChecklist({ items, onToggle, state = 'saved', error, onRetry }: VisitChecklistProps) {
  const id = useId();
  const done = items.filter((i) => i.done).length;
  return (
    <Card
      title={
        <span className="inline-flex items-center gap-2">
          <ListChecks className="h-4 w-4 text-ink-600" aria-hidden="true" />
          Checklist
        </span>
      }
      actions={
        items.length > 0 ? (
          <span className="text-sm tabular-nums text-stone-600">
            {done} of {items.length} done
          </span>
        ) : null
      }
    >
      {items.length === 0 ? (
        <p className="text-base text-stone-600">No checklist on this visit.</p>
      ) : (
        <ul className="-my-1 divide-y divide-stone-100" aria-label="Checklist">
          {items.map((item, i) => (
            <li key={`${i}-${item.label}`}>
              <label
                htmlFor={`${id}-${i}`}
                className={`flex min-h-touch-lg items-center gap-4 py-2 ${onToggle ? 'cursor-pointer' : 'cursor-default'}`}
              >
                <input
                  id={`${id}-${i}`}
                  type="checkbox"
                  checked={item.done}
                  disabled={!onToggle}
                  onChange={() => onToggle?.(i)}
                  className="h-7 w-7 shrink-0 rounded border-stone-400 accent-ink-700"
                />
                <span className="text-md text-stone-900">
                  {item.label}
                  {item.note ? <span className="block text-sm text-stone-600">{item.note}</span> : null}
                </span>
              </label>
            </li>
          ))}
        </ul>
      )}
      {onToggle && items.length > 0 ? <SaveState state={state} error={error} onRetry={onRetry} /> : null}
    </Card>
  );
}

function SaveState({ state, error, onRetry }: { state: ChecklistSaveState; error?: unknown; onRetry?: () => void }) {
  return (
    <div aria-live="polite" className="mt-3 text-sm" data-testid="checklist-save-state">
      {state === 'saved' ? (
        <p className="flex items-center gap-1.5 text-stone-600">
          <Check className="h-4 w-4" aria-hidden="true" /> Saved
        </p>
      ) : state === 'saving' ? (
        <p className="flex items-center gap-1.5 text-stone-600">
          <Spinner label="" /> Saving…
        </p>
      ) : (
        <div className="flex flex-wrap items-center justify-between gap-2 rounded border border-amber-300 bg-amber-50 px-3 py-2 text-amber-900">
          <p className="flex items-start gap-1.5">
            <CloudOff className="mt-0.5 h-4 w-4 shrink-0" aria-hidden="true" />
            <span>
              Not sent yet: kept on this phone and sent when the signal is back.
              {error ? <span className="block text-stone-700">{errorMessage(error)}</span> : null}
            </span>
          </p>
          {onRetry ? (
            <Button size="md" onClick={onRetry}>
              Send now
            </Button>
          ) : null}
        </div>
      )}
    </div>
  );
}
