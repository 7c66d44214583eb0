import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CabinetModel, CabinetModelInput } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { catalogueKeys } from '@/features/catalogue/api/keys';

export const createCabinetModel = (input: CabinetModelInput) => api.post<CabinetModel>('/api/cabinet-models', input);

export function useCreateCabinetModel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCabinetModel,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.models() }),
  });
}
