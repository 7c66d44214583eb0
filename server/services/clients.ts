import type { ClientDetail, ClientSummary, ClientUserOption, Contact, ServicePlan } from '../../shared/schemas/clients.js';
import type { Page } from '../../shared/schemas/common.js';
import { and, asc, desc, eq, ilike, isNotNull, isNull, notInArray, sql } from 'drizzle-orm';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import type { ClientInput, ClientPatch, ContactInput, ContactPatch, ListClientsQuery } from '../../shared/schemas/clients.js';
import { db, type DbOrTx } from '../db/client.js';
import { users } from '../db/schema/accounts.js';
import { clients, contacts, servicePlans, sites } from '../db/schema/clients.js';
import { badRequest } from '../errors.js';
import type { Actor } from '../middleware/auth.js';
import { recordAudit } from './audit.js';
import { clientOpenTicketCount, clientSiteCount, clientWallCount, siteWallCount } from './counts.js';
import { afterCursor, decodeCursor, pageOf } from './pagination.js';
import { found, isStaff, tenantWhere } from './scope.js';

export const likePattern = (q: string) => `%${q.replace(/[%_\\]/g, '\\$&')}%`;
export const closedStatuses = ['resolved', 'closed'] as const;

/** Sort column and direction for keyset pages; the id breaks ties. */
export function orderFor(column: AnyPgColumn, id: AnyPgColumn, dir: 'asc' | 'desc') {
  return dir === 'asc' ? [asc(column), asc(id)] : [desc(column), desc(id)];
}

export const cursorValue = (v: unknown) => (v instanceof Date ? v.toISOString() : v);

export async function listClients(actor: Actor, query: ListClientsQuery): Promise<Page<ClientSummary>> {
  const sortColumn = query.sort === 'createdAt' ? clients.createdAt : clients.name;
  const rows = await db()
    .select({
      id: clients.id,
      name: clients.name,
      servicePlanId: clients.servicePlanId,
      servicePlanName: servicePlans.name,
      archivedAt: clients.archivedAt,
      createdAt: clients.createdAt,
      siteCount: clientSiteCount,
      wallCount: clientWallCount,
      openTicketCount: clientOpenTicketCount,
    })
    .from(clients)
    .leftJoin(servicePlans, eq(servicePlans.id, clients.servicePlanId))
    .where(
      and(
        tenantWhere(actor, clients.id),
        query.archived ? isNotNull(clients.archivedAt) : isNull(clients.archivedAt),
        query.q ? ilike(clients.name, likePattern(query.q)) : undefined,
        afterCursor(sortColumn, clients.id, decodeCursor(query.cursor, 2), query.dir),
      ),
    )
    .orderBy(...orderFor(sortColumn, clients.id, query.dir))
    .limit(query.limit + 1);
  const page = pageOf(rows, query.limit, (r) => [cursorValue(query.sort === 'createdAt' ? r.createdAt : r.name), r.id]);
  return { items: page.items.map(presentClientRow), nextCursor: page.nextCursor };
}

/** A row of the clients list. */
function presentClientRow(r: {
  id: string;
  name: string;
  servicePlanId: string | null;
  servicePlanName: string | null;
  siteCount: number;
  wallCount: number;
  openTicketCount: number;
  archivedAt: Date | null;
  createdAt: Date;
}): ClientSummary {
  return {
    id: r.id,
    name: r.name,
    servicePlan: r.servicePlanId ? { id: r.servicePlanId, name: r.servicePlanName ?? '' } : null,
    siteCount: r.siteCount,
    wallCount: r.wallCount,
    openTicketCount: r.openTicketCount,
    archived: r.archivedAt !== null,
    createdAt: r.createdAt.toISOString(),
  };
}

export function presentServicePlan(p: typeof servicePlans.$inferSelect): ServicePlan {
  return {
    id: p.id,
    name: p.name,
    clockMode: p.clockMode,
    businessDays: p.businessDays,
    dayStart: p.dayStart,
    dayEnd: p.dayEnd,
    targets: p.targets,
  };
}

function presentContact(c: typeof contacts.$inferSelect): Contact {
  return {
    id: c.id,
    clientId: c.clientId,
    siteId: c.siteId,
    name: c.name,
    title: c.title,
    email: c.email,
    phone: c.phone,
    receivesUpdates: c.receivesUpdates,
    userId: c.userId,
  };
}

/** The organisation's accounts a contact can sign in as (disabled ones left out). */
async function clientUserOptions(clientId: string): Promise<ClientUserOption[]> {
  return db()
    .select({ id: users.id, name: users.name, email: users.email })
    .from(users)
    .where(and(eq(users.clientId, clientId), eq(users.role, 'client'), isNull(users.disabledAt)))
    .orderBy(asc(users.name));
}

export async function getClient(actor: Actor, id: string): Promise<ClientDetail> {
  const [row] = await db()
    .select({ client: clients, plan: servicePlans })
    .from(clients)
    .leftJoin(servicePlans, eq(servicePlans.id, clients.servicePlanId))
    .where(and(eq(clients.id, id), tenantWhere(actor, clients.id)));
  const { client, plan } = found(row, 'Client');
  const contactRows = await db().select().from(contacts).where(eq(contacts.clientId, id)).orderBy(asc(contacts.name));
  const siteRows = await db()
    .select({
      id: sites.id,
      name: sites.name,
      city: sites.city,
      region: sites.region,
      timeZone: sites.timeZone,
      wallCount: siteWallCount,
    })
    .from(sites)
    .where(and(eq(sites.clientId, id), isNull(sites.archivedAt)))
    .orderBy(asc(sites.name));
  return {
    id: client.id,
    name: client.name,
    servicePlan: plan ? presentServicePlan(plan) : null,
    ...(isStaff(actor) ? { notes: client.notes } : {}),
    archived: client.archivedAt !== null,
    contacts: contactRows.map(presentContact),
    ...(isStaff(actor) ? { users: await clientUserOptions(id) } : {}),
    sites: siteRows.map((r) => ({ id: r.id, name: r.name, city: r.city, region: r.region, timeZone: r.timeZone, wallCount: r.wallCount })),
    createdAt: client.createdAt.toISOString(),
  } satisfies ClientDetail;
}

async function assertPlan(tx: DbOrTx, id: string | null | undefined) {
  if (!id) return;
  const [plan] = await tx.select({ id: servicePlans.id }).from(servicePlans).where(eq(servicePlans.id, id));
  if (!plan) throw badRequest('validation_failed', 'That service plan does not exist.', { servicePlanId: 'Unknown service plan.' });
}

export async function createClient(actor: Actor, input: ClientInput) {
  const id = await db().transaction(async (tx) => {
    await assertPlan(tx, input.servicePlanId);
    const [row] = await tx
      .insert(clients)
      .values({ name: input.name, servicePlanId: input.servicePlanId ?? null, notes: input.notes ?? '' })
      .returning();
    await recordAudit(tx, { actor, entity: 'client', entityId: row.id, action: 'created', after: row });
    return row.id;
  });
  return getClient(actor, id);
}

export async function updateClient(actor: Actor, id: string, input: ClientPatch) {
  await db().transaction(async (tx) => {
    const [before] = await tx.select().from(clients).where(eq(clients.id, id)).for('update');
    found(before, 'Client');
    await assertPlan(tx, input.servicePlanId);
    const { archived, ...fields } = input;
    const [after] = await tx
      .update(clients)
      .set({ ...fields, ...(archived === undefined ? {} : { archivedAt: archived ? (before.archivedAt ?? new Date()) : null }) })
      .where(eq(clients.id, id))
      .returning();
    await recordAudit(tx, { actor, entity: 'client', entityId: id, action: archived ? 'archived' : 'updated', before, after });
  });
  return getClient(actor, id);
}

export async function listServicePlans(): Promise<{ items: ServicePlan[] }> {
  const rows = await db().select().from(servicePlans).orderBy(asc(servicePlans.name));
  return { items: rows.map(presentServicePlan) };
}

// ---- contacts ----
async function assertSiteOfClient(tx: DbOrTx, siteId: string | null | undefined, clientId: string) {
  if (!siteId) return;
  const [site] = await tx
    .select({ id: sites.id })
    .from(sites)
    .where(and(eq(sites.id, siteId), eq(sites.clientId, clientId)));
  if (!site) throw badRequest('validation_failed', 'That site does not belong to this client.', { siteId: 'Not a site of this client.' });
}

/** A contact signs in only as a user of its own organisation. */
async function assertUserOfClient(tx: DbOrTx, userId: string | null | undefined, clientId: string) {
  if (!userId) return;
  const [user] = await tx
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.id, userId), eq(users.clientId, clientId), eq(users.role, 'client')));
  if (!user) throw badRequest('validation_failed', 'That person is not a user of this client.', { userId: 'Not a user of this client.' });
}

export async function createContact(actor: Actor, input: ContactInput) {
  return db().transaction(async (tx) => {
    const [client] = await tx.select({ id: clients.id }).from(clients).where(eq(clients.id, input.clientId));
    if (!client) throw badRequest('validation_failed', 'That client does not exist.', { clientId: 'Unknown client.' });
    await assertSiteOfClient(tx, input.siteId, input.clientId);
    await assertUserOfClient(tx, input.userId, input.clientId);
    const [row] = await tx
      .insert(contacts)
      .values({ ...input, siteId: input.siteId ?? null, email: input.email ?? null, userId: input.userId ?? null })
      .returning();
    await recordAudit(tx, { actor, entity: 'contact', entityId: row.id, action: 'created', after: row });
    return presentContact(row);
  });
}

export async function updateContact(actor: Actor, id: string, input: ContactPatch) {
  return db().transaction(async (tx) => {
    const [before] = await tx.select().from(contacts).where(eq(contacts.id, id)).for('update');
    found(before, 'Contact');
    await assertSiteOfClient(tx, input.siteId, before.clientId);
    await assertUserOfClient(tx, input.userId, before.clientId);
    const [after] = await tx.update(contacts).set(input).where(eq(contacts.id, id)).returning();
    await recordAudit(tx, { actor, entity: 'contact', entityId: id, action: 'updated', before, after });
    return presentContact(after);
  });
}

export async function deleteContact(actor: Actor, id: string) {
  await db().transaction(async (tx) => {
    const [before] = await tx.delete(contacts).where(eq(contacts.id, id)).returning();
    found(before, 'Contact');
    await recordAudit(tx, { actor, entity: 'contact', entityId: id, action: 'deleted', before });
  });
}

/** E-mail addresses that receive updates about a site: its contacts and the organisation's. */
export async function updateRecipients(tx: DbOrTx, clientId: string, siteId: string | null, exclude: string[] = []) {
  const rows = await tx
    .select({ email: contacts.email })
    .from(contacts)
    .where(
      and(
        eq(contacts.clientId, clientId),
        eq(contacts.receivesUpdates, true),
        isNotNull(contacts.email),
        siteId ? sql`(${contacts.siteId} is null or ${contacts.siteId} = ${siteId})` : undefined,
        exclude.length ? notInArray(contacts.email, exclude) : undefined,
      ),
    );
  return [...new Set(rows.map((r) => r.email!))];
}

/**
 * The addresses of the client's contacts linked to the account that signs in as `signInEmail`:
 * the same person listed under another address (a reply's author is mailed under none of them).
 */
export async function linkedContactAddresses(tx: DbOrTx, clientId: string, signInEmail: string) {
  const rows = await tx
    .select({ email: contacts.email })
    .from(contacts)
    .innerJoin(users, eq(users.id, contacts.userId))
    .where(and(eq(contacts.clientId, clientId), eq(users.email, signInEmail.trim().toLowerCase()), isNotNull(contacts.email)));
  return rows.map((r) => r.email!);
}
