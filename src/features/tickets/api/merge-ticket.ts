import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { TicketDetail } from '@/features/tickets/api/types';

/** Closes a duplicate into the ticket that carries on (office only); notes go on both. */
export const mergeTicket = ({ id, intoTicketId }: { id: string; intoTicketId: string }) =>
  api.post<TicketDetail>(`/api/tickets/${encodeURIComponent(id)}/merge`, { intoTicketId });

export function useMergeTicket() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: mergeTicket,
    onSuccess: async (ticket) => {
      queryClient.setQueryData(ticketsKeys.detail(ticket.id), ticket);
      await queryClient.invalidateQueries({ queryKey: ticketsKeys.all });
    },
  });
}
