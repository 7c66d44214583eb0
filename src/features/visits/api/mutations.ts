// The visits feature's writes from the technician's phone. Starting or closing a visit moves its
// ticket too (the ticket's status and its list of visits), so those refresh the tickets as well;
// a saved checklist changes only the visit itself, which the answer replaces.
import { ticketKeys } from '@/resources/tickets';
import { visitKeys, visitRequests } from '@/resources/visits';
import { useWrite } from '@/lib/mutation';

const owners = [visitKeys.all, ticketKeys.all];

/** Starts (or, for the office, moves or cancels) a visit. */
export const useUpdateVisit = () => useWrite(visitRequests.update, owners, (visit, set) => set(visitKeys.detail(visit.id), visit));

/** Saves the checklist as it is ticked: only the visit's own record changes. */
export const useSaveVisitChecklist = () => useWrite(visitRequests.update, [], (visit, set) => set(visitKeys.detail(visit.id), visit));

/** Completes the visit: summary, checklist and signature; the server makes and mails the report. */
export const useCloseVisit = () => useWrite(visitRequests.close, owners, (visit, set) => set(visitKeys.detail(visit.id), visit));
