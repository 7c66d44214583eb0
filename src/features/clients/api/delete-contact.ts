import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { contactOwnerKeys } from '@/features/clients/api/keys';

export const deleteContact = (id: string) => api.delete(`/api/contacts/${encodeURIComponent(id)}`);

export function useDeleteContact() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteContact,
    onSuccess: () => Promise.all(contactOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
