import clsx from 'clsx';
import { useId } from 'react';

export interface Choice<T extends string> {
  value: T;
  label: string;
}

interface ChoiceGroupProps<T extends string> {
  legend: string;
  /** Keep the legend for screen readers only. */
  hideLegend?: boolean;
  value: T;
  onChange: (value: T) => void;
  choices: readonly Choice<T>[];
  className?: string;
  size?: 'sm' | 'md';
}

/** A small set of exclusive choices as one row of buttons (native radios underneath). */
export function ChoiceGroup<T extends string>({
  legend,
  hideLegend = false,
  value,
  onChange,
  choices,
  className,
  size = 'md',
}: ChoiceGroupProps<T>) {
  const name = useId();
  return (
    <fieldset className={className}>
      <legend className={clsx(hideLegend ? 'sr-only' : 'mb-1.5 text-sm font-medium text-stone-800')}>{legend}</legend>
      <div className="inline-flex max-w-full flex-wrap rounded border border-stone-300 bg-white p-0.5 shadow-sm">
        {choices.map((c) => (
          <label
            key={c.value}
            className={clsx(
              'relative flex cursor-pointer select-none items-center justify-center rounded-[0.3rem] px-3 font-medium transition-colors',
              size === 'sm' ? 'min-h-8 text-sm' : 'min-h-touch text-base md:min-h-9',
              'has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-ink-600',
              value === c.value ? 'bg-ink-800 text-white' : 'text-ink-800 hover:bg-stone-100',
            )}
          >
            <input
              type="radio"
              name={name}
              value={c.value}
              checked={value === c.value}
              onChange={() => onChange(c.value)}
              className="sr-only"
            />
            {c.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
