import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';

/** The IANA time zone of a site: due times and visit windows are shown in the site's local time. */
export async function getSiteTimeZone(siteId: string, signal?: AbortSignal) {
  const site = await api.get<{ timeZone: string }>(`/api/sites/${encodeURIComponent(siteId)}`, { signal });
  return site.timeZone;
}

export const siteTimeZoneQueryOptions = (siteId: string) =>
  queryOptions({
    queryKey: ticketsKeys.siteTimeZone(siteId),
    queryFn: ({ signal }) => getSiteTimeZone(siteId, signal),
    staleTime: 60 * 60_000,
  });

export const useSiteTimeZone = (siteId: string | undefined) =>
  useQuery({ ...siteTimeZoneQueryOptions(siteId ?? ''), enabled: Boolean(siteId) });
