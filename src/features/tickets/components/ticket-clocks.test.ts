import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { stateLineParts } from '@/features/tickets/components/ticket-clocks';

// Worked by hand: 2026-12-05 13:28 UTC; resolution due 2026-12-09 17:28 UTC, which is
// Wed 9 Dec 11:28 in Chicago (CST, UTC−6).
const base = {
  status: 'new' as const,
  priority: 'normal' as const,
  clocks: { response: 'breached' as const, resolution: 'on_track' as const },
  responseDueAt: '2026-12-05T09:28:00Z',
  resolutionDueAt: '2026-12-09T17:28:00Z',
  resolvedAt: null,
  siteTimeZone: 'America/Chicago',
  mergedInto: null,
};

describe('the ticket state line', () => {
  beforeEach(() => {
    vi.useFakeTimers();
    vi.setSystemTime(new Date('2026-12-05T13:28:00Z'));
  });
  afterEach(() => vi.useRealTimers());

  it('says the state, the priority and both clocks in words', () => {
    const parts = stateLineParts(base, false);
    expect(parts.map((p) => p.text)).toEqual(['New', 'normal priority', 'first response was due 4 hours ago', 'resolution due Wed 9 Dec']);
    expect(parts[2].tone).toBe('breached');
    expect(parts[3].title).toBe('Resolution target: Wed 9 Dec, 11:28 CST');
  });

  it('words the status for the client, and drops a first response answered in time', () => {
    const parts = stateLineParts({ ...base, status: 'waiting_client', clocks: { response: 'met', resolution: 'paused' } }, true);
    expect(parts.map((p) => p.text)).toEqual(['Waiting for you', 'normal priority', 'resolution clock paused while the client is asked']);
  });

  it('says when a resolved ticket was resolved, against its target', () => {
    const parts = stateLineParts(
      { ...base, status: 'resolved', clocks: { response: 'met', resolution: 'missed' }, resolvedAt: '2026-12-10T15:00:00Z' },
      false,
    );
    expect(parts.at(-1)?.text).toBe('resolved Thu 10 Dec, after the target');
  });
});
