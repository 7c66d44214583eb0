import { useMutation, useQueryClient } from '@tanstack/react-query';
import { csrfHeader } from '@shared/schemas/auth';
import type { ImportResult, ImportRowError } from '@shared/schemas/register';
import { ApiError } from '@/lib/api-client';
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
    super(status, code, message, undefined, requestId);
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

/**
 * Uploads a CSV of `serial,column,row,batch` for a wall. XMLHttpRequest rather than fetch
 * because only it reports upload progress. All or nothing: a refusal lists every bad row.
 */
export function importCabinets({ wallId, file, onProgress, signal }: ImportCabinetsInput): Promise<ImportResult> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/walls/${encodeURIComponent(wallId)}/cabinets/import`);
    xhr.setRequestHeader('Content-Type', 'text/csv');
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader(csrfHeader.name, csrfHeader.value);
    xhr.withCredentials = true;
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress?.(e.loaded / e.total);
    };
    xhr.onload = () => {
      const requestId = xhr.getResponseHeader('X-Request-Id') ?? undefined;
      let body: unknown;
      try {
        body = xhr.responseText ? JSON.parse(xhr.responseText) : undefined;
      } catch {
        body = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress?.(1);
        resolve(body as ImportResult);
        return;
      }
      const error = (body as { error?: { code?: string; message?: string; details?: { errors?: ImportRowError[] } } } | undefined)?.error;
      if (error?.code) {
        reject(new CabinetImportError(xhr.status, error.code, error.message ?? '', error.details?.errors ?? [], requestId));
      } else {
        reject(new ApiError(xhr.status, `http_${xhr.status}`, xhr.statusText || 'Unexpected response.', undefined, requestId));
      }
    };
    xhr.onerror = () => reject(new ApiError(0, 'network_error', 'The server could not be reached.'));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(file);
  });
}

export function useImportCabinets() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importCabinets,
    onSuccess: () => Promise.all(cabinetOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
