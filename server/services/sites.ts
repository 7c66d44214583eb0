import { and, eq, ilike, isNull, or } from 'drizzle-orm';
import type { Page } from '../../shared/schemas/common.js';
import type { ListSitesQuery, SiteInput, SitePatch } from '../../shared/schemas/sites.js';
import type { SiteContact, SiteDetail, SiteSummary } from '../../shared/schemas/sites.js';
import { db } from '../db/client.js';
import { clients, contacts, sites } from '../db/schema/clients.js';
import { walls } from '../db/schema/walls.js';
import { badRequest } from '../errors.js';
import type { Actor } from '../middleware/auth.js';
import { recordAudit } from './audit.js';
import { siteWallCount } from './counts.js';
import { cursorValue, likePattern, orderFor } from './clients.js';
import { afterCursor, decodeCursor, pageOf } from './pagination.js';
import { found, isStaff, tenantWhere } from './scope.js';

export async function listSites(actor: Actor, query: ListSitesQuery): Promise<Page<SiteSummary>> {
  const sortColumn = query.sort === 'city' ? sites.city : query.sort === 'createdAt' ? sites.createdAt : sites.name;
  const pattern = query.q ? likePattern(query.q) : undefined;
  const rows = await db()
    .select({
      id: sites.id,
      clientId: sites.clientId,
      clientName: clients.name,
      name: sites.name,
      city: sites.city,
      region: sites.region,
      country: sites.country,
      timeZone: sites.timeZone,
      createdAt: sites.createdAt,
      wallCount: siteWallCount,
    })
    .from(sites)
    .innerJoin(clients, eq(clients.id, sites.clientId))
    .where(
      and(
        tenantWhere(actor, sites.clientId),
        isNull(sites.archivedAt),
        query.clientId ? eq(sites.clientId, query.clientId) : undefined,
        pattern ? or(ilike(sites.name, pattern), ilike(sites.city, pattern), ilike(clients.name, pattern)) : undefined,
        afterCursor(sortColumn, sites.id, decodeCursor(query.cursor, 2), query.dir),
      ),
    )
    .orderBy(...orderFor(sortColumn, sites.id, query.dir))
    .limit(query.limit + 1);
  const key = (r: (typeof rows)[number]) => [
    cursorValue(query.sort === 'city' ? r.city : query.sort === 'createdAt' ? r.createdAt : r.name),
    r.id,
  ];
  const page = pageOf(rows, query.limit, key);
  return { items: page.items.map(presentSiteRow), nextCursor: page.nextCursor };
}

/** A row of the sites list. */
function presentSiteRow(r: Omit<SiteSummary, 'createdAt'> & { createdAt: Date }): SiteSummary {
  return {
    id: r.id,
    clientId: r.clientId,
    clientName: r.clientName,
    name: r.name,
    city: r.city,
    region: r.region,
    country: r.country,
    timeZone: r.timeZone,
    wallCount: r.wallCount,
    createdAt: r.createdAt.toISOString(),
  };
}

/** A contact as a site page lists it: the site's own and the organisation's. */
function presentSiteContact(c: typeof contacts.$inferSelect): SiteContact {
  return { id: c.id, name: c.name, title: c.title, email: c.email, phone: c.phone, siteId: c.siteId, receivesUpdates: c.receivesUpdates };
}

export async function getSite(actor: Actor, id: string): Promise<SiteDetail> {
  const [row] = await db()
    .select({ site: sites, clientName: clients.name })
    .from(sites)
    .innerJoin(clients, eq(clients.id, sites.clientId))
    .where(and(eq(sites.id, id), tenantWhere(actor, sites.clientId)));
  const { site, clientName } = found(row, 'Site');
  const siteContacts = await db()
    .select()
    .from(contacts)
    .where(and(eq(contacts.clientId, site.clientId), or(eq(contacts.siteId, id), isNull(contacts.siteId))));
  const siteWalls = await db()
    .select({ id: walls.id, name: walls.name, columns: walls.columns, rows: walls.rows, mounting: walls.mounting })
    .from(walls)
    .where(and(eq(walls.siteId, id), isNull(walls.archivedAt)))
    .orderBy(walls.name);
  return {
    id: site.id,
    clientId: site.clientId,
    clientName,
    name: site.name,
    address: site.address,
    city: site.city,
    region: site.region,
    postalCode: site.postalCode,
    country: site.country,
    timeZone: site.timeZone,
    accessNotes: site.accessNotes,
    ...(isStaff(actor) ? { internalNotes: site.internalNotes } : {}),
    archived: site.archivedAt !== null,
    contacts: siteContacts.map(presentSiteContact),
    walls: siteWalls.map((w) => ({ id: w.id, name: w.name, columns: w.columns, rows: w.rows, mounting: w.mounting })),
  } satisfies SiteDetail;
}

export async function createSite(actor: Actor, input: SiteInput) {
  const id = await db().transaction(async (tx) => {
    const [client] = await tx.select({ id: clients.id }).from(clients).where(eq(clients.id, input.clientId));
    if (!client) throw badRequest('validation_failed', 'That client does not exist.', { clientId: 'Unknown client.' });
    const [row] = await tx.insert(sites).values(input).returning();
    await recordAudit(tx, { actor, entity: 'site', entityId: row.id, action: 'created', after: row });
    return row.id;
  });
  return getSite(actor, id);
}

export async function updateSite(actor: Actor, id: string, input: SitePatch) {
  await db().transaction(async (tx) => {
    const [before] = await tx.select().from(sites).where(eq(sites.id, id)).for('update');
    found(before, 'Site');
    const { archived, ...fields } = input;
    const [after] = await tx
      .update(sites)
      .set({ ...fields, ...(archived === undefined ? {} : { archivedAt: archived ? (before.archivedAt ?? new Date()) : null }) })
      .where(eq(sites.id, id))
      .returning();
    await recordAudit(tx, { actor, entity: 'site', entityId: id, action: archived ? 'archived' : 'updated', before, after });
  });
  return getSite(actor, id);
}
