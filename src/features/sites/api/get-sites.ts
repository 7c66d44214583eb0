import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { sitesKeys, type SiteFilters } from '@/features/sites/api/keys';
import type { SiteSummary } from '@/features/sites/api/types';

/** Sites by name (the first 500), e.g. for the choices of a filter. */
export const getSites = (filters: SiteFilters, signal?: AbortSignal) =>
  api.get<Page<SiteSummary>>('/api/sites', { query: { limit: 500, ...filters }, signal });

export const sitesQueryOptions = (filters: SiteFilters) =>
  queryOptions({
    queryKey: sitesKeys.list(filters),
    queryFn: ({ signal }) => getSites(filters, signal),
    staleTime: 5 * 60_000,
  });

export const useSites = (filters: SiteFilters, enabled = true) => useQuery({ ...sitesQueryOptions(filters), enabled });
