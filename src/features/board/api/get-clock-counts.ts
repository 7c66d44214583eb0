import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { boardKeys } from '@/features/board/api/keys';

/** The clock states an open ticket can be in. */
export const openClockStates = ['on_track', 'at_risk', 'breached', 'paused'] as const;
export type OpenClockState = (typeof openClockStates)[number];

export type ClockCounts = Record<OpenClockState, number>;

/**
 * Open tickets counted by clock state (`GET /api/tickets/clock-counts`, counted by the
 * database). A state with no ticket is left out of the answer: it counts 0 here.
 */
export async function getClockCounts(signal?: AbortSignal): Promise<ClockCounts> {
  const answer = await api.get<Partial<Record<string, number>>>('/api/tickets/clock-counts', { signal });
  return Object.fromEntries(openClockStates.map((state) => [state, answer[state] ?? 0])) as ClockCounts;
}

export const clockCountsQueryOptions = () =>
  queryOptions({ queryKey: boardKeys.counts(), queryFn: ({ signal }) => getClockCounts(signal), refetchInterval: 60_000 });

export const useClockCounts = () => useQuery(clockCountsQueryOptions());
