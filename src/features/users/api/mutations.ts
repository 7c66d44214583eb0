// Writes to accounts. The staff list the pickers offer lives under the users' root key, so an
// invite, a change or a disabled account shows there at once; a name shows on tickets too
// (assignee, reporter, comments).
import { ticketKeys } from '@/resources/tickets';
import { userKeys, userRequests } from '@/resources/users';
import { useWrite } from '@/lib/mutation';

export const useInviteUser = () => useWrite(userRequests.invite, [userKeys.all]);
export const useUpdateUser = () => useWrite(userRequests.update, [userKeys.all, ticketKeys.all]);
export const useResendInvite = () => useWrite(userRequests.resendInvite, [userKeys.all]);
