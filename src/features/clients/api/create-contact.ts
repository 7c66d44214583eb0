import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ContactInput } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { contactOwnerKeys } from '@/features/clients/api/keys';
import type { Contact } from '@/features/clients/api/types';

/** A contact of the client organisation, or of one of its sites (`siteId`). */
export const createContact = (input: ContactInput) => api.post<Contact>('/api/contacts', input);

export function useCreateContact() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createContact,
    onSuccess: () => Promise.all(contactOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
