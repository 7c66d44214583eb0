// Visits: a technician's trip to a site, for a ticket or for planned maintenance. Booking,
// moving, reassigning and cancelling (the office; the invitees get an `.ics`), starting and
// closing (the visit's technicians), the report. Technicians see their own visits and, read-only,
// the others' of the day; client users their organisation's, without internal notes or conflicts.
import type { Readable } from 'node:stream';
import { aliasedTable, and, asc, eq, inArray, ne, or, sql, type SQL } from 'drizzle-orm';
import type { Page } from '../../shared/schemas/common.js';
import type { TicketStatus } from '../../shared/schemas/enums.js';
import { ticketRef } from '../../shared/schemas/tickets.js';
import {
  defaultTicketChecklist,
  type ChecklistItem,
  type CloseVisitInput,
  type CreateVisitInput,
  type ListVisitsQuery,
  type UpdateVisitInput,
  type VisitConflict,
  type VisitContact,
  type VisitDetail,
  type VisitListItem,
} from '../../shared/schemas/visits.js';
import { db, type DbOrTx, type Tx } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { clients, contacts, sites } from '../db/schema/clients.js';
import { attachments } from '../db/schema/files.js';
import { tickets } from '../db/schema/tickets.js';
import { visits, visitTechnicians } from '../db/schema/visits.js';
import { maintenancePlans, walls } from '../db/schema/walls.js';
import { badRequest, conflict, forbidden, notFound } from '../errors.js';
import { deleteObject, getObjectStream, newStorageKey, putObject } from '../integrations/s3.js';
import { logger } from '../logger.js';
import type { Actor } from '../middleware/auth.js';
import { presentAttachment } from './attachments.js';
import { recordAudit } from './audit.js';
import { cursorValue, orderFor } from './clients.js';
import { afterCursor, decodeCursor, pageOf } from './pagination.js';
import { visitRepairs } from './repairs.js';
import { found, isOffice, isStaff, tenantWhere } from './scope.js';
import { moveTicketForVisit } from './tickets.js';
import { mailVisitChange, mailVisitReport, type VisitChange, type VisitForMail } from './visit-mail.js';
import { isDecodablePng, renderVisitReport, reportFileName, type ReportData } from './visit-report.js';

type VisitRow = typeof visits.$inferSelect;

const iso = (d: Date | null) => d?.toISOString() ?? null;

/** The site's address on one line: street, city, region and postal code, country. */
export function addressLine(s: { address: string; city: string; region: string; postalCode: string; country: string }) {
  return [s.address, s.city, [s.region, s.postalCode].filter(Boolean).join(' '), s.country].filter(Boolean).join(', ');
}

// ---- who sees what ----

/** The caller is one of the visit's technicians. */
const onVisit = (userId: string) =>
  sql`exists (select 1 from ${visitTechnicians} where ${visitTechnicians.visitId} = ${visits.id} and ${visitTechnicians.userId} = ${userId})`;

/** The visit's window overlaps today in the site's own time zone (needs `sites` joined). */
const todayAtSite = sql`(${visits.windowStart} < ((((now() at time zone ${sites.timeZone})::date + 1)::timestamp) at time zone ${sites.timeZone})
  and ${visits.windowEnd} > ((((now() at time zone ${sites.timeZone})::date)::timestamp) at time zone ${sites.timeZone}))`;

/** Technicians: their own visits and the day's others; client users: their organisation's; the office: all. */
function scopeWhere(actor: Actor): SQL | undefined {
  if (actor.role === 'technician') return or(onVisit(actor.userId), todayAtSite);
  return tenantWhere(actor, visits.clientId);
}

// ---- reading ----

const listColumns = {
  v: visits,
  clientName: clients.name,
  site: {
    name: sites.name,
    address: sites.address,
    city: sites.city,
    region: sites.region,
    postalCode: sites.postalCode,
    country: sites.country,
    timeZone: sites.timeZone,
    accessNotes: sites.accessNotes,
  },
  wallName: walls.name,
  wallColumns: walls.columns,
  wallRows: walls.rows,
  ticketNumber: tickets.number,
  ticketCreatedAt: tickets.createdAt,
  ticketTitle: tickets.title,
  ticketPriority: tickets.priority,
  ticketStatus: tickets.status,
  ticketCells: tickets.cells,
  ticketReporterId: tickets.reporterId,
};

function baseQuery(tx: DbOrTx) {
  return tx
    .select(listColumns)
    .from(visits)
    .innerJoin(clients, eq(clients.id, visits.clientId))
    .innerJoin(sites, eq(sites.id, visits.siteId))
    .leftJoin(walls, eq(walls.id, visits.wallId))
    .leftJoin(tickets, eq(tickets.id, visits.ticketId));
}

type ListRow = Awaited<ReturnType<ReturnType<typeof baseQuery>['execute']>>[number];
type Technician = { id: string; name: string; email: string };

async function techniciansOf(tx: DbOrTx, visitIds: string[]) {
  const byVisit = new Map<string, Technician[]>();
  if (!visitIds.length) return byVisit;
  const rows = await tx
    .select({ visitId: visitTechnicians.visitId, id: users.id, name: users.name, email: users.email })
    .from(visitTechnicians)
    .innerJoin(users, eq(users.id, visitTechnicians.userId))
    .where(inArray(visitTechnicians.visitId, visitIds))
    .orderBy(asc(users.name));
  for (const r of rows) byVisit.set(r.visitId, [...(byVisit.get(r.visitId) ?? []), { id: r.id, name: r.name, email: r.email }]);
  return byVisit;
}

/**
 * Other visits booking one of the same technicians at an overlapping time. Cancelled visits
 * never conflict, on either side.
 */
async function conflictsOf(tx: DbOrTx, visitIds: string[]) {
  const byVisit = new Map<string, VisitConflict[]>();
  if (!visitIds.length) return byVisit;
  const mine = aliasedTable(visitTechnicians, 'mine');
  const theirs = aliasedTable(visitTechnicians, 'theirs');
  const self = aliasedTable(visits, 'self');
  const other = aliasedTable(visits, 'other');
  const rows = await tx
    .select({
      visitId: mine.visitId,
      otherId: other.id,
      technicianId: users.id,
      technicianName: users.name,
      windowStart: other.windowStart,
      windowEnd: other.windowEnd,
      siteName: sites.name,
    })
    .from(mine)
    .innerJoin(self, eq(self.id, mine.visitId))
    .innerJoin(theirs, and(eq(theirs.userId, mine.userId), ne(theirs.visitId, mine.visitId)))
    .innerJoin(other, eq(other.id, theirs.visitId))
    .innerJoin(sites, eq(sites.id, other.siteId))
    .innerJoin(users, eq(users.id, mine.userId))
    .where(
      and(
        inArray(mine.visitId, visitIds),
        ne(self.status, 'cancelled'),
        ne(other.status, 'cancelled'),
        sql`${other.windowStart} < ${self.windowEnd}`,
        sql`${other.windowEnd} > ${self.windowStart}`,
      ),
    )
    .orderBy(asc(other.windowStart), asc(users.name));
  for (const r of rows) {
    const item: VisitConflict = {
      visitId: r.otherId,
      technician: { id: r.technicianId, name: r.technicianName },
      windowStart: r.windowStart.toISOString(),
      windowEnd: r.windowEnd.toISOString(),
      siteName: r.siteName,
    };
    byVisit.set(r.visitId, [...(byVisit.get(r.visitId) ?? []), item]);
  }
  return byVisit;
}

function presentListItem(r: ListRow, technicians: Technician[], conflicts: VisitConflict[], staff: boolean): VisitListItem {
  const v = r.v;
  return {
    id: v.id,
    kind: v.kind,
    status: v.status,
    windowStart: v.windowStart.toISOString(),
    windowEnd: v.windowEnd.toISOString(),
    startedAt: iso(v.startedAt),
    completedAt: iso(v.completedAt),
    client: { id: v.clientId, name: r.clientName },
    site: { id: v.siteId, name: r.site.name, address: addressLine(r.site), timeZone: r.site.timeZone },
    wall: v.wallId ? { id: v.wallId, name: r.wallName ?? '' } : null,
    ticket:
      v.ticketId && r.ticketNumber !== null
        ? {
            id: v.ticketId,
            ref: ticketRef(r.ticketNumber, r.ticketCreatedAt!),
            title: r.ticketTitle ?? '',
            priority: r.ticketPriority ?? 'normal',
          }
        : null,
    technicians: technicians.map((t) => ({ id: t.id, name: t.name })),
    conflicts: staff ? conflicts : [],
    sequence: v.sequence,
    reportUrl: v.status === 'completed' ? `/api/visits/${v.id}/report.pdf` : null,
  };
}

export async function listVisits(actor: Actor, query: ListVisitsQuery): Promise<Page<VisitListItem>> {
  const technicianId = query.technicianId === 'me' ? actor.userId : query.technicianId;
  const rows = await baseQuery(db())
    .where(
      and(
        scopeWhere(actor),
        technicianId ? onVisit(technicianId) : undefined,
        query.from ? sql`${visits.windowEnd} > ${new Date(query.from)}` : undefined,
        query.to ? sql`${visits.windowStart} < ${new Date(query.to)}` : undefined,
        query.status ? inArray(visits.status, query.status) : undefined,
        query.siteId ? eq(visits.siteId, query.siteId) : undefined,
        query.ticketId ? eq(visits.ticketId, query.ticketId) : undefined,
        query.wallId ? eq(visits.wallId, query.wallId) : undefined,
        query.clientId ? eq(visits.clientId, query.clientId) : undefined,
        afterCursor(visits.windowStart, visits.id, decodeCursor(query.cursor, 2), query.dir),
      ),
    )
    .orderBy(...orderFor(visits.windowStart, visits.id, query.dir))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (r) => [cursorValue(r.v.windowStart), r.v.id]);
  const ids = page.items.map((r) => r.v.id);
  const staff = isStaff(actor);
  const [techs, conflicts] = await Promise.all([techniciansOf(db(), ids), staff ? conflictsOf(db(), ids) : new Map()]);
  return {
    items: page.items.map((r) => presentListItem(r, techs.get(r.v.id) ?? [], conflicts.get(r.v.id) ?? [], staff)),
    nextCursor: page.nextCursor,
  };
}

/** The visit with what its pages and mails need, if the caller may see it; or 404. */
async function visibleVisit(tx: DbOrTx, actor: Actor, id: string) {
  const [row] = await baseQuery(tx).where(and(eq(visits.id, id), scopeWhere(actor)));
  return found(row, 'Visit');
}

async function contactsOf(tx: DbOrTx, clientId: string, siteId: string): Promise<VisitContact[]> {
  const rows = await tx
    .select({ name: contacts.name, title: contacts.title, phone: contacts.phone, email: contacts.email, siteId: contacts.siteId })
    .from(contacts)
    .where(and(eq(contacts.clientId, clientId), sql`(${contacts.siteId} is null or ${contacts.siteId} = ${siteId})`))
    .orderBy(sql`${contacts.siteId} is null`, asc(contacts.name));
  return rows.map((c) => ({ name: c.name, title: c.title, phone: c.phone, email: c.email }));
}

/** Photos of the visit's repairs (and any filed on the visit itself); client users never get internal files. */
async function photosOf(tx: DbOrTx, actor: Actor, visitId: string, repairIds: string[]) {
  const rows = await tx
    .select({ a: attachments, uploadedByName: users.name })
    .from(attachments)
    .leftJoin(users, eq(users.id, attachments.uploadedById))
    .where(
      and(
        or(eq(attachments.visitId, visitId), repairIds.length ? inArray(attachments.repairId, repairIds) : undefined),
        isStaff(actor) ? undefined : eq(attachments.internal, false),
      ),
    )
    .orderBy(asc(attachments.createdAt));
  return rows.map((r) => ({ ...presentAttachment({ ...r.a, uploadedByName: r.uploadedByName }), repairId: r.a.repairId }));
}

const isOpen = (v: VisitRow) => v.status === 'planned' || v.status === 'in_progress';

export async function getVisit(actor: Actor, id: string, tx: DbOrTx = db()): Promise<VisitDetail> {
  const r = await visibleVisit(tx, actor, id);
  const staff = isStaff(actor);
  const [techs, conflicts, contactList, repairList] = await Promise.all([
    techniciansOf(tx, [id]),
    staff ? conflictsOf(tx, [id]) : new Map<string, VisitConflict[]>(),
    contactsOf(tx, r.v.clientId, r.v.siteId),
    visitRepairs(tx, actor, id),
  ]);
  const technicians = techs.get(id) ?? [];
  const photos = await photosOf(
    tx,
    actor,
    id,
    repairList.map((x) => x.id),
  );
  const item = presentListItem(r, technicians, conflicts.get(id) ?? [], staff);
  const mine = technicians.some((t) => t.id === actor.userId);
  const v = r.v;
  return {
    ...item,
    site: { ...item.site, accessNotes: r.site.accessNotes },
    contacts: contactList,
    wall: v.wallId ? { id: v.wallId, name: r.wallName ?? '', columns: r.wallColumns ?? 0, rows: r.wallRows ?? 0 } : null,
    ticket: item.ticket ? { ...item.ticket, cells: r.ticketCells ?? [], status: r.ticketStatus ?? 'new' } : null,
    checklist: v.checklist,
    summary: v.summary,
    ...(staff ? { internalNotes: v.internalNotes } : {}),
    cancelReason: v.cancelReason,
    signedByName: v.signedByName,
    signedAt: iso(v.signedAt),
    unsignedReason: v.unsignedReason,
    reportSentAt: iso(v.reportSentAt),
    repairs: repairList,
    photos,
    can: { edit: isOffice(actor) && isOpen(v), work: (isOffice(actor) || mine) && isOpen(v) },
  };
}

// ---- booking ----

/** Active technicians, in the order given; a 400 naming the field otherwise. */
async function assertTechnicians(tx: DbOrTx, ids: string[], field: string): Promise<Technician[]> {
  const unique = [...new Set(ids)];
  if (!unique.length) return [];
  const rows = await tx
    .select({ id: users.id, name: users.name, email: users.email, role: users.role, disabledAt: users.disabledAt })
    .from(users)
    .where(inArray(users.id, unique));
  if (rows.length !== unique.length || rows.some((u) => u.role !== 'technician' || u.disabledAt)) {
    throw badRequest('validation_failed', 'Choose technicians from the team.', { [field]: 'Not an active technician.' });
  }
  return rows.map((u) => ({ id: u.id, name: u.name, email: u.email }));
}

/** What the mails need, read in the transaction after the change. */
async function forMail(tx: DbOrTx, id: string): Promise<VisitForMail> {
  const [r] = await baseQuery(tx).where(eq(visits.id, id));
  const techs = await techniciansOf(tx, [id]);
  return {
    id,
    kind: r.v.kind,
    sequence: r.v.sequence,
    windowStart: r.v.windowStart,
    windowEnd: r.v.windowEnd,
    clientId: r.v.clientId,
    clientName: r.clientName,
    siteId: r.v.siteId,
    siteName: r.site.name,
    address: addressLine(r.site),
    accessNotes: r.site.accessNotes,
    timeZone: r.site.timeZone,
    wallName: r.wallName,
    ticket:
      r.v.ticketId && r.ticketNumber !== null
        ? {
            id: r.v.ticketId,
            number: r.ticketNumber,
            createdAt: r.ticketCreatedAt!,
            title: r.ticketTitle ?? '',
            reporterId: r.ticketReporterId,
            cells: r.ticketCells ?? [],
          }
        : null,
    technicians: techs.get(id) ?? [],
    internalNotes: r.v.internalNotes,
    cancelReason: r.v.cancelReason,
  };
}

const toChecklist = (labels: readonly string[]): ChecklistItem[] => labels.map((label) => ({ label, done: false }));

export interface BookVisitInput {
  kind: 'ticket' | 'maintenance';
  ticketId?: string;
  wallId?: string;
  windowStart: string;
  windowEnd: string;
  technicianIds: string[];
  checklist?: ChecklistItem[];
  internalNotes?: string;
  /** Where the fields sit in the caller's body, for 400s (`schedule.` from the ticket route). */
  fieldPrefix?: string;
}

/**
 * Books a visit in the caller's transaction: the row, its technicians, the audit, the ticket
 * moved to `scheduled` (when new or acknowledged) and the invitations (SEQUENCE 0). The one path
 * for every booking, from dispatch and from the ticket's "schedule".
 */
export async function bookVisit(tx: Tx, actor: Actor, input: BookVisitInput): Promise<string> {
  const field = (name: string) => `${input.fieldPrefix ?? ''}${name}`;
  let place: { clientId: string; siteId: string; wallId: string | null; ticketId: string | null; maintenancePlanId: string | null };
  let checklist = input.checklist;
  if (input.kind === 'ticket') {
    const [t] = await tx
      .select()
      .from(tickets)
      .where(eq(tickets.id, input.ticketId ?? ''));
    if (!t) throw badRequest('validation_failed', 'Choose the ticket.', { [field('ticketId')]: 'Unknown ticket.' });
    if (t.mergedIntoId || t.status === 'closed' || t.status === 'resolved')
      throw conflict('ticket_closed', 'That ticket is resolved or closed; reopen it before planning a visit.', {
        [field('ticketId')]: 'Not open.',
      });
    place = { clientId: t.clientId, siteId: t.siteId, wallId: t.wallId, ticketId: t.id, maintenancePlanId: null };
    checklist ??= toChecklist(defaultTicketChecklist);
  } else {
    const [w] = await tx
      .select({ id: walls.id, clientId: walls.clientId, siteId: walls.siteId, plan: maintenancePlans })
      .from(walls)
      .leftJoin(maintenancePlans, eq(maintenancePlans.wallId, walls.id))
      .where(eq(walls.id, input.wallId ?? ''));
    if (!w) throw badRequest('validation_failed', 'Choose the wall.', { [field('wallId')]: 'Unknown wall.' });
    const plan = w.plan?.active ? w.plan : null;
    place = { clientId: w.clientId, siteId: w.siteId, wallId: w.id, ticketId: null, maintenancePlanId: plan?.id ?? null };
    // A maintenance visit starts from its plan's checklist.
    checklist ??= toChecklist(plan?.checklist ?? []);
  }
  const technicians = await assertTechnicians(tx, input.technicianIds, field('technicianIds'));
  const [row] = await tx
    .insert(visits)
    .values({
      ...place,
      kind: input.kind,
      windowStart: new Date(input.windowStart),
      windowEnd: new Date(input.windowEnd),
      checklist,
      internalNotes: input.internalNotes ?? '',
    })
    .returning();
  if (technicians.length) await tx.insert(visitTechnicians).values(technicians.map((t) => ({ visitId: row.id, userId: t.id })));
  await recordAudit(tx, {
    actor,
    entity: 'visit',
    entityId: row.id,
    action: 'created',
    after: { ...row, technicianIds: technicians.map((t) => t.id) },
  });
  if (place.ticketId) await moveTicketForVisit(tx, actor, place.ticketId, 'scheduled', ['new', 'acknowledged']);
  await mailVisitChange(tx, await forMail(tx, row.id), 'booked');
  return row.id;
}

export async function createVisit(actor: Actor, input: CreateVisitInput): Promise<VisitDetail> {
  const id = await db().transaction((tx) =>
    bookVisit(tx, actor, {
      kind: input.kind,
      ticketId: input.ticketId,
      wallId: input.wallId,
      windowStart: input.windowStart,
      windowEnd: input.windowEnd,
      technicianIds: input.technicianIds,
      checklist: input.checklist,
      internalNotes: input.internalNotes,
    }),
  );
  return getVisit(actor, id);
}

// ---- changing ----

const finalMessage = (v: VisitRow, what: string) =>
  `A ${v.status === 'completed' ? 'completed' : 'cancelled'} visit cannot be ${what}; plan a new visit instead.`;

/** What the caller may change: the office everything; the visit's technicians start it and keep its checklist and notes. */
function assertMayUpdate(actor: Actor, mine: boolean, input: UpdateVisitInput) {
  if (isOffice(actor)) return;
  if (!mine) throw forbidden('forbidden', 'Only the visit’s technicians and the office can change this visit.');
  const officeOnly =
    input.windowStart !== undefined ||
    input.windowEnd !== undefined ||
    input.technicianIds !== undefined ||
    input.status === 'cancelled' ||
    input.cancelReason !== undefined;
  if (officeOnly) throw forbidden('forbidden', 'Moving, reassigning and cancelling a visit are done by the office.');
}

const sameSet = (a: string[], b: string[]) => a.length === b.length && [...a].sort().join() === [...b].sort().join();

export async function updateVisit(actor: Actor, id: string, input: UpdateVisitInput): Promise<VisitDetail> {
  await db().transaction(async (tx) => {
    await visibleVisit(tx, actor, id);
    const [before] = await tx.select().from(visits).where(eq(visits.id, id)).for('update');
    const currentTechs = (await techniciansOf(tx, [id])).get(id) ?? [];
    assertMayUpdate(
      actor,
      currentTechs.some((t) => t.id === actor.userId),
      input,
    );

    const windowStart = input.windowStart ? new Date(input.windowStart) : before.windowStart;
    const windowEnd = input.windowEnd ? new Date(input.windowEnd) : before.windowEnd;
    const moved = windowStart.getTime() !== before.windowStart.getTime() || windowEnd.getTime() !== before.windowEnd.getTime();
    const reassigned =
      input.technicianIds !== undefined &&
      !sameSet(
        input.technicianIds,
        currentTechs.map((t) => t.id),
      );
    const cancelling = input.status === 'cancelled' && before.status !== 'cancelled';
    const starting = input.status === 'in_progress' && before.status !== 'in_progress';
    const anything =
      moved || reassigned || cancelling || starting || [input.checklist, input.summary, input.internalNotes].some((x) => x !== undefined);

    if (!isOpen(before) && anything) {
      const what = moved || reassigned ? 'moved or reassigned' : cancelling ? 'cancelled' : starting ? 'started' : 'changed';
      throw conflict('visit_closed', finalMessage(before, what), { status: `The visit is ${before.status}.` });
    }
    if (windowEnd <= windowStart)
      throw badRequest('validation_failed', 'The visit must end after it starts.', { windowEnd: 'Before the start.' });

    const now = new Date();
    const changes: Partial<typeof visits.$inferInsert> = { updatedAt: now };
    if (moved) Object.assign(changes, { windowStart, windowEnd });
    if (input.checklist !== undefined) changes.checklist = input.checklist;
    if (input.summary !== undefined) changes.summary = input.summary;
    if (input.internalNotes !== undefined) changes.internalNotes = input.internalNotes;
    if (starting) {
      if (before.status !== 'planned') throw conflict('bad_transition', 'Only a planned visit can be started.', { status: 'Not planned.' });
      Object.assign(changes, { status: 'in_progress', startedAt: now });
    }
    if (cancelling) Object.assign(changes, { status: 'cancelled', cancelledAt: now, cancelReason: input.cancelReason ?? '' });
    else if (input.cancelReason !== undefined) changes.cancelReason = input.cancelReason;

    let removed: Technician[] = [];
    if (reassigned) {
      const next = await assertTechnicians(tx, input.technicianIds!, 'technicianIds');
      removed = currentTechs.filter((t) => !next.some((n) => n.id === t.id));
      await tx.delete(visitTechnicians).where(eq(visitTechnicians.visitId, id));
      if (next.length) await tx.insert(visitTechnicians).values(next.map((t) => ({ visitId: id, userId: t.id })));
    }
    // Each change the invitees hear of is a new revision of the invitation (RFC 5545 §3.8.7.4).
    const change: VisitChange | null = cancelling ? 'cancelled' : moved || reassigned ? 'moved' : null;
    if (change) changes.sequence = before.sequence + 1;

    const [after] = await tx.update(visits).set(changes).where(eq(visits.id, id)).returning();
    await recordAudit(tx, {
      actor,
      entity: 'visit',
      entityId: id,
      action: cancelling ? 'cancelled' : starting ? 'started' : moved || reassigned ? 'moved' : 'updated',
      before: { ...before, technicianIds: currentTechs.map((t) => t.id) },
      after: { ...after, technicianIds: reassigned ? input.technicianIds : currentTechs.map((t) => t.id) },
    });
    if (starting && before.ticketId) {
      await moveTicketForVisit(tx, actor, before.ticketId, 'in_progress', ['scheduled', 'acknowledged'] satisfies TicketStatus[]);
    }
    if (change) await mailVisitChange(tx, await forMail(tx, id), change, removed);
  });
  return getVisit(actor, id);
}

// ---- closing and the report ----

/** The signature pad's drawing as PNG bytes; anything else (or a damaged PNG) is refused. */
function signaturePng(dataUrl: string): Buffer {
  const bytes = Buffer.from(dataUrl.slice(dataUrl.indexOf(',') + 1), 'base64');
  if (!isDecodablePng(bytes)) {
    throw badRequest('validation_failed', 'The signature must be a PNG drawing.', { signature: 'Not a PNG image.' });
  }
  return bytes;
}

/** Everything the report shows, read from the database; `overlay` is the closing about to be saved. */
async function reportData(tx: DbOrTx, id: string, overlay: Partial<VisitRow> = {}, signature?: Buffer): Promise<ReportData> {
  const [r] = await baseQuery(tx).where(eq(visits.id, id));
  const v = { ...r.v, ...overlay };
  // The report goes to the client: it is built as a client user sees the visit (no costs, no internal notes).
  const reader: Actor = { userId: '', sessionId: '', role: 'client', clientId: v.clientId, email: '', name: '' };
  const repairList = await visitRepairs(tx, reader, id);
  const photos = await photosOf(
    tx,
    reader,
    id,
    repairList.map((x) => x.id),
  );
  const [photoRows, techs] = await Promise.all([
    photos.length
      ? tx
          .select({ id: attachments.id, storageKey: attachments.storageKey })
          .from(attachments)
          .where(
            inArray(
              attachments.id,
              photos.map((p) => p.id),
            ),
          )
      : Promise.resolve([]),
    techniciansOf(tx, [id]),
  ]);
  const keyOf = new Map(photoRows.map((p) => [p.id, p.storageKey]));
  return {
    visit: v,
    clientName: r.clientName,
    siteName: r.site.name,
    address: addressLine(r.site),
    timeZone: r.site.timeZone,
    wallName: r.wallName,
    ticket:
      v.ticketId && r.ticketNumber !== null ? { ref: ticketRef(r.ticketNumber, r.ticketCreatedAt!), title: r.ticketTitle ?? '' } : null,
    technicians: (techs.get(id) ?? []).map((t) => t.name),
    repairs: repairList,
    photos: photos.map((p) => ({ fileName: p.fileName, contentType: p.contentType, repairId: p.repairId, storageKey: keyOf.get(p.id)! })),
    signature: signature ?? null,
  };
}

async function loadSignature(key: string | null) {
  if (!key) return undefined;
  try {
    const chunks: Buffer[] = [];
    for await (const chunk of await getObjectStream(key)) chunks.push(Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk));
    return Buffer.concat(chunks);
  } catch (err) {
    logger.warn('visit signature missing from storage', { key, err: (err as Error).message });
    return undefined;
  }
}

/**
 * Completes the visit: summary, checklist, the signature (or why no one signed). The report PDF
 * is made first and stored with the signature; then one transaction saves the closing, keeps the
 * report, moves the maintenance plan on and queues the report mail to the client's people.
 */
export async function closeVisit(actor: Actor, id: string, input: CloseVisitInput): Promise<VisitDetail> {
  const r = await visibleVisit(db(), actor, id);
  const techs = (await techniciansOf(db(), [id])).get(id) ?? [];
  if (!isOffice(actor) && !techs.some((t) => t.id === actor.userId)) {
    throw forbidden('forbidden', 'Only the visit’s technicians and the office can close this visit.');
  }
  if (!isOpen(r.v)) throw conflict('visit_closed', `This visit is already ${r.v.status}.`, { status: `The visit is ${r.v.status}.` });

  const now = new Date();
  const png = input.signature ? signaturePng(input.signature) : undefined;
  const closing: Partial<VisitRow> = {
    status: 'completed',
    completedAt: now,
    summary: input.summary,
    checklist: input.checklist ?? [],
    signedByName: png ? (input.signedByName ?? null) : null,
    signedAt: png ? now : null,
    unsignedReason: png ? null : (input.unsignedReason ?? null),
  };
  const stored: string[] = [];
  try {
    if (png) {
      closing.signatureKey = (await putObject(newStorageKey(`visits/${id}/signature`), png, 'image/png')).key;
      stored.push(closing.signatureKey);
    }
    const data = await reportData(db(), id, closing, png);
    const pdf = await renderVisitReport(data);
    const reportKey = (await putObject(newStorageKey(`visits/${id}/report`), pdf, 'application/pdf')).key;
    stored.push(reportKey);

    await db().transaction(async (tx) => {
      const [before] = await tx.select().from(visits).where(eq(visits.id, id)).for('update');
      if (!isOpen(before)) throw conflict('visit_closed', `This visit is already ${before.status}.`);
      const [after] = await tx
        .update(visits)
        .set({ ...closing, reportKey, updatedAt: now })
        .where(eq(visits.id, id))
        .returning();
      await recordAudit(tx, { actor, entity: 'visit', entityId: id, action: 'closed', before, after });
      await moveMaintenancePlan(tx, actor, after, data.timeZone);
      const sent = await mailVisitReport(tx, await forMail(tx, id), { storageKey: reportKey, fileName: reportFileName(data) });
      if (sent) await tx.update(visits).set({ reportSentAt: now }).where(eq(visits.id, id));
    });
  } catch (err) {
    for (const key of stored) await deleteObject(key).catch(() => {});
    throw err;
  }
  return getVisit(actor, id);
}

/** "2026-12-10" + 6 months, the day kept or clamped to the month's last (Aug 31 + 6 → Feb 28). */
export function addMonths(isoDay: string, months: number): string {
  const [y, m, d] = isoDay.split('-').map(Number);
  const first = new Date(Date.UTC(y, m - 1 + months, 1));
  const last = new Date(Date.UTC(first.getUTCFullYear(), first.getUTCMonth() + 1, 0)).getUTCDate();
  return new Date(Date.UTC(first.getUTCFullYear(), first.getUTCMonth(), Math.min(d, last))).toISOString().slice(0, 10);
}

/** A maintenance visit done: its plan was last done today (at the site) and is next due an interval on. */
async function moveMaintenancePlan(tx: Tx, actor: Actor, v: VisitRow, timeZone: string) {
  if (v.kind !== 'maintenance' || !v.maintenancePlanId) return;
  const [plan] = await tx.select().from(maintenancePlans).where(eq(maintenancePlans.id, v.maintenancePlanId)).for('update');
  if (!plan) return;
  const doneOn = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(v.completedAt!);
  const [after] = await tx
    .update(maintenancePlans)
    .set({ lastDoneOn: doneOn, nextDueOn: addMonths(doneOn, plan.intervalMonths), updatedAt: new Date() })
    .where(eq(maintenancePlans.id, plan.id))
    .returning();
  await recordAudit(tx, { actor, entity: 'maintenance_plan', entityId: plan.id, action: 'done', before: plan, after });
}

/**
 * The kept report of a completed visit. A completed visit without one (closed before reports
 * were kept) gets it made now, kept and returned.
 */
export async function visitReport(actor: Actor, id: string): Promise<{ fileName: string; body: Buffer | Readable }> {
  const r = await visibleVisit(db(), actor, id);
  if (r.v.status !== 'completed') throw notFound('Report');
  const fileName = reportFileName({
    siteName: r.site.name,
    ticket: r.ticketNumber !== null ? { ref: ticketRef(r.ticketNumber, r.ticketCreatedAt!) } : null,
    visit: r.v,
    timeZone: r.site.timeZone,
  });
  if (r.v.reportKey) return { fileName, body: await getObjectStream(r.v.reportKey) };
  const data = await reportData(db(), id, {}, await loadSignature(r.v.signatureKey));
  const pdf = await renderVisitReport(data);
  const { key } = await putObject(newStorageKey(`visits/${id}/report`), pdf, 'application/pdf');
  const [kept] = await db()
    .update(visits)
    .set({ reportKey: key })
    .where(and(eq(visits.id, id), sql`${visits.reportKey} is null`))
    .returning({ id: visits.id });
  // Made twice at once: keep the first, drop this copy.
  if (!kept) await deleteObject(key).catch(() => {});
  return { fileName, body: pdf };
}
