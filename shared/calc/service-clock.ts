// The service-plan clock: when a response or resolution is due, counted in business hours in
// the site's own time zone or round the clock, and whether a running clock is at risk.
// Time-zone arithmetic (local days, opening times across daylight-saving changes) is done by
// date-fns with @date-fns/tz, never by hand.
import { TZDate } from '@date-fns/tz';
import { addDays, getISODay, startOfDay } from 'date-fns';

export const HOUR_MS = 3_600_000;

/** `business`: only inside the calendar's hours; `round_the_clock`: every hour counts. */
export type ClockMode = 'business' | 'round_the_clock';

/** The hours the clock runs in business mode, read as local times in the site's time zone. */
export interface BusinessCalendar {
  /** ISO weekdays (1 = Monday … 7 = Sunday). */
  days: number[];
  /** Opening time, `HH:MM`. */
  start: string;
  /** Closing time, `HH:MM` after the opening; `24:00` is midnight at the end of the day. */
  end: string;
}

function clockTime(hhmm: string): [number, number] {
  const match = /^(\d{2}):(\d{2})$/.exec(hhmm);
  if (!match) throw new RangeError(`Not a time of day: ${hhmm}`);
  return [Number(match[1]), Number(match[2])];
}

/**
 * The business windows [open, close) as epoch milliseconds, one per business day, from the
 * local day that holds `from` onwards. Each window is built from the local date and the
 * calendar's local times, so a 08:00–18:00 day is 10 hours on either side of a
 * daylight-saving change and starts at 08:00 local time on both.
 */
function* businessWindows(from: Date, timeZone: string, calendar: BusinessCalendar): Generator<[number, number]> {
  if (calendar.days.length === 0) throw new RangeError('The calendar has no business days.');
  const [openH, openM] = clockTime(calendar.start);
  const [closeH, closeM] = clockTime(calendar.end);
  if (closeH * 60 + closeM <= openH * 60 + openM) throw new RangeError('The business day must close after it opens.');
  let day = startOfDay(new TZDate(from.getTime(), timeZone));
  for (;;) {
    if (calendar.days.includes(getISODay(day))) {
      const y = day.getFullYear();
      const m = day.getMonth();
      const d = day.getDate();
      const open = new TZDate(y, m, d, openH, openM, timeZone).getTime();
      const close = new TZDate(y, m, d, closeH, closeM, timeZone).getTime();
      if (close > open) yield [open, close];
    }
    day = addDays(day, 1);
  }
}

export interface DueInput {
  start: Date;
  hours: number;
  mode: ClockMode;
  /** IANA time zone of the site, e.g. America/Chicago. */
  timeZone: string;
  calendar: BusinessCalendar;
}

/**
 * When `hours` of clock time have run from `start`.
 * Round the clock: start + hours × 3,600,000 ms (elapsed time; a daylight-saving change does
 * not add or remove an hour). Business: the hours are used up inside the calendar's windows
 * in the site's time zone; a start outside the hours waits for the next opening, and a due
 * time that lands exactly on a closing time stays there.
 */
export function dueAt(input: DueInput): Date {
  const start = input.start.getTime();
  let remaining = input.hours * HOUR_MS;
  if (input.mode === 'round_the_clock') return new Date(start + remaining);
  for (const [open, close] of businessWindows(input.start, input.timeZone, input.calendar)) {
    const from = Math.max(open, start);
    if (close <= from) continue;
    if (remaining <= close - from) return new Date(from + remaining);
    remaining -= close - from;
  }
  throw new Error('unreachable: business windows never end');
}

/**
 * Business time elapsed from `a` to `b` in milliseconds: the overlap of [a, b] with the
 * calendar's windows in the site's time zone (negative when b is before a). With `dueAt`,
 * this lets a paused clock resume: due = dueAt(resumedAt, hours − elapsed-before-the-pause).
 */
export function businessMsBetween(a: Date, b: Date, timeZone: string, calendar: BusinessCalendar): number {
  if (b.getTime() < a.getTime()) return -businessMsBetween(b, a, timeZone, calendar);
  const from = a.getTime();
  const to = b.getTime();
  let total = 0;
  for (const [open, close] of businessWindows(a, timeZone, calendar)) {
    if (open >= to) break;
    total += Math.max(0, Math.min(close, to) - Math.max(open, from));
  }
  return total;
}

/** Clock time from `a` to `b` in milliseconds, in either mode: what a service plan counts. */
export function clockMsBetween(a: Date, b: Date, mode: ClockMode, timeZone: string, calendar: BusinessCalendar): number {
  return mode === 'round_the_clock' ? b.getTime() - a.getTime() : businessMsBetween(a, b, timeZone, calendar);
}

export type ClockState = 'on_track' | 'at_risk' | 'breached';

/**
 * A product choice, not a standard: a clock is "at risk" once less than 25 % of the time it
 * was allowed is left, early enough for the office to act before it breaches.
 */
export const AT_RISK_SHARE = 0.25;

/**
 * The state of a running clock: `breached` after the due time (exactly at it is still on
 * time), `at_risk` when less than 25 % of the allowed time (start → due) is left, `on_track`
 * otherwise. Time is measured in elapsed milliseconds unless `measure` is given, e.g.
 * `(a, b) => businessMsBetween(a, b, zone, calendar)` to count business time only.
 */
export function clockState(
  now: Date,
  due: Date,
  startedAt: Date,
  measure: (a: Date, b: Date) => number = (a, b) => b.getTime() - a.getTime(),
): ClockState {
  if (now.getTime() > due.getTime()) return 'breached';
  const allowed = measure(startedAt, due);
  const left = measure(now, due);
  return left < AT_RISK_SHARE * allowed ? 'at_risk' : 'on_track';
}
