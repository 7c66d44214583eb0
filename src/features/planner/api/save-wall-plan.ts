import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SaveWallPlanRequest } from '@shared/schemas/wall-plan';
import { api } from '@/lib/api-client';
import type { WallPlanView } from '@/features/planner/api/get-wall-plan';
import { plannerKeys } from '@/features/planner/api/keys';

/** Stores the supply, capacities and runs on a wall (office only). */
export const saveWallPlan = ({ wallId, ...body }: SaveWallPlanRequest & { wallId: string }) =>
  api.put<WallPlanView>(`/api/walls/${encodeURIComponent(wallId)}/plan`, body);

export function useSaveWallPlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveWallPlan,
    onSuccess: async (wall) => {
      queryClient.setQueryData(plannerKeys.wallPlan(wall.id), wall);
      await queryClient.invalidateQueries({ queryKey: ['walls'] });
    },
  });
}
