// The tickets resource: query keys, one query per read endpoint (the list, a page of it, a ticket,
// its conversation, the saved views, the board's clock counts) and one request per write.
// Everything about tickets is filed under ['tickets'], the today board included, so any ticket
// write that invalidates the root refreshes every list, page and count.
import { queryOptions } from '@tanstack/react-query';
import type { CappedList, Page } from '@shared/schemas/common';
import type {
  CommentInput,
  CreateTicketInput,
  SavedTicketView,
  SavedViewInput,
  TicketComment,
  TicketDetail,
  TicketListItem,
  UpdateTicketInput,
} from '@shared/schemas/tickets';
import { api } from '@/lib/api-client';
import { pagedQueryOptions } from '@/lib/paged-query';

/**
 * The list filters, exactly as they appear in the address and in the API's query string
 * (`GET /api/tickets`). A saved view stores this object.
 */
export interface TicketFilters {
  status?: string;
  open?: 'true' | 'false';
  priority?: string;
  clock?: string;
  clientId?: string;
  siteId?: string;
  wallId?: string;
  assigneeId?: string;
  q?: string;
  sort?: 'createdAt' | 'resolutionDueAt' | 'updatedAt';
  dir?: 'asc' | 'desc';
}

export const ticketsPageSize = 50;

export const ticketKeys = {
  all: ['tickets'] as const,
  lists: () => [...ticketKeys.all, 'list'] as const,
  list: (filters: TicketFilters & { limit?: number }) => [...ticketKeys.lists(), filters] as const,
  details: () => [...ticketKeys.all, 'detail'] as const,
  detail: (id: string) => [...ticketKeys.details(), id] as const,
  comments: (id: string) => [...ticketKeys.detail(id), 'comments'] as const,
  views: () => [...ticketKeys.all, 'views'] as const,
};

const getTickets = (filters: TicketFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<TicketListItem>>('/api/tickets', { query: { limit: ticketsPageSize, ...filters }, signal });

/** One page of at most `limit` tickets, for short lists (a start page, a picker). */
const ticketsPage = (filters: TicketFilters, limit: number) =>
  queryOptions({ queryKey: ticketKeys.list({ ...filters, limit }), queryFn: ({ signal }) => getTickets({ ...filters, limit }, signal) });

/** The today board's lists show at most this many tickets each. */
export const boardListLimit = 12;
/** The board looks again every minute: the clocks move on by themselves. */
const boardRefresh = 60_000;

export const ticketQueries = {
  /** Pages of tickets (keyset paging), filtered and sorted by the server. */
  list: (filters: TicketFilters) =>
    pagedQueryOptions(ticketKeys.list(filters), (cursor, signal) => getTickets({ ...filters, cursor }, signal)),
  /** One page of at most `limit` tickets. */
  page: ticketsPage,
  /** The today board: new tickets nobody has acknowledged yet, the oldest first (their response clock runs). */
  waiting: () =>
    queryOptions({ ...ticketsPage({ status: 'new', sort: 'createdAt', dir: 'asc' }, boardListLimit), refetchInterval: boardRefresh }),
  /** A ticket with its clocks, visits and repairs. */
  detail: (id: string) =>
    queryOptions({
      queryKey: ticketKeys.detail(id),
      queryFn: ({ signal }) => api.get<TicketDetail>(`/api/tickets/${encodeURIComponent(id)}`, { signal }),
      // The clock moves on by itself: look again every minute while the page is open.
      refetchInterval: 60_000,
    }),
  /** The conversation, oldest first (its newest 1,000: `truncated` says older ones exist); client users get only the public comments. */
  comments: (id: string) =>
    queryOptions({
      queryKey: ticketKeys.comments(id),
      queryFn: ({ signal }) => api.get<CappedList<TicketComment>>(`/api/tickets/${encodeURIComponent(id)}/comments`, { signal }),
      refetchInterval: 60_000,
    }),
  /** The signed-in person's saved list filters, by name. */
  views: () =>
    queryOptions({
      queryKey: ticketKeys.views(),
      queryFn: ({ signal }) => api.get<CappedList<SavedTicketView>>('/api/ticket-views', { signal }),
      staleTime: 5 * 60_000,
    }),
};

export const ticketRequests = {
  /** Opens a ticket (201); due times come from the client's service plan. */
  create: (input: CreateTicketInput) => api.post<TicketDetail>('/api/tickets', input),
  /**
   * Status, priority, assignee, text; with status `scheduled` and `schedule`, plans a visit and
   * e-mails the client an invitation. A client user may only close a resolved ticket.
   */
  update: ({ id, ...input }: UpdateTicketInput & { id: string }) =>
    api.patch<TicketDetail>(`/api/tickets/${encodeURIComponent(id)}`, input),
  /** Closes a duplicate into the ticket that carries on (office only); notes go on both. */
  merge: ({ id, intoTicketId }: { id: string; intoTicketId: string }) =>
    api.post<TicketDetail>(`/api/tickets/${encodeURIComponent(id)}/merge`, { intoTicketId }),
  /** A public comment is e-mailed to the client's people; an internal one stays with the team. */
  addComment: ({ ticketId, ...input }: CommentInput & { ticketId: string }) =>
    api.post<TicketComment>(`/api/tickets/${encodeURIComponent(ticketId)}/comments`, input),
  /** Saves the filters under a name; saving again under the same name replaces them. */
  saveView: (input: SavedViewInput) => api.post<SavedTicketView>('/api/ticket-views', input),
  deleteView: (id: string) => api.delete(`/api/ticket-views/${encodeURIComponent(id)}`),
};
