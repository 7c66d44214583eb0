import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { WallInput } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { wallOwnerKeys } from '@/features/walls/api/keys';
import type { WallDetail } from '@/features/walls/api/types';

export const createWall = (input: WallInput) => api.post<WallDetail>('/api/walls', input);

export function useCreateWall() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createWall,
    onSuccess: () => Promise.all(wallOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
