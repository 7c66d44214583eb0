import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { CabinetModel } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { plannerKeys } from '@/features/planner/api/keys';

export const getCabinetModels = (signal?: AbortSignal) => api.get<Page<CabinetModel>>('/api/cabinet-models', { signal });

export const cabinetModelsQueryOptions = () =>
  queryOptions({
    queryKey: plannerKeys.cabinetModels(),
    queryFn: ({ signal }) => getCabinetModels(signal),
    staleTime: 5 * 60_000,
  });

export const useCabinetModels = () => useQuery(cabinetModelsQueryOptions());
