// The attachments resource: files kept on a ticket (photos and videos of the fault) and on a wall
// (as-built drawings, controller configuration files, calibration reports). Query keys, one
// query per list, and one request per write; uploads report their progress.
import { queryOptions } from '@tanstack/react-query';
import type { Attachment } from '@shared/schemas/attachments';
import type { CappedList } from '@shared/schemas/common';
import { api } from '@/lib/api-client';
import { uploadWithProgress, type UploadProgressOptions } from '@/lib/upload-with-progress';

export const attachmentKeys = {
  all: ['attachments'] as const,
  ofTicket: (ticketId: string) => [...attachmentKeys.all, 'ticket', ticketId] as const,
  ofWall: (wallId: string) => [...attachmentKeys.all, 'wall', wallId] as const,
};

export const attachmentQueries = {
  /** Photos, videos and files of a ticket, newest first. */
  ofTicket: (ticketId: string) =>
    queryOptions({
      queryKey: attachmentKeys.ofTicket(ticketId),
      queryFn: ({ signal }) => api.get<CappedList<Attachment>>(`/api/tickets/${encodeURIComponent(ticketId)}/attachments`, { signal }),
    }),
  /** A wall's documents, newest first. */
  ofWall: (wallId: string) =>
    queryOptions({
      queryKey: attachmentKeys.ofWall(wallId),
      queryFn: ({ signal }) => api.get<CappedList<Attachment>>(`/api/walls/${encodeURIComponent(wallId)}/documents`, { signal }),
    }),
};

export interface TicketUpload extends UploadProgressOptions {
  ticketId: string;
  file: File;
}

export interface WallDocumentUpload extends UploadProgressOptions {
  wallId: string;
  file: File;
  /** Staff only: hidden from the client's people. */
  internal: boolean;
}

export const attachmentRequests = {
  /** Sends one photo, video or file to a ticket (multipart field `file`), with progress. */
  uploadToTicket: ({ ticketId, file, onProgress, signal }: TicketUpload) => {
    const body = new FormData();
    body.append('file', file, file.name);
    return uploadWithProgress<Attachment>(`/api/tickets/${encodeURIComponent(ticketId)}/attachments`, { body, onProgress, signal });
  },
  /** Sends one document to a wall (multipart field `file`), with progress. */
  uploadToWall: ({ wallId, file, internal, onProgress, signal }: WallDocumentUpload) => {
    const body = new FormData();
    // Fields before the file: the server reads them as the multipart stream arrives.
    body.append('internal', internal ? 'true' : 'false');
    body.append('file', file, file.name);
    return uploadWithProgress<Attachment>(`/api/walls/${encodeURIComponent(wallId)}/documents`, { body, onProgress, signal });
  },
  /** Removes a file (office only). */
  delete: (id: string) => api.delete(`/api/attachments/${encodeURIComponent(id)}`),
};

/** The address that shows a photo, video or PDF in the page rather than downloading it. */
export const inlineUrl = (a: Pick<Attachment, 'id'>) => `/api/attachments/${encodeURIComponent(a.id)}?inline=1`;
export const downloadUrl = (a: Pick<Attachment, 'id'>) => `/api/attachments/${encodeURIComponent(a.id)}`;
