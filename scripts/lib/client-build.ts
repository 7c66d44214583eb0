// Builds the client with Vite's JS API, unless dist/ is newer than every source of it.
import fs from 'node:fs';
import path from 'node:path';
import { projectRoot } from './local-services.js';

/** Written after a finished build: its time is the build's (Vite empties dist/ when it starts). */
const stampName = '.build-stamp';

/** What the client bundle is made from. shared/ is imported by the client too. */
const sources = ['src', 'shared', 'public', 'index.html', 'tailwind.config.ts', 'vite.config.ts', 'postcss.config.js'];

function newestMtime(entry: string): number {
  let stat: fs.Stats;
  try {
    stat = fs.statSync(entry);
  } catch {
    return 0;
  }
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs; // a deleted file shows as a newer folder
  for (const name of fs.readdirSync(entry)) newest = Math.max(newest, newestMtime(path.join(entry, name)));
  return newest;
}

export function clientIsStale(root = projectRoot): boolean {
  const stamp = path.join(root, 'dist', stampName);
  if (!fs.existsSync(stamp) || !fs.existsSync(path.join(root, 'dist', 'index.html'))) return true;
  const built = fs.statSync(stamp).mtimeMs;
  return sources.some((s) => newestMtime(path.join(root, s)) > built);
}

export async function buildClientIfStale(log: (line: string) => void = console.log, root = projectRoot): Promise<boolean> {
  if (!clientIsStale(root)) {
    log('Client is up to date (dist/).');
    return false;
  }
  log('Building the client (vite build)…');
  const started = Date.now();
  const { build } = await import('vite');
  // Build beside dist/ and swap it in at the end: a server already running from dist/ (another
  // `npm start`, the browser tests) never finds it half empty while Vite writes.
  const dist = path.join(root, 'dist');
  const scratch = path.join(root, 'node_modules/.cache/gridkeep');
  fs.mkdirSync(scratch, { recursive: true });
  const next = path.join(scratch, `dist-next-${process.pid}`);
  const old = path.join(scratch, `dist-old-${process.pid}`);
  try {
    await build({
      root,
      configFile: path.join(root, 'vite.config.ts'),
      logLevel: 'warn',
      mode: 'production',
      build: { outDir: next, emptyOutDir: true },
    });
    fs.writeFileSync(path.join(next, stampName), new Date().toISOString() + '\n');
    if (fs.existsSync(dist)) fs.renameSync(dist, old);
    fs.renameSync(next, dist);
  } finally {
    fs.rmSync(next, { recursive: true, force: true });
    fs.rmSync(old, { recursive: true, force: true });
  }
  log(`Client built in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
  return true;
}
