import { TZDate } from '@date-fns/tz';
import { format, formatDistanceToNowStrict, isValid, parseISO } from 'date-fns';

/** "CST", "EDT" or "GMT+2": the short name of a time zone at a moment. */
export function zoneAbbreviation(date: Date, timeZone: string): string {
  try {
    const part = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'short' })
      .formatToParts(date)
      .find((p) => p.type === 'timeZoneName');
    return part?.value ?? timeZone;
  } catch {
    return timeZone;
  }
}

/**
 * A moment in the site's local time: "Thu 10 Dec, 09:00 CST" (the one way the app writes a time
 * at a site; `formatSiteTime(new Date(), zone)` is the time there now). Without a time zone
 * (still loading), the viewer's own time; '—' for no moment or a zone the browser does not know.
 */
export function formatSiteTime(at: Date | string | null | undefined, timeZone: string | undefined, pattern = 'EEE d MMM, HH:mm'): string {
  if (!at) return '—';
  const d = typeof at === 'string' ? parseISO(at) : at;
  if (!isValid(d)) return '—';
  if (!timeZone) return format(d, pattern);
  try {
    return `${format(new TZDate(d, timeZone), pattern)} ${zoneAbbreviation(d, timeZone)}`;
  } catch {
    return '—';
  }
}

/**
 * A window of time in the site's local time, the zone named once: "09:00–11:00 CST", with the day
 * in front when asked ("Thu 10 Dec, 09:00–11:00 CST", and the year with `withYear`); a window over
 * the site's midnight names both days. '—' for what it cannot read.
 */
export function formatSiteWindow(
  start: string,
  end: string,
  timeZone: string,
  { withDay = true, withYear = false }: { withDay?: boolean; withYear?: boolean } = {},
): string {
  const at = (iso: string) => {
    const d = parseISO(iso);
    if (!isValid(d)) return null;
    try {
      return new TZDate(d, timeZone);
    } catch {
      return null;
    }
  };
  const [s, e] = [at(start), at(end)];
  if (!s || !e) return '—';
  const zone = zoneAbbreviation(s, timeZone);
  const day = withYear ? 'EEE d MMM yyyy' : 'EEE d MMM';
  if (format(s, 'yyyy-MM-dd') !== format(e, 'yyyy-MM-dd')) return `${format(s, `${day}, HH:mm`)} – ${format(e, `${day}, HH:mm`)} ${zone}`;
  return `${withDay ? `${format(s, day)}, ` : ''}${format(s, 'HH:mm')}–${format(e, 'HH:mm')} ${zone}`;
}

/** "in 3 hours", "5 minutes ago". */
export function relativeTime(iso: string | null | undefined): string {
  if (!iso) return '';
  const d = parseISO(iso);
  return isValid(d) ? formatDistanceToNowStrict(d, { addSuffix: true }) : '';
}

/** The value of a `datetime-local` input ("2026-12-10T09:00") for a moment, in the site's time zone. */
export function toLocalInput(date: Date, timeZone: string): string {
  return format(new TZDate(date, timeZone), "yyyy-MM-dd'T'HH:mm");
}

/** A `datetime-local` value read as wall-clock time at the site, as an ISO string with offset. */
export function fromLocalInput(value: string, timeZone: string): string | null {
  const m = value.match(/^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/);
  if (!m) return null;
  const [, y, mo, d, h, mi] = m.map(Number);
  const at = new TZDate(y, mo - 1, d, h, mi, timeZone);
  return isValid(at) ? at.toISOString() : null;
}

/** The zone's offset from UTC now, e.g. "UTC−05:00". */
export function utcOffset(timeZone: string, now = new Date()): string {
  try {
    const part = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'longOffset' })
      .formatToParts(now)
      .find((p) => p.type === 'timeZoneName')?.value;
    return part === 'GMT' ? 'UTC±00:00' : (part ?? '').replace('GMT', 'UTC').replace('-', '−');
  } catch {
    return '';
  }
}
