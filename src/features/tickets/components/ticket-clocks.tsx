import type { TicketClockState } from '@shared/schemas/tickets';
import { Clock } from 'lucide-react';
import type { TicketDetail } from '@shared/schemas/tickets';
import { ClockBadge } from '@/features/tickets/components/ticket-status';
import { formatSiteTime, relativeTime } from '@/lib/site-time';

interface ClockLineProps {
  title: string;
  state: TicketClockState | null;
  dueAt: string | null;
  doneAt: string | null;
  doneWord: string;
  pausedAt?: string | null;
  timeZone?: string;
}

function ClockLine({ title, state, dueAt, doneAt, doneWord, pausedAt, timeZone }: ClockLineProps) {
  let text: string;
  if (!state || !dueAt) text = 'No target in the service plan.';
  else if (state === 'met' || state === 'missed')
    text = `${doneWord} ${formatSiteTime(doneAt, timeZone)} · target was ${formatSiteTime(dueAt, timeZone)}`;
  else if (state === 'paused')
    text = `Paused since ${formatSiteTime(pausedAt, timeZone)} while we wait for the client. Due ${formatSiteTime(dueAt, timeZone)} before the pause.`;
  else if (state === 'breached') text = `Was due ${formatSiteTime(dueAt, timeZone)} (${relativeTime(dueAt)})`;
  else text = `Due ${formatSiteTime(dueAt, timeZone)} (${relativeTime(dueAt)})`;
  return (
    <div className="flex flex-col gap-1 py-2.5 first:pt-0 last:pb-0 sm:flex-row sm:items-baseline sm:gap-3">
      <dt className="w-36 shrink-0 text-sm font-medium text-stone-700">{title}</dt>
      <dd className="flex min-w-0 flex-wrap items-baseline gap-x-2 gap-y-1 text-sm text-stone-800">
        <ClockBadge state={state} what={title} />
        <span>{text}</span>
      </dd>
    </div>
  );
}

/** The service-plan clocks: first response and resolution, in the site's local time. */
export function TicketClocks({ ticket, timeZone }: { ticket: TicketDetail; timeZone?: string }) {
  return (
    <section aria-labelledby="ticket-clocks" className="rounded-md border border-stone-200 bg-white px-4 py-3 shadow-card sm:px-5">
      <h2 id="ticket-clocks" className="mb-2 flex items-center gap-2 text-sm font-semibold text-stone-700">
        <Clock className="h-4 w-4 text-ink-600" aria-hidden="true" />
        Service-plan clock{timeZone ? <span className="font-normal text-stone-500">· times at the site</span> : null}
      </h2>
      <dl className="divide-y divide-stone-100">
        <ClockLine
          title="First response"
          state={ticket.clocks.response}
          dueAt={ticket.responseDueAt}
          doneAt={ticket.acknowledgedAt}
          doneWord="Answered"
          timeZone={timeZone}
        />
        <ClockLine
          title="Resolution"
          state={ticket.clocks.resolution}
          dueAt={ticket.resolutionDueAt}
          doneAt={ticket.resolvedAt}
          doneWord="Resolved"
          pausedAt={ticket.pausedAt}
          timeZone={timeZone}
        />
      </dl>
    </section>
  );
}
