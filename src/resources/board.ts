// The office's Today board resource: its key factory and one query (`GET /api/board/walls`).
// Filed under the tickets' root key: every ticket write, and every visit write (they refresh
// the tickets too), refreshes the board's walls, next visits and counts.
import { queryOptions } from '@tanstack/react-query';
import type { BoardWalls } from '@shared/schemas/board';
import { api } from '@/lib/api-client';
import { ticketKeys } from '@/resources/tickets';

export const boardKeys = {
  all: [...ticketKeys.all, 'board'] as const,
  walls: () => [...boardKeys.all, 'walls'] as const,
};

/** The board looks again every minute: the clocks move on by themselves. */
const boardRefresh = 60_000;

export const boardQueries = {
  /** The walls with open tickets (worst first) and their next visits, the tickets on no wall, the counts. */
  walls: () =>
    queryOptions({
      queryKey: boardKeys.walls(),
      queryFn: ({ signal }) => api.get<BoardWalls>('/api/board/walls', { signal }),
      refetchInterval: boardRefresh,
    }),
};
