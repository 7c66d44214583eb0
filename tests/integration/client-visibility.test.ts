// What a client user reads of its own organisation: every field the staff keep to themselves is
// left out, resource by resource and field by field (DEVELOPERS.md, "The tenant boundary":
// client users never get internal notes, internal comments, stock or costs). Each staff-only
// field holds a value found nowhere else; the staff's answer must carry it under its name (so a
// renamed field fails here too) and the client's answer must carry it nowhere in its text.
// OWASP ASVS 5.0 V8.2.3 (field-level access: a user reads only the fields it is allowed to).
import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { db } from '../../server/db/client.js';
import { clients, sites } from '../../server/db/schema/clients.js';
import { attachments } from '../../server/db/schema/files.js';
import { parts, stockLocations } from '../../server/db/schema/stock.js';
import { ticketComments, tickets } from '../../server/db/schema/tickets.js';
import { repairs, visits, visitTechnicians } from '../../server/db/schema/visits.js';
import { cabinets, controllers, walls } from '../../server/db/schema/walls.js';
import { createOrganisation, createUser, signIn, signedIn, unique, type Session } from '../factories/index.js';

/** A value that appears in no other field of any answer. */
const secret = (what: string) => `staffonly-${what}-${randomUUID().slice(0, 8)}`;
const everySecret: string[] = [];
const kept = (what: string) => {
  const s = secret(what);
  everySecret.push(s);
  return s;
};

type Org = Awaited<ReturnType<typeof createOrganisation>>;
let org: Org;
let staff: Session;
let client: Session;
let cabinet: typeof cabinets.$inferSelect;
let controller: typeof controllers.$inferSelect;
let ticket: typeof tickets.$inferSelect;
let visit: typeof visits.$inferSelect;
let technicianName: string;

const s = {
  clientNotes: kept('client-notes'),
  siteInternal: kept('site-internal'),
  wallInternal: kept('wall-internal'),
  cabinetNotes: kept('cabinet-notes'),
  controllerNotes: kept('controller-notes'),
  historyNote: kept('history-note'),
  repairNotes: kept('repair-notes'),
  stockLocation: kept('stock-location'),
  // The part fitted is named to the client on a repair (not on the ticket's work lines), never its cost.
  partName: secret('part-name'),
  internalComment: kept('internal-comment'),
  internalFile: `${kept('internal-file')}.pdf`,
  internalDocument: `${kept('internal-document')}.pdf`,
  visitInternal: kept('visit-internal'),
  // A staff member's name is public on a comment they wrote, not in a cabinet's history.
  staffName: secret('staff-name'),
};

beforeAll(async () => {
  org = await createOrganisation({ withWall: true });
  const wall = org.wall!;
  const admin = await createUser({ role: 'admin', name: s.staffName });
  staff = await signIn(admin);
  client = await signedIn('client', org.client.id);
  technicianName = unique('Technician');
  const tech = await createUser({ role: 'technician', name: technicianName });
  await db().update(clients).set({ notes: s.clientNotes }).where(eq(clients.id, org.client.id));
  await db().update(sites).set({ internalNotes: s.siteInternal }).where(eq(sites.id, org.site.id));
  await db().update(walls).set({ internalNotes: s.wallInternal }).where(eq(walls.id, wall.id));
  [cabinet] = await db()
    .insert(cabinets)
    .values({
      serial: unique('VIS').toUpperCase(),
      cabinetModelId: wall.cabinetModelId,
      wallId: wall.id,
      column: 1,
      row: 1,
      notes: s.cabinetNotes,
    })
    .returning();
  // A move by the staff, with a staff-only note: the history names the actor and keeps the note.
  const moved = await staff.post(`/api/cabinets/${cabinet.id}/move`, { wallId: wall.id, column: 2, row: 1, note: s.historyNote });
  expect(moved.status, JSON.stringify(moved.body)).toBe(200);
  [controller] = await db()
    .insert(controllers)
    .values({ wallId: wall.id, model: 'Processor', serial: unique('CTL').toUpperCase(), outputs: 4, notes: s.controllerNotes })
    .returning();
  [ticket] = await db()
    .insert(tickets)
    .values({
      clientId: org.client.id,
      siteId: org.site.id,
      wallId: wall.id,
      title: 'Dark module',
      priority: 'normal',
      cells: [{ column: 2, row: 1 }],
    })
    .returning();
  await db()
    .insert(ticketComments)
    .values([
      { ticketId: ticket.id, authorId: admin.id, visibility: 'internal', body: s.internalComment },
      { ticketId: ticket.id, authorId: admin.id, visibility: 'public', body: 'We are on it.' },
    ]);
  await db()
    .insert(attachments)
    .values([
      {
        clientId: org.client.id,
        ticketId: ticket.id,
        kind: 'document',
        storageKey: unique('k'),
        fileName: s.internalFile,
        contentType: 'application/pdf',
        sizeBytes: 10,
        internal: true,
      },
      {
        clientId: org.client.id,
        ticketId: ticket.id,
        kind: 'document',
        storageKey: unique('k'),
        fileName: 'public.pdf',
        contentType: 'application/pdf',
        sizeBytes: 10,
      },
      {
        clientId: org.client.id,
        wallId: wall.id,
        kind: 'document',
        storageKey: unique('k'),
        fileName: s.internalDocument,
        contentType: 'application/pdf',
        sizeBytes: 10,
        internal: true,
      },
    ]);
  const start = new Date(Date.now() + 24 * 3600_000);
  const end = new Date(start.getTime() + 2 * 3600_000);
  [visit] = await db()
    .insert(visits)
    .values({
      clientId: org.client.id,
      siteId: org.site.id,
      wallId: wall.id,
      ticketId: ticket.id,
      kind: 'ticket',
      status: 'planned',
      windowStart: start,
      windowEnd: end,
      internalNotes: s.visitInternal,
    })
    .returning();
  // The same technician booked at an overlapping time elsewhere: a conflict the office sees.
  const elsewhere = await createOrganisation();
  const [overlap] = await db()
    .insert(visits)
    .values({
      clientId: elsewhere.client.id,
      siteId: elsewhere.site.id,
      kind: 'maintenance',
      status: 'planned',
      windowStart: start,
      windowEnd: end,
    })
    .returning();
  await db()
    .insert(visitTechnicians)
    .values([
      { visitId: visit.id, userId: tech.id },
      { visitId: overlap.id, userId: tech.id },
    ]);
  const [part] = await db()
    .insert(parts)
    .values({ sku: unique('MOD'), name: s.partName, kind: 'module', unitCost: '412.50' })
    .returning();
  const [location] = await db().insert(stockLocations).values({ name: s.stockLocation, kind: 'warehouse' }).returning();
  await db().insert(repairs).values({
    clientId: org.client.id,
    wallId: wall.id,
    visitId: visit.id,
    ticketId: ticket.id,
    cabinetId: cabinet.id,
    column: 2,
    row: 1,
    component: 'module',
    fault: 'dead_module',
    action: 'replaced',
    partId: part.id,
    partBatch: 'B7',
    fromLocationId: location.id,
    removedPartFate: 'to_vendor_return',
    batchMismatch: true,
    notes: s.repairNotes,
    technicianId: tech.id,
  });
});

/** `a.b.0.c` in a JSON body. */
function at(body: unknown, path: string): unknown {
  return path.split('.').reduce<unknown>((v, k) => (v == null ? undefined : (v as Record<string, unknown>)[k]), body);
}

interface FieldCase {
  resource: string;
  path: () => string;
  /** Where the field sits in the answer. */
  field: string;
  /** What the staff read there. */
  staffValue: (body: unknown) => void;
  /** What a client user reads there: nothing at all, or an empty value of the same shape. */
  clientValue: 'absent' | null | '' | [];
}

const cases: FieldCase[] = [
  {
    resource: 'client',
    path: () => `/api/clients/${org.client.id}`,
    field: 'notes',
    staffValue: (v) => expect(v).toBe(s.clientNotes),
    clientValue: 'absent',
  },
  {
    resource: 'client',
    path: () => `/api/clients/${org.client.id}`,
    field: 'users',
    // The organisation's accounts and their sign-in e-mails, for linking a contact.
    staffValue: (v) => expect(v).toEqual(expect.arrayContaining([expect.objectContaining({ email: client.user.email })])),
    clientValue: 'absent',
  },
  {
    resource: 'site',
    path: () => `/api/sites/${org.site.id}`,
    field: 'internalNotes',
    staffValue: (v) => expect(v).toBe(s.siteInternal),
    clientValue: 'absent',
  },
  {
    resource: 'wall',
    path: () => `/api/walls/${org.wall!.id}`,
    field: 'internalNotes',
    staffValue: (v) => expect(v).toBe(s.wallInternal),
    clientValue: 'absent',
  },
  {
    resource: 'cabinet',
    path: () => `/api/cabinets/${cabinet.id}`,
    field: 'notes',
    staffValue: (v) => expect(v).toBe(s.cabinetNotes),
    clientValue: 'absent',
  },
  {
    resource: 'cabinet by serial',
    path: () => `/api/cabinets/by-serial/${cabinet.serial}`,
    field: 'notes',
    staffValue: (v) => expect(v).toBe(s.cabinetNotes),
    clientValue: 'absent',
  },
  {
    resource: 'cabinet history',
    path: () => `/api/cabinets/${cabinet.id}`,
    field: 'history.0.note',
    staffValue: (v) => expect(v).toBe(s.historyNote),
    clientValue: '',
  },
  {
    resource: 'cabinet history',
    path: () => `/api/cabinets/${cabinet.id}`,
    field: 'history.0.actorName',
    staffValue: (v) => expect(v).toBe(s.staffName),
    clientValue: null,
  },
  {
    resource: 'controller',
    path: () => `/api/controllers/${controller.id}`,
    field: 'notes',
    staffValue: (v) => expect(v).toBe(s.controllerNotes),
    clientValue: 'absent',
  },
  {
    resource: 'controllers list',
    path: () => `/api/controllers?wallId=${org.wall!.id}`,
    field: 'items.0.notes',
    staffValue: (v) => expect(v).toBe(s.controllerNotes),
    clientValue: 'absent',
  },
  {
    resource: 'ticket repair',
    path: () => `/api/tickets/${ticket.id}`,
    field: 'repairs.0.notes',
    staffValue: (v) => expect(v).toBe(s.repairNotes),
    clientValue: 'absent',
  },
  {
    resource: 'ticket repair',
    path: () => `/api/tickets/${ticket.id}`,
    field: 'repairs.0.part',
    staffValue: (v) => expect(v).toEqual({ name: s.partName, batch: 'B7' }),
    clientValue: 'absent',
  },
  {
    resource: 'ticket repair',
    path: () => `/api/tickets/${ticket.id}`,
    field: 'repairs.0.removedPartFate',
    staffValue: (v) => expect(v).toBe('to_vendor_return'),
    clientValue: 'absent',
  },
  {
    resource: 'visit',
    path: () => `/api/visits/${visit.id}`,
    field: 'internalNotes',
    staffValue: (v) => expect(v).toBe(s.visitInternal),
    clientValue: 'absent',
  },
  {
    resource: 'visit',
    path: () => `/api/visits/${visit.id}`,
    field: 'conflicts',
    staffValue: (v) => expect(v).toEqual([expect.objectContaining({ technician: expect.objectContaining({ name: technicianName }) })]),
    clientValue: [],
  },
  {
    resource: 'visits list',
    path: () => `/api/visits?wallId=${org.wall!.id}`,
    field: 'items.0.conflicts',
    staffValue: (v) => expect(v).toEqual([expect.objectContaining({ technician: expect.objectContaining({ name: technicianName }) })]),
    clientValue: [],
  },
  {
    resource: 'repairs list',
    path: () => `/api/repairs?wallId=${org.wall!.id}`,
    field: 'items.0.notes',
    staffValue: (v) => expect(v).toBe(s.repairNotes),
    clientValue: 'absent',
  },
  {
    resource: 'repairs list',
    path: () => `/api/repairs?wallId=${org.wall!.id}`,
    field: 'items.0.fromLocation',
    staffValue: (v) => expect(v).toEqual(expect.objectContaining({ name: s.stockLocation })),
    clientValue: 'absent',
  },
  {
    resource: 'repairs list',
    path: () => `/api/repairs?wallId=${org.wall!.id}`,
    field: 'items.0.batchMismatch',
    staffValue: (v) => expect(v).toBe(true),
    clientValue: 'absent',
  },
  {
    resource: 'visit repairs',
    path: () => `/api/visits/${visit.id}`,
    field: 'repairs.0.notes',
    staffValue: (v) => expect(v).toBe(s.repairNotes),
    clientValue: 'absent',
  },
];

describe('staff-only fields, resource by resource', () => {
  it.each(cases.map((c) => [`${c.resource} ${c.field}`, c] as const))('%s: the staff read it, a client user does not', async (_name, c) => {
    const asStaff = await staff.get(c.path());
    expect(asStaff.status).toBe(200);
    c.staffValue(at(asStaff.body, c.field));

    const asClient = await client.get(c.path());
    expect(asClient.status).toBe(200);
    const parent = c.field.split('.').slice(0, -1).join('.');
    const key = c.field.split('.').pop()!;
    const holder = parent ? at(asClient.body, parent) : asClient.body;
    // The record itself is there for the client (else the check below would prove nothing).
    expect(holder).toBeTypeOf('object');
    if (c.clientValue === 'absent') expect(holder).not.toHaveProperty(key);
    else expect(at(asClient.body, c.field)).toEqual(c.clientValue);
  });

  it.each([
    ['client', () => `/api/clients/${org.client.id}`],
    ['site', () => `/api/sites/${org.site.id}`],
    ['wall', () => `/api/walls/${org.wall!.id}`],
    ['wall map', () => `/api/walls/${org.wall!.id}/cabinets`],
    ['cabinet', () => `/api/cabinets/${cabinet.id}`],
    ['cabinets list', () => `/api/cabinets?wallId=${org.wall!.id}`],
    ['controller', () => `/api/controllers/${controller.id}`],
    ['controllers', () => `/api/controllers`],
    ['ticket', () => `/api/tickets/${ticket.id}`],
    ['tickets list', () => `/api/tickets`],
    ['comments', () => `/api/tickets/${ticket.id}/comments`],
    ['ticket files', () => `/api/tickets/${ticket.id}/attachments`],
    ['wall documents', () => `/api/walls/${org.wall!.id}/documents`],
    ['visit', () => `/api/visits/${visit.id}`],
    ['visits list', () => `/api/visits`],
    ['repairs list', () => `/api/repairs`],
    ['search by serial', () => `/api/search?q=${encodeURIComponent(cabinet.serial)}`],
    ['serial lookup', () => `/api/search/serials?tail=${encodeURIComponent(cabinet.serial)}`],
  ])('the %s answer holds no staff-only value anywhere in its text', async (_what, path) => {
    const res = await client.get(path());
    expect(res.status).toBe(200);
    expect(res.text.length).toBeGreaterThan(2);
    for (const value of everySecret) expect(res.text).not.toContain(value);
    // The fitted part's cost.
    expect(res.text).not.toMatch(/unitCost|412\.5/);
  });

  it('internal comments and internal files reach the staff only', async () => {
    const staffComments = await staff.get(`/api/tickets/${ticket.id}/comments`).expect(200);
    const clientComments = await client.get(`/api/tickets/${ticket.id}/comments`).expect(200);
    const bodies = (r: { body: { items: { body: string }[] } }) => r.body.items.map((c) => c.body);
    expect(bodies(staffComments)).toEqual(expect.arrayContaining([s.internalComment, 'We are on it.']));
    expect(bodies(clientComments)).toEqual(['We are on it.']);

    const names = (r: { body: { items: { fileName: string }[] } }) => r.body.items.map((a) => a.fileName).sort();
    expect(names(await staff.get(`/api/tickets/${ticket.id}/attachments`).expect(200))).toEqual([s.internalFile, 'public.pdf'].sort());
    expect(names(await client.get(`/api/tickets/${ticket.id}/attachments`).expect(200))).toEqual(['public.pdf']);
    expect(names(await staff.get(`/api/walls/${org.wall!.id}/documents`).expect(200))).toEqual([s.internalDocument]);
    expect(names(await client.get(`/api/walls/${org.wall!.id}/documents`).expect(200))).toEqual([]);
  });

  it('search results carry the same fields for both (none of them staff-only) and no staff value', async () => {
    const q = `/api/search?q=${encodeURIComponent(cabinet.serial)}`;
    const asStaff = await staff.get(q).expect(200);
    const asClient = await client.get(q).expect(200);
    expect(asClient.body.cabinets).toEqual(asStaff.body.cabinets);
    expect(Object.keys(asClient.body.cabinets[0]).sort()).toEqual(
      ['batch', 'column', 'id', 'row', 'serial', 'siteName', 'status', 'wallId', 'wallName'].sort(),
    );
  });

  it('a cabinet model has no staff-only field: both read the same', async () => {
    const path = `/api/cabinet-models/${org.wall!.cabinetModelId}`;
    const asStaff = await staff.get(path).expect(200);
    const asClient = await client.get(path).expect(200);
    expect(asClient.body).toEqual(asStaff.body);
  });

  it('contacts carry what the client itself keeps, and no staff e-mail', async () => {
    const res = await client.get(`/api/sites/${org.site.id}`).expect(200);
    expect(res.text).not.toContain(staff.user.email);
    const detail = await client.get(`/api/clients/${org.client.id}`).expect(200);
    expect(detail.text).not.toContain(staff.user.email);
  });
});

// ---------------------------------------------------------------------------------------------
// A cabinet's history after it crossed organisations (issue 16, finding 1): the client reads the
// events on its own walls only, never the other organisation's wall, cabinet or staff notes.
// ---------------------------------------------------------------------------------------------
describe('cabinet history across organisations', () => {
  let a: Org;
  let b: Org;
  let office: Session;
  let clientA: Session;
  let travelling: typeof cabinets.$inferSelect;
  let bNeighbour: typeof cabinets.$inferSelect;
  let aCabinet: typeof cabinets.$inferSelect;
  const note = {
    onB: secret('b-move-note'),
    swap: secret('swap-note'),
    hidden: secret('hidden-note'),
    shown: `Moved to match its neighbours' batch ${randomUUID().slice(0, 8)}`,
  };

  beforeAll(async () => {
    a = await createOrganisation({ withWall: true });
    b = await createOrganisation({ withWall: true });
    office = await signedIn('coordinator');
    clientA = await signedIn('client', a.client.id);
    const place = async (org: Org, serial: string, column: number) => {
      const res = await office.post(`/api/walls/${org.wall!.id}/cabinets`, {
        serial,
        column,
        row: 1,
        cabinetModelId: a.wall!.cabinetModelId,
      });
      expect(res.status).toBe(201);
      const [row] = await db().select().from(cabinets).where(eq(cabinets.id, res.body.id));
      return row;
    };
    travelling = await place(b, unique('TRV'), 1);
    bNeighbour = await place(b, unique('BNB'), 2);
    aCabinet = await place(a, unique('ACB'), 1);
    // Its life on B's wall: a move with a staff note, a swap with another of B's cabinets.
    await office.post(`/api/cabinets/${travelling.id}/move`, { wallId: b.wall!.id, column: 3, row: 1, note: note.onB }).expect(200);
    await office.post(`/api/cabinets/${travelling.id}/swap`, { otherCabinetId: bNeighbour.id }).expect(200);
    // Then swapped with A's cabinet: it is on A's wall now.
    await office.post(`/api/cabinets/${travelling.id}/swap`, { otherCabinetId: aCabinet.id, note: note.swap }).expect(200);
    // On A's wall: one move with a staff-only note, one with a note shown to the client.
    await office.post(`/api/cabinets/${travelling.id}/move`, { wallId: a.wall!.id, column: 4, row: 2, note: note.hidden }).expect(200);
    await office
      .post(`/api/cabinets/${travelling.id}/move`, { wallId: a.wall!.id, column: 5, row: 2, note: note.shown, noteForClient: true })
      .expect(200);
  });

  it.each([
    ['by id', () => `/api/cabinets/${travelling.id}`],
    ['by serial', () => `/api/cabinets/by-serial/${travelling.serial}`],
  ])('read %s, the answer holds nothing of B and no staff-only note', async (_how, path) => {
    const res = await clientA.get(path());
    expect(res.status).toBe(200);
    expect(res.body.wall.id).toBe(a.wall!.id);
    const text = res.text;
    for (const leaked of [
      b.wall!.id,
      b.wall!.name,
      b.site.name,
      b.site.id,
      b.client.name,
      b.client.id,
      bNeighbour.serial,
      bNeighbour.id,
      aCabinet.serial,
    ]) {
      expect(text).not.toContain(leaked);
    }
    for (const n of [note.onB, note.swap, note.hidden]) expect(text).not.toContain(n);
  });

  it('keeps the events on A’s walls, newest first, with A’s side of the swap only', async () => {
    const res = await clientA.get(`/api/cabinets/${travelling.id}`).expect(200);
    const history = res.body.history as Record<string, unknown>[];
    expect(history.map((e) => e.kind)).toEqual(['moved', 'moved', 'swapped']);
    const [shown, hidden, swap] = history;
    expect(shown).toMatchObject({ note: note.shown, noteForClient: true, fromWallId: a.wall!.id, toWallId: a.wall!.id, actorName: null });
    expect(hidden).toMatchObject({ note: '', noteForClient: false });
    expect(swap).toMatchObject({
      fromWallId: null,
      fromWallName: null,
      fromColumn: null,
      fromRow: null,
      toWallId: a.wall!.id,
      toColumn: 1,
      toRow: 1,
      otherSerial: null,
      note: '',
    });
  });

  it('the staff read the whole history, notes and both sides', async () => {
    const res = await office.get(`/api/cabinets/${travelling.id}`).expect(200);
    const history = res.body.history as Record<string, unknown>[];
    expect(history.map((e) => e.kind)).toEqual(['moved', 'moved', 'swapped', 'swapped', 'moved', 'placed']);
    expect(history.map((e) => e.note)).toEqual([note.shown, note.hidden, note.swap, '', note.onB, '']);
    expect(history[2]).toMatchObject({
      fromWallId: b.wall!.id,
      fromWallName: b.wall!.name,
      otherSerial: aCabinet.serial,
      noteForClient: false,
    });
    expect(history[3]).toMatchObject({ otherSerial: bNeighbour.serial });
    expect(res.body.historyTruncated).toBe(false);
  });

  it('a status change keeps whether its reason is shown to the client', async () => {
    const res = await office
      .patch(`/api/cabinets/${aCabinet.id}`, { status: 'at_bench', note: note.shown, noteForClient: true })
      .expect(200);
    expect(res.body.history[0]).toMatchObject({ kind: 'removed', note: note.shown, noteForClient: true });
  });
});
