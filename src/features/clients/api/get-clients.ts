import { infiniteQueryOptions, keepPreviousData, queryOptions, useInfiniteQuery, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { clientsKeys, type ClientFilters } from '@/features/clients/api/keys';
import type { ClientSummary } from '@/features/clients/api/types';

export const clientsPageSize = 50;

export const getClients = (filters: ClientFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<ClientSummary>>('/api/clients', {
    query: { limit: clientsPageSize, ...filters, archived: filters.archived ? 'true' : undefined },
    signal,
  });

export const clientsInfiniteQueryOptions = (filters: ClientFilters) =>
  infiniteQueryOptions({
    queryKey: clientsKeys.list(filters),
    queryFn: ({ pageParam, signal }) => getClients({ ...filters, cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

/** Pages of client organisations (server-side sort and search); keeps the rows while a new filter loads. */
export const useClients = (filters: ClientFilters) =>
  useInfiniteQuery({ ...clientsInfiniteQueryOptions(filters), placeholderData: keepPreviousData });

/** Every client, by name, for a filter's or a form's choices (the first 500). */
export const clientOptionsQueryOptions = () =>
  queryOptions({
    queryKey: clientsKeys.filterOptions(),
    queryFn: async ({ signal }) => (await getClients({ limit: 500 }, signal)).items.map(({ id, name }) => ({ id, name })),
    staleTime: 5 * 60_000,
  });

export const useClientOptions = (enabled = true) => useQuery({ ...clientOptionsQueryOptions(), enabled });
