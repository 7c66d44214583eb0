// The cabinet-models resource (the catalogue): its query keys, one query per read endpoint and
// one request per write. Every screen that lists models (catalogue, planner, wall forms) reads
// the same cache entry, so an edit anywhere shows everywhere.
import { queryOptions } from '@tanstack/react-query';
import type { CabinetModel, CabinetModelInput, CabinetModelPatch } from '@shared/schemas/cabinet-models';
import type { CappedList } from '@shared/schemas/common';
import { api } from '@/lib/api-client';

export const cabinetModelKeys = {
  all: ['cabinet-models'] as const,
  list: () => [...cabinetModelKeys.all, 'list'] as const,
};

export const cabinetModelQueries = {
  /** The models in the catalogue, by name (archived ones left out). */
  list: () =>
    queryOptions({
      queryKey: cabinetModelKeys.list(),
      queryFn: ({ signal }) => api.get<CappedList<CabinetModel>>('/api/cabinet-models', { signal }),
      staleTime: 5 * 60_000,
    }),
};

export const cabinetModelRequests = {
  create: (input: CabinetModelInput) => api.post<CabinetModel>('/api/cabinet-models', input),
  /** The name, the maker, the power input's datasheet figures and archiving. */
  update: ({ id, ...input }: CabinetModelPatch & { id: string }) =>
    api.patch<CabinetModel>(`/api/cabinet-models/${encodeURIComponent(id)}`, input),
};
