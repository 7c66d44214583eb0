import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cabinetsKeys } from '@/features/cabinets/api/keys';
import type { CabinetDetail } from '@/features/cabinets/api/types';

/** A cabinet with its model, where it is, and its whole history (newest first). */
export const getCabinet = (id: string, signal?: AbortSignal) =>
  api.get<CabinetDetail>(`/api/cabinets/${encodeURIComponent(id)}`, { signal });

export const cabinetQueryOptions = (id: string) =>
  queryOptions({ queryKey: cabinetsKeys.detail(id), queryFn: ({ signal }) => getCabinet(id, signal) });

export const useCabinet = (id: string | null) => useQuery({ ...cabinetQueryOptions(id ?? ''), enabled: Boolean(id) });
