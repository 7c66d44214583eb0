import type { BoardCounts } from '@shared/schemas/board';
import { useQuery } from '@tanstack/react-query';
import { Fragment } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { todaysVisits } from '@/features/board/components/visits-today';
import { errorMessage } from '@/lib/errors';
import { boardQueries } from '@/resources/board';

/** A piece of the board's sentence: plain words, or words that open the list they count. */
export type SentencePart = string | { text: string; to: string };

const plural = (n: number, one: string, many: string) => (n === 1 ? one : many);
const openTickets = (filters: Record<string, string>) => paths.tickets.getHref({ ...filters, open: 'true' });

/** "5 tickets are past their service clock and 1 is close to it, on 4 walls" (or the words for none). */
function clockClause(c: BoardCounts): SentencePart[] {
  const past = c.breached;
  const close = c.atRisk;
  const where = c.wallsPastOrClose > 0 ? `, on ${c.wallsPastOrClose} ${plural(c.wallsPastOrClose, 'wall', 'walls')}` : '';
  if (past === 0 && close === 0) {
    if (c.open === 0) return ['No ticket is open'];
    return [
      { text: `${c.open} open ${plural(c.open, 'ticket', 'tickets')}`, to: openTickets({}) },
      `, none past or close to ${plural(c.open, 'its', 'their')} service clock`,
    ];
  }
  const parts: SentencePart[] = [];
  if (past > 0) {
    parts.push({
      text: `${past} ${plural(past, 'ticket is', 'tickets are')} past ${plural(past, 'its', 'their')} service clock`,
      to: openTickets({ clock: 'breached' }),
    });
  }
  if (close > 0) {
    const text =
      past > 0
        ? `${close} ${plural(close, 'is', 'are')} close to it`
        : `${close} ${plural(close, 'ticket is', 'tickets are')} close to ${plural(close, 'its', 'their')} service clock`;
    if (past > 0) parts.push(' and ');
    parts.push({ text, to: openTickets({ clock: 'at_risk' }) });
  }
  parts.push(where);
  return parts;
}

/**
 * The board's counts as one sentence, each count a link to the list it counts: "5 tickets are past
 * their service clock and 1 is close to it, on 4 walls; 2 wait on the client; 3 visits today;
 * 2 new tickets wait for acknowledgement."
 */
export function boardSentence(c: BoardCounts, visitsToday: number | null): SentencePart[] {
  const parts: SentencePart[] = [...clockClause(c)];
  if (c.paused > 0) {
    parts.push('; ', { text: `${c.paused} ${plural(c.paused, 'waits', 'wait')} on the client`, to: openTickets({ clock: 'paused' }) });
  }
  if (visitsToday !== null) {
    parts.push(
      '; ',
      visitsToday === 0
        ? 'no visit today'
        : { text: `${visitsToday} ${plural(visitsToday, 'visit', 'visits')} today`, to: paths.dispatch.getHref() },
    );
  }
  parts.push(
    '; ',
    c.waiting === 0
      ? 'no new ticket waits for acknowledgement'
      : {
          text: `${c.waiting} new ${plural(c.waiting, 'ticket waits', 'tickets wait')} for acknowledgement`,
          to: paths.tickets.getHref({ status: 'new', sort: 'createdAt', dir: 'asc' }),
        },
    '.',
  );
  return parts;
}

/** The sentence under the greeting. Inline links in running text (WCAG 2.5.8 exempts them from the target size), spaced to tap. */
export function BoardSentence({ counts, visitsToday }: { counts: BoardCounts; visitsToday: number | null }) {
  return (
    <p className="max-w-prose text-md leading-8 text-stone-800" data-testid="board-sentence">
      {boardSentence(counts, visitsToday).map((p, i) =>
        typeof p === 'string' ? (
          <Fragment key={i}>{p}</Fragment>
        ) : (
          <Link key={i} to={p.to} className="link py-1.5">
            {p.text}
          </Link>
        ),
      )}
    </p>
  );
}

/** The sentence from the board's counts and today's visits; while they load, a line that says so. */
export function BoardSummary() {
  const board = useQuery(boardQueries.walls());
  const visits = useQuery(todaysVisits());
  if (board.data) return <BoardSentence counts={board.data.counts} visitsToday={visits.data ? visits.data.items.length : null} />;
  if (board.isError) return <p className="text-md text-stone-700">The counts could not be loaded: {errorMessage(board.error)}</p>;
  return <p className="text-md text-stone-600">Reading the board…</p>;
}
