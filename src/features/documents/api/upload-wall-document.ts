import { useMutation, useQueryClient } from '@tanstack/react-query';
import { csrfHeader } from '@shared/schemas/auth';
import type { ApiErrorBody } from '@shared/schemas/common';
import { ApiError } from '@/lib/api-client';
import { documentsKeys } from '@/features/documents/api/keys';
import type { Attachment } from '@/features/documents/api/types';

export interface UploadWallDocumentInput {
  wallId: string;
  file: File;
  /** Staff only: hidden from the client's people. */
  internal: boolean;
  /** 0..1 while the file uploads. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

/**
 * Sends one file in the multipart field `file`. XMLHttpRequest rather than fetch because only
 * it reports upload progress.
 */
export function uploadWallDocument({ wallId, file, internal, onProgress, signal }: UploadWallDocumentInput): Promise<Attachment> {
  const body = new FormData();
  // Fields before the file: the server reads them as the multipart stream arrives.
  body.append('internal', internal ? 'true' : 'false');
  body.append('file', file, file.name);
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/walls/${encodeURIComponent(wallId)}/documents`);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader(csrfHeader.name, csrfHeader.value);
    xhr.withCredentials = true;
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress?.(e.loaded / e.total);
    };
    xhr.onload = () => {
      const requestId = xhr.getResponseHeader('X-Request-Id') ?? undefined;
      let data: unknown;
      try {
        data = xhr.responseText ? JSON.parse(xhr.responseText) : undefined;
      } catch {
        data = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress?.(1);
        resolve(data as Attachment);
        return;
      }
      const error = (data as Partial<ApiErrorBody> | undefined)?.error;
      reject(
        error?.code
          ? new ApiError(xhr.status, error.code, error.message ?? '', error.fields, requestId)
          : new ApiError(xhr.status, `http_${xhr.status}`, xhr.statusText || 'Unexpected response.', undefined, requestId),
      );
    };
    xhr.onerror = () => reject(new ApiError(0, 'network_error', 'The server could not be reached.'));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(body);
  });
}

export function useUploadWallDocument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadWallDocument,
    onSuccess: (_file, { wallId }) => queryClient.invalidateQueries({ queryKey: documentsKeys.wall(wallId) }),
  });
}
