import { TZDate } from '@date-fns/tz';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

/** Dates for the demo, all relative to one "now" so the data always looks recent. */
export function createClock(now: Date) {
  const nowMs = now.getTime();

  /** The calendar date `dayOffset` days from today in `timeZone`. */
  const localDay = (timeZone: string, dayOffset: number) => {
    const t = new TZDate(nowMs + dayOffset * DAY, timeZone);
    return { year: t.getFullYear(), month: t.getMonth(), day: t.getDate(), weekday: t.getDay() };
  };

  /** A wall-clock time (`hour` may carry a fraction) on a day relative to today, in a time zone. */
  const at = (timeZone: string, dayOffset: number, hour: number) => {
    const { year, month, day } = localDay(timeZone, dayOffset);
    const whole = Math.floor(hour);
    return new Date(new TZDate(year, month, day, whole, Math.round((hour - whole) * 60), 0, timeZone).getTime());
  };

  /** The `n`-th weekday (Monday–Friday) after today in `timeZone`, as a day offset (n ≥ 1). */
  const businessDayOffset = (timeZone: string, n: number) => {
    let offset = 0;
    for (let found = 0; found < n;) {
      offset += 1;
      const { weekday } = localDay(timeZone, offset);
      if (weekday !== 0 && weekday !== 6) found += 1;
    }
    return offset;
  };

  /** Moves a day offset off the weekend (Saturday back to Friday, Sunday on to Monday). */
  const weekdayOffset = (timeZone: string, dayOffset: number) => {
    const { weekday } = localDay(timeZone, dayOffset);
    if (weekday === 6) return dayOffset - 1;
    if (weekday === 0) return dayOffset + 1;
    return dayOffset;
  };

  /** An ISO date (YYYY-MM-DD) `dayOffset` days from today in `timeZone`. */
  const isoDate = (dayOffset: number, timeZone = 'America/Chicago') => {
    const { year, month, day } = localDay(timeZone, dayOffset);
    return `${year}-${String(month + 1).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
  };

  /** The production-batch style code of a date: YYMM. */
  const yymm = (dayOffset: number) => isoDate(dayOffset).slice(2, 7).replace('-', '');

  const hoursFrom = (date: Date, hours: number) => new Date(date.getTime() + hours * HOUR);
  const hoursAgo = (hours: number) => new Date(nowMs - hours * HOUR);

  return { now, nowMs, at, businessDayOffset, weekdayOffset, isoDate, yymm, hoursFrom, hoursAgo, localDay };
}

export type Clock = ReturnType<typeof createClock>;
export { DAY, HOUR };
