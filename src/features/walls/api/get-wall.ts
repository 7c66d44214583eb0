import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { wallsKeys } from '@/features/walls/api/keys';
import type { WallDetail } from '@/features/walls/api/types';

/** A wall with its cabinet model, controllers and counts (internal notes for staff only). */
export const getWall = (id: string, signal?: AbortSignal) => api.get<WallDetail>(`/api/walls/${encodeURIComponent(id)}`, { signal });

export const wallQueryOptions = (id: string) =>
  queryOptions({ queryKey: wallsKeys.detail(id), queryFn: ({ signal }) => getWall(id, signal) });

export const useWall = (id: string) => useQuery(wallQueryOptions(id));
