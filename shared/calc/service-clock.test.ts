import { describe, expect, it } from 'vitest';
import { businessMsBetween, clockMsBetween, clockState, dueAt, HOUR_MS, type BusinessCalendar } from './service-clock.js';

// Every expected time below is worked by hand from the published time-zone rules (IANA tz
// database): in the United States, daylight saving time in 2026 starts on Sunday 8 March at
// 02:00 (CST, UTC−6 → CDT, UTC−5) and ends on Sunday 1 November at 02:00 (CDT → CST).
// In the United Kingdom, 15–19 June 2026 is in BST (UTC+1).

const chicago = 'America/Chicago';
const weekdays: BusinessCalendar = { days: [1, 2, 3, 4, 5], start: '08:00', end: '18:00' };
const due = (start: string, hours: number, calendar = weekdays, timeZone = chicago) =>
  dueAt({ start: new Date(start), hours, mode: 'business', timeZone, calendar }).toISOString();

describe('dueAt, business hours', () => {
  it('runs across a weekend and the spring-forward change', () => {
    // Start Friday 6 March 2026, 16:00 CST (22:00Z); 4 business hours, Mon–Fri 08:00–18:00.
    // Friday 16:00–18:00 uses 2 h. Saturday and Sunday are closed (clocks go forward Sunday).
    // Monday 9 March opens 08:00 CDT = 13:00Z; 2 h more → 10:00 CDT = 15:00Z.
    // (Ignoring the change would give 16:00Z.)
    expect(due('2026-03-06T16:00:00-06:00', 4)).toBe('2026-03-09T15:00:00.000Z');
  });

  it('runs across a weekend and the fall-back change', () => {
    // Start Friday 30 October 2026, 17:00 CDT (22:00Z); 3 business hours.
    // Friday 17:00–18:00 uses 1 h. Clocks go back Sunday 1 November.
    // Monday 2 November opens 08:00 CST = 14:00Z; 2 h more → 10:00 CST = 16:00Z.
    expect(due('2026-10-30T17:00:00-05:00', 3)).toBe('2026-11-02T16:00:00.000Z');
  });

  it('reads a start given in another offset as the same instant', () => {
    // 2026-03-06T23:00+01:00 is 22:00Z, the same instant as the first example.
    expect(due('2026-03-06T23:00:00+01:00', 4)).toBe('2026-03-09T15:00:00.000Z');
  });

  it('waits for the opening when the clock starts early', () => {
    // Tuesday 10 March 2026, 06:30 CDT: the day opens 08:00 CDT (13:00Z); 1 h → 09:00 CDT = 14:00Z.
    expect(due('2026-03-10T06:30:00-05:00', 1)).toBe('2026-03-10T14:00:00.000Z');
  });

  it('lands on a closing time without rolling to the next day', () => {
    // Thursday 12 March 2026, 19:00 CDT (after hours). Friday 08:00–18:00 is exactly 10 h:
    // due Friday 13 March 18:00 CDT = 23:00Z, not Monday 08:00.
    expect(due('2026-03-12T19:00:00-05:00', 10)).toBe('2026-03-13T23:00:00.000Z');
    // Monday 9 March 08:00 CDT + 50 h = five full days of 10 h → Friday 13 March 18:00 CDT.
    expect(due('2026-03-09T08:00:00-05:00', 50)).toBe('2026-03-13T23:00:00.000Z');
  });

  it('starts on a weekend at Monday’s opening', () => {
    // Saturday 7 March 2026, 11:00 CST; 0.5 h from Monday 9 March 08:00 CDT → 08:30 CDT = 13:30Z.
    expect(due('2026-03-07T11:00:00-06:00', 0.5)).toBe('2026-03-09T13:30:00.000Z');
  });

  it('follows a calendar that starts mid-week (Wednesday to Sunday, 10:00–22:00, Europe/London)', () => {
    // Start Monday 15 June 2026, 09:00 BST. Monday and Tuesday are closed.
    // Wednesday 17 June 10:00–22:00 = 12 h, Thursday 18 June = 12 h (24 h used), Friday 19 June
    // 10:00 + 6 h = 16:00 BST = 15:00Z.
    const venue: BusinessCalendar = { days: [3, 4, 5, 6, 7], start: '10:00', end: '22:00' };
    expect(due('2026-06-15T09:00:00+01:00', 30, venue, 'Europe/London')).toBe('2026-06-19T15:00:00.000Z');
  });

  it('counts a 23-hour spring-forward Sunday as 23 hours on an every-day, all-day calendar', () => {
    // Start Saturday 7 March 2026, 12:00 CST (18:00Z); 24 h on a 00:00–24:00 every-day calendar.
    // Saturday 12:00–24:00 = 12 h; Sunday 8 March 00:00 CST + 12 h elapsed = 13:00 CDT = 18:00Z,
    // the same instant as 24 elapsed hours round the clock.
    const always: BusinessCalendar = { days: [1, 2, 3, 4, 5, 6, 7], start: '00:00', end: '24:00' };
    expect(due('2026-03-07T12:00:00-06:00', 24, always)).toBe('2026-03-08T18:00:00.000Z');
  });
});

describe('dueAt, round the clock', () => {
  it('adds elapsed hours, whatever the local clock does', () => {
    // Saturday 7 March 2026, 12:00 CST (18:00Z) + 24 h = Sunday 18:00Z, which reads 13:00 CDT.
    const at = dueAt({
      start: new Date('2026-03-07T12:00:00-06:00'),
      hours: 24,
      mode: 'round_the_clock',
      timeZone: chicago,
      calendar: weekdays,
    });
    expect(at.toISOString()).toBe('2026-03-08T18:00:00.000Z');
  });
});

describe('businessMsBetween', () => {
  it('counts only business hours: Friday 17:00 CST → Monday 09:00 CDT is 2 h', () => {
    // Friday 6 March 17:00–18:00 (1 h) + Monday 9 March 08:00–09:00 (1 h).
    const ms = businessMsBetween(new Date('2026-03-06T17:00:00-06:00'), new Date('2026-03-09T09:00:00-05:00'), chicago, weekdays);
    expect(ms).toBe(2 * HOUR_MS);
  });

  it('counts a full business week as 50 h across the spring-forward weekend', () => {
    // Monday 2 March 00:00 CST → Monday 9 March 00:00 CDT: five days of 10 h.
    const ms = businessMsBetween(new Date('2026-03-02T00:00:00-06:00'), new Date('2026-03-09T00:00:00-05:00'), chicago, weekdays);
    expect(ms).toBe(50 * HOUR_MS);
  });

  it('is negative when the end is before the start, and zero on a closed day', () => {
    const a = new Date('2026-03-10T09:00:00-05:00');
    const b = new Date('2026-03-10T11:30:00-05:00');
    expect(businessMsBetween(a, b, chicago, weekdays)).toBe(2.5 * HOUR_MS);
    expect(businessMsBetween(b, a, chicago, weekdays)).toBe(-2.5 * HOUR_MS);
    expect(businessMsBetween(new Date('2026-03-07T09:00:00-06:00'), new Date('2026-03-07T17:00:00-06:00'), chicago, weekdays)).toBe(0);
  });

  it('lets a paused clock resume: the paused business hours move the due time', () => {
    // A ticket opened Friday 6 March 16:00 CST with 8 business hours is due Monday 9 March
    // 14:00 CDT (Friday 2 h + Monday 08:00–14:00). Paused at Friday 17:00 CST after 1 h, resumed
    // Monday 11:00 CDT: 7 h are left → Monday 11:00 + 7 h = 18:00 CDT = 23:00Z. The pause
    // covered 4 business hours (Friday 17–18, Monday 08–11), so 14:00 + 4 h = 18:00 agrees.
    const opened = new Date('2026-03-06T16:00:00-06:00');
    const start = { hours: 8, mode: 'business' as const, timeZone: chicago, calendar: weekdays };
    expect(dueAt({ ...start, start: opened }).toISOString()).toBe('2026-03-09T19:00:00.000Z');
    const used = businessMsBetween(opened, new Date('2026-03-06T17:00:00-06:00'), chicago, weekdays);
    const resumed = dueAt({ ...start, start: new Date('2026-03-09T11:00:00-05:00'), hours: 8 - used / HOUR_MS });
    expect(resumed.toISOString()).toBe('2026-03-09T23:00:00.000Z');
  });

  it('round the clock, counts elapsed time', () => {
    const a = new Date('2026-03-07T12:00:00-06:00');
    const b = new Date('2026-03-08T18:00:00Z');
    expect(clockMsBetween(a, b, 'round_the_clock', chicago, weekdays)).toBe(24 * HOUR_MS);
    expect(clockMsBetween(a, b, 'business', chicago, weekdays)).toBe(0);
  });

  it('refuses a calendar whose day does not close after it opens', () => {
    const a = new Date('2026-03-07T12:00:00Z');
    expect(() => businessMsBetween(a, new Date('2026-03-09T12:00:00Z'), chicago, { days: [1], start: '18:00', end: '08:00' })).toThrow(
      RangeError,
    );
    expect(() => businessMsBetween(a, new Date('2026-03-09T12:00:00Z'), chicago, { days: [], start: '08:00', end: '18:00' })).toThrow(
      RangeError,
    );
  });
});

describe('clockState', () => {
  // 10 hours allowed, 08:00 → 18:00 UTC; "at risk" under 25 % left = under 2.5 h (product choice).
  const started = new Date('2026-03-10T08:00:00Z');
  const dueTime = new Date('2026-03-10T18:00:00Z');
  const at = (hhmm: string) => new Date(`2026-03-10T${hhmm}Z`);

  it('is on track with 25 % or more left', () => {
    expect(clockState(at('09:00:00'), dueTime, started)).toBe('on_track');
    expect(clockState(at('15:30:00'), dueTime, started)).toBe('on_track'); // exactly 25 % left
  });

  it('is at risk with less than 25 % left, up to and including the due time', () => {
    expect(clockState(at('15:30:01'), dueTime, started)).toBe('at_risk');
    expect(clockState(at('18:00:00'), dueTime, started)).toBe('at_risk');
  });

  it('is breached after the due time', () => {
    expect(clockState(at('18:00:01'), dueTime, started)).toBe('breached');
  });

  it('can measure in business time, so a weekend does not count against the office', () => {
    // Opened Friday 6 March 16:00 CST with 8 business hours: due Monday 9 March 14:00 CDT.
    // Monday 09:00 CDT: 5 of 8 business hours left (62.5 %) → on track; by elapsed time only
    // 5 of 69 hours are left (7 %) → at risk.
    const opened = new Date('2026-03-06T16:00:00-06:00');
    const ticketDue = new Date('2026-03-09T14:00:00-05:00');
    const now = new Date('2026-03-09T09:00:00-05:00');
    expect(clockState(now, ticketDue, opened, (a, b) => businessMsBetween(a, b, chicago, weekdays))).toBe('on_track');
    expect(clockState(now, ticketDue, opened)).toBe('at_risk');
  });
});
