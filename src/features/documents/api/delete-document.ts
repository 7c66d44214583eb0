import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { documentsKeys } from '@/features/documents/api/keys';

/** Removes a file (office only). */
export const deleteDocument = (id: string) => api.delete(`/api/attachments/${encodeURIComponent(id)}`);

export function useDeleteDocument() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteDocument,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: documentsKeys.all }),
  });
}
