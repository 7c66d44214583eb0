// Every route of the API, read from the Express router itself, checked against the route table
// (tests/integration/route-table.ts): signed out, a role that may not call it, another
// organisation's record, and a write without the CSRF header. A route the table does not know
// fails here, and so does an entry whose route is gone: a new route cannot land without its line.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/enums.js';
import { anonymous, createUser, signIn, signedIn, testApp, type Session } from '../factories/index.js';
import {
  allRoles,
  createTheirRecords,
  fillNowhere,
  routeTable,
  routesOf,
  splitKey,
  tinyPng,
  type RouteEntry,
  type TheirRecords,
} from './route-table.js';

// The developer mailbox routes exist only with the local SMTP fake: give them a folder so their
// role check is tried like every other route's (config() is read on the first request).
const mailboxDir = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-matrix-mailbox-'));
process.env.DEV_MAILBOX_DIR = mailboxDir;

const csrf = { 'X-Requested-With': 'gridkeep' };
const lower = (m: string) => m.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete';

const entries = Object.entries(routeTable).map(([key, entry]) => ({ key, ...splitKey(key), entry }));
const isPublic = (e: RouteEntry): e is RouteEntry & { who: { public: string } } => 'public' in e.who;
const allowed = (e: RouteEntry) => (isPublic(e) ? allRoles : (e.who as { roles: readonly Role[] }).roles);

const sessions = {} as Record<Role, Session>;
let theirs: TheirRecords;
let theirClient: Session;

beforeAll(async () => {
  theirs = await createTheirRecords();
  const mine = await createTheirRecords();
  const [admin, coordinator, technician, client] = await Promise.all([
    signedIn('admin'),
    signedIn('coordinator'),
    signedIn('technician'),
    signedIn('client', mine.org.client.id),
  ]);
  Object.assign(sessions, { admin, coordinator, technician, client });
  theirClient = await signIn(await createUser({ role: 'client', clientId: theirs.org.client.id }));
});

afterAll(() => {
  fs.rmSync(mailboxDir, { recursive: true, force: true });
});

describe('the route table', () => {
  // OWASP ASVS 5.0 V8.1.1 (authorization documentation: every function has its access rules written down — from memory).
  it('has an entry for every route in the router, and no entry for a route that is gone', () => {
    const inRouter = new Set(routesOf(testApp()));
    const inTable = new Set(Object.keys(routeTable));
    const missing = [...inRouter].filter((r) => !inTable.has(r));
    const gone = [...inTable].filter((r) => !inRouter.has(r));
    const message = [
      missing.length ? `routes without an entry in tests/integration/route-table.ts: ${missing.join(', ')}` : '',
      gone.length ? `entries in tests/integration/route-table.ts for routes that no longer exist: ${gone.join(', ')}` : '',
    ].join(' ');
    expect({ missing, gone }, message).toEqual({ missing: [], gone: [] });
  });

  it('gives a reason for each public route, and marks every non-GET as reaching the CSRF check', () => {
    for (const { key, method, entry } of entries) {
      if (isPublic(entry)) expect(entry.who.public.length, key).toBeGreaterThan(5);
      else expect(allowed(entry).length, key).toBeGreaterThan(0);
      if (method === 'GET') expect(entry.writes, `${key} is a GET that writes`).toBe(false);
      if (entry.theirs) expect(allowed(entry), `${key} has a cross-organisation path but clients may not call it`).toContain('client');
    }
  });

  it('says, for each route a client may call with an id, how to reach another organisation’s record (or why not)', () => {
    const unanswered = entries
      .filter(({ path, entry }) => !isPublic(entry) && allowed(entry).includes('client') && /:/.test(path))
      .filter(({ entry }) => !entry.theirs && !entry.noTenant)
      .map(({ key }) => key);
    expect(unanswered).toEqual([]);
  });
});

describe('signed out', () => {
  // OWASP ASVS 5.0 V8.2.1 (function-level access control) and V7 (session required) — from memory.
  it.each(entries.filter(({ entry }) => !isPublic(entry)).map((e) => [e.key, e] as const))(
    '%s answers 401',
    async (_key, { method, path }) => {
      const res = await anonymous()[lower(method)](fillNowhere(path)).set(csrf);
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
    },
  );
});

describe('a role that may not call the route', () => {
  // OWASP ASVS 5.0 V8.2.1 (function-level access control) — from memory. Staff get 403; a client
  // user asking for a staff-only area gets 404, as for a route that is not there
  // (server/middleware/auth.ts requireRole), so client users learn nothing of staff areas.
  const cases = entries.flatMap(({ key, method, path, entry }) =>
    isPublic(entry) ? [] : allRoles.filter((role) => !allowed(entry).includes(role)).map((role) => [key, role, method, path] as const),
  );
  it('covers every staff-only route for client users', () => {
    expect(cases.filter(([, role]) => role === 'client').length).toBeGreaterThan(40);
  });
  it.each(cases)('%s as %s is refused', async (_key, role, method, path) => {
    const res = await sessions[role][lower(method)](fillNowhere(path));
    if (role === 'client') {
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    } else {
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
  });
});

describe('a client user and another organisation’s record', () => {
  // OWASP ASVS 5.0 V8.2.2 (data-specific access: no IDOR) and V8.4.1 (multi-tenant isolation) — from memory.
  // Named "[tenant filter]" when the organisation filter alone keeps the record out:
  // scripts/check-tenant-tests.ts removes that filter and expects each of those to fail.
  const cases = entries
    .filter(({ entry }) => entry.theirs)
    .map((e) => [e.key, e.entry.ownerOnly ? '(owner only)' : '[tenant filter]', e] as const);
  it('has cases', () => expect(cases.length).toBeGreaterThanOrEqual(18));
  it.each(cases)('%s answers 404 %s', async (_key, _tag, { method, entry }) => {
    const me = sessions.client;
    const target = entry.theirs!(theirs);
    let res;
    if (entry.upload) {
      res = await me.agent.post(target).set(csrf).attach('file', tinyPng, { filename: 'photo.png', contentType: 'image/png' });
    } else if (method === 'GET') {
      res = await me.get(target);
    } else {
      res = await me[lower(method)](target, entry.theirsBody?.(theirs) ?? {});
    }
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  // The control: the same paths answer the organisation's own client user, so the 404 above
  // comes from the boundary and not from a path that names nothing.
  it.each(cases.filter(([, , e]) => e.method === 'GET'))('%s answers their own client user', async (_key, _tag, { entry }) => {
    const res = await theirClient.get(entry.theirs!(theirs));
    // No object store runs here (a stored file is not needed to be refused): the attachment and
    // the visit report reach for it, and its 503 is proof enough that the record was found.
    if (/^\/api\/(attachments\/|visits\/.*\/report\.pdf$)/.test(entry.theirs!(theirs))) {
      expect([200, 503]).toContain(res.status);
    } else {
      expect(res.status).toBe(200);
    }
  });
});

describe('a write without the CSRF header', () => {
  // OWASP ASVS 5.0 V3.5.1 (cross-site request forgery: a header a cross-site form cannot send) — from memory.
  const writes = entries.filter(({ method }) => method !== 'GET').map((e) => [e.key, e] as const);
  it.each(writes)('%s answers 403', async (_key, { method, path, entry }) => {
    const caller = isPublic(entry) ? anonymous() : sessions[allowed(entry)[0]].agent;
    const res = await caller[lower(method)](fillNowhere(path)).send(entry.sample ?? {});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_header_missing');
  });
});
