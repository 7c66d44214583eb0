// The table of every API route: who may call it, whether it writes, and how to fill its path with
// another organisation's record. tests/integration/route-matrix.test.ts checks each route against
// it (and fails on a route the table does not know, or an entry whose route is gone);
// tests/integration/route-fuzz.test.ts sends generated bad input to the routes that read a body
// or a query. Adding a route? Add its line here.
import { randomUUID } from 'node:crypto';
import type { Express } from 'express';
import { officeRoles, roles, staffRoles, type Role } from '../../shared/schemas/enums.js';
import { db } from '../../server/db/client.js';
import { contacts } from '../../server/db/schema/clients.js';
import { attachments } from '../../server/db/schema/files.js';
import { savedViews, ticketComments, tickets } from '../../server/db/schema/tickets.js';
import { repairs, visits } from '../../server/db/schema/visits.js';
import { cabinets, controllers } from '../../server/db/schema/walls.js';
import { createOrganisation, createUser, unique } from '../factories/index.js';

export type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

/** Another organisation's records, made by `createTheirRecords`. */
export interface TheirRecords {
  org: Awaited<ReturnType<typeof createOrganisation>>;
  /** A client user of that organisation (for a positive control: the same path answers them). */
  clientUserId: string;
  cabinet: typeof cabinets.$inferSelect;
  controller: typeof controllers.$inferSelect;
  contact: typeof contacts.$inferSelect;
  visit: typeof visits.$inferSelect;
  repair: typeof repairs.$inferSelect;
  /** Resolved, so that a client user who could see it could also close it. */
  ticket: typeof tickets.$inferSelect;
  comment: typeof ticketComments.$inferSelect;
  /** A photo on the ticket (the row only: no stored object is needed to be refused). */
  attachment: typeof attachments.$inferSelect;
  /** A saved ticket view of their client user. */
  view: typeof savedViews.$inferSelect;
}

/** An organisation with one of every record a client user may address by id. */
export async function createTheirRecords(): Promise<TheirRecords> {
  const org = await createOrganisation({ withWall: true });
  const wall = org.wall!;
  const clientUser = await createUser({ role: 'client', clientId: org.client.id });
  const [cabinet] = await db()
    .insert(cabinets)
    .values({ serial: unique('THEIRS').toUpperCase(), cabinetModelId: wall.cabinetModelId, wallId: wall.id, column: 1, row: 1, batch: 'X' })
    .returning();
  const [controller] = await db()
    .insert(controllers)
    .values({ wallId: wall.id, model: 'Processor', serial: unique('CTL').toUpperCase(), outputs: 4 })
    .returning();
  const [contact] = await db()
    .insert(contacts)
    .values({ clientId: org.client.id, name: 'Their contact', email: `${unique('them')}@example.test` })
    .returning();
  const start = new Date(Date.now() - 3 * 3600_000);
  const [visit] = await db()
    .insert(visits)
    .values({
      clientId: org.client.id,
      siteId: org.site.id,
      wallId: wall.id,
      kind: 'maintenance',
      status: 'completed',
      windowStart: start,
      windowEnd: new Date(start.getTime() + 2 * 3600_000),
      summary: 'Their visit',
      completedAt: new Date(),
    })
    .returning();
  const [repair] = await db()
    .insert(repairs)
    .values({
      clientId: org.client.id,
      wallId: wall.id,
      visitId: visit.id,
      cabinetId: cabinet.id,
      column: 1,
      row: 1,
      component: 'fan',
      fault: 'other',
      action: 'cleaned',
    })
    .returning();
  const [ticket] = await db()
    .insert(tickets)
    .values({
      clientId: org.client.id,
      siteId: org.site.id,
      wallId: wall.id,
      cells: [{ column: 1, row: 1 }],
      title: 'Their dark cabinet',
      priority: 'normal',
      status: 'resolved',
      resolvedAt: new Date(),
      reporterId: clientUser.id,
    })
    .returning();
  const [comment] = await db()
    .insert(ticketComments)
    .values({ ticketId: ticket.id, authorId: clientUser.id, body: 'Their comment', visibility: 'public' })
    .returning();
  const [attachment] = await db()
    .insert(attachments)
    .values({
      clientId: org.client.id,
      ticketId: ticket.id,
      kind: 'photo',
      storageKey: `test/${randomUUID()}.png`,
      fileName: 'their-photo.png',
      contentType: 'image/png',
      sizeBytes: 68,
    })
    .returning();
  const [view] = await db()
    .insert(savedViews)
    .values({ userId: clientUser.id, name: unique('Their view'), filters: { status: 'new' } })
    .returning();
  return { org, clientUserId: clientUser.id, cabinet, controller, contact, visit, repair, ticket, comment, attachment, view };
}

/** A 1 × 1 PNG, for uploads. */
export const tinyPng = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);

type Who = { public: string } | { roles: readonly Role[] };

export interface RouteEntry {
  /** Who may call it: the roles, or `public` with the reason it needs no session. */
  who: Who;
  /** Whether a call changes stored state (the CSRF header is checked on every non-GET anyway). */
  writes: boolean;
  /**
   * For a route a client user may call with an id in its path: the path filled with another
   * organisation's record. Absent for routes a client may not call, or without an id.
   */
  theirs?: (r: TheirRecords) => string;
  /** The body of that cross-organisation call (a write a client could otherwise make). */
  theirsBody?: (r: TheirRecords) => object;
  /** Sent as multipart with one file in the field `file`. */
  upload?: boolean;
  /**
   * The record is its user's own (scoped by user, not by the organisation filter): the
   * cross-organisation 404 still holds without server/services/scope.ts's tenantWhere.
   */
  ownerOnly?: string;
  /** A client-callable route with path params but no cross-organisation check: why. */
  noTenant?: string;
  /** A well-formed body, for the fuzz test to start from (routes that read a JSON body). */
  sample?: Record<string, unknown>;
  /** The route reads a query string (lists, searches): the fuzz test sends generated queries. */
  query?: boolean;
}

const ALL = roles;
const STAFF = staffRoles;
const OFFICE = officeRoles;
const ADMIN = ['admin'] as const;

export const routeTable: Record<string, RouteEntry> = {
  // — public: no session needed, each with its reason —
  'GET /api/health': { who: { public: 'health probe for the load balancer; never depends on a session' }, writes: false },
  'POST /api/auth/login': { who: { public: 'signing in' }, writes: true, sample: { email: 'a@b.test', password: 'x' } },
  'POST /api/auth/logout': { who: { public: 'signing out without a session is harmless (204)' }, writes: true },
  'GET /api/auth/session': { who: { public: 'the first load asks who is signed in; signed out is an answer' }, writes: false },
  'POST /api/auth/forgot': { who: { public: 'asking for a password reset link' }, writes: true, sample: { email: 'a@b.test' } },
  'GET /api/auth/tokens/:token': { who: { public: 'the set-password / reset link: its token is the credential' }, writes: false },
  'POST /api/auth/redeem': {
    who: { public: 'setting a password with the link’s token' },
    writes: true,
    sample: { token: 'x'.repeat(40), password: 'a long enough passphrase 7' },
  },

  // — the developer mailbox (only with the local SMTP fake) —
  'GET /api/dev/mailbox': { who: { roles: ADMIN }, writes: false },
  'GET /api/dev/mailbox/:id/attachments/:index': { who: { roles: ADMIN }, writes: false },

  // — own account —
  'GET /api/auth/me': { who: { roles: ALL }, writes: false },
  'POST /api/auth/password': {
    who: { roles: ALL },
    writes: true,
    sample: { currentPassword: 'x', newPassword: 'a long enough passphrase 7' },
  },

  // — calculators (pure computation) —
  'POST /api/calc/wall-plan': { who: { roles: ALL }, writes: false, sample: { columns: 4, rows: 2 } },
  'POST /api/calc/runs': { who: { roles: ALL }, writes: false, sample: { columns: 4, rows: 2, pattern: 'serpentine' } },
  'POST /api/calc/runs/validate': { who: { roles: ALL }, writes: false, sample: { columns: 4, rows: 2, runs: [] } },
  'POST /api/calc/spares': { who: { roles: ALL }, writes: false, sample: { cabinets: 100 } },
  'POST /api/calc/due': {
    who: { roles: ALL },
    writes: false,
    sample: { start: '2026-03-06T16:30:00-05:00', hours: 8, mode: 'business', timeZone: 'America/New_York' },
  },

  // — people and the audit log (admin) —
  'GET /api/users': { who: { roles: ADMIN }, writes: false, query: true },
  'POST /api/users': { who: { roles: ADMIN }, writes: true, sample: { email: 'x@y.test', name: 'X', role: 'technician' } },
  'PATCH /api/users/:id': { who: { roles: ADMIN }, writes: true, sample: { name: 'X' } },
  'POST /api/users/:id/invite': { who: { roles: ADMIN }, writes: true },
  'GET /api/audit': { who: { roles: ADMIN }, writes: false, query: true },

  // — the register —
  'GET /api/clients': { who: { roles: ALL }, writes: false, query: true },
  'GET /api/clients/:id': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/clients/${r.org.client.id}` },
  'POST /api/clients': { who: { roles: OFFICE }, writes: true, sample: { name: 'Client' } },
  'PATCH /api/clients/:id': { who: { roles: OFFICE }, writes: true, sample: { name: 'Client' } },
  'GET /api/service-plans': { who: { roles: STAFF }, writes: false },
  'POST /api/contacts': { who: { roles: OFFICE }, writes: true, sample: { clientId: randomUUID(), name: 'Contact' } },
  'PATCH /api/contacts/:id': { who: { roles: OFFICE }, writes: true, sample: { name: 'Contact' } },
  'DELETE /api/contacts/:id': { who: { roles: OFFICE }, writes: true },
  'GET /api/sites': { who: { roles: ALL }, writes: false, query: true },
  'GET /api/sites/:id': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/sites/${r.org.site.id}` },
  'POST /api/sites': { who: { roles: OFFICE }, writes: true, sample: { clientId: randomUUID(), name: 'Site', timeZone: 'UTC' } },
  'PATCH /api/sites/:id': { who: { roles: OFFICE }, writes: true, sample: { name: 'Site' } },
  'GET /api/walls/:id/documents': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/walls/${r.org.wall!.id}/documents` },
  'POST /api/walls/:id/documents': { who: { roles: STAFF }, writes: true },
  'PUT /api/walls/:id/plan': { who: { roles: OFFICE }, writes: true, sample: { columns: 4, rows: 2 } },
  'GET /api/walls/:id/spares': { who: { roles: STAFF }, writes: false, query: true },
  'POST /api/walls/from-plan': { who: { roles: OFFICE }, writes: true, sample: { name: 'Wall', siteId: randomUUID() } },
  'GET /api/walls': { who: { roles: ALL }, writes: false, query: true },
  'GET /api/walls/:id': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/walls/${r.org.wall!.id}` },
  'GET /api/walls/:id/cabinets': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/walls/${r.org.wall!.id}/cabinets` },
  'POST /api/walls': { who: { roles: OFFICE }, writes: true, sample: { name: 'Wall', siteId: randomUUID(), columns: 4, rows: 2 } },
  'PATCH /api/walls/:id': { who: { roles: OFFICE }, writes: true, sample: { name: 'Wall' } },
  'POST /api/walls/:id/cabinets': { who: { roles: OFFICE }, writes: true, sample: { serial: 'S-1', column: 1, row: 1 } },
  'POST /api/walls/:id/cabinets/import': { who: { roles: OFFICE }, writes: true },
  'GET /api/attachments/:id': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/attachments/${r.attachment.id}` },
  'DELETE /api/attachments/:id': { who: { roles: OFFICE }, writes: true },
  'GET /api/cabinets': { who: { roles: ALL }, writes: false, query: true },
  'GET /api/cabinets/by-serial/:serial': {
    who: { roles: ALL },
    writes: false,
    theirs: (r) => `/api/cabinets/by-serial/${encodeURIComponent(r.cabinet.serial)}`,
  },
  'GET /api/cabinets/:id': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/cabinets/${r.cabinet.id}` },
  'POST /api/cabinets/:id/move': { who: { roles: STAFF }, writes: true, sample: { wallId: randomUUID(), column: 1, row: 1 } },
  'POST /api/cabinets/:id/swap': { who: { roles: STAFF }, writes: true, sample: { withCabinetId: randomUUID() } },
  'PATCH /api/cabinets/:id': { who: { roles: STAFF }, writes: true, sample: { status: 'spare' } },
  'GET /api/cabinet-models': { who: { roles: ALL }, writes: false },
  'GET /api/cabinet-models/:id': {
    who: { roles: ALL },
    writes: false,
    noTenant: 'the cabinet model catalogue is shared by every organisation (datasheets, no client data)',
  },
  'POST /api/cabinet-models': { who: { roles: OFFICE }, writes: true, sample: { name: 'Model', widthMm: 500, heightMm: 500 } },
  'PATCH /api/cabinet-models/:id': { who: { roles: OFFICE }, writes: true, sample: { name: 'Model' } },
  'GET /api/controllers': { who: { roles: ALL }, writes: false, query: true },
  'GET /api/controllers/:id': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/controllers/${r.controller.id}` },
  'POST /api/controllers': { who: { roles: OFFICE }, writes: true, sample: { wallId: randomUUID(), model: 'Processor', outputs: 4 } },
  'PATCH /api/controllers/:id': { who: { roles: OFFICE }, writes: true, sample: { firmware: '1.0' } },
  'GET /api/search': { who: { roles: ALL }, writes: false, query: true },
  'GET /api/search/serials': { who: { roles: ALL }, writes: false, query: true },

  // — tickets —
  'GET /api/tickets': { who: { roles: ALL }, writes: false, query: true },
  'GET /api/tickets/clock-counts': { who: { roles: ALL }, writes: false },
  'POST /api/tickets': { who: { roles: ALL }, writes: true, sample: { siteId: randomUUID(), title: 'Dark cabinet', priority: 'normal' } },
  'GET /api/tickets/:id': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/tickets/${r.ticket.id}` },
  'PATCH /api/tickets/:id': {
    who: { roles: ALL },
    writes: true,
    theirs: (r) => `/api/tickets/${r.ticket.id}`,
    // Closing a resolved ticket is what a client user may do to their own.
    theirsBody: () => ({ status: 'closed' }),
    sample: { status: 'closed' },
  },
  'POST /api/tickets/:id/merge': { who: { roles: OFFICE }, writes: true, sample: { intoTicketId: randomUUID() } },
  'GET /api/tickets/:id/comments': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/tickets/${r.ticket.id}/comments` },
  'POST /api/tickets/:id/comments': {
    who: { roles: ALL },
    writes: true,
    theirs: (r) => `/api/tickets/${r.ticket.id}/comments`,
    theirsBody: () => ({ body: 'Not my ticket' }),
    sample: { body: 'A comment' },
  },
  'GET /api/tickets/:id/attachments': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/tickets/${r.ticket.id}/attachments` },
  'POST /api/tickets/:id/attachments': {
    who: { roles: ALL },
    writes: true,
    theirs: (r) => `/api/tickets/${r.ticket.id}/attachments`,
    upload: true,
  },
  'GET /api/ticket-views': { who: { roles: ALL }, writes: false },
  'POST /api/ticket-views': { who: { roles: ALL }, writes: true, sample: { name: 'Mine', filters: { status: 'new' } } },
  'DELETE /api/ticket-views/:id': {
    who: { roles: ALL },
    writes: true,
    theirs: (r) => `/api/ticket-views/${r.view.id}`,
    ownerOnly: 'a saved view belongs to the person who saved it',
  },
  'GET /api/staff': { who: { roles: STAFF }, writes: false },

  // — stock —
  'GET /api/stock': { who: { roles: ALL }, writes: false, query: true },
  'GET /api/stock/restock': { who: { roles: STAFF }, writes: false, query: true },
  'GET /api/stock/spare-cabinets': { who: { roles: ALL }, writes: false, query: true },
  'GET /api/stock/low': { who: { roles: STAFF }, writes: false },
  'GET /api/stock-movements': { who: { roles: STAFF }, writes: false, query: true },
  'POST /api/stock-movements': {
    who: { roles: STAFF },
    writes: true,
    sample: { partId: randomUUID(), kind: 'received', quantity: 1, toLocationId: randomUUID() },
  },
  'GET /api/parts': { who: { roles: STAFF }, writes: false, query: true },
  'GET /api/parts/:id': { who: { roles: STAFF }, writes: false },
  'POST /api/parts': { who: { roles: OFFICE }, writes: true, sample: { name: 'Receiving card', sku: 'RC-1' } },
  'PATCH /api/parts/:id': { who: { roles: OFFICE }, writes: true, sample: { name: 'Receiving card' } },
  'POST /api/stock-locations': { who: { roles: OFFICE }, writes: true, sample: { name: 'Van 1', kind: 'van' } },
  'PATCH /api/stock-locations/:id': { who: { roles: OFFICE }, writes: true, sample: { name: 'Van 1' } },
  'GET /api/stock-locations': { who: { roles: ALL }, writes: false, query: true },
  'GET /api/vendor-returns': { who: { roles: STAFF }, writes: false, query: true },
  'POST /api/vendor-returns': { who: { roles: OFFICE }, writes: true, sample: { partId: randomUUID(), quantity: 1 } },
  'PATCH /api/vendor-returns/:id': { who: { roles: OFFICE }, writes: true, sample: { status: 'shipped' } },
  'PUT /api/reorder-points': {
    who: { roles: OFFICE },
    writes: true,
    sample: { partId: randomUUID(), locationId: randomUUID(), minimum: 1, reorderQuantity: 2 },
  },
  'DELETE /api/reorder-points': { who: { roles: OFFICE }, writes: true, query: true },

  // — field work —
  'GET /api/repairs': { who: { roles: ALL }, writes: false, query: true },
  'POST /api/repairs': { who: { roles: STAFF }, writes: true, sample: { cabinetId: randomUUID(), component: 'fan', action: 'cleaned' } },
  'GET /api/repairs/:id/photos': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/repairs/${r.repair.id}/photos` },
  'POST /api/repairs/:id/photos': { who: { roles: STAFF }, writes: true },
  'GET /api/visits': { who: { roles: ALL }, writes: false, query: true },
  'POST /api/visits': { who: { roles: OFFICE }, writes: true, sample: { kind: 'maintenance', wallId: randomUUID() } },
  'GET /api/visits/:id': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/visits/${r.visit.id}` },
  'PATCH /api/visits/:id': { who: { roles: STAFF }, writes: true, sample: { summary: 'Done' } },
  'POST /api/visits/:id/close': { who: { roles: STAFF }, writes: true, sample: { summary: 'Done', checklist: [] } },
  'GET /api/visits/:id/report.pdf': { who: { roles: ALL }, writes: false, theirs: (r) => `/api/visits/${r.visit.id}/report.pdf` },

  // — the office board —
  'GET /api/board/walls': { who: { roles: OFFICE }, writes: false },
};

export const allRoles = roles;

/** Every route of the app, as `METHOD /path`, read from the Express router itself (with mount paths). */
export function routesOf(app: Express): string[] {
  interface Layer {
    rawPath?: string | string[];
    route?: { path: string; methods: Record<string, boolean> };
    handle?: { stack?: Layer[] };
  }
  const join = (prefix: string, path: string | string[] | undefined) => {
    if (Array.isArray(path)) throw new Error(`a route with several paths under ${prefix}: list each in the route table`);
    return path === undefined || path === '/' ? prefix : prefix + path;
  };
  const found: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (on && method !== '_all') found.push(`${method.toUpperCase()} ${join(prefix, layer.route.path)}`);
        }
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, join(prefix, layer.rawPath));
      }
    }
  };
  const router = (app as unknown as { router?: { stack: Layer[] } }).router;
  if (!router) throw new Error('Express 5 keeps its router on app.router: not found');
  walk(router.stack, '');
  return found;
}

/** A path with every parameter filled with something that names no record. */
export function fillNowhere(path: string): string {
  return path
    .replace(/:token\b/g, 'x'.repeat(40))
    .replace(/:serial\b/g, 'NO-SUCH-SERIAL')
    .replace(/:index\b/g, '0')
    .replace(/:id\b/g, randomUUID());
}

export function splitKey(key: string): { method: Method; path: string } {
  const [method, path] = key.split(' ');
  return { method: method as Method, path };
}
