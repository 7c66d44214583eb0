import { useSearchParams } from 'react-router-dom';
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
 * A list's filters kept in the address, so that a sorted, filtered list can be bookmarked and
 * shared: `read` makes the filters from the search parameters; the setter writes them back,
 * leaving out empty values and the defaults (`{ sort: 'name', dir: 'asc' }`).
 */
export function useListFilters<F extends object>(read: (params: URLSearchParams) => F, defaults: Record<string, string> = {}) {
  const [params, setParams] = useSearchParams();
  const setFilters = (next: F) =>
    setParams(
      (prev) => {
        const p = new URLSearchParams(prev);
        for (const [key, value] of Object.entries(next)) {
          if (value === undefined || value === '' || value === false || defaults[key] === String(value)) p.delete(key);
          else p.set(key, String(value));
        }
        return p;
      },
      { replace: true },
    );
  return [read(params), setFilters] as const;
}
