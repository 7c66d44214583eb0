import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SwapCabinetInput } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { cabinetOwnerKeys } from '@/features/cabinets/api/keys';
import type { CabinetDetail } from '@/features/cabinets/api/types';

/** Exchanges the positions of two installed cabinets. */
export const swapCabinets = ({ id, ...input }: SwapCabinetInput & { id: string }) =>
  api.post<CabinetDetail>(`/api/cabinets/${encodeURIComponent(id)}/swap`, input);

export function useSwapCabinets() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: swapCabinets,
    onSuccess: () => Promise.all(cabinetOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
