// The built client (dist/): precompressed files, caching by kind, source maps kept private.
import fs from 'node:fs/promises';
import path from 'node:path';
import express, { type Request, type Response } from 'express';

/** Hashed build output: its name changes whenever its content does, so a browser keeps it a year. */
const IMMUTABLE = 'public, max-age=31536000, immutable';
/** index.html, sw.js, the manifest, the icon: always asked again (a 304 when unchanged). */
const REVALIDATE = 'no-cache';

/** The variants vite.config.ts writes beside each text file, in order of preference. */
const variants = [
  { encoding: 'br', suffix: '.br' },
  { encoding: 'gzip', suffix: '.gz' },
] as const;

async function isFile(file: string): Promise<boolean> {
  try {
    return (await fs.stat(file)).isFile();
  } catch {
    return false;
  }
}

/** The relative path of a request inside root, or null when it is not a plain path inside it. */
function relativePath(root: string, urlPath: string): string | null {
  let decoded: string;
  try {
    decoded = decodeURIComponent(urlPath);
  } catch {
    return null;
  }
  if (decoded.includes('\0') || decoded.includes('\\')) return null;
  const resolved = path.resolve(root, '.' + path.posix.normalize('/' + decoded));
  if (resolved !== root && !resolved.startsWith(root + path.sep)) return null;
  const relative = path.relative(root, resolved);
  // Dot files (the build stamp) are not part of the site.
  return relative.split(path.sep).some((part) => part.startsWith('.')) ? null : relative;
}

/**
 * Sends `relative` (a file under root) in the best encoding the caller accepts that has been
 * built: brotli, else gzip, else as it is. The compressed file goes out with the original's type;
 * ETag and Last-Modified come from the file sent, so each encoding has its own validator.
 * Resolves false when the file does not exist.
 */
async function sendBest(req: Request, res: Response, root: string, relative: string, cacheControl: string): Promise<boolean> {
  const original = path.join(root, relative);
  if (!(await isFile(original))) return false;
  res.setHeader('Vary', 'Accept-Encoding');
  res.setHeader('Cache-Control', cacheControl);
  let file = relative;
  for (const variant of variants) {
    // acceptsEncodings answers false for an encoding the caller refuses (or does not name).
    if (!req.acceptsEncodings(variant.encoding) || !(await isFile(original + variant.suffix))) continue;
    file = relative + variant.suffix;
    res.setHeader('Content-Encoding', variant.encoding);
    res.type(path.extname(relative));
    break;
  }
  await new Promise<void>((resolve, reject) =>
    res.sendFile(file, { root, cacheControl: false, lastModified: true, etag: true }, (err) => {
      if (!err || res.headersSent) return resolve();
      res.removeHeader('Content-Encoding'); // the error answer is not the compressed file
      reject(err);
    }),
  );
  return true;
}

/**
 * Serves the built client: `/assets/*` immutable for a year (404 when missing, never the page),
 * every other file revalidated, and any other GET the app's page (a client route such as
 * /c/<serial> from a QR label). Source maps are written by the build for error reports but
 * answer 404 here.
 */
export function clientFiles(distDir: string) {
  const root = path.resolve(distDir);
  const router = express.Router();
  const notFound = (res: Response) => res.status(404).type('text/plain').setHeader('Cache-Control', 'no-store').send('Not found');

  router.use(async (req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    try {
      const relative = relativePath(root, req.path);
      if (relative === null) return notFound(res);
      if (relative.endsWith('.map')) return notFound(res);
      const isAsset = relative.startsWith('assets' + path.sep);
      if (await sendBest(req, res, root, relative, isAsset ? IMMUTABLE : REVALIDATE)) return;
      if (isAsset) return notFound(res);
      if (!(await sendBest(req, res, root, 'index.html', REVALIDATE))) return notFound(res);
    } catch (err) {
      next(err);
    }
  });
  return router;
}
