import { ticketPriorities } from '@shared/schemas/enums';
import { priorityGuidance } from '@shared/schemas/tickets';
import clsx from 'clsx';
import { useFormContext } from 'react-hook-form';
import { FieldErrorText, useFieldState } from '@/components/ui/field';
import { priorityTones } from '@/features/tickets/components/ticket-status';

/** "How bad is it?": one card per priority with the plain-language guidance the client reads. */
export function PriorityPicker({ name = 'priority', hideLegend = false }: { name?: string; hideLegend?: boolean }) {
  const { register, watch } = useFormContext();
  const { id, errorId, error } = useFieldState(name);
  const value = watch(name) as string | undefined;
  return (
    <fieldset aria-describedby={error ? errorId : undefined} className="space-y-2">
      <legend className={hideLegend ? 'sr-only' : 'mb-2 text-sm font-medium text-stone-800'}>How bad is it?</legend>
      <div className="grid gap-2 sm:grid-cols-2">
        {ticketPriorities.map((p) => {
          const checked = value === p;
          return (
            <label
              key={p}
              htmlFor={`${id}-${p}`}
              className={clsx(
                'flex cursor-pointer items-start gap-3 rounded-md border bg-white p-3 transition-colors',
                'has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-ink-600 has-[:focus-visible]:ring-offset-2',
                checked
                  ? 'border-ink-700 bg-ink-50 shadow-[inset_0_0_0_1px_theme(colors.ink.700)]'
                  : 'border-stone-300 hover:border-stone-400',
              )}
            >
              <input id={`${id}-${p}`} type="radio" value={p} className="mt-1 h-4 w-4 shrink-0 accent-ink-700" {...register(name)} />
              <span className="min-w-0 space-y-0.5">
                <span className="flex items-center gap-2 font-semibold text-ink-950">
                  <span className="flex h-3 items-end gap-px" aria-hidden="true">
                    {[1, 2, 3, 4].map((n) => (
                      <span
                        key={n}
                        className={clsx(
                          'w-[3px] rounded-sm',
                          n <= priorityTones[p].bars
                            ? p === 'critical'
                              ? 'bg-danger-600'
                              : p === 'high'
                                ? 'bg-amber-600'
                                : 'bg-ink-600'
                            : 'bg-stone-300',
                        )}
                        style={{ height: `${n * 25}%` }}
                      />
                    ))}
                  </span>
                  {priorityGuidance[p].label}
                </span>
                <span className="block text-sm text-stone-700">{priorityGuidance[p].help}</span>
              </span>
            </label>
          );
        })}
      </div>
      {error ? <FieldErrorText id={errorId} message="Choose how bad it is." /> : null}
    </fieldset>
  );
}
