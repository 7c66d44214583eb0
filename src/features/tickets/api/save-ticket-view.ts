import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SavedViewInput } from '@shared/schemas/tickets';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { SavedTicketView } from '@/features/tickets/api/types';

/** Saves the filters under a name; saving again under the same name replaces them. */
export const saveTicketView = (input: SavedViewInput) => api.post<SavedTicketView>('/api/ticket-views', input);

export function useSaveTicketView() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveTicketView,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ticketsKeys.views() }),
  });
}
