// The search resource: one box for client, site and wall names and cabinet serial prefixes.
// Anything that changes a name or a serial invalidates ['search'].
import { queryOptions } from '@tanstack/react-query';
import type { SearchResults } from '@shared/schemas/search';
import { api } from '@/lib/api-client';

export const searchKeys = {
  all: ['search'] as const,
  results: (q: string) => [...searchKeys.all, q.trim()] as const,
};

export const searchQueries = {
  /** What the words find, a few of each kind. */
  results: (q: string) =>
    queryOptions({
      queryKey: searchKeys.results(q),
      queryFn: ({ signal }) => api.get<SearchResults>('/api/search', { query: { q: q.trim() }, signal }),
      staleTime: 15_000,
    }),
};
