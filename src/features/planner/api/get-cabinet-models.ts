import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { plannerKeys } from '@/features/planner/api/keys';

/** A catalogue entry as GET /api/cabinet-models answers it (the fields the planner uses). */
export interface CabinetModel {
  id: string;
  name: string;
  maker: string;
  widthMm: number;
  heightMm: number;
  pixelPitchMm: number;
  pixelsWide: number;
  pixelsHigh: number;
  modulesWide: number;
  modulesHigh: number;
  maxPowerW: number;
  typicalPowerW: number;
  weightKg: number;
  brightnessNits: number;
  voltageMin: number;
  voltageMax: number;
  environment: 'indoor' | 'outdoor';
}

export const getCabinetModels = (signal?: AbortSignal) => api.get<Page<CabinetModel>>('/api/cabinet-models', { signal });

export const cabinetModelsQueryOptions = () =>
  queryOptions({
    queryKey: plannerKeys.cabinetModels(),
    queryFn: ({ signal }) => getCabinetModels(signal),
    staleTime: 5 * 60_000,
  });

export const useCabinetModels = () => useQuery(cabinetModelsQueryOptions());
