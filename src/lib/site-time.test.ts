import { describe, expect, it } from 'vitest';
import { formatSiteTime, formatSiteWindow, fromLocalInput, toLocalInput, utcOffset } from '@/lib/site-time';

// Offsets from the IANA time zone database: America/Chicago is UTC−6 in winter (CST) and
// UTC−5 in summer (CDT); America/Phoenix keeps UTC−7 all year (no daylight saving).
describe('site local time', () => {
  it('shows a moment in the site’s time zone with its abbreviation', () => {
    expect(formatSiteTime('2026-12-10T15:00:00Z', 'America/Chicago')).toBe('Thu 10 Dec, 09:00 CST');
    expect(formatSiteTime('2026-07-10T15:00:00Z', 'America/Chicago')).toBe('Fri 10 Jul, 10:00 CDT');
    expect(formatSiteTime('2026-07-10T15:00:00Z', 'America/Phoenix')).toBe('Fri 10 Jul, 08:00 MST');
    expect(formatSiteTime(null, 'America/Chicago')).toBe('—');
  });

  it('writes the time at the site now in the same format, and a dash for a zone it does not know', () => {
    expect(formatSiteTime(new Date('2026-12-10T15:00:00Z'), 'America/Chicago')).toBe('Thu 10 Dec, 09:00 CST');
    expect(formatSiteTime(new Date('2026-12-10T15:00:00Z'), 'Nowhere/Bogus')).toBe('—');
    expect(utcOffset('America/Chicago', new Date('2026-12-10T15:00:00Z'))).toBe('UTC−06:00');
    expect(utcOffset('Nowhere/Bogus')).toBe('');
  });

  it('reads a datetime-local value as the site’s wall-clock time, and back', () => {
    expect(fromLocalInput('2026-12-10T09:00', 'America/Chicago')).toBe('2026-12-10T09:00:00.000-06:00');
    expect(new Date(fromLocalInput('2026-12-10T09:00', 'America/Chicago')!).toISOString()).toBe('2026-12-10T15:00:00.000Z');
    expect(new Date(fromLocalInput('2026-07-10T09:00', 'America/Phoenix')!).toISOString()).toBe('2026-07-10T16:00:00.000Z');
    expect(toLocalInput(new Date('2026-12-10T15:00:00Z'), 'America/Chicago')).toBe('2026-12-10T09:00');
    expect(fromLocalInput('not a date', 'America/Chicago')).toBeNull();
  });
});

describe('a window of time at the site', () => {
  it('writes the window in the site’s zone, the zone named once', () => {
    // 15:00 UTC on 10 December 2026 is 09:00 in Chicago (CST, UTC−6, no daylight time in December).
    expect(formatSiteWindow('2026-12-10T15:00:00Z', '2026-12-10T17:30:00Z', 'America/Chicago')).toBe('Thu 10 Dec, 09:00–11:30 CST');
    expect(formatSiteWindow('2026-12-10T15:00:00Z', '2026-12-10T17:30:00Z', 'America/Chicago', { withDay: false })).toBe('09:00–11:30 CST');
  });

  it('names both days when the window runs over the site’s midnight', () => {
    // 05:00 UTC on 11 December is 23:00 on the 10th in Chicago.
    expect(formatSiteWindow('2026-12-11T03:00:00Z', '2026-12-11T07:00:00Z', 'America/Chicago')).toBe(
      'Thu 10 Dec, 21:00 – Fri 11 Dec, 01:00 CST',
    );
  });

  it('adds the year when asked (a list over several years)', () => {
    expect(formatSiteWindow('2026-12-10T15:00:00Z', '2026-12-10T17:30:00Z', 'America/Chicago', { withYear: true })).toBe(
      'Thu 10 Dec 2026, 09:00–11:30 CST',
    );
  });

  it('says nothing it cannot read', () => {
    expect(formatSiteWindow('not a date', '2026-12-10T17:30:00Z', 'America/Chicago')).toBe('—');
  });
});
