// The visits resource: query keys, one query per read endpoint (a range of visits for the week
// view or a technician's day, one visit) and one request per write. Everything about visits is
// filed under ['visits']; a repair logged on a visit refreshes the visit too.
import { queryOptions } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { CloseVisitInput, CreateVisitInput, UpdateVisitInput, VisitDetail, VisitListItem } from '@shared/schemas/visits';
import { api } from '@/lib/api-client';
import { pagedQueryOptions } from '@/lib/paged-query';

/** The list filters, as the API's query string takes them (`GET /api/visits`). */
export interface VisitFilters {
  technicianId?: string;
  from?: string;
  to?: string;
  status?: string;
  siteId?: string;
  ticketId?: string;
  wallId?: string;
  clientId?: string;
  dir?: 'asc' | 'desc';
}

export const visitKeys = {
  all: ['visits'] as const,
  lists: () => [...visitKeys.all, 'list'] as const,
  list: (filters: VisitFilters & { limit?: number }) => [...visitKeys.lists(), filters] as const,
  details: () => [...visitKeys.all, 'detail'] as const,
  detail: (id: string) => [...visitKeys.details(), id] as const,
};

const getVisits = (filters: VisitFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<VisitListItem>>('/api/visits', { query: { limit: 100, ...filters }, signal });

/** A week of dispatch or a technician's day is at most this many visits in one answer. */
export const visitRangeLimit = 500;

export const visitQueries = {
  /** Pages of visits (keyset paging), soonest first unless `dir` says otherwise. */
  list: (filters: VisitFilters) =>
    pagedQueryOptions(visitKeys.list(filters), (cursor, signal) => getVisits({ ...filters, cursor }, signal)),
  /** Every visit of a window (a week, a day): one answer of up to `visitRangeLimit`. */
  range: (filters: VisitFilters & { from: string; to: string }) =>
    queryOptions({
      queryKey: visitKeys.list({ ...filters, limit: visitRangeLimit }),
      queryFn: ({ signal }) => getVisits({ ...filters, limit: visitRangeLimit }, signal),
    }),
  /** A visit with its site, contacts, wall, ticket, checklist, repairs and photos. */
  detail: (id: string) =>
    queryOptions({
      queryKey: visitKeys.detail(id),
      queryFn: ({ signal }) => api.get<VisitDetail>(`/api/visits/${encodeURIComponent(id)}`, { signal }),
    }),
};

export const visitRequests = {
  /** Books a visit (201); the technicians and the client's contacts get an invitation. */
  create: (input: CreateVisitInput) => api.post<VisitDetail>('/api/visits', input),
  /** Moves, reassigns, starts or cancels a visit, or saves its checklist and notes. */
  update: ({ id, ...input }: UpdateVisitInput & { id: string }) => api.patch<VisitDetail>(`/api/visits/${encodeURIComponent(id)}`, input),
  /** Completes the visit: summary, checklist, signature; the report is made and e-mailed. */
  close: ({ id, ...input }: CloseVisitInput & { id: string }) =>
    api.post<VisitDetail>(`/api/visits/${encodeURIComponent(id)}/close`, input),
};

/** The visit report's address (a PDF; the browser downloads or shows it). */
export const visitReportHref = (id: string) => `/api/visits/${encodeURIComponent(id)}/report.pdf`;
