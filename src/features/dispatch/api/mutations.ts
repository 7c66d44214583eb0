// Dispatch's writes. A visit shows on its ticket (the ticket's visits, its status "scheduled"),
// so booking, moving or cancelling one refreshes the tickets as well as every visit list.
import { ticketKeys } from '@/resources/tickets';
import { visitKeys, visitRequests } from '@/resources/visits';
import { useWrite } from '@/lib/mutation';

const owners = [visitKeys.all, ticketKeys.all];

/** Books a visit; the technicians and the client's contacts get an invitation. */
export const useCreateVisit = () => useWrite(visitRequests.create, owners, (visit, set) => set(visitKeys.detail(visit.id), visit));
/** Moves, reassigns or cancels a visit; the invitees get the updated invitation or the cancellation. */
export const useUpdateVisit = () => useWrite(visitRequests.update, owners, (visit, set) => set(visitKeys.detail(visit.id), visit));
