// The today board's write. The board's walls, counts and lists live under the tickets' root key
// (src/resources/board.ts files its key there), so this refreshes them and every ticket list.
import { ticketKeys, ticketRequests } from '@/resources/tickets';
import { useWrite } from '@/lib/mutation';

/** Moves a new ticket to "acknowledged": the response clock is met and the client gets an e-mail. */
export const useAcknowledgeTicket = () =>
  useWrite(
    (id: string) => ticketRequests.update({ id, status: 'acknowledged' }),
    [ticketKeys.all],
    (ticket, set) => set(ticketKeys.detail(ticket.id), ticket),
  );
