import { TZDate } from '@date-fns/tz';
import type { visitStatuses } from '@shared/schemas/enums';
import { format, parseISO } from 'date-fns';
import { Building2, CalendarCog, CalendarDays, ChevronRight, Grid3x3, MapPin, Crosshair } from 'lucide-react';
import { Link } from 'react-router-dom';
import type { ReactNode } from 'react';
import { paths } from '@/config/paths';
import type { TicketDetail, TicketVisit } from '@shared/schemas/tickets';
import { TicketPanel } from '@/features/tickets/components/ticket-panel';
import { formatAgo, formatDateTime } from '@/lib/format';
import { formatSiteTime } from '@/lib/site-time';

export const visitStatusText: Record<(typeof visitStatuses)[number], string> = {
  planned: 'Planned',
  in_progress: 'Under way',
  completed: 'Done',
  cancelled: 'Cancelled',
};

/** What a ticket without particular cabinets is about. */
const scopeText = {
  cells: 'Particular cabinets',
  whole_wall: 'The whole wall',
  controller: 'Controller or signal',
  site: 'Something else at the site',
} as const;

/** So many reported cells are linked one by one; the map shows the rest. */
const linkedCells = 6;

const stopLink =
  'inline-flex min-h-touch items-center font-medium text-ink-800 underline decoration-ink-300 underline-offset-4 hover:decoration-ink-700 sm:min-h-0';

interface Stop {
  label: string;
  icon: typeof MapPin;
  value: ReactNode;
}

/** The reported place on the wall: each reported cell a link to it on the wall page, or what the ticket is about. */
function reportedStop(ticket: TicketDetail): Stop {
  if (ticket.wall && ticket.scope === 'cells' && ticket.cells.length > 0) {
    const wall = ticket.wall;
    const shown = ticket.cells.slice(0, linkedCells);
    return {
      label: ticket.cells.length === 1 ? 'Reported cabinet' : `Reported cabinets (${ticket.cells.length})`,
      icon: Crosshair,
      value: (
        <span className="flex flex-wrap items-center gap-x-2">
          {shown.map((p, i) => (
            <Link
              key={`${p.column}-${p.row}`}
              to={paths.wall.getHref(wall.id, { col: p.column, row: p.row })}
              className={`${stopLink} font-mono`}
              aria-label={`${ticket.cellLabels[i]} on the wall page`}
            >
              {ticket.cellLabels[i]}
            </Link>
          ))}
          {ticket.cells.length > shown.length ? (
            <span className="text-sm text-stone-600">+{ticket.cells.length - shown.length} on the map</span>
          ) : null}
        </span>
      ),
    };
  }
  return { label: 'Reported', icon: Crosshair, value: <span className="font-medium text-stone-900">{scopeText[ticket.scope]}</span> };
}

/**
 * Where the fault is, as a technician thinks of it: client › site › wall › reported cabinets, each a
 * link; and under it who reported it, when, and who has it.
 */
export function InstallationLine({ ticket, forClient }: { ticket: TicketDetail; forClient: boolean }) {
  const stops: Stop[] = [
    {
      label: 'Client',
      icon: Building2,
      value: forClient ? (
        <span className="font-medium text-stone-900">{ticket.client.name}</span>
      ) : (
        <Link to={paths.client.getHref(ticket.client.id)} className={stopLink}>
          {ticket.client.name}
        </Link>
      ),
    },
    {
      label: 'Site',
      icon: MapPin,
      value: (
        <Link to={paths.site.getHref(ticket.site.id)} className={stopLink}>
          {ticket.site.name}
        </Link>
      ),
    },
    ...(ticket.wall
      ? [
          {
            label: 'Wall',
            icon: Grid3x3,
            value: (
              <Link to={paths.wall.getHref(ticket.wall.id)} className={stopLink}>
                {ticket.wall.name}
              </Link>
            ),
          },
        ]
      : []),
    reportedStop(ticket),
  ];
  return (
    <div className="mb-5 space-y-2 border-y border-stone-200 py-3">
      <nav aria-label="Installation">
        <ol className="flex flex-col gap-1 sm:flex-row sm:flex-wrap sm:items-center sm:gap-x-2 sm:gap-y-2">
          {stops.map((s, i) => (
            <li key={s.label} className="flex min-w-0 items-center gap-2">
              {i > 0 ? <ChevronRight className="hidden h-5 w-5 shrink-0 text-ink-300 sm:block" aria-hidden="true" /> : null}
              <s.icon className="h-4 w-4 shrink-0 text-ink-600" aria-hidden="true" />
              <span className="w-24 shrink-0 text-xs font-medium uppercase tracking-wide text-stone-600 sm:w-auto">{s.label}</span>
              <span className="min-w-0 text-base">{s.value}</span>
            </li>
          ))}
        </ol>
      </nav>
      <p className="flex flex-wrap gap-x-3 gap-y-0.5 text-sm text-stone-700">
        <span>
          Reported by <span className="font-medium text-stone-900">{ticket.reporterName ?? 'the service desk'}</span>
        </span>
        <span>
          opened{' '}
          <time dateTime={ticket.createdAt} title={formatDateTime(ticket.createdAt)}>
            {formatAgo(ticket.createdAt)}
          </time>
        </span>
        <span>
          {forClient ? 'handled by ' : 'assignee '}
          <span className="font-medium text-stone-900">{ticket.assignee?.name ?? (forClient ? 'the service desk' : 'nobody yet')}</span>
        </span>
        <span>
          last change{' '}
          <time dateTime={ticket.updatedAt} title={formatDateTime(ticket.updatedAt)}>
            {formatAgo(ticket.updatedAt)}
          </time>
        </span>
      </p>
    </div>
  );
}

/** The visits planned for this ticket, in the site's local time; the office moves or cancels one in dispatch. */
export function TicketVisits({ visits, timeZone, office = false }: { visits: TicketVisit[]; timeZone?: string; office?: boolean }) {
  if (visits.length === 0) return null;
  return (
    <TicketPanel title="Visits" icon={CalendarDays}>
      <ul className="space-y-2" aria-label="Visits for this ticket">
        {visits.map((v) => (
          <li key={v.id} className="flex items-stretch rounded-md border border-stone-200 hover:border-ink-300">
            <Link to={paths.visit.getHref(v.id)} className="group flex min-w-0 flex-1 items-center gap-2 px-3 py-2 hover:bg-ink-50/40">
              <span className="min-w-0 flex-1">
                <span className="block text-sm font-medium text-ink-950 group-hover:underline">
                  {formatSiteTime(v.windowStart, timeZone)}
                </span>
                <span className="block text-xs text-stone-600">
                  until {formatSiteTime(v.windowEnd, timeZone, 'HH:mm')} · {visitStatusText[v.status]}
                </span>
              </span>
              <ChevronRight className="h-4 w-4 shrink-0 text-stone-400 group-hover:text-ink-700" aria-hidden="true" />
            </Link>
            {office && (v.status === 'planned' || v.status === 'in_progress') ? <MoveInDispatch visit={v} timeZone={timeZone} /> : null}
          </li>
        ))}
      </ul>
    </TicketPanel>
  );
}

/** The visit's week in dispatch, its edit dialog open: move, reassign or cancel it there. */
function MoveInDispatch({ visit, timeZone }: { visit: TicketVisit; timeZone?: string }) {
  // Any date of the week opens that week; the date is the site's, as dispatch files visits.
  const start = parseISO(visit.windowStart);
  const week = format(timeZone ? new TZDate(start, timeZone) : start, 'yyyy-MM-dd');
  return (
    <Link
      to={paths.dispatch.getHref({ week, visit: visit.id })}
      aria-label={`Move or cancel the visit of ${formatSiteTime(visit.windowStart, timeZone)} in dispatch`}
      className="flex min-h-touch shrink-0 items-center gap-1.5 border-l border-stone-200 px-3 text-xs font-medium text-ink-700 hover:bg-ink-50/40 hover:underline"
    >
      <CalendarCog className="h-4 w-4" aria-hidden="true" />
      Move or cancel
    </Link>
  );
}
