import type { visitStatuses } from '@shared/schemas/enums';
import { CalendarDays } from 'lucide-react';
import type { ReactNode } from 'react';
import { Card } from '@/components/ui/card';
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

/** Who, where and when, at a glance. */
export function TicketFacts({ ticket, forClient }: { ticket: TicketDetail; forClient: boolean }) {
  return (
    <Card title="Details">
      <dl className="divide-y divide-stone-100">
        {forClient ? null : <Fact label="Client">{ticket.client.name}</Fact>}
        <Fact label="Site">{ticket.site.name}</Fact>
        <Fact label="Wall">{ticket.wall?.name ?? <span className="font-normal text-stone-500">None</span>}</Fact>
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

/** The visits planned for this ticket, in the site's local time. */
export function TicketVisits({ visits, timeZone }: { visits: TicketVisit[]; timeZone?: string }) {
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
          <li key={v.id} className="rounded-md border border-stone-200 px-3 py-2">
            <p className="text-sm font-medium text-ink-950">{formatSiteTime(v.windowStart, timeZone)}</p>
            <p className="text-xs text-stone-600">
              until {formatSiteTime(v.windowEnd, timeZone, 'HH:mm')} · {visitStatusText[v.status]}
            </p>
          </li>
        ))}
      </ul>
    </Card>
  );
}
