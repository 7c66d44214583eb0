import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { documentsKeys } from '@/features/documents/api/keys';
import type { Attachment } from '@/features/documents/api/types';

/** As-built drawings, controller configuration files, calibration reports: newest first. */
export const getWallDocuments = (wallId: string, signal?: AbortSignal) =>
  api.get<{ items: Attachment[] }>(`/api/walls/${encodeURIComponent(wallId)}/documents`, { signal });

export const wallDocumentsQueryOptions = (wallId: string) =>
  queryOptions({ queryKey: documentsKeys.wall(wallId), queryFn: ({ signal }) => getWallDocuments(wallId, signal) });

export const useWallDocuments = (wallId: string) => useQuery(wallDocumentsQueryOptions(wallId));
