// Reads that could grow without bound answer at most a cap and say there is more (issue 16,
// finding 10), and an upload is refused before its body is read when the caller may not see the
// record (OWASP ASVS 5.0 V2.4.1 anti-automation/resource limits; OWASP File Upload Cheat Sheet:
// "check authorisation before accepting the file").
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq, sql } from 'drizzle-orm';
import { db } from '../../server/db/client.js';
import type { users } from '../../server/db/schema/accounts.js';
import { attachments } from '../../server/db/schema/files.js';
import { savedViews, ticketComments, tickets } from '../../server/db/schema/tickets.js';
import { cabinetEvents, cabinets, controllers, walls } from '../../server/db/schema/walls.js';
import { ensureBucket } from '../../server/integrations/s3.js';
import type { Actor } from '../../server/middleware/auth.js';
import { HISTORY_CAP } from '../../server/services/cabinets.js';
import { ATTACHMENTS_CAP } from '../../server/services/attachments.js';
import { CONTROLLERS_CAP, listCabinetModels } from '../../server/services/catalogue.js';
import { COMMENTS_CAP, SAVED_VIEWS_CAP } from '../../server/services/tickets.js';
import { listStaff } from '../../server/services/users.js';
import { wallCabinets, WALL_CABINETS_CAP } from '../../server/services/walls.js';
import { startTestS3, type TestS3 } from '../setup/fakes.js';
import {
  createCabinetModel,
  createOrganisation,
  createUser,
  signedIn,
  testApp,
  TEST_PASSWORD,
  unique,
  type Session,
} from '../factories/index.js';

type Org = Awaited<ReturnType<typeof createOrganisation>>;
let org: Org;
let office: Session;
let s3: TestS3;

beforeAll(async () => {
  s3 = await startTestS3();
  Object.assign(process.env, s3.env);
  await ensureBucket();
  org = await createOrganisation({ withWall: true });
  office = await signedIn('coordinator');
});
afterAll(async () => {
  await s3.dispose();
});

const newTicket = async (o: Org) => {
  const [t] = await db()
    .insert(tickets)
    .values({ clientId: o.client.id, siteId: o.site.id, wallId: o.wall!.id, title: 'Flicker', priority: 'normal' })
    .returning();
  return t;
};
const staffActor = (u: typeof users.$inferSelect): Actor => ({
  userId: u.id,
  sessionId: 'test',
  role: u.role,
  clientId: null,
  name: u.name,
  email: u.email,
});

describe('lists over their cap', () => {
  it('a wall’s controllers: the cap, and “truncated”', async () => {
    const o = await createOrganisation({ withWall: true });
    const rows = Array.from({ length: CONTROLLERS_CAP + 1 }, (_, i) => ({
      wallId: o.wall!.id,
      model: 'Processor',
      serial: `${unique('CAP')}-${String(i).padStart(5, '0')}`.toUpperCase(),
      outputs: 4,
    }));
    await db().insert(controllers).values(rows);
    const over = await office.get(`/api/controllers?wallId=${o.wall!.id}`).expect(200);
    expect(over.body.items).toHaveLength(CONTROLLERS_CAP);
    expect(over.body.truncated).toBe(true);
    await db().delete(controllers).where(eq(controllers.serial, rows[0].serial));
    const at = await office.get(`/api/controllers?wallId=${o.wall!.id}`).expect(200);
    expect(at.body.items).toHaveLength(CONTROLLERS_CAP);
    expect(at.body.truncated).toBe(false);
  });

  it('a ticket’s comments: the newest up to the cap, oldest first, and “truncated”', async () => {
    const ticket = await newTicket(org);
    const base = Date.now() - 10 * 24 * 3600_000;
    await db()
      .insert(ticketComments)
      .values(
        Array.from({ length: COMMENTS_CAP + 1 }, (_, i) => ({
          ticketId: ticket.id,
          visibility: 'public' as const,
          body: `comment ${i}`,
          createdAt: new Date(base + i * 60_000),
        })),
      );
    const res = await office.get(`/api/tickets/${ticket.id}/comments`).expect(200);
    expect(res.body.items).toHaveLength(COMMENTS_CAP);
    expect(res.body.truncated).toBe(true);
    // The oldest one is left out; the conversation still reads oldest first.
    expect(res.body.items[0].body).toBe('comment 1');
    expect(res.body.items.at(-1).body).toBe(`comment ${COMMENTS_CAP}`);
  });

  it('a ticket’s files: the cap, and “truncated”', async () => {
    const ticket = await newTicket(org);
    await db()
      .insert(attachments)
      .values(
        Array.from({ length: ATTACHMENTS_CAP + 1 }, (_, i) => ({
          clientId: org.client.id,
          ticketId: ticket.id,
          kind: 'photo' as const,
          storageKey: unique(`cap/${i}`),
          fileName: `photo-${i}.jpg`,
          contentType: 'image/jpeg',
          sizeBytes: 10,
        })),
      );
    const res = await office.get(`/api/tickets/${ticket.id}/attachments`).expect(200);
    expect(res.body.items).toHaveLength(ATTACHMENTS_CAP);
    expect(res.body.truncated).toBe(true);
    const fewer = await office.get(`/api/walls/${org.wall!.id}/documents`).expect(200);
    expect(fewer.body).toEqual({ items: [], truncated: false });
  });

  it('a person’s saved views: the cap, and “truncated”', async () => {
    const viewer = await signedIn('coordinator');
    await db()
      .insert(savedViews)
      .values(
        Array.from({ length: SAVED_VIEWS_CAP + 1 }, (_, i) => ({
          userId: viewer.user.id,
          name: `View ${String(i).padStart(4, '0')}`,
          filters: {},
        })),
      );
    const res = await viewer.get('/api/ticket-views').expect(200);
    expect(res.body.items).toHaveLength(SAVED_VIEWS_CAP);
    expect(res.body.truncated).toBe(true);
  });

  it('a cabinet’s history: the newest events up to the cap, and “historyTruncated”', async () => {
    const [cabinet] = await db()
      .insert(cabinets)
      .values({ serial: unique('HIS').toUpperCase(), cabinetModelId: org.wall!.cabinetModelId, wallId: org.wall!.id, column: 3, row: 3 })
      .returning();
    const base = Date.now() - 24 * 3600_000;
    await db()
      .insert(cabinetEvents)
      .values(
        Array.from({ length: HISTORY_CAP + 1 }, (_, i) => ({
          cabinetId: cabinet.id,
          kind: 'status_changed' as const,
          fromWallId: org.wall!.id,
          note: `event ${i}`,
          createdAt: new Date(base + i * 1000),
        })),
      );
    const res = await office.get(`/api/cabinets/${cabinet.id}`).expect(200);
    expect(res.body.history).toHaveLength(HISTORY_CAP);
    expect(res.body.historyTruncated).toBe(true);
    expect(res.body.history[0].note).toBe(`event ${HISTORY_CAP}`);
    expect(res.body.history.at(-1).note).toBe('event 1');
  });

  // The catalogue and the staff list are shared by every test of the run: their caps are tried
  // on the service with a small cap, and the routes for the shape they answer.
  it('cabinet models and the staff list: capped, and the routes say whether they were', async () => {
    await Promise.all([createCabinetModel(), createCabinetModel(), createCabinetModel()]);
    const models = await listCabinetModels(false, 2);
    expect(models.items).toHaveLength(2);
    expect(models.truncated).toBe(true);
    expect((await office.get('/api/cabinet-models').expect(200)).body.truncated).toBe(false);

    const admin = await createUser({ role: 'admin' });
    await createUser({ role: 'technician' });
    const staff = await listStaff(1);
    expect(staff.items).toHaveLength(1);
    expect(staff.truncated).toBe(true);
    const route = await office.get('/api/staff').expect(200);
    expect(route.body.truncated).toBe(false);
    expect(route.body.items.map((u: { id: string }) => u.id)).toContain(admin.id);
  });

  it('a wall’s cabinets for the map: a whole 500 × 500 wall fits under the cap; over it, “truncated”', async () => {
    expect(WALL_CABINETS_CAP).toBe(500 * 500);
    const o = await createOrganisation({ withWall: true });
    await db()
      .insert(cabinets)
      .values(
        [1, 2, 3, 4].map((column) => ({
          serial: unique('MAP').toUpperCase(),
          cabinetModelId: o.wall!.cabinetModelId,
          wallId: o.wall!.id,
          column,
          row: 1,
        })),
      );
    const admin = await createUser({ role: 'admin' });
    const over = await wallCabinets(staffActor(admin), o.wall!.id, 3);
    expect(over.items.map((c) => c.column)).toEqual([1, 2, 3]);
    expect(over.truncated).toBe(true);
    const route = await office.get(`/api/walls/${o.wall!.id}/cabinets`).expect(200);
    expect(route.body.items).toHaveLength(4);
    expect(route.body.truncated).toBe(false);
  });

  it('a large wall map answer goes gzipped to a caller that accepts it, and whole', async () => {
    const o = await createOrganisation({ withWall: true });
    await db().update(walls).set({ columns: 25, rows: 20 }).where(eq(walls.id, o.wall!.id));
    await db().execute(sql`insert into cabinets (serial, cabinet_model_id, wall_id, "column", "row", batch)
      select ${unique('GZ').toUpperCase()} || '-' || c || '-' || r, ${o.wall!.cabinetModelId}, ${o.wall!.id}, c, r, 'B1'
      from generate_series(1, 25) c, generate_series(1, 20) r`);
    const gz = await office.get(`/api/walls/${o.wall!.id}/cabinets`).set('Accept-Encoding', 'gzip').expect(200);
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.body.items).toHaveLength(500);
    expect(gz.body.truncated).toBe(false);
    const plain = await office.get(`/api/walls/${o.wall!.id}/cabinets`).set('Accept-Encoding', 'identity').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body).toEqual(gz.body);
  });
});

// ---------------------------------------------------------------------------------------------
// Uploads: the caller's right to the record is checked before the body is read.
// ---------------------------------------------------------------------------------------------
describe('an upload to a record the caller may not see', () => {
  let server: http.Server;
  let port: number;

  beforeAll(async () => {
    server = testApp().listen(0);
    await new Promise((resolve) => server.once('listening', resolve));
    port = (server.address() as AddressInfo).port;
  });
  afterAll(async () => {
    await new Promise((resolve) => server.close(resolve));
  });

  async function cookieOf(email: string) {
    const res = await fetch(`http://127.0.0.1:${port}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', 'X-Requested-With': 'gridkeep' },
      body: JSON.stringify({ email, password: TEST_PASSWORD }),
    });
    expect(res.status).toBe(200);
    return res.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .join('; ');
  }

  /**
   * Announces a 25 MB multipart upload, sends its first 64 KB only, and waits for the answer: a
   * server that reads the body first never answers (it waits for the rest), one that checks the
   * caller first answers at once.
   */
  function partialUpload(path: string, cookie: string, csv = false): Promise<{ status: number; body: string; sentBytes: number }> {
    const boundary = 'gridkeepboundary';
    const head = Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="big.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`,
    );
    const total = 25 * 1024 * 1024;
    return new Promise((resolve, reject) => {
      let sentBytes = 0;
      let answered = false;
      const req = http.request(
        {
          host: '127.0.0.1',
          port,
          path,
          method: 'POST',
          headers: {
            Cookie: cookie,
            'X-Requested-With': 'gridkeep',
            'Content-Type': csv ? 'text/csv' : `multipart/form-data; boundary=${boundary}`,
            'Content-Length': String(total),
          },
        },
        (res) => {
          let body = '';
          res.setEncoding('utf8');
          res.on('data', (chunk) => (body += chunk));
          res.on('end', () => {
            answered = true;
            clearTimeout(timer);
            resolve({ status: res.statusCode ?? 0, body, sentBytes });
            req.destroy();
          });
        },
      );
      req.on('error', (err) => {
        // The server may close the connection after answering; the answer is what counts.
        if (!answered) reject(err);
      });
      const first = Buffer.concat([head, Buffer.alloc(64 * 1024 - head.length, 0xff)]);
      req.write(first);
      sentBytes = first.length;
      const timer = setTimeout(() => {
        req.destroy();
        reject(new Error('no answer while the body was still being sent: the body is read before the check'));
      }, 5000);
    });
  }

  it('a client user’s 25 MB file to another organisation’s ticket is a 404 before the body is read, and nothing is stored', async () => {
    const mine = await createOrganisation({ withWall: true });
    const theirs = await createOrganisation({ withWall: true });
    const theirTicket = await newTicket(theirs);
    const me = await createUser({ role: 'client', clientId: mine.client.id });
    const cookie = await cookieOf(me.email);
    const keysBefore = s3.current.keys(s3.env.S3_BUCKET).length;
    const res = await partialUpload(`/api/tickets/${theirTicket.id}/attachments`, cookie);
    expect(res.status).toBe(404);
    expect(JSON.parse(res.body).error.code).toBe('not_found');
    expect(res.sentBytes).toBeLessThan(100 * 1024);
    expect(s3.current.keys(s3.env.S3_BUCKET)).toHaveLength(keysBefore);
    expect(await db().select().from(attachments).where(eq(attachments.ticketId, theirTicket.id))).toEqual([]);
  });

  it('the same for a wall document to a wall that does not exist, and a repair photo to a missing repair', async () => {
    const tech = await createUser({ role: 'technician' });
    const cookie = await cookieOf(tech.email);
    const missing = '00000000-0000-4000-8000-000000000000';
    expect((await partialUpload(`/api/walls/${missing}/documents`, cookie)).status).toBe(404);
    expect((await partialUpload(`/api/repairs/${missing}/photos`, cookie)).status).toBe(404);
  });

  it('a cabinet CSV for a wall that does not exist is a 404 before the file is read', async () => {
    const coordinator = await createUser({ role: 'coordinator' });
    const cookie = await cookieOf(coordinator.email);
    const res = await partialUpload('/api/walls/00000000-0000-4000-8000-000000000000/cabinets/import', cookie, true);
    expect(res.status).toBe(404);
  });

  it('an upload the caller may make still goes through', async () => {
    const ticket = await newTicket(org);
    const client = await signedIn('client', org.client.id);
    const png = Buffer.from(
      '89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8cfc0f01f0005000201a5f1e0d10000000049454e44ae426082',
      'hex',
    );
    const res = await client.agent
      .post(`/api/tickets/${ticket.id}/attachments`)
      .set('X-Requested-With', 'gridkeep')
      .attach('file', png, 'fault.png');
    expect(res.status).toBe(201);
    const list = await client.get(`/api/tickets/${ticket.id}/attachments`).expect(200);
    expect(list.body).toEqual({ items: [expect.objectContaining({ fileName: 'fault.png' })], truncated: false });
  });
});
