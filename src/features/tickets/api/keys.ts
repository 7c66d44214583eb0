/**
 * The list filters, exactly as they appear in the address and in the API's query string
 * (`GET /api/tickets`). A saved view stores this object.
 */
export interface TicketFilters {
  status?: string;
  open?: 'true' | 'false';
  priority?: string;
  clock?: string;
  clientId?: string;
  siteId?: string;
  wallId?: string;
  assigneeId?: string;
  q?: string;
  sort?: 'createdAt' | 'resolutionDueAt' | 'updatedAt';
  dir?: 'asc' | 'desc';
}

/** Query keys of the tickets feature, general to specific. */
export const ticketsKeys = {
  all: ['tickets'] as const,
  lists: () => [...ticketsKeys.all, 'list'] as const,
  list: (filters: TicketFilters & { limit?: number }) => [...ticketsKeys.lists(), filters] as const,
  details: () => [...ticketsKeys.all, 'detail'] as const,
  detail: (id: string) => [...ticketsKeys.details(), id] as const,
  comments: (id: string) => [...ticketsKeys.detail(id), 'comments'] as const,
  attachments: (id: string) => [...ticketsKeys.detail(id), 'attachments'] as const,
  views: () => [...ticketsKeys.all, 'views'] as const,
  /**
   * Pickers fed by other domains. Filed under those domains' root keys on purpose, so a change
   * to sites, walls, clients or people (which invalidates that root) refreshes them too.
   */
  siteOptions: () => ['sites', 'options', 'tickets'] as const,
  wallOptions: (siteId: string) => ['walls', 'options', 'tickets', siteId] as const,
  wallCabinets: (wallId: string) => ['walls', 'detail', wallId, 'cabinets', 'tickets'] as const,
  wallShape: (wallId: string) => ['walls', 'detail', wallId, 'shape'] as const,
  clientOptions: () => ['clients', 'options', 'tickets'] as const,
  staff: () => ['staff'] as const,
};
