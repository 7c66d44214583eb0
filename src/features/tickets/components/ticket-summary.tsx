import { cellLabel } from '@shared/calc/grid';
import type { Position } from '@shared/schemas/cabinets';
import { Cpu, Grid3x3, MapPin } from 'lucide-react';
import { Link } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import type { TicketDetail } from '@shared/schemas/tickets';
import { TicketWallMap } from '@/features/tickets/components/ticket-wall-map';

const placeLink = 'font-medium text-ink-700 underline-offset-2 hover:underline';

interface TicketSummaryProps {
  ticket: TicketDetail;
  /** A tap on a cell of the map opens its cabinet (the page shows the card). */
  onOpenCell?: (p: Position) => void;
}

/** What was reported: the description and, on a wall, the reported cells on the map. */
export function TicketSummary({ ticket, onOpenCell }: TicketSummaryProps) {
  return (
    <Card title="What is wrong">
      <div className="space-y-4">
        {ticket.description ? (
          <p className="whitespace-pre-wrap break-words text-base text-stone-900">{ticket.description}</p>
        ) : (
          <p className="text-sm text-stone-600">No description.</p>
        )}
        <p className="flex flex-wrap items-center gap-x-2 gap-y-1 text-sm text-stone-700">
          <MapPin className="h-4 w-4 text-ink-600" aria-hidden="true" />
          <Link to={paths.site.getHref(ticket.site.id)} className={placeLink}>
            {ticket.site.name}
          </Link>
          {ticket.wall ? (
            <>
              <span aria-hidden="true">·</span>
              <Grid3x3 className="h-4 w-4 text-ink-600" aria-hidden="true" />
              <Link to={paths.wall.getHref(ticket.wall.id)} className={placeLink}>
                {ticket.wall.name}
              </Link>
            </>
          ) : null}
        </p>
        {ticket.wall ? (
          ticket.scope === 'cells' && ticket.cells.length ? (
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
          )
        ) : null}
      </div>
    </Card>
  );
}
