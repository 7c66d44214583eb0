// The e-mails a ticket sends, each as HTML with a plain-text alternative (mail-layout.ts). Queued
// in the same transaction as the change that causes them (server/integrations/mail.ts sends
// them); internal comments never appear in a client's mail, and a comment's author never gets it.
import { eq } from 'drizzle-orm';
import { priorityGuidance, statusLabels, ticketRef } from '../../shared/schemas/tickets.js';
import { cellLabel } from '../../shared/calc/grid.js';
import { config } from '../config.js';
import type { DbOrTx } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { queueMail } from '../integrations/mail.js';
import { renderMail, type MailFact, type MailMessage } from './mail-layout.js';
import { linkedContactAddresses, updateRecipients } from './clients.js';

export interface TicketForMail {
  id: string;
  number: number;
  /** When the ticket was opened: the year in its reference. */
  createdAt: Date;
  clientId: string;
  siteId: string;
  title: string;
  description: string;
  priority: string;
  status: string;
  reporterId: string | null;
  cells: { column: number; row: number }[];
  siteName: string;
  wallName: string | null;
  clientName: string;
  resolutionDueAt: Date | null;
}

const ticketLink = (id: string) => `${config().APP_URL}/tickets/${id}`;

const statusLabel = (status: string) => statusLabels[status as keyof typeof statusLabels] ?? status;

/** What every ticket mail shows: its reference, state, place and the cells reported. */
function ticketFacts(t: TicketForMail): MailFact[] {
  const facts: MailFact[] = [
    { label: 'Ticket', value: `${ticketRef(t.number, t.createdAt)} — ${t.title}` },
    { label: 'State', value: statusLabel(t.status) },
    { label: 'Priority', value: priorityGuidance[t.priority as keyof typeof priorityGuidance]?.label ?? t.priority },
    { label: 'Where', value: [t.clientName, t.siteName, t.wallName].filter(Boolean).join(' · ') },
  ];
  if (t.cells.length) facts.push({ label: t.cells.length === 1 ? 'Cell' : 'Cells', value: t.cells.map(cellLabel).join(', ') });
  return facts;
}

const sameAddress = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/**
 * The client people who hear about a ticket: its reporter (if a client user) and the site's
 * contacts, each address once. `excludeEmail` (a comment's author) is left out however a contact
 * spells it, and so is every contact linked to the author's account under another address:
 * nobody is mailed their own words.
 */
async function clientRecipients(tx: DbOrTx, t: TicketForMail, excludeEmail?: string) {
  const list = await updateRecipients(tx, t.clientId, t.siteId);
  if (t.reporterId) {
    const [reporter] = await tx
      .select({ email: users.email, role: users.role, disabledAt: users.disabledAt })
      .from(users)
      .where(eq(users.id, t.reporterId));
    if (reporter && reporter.role === 'client' && !reporter.disabledAt) list.unshift(reporter.email);
  }
  const unique = list.filter((e, i) => list.findIndex((other) => sameAddress(other, e)) === i);
  if (!excludeEmail) return unique;
  const authors = [excludeEmail, ...(await linkedContactAddresses(tx, t.clientId, excludeEmail))];
  return unique.filter((e) => !authors.some((a) => sameAddress(e, a)));
}

export async function mailOfficeNewTicket(tx: DbOrTx, t: TicketForMail, reporterName: string) {
  const ref = ticketRef(t.number, t.createdAt);
  await queueMail(tx, {
    to: [config().OFFICE_EMAIL],
    subject: `New ${t.priority} ticket ${ref}: ${t.title}`,
    ...renderMail({
      preview: `${reporterName} opened ${ref}: ${t.title}`,
      heading: `New ticket ${ref}`,
      paragraphs: [`${reporterName} opened a ${t.priority}-priority ticket.`],
      ...(t.description ? { quote: { author: reporterName, body: t.description } } : {}),
      facts: ticketFacts(t),
      action: { label: 'Open the ticket', url: ticketLink(t.id) },
    }),
    dedupeKey: `ticket:${t.id}:opened`,
  });
}

export type ClientUpdate =
  | { kind: 'acknowledged' }
  | { kind: 'resolved' }
  | { kind: 'status'; status: string }
  | { kind: 'comment'; commentId: string; authorName: string; body: string; excludeEmail?: string };
// A booked visit mails its own invitation (visit-mail.ts).

/** An update for the client's people. Never called with an internal comment. */
export async function mailClientUpdate(tx: DbOrTx, t: TicketForMail, update: ClientUpdate) {
  const to = await clientRecipients(tx, t, update.kind === 'comment' ? update.excludeEmail : undefined);
  if (to.length === 0) return;
  const ref = ticketRef(t.number, t.createdAt);
  let subject: string;
  let heading: string;
  let paragraphs: string[] = [];
  let quote: MailMessage['quote'];
  let dedupeKey: string;
  switch (update.kind) {
    case 'acknowledged':
      subject = `We are on it: ${ref} ${t.title}`;
      heading = `We are on it: ${ref}`;
      paragraphs = ['We have received your ticket and are looking at it.'];
      dedupeKey = `ticket:${t.id}:acknowledged`;
      break;
    case 'comment':
      subject = `New reply on ${ref}: ${t.title}`;
      heading = `New reply on ${ref}`;
      quote = { author: update.authorName, body: update.body };
      dedupeKey = `ticket:${t.id}:comment:${update.commentId}`;
      break;
    case 'resolved':
      subject = `Resolved: ${ref} ${t.title}`;
      heading = `Resolved: ${ref}`;
      paragraphs = ['We have marked this ticket resolved. If the fault is still there, reply in the portal and we will reopen it.'];
      dedupeKey = `ticket:${t.id}:resolved:${Date.now()}`;
      break;
    case 'status':
      subject = `${ref} is now ${statusLabel(update.status)}`;
      heading = subject;
      paragraphs = [`The status of your ticket changed to: ${statusLabel(update.status)}.`];
      dedupeKey = `ticket:${t.id}:status:${update.status}:${Date.now()}`;
      break;
  }
  await queueMail(tx, {
    to,
    subject,
    ...renderMail({
      preview: quote ? `${quote.author}: ${quote.body.slice(0, 120)}` : (paragraphs[0] ?? subject),
      heading,
      paragraphs,
      ...(quote ? { quote } : {}),
      facts: ticketFacts(t),
      action: { label: 'Follow it in the portal', url: ticketLink(t.id) },
    }),
    dedupeKey,
  });
}
