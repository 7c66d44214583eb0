import { infiniteQueryOptions, keepPreviousData, queryOptions, useInfiniteQuery, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { ticketsKeys, type TicketFilters } from '@/features/tickets/api/keys';
import type { TicketListItem } from '@/features/tickets/api/types';

export const ticketsPageSize = 50;

export const getTickets = (filters: TicketFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<TicketListItem>>('/api/tickets', { query: { limit: ticketsPageSize, ...filters }, signal });

export const ticketsInfiniteQueryOptions = (filters: TicketFilters) =>
  infiniteQueryOptions({
    queryKey: ticketsKeys.list(filters),
    queryFn: ({ pageParam, signal }) => getTickets({ ...filters, cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

/** Pages of tickets (keyset paging); keeps the last rows on screen while a new filter loads. */
export const useTickets = (filters: TicketFilters) =>
  useInfiniteQuery({ ...ticketsInfiniteQueryOptions(filters), placeholderData: keepPreviousData });

/** One page of tickets, for short lists such as the today board (`limit` rows at most). */
export const ticketsPageQueryOptions = (filters: TicketFilters, limit: number) =>
  queryOptions({
    queryKey: ticketsKeys.list({ ...filters, limit }),
    queryFn: ({ signal }) => getTickets({ ...filters, limit }, signal),
  });

export const useTicketsPage = (filters: TicketFilters, limit: number, enabled = true) =>
  useQuery({ ...ticketsPageQueryOptions(filters, limit), enabled });
