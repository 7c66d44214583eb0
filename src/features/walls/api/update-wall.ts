import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { WallPatch } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { wallOwnerKeys, wallsKeys } from '@/features/walls/api/keys';
import type { WallDetail } from '@/features/walls/api/types';

export const updateWall = ({ id, ...input }: WallPatch & { id: string }) =>
  api.patch<WallDetail>(`/api/walls/${encodeURIComponent(id)}`, input);

export function useUpdateWall() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateWall,
    onSuccess: async (wall) => {
      queryClient.setQueryData(wallsKeys.detail(wall.id), wall);
      await Promise.all(wallOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
    },
  });
}
