import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlaceCabinetInput } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { cabinetOwnerKeys } from '@/features/cabinets/api/keys';
import type { CabinetDetail } from '@/features/cabinets/api/types';

/** Registers a new cabinet at a free position of the wall (office). */
export const placeCabinet = ({ wallId, ...input }: PlaceCabinetInput & { wallId: string }) =>
  api.post<CabinetDetail>(`/api/walls/${encodeURIComponent(wallId)}/cabinets`, input);

export function usePlaceCabinet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: placeCabinet,
    onSuccess: () => Promise.all(cabinetOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
