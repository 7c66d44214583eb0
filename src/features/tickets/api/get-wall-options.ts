import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { WallOption } from '@/features/tickets/api/types';

/** The walls at a site, by name. */
export async function getWallOptions(siteId: string, signal?: AbortSignal): Promise<WallOption[]> {
  const page = await api.get<Page<WallOption>>('/api/walls', { query: { siteId, limit: 500 }, signal });
  return page.items.map(({ id, name, siteId: sid, columns, rows, cabinetCount, openTicketCount }) => ({
    id,
    name,
    siteId: sid,
    columns,
    rows,
    cabinetCount,
    openTicketCount,
  }));
}

export const wallOptionsQueryOptions = (siteId: string) =>
  queryOptions({ queryKey: ticketsKeys.wallOptions(siteId), queryFn: ({ signal }) => getWallOptions(siteId, signal), staleTime: 5 * 60_000 });

export const useWallOptions = (siteId: string | undefined) =>
  useQuery({ ...wallOptionsQueryOptions(siteId ?? ''), enabled: Boolean(siteId) });
