import type { Position } from '@shared/schemas/register';
import { useMemo, useState } from 'react';
import { WallMap, WallViewToggle, type WallMapCell } from '@/components/wall-map/wall-map';
import { useWallCabinets } from '@/features/tickets/api/get-wall-cabinets';
import { useWallShape } from '@/features/tickets/api/get-wall-shape';

interface TicketWallMapProps {
  wall: { id: string; name: string; columns: number; rows: number };
  selected: Position[];
  /** Tapping toggles a cell; leave out for a read-only map. */
  onToggle?: (p: Position) => void;
  /** Cells with an open ticket get their own tone (useful while reporting; noise on a ticket). */
  markOpenTickets?: boolean;
}

/** The wall map for a ticket: cabinets with their serials, the reported cells highlighted, front/rear. */
export function TicketWallMap({ wall, selected, onToggle, markOpenTickets = false }: TicketWallMapProps) {
  const [view, setView] = useState<'front' | 'rear'>('front');
  const cabinets = useWallCabinets(wall.id);
  const shape = useWallShape(wall.id);
  const cells = useMemo<WallMapCell[]>(
    () =>
      (cabinets.data ?? []).map((c) => ({
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
        cellAspect={shape.data?.cellAspect}
        view={view}
        selected={selected}
        onCellActivate={onToggle}
        ariaLabel={onToggle ? `${wall.name}: tap the faulty cabinets` : `${wall.name}: reported cabinets highlighted`}
      />
    </div>
  );
}
