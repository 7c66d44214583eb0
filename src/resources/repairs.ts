// The repairs resource: a page of repairs (of a wall, a cabinet, a ticket or a visit) and the
// write that logs one. The write carries an Idempotency-Key, so a retry from the phone's queue
// or a double tap writes nothing twice.
import type { Page } from '@shared/schemas/common';
import type { CreateRepairInput, RepairItem } from '@shared/schemas/repairs';
import { api } from '@/lib/api-client';
import { pagedQueryOptions } from '@/lib/paged-query';

export interface RepairFilters {
  wallId?: string;
  cabinetId?: string;
  ticketId?: string;
  visitId?: string;
  from?: string;
  to?: string;
}

export const repairKeys = {
  all: ['repairs'] as const,
  lists: () => [...repairKeys.all, 'list'] as const,
  list: (filters: RepairFilters) => [...repairKeys.lists(), filters] as const,
};

export const repairQueries = {
  /** Latest first. */
  list: (filters: RepairFilters) =>
    pagedQueryOptions(repairKeys.list(filters), (cursor, signal) =>
      api.get<Page<RepairItem>>('/api/repairs', { query: { limit: 50, ...filters, cursor }, signal }),
    ),
};

export const repairRequests = {
  /**
   * Logs a repair (201). `key` is the Idempotency-Key: made once when the technician taps Save
   * and kept with a queued repair, so every retry of it is the same request.
   */
  create: ({ key, input }: { key: string; input: CreateRepairInput }) =>
    api.post<RepairItem>('/api/repairs', input, { headers: { 'Idempotency-Key': key } }),
};
