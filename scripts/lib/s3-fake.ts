// The local S3 fake: s3rver on loopback, keeping objects on disk so they survive a restart.
// Used by `npm start` / `npm run dev` (data in .data/s3) and by integration tests (a temp folder).
import fs from 'node:fs';
import type { Server as HttpServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';

export interface S3FakeOptions {
  /** Where objects are kept; a new temporary folder when omitted. */
  dir?: string;
  /** 0 or omitted: any free port. */
  port?: number;
  /** Buckets to create at start (the app also creates its own with ensureBucket()). */
  buckets?: string[];
}

export interface S3Fake {
  port: number;
  endpoint: string;
  dir: string;
  /** The object keys stored in a bucket, read from disk. */
  keys: (bucket: string) => string[];
  stop: () => Promise<void>;
}

/** The static credentials the fake accepts (s3rver's own defaults). */
export const s3FakeCredentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } as const;

export async function startS3Fake(options: S3FakeOptions = {}): Promise<S3Fake> {
  const dir = options.dir ?? fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-s3-'));
  fs.mkdirSync(dir, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port: options.port ?? 0,
    directory: dir,
    silent: true,
    resetOnClose: false,
    configureBuckets: (options.buckets ?? []).map((name) => ({ name, configs: [] })),
  });
  const address = (await server.run()) as AddressInfo;
  const port = address.port;

  let stopped = false;
  const stop = async () => {
    if (stopped) return;
    stopped = true;
    // Drop keep-alive sockets so close() does not wait for the SDK's idle connections.
    const http = (server as unknown as { httpServer?: HttpServer }).httpServer;
    const closing = server.close();
    http?.closeAllConnections();
    await closing;
  };

  const keys = (bucket: string) => {
    const root = path.join(dir, bucket);
    if (!fs.existsSync(root)) return [];
    const out: string[] = [];
    const walk = (folder: string) => {
      for (const entry of fs.readdirSync(folder, { withFileTypes: true })) {
        const full = path.join(folder, entry.name);
        if (entry.isDirectory()) walk(full);
        // s3rver keeps each object as `<key>._S3rver_object` beside its metadata files.
        else if (entry.name.endsWith('._S3rver_object')) {
          out.push(path.relative(root, full).slice(0, -'._S3rver_object'.length).split(path.sep).join('/'));
        }
      }
    };
    walk(root);
    return out.sort();
  };

  return { port, endpoint: `http://127.0.0.1:${port}`, dir, keys, stop };
}
