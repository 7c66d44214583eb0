import { TZDate } from '@date-fns/tz';
import type { visitStatuses } from '@shared/schemas/enums';
import { format, parseISO } from 'date-fns';
import { CalendarCog, CalendarDays, ChevronRight } from 'lucide-react';
import { Link } from 'react-router-dom';
import type { ReactNode } from 'react';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import type { TicketDetail, TicketVisit } from '@shared/schemas/tickets';
import { formatAgo, formatDateTime } from '@/lib/format';
import { formatSiteTime } from '@/lib/site-time';

const scopeText = {
  cells: 'Particular cabinets',
  whole_wall: 'The whole wall',
  controller: 'Controller / signal',
  site: 'Something else at the site',
} as const;
const visitStatusText: Record<(typeof visitStatuses)[number], string> = {
  planned: 'Planned',
  in_progress: 'Under way',
  completed: 'Done',
  cancelled: 'Cancelled',
};

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex justify-between gap-3 py-2 first:pt-0 last:pb-0">
      <dt className="shrink-0 text-sm text-stone-600">{label}</dt>
      <dd className="min-w-0 text-right text-sm font-medium text-stone-900">{children}</dd>
    </div>
  );
}

/** The name of a record, linked to its page. */
function RecordLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <Link to={to} className="inline-flex min-h-touch items-center text-ink-700 underline-offset-2 hover:underline lg:min-h-0">
      {children}
    </Link>
  );
}

/** Who, where and when, at a glance. */
export function TicketFacts({ ticket, forClient }: { ticket: TicketDetail; forClient: boolean }) {
  return (
    <Card title="Details">
      <dl className="divide-y divide-stone-100">
        {forClient ? null : (
          <Fact label="Client">
            <RecordLink to={paths.client.getHref(ticket.client.id)}>{ticket.client.name}</RecordLink>
          </Fact>
        )}
        <Fact label="Site">
          <RecordLink to={paths.site.getHref(ticket.site.id)}>{ticket.site.name}</RecordLink>
        </Fact>
        <Fact label="Wall">
          {ticket.wall ? (
            <RecordLink to={paths.wall.getHref(ticket.wall.id)}>{ticket.wall.name}</RecordLink>
          ) : (
            <span className="font-normal text-stone-500">None</span>
          )}
        </Fact>
        <Fact label="Affects">{scopeText[ticket.scope]}</Fact>
        <Fact label="Reported by">{ticket.reporterName ?? '—'}</Fact>
        <Fact label="Opened">
          <span title={formatDateTime(ticket.createdAt)}>{formatAgo(ticket.createdAt)}</span>
        </Fact>
        <Fact label={forClient ? 'Handled by' : 'Assignee'}>
          {ticket.assignee?.name ?? <span className="font-normal text-stone-500">{forClient ? 'The service desk' : 'Unassigned'}</span>}
        </Fact>
        <Fact label="Updated">
          <span title={formatDateTime(ticket.updatedAt)}>{formatAgo(ticket.updatedAt)}</span>
        </Fact>
      </dl>
    </Card>
  );
}

/** The visits planned for this ticket, in the site's local time; the office moves or cancels one in dispatch. */
export function TicketVisits({ visits, timeZone, office = false }: { visits: TicketVisit[]; timeZone?: string; office?: boolean }) {
  if (visits.length === 0) return null;
  return (
    <Card
      title={
        <span className="inline-flex items-center gap-2">
          <CalendarDays className="h-4 w-4 text-ink-600" aria-hidden="true" />
          Visits
        </span>
      }
    >
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
    </Card>
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
