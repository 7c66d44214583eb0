// The tickets feature's writes. A ticket's status and cells show in wall and client counts too
// (open tickets per wall, per cell, per client), so the ticket writes refresh those as well; the
// today board lives under the tickets' root key; search results name tickets by title and state.
import type { CommentVisibility } from '@shared/schemas/enums';
import { attachmentKeys, attachmentRequests } from '@/resources/attachments';
import { clientKeys } from '@/resources/clients';
import { searchKeys } from '@/resources/search';
import { ticketKeys, ticketRequests } from '@/resources/tickets';
import { wallKeys } from '@/resources/walls';
import { useWrite } from '@/lib/mutation';

const owners = [ticketKeys.all, wallKeys.all, clientKeys.all, searchKeys.all];

export const useCreateTicket = () => useWrite(ticketRequests.create, owners, (ticket, set) => set(ticketKeys.detail(ticket.id), ticket));
export const useUpdateTicket = () => useWrite(ticketRequests.update, owners, (ticket, set) => set(ticketKeys.detail(ticket.id), ticket));
export const useMergeTicket = () => useWrite(ticketRequests.merge, owners, (ticket, set) => set(ticketKeys.detail(ticket.id), ticket));

/**
 * A comment on one ticket. The ticket's "updated" time moves, so lists sorted by it change; the
 * ticket itself is left as it is (the triage form on its page keeps what is being edited).
 */
export const useAddComment = (ticketId: string) =>
  useWrite(
    (input: { body: string; visibility: CommentVisibility }) => ticketRequests.addComment({ ticketId, ...input }),
    [ticketKeys.comments(ticketId), ticketKeys.lists()],
  );

export const useSaveTicketView = () => useWrite(ticketRequests.saveView, [ticketKeys.views()]);
export const useDeleteTicketView = () => useWrite(ticketRequests.deleteView, [ticketKeys.views()]);

/** One photo, video or file sent to a ticket; its list of attachments is refreshed after each. */
export const useUploadTicketAttachment = () =>
  useWrite(attachmentRequests.uploadToTicket, (_file, { ticketId }) => [attachmentKeys.ofTicket(ticketId)]);
