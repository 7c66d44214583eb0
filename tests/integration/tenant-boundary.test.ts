// The most important security property of the product: a client user never sees or changes
// another organisation's record, by any route, id, filter or search. Every answer about
// another organisation's record is 404, exactly as for a record that does not exist.
import { eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { contacts } from '../../server/db/schema/clients.js';
import { attachments } from '../../server/db/schema/files.js';
import { savedViews, ticketComments, tickets } from '../../server/db/schema/tickets.js';
import { cabinets } from '../../server/db/schema/walls.js';
import { createOrganisation, signedIn, unique, type Session } from '../factories/index.js';
import { createTheirRecords, tinyPng, type TheirRecords } from './route-table.js';

let mine: Awaited<ReturnType<typeof createOrganisation>>;
let theirs: TheirRecords['org'];
let their: TheirRecords;
let me: Session;
let theirCabinet: TheirRecords['cabinet'];
let theirController: TheirRecords['controller'];
let theirContact: TheirRecords['contact'];
let theirVisit: TheirRecords['visit'];
let theirRepair: TheirRecords['repair'];

beforeAll(async () => {
  mine = await createOrganisation({ withWall: true });
  their = await createTheirRecords();
  ({
    org: theirs,
    cabinet: theirCabinet,
    controller: theirController,
    contact: theirContact,
    visit: theirVisit,
    repair: theirRepair,
  } = their);
  me = await signedIn('client', mine.client.id);
  await db()
    .insert(cabinets)
    .values({
      serial: unique('MINE').toUpperCase(),
      cabinetModelId: mine.wall!.cabinetModelId,
      wallId: mine.wall!.id,
      column: 1,
      row: 1,
      batch: 'Y',
    });
});

const json = { 'X-Requested-With': 'gridkeep' };

describe('a client user and another organisation’s records', () => {
  it.each([
    ['client', () => `/api/clients/${theirs.client.id}`],
    ['site', () => `/api/sites/${theirs.site.id}`],
    ['wall', () => `/api/walls/${theirs.wall!.id}`],
    ['wall map', () => `/api/walls/${theirs.wall!.id}/cabinets`],
    ['cabinet', () => `/api/cabinets/${theirCabinet.id}`],
    ['cabinet by serial', () => `/api/cabinets/by-serial/${theirCabinet.serial}`],
    ['controller', () => `/api/controllers/${theirController.id}`],
    ['wall’s spares', () => `/api/walls/${theirs.wall!.id}/spares`],
    ['visit', () => `/api/visits/${theirVisit.id}`],
    ['visit report', () => `/api/visits/${theirVisit.id}/report.pdf`],
    ['repair’s photos', () => `/api/repairs/${theirRepair.id}/photos`],
  ])('reading their %s by id is 404', async (_what, path) => {
    const res = await me.get(path());
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  // Staff-only writes: a client user stops at the role gate (404, as for a route that is not
  // there) before any organisation filter is reached. They keep the gate honest; the writes a
  // client user may make are tried across organisations below.
  it.each([
    ['edit their client', 'patch', () => `/api/clients/${theirs.client.id}`, { name: 'Mine now' }],
    ['edit their site', 'patch', () => `/api/sites/${theirs.site.id}`, { name: 'Mine now' }],
    ['edit their wall', 'patch', () => `/api/walls/${theirs.wall!.id}`, { name: 'Mine now' }],
    ['place a cabinet on their wall', 'post', () => `/api/walls/${theirs.wall!.id}/cabinets`, { serial: 'EVIL-1', column: 2, row: 2 }],
    ['move their cabinet', 'post', () => `/api/cabinets/${theirCabinet.id}/move`, () => ({ wallId: mine.wall!.id, column: 2, row: 2 })],
    ['change their cabinet', 'patch', () => `/api/cabinets/${theirCabinet.id}`, { status: 'retired' }],
    ['edit their controller', 'patch', () => `/api/controllers/${theirController.id}`, { firmware: 'x' }],
    ['edit their contact', 'patch', () => `/api/contacts/${theirContact.id}`, { name: 'x' }],
    ['change their visit', 'patch', () => `/api/visits/${theirVisit.id}`, { summary: 'Mine now' }],
    ['close their visit', 'post', () => `/api/visits/${theirVisit.id}/close`, { summary: 'x', checklist: [], unsignedReason: 'x' }],
  ] as const)('trying to %s stops at the role gate (404)', async (_what, method, path, body) => {
    const res = await me[method](path(), typeof body === 'function' ? body() : body);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('importing into their wall is 404', async () => {
    const res = await me.agent
      .post(`/api/walls/${theirs.wall!.id}/cabinets/import`)
      .set(json)
      .set('Content-Type', 'text/csv')
      .send('serial,column,row,batch\nEVIL-2,2,2,A');
    expect(res.status).toBe(404);
  });

  it.each([
    ['walls', () => `/api/walls?clientId=${theirs.client.id}`],
    ['walls by site', () => `/api/walls?siteId=${theirs.site.id}`],
    ['sites', () => `/api/sites?clientId=${theirs.client.id}`],
    ['cabinets', () => `/api/cabinets?wallId=${theirs.wall!.id}`],
    ['cabinets by serial prefix', () => `/api/cabinets?serial=${theirCabinet.serial}`],
    ['controllers', () => `/api/controllers?wallId=${theirs.wall!.id}`],
    ['visits by site', () => `/api/visits?siteId=${theirs.site.id}`],
    ['visits by wall', () => `/api/visits?wallId=${theirs.wall!.id}`],
    ['repairs by wall', () => `/api/repairs?wallId=${theirs.wall!.id}`],
    ['repairs by cabinet', () => `/api/repairs?cabinetId=${theirCabinet.id}`],
    ['repairs by visit', () => `/api/repairs?visitId=${theirVisit.id}`],
  ])('filtering %s by their ids finds nothing', async (_what, path) => {
    const res = await me.get(path());
    expect(res.status).toBe(200);
    expect(res.body.items).toEqual([]);
  });

  it('lists only their own organisation', async () => {
    const clients = await me.get('/api/clients?limit=500');
    expect(clients.body.items.map((c: { id: string }) => c.id)).toEqual([mine.client.id]);
    const walls = await me.get('/api/walls?limit=500');
    expect(walls.body.items.map((w: { id: string }) => w.id)).toEqual([mine.wall!.id]);
    const sites = await me.get('/api/sites?limit=500');
    expect(sites.body.items.map((s: { id: string }) => s.id)).toEqual([mine.site.id]);
  });

  it('search finds nothing of theirs', async () => {
    for (const q of [theirs.client.name, theirs.site.name, theirs.wall!.name, theirCabinet.serial]) {
      const res = await me.get(`/api/search?q=${encodeURIComponent(q)}`);
      expect(res.status).toBe(200);
      expect([...res.body.clients, ...res.body.sites, ...res.body.walls, ...res.body.cabinets]).toEqual([]);
    }
  });

  it('staff-only areas answer 404, not 403', async () => {
    for (const path of ['/api/users', '/api/audit', '/api/service-plans']) {
      expect((await me.get(path)).status).toBe(404);
    }
    expect((await me.post('/api/contacts', { clientId: mine.client.id, name: 'x' })).status).toBe(404);
    expect((await me.post('/api/clients', { name: 'x' })).status).toBe(404);
    expect((await me.post('/api/visits', { kind: 'maintenance', wallId: mine.wall!.id })).status).toBe(404);
    expect((await me.post('/api/repairs', { cabinetId: theirCabinet.id })).status).toBe(404);
  });

  it('sees its own records without internal notes', async () => {
    const client = await me.get(`/api/clients/${mine.client.id}`);
    expect(client.status).toBe(200);
    expect(client.body).not.toHaveProperty('notes');
    const site = await me.get(`/api/sites/${mine.site.id}`);
    expect(site.body).not.toHaveProperty('internalNotes');
    const wall = await me.get(`/api/walls/${mine.wall!.id}`);
    expect(wall.body).not.toHaveProperty('internalNotes');
    const map = await me.get(`/api/walls/${mine.wall!.id}/cabinets`);
    expect(map.body.items).toHaveLength(1);
  });
});

// The writes a client user may make, each aimed at another organisation's record. Only the
// organisation filter (server/services/scope.ts tenantWhere) keeps them out: each is named
// "[tenant filter]", and scripts/check-tenant-tests.ts removes that filter and expects every one
// of them to fail. OWASP ASVS 5.0 V8.2.2 (data-specific access) and V8.4.1 (tenant isolation) —
// from memory.
describe('a client user writing to another organisation’s records [tenant filter]', () => {
  it('closing their resolved ticket is 404, and the ticket stays resolved [tenant filter]', async () => {
    const res = await me.patch(`/api/tickets/${their.ticket.id}`, { status: 'closed' });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    const [row] = await db().select().from(tickets).where(eq(tickets.id, their.ticket.id));
    expect(row.status).toBe('resolved');
  });

  it('commenting on their ticket is 404, and no comment is stored [tenant filter]', async () => {
    const res = await me.post(`/api/tickets/${their.ticket.id}/comments`, { body: 'Not my ticket' });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    const rows = await db().select().from(ticketComments).where(eq(ticketComments.ticketId, their.ticket.id));
    expect(rows.map((r) => r.body)).toEqual(['Their comment']);
  });

  it('attaching a photo to their ticket is 404, and nothing is stored [tenant filter]', async () => {
    const res = await me.agent
      .post(`/api/tickets/${their.ticket.id}/attachments`)
      .set(json)
      .attach('file', tinyPng, { filename: 'photo.png', contentType: 'image/png' });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    const rows = await db().select().from(attachments).where(eq(attachments.ticketId, their.ticket.id));
    expect(rows.map((r) => r.id)).toEqual([their.attachment.id]);
  });

  it('opening a ticket at their site is refused, naming the site, and no ticket is stored [tenant filter]', async () => {
    const res = await me.post('/api/tickets', { siteId: theirs.site.id, title: 'Opened on their site', priority: 'low' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('siteId');
    const rows = await db().select().from(tickets).where(eq(tickets.siteId, theirs.site.id));
    expect(rows.map((r) => r.id)).toEqual([their.ticket.id]);
  });

  it('reading their ticket, its comments and its attachments is 404 [tenant filter]', async () => {
    for (const path of [
      `/api/tickets/${their.ticket.id}`,
      `/api/tickets/${their.ticket.id}/comments`,
      `/api/tickets/${their.ticket.id}/attachments`,
      `/api/attachments/${their.attachment.id}`,
    ]) {
      const res = await me.get(path);
      expect(res.status, path).toBe(404);
    }
  });
});

describe('deleting another organisation’s records', () => {
  it('their saved ticket view: 404, and it is still there', async () => {
    const res = await me.delete(`/api/ticket-views/${their.view.id}`);
    expect(res.status).toBe(404);
    expect(await db().select().from(savedViews).where(eq(savedViews.id, their.view.id))).toHaveLength(1);
  });

  it('their contact: 404, and it is still there', async () => {
    const res = await me.delete(`/api/contacts/${theirContact.id}`);
    expect(res.status).toBe(404);
    expect(await db().select().from(contacts).where(eq(contacts.id, theirContact.id))).toHaveLength(1);
  });

  it('their ticket photo: 404, and it is still there', async () => {
    const res = await me.delete(`/api/attachments/${their.attachment.id}`);
    expect(res.status).toBe(404);
    expect(await db().select().from(attachments).where(eq(attachments.id, their.attachment.id))).toHaveLength(1);
  });

  it('a reorder point: 404 (stock is the office’s)', async () => {
    const res = await me.delete(`/api/reorder-points?partId=${crypto.randomUUID()}&locationId=${crypto.randomUUID()}`);
    expect(res.status).toBe(404);
  });
});
