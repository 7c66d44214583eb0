export interface ClientFilters {
  q?: string;
  sort?: 'name' | 'createdAt';
  dir?: 'asc' | 'desc';
  archived?: boolean;
}

/** Query keys of the clients feature, general to specific. */
export const clientsKeys = {
  all: ['clients'] as const,
  lists: () => [...clientsKeys.all, 'list'] as const,
  list: (filters: ClientFilters) => [...clientsKeys.lists(), filters] as const,
  details: () => [...clientsKeys.all, 'detail'] as const,
  detail: (id: string) => [...clientsKeys.details(), id] as const,
  filterOptions: () => [...clientsKeys.all, 'filter-options'] as const,
  servicePlans: () => [...clientsKeys.all, 'service-plans'] as const,
};

/**
 * Contacts show on client pages and on site pages: a change refreshes both. Other features'
 * root keys are named here rather than imported (features do not import each other).
 */
export const contactOwnerKeys = [clientsKeys.all, ['sites'] as const];
