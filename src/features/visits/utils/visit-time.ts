import { TZDate } from '@date-fns/tz';
import { format, isValid, parseISO } from 'date-fns';
import { zoneAbbreviation } from '@/lib/site-time';

const at = (iso: string, timeZone: string) => {
  const d = parseISO(iso);
  if (!isValid(d)) return null;
  try {
    return new TZDate(d, timeZone);
  } catch {
    return null;
  }
};

/**
 * A visit's window in the site's local time, the zone named once: "09:00–11:00 CST", with the day
 * in front when asked ("Thu 10 Dec, 09:00–11:00 CST"); a window over midnight names both days.
 */
export function visitWindowText(start: string, end: string, timeZone: string, { withDay = true } = {}): string {
  const [s, e] = [at(start, timeZone), at(end, timeZone)];
  if (!s || !e) return '—';
  const zone = zoneAbbreviation(s, timeZone);
  const sameDay = format(s, 'yyyy-MM-dd') === format(e, 'yyyy-MM-dd');
  if (!sameDay) return `${format(s, 'EEE d MMM, HH:mm')} – ${format(e, 'EEE d MMM, HH:mm')} ${zone}`;
  return `${withDay ? `${format(s, 'EEE d MMM')}, ` : ''}${format(s, 'HH:mm')}–${format(e, 'HH:mm')} ${zone}`;
}

/**
 * The viewer's day around `now`, the days after it, and the weeks before it (a visit started
 * earlier and never closed), as the list query's `from`/`to`: the same strings all day long, so
 * the loader and the page share their cached answers.
 */
export function dayRanges(now = new Date(), upcomingDays = 14, earlierDays = 30) {
  const day = (offset: number) => new Date(now.getFullYear(), now.getMonth(), now.getDate() + offset).toISOString();
  return {
    earlier: { from: day(-earlierDays), to: day(0) },
    today: { from: day(0), to: day(1) },
    upcoming: { from: day(1), to: day(1 + upcomingDays) },
  };
}
