import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { boardKeys } from '@/features/board/api/keys';
import type { BoardTicket } from '@/features/board/api/types';

export const waitingLimit = 12;

/** New tickets nobody has acknowledged yet, the oldest first (their response clock runs). */
export const getWaitingTickets = (signal?: AbortSignal) =>
  api.get<Page<BoardTicket>>('/api/tickets', { query: { status: 'new', sort: 'createdAt', dir: 'asc', limit: waitingLimit }, signal });

export const waitingTicketsQueryOptions = () =>
  queryOptions({ queryKey: boardKeys.waiting(), queryFn: ({ signal }) => getWaitingTickets(signal), refetchInterval: 60_000 });

export const useWaitingTickets = () => useQuery(waitingTicketsQueryOptions());
