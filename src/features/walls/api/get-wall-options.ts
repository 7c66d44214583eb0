import { queryOptions, useQuery } from '@tanstack/react-query';
import { wallsKeys } from '@/features/walls/api/keys';
import { getWalls } from '@/features/walls/api/get-walls';

export interface WallOption {
  id: string;
  name: string;
  siteName: string;
  clientName: string;
}

/** Walls by name (the first 500) as choices for a picker. */
export const wallOptionsQueryOptions = () =>
  queryOptions({
    queryKey: [...wallsKeys.all, 'options'] as const,
    queryFn: async ({ signal }): Promise<WallOption[]> =>
      (await getWalls({ limit: 500 }, signal)).items.map(({ id, name, siteName, clientName }) => ({ id, name, siteName, clientName })),
    staleTime: 5 * 60_000,
  });

export const useWallOptions = (enabled = true) => useQuery({ ...wallOptionsQueryOptions(), enabled });
