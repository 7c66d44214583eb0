import type { CabinetStatus } from '@shared/schemas/enums';

/** The cabinets list's filters and sort (the API's query parameters). */
export interface CabinetFilters {
  /** A serial prefix. */
  serial?: string;
  clientId?: string;
  siteId?: string;
  status?: CabinetStatus;
  batch?: string;
  modelId?: string;
  sort?: 'serial' | 'batch' | 'installedOn';
  dir?: 'asc' | 'desc';
}

/** Query keys of the cabinets feature, general to specific. */
export const cabinetsKeys = {
  all: ['cabinets'] as const,
  lists: () => [...cabinetsKeys.all, 'list'] as const,
  list: (filters: CabinetFilters) => [...cabinetsKeys.lists(), filters] as const,
  onWall: (wallId: string) => [...cabinetsKeys.all, 'wall', wallId] as const,
  details: () => [...cabinetsKeys.all, 'detail'] as const,
  detail: (id: string) => [...cabinetsKeys.details(), id] as const,
  bySerial: (serial: string) => [...cabinetsKeys.all, 'serial', serial.trim().toUpperCase()] as const,
};

/**
 * A cabinet change moves counts and cells on wall pages and search results too. Other
 * features' root keys are named here rather than imported.
 */
export const cabinetOwnerKeys = [cabinetsKeys.all, ['walls'] as const, ['search'] as const];
