import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { TicketDetail } from '@/features/tickets/api/types';

export const getTicket = (id: string, signal?: AbortSignal) =>
  api.get<TicketDetail>(`/api/tickets/${encodeURIComponent(id)}`, { signal });

export const ticketQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ticketsKeys.detail(id),
    queryFn: ({ signal }) => getTicket(id, signal),
    // The clock moves on by itself: look again every minute while the page is open.
    refetchInterval: 60_000,
  });

export const useTicket = (id: string) => useQuery(ticketQueryOptions(id));
