// The controllers resource: query keys, the list query and the write requests.
import { queryOptions } from '@tanstack/react-query';
import type { CappedList } from '@shared/schemas/common';
import type { Controller, ControllerInput, ControllerPatch } from '@shared/schemas/controllers';
import { api } from '@/lib/api-client';

export const controllerKeys = {
  all: ['controllers'] as const,
  list: (wallId?: string) => [...controllerKeys.all, 'list', wallId ?? 'all'] as const,
};

export const controllerQueries = {
  /** Controllers by serial; with `wallId`, only those driving that wall. */
  list: (wallId?: string) =>
    queryOptions({
      queryKey: controllerKeys.list(wallId),
      queryFn: ({ signal }) => api.get<CappedList<Controller>>('/api/controllers', { query: { wallId }, signal }),
    }),
};

export const controllerRequests = {
  create: (input: ControllerInput) => api.post<Controller>('/api/controllers', input),
  update: ({ id, ...input }: ControllerPatch & { id: string }) =>
    api.patch<Controller>(`/api/controllers/${encodeURIComponent(id)}`, input),
};
