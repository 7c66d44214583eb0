// The audit log resource: who changed what, and when (admins). Read only.
import type { Page } from '@shared/schemas/common';
import type { AuditEventView } from '@shared/schemas/users';
import { api } from '@/lib/api-client';
import { pagedQueryOptions } from '@/lib/paged-query';

/** The log's filters (the API's query parameters). */
export interface AuditFilters {
  entity?: string;
  entityId?: string;
  actorId?: string;
}

export const auditPageSize = 50;

export const auditKeys = {
  all: ['audit'] as const,
  lists: () => [...auditKeys.all, 'list'] as const,
  list: (filters: AuditFilters) => [...auditKeys.lists(), filters] as const,
};

export const auditQueries = {
  /** Pages of changes, newest first. */
  list: (filters: AuditFilters) =>
    pagedQueryOptions(auditKeys.list(filters), (cursor, signal) =>
      api.get<Page<AuditEventView>>('/api/audit', { query: { limit: auditPageSize, ...filters, cursor }, signal }),
    ),
};
