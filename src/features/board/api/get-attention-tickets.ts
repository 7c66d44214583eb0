import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { boardKeys } from '@/features/board/api/keys';
import type { BoardTicket } from '@/features/board/api/types';

export const attentionLimit = 12;

/** Open tickets at risk or breached, the soonest due first. */
export const getAttentionTickets = (signal?: AbortSignal) =>
  api.get<Page<BoardTicket>>('/api/tickets', {
    query: { clock: 'at_risk,breached', open: 'true', sort: 'resolutionDueAt', dir: 'asc', limit: attentionLimit },
    signal,
  });

export const attentionTicketsQueryOptions = () =>
  queryOptions({ queryKey: boardKeys.attention(), queryFn: ({ signal }) => getAttentionTickets(signal), refetchInterval: 60_000 });

export const useAttentionTickets = () => useQuery(attentionTicketsQueryOptions());
