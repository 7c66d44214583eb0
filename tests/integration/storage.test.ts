// Object storage through the AWS SDK (server/integrations/s3.ts) against the local S3 fake.
import { createHash, randomBytes } from 'node:crypto';
import { Readable } from 'node:stream';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type * as Storage from '../../server/integrations/s3.js';
import { setEnv, startTestS3, type TestS3 } from '../setup/fakes.js';

let s3: TestS3;
let restoreEnv: () => void;
let storage: typeof Storage;

async function readAll(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk));
  return Buffer.concat(chunks);
}

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');

beforeAll(async () => {
  s3 = await startTestS3(`gridkeep-storage-${Date.now()}`);
  // The server reads its settings once, on first use: point it at this fake before that.
  restoreEnv = setEnv(s3.env);
  storage = await import('../../server/integrations/s3.js');
  await storage.ensureBucket();
});

afterAll(async () => {
  storage?.closeStorage();
  await s3?.dispose();
  restoreEnv?.();
});

describe('object storage', () => {
  it('creates the bucket once and finds it again', async () => {
    // ensureBucket() ran in beforeAll; a second call must see the bucket (HeadBucket 200), not fail.
    await expect(storage.ensureBucket()).resolves.toBeUndefined();
  });

  it('round-trips every byte value, unchanged, through put and get', async () => {
    // Every byte 0x00–0xFF, repeated: catches text decoding and chunk framing stored inside the
    // object (the SDK's default checksums do that against S3-compatible fakes; STACK.md).
    const body = Buffer.alloc(256 * 40);
    for (let i = 0; i < body.length; i++) body[i] = i % 256;
    const key = storage.newStorageKey('walls/test/documents');
    const put = await storage.putObject(key, body, 'application/octet-stream');
    expect(put).toEqual({ key, sizeBytes: body.length });
    const back = await readAll(await storage.getObjectStream(key));
    expect(back.length).toBe(body.length);
    expect(back.equals(body)).toBe(true);
    expect(s3.current.keys(s3.env.S3_BUCKET)).toContain(key);
  });

  it('stores a stream of several megabytes', async () => {
    const body = randomBytes(5 * 1024 * 1024 + 17);
    const key = storage.newStorageKey('tickets/photos');
    const source = Readable.from([body.subarray(0, 1_000_000), body.subarray(1_000_000)]);
    const put = await storage.putObject(key, source, 'image/jpeg');
    expect(put.sizeBytes).toBe(body.length);
    expect(sha256(await storage.getObjectBuffer(key))).toBe(sha256(body));
  });

  it('keeps objects when the store restarts', async () => {
    const key = storage.newStorageKey('visits/reports');
    await storage.putObject(key, 'report body', 'application/pdf');
    await s3.restart();
    expect((await storage.getObjectBuffer(key)).toString()).toBe('report body');
  });

  it('deletes objects; a missing object is a 404 not_found, and deleting twice is fine', async () => {
    const key = storage.newStorageKey('walls/x');
    await storage.putObject(key, Buffer.from('to be removed'), 'text/plain');
    await storage.deleteObject(key);
    await expect(storage.getObjectStream(key)).rejects.toMatchObject({ status: 404, code: 'not_found' });
    await expect(storage.deleteObject(key)).resolves.toBeUndefined();
    expect(s3.current.keys(s3.env.S3_BUCKET)).not.toContain(key);
  });

  it('makes random keys that never carry a file name (OWASP File Upload Cheat Sheet)', () => {
    const keys = new Set(Array.from({ length: 200 }, () => storage.newStorageKey('walls/abc/documents')));
    expect(keys.size).toBe(200);
    for (const key of keys) {
      // prefix, then an RFC 9562 version-4 UUID
      expect(key).toMatch(/^walls\/abc\/documents\/[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    }
    // A prefix cannot climb out of its folder or carry odd characters.
    expect(storage.newStorageKey('../Wall Docs/../x')).toMatch(/^wall-docs\/x\/[0-9a-f-]{36}$/);
  });
});
