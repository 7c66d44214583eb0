import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateTicketInput } from '@shared/schemas/tickets';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { TicketDetail } from '@/features/tickets/api/types';

/**
 * Status, priority, assignee, text; with status `scheduled` and `schedule`, plans a visit and
 * e-mails the client an invitation. A client user may only close a resolved ticket.
 */
export const updateTicket = ({ id, ...input }: UpdateTicketInput & { id: string }) =>
  api.patch<TicketDetail>(`/api/tickets/${encodeURIComponent(id)}`, input);

export function useUpdateTicket() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateTicket,
    onSuccess: async (ticket) => {
      queryClient.setQueryData(ticketsKeys.detail(ticket.id), ticket);
      await queryClient.invalidateQueries({ queryKey: ticketsKeys.all });
    },
  });
}
