import { describe, expect, it } from 'vitest';
import type { VisitListItem } from '@shared/schemas/visits';
import {
  doubleBookings,
  movedToDate,
  replaceTechnician,
  siteDate,
  weekDays,
  weekStartOf,
  weekWindow,
} from '@/features/dispatch/utils/week';

// Offsets from the IANA time zone database: America/Chicago is UTC−6 in winter and UTC−5 in
// summer (daylight saving ends on the first Sunday of November, 1 Nov 2026); Pacific/Kiritimati
// is UTC+14 and Pacific/Pago_Pago UTC−11 all year.
describe('the dispatch week', () => {
  it('starts on Monday (ISO 8601 weeks), from any date of it, and falls back to this week', () => {
    expect(weekStartOf('2026-12-10')).toBe('2026-12-07');
    expect(weekStartOf('2026-12-07')).toBe('2026-12-07');
    expect(weekStartOf('2026-12-13')).toBe('2026-12-07');
    expect(weekStartOf('not-a-date', new Date(2026, 11, 5))).toBe('2026-11-30');
    expect(weekDays('2026-12-28')).toEqual([
      '2026-12-28',
      '2026-12-29',
      '2026-12-30',
      '2026-12-31',
      '2027-01-01',
      '2027-01-02',
      '2027-01-03',
    ]);
  });

  it('asks for a window that holds a visit starting on the week’s first or last date in any time zone', () => {
    const { from, to } = weekWindow('2026-12-07');
    const mondayAtKiritimati = Date.parse('2026-12-07T00:00:00+14:00');
    const sundayLateAtPagoPago = Date.parse('2026-12-13T23:30:00-11:00');
    expect(Date.parse(from)).toBeLessThanOrEqual(mondayAtKiritimati);
    expect(Date.parse(to)).toBeGreaterThan(sundayLateAtPagoPago);
    expect(siteDate('2026-12-07T00:00:00+14:00', 'Pacific/Kiritimati')).toBe('2026-12-07');
    // 02:00 UTC on Tuesday is still Monday evening in Chicago.
    expect(siteDate('2026-12-08T02:00:00Z', 'America/Chicago')).toBe('2026-12-07');
  });

  it('moves a visit to another date at the same time of day at the site, across the end of daylight saving', () => {
    const visit = {
      windowStart: '2026-10-30T09:00:00-05:00',
      windowEnd: '2026-10-30T11:30:00-05:00',
      site: { id: 's', name: 'Site', address: '', timeZone: 'America/Chicago' },
    };
    const moved = movedToDate(visit, '2026-11-03');
    expect(new Date(moved.windowStart).toISOString()).toBe('2026-11-03T15:00:00.000Z'); // 09:00 CST
    expect(new Date(moved.windowEnd).toISOString()).toBe('2026-11-03T17:30:00.000Z'); // 11:30 CST
    const back = movedToDate(visit, '2026-10-28');
    expect(new Date(back.windowStart).toISOString()).toBe('2026-10-28T14:00:00.000Z'); // 09:00 CDT
  });

  it('puts the technician of the row dropped on in the place of the one dragged from', () => {
    expect(replaceTechnician(['a', 'b'], 'a', 'c')).toEqual(['c', 'b']);
    expect(replaceTechnician(['a', 'b'], 'a', 'b')).toEqual(['b']);
    expect(replaceTechnician(['a'], 'a', 'a')).toEqual(['a']);
  });

  it('tells each double booking once, leaving cancelled visits out', () => {
    const base = {
      kind: 'ticket',
      startedAt: null,
      completedAt: null,
      client: { id: 'c', name: 'Client' },
      wall: null,
      ticket: null,
      sequence: 0,
      reportUrl: null,
    } as const;
    const tech = { id: 't', name: 'Jonah' };
    const a: VisitListItem = {
      ...base,
      id: 'a',
      status: 'planned',
      windowStart: '2026-12-08T15:00:00Z',
      windowEnd: '2026-12-08T17:00:00Z',
      site: { id: 's1', name: 'North', address: '', timeZone: 'UTC' },
      technicians: [tech],
      conflicts: [
        { visitId: 'b', technician: tech, windowStart: '2026-12-08T16:00:00Z', windowEnd: '2026-12-08T18:00:00Z', siteName: 'South' },
      ],
    };
    const b: VisitListItem = {
      ...a,
      id: 'b',
      windowStart: '2026-12-08T16:00:00Z',
      windowEnd: '2026-12-08T18:00:00Z',
      site: { id: 's2', name: 'South', address: '', timeZone: 'UTC' },
      conflicts: [{ visitId: 'a', technician: tech, windowStart: a.windowStart, windowEnd: a.windowEnd, siteName: 'North' }],
    };
    const found = doubleBookings([b, a]);
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ technician: 'Jonah', first: { visitId: 'a', siteName: 'North' }, second: { visitId: 'b' } });
    expect(doubleBookings([{ ...a, status: 'cancelled' }])).toEqual([]);
  });
});
