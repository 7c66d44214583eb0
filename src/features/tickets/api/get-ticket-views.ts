import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { SavedTicketView } from '@/features/tickets/api/types';

/** The signed-in person's saved list filters, by name. */
export async function getTicketViews(signal?: AbortSignal) {
  const { items } = await api.get<{ items: SavedTicketView[] }>('/api/ticket-views', { signal });
  return items;
}

export const ticketViewsQueryOptions = () =>
  queryOptions({ queryKey: ticketsKeys.views(), queryFn: ({ signal }) => getTicketViews(signal), staleTime: 5 * 60_000 });

export const useTicketViews = () => useQuery(ticketViewsQueryOptions());
