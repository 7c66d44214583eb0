import { infiniteQueryOptions, keepPreviousData, queryOptions, useInfiniteQuery, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { sitesKeys, type SiteFilters } from '@/features/sites/api/keys';
import type { SiteSummary } from '@/features/sites/api/types';

export const sitesPageSize = 50;
/** Enough sites for the choices of a filter. */
const optionsLimit = 500;

export const getSites = (filters: SiteFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<SiteSummary>>('/api/sites', { query: { limit: sitesPageSize, ...filters }, signal });

/** The sites list page: keyset pages of 50, "load more". */
export const sitesInfiniteQueryOptions = (filters: SiteFilters) =>
  infiniteQueryOptions({
    queryKey: sitesKeys.list(filters),
    queryFn: ({ pageParam, signal }) => getSites({ ...filters, cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

export const useSitesList = (filters: SiteFilters) =>
  useInfiniteQuery({ ...sitesInfiniteQueryOptions(filters), placeholderData: keepPreviousData });

/** Sites by name (the first 500), e.g. for the choices of a filter. */
export const sitesQueryOptions = (filters: SiteFilters) =>
  queryOptions({
    queryKey: sitesKeys.list({ ...filters, limit: optionsLimit }),
    queryFn: ({ signal }) => getSites({ ...filters, limit: optionsLimit }, signal),
    staleTime: 5 * 60_000,
  });

export const useSites = (filters: SiteFilters, enabled = true) => useQuery({ ...sitesQueryOptions(filters), enabled });
