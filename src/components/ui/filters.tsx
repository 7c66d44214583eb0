import { Search, X } from 'lucide-react';
import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { inputClasses } from '@/components/ui/field';
import { SelectBox, type SelectOption } from '@/components/ui/select-field';

function FilterLabel({ htmlFor, children }: { htmlFor: string; children: ReactNode }) {
  return (
    <label htmlFor={htmlFor} className="mb-1 block text-xs font-semibold text-stone-600">
      {children}
    </label>
  );
}

interface FilterSearchProps {
  label: string;
  value: string;
  /** Called a moment after typing stops. */
  onChange: (value: string) => void;
  placeholder?: string;
  delayMs?: number;
  className?: string;
}

/**
 * A search box for a list filter; it waits for a pause in typing before asking the server. Leaving
 * the box (a click on a result, on another filter) applies what was typed at once and drops the
 * pending wait, so no late write can follow the person to the page they clicked through to.
 */
export function FilterSearch({ label, value, onChange, placeholder, delayMs = 300, className }: FilterSearchProps) {
  const id = useId();
  const [text, setText] = useState(value);
  const latest = useRef(onChange);
  latest.current = onChange;
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);

  useEffect(() => setText(value), [value]);
  useEffect(() => {
    if (text === value) return;
    timer.current = setTimeout(() => latest.current(text), delayMs);
    return () => clearTimeout(timer.current);
  }, [text, value, delayMs]);
  const flush = () => {
    clearTimeout(timer.current);
    if (text !== value) latest.current(text);
  };

  return (
    <div className={className ?? 'w-full sm:w-64'}>
      <FilterLabel htmlFor={id}>{label}</FilterLabel>
      <div className="relative">
        <Search className="pointer-events-none absolute left-3 top-1/2 h-4 w-4 -translate-y-1/2 text-stone-500" aria-hidden="true" />
        <input
          id={id}
          type="search"
          value={text}
          placeholder={placeholder}
          onChange={(e) => setText(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === 'Enter') flush();
          }}
          onBlur={flush}
          className={inputClasses(false, 'pl-9 pr-9 [&::-webkit-search-cancel-button]:hidden')}
        />
        {text ? (
          <button
            type="button"
            onClick={() => {
              setText('');
              latest.current('');
            }}
            aria-label={`Clear ${label.toLowerCase()}`}
            className="absolute inset-y-0 right-0 flex w-10 items-center justify-center text-stone-500 hover:text-ink-900"
          >
            <X className="h-4 w-4" aria-hidden="true" />
          </button>
        ) : null}
      </div>
    </div>
  );
}

interface FilterSelectProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  options: readonly SelectOption[];
  /** The "no filter" choice. */
  anyLabel: string;
  className?: string;
}

export function FilterSelect({ label, value, onChange, options, anyLabel, className }: FilterSelectProps) {
  const id = useId();
  return (
    <div className={className ?? 'w-full sm:w-48'}>
      <FilterLabel htmlFor={id}>{label}</FilterLabel>
      <SelectBox id={id} value={value} onChange={(e) => onChange(e.target.value)}>
        <option value="">{anyLabel}</option>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </SelectBox>
    </div>
  );
}
