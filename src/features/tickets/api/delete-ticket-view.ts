import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';

export const deleteTicketView = (id: string) => api.delete(`/api/ticket-views/${encodeURIComponent(id)}`);

export function useDeleteTicketView() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteTicketView,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ticketsKeys.views() }),
  });
}
