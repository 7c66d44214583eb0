import { cellLabel } from '@shared/calc/grid';
import type { Position } from '@shared/schemas/cabinets';
import type { TicketDetail } from '@shared/schemas/tickets';
import { Cpu, Grid3x3, MapPin } from 'lucide-react';
import { TicketPanel } from '@/features/tickets/components/ticket-panel';
import { TicketWallMap } from '@/features/tickets/components/ticket-wall-map';

interface TicketWallProps {
  ticket: TicketDetail;
  /** A tap on a cell of the map opens its cabinet (the page shows the card). */
  onOpenCell?: (p: Position) => void;
}

/** The object of the work: the wall with the reported cabinets on its map, or what else at the site is at fault. */
export function TicketWall({ ticket, onOpenCell }: TicketWallProps) {
  if (!ticket.wall) {
    return (
      <TicketPanel title={ticket.site.name} icon={MapPin}>
        <p className="text-sm text-stone-700">No wall is named on this ticket: the fault is elsewhere at the site.</p>
      </TicketPanel>
    );
  }
  const cells = ticket.scope === 'cells' && ticket.cells.length > 0;
  return (
    <TicketPanel title={ticket.wall.name} icon={Grid3x3} aside={`${ticket.wall.columns} × ${ticket.wall.rows} cabinets`}>
      {cells ? (
        <div className="space-y-3">
          <p className="text-sm text-stone-800">
            <span className="font-medium">
              {ticket.cells.length === 1 ? 'Reported cabinet:' : `Reported cabinets (${ticket.cells.length}):`}
            </span>{' '}
            {ticket.cellLabels.join(', ')}
          </p>
          <TicketWallMap wall={ticket.wall} selected={ticket.cells} onOpenCell={onOpenCell} />
        </div>
      ) : (
        <p className="flex items-center gap-2 rounded-md bg-stone-100 px-3 py-2 text-sm font-medium text-stone-800">
          {ticket.scope === 'controller' ? (
            <Cpu className="h-4 w-4" aria-hidden="true" />
          ) : (
            <Grid3x3 className="h-4 w-4" aria-hidden="true" />
          )}
          {ticket.scope === 'controller' ? 'The controller or the signal' : 'The whole wall'}
          {ticket.cells.length ? ` · ${ticket.cells.map(cellLabel).join(', ')}` : ''}
        </p>
      )}
    </TicketPanel>
  );
}
