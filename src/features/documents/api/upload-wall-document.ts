import { useMutation, useQueryClient } from '@tanstack/react-query';
import { uploadWithProgress, type UploadProgressOptions } from '@/lib/upload-with-progress';
import { documentsKeys } from '@/features/documents/api/keys';
import type { Attachment } from '@/features/documents/api/types';

export interface UploadWallDocumentInput extends UploadProgressOptions {
  wallId: string;
  file: File;
  /** Staff only: hidden from the client's people. */
  internal: boolean;
}

/** Sends one file in the multipart field `file`, with progress. */
export function uploadWallDocument({ wallId, file, internal, onProgress, signal }: UploadWallDocumentInput): Promise<Attachment> {
  const body = new FormData();
  // Fields before the file: the server reads them as the multipart stream arrives.
  body.append('internal', internal ? 'true' : 'false');
  body.append('file', file, file.name);
  return uploadWithProgress<Attachment>(`/api/walls/${encodeURIComponent(wallId)}/documents`, { body, onProgress, signal });
}

export function useUploadWallDocument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadWallDocument,
    onSuccess: (_file, { wallId }) => queryClient.invalidateQueries({ queryKey: documentsKeys.wall(wallId) }),
  });
}
