// The visits resource: a technician's trip to a site, for a ticket or for planned maintenance.
// Request schemas (dispatch, the technician's phone and the server alike), the list query and the
// responses. Client users get their own visits without internal notes.
import { z } from 'zod';
import { pageQuery, requiredText, text } from './common.js';
import { visitKinds, visitStatuses, type VisitKind, type VisitStatus } from './enums.js';
import type { RepairItem } from './repairs.js';
import type { Attachment } from './attachments.js';

const instant = (what: string) => z.iso.datetime({ offset: true, error: `${what}: use a date and time with its offset.` });

export const checklistItem = z.object({
  label: requiredText(200),
  done: z.boolean(),
  note: text(500).optional(),
});
export type ChecklistItem = z.infer<typeof checklistItem>;
const checklist = z.array(checklistItem).max(60, 'At most 60 checklist items.');

/** The checklist a ticket visit starts with when dispatch gives none. Common practice, from memory. */
export const defaultTicketChecklist = [
  'Isolate the wall’s supply before opening a cabinet (lock out, tag out)',
  'Faults reported on the ticket checked',
  'Whole wall shown on a test pattern after the work',
  'Client shown the result',
] as const;

const technicianIds = z
  .array(z.uuid('Choose technicians from the team.'))
  .min(1, 'Assign at least one technician.')
  .max(10, 'At most 10 technicians on one visit.');

const windowOrder = (v: { windowStart?: string; windowEnd?: string }) =>
  !v.windowStart || !v.windowEnd || new Date(v.windowEnd) > new Date(v.windowStart);
const windowOrderError = { path: ['windowEnd'], message: 'The visit must end after it starts.' };

export const createVisitInput = z
  .object({
    kind: z.enum(visitKinds, { error: 'Choose a ticket visit or planned maintenance.' }),
    /** A ticket visit names its ticket; the site and wall come from it. */
    ticketId: z.uuid().optional(),
    /** Planned maintenance names the wall; the site comes from it. */
    wallId: z.uuid().optional(),
    windowStart: instant('Start'),
    windowEnd: instant('End'),
    technicianIds,
    checklist: checklist.optional(),
    internalNotes: text(5000).optional(),
  })
  .refine(windowOrder, windowOrderError)
  .refine((v) => v.kind !== 'ticket' || Boolean(v.ticketId), { path: ['ticketId'], message: 'Choose the ticket.' })
  .refine((v) => v.kind !== 'maintenance' || Boolean(v.wallId), { path: ['wallId'], message: 'Choose the wall.' });
export type CreateVisitInput = z.input<typeof createVisitInput>;

/**
 * Moving, reassigning, cancelling, starting a visit, or the technician's checklist and notes.
 * Completing goes through `POST /api/visits/:id/close` (summary, checklist, signature).
 */
export const updateVisitInput = z
  .object({
    windowStart: instant('Start').optional(),
    windowEnd: instant('End').optional(),
    technicianIds: technicianIds.optional(),
    /** `in_progress` starts the visit; `cancelled` cancels it (the invitees get a cancellation). */
    status: z.enum(['in_progress', 'cancelled'], { error: 'Start or cancel the visit here; close it to complete it.' }).optional(),
    cancelReason: text(500).optional(),
    checklist: checklist.optional(),
    summary: text(5000).optional(),
    internalNotes: text(5000).optional(),
  })
  .refine(windowOrder, windowOrderError);
export type UpdateVisitInput = z.input<typeof updateVisitInput>;

/** A PNG drawn on the signature pad, as a data URL (at most about 300 kB). */
export const signatureDataUrl = z
  .string()
  .max(400_000, 'The signature is too large.')
  .regex(/^data:image\/png;base64,[A-Za-z0-9+/=]+$/, 'The signature must be a PNG drawing.');

export const closeVisitInput = z
  .object({
    /** Shown to the client in the report. */
    summary: requiredText(5000),
    checklist,
    /** Who signed on the screen for the client; leave both out when no one was there to sign. */
    signedByName: text(120).optional(),
    signature: signatureDataUrl.optional(),
    /** When no one signs: why (e.g. "No one on site after hours"). */
    unsignedReason: text(300).optional(),
  })
  .refine((v) => !v.signature || Boolean(v.signedByName), { path: ['signedByName'], message: 'Type the name of the person who signed.' })
  .refine((v) => Boolean(v.signature) || Boolean(v.unsignedReason), {
    path: ['signature'],
    message: 'Ask the client’s contact to sign, or say why no one could.',
  });
export type CloseVisitInput = z.input<typeof closeVisitInput>;

const csv = <T extends readonly [string, ...string[]]>(values: T) =>
  z
    .string()
    .optional()
    .transform((s) => (s ? s.split(',').filter(Boolean) : undefined))
    .pipe(z.array(z.enum(values)).optional());

export const listVisitsQuery = pageQuery.extend({
  /** A technician's id, or `me`. */
  technicianId: z.union([z.uuid(), z.literal('me')]).optional(),
  /** Visits whose window ends after `from` and starts before `to`. */
  from: instant('From').optional(),
  to: instant('To').optional(),
  status: csv(visitStatuses),
  siteId: z.uuid().optional(),
  ticketId: z.uuid().optional(),
  wallId: z.uuid().optional(),
  clientId: z.uuid().optional(),
  /** `asc` (soonest first, the default) or `desc` (latest first: a client's visit history). */
  dir: z.enum(['asc', 'desc']).default('asc'),
});
export type ListVisitsQuery = z.infer<typeof listVisitsQuery>;

// ---- responses (server/services/visits.ts presenters) ----

export interface VisitRef {
  id: string;
  name: string;
}

/** Another visit that books the same technician at an overlapping time. */
export interface VisitConflict {
  visitId: string;
  technician: VisitRef;
  windowStart: string;
  windowEnd: string;
  siteName: string;
}

/** One row of `GET /api/visits`. */
export interface VisitListItem {
  id: string;
  kind: VisitKind;
  status: VisitStatus;
  windowStart: string;
  windowEnd: string;
  startedAt: string | null;
  completedAt: string | null;
  client: VisitRef;
  site: VisitRef & {
    /** One line: street, city, region, postal code, country. */
    address: string;
    timeZone: string;
  };
  wall: VisitRef | null;
  ticket: { id: string; ref: string; title: string; priority: string } | null;
  technicians: VisitRef[];
  /** Staff only: the same technician booked at an overlapping time (cancelled visits never conflict). */
  conflicts: VisitConflict[];
  /** Bumped on each move or change the invitees hear of (the invitation's SEQUENCE). */
  sequence: number;
  /** A completed visit's report (`GET /api/visits/:id/report.pdf`). */
  reportUrl: string | null;
}

export interface VisitContact {
  name: string;
  title: string;
  phone: string;
  email: string | null;
}

/** `GET /api/visits/:id`. */
export interface VisitDetail extends VisitListItem {
  site: VisitListItem['site'] & { accessNotes: string };
  contacts: VisitContact[];
  wall: (VisitRef & { columns: number; rows: number }) | null;
  /** The ticket's reported cells. */
  ticket: (NonNullable<VisitListItem['ticket']> & { cells: { column: number; row: number }[]; status: string }) | null;
  checklist: ChecklistItem[];
  summary: string;
  /** Staff only. */
  internalNotes?: string;
  cancelReason: string;
  signedByName: string | null;
  signedAt: string | null;
  unsignedReason: string | null;
  reportSentAt: string | null;
  /** Oldest first. */
  repairs: RepairItem[];
  /** Photos of the visit's repairs. */
  photos: (Attachment & { repairId: string | null })[];
  /** What the caller may do: technicians of the visit start, log and close it; the office also moves and cancels. */
  can: { edit: boolean; work: boolean };
}

export const visitStatusLabels: Record<VisitStatus, string> = {
  planned: 'Planned',
  in_progress: 'On site',
  completed: 'Completed',
  cancelled: 'Cancelled',
};
