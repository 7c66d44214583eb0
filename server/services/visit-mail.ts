// The e-mails a visit sends: the calendar invitation when it is booked, moved or cancelled (to
// the technicians and the client's people), and the visit report after it is closed. Queued in
// the same transaction as the change that causes them; the client's copies never carry the
// internal notes.
import { createEvent, type Attendee } from 'ics';
import { and, eq, inArray } from 'drizzle-orm';
import { ticketRef } from '../../shared/schemas/tickets.js';
import { cellLabel } from '../../shared/calc/grid.js';
import { config } from '../config.js';
import type { DbOrTx } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { contacts } from '../db/schema/clients.js';
import type { MailAttachmentRef } from '../db/schema/mail.js';
import { queueMail } from '../integrations/mail.js';
import { renderMail, type MailFact } from './mail-layout.js';
import { updateRecipients } from './clients.js';

export interface VisitForMail {
  id: string;
  kind: 'ticket' | 'maintenance';
  /** The invitation's SEQUENCE (RFC 5545 §3.8.7.4). */
  sequence: number;
  windowStart: Date;
  windowEnd: Date;
  clientId: string;
  clientName: string;
  siteId: string;
  siteName: string;
  /** The site's full address on one line. */
  address: string;
  accessNotes: string;
  timeZone: string;
  wallName: string | null;
  ticket: {
    id: string;
    number: number;
    /** When the ticket was opened: the year in its reference. */
    createdAt: Date;
    title: string;
    reporterId: string | null;
    cells: { column: number; row: number }[];
  } | null;
  technicians: { id: string; name: string; email: string }[];
  internalNotes: string;
  cancelReason: string;
}

export type VisitChange = 'booked' | 'moved' | 'cancelled';

/** The invitation's UID: the same for every version of one visit (RFC 5545 §3.8.4.7). */
export const visitUid = (visitId: string) => `visit-${visitId}@gridkeep`;

const visitLink = (id: string) => `${config().APP_URL}/visits/${id}`;

/** "Thursday, December 10, 2026, 9:00 AM CST – 11:00 AM CST", in the site's own time zone. */
export function formatWindow(start: Date, end: Date, timeZone: string) {
  const day = new Intl.DateTimeFormat('en-US', { timeZone, weekday: 'long', month: 'long', day: 'numeric', year: 'numeric' }).format(start);
  const time = (d: Date) =>
    new Intl.DateTimeFormat('en-US', { timeZone, hour: 'numeric', minute: '2-digit', timeZoneName: 'short' }).format(d);
  return `${day}, ${time(start)} – ${time(end)}`;
}

/** The client's people who hear about a visit: the site's and organisation's contacts, and the ticket's reporter when a client user. */
export async function visitClientRecipients(tx: DbOrTx, v: Pick<VisitForMail, 'clientId' | 'siteId' | 'ticket'>) {
  return (await clientInvitees(tx, v)).map((p) => p.email);
}

/** The same people with their names, for the invitation's ATTENDEE lines. */
async function clientInvitees(tx: DbOrTx, v: Pick<VisitForMail, 'clientId' | 'siteId' | 'ticket'>) {
  const emails = await updateRecipients(tx, v.clientId, v.siteId);
  const named = emails.length
    ? await tx
        .select({ name: contacts.name, email: contacts.email })
        .from(contacts)
        .where(and(eq(contacts.clientId, v.clientId), inArray(contacts.email, emails)))
    : [];
  const people = emails.map((email) => ({ email, name: named.find((c) => c.email === email)?.name ?? email }));
  if (v.ticket?.reporterId) {
    const [reporter] = await tx
      .select({ name: users.name, email: users.email, role: users.role, disabledAt: users.disabledAt })
      .from(users)
      .where(eq(users.id, v.ticket.reporterId));
    if (reporter && reporter.role === 'client' && !reporter.disabledAt) people.unshift({ email: reporter.email, name: reporter.name });
  }
  // One line per person: addresses that differ only in capitals reach one mailbox in practice (RFC 5321 §2.4 lets the
  // local part be case-sensitive; mail providers do not make use of it).
  return people.filter((p, i) => people.findIndex((q) => q.email.toLowerCase() === p.email.toLowerCase()) === i);
}

function title(v: VisitForMail) {
  const what = v.kind === 'maintenance' ? 'Planned maintenance' : 'Service visit';
  const ref = v.ticket ? ` (${ticketRef(v.ticket.number, v.ticket.createdAt)})` : '';
  return `${what}: ${v.wallName ?? v.siteName}${ref}`;
}

/** What the visit is about, for the mail body and the invitation's DESCRIPTION. */
function about(v: VisitForMail, audience: 'technicians' | 'client') {
  const lines = [
    [v.clientName, v.siteName, v.wallName].filter(Boolean).join(' · '),
    v.ticket ? `Ticket ${ticketRef(v.ticket.number, v.ticket.createdAt)} — ${v.ticket.title}` : 'Planned maintenance',
  ];
  if (v.ticket?.cells.length) lines.push(`Cells: ${v.ticket.cells.map(cellLabel).join(', ')}`);
  lines.push(`When: ${formatWindow(v.windowStart, v.windowEnd, v.timeZone)}`);
  if (v.address) lines.push(`Where: ${v.address}`);
  lines.push(`Technician(s): ${v.technicians.map((t) => t.name).join(', ') || 'to be confirmed'}`);
  if (v.accessNotes) lines.push(`Access: ${v.accessNotes}`);
  if (audience === 'technicians' && v.internalNotes) lines.push(`Internal notes: ${v.internalNotes}`);
  if (audience === 'technicians') lines.push(visitLink(v.id));
  return lines.join('\n');
}

/**
 * The `.ics` for one version of the visit. RFC 5546 §3.2.2 (REQUEST) and §3.2.5 (CANCEL): one
 * ATTENDEE per invitee and the ORGANIZER; RFC 5545 §3.8.4.7 a UID stable across versions and
 * §3.8.7.4 a SEQUENCE raised on each revision the invitees must hear of.
 */
export function visitInvitation(
  v: VisitForMail,
  audience: 'technicians' | 'client',
  method: 'REQUEST' | 'CANCEL',
  invitees: { technicians: { name: string; email: string }[]; client: { name: string; email: string }[] },
): MailAttachmentRef {
  const attendees: Attendee[] = [
    ...invitees.technicians.map((t): Attendee => ({
      name: t.name,
      email: t.email,
      role: 'REQ-PARTICIPANT',
      partstat: 'NEEDS-ACTION',
      rsvp: true,
      cutype: 'INDIVIDUAL',
    })),
    ...invitees.client.map((p): Attendee => ({
      name: p.name,
      email: p.email,
      role: 'OPT-PARTICIPANT',
      partstat: 'NEEDS-ACTION',
      rsvp: false,
      cutype: 'INDIVIDUAL',
    })),
  ];
  const { value, error } = createEvent({
    productId: 'gridkeep/service-visits',
    method,
    uid: visitUid(v.id),
    sequence: v.sequence,
    title: title(v),
    description: about(v, audience),
    // The address alone, so a phone's calendar can route to it; the site's name is in the title.
    location: v.address || v.siteName,
    start: v.windowStart.getTime(),
    startInputType: 'utc',
    startOutputType: 'utc',
    end: v.windowEnd.getTime(),
    endInputType: 'utc',
    endOutputType: 'utc',
    organizer: { name: 'Gridkeep service desk', email: config().OFFICE_EMAIL },
    attendees,
    status: method === 'CANCEL' ? 'CANCELLED' : 'CONFIRMED',
  });
  if (error || !value) throw error ?? new Error('could not build the calendar invitation');
  return {
    fileName: method === 'CANCEL' ? 'visit-cancelled.ics' : 'visit.ics',
    contentType: `text/calendar; method=${method}; charset=UTF-8`,
    content: value,
  };
}

function subjectFor(v: VisitForMail, change: VisitChange, audience: 'technicians' | 'client' | 'removed') {
  const ref = v.ticket
    ? `${ticketRef(v.ticket.number, v.ticket.createdAt)}: ${v.ticket.title}`
    : `maintenance of ${v.wallName ?? v.siteName}`;
  if (audience === 'removed') return `Taken off a visit: ${v.siteName}, ${ref}`;
  if (audience === 'technicians') {
    const verb = change === 'booked' ? 'New visit' : change === 'moved' ? 'Visit changed' : 'Visit cancelled';
    return `${verb} for you: ${v.siteName}, ${ref}`;
  }
  const verb = change === 'booked' ? 'Visit scheduled' : change === 'moved' ? 'Visit moved' : 'Visit cancelled';
  return `${verb} for ${ref}`;
}

/** The first paragraphs of a change's mail: what happened, and that the calendar file is attached. */
function opening(v: VisitForMail, change: VisitChange, audience: 'technicians' | 'client' | 'removed'): string[] {
  const when = formatWindow(v.windowStart, v.windowEnd, v.timeZone);
  if (audience === 'removed')
    return [`You are no longer booked on this visit (${when}).`, 'The cancellation is attached for your calendar.'];
  if (change === 'cancelled') {
    return [
      `The visit planned for ${when} is cancelled.`,
      ...(v.cancelReason ? [`Reason: ${v.cancelReason}`] : []),
      'The cancellation is attached for your calendar.',
    ];
  }
  const lead = change === 'booked' ? 'A technician visit is planned' : 'The visit has moved; it is now planned';
  return [`${lead} for ${when}.`, 'The invitation is attached for your calendar.'];
}

/** The facts of a visit mail: the window at the site, the address and who comes, then what it is about. */
function visitFacts(v: VisitForMail, audience: 'technicians' | 'client'): MailFact[] {
  const facts: MailFact[] = [
    { label: 'When', value: formatWindow(v.windowStart, v.windowEnd, v.timeZone) },
    { label: 'Where', value: [v.siteName, v.address].filter(Boolean).join('\n') },
    {
      label: v.technicians.length === 1 ? 'Technician' : 'Technicians',
      value: v.technicians.map((t) => t.name).join(', ') || 'to be confirmed',
    },
    { label: 'Client', value: v.clientName },
    ...(v.wallName ? [{ label: 'Wall', value: v.wallName }] : []),
    {
      label: 'For',
      value: v.ticket ? `Ticket ${ticketRef(v.ticket.number, v.ticket.createdAt)} — ${v.ticket.title}` : 'Planned maintenance',
    },
  ];
  if (v.ticket?.cells.length)
    facts.push({ label: v.ticket.cells.length === 1 ? 'Cell' : 'Cells', value: v.ticket.cells.map(cellLabel).join(', ') });
  if (v.accessNotes) facts.push({ label: 'Access', value: v.accessNotes });
  if (audience === 'technicians' && v.internalNotes) facts.push({ label: 'Internal notes', value: v.internalNotes });
  return facts;
}

/** Technicians open the visit; the client's people follow the ticket, or the visit when there is none. */
function visitAction(v: VisitForMail, audience: 'technicians' | 'client') {
  if (audience === 'client' && v.ticket) return { label: 'Follow it in the portal', url: `${config().APP_URL}/tickets/${v.ticket.id}` };
  return { label: audience === 'technicians' ? 'Open the visit' : 'Open the visit in the portal', url: visitLink(v.id) };
}

function changeMail(v: VisitForMail, change: VisitChange, audience: 'technicians' | 'client' | 'removed') {
  const subject = subjectFor(v, change, audience);
  const paragraphs = opening(v, change, audience);
  const facts = audience === 'removed' ? 'technicians' : audience;
  return {
    subject,
    ...renderMail({
      preview: paragraphs[0],
      heading: subject,
      paragraphs,
      facts: visitFacts(v, facts),
      // A technician taken off the visit has nothing left to open.
      ...(audience === 'removed' ? {} : { action: visitAction(v, audience) }),
    }),
  };
}

/**
 * Tells the technicians and the client's people that the visit was booked, moved or cancelled.
 * `removedTechnicians` (taken off the visit by a reassignment) get a cancellation of their own.
 * The dedupe keys carry the SEQUENCE: each version is sent once to each audience.
 */
export async function mailVisitChange(
  tx: DbOrTx,
  v: VisitForMail,
  change: VisitChange,
  removedTechnicians: { id: string; name: string; email: string }[] = [],
) {
  const client = await clientInvitees(tx, v);
  const technicians = v.technicians.map((t) => ({ name: t.name, email: t.email }));
  const invitees = { technicians, client };
  const method = change === 'cancelled' ? 'CANCEL' : 'REQUEST';
  const key = (audience: string) => `visit:${v.id}:seq${v.sequence}:${audience}`;
  if (technicians.length) {
    await queueMail(tx, {
      to: technicians.map((t) => t.email),
      ...changeMail(v, change, 'technicians'),
      attachments: [visitInvitation(v, 'technicians', method, invitees)],
      dedupeKey: key('technicians'),
    });
  }
  if (client.length) {
    await queueMail(tx, {
      to: client.map((p) => p.email),
      ...changeMail(v, change, 'client'),
      attachments: [visitInvitation(v, 'client', method, invitees)],
      dedupeKey: key('client'),
    });
  }
  if (removedTechnicians.length) {
    const removed = removedTechnicians.map((t) => ({ name: t.name, email: t.email }));
    await queueMail(tx, {
      to: removed.map((t) => t.email),
      ...changeMail(v, change, 'removed'),
      // RFC 5546 §3.2.5: a CANCEL naming the attendees being removed from the event.
      attachments: [visitInvitation(v, 'technicians', 'CANCEL', { technicians: removed, client: [] })],
      dedupeKey: key('removed'),
    });
  }
}

/** The visit report, e-mailed to the client's people with the PDF (read from object storage by the mail worker). */
export async function mailVisitReport(tx: DbOrTx, v: VisitForMail, report: { storageKey: string; fileName: string }) {
  const to = await visitClientRecipients(tx, v);
  if (to.length === 0) return false;
  const ref = v.ticket ? ` (${ticketRef(v.ticket.number, v.ticket.createdAt)})` : '';
  await queueMail(tx, {
    to,
    subject: `Visit report: ${v.siteName}${ref}`,
    ...renderMail({
      preview: `Our visit to ${v.siteName} is complete.`,
      heading: `Visit report: ${v.siteName}${ref}`,
      paragraphs: [
        `Our visit to ${v.siteName} is complete. The report is attached: the work done, the parts fitted, photos and the sign-off.`,
      ],
      facts: visitFacts(v, 'client'),
      action: { label: 'Download it from the portal', url: visitLink(v.id) },
    }),
    attachments: [{ fileName: report.fileName, contentType: 'application/pdf', storageKey: report.storageKey }],
    dedupeKey: `visit-report:${v.id}`,
  });
  return true;
}
