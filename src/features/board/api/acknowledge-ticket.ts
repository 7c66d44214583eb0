import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Moves a new ticket to "acknowledged": the response clock is met and the client gets an e-mail. */
export const acknowledgeTicket = (id: string) => api.patch<{ id: string; ref: string }>(`/api/tickets/${encodeURIComponent(id)}`, { status: 'acknowledged' });

export function useAcknowledgeTicket() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acknowledgeTicket,
    // The board's keys live under ['tickets'], so this refreshes the board and every ticket list.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['tickets'] }),
  });
}
