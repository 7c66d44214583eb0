// The e-mails a ticket sends. Queued in the same transaction as the change that causes them
// (server/integrations/mail.ts sends them); internal comments never appear in a client's mail.
import { eq } from 'drizzle-orm';
import { statusLabels, ticketRef } from '../../shared/schemas/tickets.js';
import { cellLabel } from '../../shared/calc/grid.js';
import { config } from '../config.js';
import type { DbOrTx } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { queueMail } from '../integrations/mail.js';
import { updateRecipients } from './clients.js';

export interface TicketForMail {
  id: string;
  number: number;
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

function summary(t: TicketForMail) {
  const where = [t.clientName, t.siteName, t.wallName].filter(Boolean).join(' · ');
  const cells = t.cells.length ? `\nCells: ${t.cells.map(cellLabel).join(', ')}` : '';
  return `${ticketRef(t.number)} — ${t.title}\n${where}\nPriority: ${t.priority}${cells}`;
}

/** The client people who hear about a ticket: its reporter (if a client user) and the site's contacts. */
async function clientRecipients(tx: DbOrTx, t: TicketForMail, excludeEmail?: string) {
  const list = await updateRecipients(tx, t.clientId, t.siteId);
  if (t.reporterId) {
    const [reporter] = await tx
      .select({ email: users.email, role: users.role, disabledAt: users.disabledAt })
      .from(users)
      .where(eq(users.id, t.reporterId));
    if (reporter && reporter.role === 'client' && !reporter.disabledAt) list.unshift(reporter.email);
  }
  return [...new Set(list)].filter((e) => e !== excludeEmail);
}

export async function mailOfficeNewTicket(tx: DbOrTx, t: TicketForMail, reporterName: string) {
  await queueMail(tx, {
    to: [config().OFFICE_EMAIL],
    subject: `New ${t.priority} ticket ${ticketRef(t.number)}: ${t.title}`,
    text: `${reporterName} opened a ticket.\n\n${summary(t)}\n\n${t.description}\n\nOpen it: ${ticketLink(t.id)}\n`,
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
  const ref = ticketRef(t.number);
  let subject: string;
  let body: string;
  let dedupeKey: string;
  switch (update.kind) {
    case 'acknowledged':
      subject = `We are on it: ${ref} ${t.title}`;
      body = `We have received your ticket and are looking at it.`;
      dedupeKey = `ticket:${t.id}:acknowledged`;
      break;
    case 'comment':
      subject = `New reply on ${ref}: ${t.title}`;
      body = `${update.authorName} wrote:\n\n${update.body}`;
      dedupeKey = `ticket:${t.id}:comment:${update.commentId}`;
      break;
    case 'resolved':
      subject = `Resolved: ${ref} ${t.title}`;
      body = `We have marked this ticket resolved. If the fault is still there, reply in the portal and we will reopen it.`;
      dedupeKey = `ticket:${t.id}:resolved:${Date.now()}`;
      break;
    case 'status':
      subject = `${ref} is now ${statusLabels[update.status as keyof typeof statusLabels] ?? update.status}`;
      body = `The status of your ticket changed to: ${statusLabels[update.status as keyof typeof statusLabels] ?? update.status}.`;
      dedupeKey = `ticket:${t.id}:status:${update.status}:${Date.now()}`;
      break;
  }
  await queueMail(tx, {
    to,
    subject,
    text: `${body}\n\n${summary(t)}\n\nFollow it in the portal: ${ticketLink(t.id)}\n`,
    dedupeKey,
  });
}
