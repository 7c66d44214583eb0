import { z } from 'zod';
import { pageQuery, requiredText, text } from './common.js';
import {
  commentVisibilities,
  ticketPriorities,
  ticketScopes,
  ticketStatuses,
  type CommentVisibility,
  type RemovedPartFate,
  type RepairAction,
  type RepairComponent,
  type RepairFault,
  type Role,
  type TicketPriority,
  type TicketScope,
  type TicketStatus,
  type VisitKind,
  type VisitStatus,
} from './enums.js';
import { position, type Position } from './cabinets.js';

export const ticketClockStates = ['on_track', 'at_risk', 'breached', 'paused', 'met', 'missed'] as const;
export type TicketClockState = (typeof ticketClockStates)[number];
/** The states the clock of an open ticket can be in (met and missed are for resolved ones). */
export const openClockStates = ['on_track', 'at_risk', 'breached', 'paused'] as const satisfies readonly TicketClockState[];
export type OpenClockState = (typeof openClockStates)[number];

/** Plain-language guidance a client reads when choosing how bad it is. */
export const priorityGuidance: Record<TicketPriority, { label: string; help: string }> = {
  critical: { label: 'Critical', help: 'The wall is dark or cannot be used, and you need it for an event or service.' },
  high: { label: 'High', help: 'A fault people can see in the main viewing area: a dark cabinet, a flickering block, wrong colours.' },
  normal: { label: 'Normal', help: 'A minor fault: a few dead pixels, a module slightly off in colour, a fault at the edge.' },
  low: { label: 'Low', help: 'Cosmetic, a question, or something to look at on the next visit.' },
};

export const statusLabels: Record<TicketStatus, string> = {
  new: 'New',
  acknowledged: 'Acknowledged',
  scheduled: 'Scheduled',
  in_progress: 'In progress',
  waiting_parts: 'Waiting for parts',
  waiting_client: 'Waiting for you',
  resolved: 'Resolved',
  closed: 'Closed',
};

export const openStatuses: TicketStatus[] = ['new', 'acknowledged', 'scheduled', 'in_progress', 'waiting_parts', 'waiting_client'];

/**
 * Where a ticket may go next. Open tickets move freely among the working statuses (never back
 * to `new`); a resolved ticket is closed or reopened; a closed ticket is final.
 */
export function allowedNextStatuses(from: TicketStatus): TicketStatus[] {
  if (from === 'closed') return [];
  if (from === 'resolved') return ['closed', 'in_progress'];
  return [...openStatuses.filter((s) => s !== 'new' && s !== from), 'resolved'];
}

export const createTicketInput = z
  .object({
    siteId: z.uuid(),
    wallId: z.uuid().nullable().optional(),
    scope: z.enum(ticketScopes).optional(),
    cells: z.array(position).max(2000).optional(),
    title: requiredText(160),
    description: text(10_000).optional(),
    priority: z.enum(ticketPriorities),
  })
  .refine((t) => !(t.cells?.length && !t.wallId), { path: ['cells'], message: 'Pick the wall the cells are on.' })
  .refine((t) => !((t.scope === 'cells' || t.scope === 'whole_wall' || t.scope === 'controller') && !t.wallId), {
    path: ['wallId'],
    message: 'Pick the wall.',
  });
export type CreateTicketInput = z.infer<typeof createTicketInput>;

export const scheduleInput = z
  .object({
    start: z.iso.datetime({ offset: true }),
    end: z.iso.datetime({ offset: true }),
    technicianIds: z.array(z.uuid()).max(10).default([]),
  })
  .refine((s) => new Date(s.end) > new Date(s.start), { path: ['end'], message: 'The visit must end after it starts.' });

export const updateTicketInput = z.object({
  status: z.enum(ticketStatuses).optional(),
  priority: z.enum(ticketPriorities).optional(),
  assigneeId: z.uuid().nullable().optional(),
  title: requiredText(160).optional(),
  description: text(10_000).optional(),
  /** With status `scheduled`: plan the visit and send the client an invitation. */
  schedule: scheduleInput.optional(),
});
export type UpdateTicketInput = z.infer<typeof updateTicketInput>;

export const mergeTicketInput = z.object({ intoTicketId: z.uuid() });

export const commentInput = z.object({
  body: requiredText(10_000),
  visibility: z.enum(commentVisibilities).default('public'),
});
export type CommentInput = z.infer<typeof commentInput>;

const csv = <T extends readonly [string, ...string[]]>(values: T) =>
  z
    .string()
    .optional()
    .transform((s) => (s ? s.split(',').filter(Boolean) : undefined))
    .pipe(z.array(z.enum(values)).optional());

export const listTicketsQuery = pageQuery.extend({
  status: csv(ticketStatuses),
  priority: csv(ticketPriorities),
  clock: csv(ticketClockStates),
  open: z.enum(['true', 'false']).optional(),
  clientId: z.uuid().optional(),
  siteId: z.uuid().optional(),
  wallId: z.uuid().optional(),
  assigneeId: z.union([z.uuid(), z.literal('none'), z.literal('me')]).optional(),
  q: z.string().trim().max(100).optional(),
  sort: z.enum(['createdAt', 'resolutionDueAt', 'updatedAt']).default('createdAt'),
  dir: z.enum(['asc', 'desc']).default('desc'),
});
export type ListTicketsQuery = z.infer<typeof listTicketsQuery>;

export const savedViewInput = z.object({
  name: requiredText(60),
  filters: z.record(z.string(), z.string().max(500)),
});
export type SavedViewInput = z.infer<typeof savedViewInput>;

/**
 * The ticket's reference, `1042/26`: its number, a slash and the two-digit year it was opened
 * (UTC), said "ten forty-two of twenty-six". The number alone is unique (the `tickets.number`
 * serial); the year is there for people, who see at a glance how old a case is. Search finds a
 * ticket by the number in it (`ticketNumberIn` in search.ts). docs/look.md, "The ticket reference".
 */
export function ticketRef(number: number, openedAt: Date | string): string {
  const year = new Date(openedAt).getUTCFullYear();
  if (!Number.isInteger(number) || number < 1 || !Number.isFinite(year)) {
    throw new RangeError(`No ticket reference for number ${number} opened at ${String(openedAt)}.`);
  }
  return `${number}/${String(year % 100).padStart(2, '0')}`;
}

// ---- responses (server/services/tickets.ts presenters) ----

/** A record named in a ticket row: its client, site, wall or assignee. */
export interface NamedRef {
  id: string;
  name: string;
}

/** One row of the tickets list (`GET /api/tickets`). */
export interface TicketListItem {
  id: string;
  number: number;
  /** `1042/26` (ticketRef). */
  ref: string;
  title: string;
  status: TicketStatus;
  priority: TicketPriority;
  scope: TicketScope;
  cellCount: number;
  client: NamedRef;
  site: NamedRef;
  wall: NamedRef | null;
  assignee: NamedRef | null;
  reporterName: string | null;
  responseDueAt: string | null;
  resolutionDueAt: string | null;
  /** The worse of the response and resolution clocks. */
  clockState: TicketClockState | null;
  createdAt: string;
  updatedAt: string;
}

export interface TicketVisit {
  id: string;
  status: VisitStatus;
  kind: VisitKind;
  windowStart: string;
  windowEnd: string;
}

/** One line of work done for the ticket. `notes`, `part` and `removedPartFate` come to staff only. */
export interface TicketRepair {
  id: string;
  column: number;
  row: number;
  /** `C{col}·R{row}`. */
  position: string;
  module: Position | null;
  component: RepairComponent;
  fault: RepairFault;
  action: RepairAction;
  cabinetSerial: string | null;
  technicianName: string | null;
  performedAt: string;
  notes?: string;
  part?: { name: string; batch: string | null } | null;
  removedPartFate?: RemovedPartFate;
}

/** A ticket with its text, cells, clocks, visits and repairs (`GET /api/tickets/:id`). */
export interface TicketDetail extends TicketListItem {
  description: string;
  /** The site's IANA time zone: due times and visit windows are shown in the site's local time. */
  siteTimeZone: string;
  cells: Position[];
  cellLabels: string[];
  wall: (NamedRef & { columns: number; rows: number }) | null;
  mergedInto: { id: string; ref: string } | null;
  acknowledgedAt: string | null;
  resolvedAt: string | null;
  closedAt: string | null;
  pausedAt: string | null;
  clocks: { response: TicketClockState | null; resolution: TicketClockState | null };
  /** Oldest window first. */
  visits: TicketVisit[];
  /** Oldest first. */
  repairs: TicketRepair[];
  /** Where the caller may move the ticket next. */
  nextStatuses: TicketStatus[];
}

/** A comment of the conversation; client users get only the public ones. */
export interface TicketComment {
  id: string;
  body: string;
  visibility: CommentVisibility;
  /** "Former user" with a null role when the author's account is gone. */
  author: { name: string; role: Role | null; staff: boolean };
  createdAt: string;
}

/** A person's named list filters (`GET /api/ticket-views`): the address's parameters as strings. */
export interface SavedTicketView {
  id: string;
  name: string;
  filters: Record<string, string>;
}

/**
 * Open tickets counted by clock state (`GET /api/tickets/clock-counts`), every state present
 * (0 when no ticket is in it); `none` counts open tickets without a due time.
 */
export type TicketClockCounts = Record<TicketClockState | 'none', number>;
