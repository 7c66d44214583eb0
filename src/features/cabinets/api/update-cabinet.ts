import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CabinetPatch } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { cabinetOwnerKeys } from '@/features/cabinets/api/keys';
import type { CabinetDetail } from '@/features/cabinets/api/types';

/** Batch, notes and status; a status other than installed takes the cabinet off its wall. */
export const updateCabinet = ({ id, ...input }: CabinetPatch & { id: string }) =>
  api.patch<CabinetDetail>(`/api/cabinets/${encodeURIComponent(id)}`, input);

export function useUpdateCabinet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCabinet,
    onSuccess: () => Promise.all(cabinetOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
