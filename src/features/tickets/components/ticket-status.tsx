import type { TicketPriority, TicketStatus } from '@shared/schemas/enums';
import { priorityGuidance, statusLabels, type TicketClockState } from '@shared/schemas/tickets';
import clsx from 'clsx';
import {
  CalendarCheck,
  CircleCheck,
  CircleDot,
  CircleSlash,
  Hourglass,
  Inbox,
  MessageCircleQuestion,
  Package,
  Wrench,
  type LucideIcon,
} from 'lucide-react';
import { StatusPill, type PillState } from '@/components/ui/badge';

/**
 * Each status has its own icon and word, so the pill never depends on colour alone. Colours
 * are the design tokens' foreground/background pairs (contrast checked in ticket-status.test.ts).
 */
export const statusTones: Record<TicketStatus, { className: string; icon: LucideIcon }> = {
  new: { className: 'bg-amber-100 text-amber-900 ring-amber-300', icon: Inbox },
  acknowledged: { className: 'bg-ink-50 text-ink-800 ring-ink-200', icon: CircleDot },
  scheduled: { className: 'bg-state-spare-bg text-state-spare ring-state-spare/30', icon: CalendarCheck },
  in_progress: { className: 'bg-state-installed-bg text-state-installed ring-state-installed/30', icon: Wrench },
  waiting_parts: { className: 'bg-state-at-bench-bg text-state-at-bench ring-state-at-bench/30', icon: Package },
  waiting_client: { className: 'bg-state-returned-bg text-state-returned ring-state-returned/30', icon: MessageCircleQuestion },
  resolved: { className: 'bg-state-on-track-bg text-state-on-track ring-state-on-track/30', icon: CircleCheck },
  closed: { className: 'bg-stone-100 text-stone-700 ring-stone-300', icon: CircleSlash },
};

/** The status as a client reads it: "Waiting for you" only makes sense to the client. */
export function statusText(status: TicketStatus, forClient: boolean) {
  if (status === 'waiting_client' && !forClient) return 'Waiting for client';
  return statusLabels[status];
}

export function TicketStatusBadge({
  status,
  forClient = false,
  size = 'sm',
  className,
}: {
  status: TicketStatus;
  forClient?: boolean;
  size?: 'sm' | 'md';
  className?: string;
}) {
  const { className: tone, icon: Icon } = statusTones[status];
  return (
    <span
      className={clsx(
        'inline-flex items-center gap-1 whitespace-nowrap rounded-full font-medium ring-1 ring-inset',
        size === 'md' ? 'px-2.5 py-1 text-sm' : 'px-2 py-0.5 text-xs',
        tone,
        className,
      )}
    >
      <Icon className={size === 'md' ? 'h-4 w-4' : 'h-3.5 w-3.5'} aria-hidden="true" />
      <span>
        <span className="sr-only">Status: </span>
        {statusText(status, forClient)}
      </span>
    </span>
  );
}

/** Priority: a bar count (4 to 1) next to the word, so it is not colour alone either. */
export const priorityTones: Record<TicketPriority, { className: string; bars: number }> = {
  critical: { className: 'bg-danger-50 text-danger-700 ring-danger-600/40', bars: 4 },
  high: { className: 'bg-amber-50 text-amber-800 ring-amber-300', bars: 3 },
  normal: { className: 'bg-white text-ink-800 ring-ink-200', bars: 2 },
  low: { className: 'bg-white text-stone-700 ring-stone-300', bars: 1 },
};

export function PriorityBadge({ priority, size = 'sm', className }: { priority: TicketPriority; size?: 'sm' | 'md'; className?: string }) {
  const { className: tone, bars } = priorityTones[priority];
  return (
    <span
      className={clsx(
        'inline-flex items-center gap-1.5 whitespace-nowrap rounded-full font-medium ring-1 ring-inset',
        size === 'md' ? 'px-2.5 py-1 text-sm' : 'px-2 py-0.5 text-xs',
        tone,
        className,
      )}
    >
      <span className="flex h-3 items-end gap-px" aria-hidden="true">
        {[1, 2, 3, 4].map((n) => (
          <span key={n} className={clsx('w-[3px] rounded-sm bg-current', n > bars && 'opacity-25')} style={{ height: `${n * 25}%` }} />
        ))}
      </span>
      <span>
        <span className="sr-only">Priority: </span>
        {priorityGuidance[priority].label}
      </span>
    </span>
  );
}

export const clockLabels: Record<TicketClockState, string> = {
  on_track: 'On track',
  at_risk: 'At risk',
  breached: 'Breached',
  paused: 'Paused',
  met: 'Met',
  missed: 'Missed',
};

const clockPill: Record<Exclude<TicketClockState, 'paused'>, PillState> = {
  on_track: 'on-track',
  at_risk: 'at-risk',
  breached: 'breached',
  met: 'on-track',
  missed: 'breached',
};

/** A service-plan clock state; `what` names the clock for screen readers ("Resolution"). */
export function ClockBadge({ state, what, className }: { state: TicketClockState | null; what?: string; className?: string }) {
  if (!state) return <span className={clsx('text-xs text-stone-500', className)}>No target</span>;
  const label = (
    <>
      {what ? <span className="sr-only">{what}: </span> : null}
      {clockLabels[state]}
    </>
  );
  if (state === 'paused') {
    return (
      <span
        className={clsx(
          'inline-flex items-center gap-1.5 whitespace-nowrap rounded-full bg-stone-100 px-2 py-0.5 text-xs font-medium text-stone-700',
          className,
        )}
      >
        <Hourglass className="h-3 w-3" aria-hidden="true" />
        {label}
      </span>
    );
  }
  return (
    <StatusPill state={clockPill[state]} className={className}>
      {label}
    </StatusPill>
  );
}
