// The dispatch week: which dates it shows, which window of time it asks the API for, and where a
// visit sits in it. A visit belongs to the day on which it starts at its site (a Phoenix visit at
// 17:00 on Tuesday is Tuesday's, whatever the office's own clock says).
import { TZDate } from '@date-fns/tz';
import { addDays, differenceInCalendarDays, format, isValid, parseISO, startOfWeek } from 'date-fns';
import type { VisitListItem } from '@shared/schemas/visits';
import { fromLocalInput } from '@/lib/site-time';

const dateOnly = /^\d{4}-\d{2}-\d{2}$/;
const ymd = (d: Date) => format(d, 'yyyy-MM-dd');

/** The Monday of the week holding `date` (YYYY-MM-DD), or of the week holding `today` when `date` is missing or wrong. */
export function weekStartOf(date: string | null | undefined, today: Date = new Date()): string {
  const d = date && dateOnly.test(date) ? parseISO(date) : today;
  return ymd(startOfWeek(isValid(d) ? d : today, { weekStartsOn: 1 }));
}

/** The seven dates of the week starting `monday`, Monday to Sunday. */
export function weekDays(monday: string): string[] {
  const start = parseISO(monday);
  return Array.from({ length: 7 }, (_, i) => ymd(addDays(start, i)));
}

/** The Monday `weeks` weeks before or after `monday`. */
export function shiftWeek(monday: string, weeks: number): string {
  return ymd(addDays(parseISO(monday), weeks * 7));
}

/**
 * What to ask the API for: the week's dates as UTC days, widened by 14 hours each side, so a
 * visit at any site's time zone (UTC−12 to UTC+14) that starts on one of the dates is inside.
 * The grid then keeps the visits whose site date is one of the week's.
 */
export function weekWindow(monday: string): { from: string; to: string } {
  const start = Date.parse(`${monday}T00:00:00Z`);
  const hour = 3_600_000;
  return { from: new Date(start - 14 * hour).toISOString(), to: new Date(start + 7 * 24 * hour + 14 * hour).toISOString() };
}

/** The date (YYYY-MM-DD) of a moment at the site. */
export const siteDate = (at: string, timeZone: string) => format(new TZDate(parseISO(at), timeZone), 'yyyy-MM-dd');

/** The time of day (HH:mm) of a moment at the site. */
export const siteClock = (at: string, timeZone: string) => format(new TZDate(parseISO(at), timeZone), 'HH:mm');

/** A date and a time of day at the site, as an instant with its offset; null when either is not valid. */
export const atSite = (date: string, time: string, timeZone: string) => fromLocalInput(`${date}T${time}`, timeZone);

/**
 * The window moved to another date, at the same time of day at the site (the clock on the wall
 * stays, even across a change to or from daylight saving time).
 */
export function movedToDate(visit: Pick<VisitListItem, 'windowStart' | 'windowEnd' | 'site'>, date: string) {
  const zone = visit.site.timeZone;
  const days = differenceInCalendarDays(parseISO(date), parseISO(siteDate(visit.windowStart, zone)));
  const shift = (at: string) => addDays(new TZDate(parseISO(at), zone), days).toISOString();
  return { windowStart: shift(visit.windowStart), windowEnd: shift(visit.windowEnd) };
}

/** The technicians after dropping the visit on another technician's row: that one takes the place of the first. */
export function replaceTechnician(ids: string[], from: string, to: string): string[] {
  if (from === to) return ids;
  return [...new Set(ids.map((id) => (id === from ? to : id)))];
}

/** One "booked twice" of the week: a technician with two visits at overlapping times, told once. */
export interface DoubleBooking {
  key: string;
  technician: string;
  first: { visitId: string; siteName: string; windowStart: string; windowEnd: string };
  second: { visitId: string; siteName: string; windowStart: string; windowEnd: string };
}

/** The week's double bookings, each pair once (both visits of a pair carry it), earliest first. */
export function doubleBookings(visits: VisitListItem[]): DoubleBooking[] {
  const seen = new Map<string, DoubleBooking>();
  for (const v of visits) {
    if (v.status === 'cancelled') continue;
    for (const c of v.conflicts) {
      const pair = [v.id, c.visitId].sort();
      const key = `${c.technician.id}:${pair.join(':')}`;
      if (seen.has(key)) continue;
      const mine = { visitId: v.id, siteName: v.site.name, windowStart: v.windowStart, windowEnd: v.windowEnd };
      const theirs = { visitId: c.visitId, siteName: c.siteName, windowStart: c.windowStart, windowEnd: c.windowEnd };
      const [first, second] = Date.parse(mine.windowStart) <= Date.parse(theirs.windowStart) ? [mine, theirs] : [theirs, mine];
      seen.set(key, { key, technician: c.technician.name, first, second });
    }
  }
  return [...seen.values()].sort((a, b) => Date.parse(a.first.windowStart) - Date.parse(b.first.windowStart));
}
