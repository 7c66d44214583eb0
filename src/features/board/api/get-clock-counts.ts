import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/common';
import type { TicketClockState } from '@shared/schemas/tickets';
import { api } from '@/lib/api-client';
import { boardKeys } from '@/features/board/api/keys';

export interface ClockCounts {
  counts: Record<'on_track' | 'at_risk' | 'breached' | 'paused', number>;
  open: number;
  /** False when there were more open tickets than the board reads (the counts are a floor). */
  complete: boolean;
}

const pageSize = 500;
const maxPages = 10;

/**
 * Open tickets counted by clock state, read from the list endpoint page by page (only the
 * clock state of each row is used).
 */
export async function getClockCounts(signal?: AbortSignal): Promise<ClockCounts> {
  const counts = { on_track: 0, at_risk: 0, breached: 0, paused: 0 };
  let open = 0;
  let cursor: string | undefined;
  for (let page = 0; page < maxPages; page += 1) {
    const res = await api.get<Page<{ clockState: TicketClockState | null }>>('/api/tickets', {
      query: { open: 'true', limit: pageSize, cursor },
      signal,
    });
    for (const t of res.items) {
      open += 1;
      if (t.clockState && t.clockState in counts) counts[t.clockState as keyof typeof counts] += 1;
    }
    if (!res.nextCursor) return { counts, open, complete: true };
    cursor = res.nextCursor;
  }
  return { counts, open, complete: false };
}

export const clockCountsQueryOptions = () =>
  queryOptions({ queryKey: boardKeys.counts(), queryFn: ({ signal }) => getClockCounts(signal), refetchInterval: 60_000 });

export const useClockCounts = () => useQuery(clockCountsQueryOptions());
