import type { Position } from '@shared/schemas/cabinets';
import type { WallDetail } from '@shared/schemas/walls';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { WallMap, WallViewToggle, type WallMapCell } from '@/components/wall-map/wall-map';
import type { WallView } from '@/components/wall-map/wall-map-geometry';
import { wallQueries } from '@/resources/walls';

/** A cabinet's height ÷ width, so the map draws cells the shape they are. */
const cellAspectOf = ({ cabinetModel: { widthMm, heightMm } }: WallDetail) => (widthMm > 0 && heightMm > 0 ? heightMm / widthMm : 1);

const samePosition = (a: Position, b: Position) => a.column === b.column && a.row === b.row;

interface VisitWallMapProps {
  wall: { id: string; name: string; columns: number; rows: number };
  /** The ticket's reported cells, drawn highlighted. */
  reported: Position[];
  /** A tap on a reported cell (starting its repair); without it a reported cell opens like any other. */
  onReportedCell?: (p: Position) => void;
  /** A tap on any other cell: its cabinet card. */
  onOpenCell: (p: Position) => void;
}

/**
 * The visit's wall, in rear view by default (the technician works from behind it), with the
 * ticket's reported cells marked. Tapping a reported cell starts its repair; any other cell opens
 * its cabinet.
 */
export function VisitWallMap({ wall, reported, onReportedCell, onOpenCell }: VisitWallMapProps) {
  const [view, setView] = useState<WallView>('rear');
  const cabinets = useQuery(wallQueries.cabinets(wall.id));
  const cellAspect = useQuery({ ...wallQueries.detail(wall.id), select: cellAspectOf });
  const cells = useMemo<WallMapCell[]>(
    () => (cabinets.data?.items ?? []).map((c) => ({ column: c.column, row: c.row, serial: c.serial, tone: c.status })),
    [cabinets.data],
  );
  const activate = (p: Position) => (onReportedCell && reported.some((r) => samePosition(r, p)) ? onReportedCell(p) : onOpenCell(p));
  return (
    <div className="space-y-3" data-testid="visit-wall-map">
      <WallViewToggle view={view} onChange={setView} />
      <WallMap
        columns={wall.columns}
        rows={wall.rows}
        cells={cells}
        cellAspect={cellAspect.data}
        view={view}
        selected={reported}
        onCellActivate={activate}
        ariaLabel={`${wall.name}: ${reported.length ? 'reported cabinets highlighted; ' : ''}tap a cabinet to open it`}
      />
    </div>
  );
}
