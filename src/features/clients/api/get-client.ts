import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { clientsKeys } from '@/features/clients/api/keys';
import type { ClientDetail } from '@/features/clients/api/types';

/** A client with its service plan, contacts and sites (notes for staff only). */
export const getClient = (id: string, signal?: AbortSignal) =>
  api.get<ClientDetail>(`/api/clients/${encodeURIComponent(id)}`, { signal });

export const clientQueryOptions = (id: string) =>
  queryOptions({ queryKey: clientsKeys.detail(id), queryFn: ({ signal }) => getClient(id, signal) });

export const useClient = (id: string) => useQuery(clientQueryOptions(id));
