import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { ticketsKeys } from '@/features/tickets/api/keys';

export interface WallShape {
  columns: number;
  rows: number;
  /** A cabinet's height ÷ width, so the map draws cells the shape they are. */
  cellAspect: number;
}

export async function getWallShape(wallId: string, signal?: AbortSignal): Promise<WallShape> {
  const wall = await api.get<{ columns: number; rows: number; cabinetModel: { widthMm: number; heightMm: number } }>(
    `/api/walls/${encodeURIComponent(wallId)}`,
    { signal },
  );
  const { widthMm, heightMm } = wall.cabinetModel;
  return { columns: wall.columns, rows: wall.rows, cellAspect: widthMm > 0 && heightMm > 0 ? heightMm / widthMm : 1 };
}

export const wallShapeQueryOptions = (wallId: string) =>
  queryOptions({ queryKey: ticketsKeys.wallShape(wallId), queryFn: ({ signal }) => getWallShape(wallId, signal), staleTime: 10 * 60_000 });

export const useWallShape = (wallId: string | undefined | null) => useQuery({ ...wallShapeQueryOptions(wallId ?? ''), enabled: Boolean(wallId) });
