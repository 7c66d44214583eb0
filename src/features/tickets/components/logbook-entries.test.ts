import type { TicketComment, TicketRepair, TicketVisit } from '@shared/schemas/tickets';
import { describe, expect, it } from 'vitest';
import { logbookEntries } from '@/features/tickets/components/logbook-entries';

const comment = (id: string, createdAt: string, visibility: 'public' | 'internal' = 'public'): TicketComment => ({
  id,
  body: id,
  visibility,
  author: { name: 'Priya', role: 'coordinator', staff: true },
  createdAt,
});
const visit = (id: string, windowStart: string, status: TicketVisit['status'] = 'planned'): TicketVisit => ({
  id,
  status,
  kind: 'repair' as TicketVisit['kind'],
  windowStart,
  windowEnd: windowStart,
});
const repair = { id: 'r1', performedAt: '2026-12-03T10:00:00Z' } as TicketRepair;

const ticket = {
  createdAt: '2026-12-01T09:00:00Z',
  acknowledgedAt: '2026-12-01T10:00:00Z',
  resolvedAt: null,
  closedAt: null,
  repairs: [repair],
  visits: [
    visit('v-done', '2026-12-03T08:00:00Z', 'completed'),
    visit('v-next', '2026-12-09T08:00:00Z'),
    visit('v-off', '2026-12-04T08:00:00Z', 'cancelled'),
  ],
};
const now = new Date('2026-12-05T12:00:00Z');

describe('the ticket logbook', () => {
  it('puts the report, messages, notes and what happened in one list, oldest first', () => {
    const { past } = logbookEntries(
      ticket,
      [comment('late', '2026-12-04T09:00:00Z'), comment('note', '2026-12-01T09:30:00Z', 'internal')],
      now,
    );
    expect(past.map((e) => e.id)).toEqual(['report', 'c-note', 'acknowledged', 'v-v-done', 'r-r1', 'c-late']);
  });

  it('keeps visits still to come after the log, and leaves cancelled visits out', () => {
    const { past, upcoming } = logbookEntries(ticket, [], now);
    expect(upcoming.map((v) => v.id)).toEqual(['v-next']);
    expect(past.some((e) => e.id === 'v-v-off' || e.id === 'v-v-next')).toBe(false);
  });

  it('logs a planned visit whose window has begun, and the resolution and closing', () => {
    const { past, upcoming } = logbookEntries(
      { ...ticket, resolvedAt: '2026-12-10T09:00:00Z', closedAt: '2026-12-11T09:00:00Z' },
      [],
      new Date('2026-12-12T00:00:00Z'),
    );
    expect(upcoming).toEqual([]);
    expect(past.map((e) => e.id).slice(-3)).toEqual(['v-v-next', 'resolved', 'closed']);
  });
});
