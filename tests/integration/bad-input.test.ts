// Cheap bad input never costs a 500: NUL characters, integers beyond PostgreSQL's `integer`,
// crafted page cursors, empty updates, broken uploads, unknown charsets and encodings each get a
// 400 (or 413/415) in the error shape that names the field at fault.
// OWASP ASVS 5.0 2.2.1 (input is validated against expected structure and ranges) and 16.5.3
// (the application fails gracefully and securely): a refusal is an answer the caller can act on,
// never a server error. Checked against the ASVS 5.0.0 text.
import { randomUUID } from 'node:crypto';
import type request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { cabinetModelFigures, createOrganisation, signedIn, unique, type Session } from '../factories/index.js';

let admin: Session;
let org: Awaited<ReturnType<typeof createOrganisation>>;

beforeAll(async () => {
  admin = await signedIn('admin');
  org = await createOrganisation({ withWall: true });
});

const NUL = '\u0000';
const TOO_BIG = 2 ** 31; // one more than PostgreSQL's largest `integer` (PostgreSQL manual, 8.1.1)

/** "METHOD /path" of the request behind a response, for a failing check's message. */
function describeRequest(res: request.Response) {
  const req = (res as unknown as { req?: { method?: string; path?: string } }).req;
  return `${req?.method ?? ''} ${req?.path ?? ''}`;
}

/** Every refusal: a 4xx (never a 5xx) in the error shape, naming `field`. */
function expectRefused(res: request.Response, field: string, statuses = [400]) {
  const what = `${describeRequest(res)} → ${res.status} ${JSON.stringify(res.body)}`;
  expect(statuses, what).toContain(res.status);
  expect(res.body.error?.code, what).toEqual(expect.any(String));
  expect(Object.keys(res.body.error?.fields ?? {}), what).toContain(field);
}

const cursorOf = (value: unknown) => Buffer.from(JSON.stringify(value)).toString('base64url');

describe('NUL characters', () => {
  // Every list route that takes a search or filter text.
  const lists: [string, string][] = [
    ['/api/clients', 'q'],
    ['/api/sites', 'q'],
    ['/api/walls', 'q'],
    ['/api/tickets', 'q'],
    ['/api/users', 'q'],
    ['/api/parts', 'q'],
    ['/api/search', 'q'],
    ['/api/cabinets', 'serial'],
    ['/api/stock', 'batch'],
    ['/api/stock-movements', 'batch'],
    ['/api/audit', 'entity'],
    ['/api/visits', 'q'],
  ];
  it.each(lists)('GET %s?%s=<NUL> is a 400 naming the parameter', async (path, param) => {
    const res = await admin.get(`${path}?${param}=a%00b`);
    expectRefused(res, param);
  });

  it('refuses NUL in a path segment (a serial looked up from a label)', async () => {
    const res = await admin.get('/api/cabinets/by-serial/AB%00CD');
    expectRefused(res, 'path');
  });

  // Write routes with a text field; the check runs before the route, so the rest of the body may be anything.
  type Body = Record<string, unknown> | (() => Record<string, unknown>);
  const writes: [method: 'post' | 'patch' | 'put', path: () => string, body: Body, field: string][] = [
    ['post', () => '/api/clients', { name: `Acme${NUL}` }, 'name'],
    ['patch', () => `/api/clients/${org.client.id}`, { notes: `x${NUL}` }, 'notes'],
    ['post', () => '/api/contacts', () => ({ clientId: org.client.id, name: `A${NUL}`, email: 'a@example.test' }), 'name'],
    ['post', () => '/api/sites', () => ({ clientId: org.client.id, name: `Hall${NUL}` }), 'name'],
    ['patch', () => `/api/sites/${org.site.id}`, { address: `1 Main${NUL}` }, 'address'],
    ['post', () => '/api/walls', () => ({ siteId: org.site.id, name: `Wall${NUL}` }), 'name'],
    ['patch', () => `/api/walls/${org.wall!.id}`, { name: `W${NUL}` }, 'name'],
    ['post', () => '/api/cabinet-models', { name: `Model${NUL}` }, 'name'],
    ['post', () => '/api/controllers', { serial: `C${NUL}` }, 'serial'],
    ['post', () => '/api/tickets', () => ({ title: `Dark${NUL}`, clientId: org.client.id }), 'title'],
    ['post', () => `/api/tickets/${randomUUID()}/comments`, { body: `hello${NUL}` }, 'body'],
    ['post', () => '/api/parts', { name: `Fan${NUL}`, sku: 'X' }, 'name'],
    ['post', () => '/api/stock-locations', { name: `Van${NUL}` }, 'name'],
    ['post', () => '/api/users', { name: `Sam${NUL}`, email: 'sam@example.test' }, 'name'],
    ['post', () => '/api/visits', { notes: `n${NUL}` }, 'notes'],
    ['post', () => '/api/auth/login', { email: `a${NUL}@example.test`, password: 'x' }, 'email'],
    ['post', () => '/api/auth/forgot', { email: `a${NUL}@example.test` }, 'email'],
    ['post', () => '/api/ticket-views', { name: `v${NUL}` }, 'name'],
    ['put', () => `/api/walls/${org.wall!.id}/plan`, { runs: [{ label: `r${NUL}` }] }, 'runs.0.label'],
    ['post', () => '/api/calc/due', { timeZone: `UTC${NUL}` }, 'timeZone'],
  ];
  it.each(writes)('%s %s with a NUL in a text field is a 400 naming the field', async (method, path, body, field) => {
    const res = await admin[method](path(), typeof body === 'function' ? body() : body);
    expectRefused(res, field);
    expect(res.body.error.fields[field]).toMatch(/NUL/);
  });

  it('refuses NUL in a CSV import, whichever column holds it', async () => {
    const res = await admin.agent
      .post(`/api/walls/${org.wall!.id}/cabinets/import`)
      .set('X-Requested-With', 'gridkeep')
      .set('Content-Type', 'text/csv')
      .send(`serial,column,row,batch\nNUL-1,1,1,B${NUL}1\n`);
    expectRefused(res, 'body');
  });

  it('refuses NUL in a field name too', async () => {
    const res = await admin.post('/api/clients', { [`na${NUL}me`]: 'Acme' });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error.fields)).toMatch(/NUL/);
  });
});

describe('integers beyond PostgreSQL integer', () => {
  const cases: [string, 'post' | 'patch', () => string, Record<string, unknown>, string][] = [
    ['a cabinet move', 'post', () => `/api/cabinets/${randomUUID()}/move`, { wallId: randomUUID(), column: TOO_BIG, row: 1 }, 'column'],
    ['controller outputs', 'post', () => '/api/controllers', { model: 'MCTRL', serial: unique('BIG'), outputs: TOO_BIG }, 'outputs'],
    ['outputs in use', 'patch', () => `/api/controllers/${randomUUID()}`, { outputsInUse: TOO_BIG }, 'outputsInUse'],
    [
      'model pixels',
      'post',
      () => '/api/cabinet-models',
      { ...cabinetModelFigures, name: unique('Big'), pixelsWide: TOO_BIG },
      'pixelsWide',
    ],
    ['model cabinets per chain', 'patch', () => `/api/cabinet-models/${randomUUID()}`, { maxPerChain: TOO_BIG }, 'maxPerChain'],
  ];
  it.each(cases)('%s of 2^31 is a 400 naming the field', async (_what, method, path, body, field) => {
    const res = await admin[method](path(), body);
    expectRefused(res, field);
  });

  it('a list limit of 2^31 is a 400 naming limit', async () => {
    expectRefused(await admin.get(`/api/clients?limit=${TOO_BIG}`), 'limit');
  });
});

describe('crafted page cursors', () => {
  const uuid = randomUUID();
  // Each list and how many values its cursor holds.
  // Each list, how many values its cursor holds, and whether it pages by a date or time.
  const lists: [string, number, boolean][] = [
    ['/api/clients', 2, false],
    ['/api/clients?sort=createdAt', 2, true],
    ['/api/sites', 2, false],
    ['/api/walls', 2, false],
    ['/api/tickets', 2, true],
    ['/api/tickets?sort=updatedAt&dir=desc', 2, true],
    ['/api/users', 2, false],
    ['/api/audit', 2, true],
    ['/api/cabinets', 2, false],
    ['/api/cabinets?sort=installedOn', 2, true],
    ['/api/visits', 2, true],
    ['/api/repairs', 2, true],
    ['/api/parts', 2, false],
    ['/api/stock', 5, false],
    ['/api/stock-movements', 1, false],
  ];
  /** Cursors that no page ever hands out, for a cursor of `n` values. */
  const crafted = (n: number, dated: boolean): [string, string][] => [
    ['not base64url', '%%%'],
    ['not JSON', Buffer.from('{oops').toString('base64url')],
    ['not a list', cursorOf({ a: 1 })],
    ['too short', cursorOf([])],
    ['too long', cursorOf([...Array(n + 1).fill('a')])],
    ['an object for a value', cursorOf([...Array(n - 1).fill('a'), { $gt: '' }])],
    ['a list for a value', cursorOf([[1, 2], ...Array(n - 1).fill(uuid)])],
    ['a NUL in a value', cursorOf([`a${NUL}`, ...Array(n - 1).fill(uuid)])],
    ['an id that is no uuid', cursorOf([...Array(n - 1).fill('a'), 'not-a-uuid'])],
    ['a number of 10^400', Buffer.from(`[1e400${',"a"'.repeat(n - 1)}]`).toString('base64url')],
    // Only where the list pages by a date or time (elsewhere the same text is a valid name).
    ...(dated ? ([['an impossible date', cursorOf(['2026-02-31T99:99:99Z', uuid])]] as [string, string][]) : []),
  ];
  for (const [path, n, dated] of lists) {
    it.each(crafted(n, dated))(`GET ${path} with a cursor that is %s is a 400 naming cursor`, async (_what, cursor) => {
      const res = await admin.get(`${path}${path.includes('?') ? '&' : '?'}cursor=${encodeURIComponent(cursor)}`);
      expectRefused(res, 'cursor');
    });
  }

  it('still pages with the cursor a list hands out', async () => {
    await createOrganisation();
    const first = await admin.get('/api/clients?limit=1');
    expect(first.status).toBe(200);
    expect(first.body.nextCursor).toEqual(expect.any(String));
    const second = await admin.get(`/api/clients?limit=1&cursor=${first.body.nextCursor}`);
    expect(second.status).toBe(200);
    expect(second.body.items[0].id).not.toBe(first.body.items[0].id);
  });
});

describe('empty updates', () => {
  const patches: [string, () => string][] = [
    ['a client', () => `/api/clients/${org.client.id}`],
    ['a contact', () => `/api/contacts/${randomUUID()}`],
    ['a site', () => `/api/sites/${org.site.id}`],
    ['a cabinet model', () => `/api/cabinet-models/${org.wall!.cabinetModelId}`],
    ['a controller', () => `/api/controllers/${randomUUID()}`],
  ];
  it.each(patches)('PATCH {} on %s is a 400 nothing_to_change', async (_what, path) => {
    const res = await admin.patch(path(), {});
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('nothing_to_change');
    expect(res.body.error.fields).toEqual({ _: 'Nothing to change.' });
  });

  it('a PATCH with only unknown fields changes nothing either', async () => {
    const res = await admin.patch(`/api/clients/${org.client.id}`, { colour: 'red' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('nothing_to_change');
  });

  it('a PATCH that names a field still works', async () => {
    const res = await admin.patch(`/api/clients/${org.client.id}`, { notes: 'changed' });
    expect(res.status).toBe(200);
  });
});

describe('broken uploads', () => {
  const pdf = Buffer.from('%PDF-1.4\n%%EOF\n');
  const documents = () => `/api/walls/${org.wall!.id}/documents`;
  const post = () => admin.agent.post(documents()).set('X-Requested-With', 'gridkeep');

  it('a file in a misnamed field is a 400 naming that field', async () => {
    expectRefused(await post().attach('document', pdf, 'a.pdf'), 'document');
  });

  it('two files are a 400 naming file', async () => {
    const res = await post().attach('file', pdf, 'a.pdf').attach('file', pdf, 'b.pdf');
    expectRefused(res, 'file');
    expect(res.body.error.code).toBe('too_many_files');
  });

  it('too many fields are a 413', async () => {
    let req = post();
    for (let i = 0; i < 15; i++) req = req.field(`f${i}`, 'x');
    expectRefused(await req.attach('file', pdf, 'a.pdf'), 'body', [413]);
  });

  it('a body that does not match its multipart boundary is a 400 naming file', async () => {
    const res = await post()
      .set('Content-Type', 'multipart/form-data; boundary=----expected')
      .send('------other\r\nContent-Disposition: form-data; name="file"; filename="a.pdf"\r\n\r\n%PDF');
    expectRefused(res, 'file');
  });

  it('a multipart body without a boundary is a 400 naming file', async () => {
    expectRefused(await post().set('Content-Type', 'multipart/form-data').send('whatever'), 'file');
  });

  it('a zero-byte wall document is a 400 naming file', async () => {
    const res = await post().attach('file', Buffer.alloc(0), 'empty.pdf');
    expectRefused(res, 'file');
    expect(res.body.error.fields.file).toMatch(/empty/i);
  });

  it('a NUL in a multipart text field is a 400 naming it', async () => {
    expectRefused(await post().field('internal', `tr${NUL}ue`).attach('file', pdf, 'a.pdf'), 'internal');
  });
});

describe('bodies the parser cannot read', () => {
  const raw = () => admin.agent.post('/api/clients').set('X-Requested-With', 'gridkeep');

  it('an unknown charset is a 415 naming content-type', async () => {
    const res = await raw().set('Content-Type', 'application/json; charset=klingon').send('{"name":"Acme"}');
    expectRefused(res, 'content-type', [415]);
  });

  it('an unknown Content-Encoding is a 415 naming content-encoding', async () => {
    const res = await raw().set('Content-Type', 'application/json').set('Content-Encoding', 'br2').send('{"name":"Acme"}');
    expectRefused(res, 'content-encoding', [415]);
  });

  it('a gzip body that is not gzip is a 400, not a 500', async () => {
    const res = await raw().set('Content-Type', 'application/json').set('Content-Encoding', 'gzip').send('{"name":"Acme"}');
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expect(res.body.error.fields).toEqual({ body: expect.any(String) });
  });

  it('malformed JSON is a 400 naming body', async () => {
    expectRefused(await raw().set('Content-Type', 'application/json').send('{"name":'), 'body');
  });
});
