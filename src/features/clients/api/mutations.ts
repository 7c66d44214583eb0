// Writes to a client and its contacts. Contacts show on client and site pages alike.
import { clientKeys, clientRequests } from '@/resources/clients';
import { siteKeys } from '@/resources/sites';
import { useWrite } from '@/lib/mutation';

export const useCreateClient = () => useWrite(clientRequests.create, [clientKeys.all]);
export const useUpdateClient = () =>
  useWrite(clientRequests.update, [clientKeys.all], (client, set) => set(clientKeys.detail(client.id), client));
export const useCreateContact = () => useWrite(clientRequests.createContact, [clientKeys.all, siteKeys.all]);
export const useUpdateContact = () => useWrite(clientRequests.updateContact, [clientKeys.all, siteKeys.all]);
export const useDeleteContact = () => useWrite(clientRequests.deleteContact, [clientKeys.all, siteKeys.all]);
