// Object storage: the only module that touches the AWS SDK. Locally it talks to the S3 fake
// (s3rver, started by `npm start`), in production to any S3-compatible store.
import { randomUUID } from 'node:crypto';
import { Readable } from 'node:stream';
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { config } from '../config.js';
import { notFound } from '../errors.js';

let client: S3Client | undefined;

function s3(): S3Client {
  if (!client) {
    const cfg = config();
    // The SDK is pinned to a release that supports Node 20 (STACK.md); its notice that later
    // releases will not is known and says nothing about this one.
    process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
    client = new S3Client({
      region: cfg.S3_REGION,
      ...(cfg.S3_ENDPOINT ? { endpoint: cfg.S3_ENDPOINT } : {}),
      forcePathStyle: cfg.S3_FORCE_PATH_STYLE,
      credentials: { accessKeyId: cfg.S3_ACCESS_KEY_ID, secretAccessKey: cfg.S3_SECRET_ACCESS_KEY },
      // Send and check checksums only where S3 requires them: the default flexible checksums
      // break S3-compatible stores such as the local fake (see STACK.md).
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
  }
  return client;
}

function bucket() {
  return config().S3_BUCKET;
}

function isMissing(err: unknown) {
  if (err instanceof S3ServiceException) {
    return err.$metadata.httpStatusCode === 404 || ['NoSuchKey', 'NotFound', 'NoSuchBucket'].includes(err.name);
  }
  return false;
}

/**
 * A new random object key under a prefix such as `walls/<id>/documents`. Never derived from the
 * uploaded file's name (OWASP File Upload Cheat Sheet: "generate a new filename").
 */
export function newStorageKey(prefix: string): string {
  const clean = prefix
    .toLowerCase()
    .split('/')
    .filter((part) => part !== '.' && part !== '..')
    .map((part) => part.replace(/[^a-z0-9_-]+/g, '-').replace(/^-+|-+$/g, ''))
    .filter(Boolean)
    .join('/');
  return clean ? `${clean}/${randomUUID()}` : randomUUID();
}

/** Creates the configured bucket when it does not exist yet (called at start). */
export async function ensureBucket(): Promise<void> {
  try {
    await s3().send(new HeadBucketCommand({ Bucket: bucket() }));
  } catch (err) {
    if (!isMissing(err)) throw err;
    try {
      await s3().send(new CreateBucketCommand({ Bucket: bucket() }));
    } catch (createErr) {
      // Several app processes starting together race to create it: the loser finds it made.
      const name = (createErr as Error).name;
      if (name !== 'BucketAlreadyOwnedByYou' && name !== 'BucketAlreadyExists') throw createErr;
    }
  }
}

async function toBuffer(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk));
  return Buffer.concat(chunks);
}

/**
 * Stores an object. A stream is read into memory first (uploads are capped by UPLOAD_MAX_BYTES),
 * since S3 needs each object's length before its body.
 */
export async function putObject(
  key: string,
  body: Buffer | Uint8Array | string | Readable,
  contentType: string,
): Promise<{ key: string; sizeBytes: number }> {
  const data = body instanceof Readable ? await toBuffer(body) : typeof body === 'string' ? Buffer.from(body) : body;
  await s3().send(
    new PutObjectCommand({
      Bucket: bucket(),
      Key: key,
      Body: data,
      ContentType: contentType,
      ContentLength: data.byteLength,
    }),
  );
  return { key, sizeBytes: data.byteLength };
}

/** The object's bytes as a stream; a missing object is a 404 `not_found`. */
export async function getObjectStream(key: string): Promise<Readable> {
  try {
    const out = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
    if (!out.Body) throw notFound('File');
    return out.Body as Readable;
  } catch (err) {
    if (isMissing(err)) throw notFound('File');
    throw err;
  }
}

/** The whole object in memory (mail attachments, small files). */
export async function getObjectBuffer(key: string): Promise<Buffer> {
  return toBuffer(await getObjectStream(key));
}

/** Removes an object; removing one that is already gone is not an error. */
export async function deleteObject(key: string): Promise<void> {
  try {
    await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
  } catch (err) {
    if (!isMissing(err)) throw err;
  }
}

/** Releases the client's sockets (graceful shutdown). */
export function closeStorage() {
  client?.destroy();
  client = undefined;
}
