import type { BoardTicket } from '@shared/schemas/board';
import type { TicketClockState } from '@shared/schemas/tickets';
import clsx from 'clsx';
import { formatDateTime, formatAgo } from '@/lib/format';

/** The board's words for a ticket's service-plan clock, with the mark beside them. */
const clockWords: Record<TicketClockState, { words: string; dot: string; text: string }> = {
  breached: { words: 'Past due', dot: 'bg-state-breached-dot', text: 'font-medium text-state-breached' },
  missed: { words: 'Past due', dot: 'bg-state-breached-dot', text: 'font-medium text-state-breached' },
  at_risk: { words: 'Close to due', dot: 'bg-state-at-risk-dot', text: 'font-medium text-state-at-risk' },
  paused: { words: 'Paused', dot: 'bg-stone-400', text: 'text-stone-700' },
  on_track: { words: 'On track', dot: 'bg-state-on-track-dot', text: 'text-state-on-track' },
  met: { words: 'Met', dot: 'bg-state-on-track-dot', text: 'text-state-on-track' },
};

/** "resolution was due 9 days ago", "response due in 3 hours", "waiting for the client". */
export function dueWords(t: Pick<BoardTicket, 'clockState' | 'dueAt' | 'dueKind'>, now = Date.now()): string {
  if (t.clockState === 'paused') return 'waiting for the client';
  if (!t.dueAt || !t.dueKind) return 'no service-plan target';
  const past = new Date(t.dueAt).getTime() < now;
  return past ? `${t.dueKind} was due ${formatAgo(t.dueAt)}` : `${t.dueKind} due ${formatAgo(t.dueAt)}`;
}

/** A ticket's clock in words: a coloured mark, the state ("Past due") and when it was or is due. */
export function ClockWords({ ticket, className }: { ticket: Pick<BoardTicket, 'clockState' | 'dueAt' | 'dueKind'>; className?: string }) {
  const look = ticket.clockState ? clockWords[ticket.clockState] : undefined;
  return (
    <span className={clsx('inline-flex items-baseline gap-1.5', className)} title={ticket.dueAt ? formatDateTime(ticket.dueAt) : undefined}>
      <span className={clsx('h-2 w-2 shrink-0 translate-y-[-1px] rounded-full', look?.dot ?? 'bg-stone-300')} aria-hidden="true" />
      <span>
        {look ? <span className={look.text}>{look.words}</span> : null}
        {look ? ': ' : null}
        {look ? dueWords(ticket) : 'No service-plan target'}
      </span>
    </span>
  );
}
