import { infiniteQueryOptions, keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { cabinetsKeys, type CabinetFilters } from '@/features/cabinets/api/keys';
import type { CabinetSummary } from '@/features/cabinets/api/types';

export const cabinetsPageSize = 100;

export const getCabinets = (filters: CabinetFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<CabinetSummary>>('/api/cabinets', { query: { limit: cabinetsPageSize, ...filters }, signal });

export const cabinetsInfiniteQueryOptions = (filters: CabinetFilters) =>
  infiniteQueryOptions({
    queryKey: cabinetsKeys.list(filters),
    queryFn: ({ pageParam, signal }) => getCabinets({ ...filters, cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

/** Pages of cabinets (server-side filters and sort); keeps the rows while a new filter loads. */
export const useCabinets = (filters: CabinetFilters) =>
  useInfiniteQuery({ ...cabinetsInfiniteQueryOptions(filters), placeholderData: keepPreviousData });
