// The walls resource: query keys, one query per read endpoint (the list, a page of it for short
// views and pickers, a wall, its cabinets as the wall map draws them) and one request per write.
import { queryOptions } from '@tanstack/react-query';
import type { z } from 'zod';
import type { CappedList, Page } from '@shared/schemas/common';
import type { listWallsQuery, WallCabinet, WallDetail, WallInput, WallPatch, WallSummary } from '@shared/schemas/walls';
import type { CreateWallFromPlanRequest, SaveWallPlanRequest } from '@shared/schemas/wall-plan';
import { api } from '@/lib/api-client';
import { pagedQueryOptions } from '@/lib/paged-query';

/** The walls list's search, place, model and sort (the API's query parameters). */
export type WallFilters = Omit<z.input<typeof listWallsQuery>, 'cursor' | 'limit'>;

export const wallsPageSize = 50;
/** The most walls a picker offers (plenty for one site, one client or one model). */
export const wallChoicesLimit = 500;

export const wallKeys = {
  all: ['walls'] as const,
  lists: () => [...wallKeys.all, 'list'] as const,
  list: (filters: WallFilters & { limit?: number }) => [...wallKeys.lists(), filters] as const,
  details: () => [...wallKeys.all, 'detail'] as const,
  detail: (id: string) => [...wallKeys.details(), id] as const,
  cabinets: (id: string) => [...wallKeys.all, 'cabinets', id] as const,
};

const getWalls = (filters: WallFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<WallSummary>>('/api/walls', { query: { limit: wallsPageSize, ...filters }, signal });

export const wallQueries = {
  /** The walls list: keyset pages of 50. */
  list: (filters: WallFilters) => pagedQueryOptions(wallKeys.list(filters), (cursor, signal) => getWalls({ ...filters, cursor }, signal)),
  /** One page of at most `limit` walls: a short view, or a picker's choices (`wallChoicesLimit`). */
  page: (filters: WallFilters, limit = wallChoicesLimit) =>
    queryOptions({ queryKey: wallKeys.list({ ...filters, limit }), queryFn: ({ signal }) => getWalls({ ...filters, limit }, signal) }),
  /** A wall with its cabinet model, controllers, stored plan and counts (internal notes for staff only). */
  detail: (id: string) =>
    queryOptions({
      queryKey: wallKeys.detail(id),
      queryFn: ({ signal }) => api.get<WallDetail>(`/api/walls/${encodeURIComponent(id)}`, { signal }),
    }),
  /** Every cabinet on the wall with its position, state and open tickets: what the wall map draws. */
  cabinets: (id: string) =>
    queryOptions({
      queryKey: wallKeys.cabinets(id),
      queryFn: ({ signal }) => api.get<CappedList<WallCabinet>>(`/api/walls/${encodeURIComponent(id)}/cabinets`, { signal }),
    }),
};

export const wallRequests = {
  create: (input: WallInput) => api.post<WallDetail>('/api/walls', input),
  update: ({ id, ...input }: WallPatch & { id: string }) => api.patch<WallDetail>(`/api/walls/${encodeURIComponent(id)}`, input),
  /** Stores the supply, capacities and runs a wall is planned with (office). */
  savePlan: ({ wallId, ...input }: SaveWallPlanRequest & { wallId: string }) =>
    api.put<WallDetail>(`/api/walls/${encodeURIComponent(wallId)}/plan`, input),
  /** A new wall from the planner's result, with its settings and runs, in one request (office). */
  createFromPlan: (input: CreateWallFromPlanRequest) => api.post<WallDetail>('/api/walls/from-plan', input),
};
