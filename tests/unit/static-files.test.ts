// The built client as server/middleware/static-files.ts serves it, on a folder laid out as
// `vite build` writes dist/ (vite.config.ts): hashed files in assets/, each text file with a
// .br and a .gz beside it, hidden source maps. Raw HTTP, so the bytes on the wire are checked
// and nothing is decompressed on the way.
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { brotliCompressSync, brotliDecompressSync, gunzipSync, gzipSync } from 'node:zlib';
import express from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { clientFiles } from '../../server/middleware/static-files';

const page = '<!doctype html><html><body><div id="root"></div><script src="/assets/index-AbC123.js"></script></body></html>';
const script = `export const greeting = ${JSON.stringify('cabinet '.repeat(200))};\n`;

let dir: string;
let server: http.Server;
let base: string;

function write(relative: string, content: string | Buffer) {
  fs.mkdirSync(path.dirname(path.join(dir, relative)), { recursive: true });
  fs.writeFileSync(path.join(dir, relative), content);
}

type Answer = { status: number; headers: http.IncomingHttpHeaders; body: Buffer };
function get(url: string, headers: Record<string, string> = {}, method = 'GET'): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const req = http.request(`${base}${url}`, { method, headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode!, headers: res.headers, body: Buffer.concat(chunks) }));
    });
    req.on('error', reject);
    req.end();
  });
}

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-static-'));
  write('index.html', page);
  write('index.html.br', brotliCompressSync(page));
  write('index.html.gz', gzipSync(page));
  write('assets/index-AbC123.js', script);
  write('assets/index-AbC123.js.br', brotliCompressSync(script));
  write('assets/index-AbC123.js.gz', gzipSync(script));
  write('assets/index-AbC123.js.map', '{"version":3,"sources":["src/main.tsx"],"mappings":""}');
  // Too small to gain from compression: the build writes no .br or .gz for it.
  write('assets/tiny-Zz9.js', 'export{};');
  write('favicon.svg', '<svg xmlns="http://www.w3.org/2000/svg"/>');
  write('.build-stamp', '2026-01-01T00:00:00.000Z\n');
  const app = express();
  app.use(clientFiles(dir));
  server = app.listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});

afterAll(async () => {
  await new Promise<void>((resolve) => server.close(() => resolve()));
  fs.rmSync(dir, { recursive: true, force: true });
});

describe('encodings (RFC 9110 §8.4 Content-Encoding, §12.5.3 Accept-Encoding, §12.5.5 Vary)', () => {
  it('sends the brotli file when the browser accepts brotli, with the type of the script', async () => {
    const res = await get('/assets/index-AbC123.js', { 'Accept-Encoding': 'gzip, deflate, br, zstd' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/^text\/javascript/);
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    expect(res.headers.etag).toBeTruthy();
    expect(Number(res.headers['content-length'])).toBe(fs.statSync(path.join(dir, 'assets/index-AbC123.js.br')).size);
    expect(brotliDecompressSync(res.body).toString()).toBe(script);
  });

  it('sends the gzip file when brotli is not accepted', async () => {
    const res = await get('/assets/index-AbC123.js', { 'Accept-Encoding': 'gzip, deflate' });
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers['content-type']).toMatch(/^text\/javascript/);
    expect(gunzipSync(res.body).toString()).toBe(script);
  });

  it('does not send brotli that the browser refuses with q=0', async () => {
    const res = await get('/assets/index-AbC123.js', { 'Accept-Encoding': 'br;q=0, gzip' });
    expect(res.headers['content-encoding']).toBe('gzip');
  });

  it('sends the file as it is when neither encoding is accepted, or no Accept-Encoding is sent', async () => {
    for (const headers of [{ 'Accept-Encoding': 'identity' }, {}] as Record<string, string>[]) {
      const res = await get('/assets/index-AbC123.js', headers);
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBeUndefined();
      expect(res.headers.vary).toMatch(/Accept-Encoding/i);
      expect(res.body.toString()).toBe(script);
    }
  });

  it('sends a file without a compressed copy as it is, even to a browser that takes brotli', async () => {
    const res = await get('/assets/tiny-Zz9.js', { 'Accept-Encoding': 'br, gzip' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.body.toString()).toBe('export{};');
  });

  it('gives each encoding its own ETag and answers 304 to a matching If-None-Match', async () => {
    const br = await get('/assets/index-AbC123.js', { 'Accept-Encoding': 'br' });
    const gz = await get('/assets/index-AbC123.js', { 'Accept-Encoding': 'gzip' });
    expect(br.headers.etag).not.toBe(gz.headers.etag);
    const again = await get('/assets/index-AbC123.js', { 'Accept-Encoding': 'br', 'If-None-Match': br.headers.etag! });
    expect(again.status).toBe(304);
  });

  it('answers HEAD with the headers and no body', async () => {
    const res = await get('/assets/index-AbC123.js', { 'Accept-Encoding': 'br' }, 'HEAD');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.body.length).toBe(0);
  });
});

describe('caching (RFC 9111 §5.2.2; RFC 8246 immutable)', () => {
  it('keeps hashed assets a year, immutable', async () => {
    const res = await get('/assets/index-AbC123.js', { 'Accept-Encoding': 'br' });
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('has the page asked again every time (no-cache), compressed too', async () => {
    const res = await get('/', { 'Accept-Encoding': 'br, gzip' });
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.headers['content-encoding']).toBe('br');
    expect(brotliDecompressSync(res.body).toString()).toBe(page);
  });

  it('sends the page for a client route (a QR label’s /c/<serial>, dots included), not cached', async () => {
    const res = await get('/c/LED-0042.B', { 'Accept-Encoding': 'gzip' });
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(gunzipSync(res.body).toString()).toBe(page);
  });

  it('revalidates the other files at the root (icon)', async () => {
    const res = await get('/favicon.svg');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
  });
});

describe('what is never sent', () => {
  it('answers 404 for a source map, though it is on disk', async () => {
    const res = await get('/assets/index-AbC123.js.map', { 'Accept-Encoding': 'br, gzip' });
    expect(res.status).toBe(404);
    expect(res.body.toString()).not.toContain('mappings');
  });

  it('answers 404 for a missing asset instead of the page (a stale chunk must fail as a script)', async () => {
    const res = await get('/assets/gone-Old999.js', { 'Accept-Encoding': 'br' });
    expect(res.status).toBe(404);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.body.toString()).not.toContain('<html');
  });

  it('does not send dot files or anything outside the folder', async () => {
    expect((await get('/.build-stamp')).body.toString()).not.toContain('2026');
    for (const url of ['/../package.json', '/assets/%2e%2e/%2e%2e/package.json', '/%2e%2e%2fpackage.json']) {
      const res = await get(url);
      expect(res.body.toString()).not.toContain('"name"');
    }
  });

  it('leaves other methods to the next handler', async () => {
    const res = await get('/assets/index-AbC123.js', {}, 'POST');
    expect(res.status).toBe(404);
    expect(res.body.toString()).not.toContain('greeting');
  });
});
