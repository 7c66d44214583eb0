import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { uploadWithProgress, type UploadProgressOptions } from '@/lib/upload-with-progress';
import { ticketsKeys } from '@/features/tickets/api/keys';
import type { TicketAttachment } from '@/features/tickets/api/types';

/** Sends one photo, video or file to a ticket (multipart field `file`), with progress. */
export function uploadTicketAttachment(ticketId: string, file: File, { onProgress, signal }: UploadProgressOptions = {}) {
  const body = new FormData();
  body.append('file', file, file.name);
  return uploadWithProgress<TicketAttachment>(`/api/tickets/${encodeURIComponent(ticketId)}/attachments`, { body, onProgress, signal });
}

/** Upload bound to a ticket; refreshes its attachment list after each file. */
export function useUploadTicketAttachment() {
  const queryClient = useQueryClient();
  return useCallback(
    async (ticketId: string, file: File, options?: UploadProgressOptions) => {
      const stored = await uploadTicketAttachment(ticketId, file, options);
      await queryClient.invalidateQueries({ queryKey: ticketsKeys.attachments(ticketId) });
      return stored;
    },
    [queryClient],
  );
}
