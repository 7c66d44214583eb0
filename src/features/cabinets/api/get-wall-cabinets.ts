import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cabinetsKeys } from '@/features/cabinets/api/keys';
import type { WallCabinet } from '@/features/cabinets/api/types';

/** Every cabinet on a wall with its position, state and open tickets: what the wall map draws. */
export const getWallCabinets = (wallId: string, signal?: AbortSignal) =>
  api.get<{ items: WallCabinet[] }>(`/api/walls/${encodeURIComponent(wallId)}/cabinets`, { signal });

export const wallCabinetsQueryOptions = (wallId: string) =>
  queryOptions({ queryKey: cabinetsKeys.onWall(wallId), queryFn: ({ signal }) => getWallCabinets(wallId, signal) });

export const useWallCabinets = (wallId: string) => useQuery(wallCabinetsQueryOptions(wallId));
