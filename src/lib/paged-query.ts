import { infiniteQueryOptions, type QueryKey } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';

/**
 * Keyset pages of a list: each page asks for the rows after the previous page's `nextCursor`,
 * until the server answers with none. The one shape every paged list of the API shares.
 */
export function pagedQueryOptions<T, K extends QueryKey>(
  queryKey: K,
  fetchPage: (cursor: string | undefined, signal: AbortSignal) => Promise<Page<T>>,
) {
  return infiniteQueryOptions({
    queryKey,
    queryFn: ({ pageParam, signal }) => fetchPage(pageParam, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });
}
