import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Controller, ControllerInput } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { controllerOwnerKeys } from '@/features/catalogue/api/keys';

export const createController = (input: ControllerInput) => api.post<Controller>('/api/controllers', input);

export function useCreateController() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createController,
    onSuccess: () => Promise.all(controllerOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
