import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CabinetModel, CabinetModelPatch } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { catalogueKeys } from '@/features/catalogue/api/keys';

/** Only the name and maker change (and archiving): walls already built keep their physical spec. */
export const updateCabinetModel = ({ id, ...input }: CabinetModelPatch & { id: string }) =>
  api.patch<CabinetModel>(`/api/cabinet-models/${encodeURIComponent(id)}`, input);

export function useUpdateCabinetModel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCabinetModel,
    // Wall pages show the model's name.
    onSuccess: () => Promise.all([catalogueKeys.models(), ['walls'] as const].map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
