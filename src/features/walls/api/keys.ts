export interface WallFilters {
  q?: string;
  clientId?: string;
  siteId?: string;
  cabinetModelId?: string;
  sort?: 'name' | 'createdAt';
  dir?: 'asc' | 'desc';
}

/** Query keys of the walls feature, general to specific. */
export const wallsKeys = {
  all: ['walls'] as const,
  lists: () => [...wallsKeys.all, 'list'] as const,
  list: (filters: WallFilters & { limit?: number }) => [...wallsKeys.lists(), filters] as const,
  details: () => [...wallsKeys.all, 'detail'] as const,
  detail: (id: string) => [...wallsKeys.details(), id] as const,
};

/** A wall change shows on its site's and client's pages too. Named, not imported. */
export const wallOwnerKeys = [wallsKeys.all, ['sites'] as const, ['clients'] as const];
