import { infiniteQueryOptions, keepPreviousData, useInfiniteQuery } from '@tanstack/react-query';
import type { AuditEventView } from '@shared/schemas/auth';
import type { Page } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { auditKeys, type AuditFilters } from '@/features/audit/api/keys';

export const auditPageSize = 50;

/** Newest first. */
export const getAuditEvents = (filters: AuditFilters & { cursor?: string; limit?: number }, signal?: AbortSignal) =>
  api.get<Page<AuditEventView>>('/api/audit', { query: { limit: auditPageSize, ...filters }, signal });

export const auditInfiniteQueryOptions = (filters: AuditFilters) =>
  infiniteQueryOptions({
    queryKey: auditKeys.list(filters),
    queryFn: ({ pageParam, signal }) => getAuditEvents({ ...filters, cursor: pageParam }, signal),
    initialPageParam: undefined as string | undefined,
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });

export const useAuditEvents = (filters: AuditFilters) =>
  useInfiniteQuery({ ...auditInfiniteQueryOptions(filters), placeholderData: keepPreviousData });
