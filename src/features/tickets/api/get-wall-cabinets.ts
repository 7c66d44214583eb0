import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { WallCabinet } from '@/features/tickets/api/types';

/** The cabinets in a wall's grid, so the map can show serials and cells with open tickets. */
export async function getWallCabinets(wallId: string, signal?: AbortSignal): Promise<WallCabinet[]> {
  const { items } = await api.get<{ items: WallCabinet[] }>(`/api/walls/${encodeURIComponent(wallId)}/cabinets`, { signal });
  return items;
}

export const wallCabinetsQueryOptions = (wallId: string) =>
  queryOptions({ queryKey: ticketsKeys.wallCabinets(wallId), queryFn: ({ signal }) => getWallCabinets(wallId, signal) });

export const useWallCabinets = (wallId: string | undefined | null) =>
  useQuery({ ...wallCabinetsQueryOptions(wallId ?? ''), enabled: Boolean(wallId) });
