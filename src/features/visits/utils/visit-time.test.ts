import { describe, expect, it } from 'vitest';
import { dayRanges, visitWindowText } from '@/features/visits/utils/visit-time';

describe('visit window', () => {
  it('writes the window in the site’s zone, the zone named once', () => {
    // 15:00 UTC on 10 December 2026 is 09:00 in Chicago (CST, UTC−6, no daylight time in December).
    expect(visitWindowText('2026-12-10T15:00:00Z', '2026-12-10T17:30:00Z', 'America/Chicago')).toBe('Thu 10 Dec, 09:00–11:30 CST');
    expect(visitWindowText('2026-12-10T15:00:00Z', '2026-12-10T17:30:00Z', 'America/Chicago', { withDay: false })).toBe('09:00–11:30 CST');
  });

  it('names both days when the window runs over the site’s midnight', () => {
    // 05:00 UTC on 11 December is 23:00 on the 10th in Chicago.
    expect(visitWindowText('2026-12-11T03:00:00Z', '2026-12-11T07:00:00Z', 'America/Chicago')).toBe(
      'Thu 10 Dec, 21:00 – Fri 11 Dec, 01:00 CST',
    );
  });

  it('says nothing it cannot read', () => {
    expect(visitWindowText('not a date', '2026-12-10T17:30:00Z', 'America/Chicago')).toBe('—');
  });
});

describe('day ranges', () => {
  it('today runs from the viewer’s midnight to the next; the coming days follow on, the earlier weeks lead up to it', () => {
    const now = new Date(2026, 11, 10, 14, 30);
    const { earlier, today, upcoming } = dayRanges(now, 14, 30);
    expect(new Date(today.from)).toEqual(new Date(2026, 11, 10));
    expect(new Date(today.to)).toEqual(new Date(2026, 11, 11));
    expect(upcoming.from).toBe(today.to);
    expect(new Date(upcoming.to)).toEqual(new Date(2026, 11, 25));
    expect(new Date(earlier.from)).toEqual(new Date(2026, 10, 10));
    expect(earlier.to).toBe(today.from);
  });
});
