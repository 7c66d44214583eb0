import type { BoardCounts } from '@shared/schemas/board';
import { describe, expect, it } from 'vitest';
import { boardSentence, type SentencePart } from '@/features/board/components/board-sentence';

const counts = (c: Partial<BoardCounts> = {}): BoardCounts => ({
  open: 14,
  breached: 5,
  atRisk: 1,
  paused: 2,
  onTrack: 6,
  waiting: 3,
  wallsPastOrClose: 4,
  ...c,
});
const words = (parts: SentencePart[]) => parts.map((p) => (typeof p === 'string' ? p : p.text)).join('');
const links = (parts: SentencePart[]) => parts.filter((p): p is { text: string; to: string } => typeof p !== 'string');

describe('the board’s sentence', () => {
  it('carries every count in words', () => {
    expect(words(boardSentence(counts(), 3))).toBe(
      '5 tickets are past their service clock and 1 is close to it, on 4 walls; 2 wait on the client; 3 visits today; 3 new tickets wait for acknowledgement.',
    );
  });

  it('links each count to the list it counts: open tickets by clock, new tickets oldest first, the dispatch week', () => {
    expect(links(boardSentence(counts(), 3)).map((l) => l.to)).toEqual([
      '/tickets?clock=breached&open=true',
      '/tickets?clock=at_risk&open=true',
      '/tickets?clock=paused&open=true',
      '/dispatch',
      '/tickets?status=new&sort=createdAt&dir=asc',
    ]);
  });

  it('speaks of one in the singular', () => {
    expect(words(boardSentence(counts({ breached: 1, atRisk: 0, paused: 1, waiting: 1, wallsPastOrClose: 1 }), 1))).toBe(
      '1 ticket is past its service clock, on 1 wall; 1 waits on the client; 1 visit today; 1 new ticket waits for acknowledgement.',
    );
    expect(words(boardSentence(counts({ breached: 0, atRisk: 2, paused: 0, wallsPastOrClose: 2 }), 0))).toBe(
      '2 tickets are close to their service clock, on 2 walls; no visit today; 3 new tickets wait for acknowledgement.',
    );
  });

  it('says when nothing is late, and when nothing is open, without links to empty lists', () => {
    const calm = boardSentence(counts({ breached: 0, atRisk: 0, paused: 0, wallsPastOrClose: 0, waiting: 0 }), 0);
    expect(words(calm)).toBe(
      '14 open tickets, none past or close to their service clock; no visit today; no new ticket waits for acknowledgement.',
    );
    expect(links(calm).map((l) => l.to)).toEqual(['/tickets?open=true']);
    const empty = boardSentence(counts({ open: 0, breached: 0, atRisk: 0, paused: 0, onTrack: 0, waiting: 0, wallsPastOrClose: 0 }), 2);
    expect(words(empty)).toBe('No ticket is open; 2 visits today; no new ticket waits for acknowledgement.');
  });

  it('leaves out the visits while they are not known', () => {
    expect(words(boardSentence(counts(), null))).not.toContain('today');
  });
});
