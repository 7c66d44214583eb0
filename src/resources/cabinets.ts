// The cabinets resource: query keys, one query per read endpoint (the list, a cabinet by id or
// by the serial on its label) and one request per write, the CSV import with its progress.
import { queryOptions } from '@tanstack/react-query';
import type { z } from 'zod';
import type {
  CabinetDetail,
  CabinetPatch,
  CabinetSummary,
  ImportResult,
  ImportRowError,
  listCabinetsQuery,
  MoveCabinetInput,
  PlaceCabinetInput,
  SwapCabinetInput,
} from '@shared/schemas/cabinets';
import type { Page } from '@shared/schemas/common';
import { ApiError, api, isApiError } from '@/lib/api-client';
import { pagedQueryOptions } from '@/lib/paged-query';
import { uploadWithProgress } from '@/lib/upload-with-progress';

/** The cabinets list's filters and sort (the API's query parameters). */
export type CabinetFilters = Omit<z.input<typeof listCabinetsQuery>, 'cursor' | 'limit' | 'wallId'>;

export const cabinetsPageSize = 100;

export const cabinetKeys = {
  all: ['cabinets'] as const,
  lists: () => [...cabinetKeys.all, 'list'] as const,
  list: (filters: CabinetFilters) => [...cabinetKeys.lists(), filters] as const,
  details: () => [...cabinetKeys.all, 'detail'] as const,
  detail: (id: string) => [...cabinetKeys.details(), id] as const,
  bySerial: (serial: string) => [...cabinetKeys.all, 'serial', serial.trim().toUpperCase()] as const,
};

const getCabinets = (filters: CabinetFilters & { cursor?: string }, signal?: AbortSignal) =>
  api.get<Page<CabinetSummary>>('/api/cabinets', { query: { limit: cabinetsPageSize, ...filters }, signal });

export const cabinetQueries = {
  /** Pages of cabinets, filtered and sorted by the server. */
  list: (filters: CabinetFilters) =>
    pagedQueryOptions(cabinetKeys.list(filters), (cursor, signal) => getCabinets({ ...filters, cursor }, signal)),
  /**
   * Every cabinet on a wall with its own model (a cabinet moved in from another wall may be of
   * another model than the wall's): what the QR labels print. Read 500 at a time.
   */
  onWall: (wallId: string) =>
    queryOptions({
      queryKey: [...cabinetKeys.lists(), 'wall', wallId] as const,
      queryFn: async ({ signal }) => {
        const items: CabinetSummary[] = [];
        let cursor: string | undefined;
        do {
          const page = await api.get<Page<CabinetSummary>>('/api/cabinets', { query: { wallId, limit: 500, cursor }, signal });
          items.push(...page.items);
          cursor = page.nextCursor ?? undefined;
        } while (cursor);
        return items;
      },
    }),
  /** A cabinet with its model, where it is, and its whole history (newest first). */
  detail: (id: string) =>
    queryOptions({
      queryKey: cabinetKeys.detail(id),
      queryFn: ({ signal }) => api.get<CabinetDetail>(`/api/cabinets/${encodeURIComponent(id)}`, { signal }),
    }),
  /** The cabinet a QR label names (serials are matched trimmed and upper-cased). */
  bySerial: (serial: string) =>
    queryOptions({
      queryKey: cabinetKeys.bySerial(serial),
      queryFn: ({ signal }) => api.get<CabinetDetail>(`/api/cabinets/by-serial/${encodeURIComponent(serial.trim())}`, { signal }),
    }),
};

/** The import was refused: `rows` says which lines and why (nothing was written). */
export class CabinetImportError extends ApiError {
  constructor(
    status: number,
    code: string,
    message: string,
    readonly rows: ImportRowError[],
    requestId?: string,
  ) {
    super(status, code, message, undefined, requestId, { errors: rows });
    this.name = 'CabinetImportError';
  }
}

export interface ImportCabinetsInput {
  wallId: string;
  /** The CSV file as picked (sent as is, `Content-Type: text/csv`). */
  file: Blob;
  /** 0..1 while the body uploads. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

/** The rows a refusal lists (`error.details.errors`), when it lists any. */
function refusedRows(details: unknown): ImportRowError[] | undefined {
  const errors = (details as { errors?: unknown } | undefined)?.errors;
  return Array.isArray(errors) ? (errors as ImportRowError[]) : undefined;
}

export const cabinetRequests = {
  /** Registers a new cabinet at a free position of the wall (office). */
  place: ({ wallId, ...input }: PlaceCabinetInput & { wallId: string }) =>
    api.post<CabinetDetail>(`/api/walls/${encodeURIComponent(wallId)}/cabinets`, input),
  /** Moves a cabinet to a free position (recorded in its history, never overwritten). */
  move: ({ id, ...input }: MoveCabinetInput & { id: string }) =>
    api.post<CabinetDetail>(`/api/cabinets/${encodeURIComponent(id)}/move`, input),
  /** Exchanges the positions of two installed cabinets. */
  swap: ({ id, ...input }: SwapCabinetInput & { id: string }) =>
    api.post<CabinetDetail>(`/api/cabinets/${encodeURIComponent(id)}/swap`, input),
  /** Batch, notes and status; a status other than installed takes the cabinet off its wall. */
  update: ({ id, ...input }: CabinetPatch & { id: string }) => api.patch<CabinetDetail>(`/api/cabinets/${encodeURIComponent(id)}`, input),
  /**
   * Uploads a CSV of `serial,column,row,batch` for a wall, with progress. All or nothing: a
   * refusal lists every bad row (`CabinetImportError.rows`).
   */
  async import({ wallId, file, onProgress, signal }: ImportCabinetsInput): Promise<ImportResult> {
    try {
      return await uploadWithProgress<ImportResult>(`/api/walls/${encodeURIComponent(wallId)}/cabinets/import`, {
        body: file,
        contentType: 'text/csv',
        onProgress,
        signal,
      });
    } catch (error) {
      if (!isApiError(error)) throw error;
      const rows = refusedRows(error.details);
      throw rows ? new CabinetImportError(error.status, error.code, error.message, rows, error.requestId) : error;
    }
  },
};
