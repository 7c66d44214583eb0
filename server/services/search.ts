import { and, asc, desc, eq, ilike, isNull, like, or, sql, type SQL } from 'drizzle-orm';
import type { PgSelect } from 'drizzle-orm/pg-core';
import {
  partMinLength,
  searchCountCap,
  ticketNumberIn,
  type SearchCabinet,
  type SearchResults,
  type SerialTailMatches,
} from '../../shared/schemas/search.js';
import { ticketRef } from '../../shared/schemas/tickets.js';
import { db } from '../db/client.js';
import { clients, sites } from '../db/schema/clients.js';
import { tickets } from '../db/schema/tickets.js';
import { cabinets, walls } from '../db/schema/walls.js';
import type { Actor } from '../middleware/auth.js';
import { likePattern } from './clients.js';
import { tenantWhere } from './scope.js';

const LIMIT = 8;
const TAIL_LIMIT = 20;

const escapeLike = (s: string) => s.replace(/[%_\\]/g, '\\$&');

/** How many rows a query finds, up to searchCountCap: the count stops reading there. */
async function countUpTo(query: PgSelect): Promise<number> {
  const [row] = await db()
    .select({ n: sql<number>`count(*)::int` })
    .from(query.limit(searchCountCap).as('matches'));
  return row?.n ?? 0;
}

/** Cabinets a caller may see: client users only those on their own walls (spares are stock). */
const visibleCabinets = (actor: Actor) => (actor.role === 'client' ? tenantWhere(actor, walls.clientId) : undefined);

/** A ticket's title and description as one text: the expression `tickets_text_trgm_idx` indexes. */
const ticketText = sql`(${tickets.title} || ' ' || ${tickets.description})`;

/** The ticket the query's number names, or tickets holding every word of it; the actor's own only. */
function ticketWhere(actor: Actor, q: string): SQL | undefined {
  const number = ticketNumberIn(q);
  const words = q.split(/\s+/).filter(Boolean);
  return and(
    tenantWhere(actor, tickets.clientId),
    or(number !== null ? eq(tickets.number, number) : undefined, and(...words.map((w) => sql`${ticketText} ilike ${likePattern(w)}`))),
  );
}

/**
 * Serials containing the query (upper-cased, as serials are stored), or for a query shorter
 * than a trigram the serial that is exactly it. Both use an index: the trigram GIN index on
 * serial for the contains-match, the unique index for the whole serial.
 */
function serialWhere(actor: Actor, q: string): SQL | undefined {
  const upper = q.toUpperCase();
  return and(
    visibleCabinets(actor),
    q.length >= partMinLength ? like(cabinets.serial, `%${escapeLike(upper)}%`) : eq(cabinets.serial, upper),
  );
}

/** Batch codes containing the query, any case (trigram GIN index on batch); whole codes when short. */
function batchWhere(actor: Actor, q: string): SQL | undefined {
  return and(
    visibleCabinets(actor),
    q.length >= partMinLength ? ilike(cabinets.batch, likePattern(q)) : sql`lower(${cabinets.batch}) = lower(${q})`,
    sql`${cabinets.batch} <> ''`,
  );
}

const cabinetColumns = {
  id: cabinets.id,
  serial: cabinets.serial,
  status: cabinets.status,
  batch: cabinets.batch,
  wallId: walls.id,
  wallName: walls.name,
  siteName: sites.name,
  column: cabinets.column,
  row: cabinets.row,
};

function cabinetsWhere(where: SQL | undefined) {
  return db()
    .select(cabinetColumns)
    .from(cabinets)
    .leftJoin(walls, eq(walls.id, cabinets.wallId))
    .leftJoin(sites, eq(sites.id, walls.siteId))
    .where(where)
    .$dynamic();
}

/** The whole serial first, then serials ending in the query (the tail a label shows), then the rest. */
const serialOrder = (upper: string) => [
  desc(sql`${cabinets.serial} = ${upper}`),
  desc(sql`${cabinets.serial} like ${`%${escapeLike(upper)}`}`),
  asc(cabinets.serial),
];

function presentCabinet(c: Awaited<ReturnType<ReturnType<typeof cabinetsWhere>['execute']>>[number]): SearchCabinet {
  return {
    id: c.id,
    serial: c.serial,
    status: c.status,
    batch: c.batch,
    wallId: c.wallId,
    wallName: c.wallName,
    siteName: c.siteName,
    column: c.column,
    row: c.row,
  };
}

/**
 * One box for everything a person may type: a ticket's number or words of its title or
 * description, client, site and wall names, and any part of a serial or batch code. A few of
 * each kind, with how many match in all; scoped like every other read.
 */
export async function search(actor: Actor, q: string): Promise<SearchResults> {
  const pattern = likePattern(q);
  const ticketsWhere = ticketWhere(actor, q);
  const number = ticketNumberIn(q);
  const clientsWhere = and(tenantWhere(actor, clients.id), isNull(clients.archivedAt), ilike(clients.name, pattern));
  const sitesWhere = and(tenantWhere(actor, sites.clientId), isNull(sites.archivedAt), ilike(sites.name, pattern));
  const wallsWhere = and(tenantWhere(actor, walls.clientId), isNull(walls.archivedAt), ilike(walls.name, pattern));
  const serialsWhere = serialWhere(actor, q);
  const batchesWhere = batchWhere(actor, q);
  // A batch's visible cabinets: for client users, those on their walls only.
  const batchCabinets = () => db().select({ batch: cabinets.batch }).from(cabinets).leftJoin(walls, eq(walls.id, cabinets.wallId));

  const [ticketRows, clientRows, siteRows, wallRows, cabinetRows, batchRows, counts] = await Promise.all([
    db()
      .select({
        id: tickets.id,
        number: tickets.number,
        createdAt: tickets.createdAt,
        title: tickets.title,
        status: tickets.status,
        priority: tickets.priority,
        clientName: clients.name,
        siteName: sites.name,
        wallName: walls.name,
      })
      .from(tickets)
      .innerJoin(clients, eq(clients.id, tickets.clientId))
      .innerJoin(sites, eq(sites.id, tickets.siteId))
      .leftJoin(walls, eq(walls.id, tickets.wallId))
      .where(ticketsWhere)
      .orderBy(...(number !== null ? [desc(sql`${tickets.number} = ${number}`)] : []), desc(tickets.createdAt), desc(tickets.id))
      .limit(LIMIT),
    db().select({ id: clients.id, name: clients.name }).from(clients).where(clientsWhere).orderBy(asc(clients.name)).limit(LIMIT),
    db()
      .select({ id: sites.id, name: sites.name, clientName: clients.name, city: sites.city })
      .from(sites)
      .innerJoin(clients, eq(clients.id, sites.clientId))
      .where(sitesWhere)
      .orderBy(asc(sites.name))
      .limit(LIMIT),
    db()
      .select({ id: walls.id, name: walls.name, siteName: sites.name, clientName: clients.name })
      .from(walls)
      .innerJoin(sites, eq(sites.id, walls.siteId))
      .innerJoin(clients, eq(clients.id, walls.clientId))
      .where(wallsWhere)
      .orderBy(asc(walls.name))
      .limit(LIMIT),
    serialMatchesQuery(actor, q),
    db()
      .select({ batch: cabinets.batch, cabinetCount: sql<number>`count(*)::int` })
      .from(cabinets)
      .leftJoin(walls, eq(walls.id, cabinets.wallId))
      .where(batchesWhere)
      .groupBy(cabinets.batch)
      .orderBy(asc(cabinets.batch))
      .limit(LIMIT),
    Promise.all([
      countUpTo(db().select({ id: tickets.id }).from(tickets).where(ticketsWhere).$dynamic()),
      countUpTo(db().select({ id: clients.id }).from(clients).where(clientsWhere).$dynamic()),
      countUpTo(db().select({ id: sites.id }).from(sites).where(sitesWhere).$dynamic()),
      countUpTo(db().select({ id: walls.id }).from(walls).where(wallsWhere).$dynamic()),
      countUpTo(
        db().select({ id: cabinets.id }).from(cabinets).leftJoin(walls, eq(walls.id, cabinets.wallId)).where(serialsWhere).$dynamic(),
      ),
      countUpTo(batchCabinets().where(batchesWhere).groupBy(cabinets.batch).$dynamic()),
    ]),
  ]);
  const [ticketCount, clientCount, siteCount, wallCount, cabinetCount, batchCount] = counts;
  return {
    tickets: ticketRows.map((t) => ({
      id: t.id,
      ref: ticketRef(t.number, t.createdAt),
      title: t.title,
      status: t.status,
      priority: t.priority,
      clientName: t.clientName,
      siteName: t.siteName,
      wallName: t.wallName,
    })),
    clients: clientRows.map((c) => ({ id: c.id, name: c.name })),
    sites: siteRows.map((s) => ({ id: s.id, name: s.name, clientName: s.clientName, city: s.city })),
    walls: wallRows.map((w) => ({ id: w.id, name: w.name, siteName: w.siteName, clientName: w.clientName })),
    cabinets: cabinetRows.map(presentCabinet),
    batches: batchRows.map((b) => ({ batch: b.batch, cabinetCount: b.cabinetCount })),
    counts: {
      tickets: ticketCount,
      clients: clientCount,
      sites: siteCount,
      walls: wallCount,
      cabinets: cabinetCount,
      batches: batchCount,
    },
  };
}

const serialTailWhere = (actor: Actor, tail: string) => {
  const upper = tail.toUpperCase();
  return and(
    visibleCabinets(actor),
    upper.length >= partMinLength ? like(cabinets.serial, `%${escapeLike(upper)}`) : eq(cabinets.serial, upper),
  );
};

/** The Scan page's matches for a tail, not yet run (the query-plan tests read its plan). */
export const serialTailQuery = (actor: Actor, tail: string) =>
  cabinetsWhere(serialTailWhere(actor, tail))
    .orderBy(...serialOrder(tail.toUpperCase()))
    .limit(TAIL_LIMIT);

/** The search box's cabinets for a query, not yet run (the query-plan tests read its plan). */
export const serialMatchesQuery = (actor: Actor, q: string) =>
  cabinetsWhere(serialWhere(actor, q))
    .orderBy(...serialOrder(q.toUpperCase()))
    .limit(LIMIT);

/**
 * The Scan page's typed lookup: the cabinet whose serial is what was typed, or the cabinets
 * whose serial ends in it (a technician behind a wall reads the end of the label). Fewer
 * characters than a trigram match only a whole serial.
 */
export async function serialsEndingIn(actor: Actor, tail: string): Promise<SerialTailMatches> {
  const where = serialTailWhere(actor, tail);
  const [rows, total] = await Promise.all([
    serialTailQuery(actor, tail),
    countUpTo(db().select({ id: cabinets.id }).from(cabinets).leftJoin(walls, eq(walls.id, cabinets.wallId)).where(where).$dynamic()),
  ]);
  return { items: rows.map(presentCabinet), total };
}
