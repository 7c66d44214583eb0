// The sites resource: query keys, one query per read endpoint, one request per write.
import { queryOptions } from '@tanstack/react-query';
import type { z } from 'zod';
import type { Page } from '@shared/schemas/common';
import type { listSitesQuery, SiteDetail, SiteInput, SitePatch, SiteSummary } from '@shared/schemas/sites';
import { api } from '@/lib/api-client';
import { pagedQueryOptions } from '@/lib/paged-query';

/** The sites list's search, client and sort (the API's query parameters). */
export type SiteFilters = Omit<z.input<typeof listSitesQuery>, 'cursor' | 'limit'>;

export const sitesPageSize = 50;
/** Enough sites for the choices of a filter or a form. */
const optionsLimit = 500;

export const siteKeys = {
  all: ['sites'] as const,
  lists: () => [...siteKeys.all, 'list'] as const,
  list: (filters: SiteFilters & { limit?: number }) => [...siteKeys.lists(), filters] as const,
  details: () => [...siteKeys.all, 'detail'] as const,
  detail: (id: string) => [...siteKeys.details(), id] as const,
};

const getSites = (filters: SiteFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<SiteSummary>>('/api/sites', { query: { limit: sitesPageSize, ...filters }, signal });

export const siteQueries = {
  /** The sites list: keyset pages of 50. */
  list: (filters: SiteFilters) => pagedQueryOptions(siteKeys.list(filters), (cursor, signal) => getSites({ ...filters, cursor }, signal)),
  /** Sites by name (the first 500), for the choices of a filter or a form. */
  options: (filters: SiteFilters = {}) =>
    queryOptions({
      queryKey: siteKeys.list({ ...filters, limit: optionsLimit }),
      queryFn: ({ signal }) => getSites({ ...filters, limit: optionsLimit }, signal),
      staleTime: 5 * 60_000,
    }),
  /** A site with its access notes, contacts and walls (internal notes for staff only). */
  detail: (id: string) =>
    queryOptions({
      queryKey: siteKeys.detail(id),
      queryFn: ({ signal }) => api.get<SiteDetail>(`/api/sites/${encodeURIComponent(id)}`, { signal }),
    }),
};

export const siteRequests = {
  create: (input: SiteInput) => api.post<SiteDetail>('/api/sites', input),
  update: ({ id, ...input }: SitePatch & { id: string }) => api.patch<SiteDetail>(`/api/sites/${encodeURIComponent(id)}`, input),
};
