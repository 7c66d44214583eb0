import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Controller, ControllerPatch } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { controllerOwnerKeys } from '@/features/catalogue/api/keys';

/** The wall it drives, firmware, outputs in use, notes, archiving. */
export const updateController = ({ id, ...input }: ControllerPatch & { id: string }) =>
  api.patch<Controller>(`/api/controllers/${encodeURIComponent(id)}`, input);

export function useUpdateController() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateController,
    onSuccess: () => Promise.all(controllerOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
