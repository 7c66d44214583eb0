import { and, asc, eq, ilike, isNull, like } from 'drizzle-orm';
import type { SearchResults } from '../../shared/schemas/search.js';
import { db } from '../db/client.js';
import { clients, sites } from '../db/schema/clients.js';
import { cabinets, walls } from '../db/schema/walls.js';
import type { Actor } from '../middleware/auth.js';
import { likePattern } from './clients.js';
import { tenantWhere } from './scope.js';

const LIMIT = 8;

/** One box for serial prefixes and client, site and wall names, scoped like every other read. */
export async function search(actor: Actor, q: string): Promise<SearchResults> {
  const pattern = likePattern(q);
  const serialPrefix = `${q.toUpperCase().replace(/[%_\\]/g, '\\$&')}%`;
  const [clientRows, siteRows, wallRows, cabinetRows] = await Promise.all([
    db()
      .select({ id: clients.id, name: clients.name })
      .from(clients)
      .where(and(tenantWhere(actor, clients.id), isNull(clients.archivedAt), ilike(clients.name, pattern)))
      .orderBy(asc(clients.name))
      .limit(LIMIT),
    db()
      .select({ id: sites.id, name: sites.name, clientName: clients.name, city: sites.city })
      .from(sites)
      .innerJoin(clients, eq(clients.id, sites.clientId))
      .where(and(tenantWhere(actor, sites.clientId), isNull(sites.archivedAt), ilike(sites.name, pattern)))
      .orderBy(asc(sites.name))
      .limit(LIMIT),
    db()
      .select({ id: walls.id, name: walls.name, siteName: sites.name, clientName: clients.name })
      .from(walls)
      .innerJoin(sites, eq(sites.id, walls.siteId))
      .innerJoin(clients, eq(clients.id, walls.clientId))
      .where(and(tenantWhere(actor, walls.clientId), isNull(walls.archivedAt), ilike(walls.name, pattern)))
      .orderBy(asc(walls.name))
      .limit(LIMIT),
    db()
      .select({
        id: cabinets.id,
        serial: cabinets.serial,
        status: cabinets.status,
        wallId: walls.id,
        wallName: walls.name,
        column: cabinets.column,
        row: cabinets.row,
      })
      .from(cabinets)
      .leftJoin(walls, eq(walls.id, cabinets.wallId))
      .where(and(actor.role === 'client' ? tenantWhere(actor, walls.clientId) : undefined, like(cabinets.serial, serialPrefix)))
      .orderBy(asc(cabinets.serial))
      .limit(LIMIT),
  ]);
  return {
    clients: clientRows.map((c) => ({ id: c.id, name: c.name })),
    sites: siteRows.map((s) => ({ id: s.id, name: s.name, clientName: s.clientName, city: s.city })),
    walls: wallRows.map((w) => ({ id: w.id, name: w.name, siteName: w.siteName, clientName: w.clientName })),
    cabinets: cabinetRows.map((c) => ({
      id: c.id,
      serial: c.serial,
      status: c.status,
      wallId: c.wallId,
      wallName: c.wallName,
      column: c.column,
      row: c.row,
    })),
  };
}
