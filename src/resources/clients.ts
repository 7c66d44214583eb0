// The clients resource, with the contacts and service plans that belong to a client: query keys,
// one query per read endpoint, one request per write.
import { queryOptions } from '@tanstack/react-query';
import type {
  ClientDetail,
  ClientInput,
  ClientOption,
  ClientPatch,
  ClientSummary,
  Contact,
  ContactInput,
  ContactPatch,
  ServicePlan,
} from '@shared/schemas/clients';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { pagedQueryOptions } from '@/lib/paged-query';

/** The clients list's search, sort and archive filter (the API's query parameters). */
export interface ClientFilters {
  q?: string;
  sort?: 'name' | 'createdAt';
  dir?: 'asc' | 'desc';
  archived?: boolean;
}

export const clientsPageSize = 50;

export const clientKeys = {
  all: ['clients'] as const,
  lists: () => [...clientKeys.all, 'list'] as const,
  list: (filters: ClientFilters) => [...clientKeys.lists(), filters] as const,
  options: () => [...clientKeys.all, 'options'] as const,
  details: () => [...clientKeys.all, 'detail'] as const,
  detail: (id: string) => [...clientKeys.details(), id] as const,
  servicePlans: () => [...clientKeys.all, 'service-plans'] as const,
};

const getClients = (filters: ClientFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<ClientSummary>>('/api/clients', {
    query: { limit: clientsPageSize, ...filters, archived: filters.archived ? 'true' : undefined },
    signal,
  });

export const clientQueries = {
  /** Pages of client organisations, sorted and searched by the server. */
  list: (filters: ClientFilters) =>
    pagedQueryOptions(clientKeys.list(filters), (cursor, signal) => getClients({ ...filters, cursor }, signal)),
  /** Every client by name (the first 500), for a filter's or a form's choices. */
  options: () =>
    queryOptions({
      queryKey: clientKeys.options(),
      queryFn: async ({ signal }): Promise<ClientOption[]> =>
        (await getClients({ limit: 500 }, signal)).items.map(({ id, name }) => ({ id, name })),
      staleTime: 5 * 60_000,
    }),
  /** A client with its service plan, contacts and sites (notes for staff only). */
  detail: (id: string) =>
    queryOptions({
      queryKey: clientKeys.detail(id),
      queryFn: ({ signal }) => api.get<ClientDetail>(`/api/clients/${encodeURIComponent(id)}`, { signal }),
    }),
  /** The service plans a client can be on (staff only). */
  servicePlans: () =>
    queryOptions({
      queryKey: clientKeys.servicePlans(),
      queryFn: ({ signal }) => api.get<{ items: ServicePlan[] }>('/api/service-plans', { signal }),
      staleTime: 10 * 60_000,
    }),
};

export const clientRequests = {
  create: (input: ClientInput) => api.post<ClientDetail>('/api/clients', input),
  /** Name, service plan, notes, archiving. */
  update: ({ id, ...input }: ClientPatch & { id: string }) => api.patch<ClientDetail>(`/api/clients/${encodeURIComponent(id)}`, input),
  /** A contact of the organisation, or of one of its sites (`siteId`). */
  createContact: (input: ContactInput) => api.post<Contact>('/api/contacts', input),
  updateContact: ({ id, ...input }: ContactPatch & { id: string }) => api.patch<Contact>(`/api/contacts/${encodeURIComponent(id)}`, input),
  deleteContact: (id: string) => api.delete(`/api/contacts/${encodeURIComponent(id)}`),
};
