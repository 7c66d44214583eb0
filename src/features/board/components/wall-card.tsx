import type { BoardTicket, BoardVisit, BoardWall } from '@shared/schemas/board';
import { priorityGuidance } from '@shared/schemas/tickets';
import { CalendarClock, CalendarPlus } from 'lucide-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ClockWords } from '@/features/board/components/clock-words';
import { WallDrawing } from '@/features/board/components/wall-drawing';
import { formatSiteWindow } from '@/lib/site-time';

/** One wall that needs attention: where it is, a drawing of its grid, its open tickets, its next visit. */
export function WallCard({ wall }: { wall: BoardWall }) {
  const id = `board-wall-${wall.id}`;
  const cells = wall.tickets.flatMap((t) => t.cells);
  return (
    <article aria-labelledby={id} className="rounded-md border border-stone-200 bg-white shadow-card">
      <header className="flex items-start gap-4 px-4 pb-2 pt-3 sm:px-5">
        <div className="min-w-0 flex-1">
          <h3 id={id} className="text-md font-semibold leading-snug">
            <Link to={paths.wall.getHref(wall.id)} className="text-ink-950 hover:underline">
              {wall.name}
            </Link>
          </h3>
          <p className="text-sm text-stone-600">
            <Link to={paths.client.getHref(wall.client.id)} className="hover:underline">
              {wall.client.name}
            </Link>
            {' · '}
            <Link to={paths.site.getHref(wall.site.id)} className="hover:underline">
              {wall.site.name}
            </Link>
          </p>
        </div>
        <WallDrawing
          columns={wall.columns}
          rows={wall.rows}
          cells={cells}
          wholeWall={wall.tickets.some((t) => t.scope === 'whole_wall')}
          className="mt-1"
        />
      </header>
      <ul className="divide-y divide-stone-100 border-t border-stone-100" aria-label={`Open tickets on ${wall.name}`}>
        {wall.tickets.map((t) => (
          <TicketLine key={t.id} ticket={t} />
        ))}
      </ul>
      <NextVisit wall={wall} visit={wall.nextVisit} />
    </article>
  );
}

/** An open ticket: reference and title (one link), then its clock in words and who has it. */
export function TicketLine({ ticket: t, place }: { ticket: BoardTicket; place?: string }) {
  return (
    <li className="px-4 py-2 sm:px-5">
      <Link to={paths.ticket.getHref(t.id)} className="group flex min-h-touch items-center md:min-h-0 md:py-0.5">
        <span>
          <span className="mr-2 font-mono text-sm text-ink-700">{t.ref}</span>
          <span className="font-medium text-ink-950 group-hover:underline">{t.title}</span>
        </span>
      </Link>
      <p className="flex flex-wrap items-baseline gap-x-2 text-sm text-stone-700">
        <ClockWords ticket={t} />
        <span aria-hidden="true">·</span>
        {t.priority === 'critical' || t.priority === 'high' ? (
          <>
            <span className={t.priority === 'critical' ? 'font-medium text-danger-700' : 'text-amber-800'}>
              {priorityGuidance[t.priority].label} priority
            </span>
            <span aria-hidden="true">·</span>
          </>
        ) : null}
        {t.assignee ? <span>{t.assignee.name}</span> : <span className="text-stone-500">Unassigned</span>}
        {place ? (
          <>
            <span aria-hidden="true">·</span>
            <span className="text-stone-600">{place}</span>
          </>
        ) : null}
      </p>
    </li>
  );
}

/** The next visit booked for the wall (time at the site, who goes), or a way to plan one. */
function NextVisit({ wall, visit }: { wall: BoardWall; visit: BoardVisit | null }) {
  return (
    <div className="flex items-start gap-2 border-t border-stone-100 bg-stone-50 px-4 py-1 text-sm sm:px-5 md:py-2">
      <CalendarClock className="mt-3 h-4 w-4 shrink-0 text-stone-500 md:mt-0.5" aria-hidden="true" />
      {visit ? (
        <Link to={paths.visit.getHref(visit.id)} className="flex min-h-touch flex-1 items-center text-ink-800 hover:underline md:min-h-0">
          <span>
            <span className="font-medium">{visit.status === 'in_progress' ? 'On site now' : 'Next visit'}</span>{' '}
            {formatSiteWindow(visit.windowStart, visit.windowEnd, wall.site.timeZone)}
            {' · '}
            {visit.technicians.map((p) => p.name).join(', ') || 'no technician yet'}
          </span>
        </Link>
      ) : (
        <div className="flex flex-1 flex-wrap items-center justify-between gap-x-3">
          <span className="text-stone-700">No visit booked</span>
          <Link
            to={paths.dispatch.getHref({ ticketId: wall.tickets[0].id })}
            aria-label={`Plan a visit to ${wall.name}`}
            className="inline-flex min-h-touch items-center gap-1 font-medium text-ink-700 hover:underline md:min-h-0"
          >
            <CalendarPlus className="h-4 w-4" aria-hidden="true" /> Plan a visit
          </Link>
        </div>
      )}
    </div>
  );
}
