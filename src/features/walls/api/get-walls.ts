import { infiniteQueryOptions, keepPreviousData, queryOptions, useInfiniteQuery, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { wallsKeys, type WallFilters } from '@/features/walls/api/keys';
import type { WallSummary } from '@/features/walls/api/types';

export const wallsPageSize = 50;

export const getWalls = (filters: WallFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<WallSummary>>('/api/walls', { query: { limit: wallsPageSize, ...filters }, signal });

export const wallsInfiniteQueryOptions = (filters: WallFilters) =>
  infiniteQueryOptions({
    queryKey: wallsKeys.list(filters),
    queryFn: ({ pageParam, signal }) => getWalls({ ...filters, cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

export const useWalls = (filters: WallFilters) =>
  useInfiniteQuery({ ...wallsInfiniteQueryOptions(filters), placeholderData: keepPreviousData });

/** One page of walls, for short views such as the client's overview (`limit` walls at most). */
export const wallsPageQueryOptions = (filters: WallFilters, limit: number) =>
  queryOptions({
    queryKey: wallsKeys.list({ ...filters, limit }),
    queryFn: ({ signal }) => getWalls({ ...filters, limit }, signal),
  });

export const useWallsPage = (filters: WallFilters, limit: number) => useQuery(wallsPageQueryOptions(filters, limit));
