// Generated bad input (fast-check) against every route of the route table
// (tests/integration/route-table.ts) that reads a body or a query string: NUL characters, huge
// and out-of-range numbers, wrong types, deep nesting, crafted keyset cursors, malformed and
// mislabelled bodies (wrong content type, unknown charset or Content-Encoding, broken multipart).
// Whatever arrives, the answer is never a 5xx: bad input is the caller's error (4xx), named in
// the error shape. OWASP ASVS 5.0 V1.2/V2.2 (input validation at a trusted layer) and V16.5
// (errors handled without exposing a failure) — from memory.
import fc from 'fast-check';
import type request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { roles, type Role } from '../../shared/schemas/enums.js';
import { anonymous, createOrganisation, signedIn, type Session } from '../factories/index.js';
import { fillNowhere, routeTable, splitKey, type RouteEntry } from './route-table.js';

/** Cases per route (60 in `npm test`; FUZZ_RUNS=1000 for a deeper run); a failing case is shrunk to the smallest that still fails. */
const RUNS = Number(process.env.FUZZ_RUNS ?? 60);

const csrf = { 'X-Requested-With': 'gridkeep' };

const nastyConstant = fc.constantFrom<unknown>(
  '\u0000',
  'a\u0000b',
  '\u0000'.repeat(5),
  '%00',
  2 ** 31,
  2 ** 31 - 1,
  -(2 ** 31) - 1,
  2 ** 53 + 2,
  Number.MAX_VALUE,
  -Number.MAX_VALUE,
  5e-324,
  -1,
  0,
  0.5,
  '',
  ' ',
  'x'.repeat(20_000),
  '9'.repeat(400),
  '2026-02-30T25:61:00Z',
  '0000-00-00',
  '00000000-0000-0000-0000-000000000000',
  'not-a-uuid',
  '../../../etc/passwd',
  "'; drop table tickets; --",
  '\uD800',
  '\u202E',
  true,
  false,
  null,
  [],
  {},
  [[[[[[[[]]]]]]]],
  { a: { b: { c: { d: { e: {} } } } } },
  JSON.parse('{"__proto__": {"admin": true}}') as unknown,
  { constructor: { prototype: { polluted: true } } },
);

const nasty: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 4, arbitrary: nastyConstant },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 40 }) },
  { weight: 1, arbitrary: fc.integer() },
  { weight: 1, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) },
);

/** A keyset cursor as a caller could craft one: base64url JSON of the wrong length or kinds, or not base64 at all. */
const craftedCursor = fc.oneof(
  fc.array(nasty, { maxLength: 4 }).map((values) => Buffer.from(JSON.stringify(values) ?? 'null').toString('base64url')),
  fc.jsonValue({ maxDepth: 2 }).map((v) => Buffer.from(JSON.stringify(v) ?? 'null').toString('base64url')),
  fc.constantFrom('!!!', '====', 'e30', 'W10', 'WyJ4Il0', 'bnVsbA', '\u0000', 'A'.repeat(5000)),
  fc.string({ unit: 'binary', maxLength: 30 }),
);

const queryKeys = [
  'limit',
  'cursor',
  'q',
  'status',
  'priority',
  'clock',
  'open',
  'sort',
  'dir',
  'clientId',
  'siteId',
  'wallId',
  'cabinetId',
  'visitId',
  'assigneeId',
  'technicianId',
  'from',
  'to',
  'role',
  'serial',
  'batch',
  'tail',
  'kind',
  'partId',
  'locationId',
  'serviceLevel',
  'entity',
  'inline',
] as const;

const asQueryValue = (v: unknown) => (typeof v === 'string' ? v : (JSON.stringify(v) ?? ''));

/** A query string: known parameter names with bad values, repeated names (arrays), crafted cursors. */
const badQuery = fc
  .tuple(
    fc.array(fc.tuple(fc.constantFrom(...queryKeys), nasty.map(asQueryValue)), { minLength: 1, maxLength: 5 }),
    fc.option(craftedCursor, { nil: undefined }),
  )
  .map(([pairs, cursor]) => {
    const params = new URLSearchParams();
    for (const [k, v] of pairs) params.append(k, v);
    if (cursor !== undefined) params.append('cursor', cursor);
    return params.toString();
  });

/** A JSON body: the route's well-formed sample with fields made bad, or any JSON at all. */
const badJson = (sample: Record<string, unknown>) => {
  const keys = [...Object.keys(sample), 'extra'];
  return fc.oneof(
    fc.tuple(fc.constantFrom(...keys), nasty).map(([k, v]) => ({ ...sample, [k]: v })),
    fc.dictionary(fc.constantFrom(...keys), nasty, { maxKeys: keys.length }),
    fc.jsonValue({ maxDepth: 4 }),
  );
};

const boundary = 'gridkeep-fuzz';
/** A body that is not what the route reads: mislabelled, malformed, compressed in name only. */
const badRaw = fc.record({
  contentType: fc.constantFrom(
    'application/json',
    'application/json; charset=klingon',
    'application/json; charset=utf-16',
    'text/plain',
    'text/csv',
    'application/xml',
    'application/x-www-form-urlencoded',
    'application/octet-stream',
    `multipart/form-data; boundary=${boundary}`,
    'multipart/form-data',
    'multipart/form-data; boundary=',
  ),
  encoding: fc.constantFrom(undefined, 'gzip', 'deflate', 'br', 'x-unknown'),
  payload: fc.oneof(
    fc.constantFrom(
      '{"a":',
      '{"a":1}',
      '[]',
      'null',
      '"\u0000"',
      '{"limit":1e999}',
      '\u0000',
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="a.png"\r\nContent-Type: image/png\r\n\r\nabc\r\n--${boundary}--\r\n`,
      `--${boundary}\r\nContent-Disposition: form-data; name="photo"; filename="a.png"\r\n\r\nabc\r\n--${boundary}--\r\n`,
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="a\u0000.png"\r\n\r\nabc\r\n--${boundary}--\r\n`,
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="a.png"\r\n\r\n\r\n--${boundary}--\r\n`,
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="a.png"\r\n\r\nabc`,
      'serial,column,row,batch\n\u0000,1,1,A',
      'serial,column,row,batch\nX,99999999999,-1,A',
    ),
    fc.string({ unit: 'binary', maxLength: 200 }),
  ),
});

type RawBody = typeof badRaw extends fc.Arbitrary<infer T> ? T : never;
type Case = { kind: 'json'; query: string; body: unknown } | { kind: 'raw'; query: string; raw: RawBody };

function casesFor(method: string, entry: RouteEntry): fc.Arbitrary<Case> {
  const query = entry.query ? badQuery : fc.constant('');
  if (method === 'GET') return query.map((q) => ({ kind: 'json' as const, query: q, body: undefined }));
  return fc.oneof(
    fc.tuple(query, badJson(entry.sample ?? {})).map(([q, body]) => ({ kind: 'json' as const, query: q, body })),
    fc.tuple(query, badRaw).map(([q, raw]) => ({ kind: 'raw' as const, query: q, raw })),
  );
}

const routes = Object.entries(routeTable)
  .map(([key, entry]) => ({ key, ...splitKey(key), entry }))
  .filter(({ method, entry }) => method !== 'GET' || entry.query);

const sessions = {} as Record<Role, Session>;

beforeAll(async () => {
  const org = await createOrganisation();
  const [admin, coordinator, technician, client] = await Promise.all([
    signedIn('admin'),
    signedIn('coordinator'),
    signedIn('technician'),
    signedIn('client', org.client.id),
  ]);
  Object.assign(sessions, { admin, coordinator, technician, client });
});

/** The caller: someone the route lets in, so the input reaches validation and the service. */
function caller(key: string, entry: RouteEntry) {
  // Signing out would end the session the other cases use: that one route is tried signed out.
  if ('public' in entry.who || key === 'POST /api/auth/logout') return anonymous();
  const role = roles.find((r) => (entry.who as { roles: readonly Role[] }).roles.includes(r))!;
  return sessions[role].agent;
}

function send(key: string, method: string, path: string, entry: RouteEntry, c: Case): request.Test {
  const url = c.query ? `${path}?${c.query}` : path;
  const req = caller(key, entry)[method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete'](url).set(csrf);
  if (c.kind === 'json') return c.body === undefined ? req : req.set('Content-Type', 'application/json').send(JSON.stringify(c.body));
  req.set('Content-Type', c.raw.contentType);
  if (c.raw.encoding) req.set('Content-Encoding', c.raw.encoding);
  return req.send(c.raw.payload);
}

describe('generated bad input never gets a 5xx', () => {
  it('tries a body or a query on a good share of the routes', () => {
    expect(routes.length).toBeGreaterThan(70);
  });

  it.each(routes.map((r) => [r.key, r] as const))(
    '%s',
    async (key, { method, path, entry }) => {
      await fc.assert(
        fc.asyncProperty(casesFor(method, entry), async (c) => {
          const res = await send(key, method, fillNowhere(path), entry, c);
          if (res.status >= 500) {
            throw new Error(`${key} answered ${res.status} ${JSON.stringify(res.body)} to ${JSON.stringify(c).slice(0, 600)}`);
          }
          // Refusals use the one error shape, with a stable code (431: Node's own answer to
          // headers over its 16 KiB limit, before the app is reached).
          if (res.status >= 400 && res.status !== 431) {
            expect(typeof res.body?.error?.code, `${res.status} ${JSON.stringify(res.body)}`).toBe('string');
          }
        }),
        { numRuns: RUNS, endOnFailure: false },
      );
    },
    120_000,
  );
});
