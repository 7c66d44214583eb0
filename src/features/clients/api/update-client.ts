import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClientPatch } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { clientsKeys } from '@/features/clients/api/keys';
import type { ClientDetail } from '@/features/clients/api/types';

/** Name, service plan, notes, archiving. */
export const updateClient = ({ id, ...input }: ClientPatch & { id: string }) =>
  api.patch<ClientDetail>(`/api/clients/${encodeURIComponent(id)}`, input);

export function useUpdateClient() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateClient,
    onSuccess: async (client) => {
      queryClient.setQueryData(clientsKeys.detail(client.id), client);
      await queryClient.invalidateQueries({ queryKey: clientsKeys.all });
    },
  });
}
