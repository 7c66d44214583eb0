import clsx from 'clsx';
import { Search, SlidersHorizontal, X } from 'lucide-react';
import { createContext, useCallback, useContext, useEffect, useId, useMemo, useRef, useState, type ReactNode } from 'react';
import { inputClasses } from '@/components/ui/field';
import { SelectBox, type SelectOption } from '@/components/ui/select-field';
import { useMediaQuery } from '@/lib/use-media-query';

/** Below Tailwind's `sm` (640 px) a list is read on a phone (the same break as the cards of a list). */
const phoneQuery = '(max-width: 639.98px)';

interface FoldState {
  /** On a phone with the filters closed: a foldable filter is not shown. */
  folded: boolean;
  onPhone: boolean;
  /** A foldable filter says it is there and whether it filters anything. */
  report: (id: string, active: boolean | null) => void;
}

const FilterFoldContext = createContext<FoldState | null>(null);

/** Registers a foldable filter with the surrounding <FilterBar>; the class that folds it away. */
function useFold(active: boolean, foldable = true) {
  const fold = useContext(FilterFoldContext);
  const id = useId();
  const report = foldable ? fold?.report : undefined;
  useEffect(() => {
    report?.(id, active);
  }, [report, id, active]);
  useEffect(() => () => report?.(id, null), [report, id]);
  if (!foldable || !fold?.onPhone) return undefined;
  // Below the Filters button when open; not shown at all when folded.
  return fold.folded ? 'hidden' : 'order-last';
}

/**
 * A list's filters. On a wide screen they stand in a row as they are; on a phone the search box
 * stays in sight and the other filters fold behind a "Filters" button that says how many are
 * applied, so the list starts on the first screen.
 */
export function FilterBar({ children }: { children: ReactNode }) {
  const onPhone = useMediaQuery(phoneQuery);
  const [open, setOpen] = useState(false);
  const [filters, setFilters] = useState<Record<string, boolean>>({});
  const report = useCallback(
    (id: string, active: boolean | null) =>
      setFilters((all) => {
        if (active === null) {
          if (!(id in all)) return all;
          const { [id]: _gone, ...rest } = all;
          return rest;
        }
        return all[id] === active ? all : { ...all, [id]: active };
      }),
    [],
  );
  const fold = useMemo<FoldState>(() => ({ folded: onPhone && !open, onPhone, report }), [onPhone, open, report]);
  const count = Object.values(filters).filter(Boolean).length;
  const any = Object.keys(filters).length > 0;
  return (
    <FilterFoldContext.Provider value={fold}>
      {children}
      {onPhone && any ? (
        <button
          type="button"
          aria-expanded={open}
          onClick={() => setOpen((o) => !o)}
          className={clsx(
            'inline-flex min-h-touch w-full items-center justify-center gap-2 rounded-md border px-3 text-sm font-medium shadow-sm',
            count > 0 ? 'border-ink-700 bg-ink-50 text-ink-900' : 'border-stone-300 bg-white text-ink-800',
          )}
        >
          <SlidersHorizontal className="h-4 w-4" aria-hidden="true" />
          Filters
          {count > 0 ? (
            <span className="rounded-full bg-ink-700 px-2 py-0.5 text-xs font-semibold text-white" data-testid="active-filter-count">
              {count}
              <span className="sr-only"> applied</span>
            </span>
          ) : null}
        </button>
      ) : null}
    </FilterFoldContext.Provider>
  );
}

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
  /** A second search (e.g. by batch): folds away on a phone with the other filters. The first stays in sight. */
  foldable?: boolean;
}

/**
 * A search box for a list filter; it waits for a pause in typing before asking the server. Leaving
 * the box (a click on a result, on another filter) applies what was typed at once and drops the
 * pending wait, so no late write can follow the person to the page they clicked through to.
 */
export function FilterSearch({ label, value, onChange, placeholder, delayMs = 300, className, foldable = false }: FilterSearchProps) {
  const id = useId();
  const foldClass = useFold(Boolean(value), foldable);
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
    <div className={clsx(className ?? 'w-full sm:w-64', foldClass)}>
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

/** A select filter; inside a <FilterBar> it folds away on a phone. */
export function FilterSelect({ label, value, onChange, options, anyLabel, className }: FilterSelectProps) {
  const id = useId();
  const foldClass = useFold(value !== '');
  return (
    <div className={clsx(className ?? 'w-full sm:w-48', foldClass)}>
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
