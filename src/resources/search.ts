// The search resource: one box for tickets (number and words), client, site and wall names, and
// any part of a serial or batch code; and the Scan page's lookup by the tail of a serial.
// Anything that changes a name, a serial or a ticket invalidates ['search'].
import { queryOptions } from '@tanstack/react-query';
import type { SearchResults, SerialTailMatches } from '@shared/schemas/search';
import { api } from '@/lib/api-client';

export const searchKeys = {
  all: ['search'] as const,
  results: (q: string) => [...searchKeys.all, 'results', q.trim()] as const,
  serials: (tail: string) => [...searchKeys.all, 'serials', tail.trim().toUpperCase()] as const,
};

export const searchQueries = {
  /** What the words find, a few of each kind, with how many match in all. */
  results: (q: string) =>
    queryOptions({
      queryKey: searchKeys.results(q),
      queryFn: ({ signal }) => api.get<SearchResults>('/api/search', { query: { q: q.trim() }, signal }),
      staleTime: 15_000,
    }),
  /** The cabinet with this serial, or those whose serial ends in it. */
  serials: (tail: string) =>
    queryOptions({
      queryKey: searchKeys.serials(tail),
      queryFn: ({ signal }) => api.get<SerialTailMatches>('/api/search/serials', { query: { tail: tail.trim() }, signal }),
      staleTime: 15_000,
    }),
};
