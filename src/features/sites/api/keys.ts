export interface SiteFilters {
  q?: string;
  clientId?: string;
  sort?: 'name' | 'city' | 'createdAt';
  dir?: 'asc' | 'desc';
}

/** Query keys of the sites feature, general to specific. */
export const sitesKeys = {
  all: ['sites'] as const,
  lists: () => [...sitesKeys.all, 'list'] as const,
  list: (filters: SiteFilters & { limit?: number }) => [...sitesKeys.lists(), filters] as const,
  details: () => [...sitesKeys.all, 'detail'] as const,
  detail: (id: string) => [...sitesKeys.details(), id] as const,
};

/** A site change shows on its client's page too (site list, counts). Named, not imported. */
export const siteOwnerKeys = [sitesKeys.all, ['clients'] as const];
