import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '../../server/db/client.js';
import { attachments } from '../../server/db/schema/files.js';
import { ensureBucket } from '../../server/integrations/s3.js';
import { startTestS3, type TestS3 } from '../setup/fakes.js';
import { createOrganisation, signedIn, type Session } from '../factories/index.js';

// A minimal valid PDF header and a 1×1 PNG: their first bytes are what content sniffing reads
// (PDF: ISO 32000-1 §7.5.2 "%PDF-"; PNG: RFC 2083 §3.1 signature 89 50 4E 47 0D 0A 1A 0A).
const pdf = Buffer.from('%PDF-1.4\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n');
const png = Buffer.from(
  '89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8cfc0f01f0005000201a5f1e0d10000000049454e44ae426082',
  'hex',
);
const exe = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(200, 0x90)]);

let s3: TestS3;
let office: Session;
let org: Awaited<ReturnType<typeof createOrganisation>>;

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

const upload = (s: Session, wallId: string, name: string, content: Buffer, internal = false) =>
  s.agent
    .post(`/api/walls/${wallId}/documents`)
    .set('X-Requested-With', 'gridkeep')
    .field('internal', String(internal))
    .attach('file', content, name);

describe('wall documents', () => {
  it('uploads to object storage under a random key and downloads with the original name', async () => {
    const res = await upload(office, org.wall!.id, 'As-built — Hall A.pdf', pdf);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      fileName: 'As-built — Hall A.pdf',
      contentType: 'application/pdf',
      sizeBytes: pdf.length,
      kind: 'document',
    });
    const [row] = await db().select().from(attachments).where(eq(attachments.id, res.body.id));
    expect(row.storageKey).not.toContain('As-built');
    expect(row.storageKey).toMatch(/[0-9a-f-]{36}$/);
    expect(s3.current.keys('gridkeep-test')).toContain(row.storageKey);
    const list = await office.get(`/api/walls/${org.wall!.id}/documents`);
    expect(list.body.items.map((d: { id: string }) => d.id)).toContain(res.body.id);
    const download = await office
      .get(res.body.url)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(download.status).toBe(200);
    expect(Buffer.compare(download.body as Buffer, pdf)).toBe(0);
    expect(download.headers['content-type']).toBe('application/pdf');
    // RFC 6266 with the RFC 5987 UTF-8 form for the non-ASCII dash.
    expect(download.headers['content-disposition']).toBe(
      `attachment; filename="As-built _ Hall A.pdf"; filename*=UTF-8''${encodeURIComponent('As-built — Hall A.pdf')}`,
    );
  });

  it('checks the type by content, not by name', async () => {
    const renamed = await upload(office, org.wall!.id, 'drawing.pdf', exe);
    expect(renamed.status).toBe(415);
    expect(renamed.body.error.code).toBe('file_type_not_allowed');
    const image = await upload(office, org.wall!.id, 'photo.pdf', png);
    expect(image.status).toBe(201);
    expect(image.body.contentType).toBe('image/png');
    const text = await upload(office, org.wall!.id, 'controller-config.txt', Buffer.from('outputs=6\nbrightness=40\n'));
    expect(text.status).toBe(201);
    expect(text.body.contentType).toBe('text/plain');
  });

  it('refuses a file over the size limit with 413', async () => {
    const limit = Number(process.env.UPLOAD_MAX_BYTES ?? 25 * 1024 * 1024);
    const big = Buffer.concat([pdf, Buffer.alloc(limit, 0x20)]);
    const res = await upload(office, org.wall!.id, 'huge.pdf', big);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('file_too_large');
  });

  it('strips paths from the file name', async () => {
    const res = await upload(office, org.wall!.id, '../../etc/passwd.pdf', pdf);
    expect(res.status).toBe(201);
    expect(res.body.fileName).toBe('passwd.pdf');
  });

  it('hides internal documents and other organisations’ documents from client users', async () => {
    const shared = (await upload(office, org.wall!.id, 'calibration.pdf', pdf)).body;
    const internal = (await upload(office, org.wall!.id, 'pricing.pdf', pdf, true)).body;
    const mine = await signedIn('client', org.client.id);
    const list = await mine.get(`/api/walls/${org.wall!.id}/documents`);
    const ids = list.body.items.map((d: { id: string }) => d.id);
    expect(ids).toContain(shared.id);
    expect(ids).not.toContain(internal.id);
    expect((await mine.get(internal.url)).status).toBe(404);
    expect((await upload(mine, org.wall!.id, 'x.pdf', pdf)).status).toBe(404);
    const other = await createOrganisation();
    const stranger = await signedIn('client', other.client.id);
    expect((await stranger.get(shared.url)).status).toBe(404);
    expect((await stranger.get(`/api/walls/${org.wall!.id}/documents`)).status).toBe(404);
  });
});
