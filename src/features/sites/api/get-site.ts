import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { sitesKeys } from '@/features/sites/api/keys';
import type { SiteDetail } from '@/features/sites/api/types';

/** A site with its access notes, contacts and walls (internal notes for staff only). */
export const getSite = (id: string, signal?: AbortSignal) => api.get<SiteDetail>(`/api/sites/${encodeURIComponent(id)}`, { signal });

export const siteQueryOptions = (id: string) =>
  queryOptions({ queryKey: sitesKeys.detail(id), queryFn: ({ signal }) => getSite(id, signal) });

export const useSite = (id: string) => useQuery(siteQueryOptions(id));
