import type { CabinetStatus } from '@shared/schemas/enums';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { searchKeys } from '@/features/search/api/keys';

/** What one search box finds: names of clients, sites and walls, and serial prefixes (server/services/search.ts). */
export interface SearchResults {
  clients: { id: string; name: string }[];
  sites: { id: string; name: string; clientName: string; city: string }[];
  walls: { id: string; name: string; siteName: string; clientName: string }[];
  cabinets: { id: string; serial: string; status: CabinetStatus; wallId: string | null; wallName: string | null; column: number | null; row: number | null }[];
}

export const getSearch = (q: string, signal?: AbortSignal) => api.get<SearchResults>('/api/search', { query: { q: q.trim() }, signal });

export const searchQueryOptions = (q: string) =>
  queryOptions({ queryKey: searchKeys.results(q), queryFn: ({ signal }) => getSearch(q, signal), staleTime: 15_000 });

export const useSearch = (q: string) => useQuery({ ...searchQueryOptions(q), enabled: q.trim().length > 0, placeholderData: keepPreviousData });
