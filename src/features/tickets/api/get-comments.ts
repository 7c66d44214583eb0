import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { TicketComment } from '@/features/tickets/api/types';

/** The conversation, oldest first; client users get only the public comments. */
export async function getComments(ticketId: string, signal?: AbortSignal) {
  const { items } = await api.get<{ items: TicketComment[] }>(`/api/tickets/${encodeURIComponent(ticketId)}/comments`, { signal });
  return items;
}

export const commentsQueryOptions = (ticketId: string) =>
  queryOptions({
    queryKey: ticketsKeys.comments(ticketId),
    queryFn: ({ signal }) => getComments(ticketId, signal),
    refetchInterval: 60_000,
  });

export const useComments = (ticketId: string) => useQuery(commentsQueryOptions(ticketId));
