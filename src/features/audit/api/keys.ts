export interface AuditFilters {
  entity?: string;
  entityId?: string;
  actorId?: string;
}

/** Query keys of the audit log, general to specific. */
export const auditKeys = {
  all: ['audit'] as const,
  lists: () => [...auditKeys.all, 'list'] as const,
  list: (filters: AuditFilters) => [...auditKeys.lists(), filters] as const,
};
