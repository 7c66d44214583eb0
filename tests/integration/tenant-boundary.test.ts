// The most important security property of the product: a client user never sees or changes
// another organisation's record, by any route, id, filter or search. Every answer about
// another organisation's record is 404, exactly as for a record that does not exist.
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { contacts } from '../../server/db/schema/clients.js';
import { cabinets, controllers } from '../../server/db/schema/walls.js';
import { repairs, visits } from '../../server/db/schema/visits.js';
import { createOrganisation, signedIn, unique, type Session } from '../factories/index.js';

let mine: Awaited<ReturnType<typeof createOrganisation>>;
let theirs: Awaited<ReturnType<typeof createOrganisation>>;
let me: Session;
let theirCabinet: typeof cabinets.$inferSelect;
let theirController: typeof controllers.$inferSelect;
let theirContact: typeof contacts.$inferSelect;
let theirVisit: typeof visits.$inferSelect;
let theirRepair: typeof repairs.$inferSelect;

beforeAll(async () => {
  mine = await createOrganisation({ withWall: true });
  theirs = await createOrganisation({ withWall: true });
  me = await signedIn('client', mine.client.id);
  [theirCabinet] = await db()
    .insert(cabinets)
    .values({
      serial: unique('THEIRS').toUpperCase(),
      cabinetModelId: theirs.wall!.cabinetModelId,
      wallId: theirs.wall!.id,
      column: 1,
      row: 1,
      batch: 'X',
    })
    .returning();
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
  [theirController] = await db()
    .insert(controllers)
    .values({ wallId: theirs.wall!.id, model: 'Processor', serial: unique('CTL').toUpperCase(), outputs: 4 })
    .returning();
  [theirContact] = await db()
    .insert(contacts)
    .values({ clientId: theirs.client.id, name: 'Their contact', email: 'them@example.test' })
    .returning();
  const start = new Date(Date.now() - 3 * 3600_000);
  [theirVisit] = await db()
    .insert(visits)
    .values({
      clientId: theirs.client.id,
      siteId: theirs.site.id,
      wallId: theirs.wall!.id,
      kind: 'maintenance',
      status: 'completed',
      windowStart: start,
      windowEnd: new Date(start.getTime() + 2 * 3600_000),
      summary: 'Their visit',
      completedAt: new Date(),
    })
    .returning();
  [theirRepair] = await db()
    .insert(repairs)
    .values({
      clientId: theirs.client.id,
      wallId: theirs.wall!.id,
      visitId: theirVisit.id,
      cabinetId: theirCabinet.id,
      column: 1,
      row: 1,
      component: 'fan',
      fault: 'other',
      action: 'cleaned',
    })
    .returning();
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
  ] as const)('trying to %s is 404', async (_what, method, path, body) => {
    const res = await me[method](path(), typeof body === 'function' ? body() : body);
    expect(res.status).toBe(404);
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
