import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ContactPatch } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { contactOwnerKeys } from '@/features/clients/api/keys';
import type { Contact } from '@/features/clients/api/types';

export const updateContact = ({ id, ...input }: ContactPatch & { id: string }) =>
  api.patch<Contact>(`/api/contacts/${encodeURIComponent(id)}`, input);

export function useUpdateContact() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateContact,
    onSuccess: () => Promise.all(contactOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
