import { sql } from 'drizzle-orm';

// Correlated counts for list rows. Written with explicit table names: Drizzle leaves columns
// unqualified in a single-table select, and an unqualified outer column inside a subquery
// would silently bind to the subquery's own table.
export const clientSiteCount = sql<number>`(select count(*)::int from sites s where s.client_id = "clients"."id" and s.archived_at is null)`;
export const clientWallCount = sql<number>`(select count(*)::int from walls w where w.client_id = "clients"."id" and w.archived_at is null)`;
export const clientOpenTicketCount = sql<number>`(select count(*)::int from tickets t where t.client_id = "clients"."id" and t.status not in ('resolved','closed'))`;
export const siteWallCount = sql<number>`(select count(*)::int from walls w where w.site_id = "sites"."id" and w.archived_at is null)`;
export const wallOpenTicketCount = sql<number>`(select count(*)::int from tickets t where t.wall_id = "walls"."id" and t.status not in ('resolved','closed'))`;
