import { networkError, readResponse, requestHeaders } from '@/lib/api-client';

export interface UploadProgressOptions {
  /** Called as bytes leave the browser: a fraction from 0 to 1 (1 once the server has answered). */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

export interface UploadRequest extends UploadProgressOptions {
  /** A FormData is sent as multipart (the browser writes the boundary); a Blob is sent as is. */
  body: FormData | Blob;
  /** The Content-Type of a Blob body; by default the Blob's own type. */
  contentType?: string;
  method?: 'POST' | 'PUT';
}

const aborted = () => new DOMException('The upload was cancelled.', 'AbortError');

/**
 * Sends a file to the API and reports its progress. XMLHttpRequest rather than fetch, because
 * only it reports upload progress. Same headers (CSRF), same-origin cookie, JSON answer and
 * typed `ApiError`s as every other call (lib/api-client.ts); cancelling through `signal` rejects
 * with an `AbortError`, as fetch does.
 */
export function uploadWithProgress<T>(path: string, { body, contentType, method = 'POST', onProgress, signal }: UploadRequest): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    if (signal?.aborted) {
      reject(aborted());
      return;
    }
    const xhr = new XMLHttpRequest();
    xhr.open(method, path);
    for (const [name, value] of Object.entries(requestHeaders(method))) xhr.setRequestHeader(name, value);
    const type = body instanceof FormData ? undefined : (contentType ?? body.type);
    if (type) xhr.setRequestHeader('Content-Type', type);
    xhr.responseType = 'text';

    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress?.(Math.min(1, e.loaded / e.total));
    };
    xhr.onload = () => {
      try {
        const data = readResponse<T>(xhr.status, xhr.statusText, xhr.responseText, xhr.getResponseHeader('X-Request-Id') ?? undefined);
        onProgress?.(1);
        resolve(data);
      } catch (error) {
        reject(error);
      }
    };
    xhr.onerror = () => reject(networkError());
    xhr.onabort = () => reject(aborted());

    const abort = () => xhr.abort();
    signal?.addEventListener('abort', abort, { once: true });
    xhr.onloadend = () => signal?.removeEventListener('abort', abort);
    xhr.send(body);
  });
}
