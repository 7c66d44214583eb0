import { describe, expect, it } from 'vitest';
import { windowAt } from '@/features/dispatch/components/visit-form';

// Offsets from the IANA time zone database: America/Chicago is UTC−6 in December (CST).
describe('the window the dispatch form sends', () => {
  it('is the day and the two times at the site', () => {
    const w = windowAt({ date: '2026-12-10', windowStart: '09:00', windowEnd: '11:30' }, 'America/Chicago');
    expect(new Date(w.windowStart).toISOString()).toBe('2026-12-10T15:00:00.000Z');
    expect(new Date(w.windowEnd).toISOString()).toBe('2026-12-10T17:30:00.000Z');
  });

  it('ends on the next day when the end is before the start (an overnight visit)', () => {
    const w = windowAt({ date: '2026-12-10', windowStart: '22:00', windowEnd: '02:00' }, 'America/Chicago');
    expect(new Date(w.windowStart).toISOString()).toBe('2026-12-11T04:00:00.000Z');
    expect(new Date(w.windowEnd).toISOString()).toBe('2026-12-11T08:00:00.000Z');
  });

  it('leaves equal times alone, for the contract to refuse', () => {
    const w = windowAt({ date: '2026-12-10', windowStart: '09:00', windowEnd: '09:00' }, 'America/Chicago');
    expect(w.windowEnd).toBe(w.windowStart);
  });
});
