import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateTicketInput } from '@shared/schemas/tickets';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { TicketDetail } from '@/features/tickets/api/types';

/** Opens a ticket (201); due times come from the client's service plan. */
export const createTicket = (input: CreateTicketInput) => api.post<TicketDetail>('/api/tickets', input);

export function useCreateTicket() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createTicket,
    onSuccess: async (ticket) => {
      queryClient.setQueryData(ticketsKeys.detail(ticket.id), ticket);
      await queryClient.invalidateQueries({ queryKey: ticketsKeys.lists() });
      // The wall's open-ticket count changes too.
      await queryClient.invalidateQueries({ queryKey: ['walls'] });
    },
  });
}
