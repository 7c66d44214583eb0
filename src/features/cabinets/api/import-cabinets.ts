import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ImportResult, ImportRowError } from '@shared/schemas/register';
import { ApiError, isApiError } from '@/lib/api-client';
import { uploadWithProgress } from '@/lib/upload-with-progress';
import { cabinetOwnerKeys } from '@/features/cabinets/api/keys';

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

/**
 * Uploads a CSV of `serial,column,row,batch` for a wall, with progress. All or nothing: a
 * refusal lists every bad row.
 */
export async function importCabinets({ wallId, file, onProgress, signal }: ImportCabinetsInput): Promise<ImportResult> {
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
}

export function useImportCabinets() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importCabinets,
    onSuccess: () => Promise.all(cabinetOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
