import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { SiteOption } from '@/features/tickets/api/types';

/** The sites the caller may open a ticket at (a client user: their own), by name; the first 500. */
export async function getSiteOptions(signal?: AbortSignal): Promise<SiteOption[]> {
  const page = await api.get<Page<SiteOption>>('/api/sites', { query: { limit: 500 }, signal });
  return page.items.map(({ id, name, clientId, clientName, city, timeZone, wallCount }) => ({ id, name, clientId, clientName, city, timeZone, wallCount }));
}

export const siteOptionsQueryOptions = () =>
  queryOptions({ queryKey: ticketsKeys.siteOptions(), queryFn: ({ signal }) => getSiteOptions(signal), staleTime: 5 * 60_000 });

export const useSiteOptions = (enabled = true) => useQuery({ ...siteOptionsQueryOptions(), enabled });
