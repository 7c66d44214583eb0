import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { cabinetsKeys } from '@/features/cabinets/api/keys';
import type { CabinetDetail } from '@/features/cabinets/api/types';

/** The cabinet a QR label names (serials are matched trimmed and upper-cased). */
export const getCabinetBySerial = (serial: string, signal?: AbortSignal) =>
  api.get<CabinetDetail>(`/api/cabinets/by-serial/${encodeURIComponent(serial.trim())}`, { signal });

export const cabinetBySerialQueryOptions = (serial: string) =>
  queryOptions({ queryKey: cabinetsKeys.bySerial(serial), queryFn: ({ signal }) => getCabinetBySerial(serial, signal) });

export const useCabinetBySerial = (serial: string) => useQuery(cabinetBySerialQueryOptions(serial));
