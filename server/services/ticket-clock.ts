import type { TicketClockState } from '../../shared/schemas/tickets.js';
import type { TicketPriority } from '../../shared/schemas/enums.js';
import { AT_RISK_SHARE, clockMsBetween, dueAt, HOUR_MS, type BusinessCalendar, type ClockMode } from '../../shared/calc/service-clock.js';
import type { PlanTargets } from '../db/schema/clients.js';

export interface PlanClock {
  mode: ClockMode;
  calendar: BusinessCalendar;
  timeZone: string;
  targets: PlanTargets;
}

/** Without a service plan: round the clock, generous targets (a product default). */
export const defaultTargets: PlanTargets = {
  critical: { responseHours: 2, resolutionHours: 24 },
  high: { responseHours: 8, resolutionHours: 72 },
  normal: { responseHours: 24, resolutionHours: 168 },
  low: { responseHours: 72, resolutionHours: 720 },
};

export function planClock(
  plan: { clockMode: ClockMode; businessDays: number[]; dayStart: string; dayEnd: string; targets: PlanTargets } | null,
  timeZone: string,
): PlanClock {
  if (!plan)
    return {
      mode: 'round_the_clock',
      calendar: { days: [1, 2, 3, 4, 5, 6, 7], start: '00:00', end: '24:00' },
      timeZone,
      targets: defaultTargets,
    };
  return {
    mode: plan.clockMode,
    calendar: { days: plan.businessDays, start: plan.dayStart, end: plan.dayEnd },
    timeZone,
    targets: plan.targets,
  };
}

const due = (clock: PlanClock, start: Date, hours: number) =>
  dueAt({ start, hours, mode: clock.mode, timeZone: clock.timeZone, calendar: clock.calendar });

/**
 * Response and resolution due times for a ticket opened at `openedAt`, with `pausedMs` of clock
 * time already spent waiting on the client (added to the resolution target). The at-risk time
 * is when a quarter of the allowed clock time is left (AT_RISK_SHARE).
 */
export function ticketDueTimes(clock: PlanClock, priority: TicketPriority, openedAt: Date, pausedMs = 0) {
  const target = clock.targets[priority];
  const resolutionHours = target.resolutionHours + pausedMs / HOUR_MS;
  return {
    responseDueAt: due(clock, openedAt, target.responseHours),
    responseAtRiskAt: due(clock, openedAt, target.responseHours * (1 - AT_RISK_SHARE)),
    resolutionDueAt: due(clock, openedAt, resolutionHours),
    resolutionAtRiskAt: due(clock, openedAt, target.resolutionHours * (1 - AT_RISK_SHARE) + pausedMs / HOUR_MS),
  };
}

/** Clock time that passed while paused, counted the way the plan counts. */
export function pausedClockMs(clock: PlanClock, pausedAt: Date, resumedAt: Date) {
  return Math.max(0, clockMsBetween(pausedAt, resumedAt, clock.mode, clock.timeZone, clock.calendar));
}

/** One clock's state at `now`: met/missed once done, paused, or on track / at risk / breached. */
export function clockStateOf(
  now: Date,
  c: { dueAt: Date | null; atRiskAt: Date | null; doneAt: Date | null; paused?: boolean },
): TicketClockState | null {
  if (!c.dueAt) return null;
  if (c.doneAt) return c.doneAt.getTime() <= c.dueAt.getTime() ? 'met' : 'missed';
  if (c.paused) return 'paused';
  if (now.getTime() > c.dueAt.getTime()) return 'breached';
  if (c.atRiskAt && now.getTime() >= c.atRiskAt.getTime()) return 'at_risk';
  return 'on_track';
}

const severity: Record<TicketClockState, number> = { breached: 5, missed: 4, at_risk: 3, paused: 2, on_track: 1, met: 0 };

/** The state the office acts on: the worse of the response and resolution clocks. */
export function worstState(...states: (TicketClockState | null)[]): TicketClockState | null {
  return states.filter((s): s is TicketClockState => s !== null).sort((a, b) => severity[b] - severity[a])[0] ?? null;
}
