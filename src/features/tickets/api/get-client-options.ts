import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { NamedRef } from '@/features/tickets/api/types';

/** Client organisations for the list's client filter (staff), by name; the first 500. */
export async function getClientOptions(signal?: AbortSignal): Promise<NamedRef[]> {
  const page = await api.get<Page<NamedRef>>('/api/clients', { query: { limit: 500 }, signal });
  return page.items.map(({ id, name }) => ({ id, name })).sort((a, b) => a.name.localeCompare(b.name));
}

export const clientOptionsQueryOptions = () =>
  queryOptions({ queryKey: ticketsKeys.clientOptions(), queryFn: ({ signal }) => getClientOptions(signal), staleTime: 5 * 60_000 });

export const useClientOptions = (enabled = true) => useQuery({ ...clientOptionsQueryOptions(), enabled });
