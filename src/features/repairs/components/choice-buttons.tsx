import clsx from 'clsx';
import { Check } from 'lucide-react';
import type { ReactNode } from 'react';

export interface Choice<T extends string> {
  value: T;
  label: ReactNode;
  hint?: ReactNode;
}

/**
 * Big buttons for one choice, sized for a gloved or dusty thumb (at least 56 px high). The
 * chosen one is pressed (`aria-pressed`) and ticked, so colour is not the only sign.
 */
export function ChoiceButtons<T extends string>({
  label,
  choices,
  value,
  onChoose,
  columns = 2,
}: {
  label: string;
  choices: Choice<T>[];
  value: T | null;
  onChoose: (value: T) => void;
  columns?: 1 | 2;
}) {
  return (
    <div role="group" aria-label={label} className={clsx('grid gap-2.5', columns === 2 ? 'grid-cols-2' : 'grid-cols-1')}>
      {choices.map((c) => {
        const chosen = c.value === value;
        return (
          <button
            key={c.value}
            type="button"
            aria-pressed={chosen}
            onClick={() => onChoose(c.value)}
            className={clsx(
              'flex min-h-touch-lg items-center gap-2 rounded-md border-2 px-3.5 py-2.5 text-left text-md font-semibold transition-colors',
              chosen
                ? 'border-ink-800 bg-ink-800 text-white shadow-sm'
                : 'border-stone-300 bg-white text-ink-950 hover:border-ink-400 active:bg-stone-100',
            )}
          >
            <span className="min-w-0 flex-1">
              <span className="block">{c.label}</span>
              {c.hint ? (
                <span className={clsx('block text-sm font-normal', chosen ? 'text-ink-100' : 'text-stone-600')}>{c.hint}</span>
              ) : null}
            </span>
            {chosen ? <Check className="h-5 w-5 shrink-0" aria-hidden="true" /> : null}
          </button>
        );
      })}
    </div>
  );
}
