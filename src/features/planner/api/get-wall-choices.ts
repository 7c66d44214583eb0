import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { plannerKeys } from '@/features/planner/api/keys';

/** A wall a plan can be saved onto (a row of GET /api/walls). */
export interface WallChoice {
  id: string;
  name: string;
  clientName: string;
  siteName: string;
  columns: number;
  rows: number;
  cabinetModel: { id: string; name: string };
}

/** Walls built from one cabinet model, by name (the first 500; plenty for one model). */
export const getWallChoices = (cabinetModelId: string, signal?: AbortSignal) =>
  api.get<Page<WallChoice>>('/api/walls', { query: { cabinetModelId, limit: 500, sort: 'name' }, signal });

export const wallChoicesQueryOptions = (cabinetModelId: string) =>
  queryOptions({
    queryKey: plannerKeys.wallChoices(cabinetModelId),
    queryFn: ({ signal }) => getWallChoices(cabinetModelId, signal),
  });

export const useWallChoices = (cabinetModelId: string | null) =>
  useQuery({ ...wallChoicesQueryOptions(cabinetModelId ?? ''), enabled: Boolean(cabinetModelId) });
