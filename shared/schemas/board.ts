// The office's Today board (`GET /api/board/walls`): the walls with open tickets, worst first,
// each with its open tickets and the next visit booked for it; the open tickets on no wall; and
// the counts the board's sentence is written from. One answer, so the words and the walls agree.
// Responses only: the endpoint takes no input.
import type { TicketPriority, TicketScope, TicketStatus, VisitStatus } from './enums.js';
import type { Position } from './cabinets.js';
import type { NamedRef, TicketClockState } from './tickets.js';

/** Which service-plan due time a ticket's clock runs to now. */
export type BoardDueKind = 'response' | 'resolution';

/** One open ticket as the board shows it. */
export interface BoardTicket {
  id: string;
  /** The ticket's reference (ticketRef). */
  ref: string;
  title: string;
  status: TicketStatus;
  priority: TicketPriority;
  scope: TicketScope;
  /** The worse of the response and resolution clocks; null without a service-plan target. */
  clockState: TicketClockState | null;
  /** The response due time while the ticket waits for acknowledgement, else the resolution due time. */
  dueAt: string | null;
  dueKind: BoardDueKind | null;
  assignee: NamedRef | null;
  /** The cabinets the ticket names on its wall (column and row from 1, top-left from the audience). */
  cells: Position[];
  createdAt: string;
}

/** An open ticket that names no wall (a quote request, a site-wide question). */
export interface BoardLooseTicket extends BoardTicket {
  client: NamedRef;
  site: NamedRef;
}

/** The next visit booked for a wall: planned or under way, not yet over. */
export interface BoardVisit {
  id: string;
  status: VisitStatus;
  windowStart: string;
  windowEnd: string;
  /** The ticket the visit is for, when it is a ticket visit. */
  ticketId: string | null;
  technicians: NamedRef[];
}

/** A wall with at least one open ticket. */
export interface BoardWall {
  id: string;
  name: string;
  columns: number;
  rows: number;
  client: NamedRef;
  /** The site, with its IANA time zone: visit times are written in the site's local time. */
  site: NamedRef & { timeZone: string };
  /** The worst clock among the wall's open tickets. */
  clockState: TicketClockState | null;
  /** Worst clock first, then the soonest due. */
  tickets: BoardTicket[];
  nextVisit: BoardVisit | null;
}

/** Open tickets counted for the board's sentence (every open ticket, on a wall or not). */
export interface BoardCounts {
  open: number;
  breached: number;
  atRisk: number;
  paused: number;
  onTrack: number;
  /** New tickets nobody has acknowledged yet. */
  waiting: number;
  /** Walls with at least one ticket past or close to its due time. */
  wallsPastOrClose: number;
}

/** `GET /api/board/walls`. */
export interface BoardWalls {
  /** Worst first: breached before at risk before paused before on track, then the soonest due. */
  walls: BoardWall[];
  /** Open tickets on no wall, in the same order. */
  notOnWall: BoardLooseTicket[];
  counts: BoardCounts;
}
