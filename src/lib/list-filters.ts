import { useRef } from 'react';
import { useLocation, useNavigation, useSearchParams } from 'react-router-dom';
import { isRecordId } from '@/lib/record-id';

/** A record id from the address, or undefined when it is missing or not an id. */
export function idParam(params: URLSearchParams, key: string): string | undefined {
  const value = params.get(key) ?? '';
  return isRecordId(value) ? value : undefined;
}

/** A trimmed text from the address, cut to `max` characters, or undefined when empty. */
export function textParam(params: URLSearchParams, key: string, max: number): string | undefined {
  return params.get(key)?.trim().slice(0, max) || undefined;
}

/**
 * Whether the person is on their way to another page. A search box writes a moment after typing
 * stops; when the person has already clicked through to a record meanwhile, that late write must
 * not pull them back to the list: a list's setter does nothing while this is true.
 */
export function useLeavingPage() {
  const navigation = useNavigation();
  const location = useLocation();
  const leaving = useRef(false);
  leaving.current = navigation.state !== 'idle' && navigation.location?.pathname !== location.pathname;
  return leaving;
}

/** `prev` with the filters of `next` written in, leaving out empty values and the defaults. */
export function withFilters(prev: URLSearchParams, next: object, defaults: Record<string, string> = {}): URLSearchParams {
  const p = new URLSearchParams(prev);
  for (const [key, value] of Object.entries(next)) {
    if (value === undefined || value === '' || value === false || defaults[key] === String(value)) p.delete(key);
    else p.set(key, String(value));
  }
  return p;
}

/**
 * Makes the address after each filter change. Two changes made quickly (a technician, then a
 * status, before the list shows the first) both stay: while the router has not yet shown a
 * write, the next one builds on it rather than on the address the screen was drawn from.
 */
export function createFilterWriter(defaults: Record<string, string> = {}) {
  let pending: { from: URLSearchParams; to: URLSearchParams } | null = null;
  return (rendered: URLSearchParams, next: object): URLSearchParams => {
    const base = pending && pending.from === rendered ? pending.to : rendered;
    const to = withFilters(base, next, defaults);
    pending = { from: rendered, to };
    return to;
  };
}

/**
 * A list's filters kept in the address, so that a sorted, filtered list can be bookmarked and
 * shared: `read` makes the filters from the search parameters; the setter writes them back,
 * leaving out empty values and the defaults (`{ sort: 'name', dir: 'asc' }`).
 */
export function useListFilters<F extends object>(read: (params: URLSearchParams) => F, defaults: Record<string, string> = {}) {
  const [params, setParams] = useSearchParams();
  const leaving = useLeavingPage();
  const writer = useRef<ReturnType<typeof createFilterWriter> | null>(null);
  writer.current ??= createFilterWriter(defaults);
  const setFilters = (next: F) => {
    if (leaving.current || !writer.current) return;
    setParams(writer.current(params, next), { replace: true });
  };
  return [read(params), setFilters] as const;
}
