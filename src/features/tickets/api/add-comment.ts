import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CommentVisibility } from '@shared/schemas/enums';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { TicketComment } from '@/features/tickets/api/types';

/** A public comment is e-mailed to the client's people; an internal one stays with the team. */
export const addComment = ({ ticketId, ...input }: { ticketId: string; body: string; visibility: CommentVisibility }) =>
  api.post<TicketComment>(`/api/tickets/${encodeURIComponent(ticketId)}/comments`, input);

export function useAddComment(ticketId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { body: string; visibility: CommentVisibility }) => addComment({ ticketId, ...input }),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: ticketsKeys.comments(ticketId) });
      // The ticket's "updated" time moved; lists sorted by it change.
      await queryClient.invalidateQueries({ queryKey: ticketsKeys.lists() });
    },
  });
}
