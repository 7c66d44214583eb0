import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CabinetModel } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { catalogueKeys } from '@/features/catalogue/api/keys';

/** The cabinet models in the catalogue, by name (archived ones left out). */
export const getCabinetModels = (signal?: AbortSignal) => api.get<{ items: CabinetModel[] }>('/api/cabinet-models', { signal });

export const cabinetModelsQueryOptions = () =>
  queryOptions({ queryKey: catalogueKeys.models(), queryFn: ({ signal }) => getCabinetModels(signal), staleTime: 5 * 60_000 });

export const useCabinetModels = () => useQuery(cabinetModelsQueryOptions());
