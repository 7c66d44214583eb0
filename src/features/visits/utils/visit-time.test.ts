import { describe, expect, it } from 'vitest';
import { dayRanges } from '@/features/visits/utils/visit-time';

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
