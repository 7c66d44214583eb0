import clsx from 'clsx';
import { stepTitles, type StepId } from '@/features/repairs/utils/repair-draft';

/**
 * Where the technician is in the repair: "Step 3 of 8 · Component", and a bar of the steps; the
 * steps already answered can be tapped to go back to them.
 */
export function StepIndicator({
  steps,
  current,
  reachable,
  onGo,
}: {
  steps: StepId[];
  current: StepId;
  reachable: (step: StepId) => boolean;
  onGo: (step: StepId) => void;
}) {
  const index = steps.indexOf(current);
  return (
    <nav aria-label="Repair steps" className="space-y-2">
      <p className="text-sm font-semibold uppercase tracking-wide text-stone-600" aria-live="polite">
        Step {index + 1} of {steps.length} · <span className="text-ink-950">{stepTitles[current]}</span>
      </p>
      <ol className="flex gap-1">
        {steps.map((step, i) => {
          const done = i < index;
          const canGo = step !== current && reachable(step);
          return (
            <li key={step} className="flex-1">
              <button
                type="button"
                disabled={!canGo}
                onClick={() => onGo(step)}
                aria-current={step === current ? 'step' : undefined}
                aria-label={`${stepTitles[step]}${done ? ' (done)' : ''}`}
                className="group flex h-6 w-full items-center disabled:cursor-default"
              >
                <span
                  className={clsx(
                    'block h-2 w-full rounded-full',
                    step === current ? 'bg-amber-400' : done ? 'bg-ink-700 group-enabled:group-hover:bg-ink-500' : 'bg-stone-300',
                  )}
                />
              </button>
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
