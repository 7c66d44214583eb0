// The spare-stock resources: quantities on hand, the movement ledger, parts, stock locations,
// low stock and a wall's spares. Query keys, one query per read endpoint, one request per write.
import { queryOptions } from '@tanstack/react-query';
import type { z } from 'zod';
import type { Page } from '@shared/schemas/common';
import type {
  listStockMovementsQuery,
  listStockQuery,
  Part,
  StockBalance,
  StockLocation,
  StockMovement,
  StockMovementInput,
  RestockLine,
  VendorReturn,
  VendorReturnInput,
  VendorReturnPatch,
  WallSpare,
  PartInput,
  PartPatch,
  ReorderPointInput,
  StockLocationInput,
  StockLocationPatch,
  SpareCabinetGroup,
} from '@shared/schemas/stock';
import { api } from '@/lib/api-client';
import { pagedQueryOptions } from '@/lib/paged-query';

export type StockFilters = Omit<z.input<typeof listStockQuery>, 'cursor' | 'limit'>;
export type MovementFilters = Omit<z.input<typeof listStockMovementsQuery>, 'cursor' | 'limit'>;

export const stockPageSize = 100;

export const stockKeys = {
  all: ['stock'] as const,
  balances: (filters: StockFilters) => [...stockKeys.all, 'balances', filters] as const,
  movements: (filters: MovementFilters) => [...stockKeys.all, 'movements', filters] as const,
  low: () => [...stockKeys.all, 'low'] as const,
  parts: () => [...stockKeys.all, 'parts'] as const,
  locations: () => [...stockKeys.all, 'locations'] as const,
  wallSpares: (wallId: string, locationId?: string) => [...stockKeys.all, 'wall-spares', wallId, locationId ?? 'all'] as const,
  vendorReturns: (filters: { overdue?: boolean }) => [...stockKeys.all, 'vendor-returns', filters] as const,
  restock: (serviceLevel: number) => [...stockKeys.all, 'restock', serviceLevel] as const,
  spareCabinets: (locationId?: string) => [...stockKeys.all, 'spare-cabinets', locationId ?? 'all'] as const,
};

export const stockQueries = {
  /** On hand per part, batch and location, by part, batch and location. */
  balances: (filters: StockFilters) =>
    pagedQueryOptions(stockKeys.balances(filters), (cursor, signal) =>
      api.get<Page<StockBalance>>('/api/stock', { query: { limit: stockPageSize, ...filters, cursor }, signal }),
    ),
  /** The ledger, newest first. */
  movements: (filters: MovementFilters) =>
    pagedQueryOptions(stockKeys.movements(filters), (cursor, signal) =>
      api.get<Page<StockMovement>>('/api/stock-movements', { query: { limit: 50, ...filters, cursor }, signal }),
    ),
  /** Reorder points at or below their mark. */
  low: () =>
    queryOptions({
      queryKey: stockKeys.low(),
      queryFn: ({ signal }) => api.get<{ items: (StockBalance & { reorderQuantity: number })[] }>('/api/stock/low', { signal }),
    }),
  /** The parts of the catalogue of spares (the first 500, by name). */
  parts: () =>
    queryOptions({
      queryKey: stockKeys.parts(),
      queryFn: ({ signal }) => api.get<Page<Part>>('/api/parts', { query: { limit: 500 }, signal }),
      staleTime: 5 * 60_000,
    }),
  /** Warehouses, vans and site kits (client users: their own site kits). */
  locations: () =>
    queryOptions({
      queryKey: stockKeys.locations(),
      queryFn: ({ signal }) => api.get<{ items: StockLocation[] }>('/api/stock-locations', { signal }),
      staleTime: 5 * 60_000,
    }),
  /** Whole spare cabinets on the shelves, by model, batch and location. */
  spareCabinets: (locationId?: string) =>
    queryOptions({
      queryKey: stockKeys.spareCabinets(locationId),
      queryFn: ({ signal }) => api.get<{ items: SpareCabinetGroup[] }>('/api/stock/spare-cabinets', { query: { locationId }, signal }),
    }),
  /** Each wall's spares forecast against its site kit. */
  restock: (serviceLevel: number) =>
    queryOptions({
      queryKey: stockKeys.restock(serviceLevel),
      queryFn: ({ signal }) => api.get<{ items: RestockLine[] }>('/api/stock/restock', { query: { serviceLevel }, signal }),
    }),
  /** Spares of a wall's model, the wall's own batches first. */
  wallSpares: (wallId: string, locationId?: string) =>
    queryOptions({
      queryKey: stockKeys.wallSpares(wallId, locationId),
      queryFn: ({ signal }) =>
        api.get<{ wallBatches: string[]; items: WallSpare[] }>(`/api/walls/${encodeURIComponent(wallId)}/spares`, {
          query: { locationId },
          signal,
        }),
    }),
};

export const returnQueries = {
  /** Failed parts sent back to their makers: overdue first, then pending, then the rest. */
  list: (filters: { overdue?: boolean } = {}) =>
    queryOptions({
      queryKey: stockKeys.vendorReturns(filters),
      queryFn: ({ signal }) =>
        api.get<{ items: VendorReturn[] }>('/api/vendor-returns', { query: { overdue: filters.overdue ? 'true' : undefined }, signal }),
    }),
};

export const stockRequests = {
  createPart: (input: PartInput) => api.post<Part>('/api/parts', input),
  updatePart: ({ id, ...input }: PartPatch & { id: string }) => api.patch<Part>(`/api/parts/${encodeURIComponent(id)}`, input),
  createLocation: (input: StockLocationInput) => api.post<StockLocation>('/api/stock-locations', input),
  updateLocation: ({ id, ...input }: StockLocationPatch & { id: string }) =>
    api.patch<StockLocation>(`/api/stock-locations/${encodeURIComponent(id)}`, input),
  setReorderPoint: (input: ReorderPointInput) => api.put<ReorderPointInput>('/api/reorder-points', input),
  openReturn: (input: VendorReturnInput) => api.post<VendorReturn>('/api/vendor-returns', input),
  updateReturn: ({ id, ...input }: VendorReturnPatch & { id: string }) =>
    api.patch<VendorReturn>(`/api/vendor-returns/${encodeURIComponent(id)}`, input),
  /** Records a movement; 409 `insufficient_stock` when fewer are on hand, `batch_mismatch` for another batch than the wall's. */
  move: (input: StockMovementInput) => api.post<StockMovement>('/api/stock-movements', input),
};
