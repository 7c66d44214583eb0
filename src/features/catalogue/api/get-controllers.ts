import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Controller } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { catalogueKeys } from '@/features/catalogue/api/keys';

/** Controllers by serial; with `wallId`, only those driving that wall. */
export const getControllers = (wallId?: string, signal?: AbortSignal) =>
  api.get<{ items: Controller[] }>('/api/controllers', { query: { wallId }, signal });

export const controllersQueryOptions = (wallId?: string) =>
  queryOptions({ queryKey: catalogueKeys.controllers(wallId), queryFn: ({ signal }) => getControllers(wallId, signal) });

export const useControllers = (wallId?: string) => useQuery(controllersQueryOptions(wallId));
