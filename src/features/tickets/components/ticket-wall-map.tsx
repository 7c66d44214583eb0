import type { Position } from '@shared/schemas/cabinets';
import type { WallDetail } from '@shared/schemas/walls';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { WallMap, WallViewToggle, type WallMapCell } from '@/components/wall-map/wall-map';
import { SmallCellsHint } from '@/features/tickets/components/small-cells-hint';
import { wallQueries } from '@/resources/walls';

/** A cabinet's height ÷ width, so the map draws cells the shape they are. */
const cellAspectOf = ({ cabinetModel: { widthMm, heightMm } }: WallDetail) => (widthMm > 0 && heightMm > 0 ? heightMm / widthMm : 1);

interface TicketWallMapProps {
  wall: { id: string; name: string; columns: number; rows: number };
  selected: Position[];
  /** Tapping toggles a cell (picking the faulty cabinets). */
  onToggle?: (p: Position) => void;
  /** Tapping opens the cell's cabinet (a ticket's map). Leave both out for a map that only shows. */
  onOpenCell?: (p: Position) => void;
  /** Cells with an open ticket get their own tone (useful while reporting; noise on a ticket). */
  markOpenTickets?: boolean;
}

/** The wall map for a ticket: cabinets with their serials, the reported cells highlighted, front/rear. */
export function TicketWallMap({ wall, selected, onToggle, onOpenCell, markOpenTickets = false }: TicketWallMapProps) {
  const [view, setView] = useState<'front' | 'rear'>('front');
  const cabinets = useQuery(wallQueries.cabinets(wall.id));
  const cellAspect = useQuery({ ...wallQueries.detail(wall.id), select: cellAspectOf });
  const cells = useMemo<WallMapCell[]>(
    () =>
      (cabinets.data?.items ?? []).map((c) => ({
        column: c.column,
        row: c.row,
        serial: c.serial,
        tone: markOpenTickets && c.openTickets > 0 ? 'open_ticket' : c.status,
      })),
    [cabinets.data, markOpenTickets],
  );
  return (
    <div className="space-y-3">
      <WallViewToggle view={view} onChange={setView} />
      <WallMap
        columns={wall.columns}
        rows={wall.rows}
        cells={cells}
        cellAspect={cellAspect.data}
        view={view}
        selected={selected}
        onCellActivate={onToggle ?? onOpenCell}
        ariaLabel={
          onToggle
            ? `${wall.name}: tap the faulty cabinets`
            : `${wall.name}: reported cabinets highlighted${onOpenCell ? '; open a cell for its cabinet' : ''}`
        }
      />
      {onToggle ? <SmallCellsHint columns={wall.columns} rows={wall.rows} cellAspect={cellAspect.data} /> : null}
    </div>
  );
}
