import type { Position } from '@shared/schemas/cabinets';
import type { VisitDetail } from '@shared/schemas/visits';
import { ClipboardList, Grid3x3, Ticket } from 'lucide-react';
import { Link, useNavigate } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { VisitWallMap } from '@/features/visits/components/visit-wall-map';

/**
 * What the visit is for: the wall (its map, rear view for whoever works from behind it) and the
 * ticket with its reported cells. For those working the visit a reported cell opens the repair
 * form on that cabinet; for anyone else it opens the cell on the wall's map. On the map, any
 * other cell opens its cabinet card (`onOpenCell`; the page shows the card).
 */
export function VisitWork({ visit, onOpenCell }: { visit: VisitDetail; onOpenCell?: (p: Position) => void }) {
  const { wall, ticket } = visit;
  const navigate = useNavigate();
  const working = visit.can.work && (visit.status === 'planned' || visit.status === 'in_progress');
  const cellHref = (column: number, row: number) =>
    visit.can.work && wall
      ? paths.logRepair.getHref({ visitId: visit.id, wallId: wall.id, col: column, row })
      : paths.wall.getHref(wall?.id ?? '', { col: column, row });
  return (
    <Card
      title={
        <span className="inline-flex items-center gap-2">
          <ClipboardList className="h-4 w-4 text-ink-600" aria-hidden="true" />
          {ticket ? 'Ticket and wall' : 'Planned maintenance'}
        </span>
      }
    >
      <div className="space-y-4">
        {ticket ? (
          <div>
            <Link to={paths.ticket.getHref(ticket.id)} className="flex min-h-touch items-start gap-2 py-1 hover:underline">
              <Ticket className="mt-1 h-5 w-5 shrink-0 text-ink-600" aria-hidden="true" />
              <span>
                <span className="font-mono text-sm font-medium text-ink-600">{ticket.ref}</span>{' '}
                <span className="text-md font-semibold text-ink-950">{ticket.title}</span>
              </span>
            </Link>
            {ticket.cells.length > 0 && wall ? (
              <>
                <p className="mt-2 text-sm text-stone-600">Reported cabinets{visit.can.work ? ': tap one to log its repair' : ''}</p>
                <ul className="mt-2 flex flex-wrap gap-2" aria-label="Reported cabinets">
                  {ticket.cells.map((c) => (
                    <li key={`${c.column}-${c.row}`}>
                      <Link
                        to={cellHref(c.column, c.row)}
                        className="inline-flex min-h-touch min-w-touch items-center justify-center rounded-full border border-state-open-ticket-dot/50 bg-state-open-ticket-bg px-4 font-mono text-base font-medium text-state-open-ticket hover:border-state-open-ticket"
                      >
                        C{c.column}·R{c.row}
                      </Link>
                    </li>
                  ))}
                </ul>
              </>
            ) : null}
          </div>
        ) : null}
        {wall && onOpenCell ? (
          <VisitWallMap
            wall={wall}
            reported={ticket?.cells ?? []}
            onReportedCell={working ? (p) => void navigate(cellHref(p.column, p.row)) : undefined}
            onOpenCell={onOpenCell}
          />
        ) : null}
        {wall ? (
          <Link to={paths.wall.getHref(wall.id, { view: 'rear' })} className="flex min-h-touch items-center gap-2 py-1 hover:underline">
            <Grid3x3 className="h-5 w-5 shrink-0 text-ink-600" aria-hidden="true" />
            <span>
              <span className="text-md font-medium text-ink-950">{wall.name}</span>
              <span className="block text-sm text-stone-600">
                {wall.columns} × {wall.rows} cabinets · open the wall map
              </span>
            </span>
          </Link>
        ) : (
          <p className="text-base text-stone-600">No wall named on this visit.</p>
        )}
      </div>
    </Card>
  );
}
