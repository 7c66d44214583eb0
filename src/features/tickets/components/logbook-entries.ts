// The ticket's logbook as one time-ordered list: the report, the comments, and what the ticket
// record already says happened (acknowledged, repairs logged, visits at the site, resolved,
// closed). Oldest first, so the newest sits next to the composer.
import type { TicketComment, TicketDetail, TicketRepair, TicketVisit } from '@shared/schemas/tickets';

export type LogEntry =
  | { kind: 'report'; at: string; id: string }
  | { kind: 'comment'; at: string; id: string; comment: TicketComment }
  | { kind: 'repair'; at: string; id: string; repair: TicketRepair }
  | { kind: 'visit'; at: string; id: string; visit: TicketVisit }
  | { kind: 'status'; at: string; id: string; what: 'acknowledged' | 'resolved' | 'closed' };

type LogTicket = Pick<TicketDetail, 'createdAt' | 'acknowledgedAt' | 'resolvedAt' | 'closedAt' | 'repairs' | 'visits'>;

/**
 * The entries up to `now`, oldest first, and the visits still to come (booked, not begun), which
 * the logbook shows after its last entry. A cancelled visit is left out: it never happened.
 */
export function logbookEntries(ticket: LogTicket, comments: TicketComment[], now: Date = new Date()) {
  const past: LogEntry[] = [{ kind: 'report', at: ticket.createdAt, id: 'report' }];
  const upcoming: TicketVisit[] = [];
  for (const c of comments) past.push({ kind: 'comment', at: c.createdAt, id: `c-${c.id}`, comment: c });
  for (const r of ticket.repairs) past.push({ kind: 'repair', at: r.performedAt, id: `r-${r.id}`, repair: r });
  for (const v of ticket.visits) {
    if (v.status === 'cancelled') continue;
    if (v.status === 'planned' && Date.parse(v.windowStart) > now.getTime()) upcoming.push(v);
    else past.push({ kind: 'visit', at: v.windowStart, id: `v-${v.id}`, visit: v });
  }
  if (ticket.acknowledgedAt) past.push({ kind: 'status', at: ticket.acknowledgedAt, id: 'acknowledged', what: 'acknowledged' });
  if (ticket.resolvedAt) past.push({ kind: 'status', at: ticket.resolvedAt, id: 'resolved', what: 'resolved' });
  if (ticket.closedAt) past.push({ kind: 'status', at: ticket.closedAt, id: 'closed', what: 'closed' });
  // A stable sort: entries of the same moment keep the order above (the report before all).
  past.sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  upcoming.sort((a, b) => Date.parse(a.windowStart) - Date.parse(b.windowStart));
  return { past, upcoming };
}
