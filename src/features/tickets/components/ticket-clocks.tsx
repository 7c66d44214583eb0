import { TZDate } from '@date-fns/tz';
import type { TicketClockState, TicketDetail } from '@shared/schemas/tickets';
import { priorityGuidance } from '@shared/schemas/tickets';
import clsx from 'clsx';
import { format, isValid, parseISO } from 'date-fns';
import { AlertTriangle, Clock } from 'lucide-react';
import { Fragment } from 'react';
import { statusText } from '@/features/tickets/components/ticket-status';
import { formatSiteTime, relativeTime } from '@/lib/site-time';

type Tone = 'plain' | 'strong' | 'at-risk' | 'breached';

/** One phrase of the ticket's state line; `title` holds the exact moment at the site. */
export interface StatePart {
  text: string;
  tone: Tone;
  title?: string;
}

type ClockTicket = Pick<
  TicketDetail,
  'status' | 'priority' | 'clocks' | 'responseDueAt' | 'resolutionDueAt' | 'resolvedAt' | 'siteTimeZone' | 'mergedInto'
>;

/** "Wed 9 Dec" at the site (its own day, not the viewer's). */
function siteDay(iso: string, timeZone: string | undefined) {
  const d = parseISO(iso);
  if (!isValid(d)) return '—';
  try {
    return format(timeZone ? new TZDate(d, timeZone) : d, 'EEE d MMM');
  } catch {
    return format(d, 'EEE d MMM');
  }
}

const toneOf = (state: TicketClockState | null): Tone => (state === 'at_risk' ? 'at-risk' : state === 'breached' ? 'breached' : 'plain');

function responsePart(t: ClockTicket): StatePart | null {
  const state = t.clocks.response;
  const due = t.responseDueAt;
  if (!due) return null;
  const title = `First response target: ${formatSiteTime(due, t.siteTimeZone)}`;
  if (state === 'on_track' || state === 'at_risk') return { text: `first response due ${relativeTime(due)}`, tone: toneOf(state), title };
  if (state === 'breached') return { text: `first response was due ${relativeTime(due)}`, tone: 'breached', title };
  if (state === 'missed') return { text: 'first response came late', tone: 'plain', title };
  return null; // answered in time: nothing left to say
}

function resolutionPart(t: ClockTicket): StatePart | null {
  const state = t.clocks.resolution;
  const due = t.resolutionDueAt;
  if (!state || !due) return null;
  const title = `Resolution target: ${formatSiteTime(due, t.siteTimeZone)}`;
  const day = siteDay(due, t.siteTimeZone);
  switch (state) {
    case 'on_track':
    case 'at_risk':
      return { text: `resolution due ${day}`, tone: toneOf(state), title };
    case 'breached':
      return { text: `resolution was due ${day} (${relativeTime(due)})`, tone: 'breached', title };
    case 'paused':
      return { text: 'resolution clock paused while the client is asked', tone: 'plain', title };
    case 'met':
    case 'missed': {
      const when = t.resolvedAt ? ` ${siteDay(t.resolvedAt, t.siteTimeZone)}` : '';
      return { text: `resolved${when}, ${state === 'met' ? 'within' : 'after'} the target`, tone: 'plain', title };
    }
  }
}

/**
 * The ticket's state in words, with the service-plan clock:
 * "New · normal priority · first response was due 4 hours ago · resolution due Wed 9 Dec".
 */
export function stateLineParts(t: ClockTicket, forClient: boolean): StatePart[] {
  const parts: StatePart[] = [
    { text: statusText(t.status, forClient), tone: 'strong' },
    { text: `${priorityGuidance[t.priority].label.toLowerCase()} priority`, tone: 'plain' },
  ];
  if (t.mergedInto) return parts;
  const clock = [responsePart(t), resolutionPart(t)].filter((p): p is StatePart => p !== null);
  if (clock.length === 0 && t.status !== 'closed' && t.status !== 'resolved') parts.push({ text: 'no service-plan target', tone: 'plain' });
  return [...parts, ...clock];
}

const toneClass: Record<Tone, string> = {
  plain: 'text-stone-700',
  strong: 'font-semibold text-ink-950',
  'at-risk': 'font-medium text-state-at-risk',
  breached: 'font-medium text-state-breached',
};

/** The line under the ticket's title: its state and clocks, in the site's time (the exact moment on hover). */
export function TicketStateLine({ ticket, forClient }: { ticket: ClockTicket; forClient: boolean }) {
  const parts = stateLineParts(ticket, forClient);
  return (
    <p className="mt-1 flex flex-wrap items-center gap-x-1.5 gap-y-0.5 text-base" data-testid="ticket-state">
      <Clock className="h-4 w-4 shrink-0 text-ink-600" aria-hidden="true" />
      {parts.map((p, i) => (
        <Fragment key={p.text}>
          {i > 0 ? (
            <span aria-hidden="true" className="text-stone-400">
              ·
            </span>
          ) : null}
          <span className={clsx('inline-flex items-center gap-1', toneClass[p.tone])} title={p.title}>
            {p.tone === 'breached' || p.tone === 'at-risk' ? <AlertTriangle className="h-3.5 w-3.5" aria-hidden="true" /> : null}
            {p.text}
          </span>
        </Fragment>
      ))}
    </p>
  );
}
