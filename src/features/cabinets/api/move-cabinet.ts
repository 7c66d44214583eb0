import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MoveCabinetInput } from '@shared/schemas/register';
import { api } from '@/lib/api-client';
import { cabinetOwnerKeys } from '@/features/cabinets/api/keys';
import type { CabinetDetail } from '@/features/cabinets/api/types';

/** Moves a cabinet to a free position (recorded in its history, never overwritten). */
export const moveCabinet = ({ id, ...input }: MoveCabinetInput & { id: string }) =>
  api.post<CabinetDetail>(`/api/cabinets/${encodeURIComponent(id)}/move`, input);

export function useMoveCabinet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: moveCabinet,
    onSuccess: () => Promise.all(cabinetOwnerKeys.map((queryKey) => queryClient.invalidateQueries({ queryKey }))),
  });
}
