import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClientInput } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { clientsKeys } from '@/features/clients/api/keys';
import type { ClientDetail } from '@/features/clients/api/types';

export const createClient = (input: ClientInput) => api.post<ClientDetail>('/api/clients', input);

export function useCreateClient() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createClient,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clientsKeys.all }),
  });
}
