import { useQueryClient } from '@tanstack/react-query';
import { csrfHeader } from '@shared/schemas/auth';
import { useCallback } from 'react';
import { ApiError } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { TicketAttachment } from '@/features/tickets/api/types';

export interface UploadOptions {
  /** Called as bytes leave the browser: a fraction from 0 to 1. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

/**
 * Sends one photo, video or file to a ticket (multipart field `file`). XMLHttpRequest rather
 * than fetch, because only it reports upload progress. Errors are the same `ApiError` as
 * every other call.
 */
export function uploadTicketAttachment(ticketId: string, file: File, { onProgress, signal }: UploadOptions = {}) {
  return new Promise<TicketAttachment>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/tickets/${encodeURIComponent(ticketId)}/attachments`);
    xhr.setRequestHeader(csrfHeader.name, csrfHeader.value);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.withCredentials = true;
    xhr.responseType = 'text';

    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress?.(Math.min(1, e.loaded / e.total));
    };
    xhr.onload = () => {
      let body: unknown;
      try {
        body = xhr.responseText ? JSON.parse(xhr.responseText) : undefined;
      } catch {
        body = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300 && body) {
        onProgress?.(1);
        resolve(body as TicketAttachment);
        return;
      }
      const error = (body as { error?: { code?: string; message?: string; fields?: Record<string, string> } } | undefined)?.error;
      const requestId = xhr.getResponseHeader('X-Request-Id') ?? undefined;
      reject(
        error?.code
          ? new ApiError(xhr.status, error.code, error.message ?? '', error.fields, requestId)
          : new ApiError(xhr.status, `http_${xhr.status}`, xhr.statusText || 'Unexpected response.', undefined, requestId),
      );
    };
    xhr.onerror = () => reject(new ApiError(0, 'network_error', 'The server could not be reached.'));
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));

    if (signal) {
      if (signal.aborted) return xhr.abort();
      signal.addEventListener('abort', () => xhr.abort(), { once: true });
    }
    const form = new FormData();
    form.append('file', file, file.name);
    xhr.send(form);
  });
}

/** Upload bound to a ticket; refreshes its attachment list after each file. */
export function useUploadTicketAttachment() {
  const queryClient = useQueryClient();
  return useCallback(
    async (ticketId: string, file: File, options?: UploadOptions) => {
      const stored = await uploadTicketAttachment(ticketId, file, options);
      await queryClient.invalidateQueries({ queryKey: ticketsKeys.attachments(ticketId) });
      return stored;
    },
    [queryClient],
  );
}
