import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CabinetModel, Controller } from '@shared/schemas/register';
import type { StoredPlanSettings, StoredWallRuns } from '@shared/schemas/wall-plan';
import { api } from '@/lib/api-client';
import { plannerKeys } from '@/features/planner/api/keys';

/** What the runs page reads of GET /api/walls/:id. */
export interface WallPlanView {
  id: string;
  name: string;
  clientName: string;
  siteName: string;
  columns: number;
  rows: number;
  mounting: string;
  cabinetModel: CabinetModel;
  controllers: Pick<Controller, 'id' | 'model' | 'serial' | 'outputs' | 'pixelsPerOutput'>[];
  planSettings: StoredPlanSettings | null;
  dataRuns: StoredWallRuns | null;
  powerRuns: StoredWallRuns | null;
}

export const getWallPlan = (wallId: string, signal?: AbortSignal) =>
  api.get<WallPlanView>(`/api/walls/${encodeURIComponent(wallId)}`, { signal });

export const wallPlanQueryOptions = (wallId: string) =>
  queryOptions({
    queryKey: plannerKeys.wallPlan(wallId),
    queryFn: ({ signal }) => getWallPlan(wallId, signal),
  });

export const useWallPlan = (wallId: string) => useQuery(wallPlanQueryOptions(wallId));
