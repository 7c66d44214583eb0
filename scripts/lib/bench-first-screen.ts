// `npm run bench -- firstscreen`: what a phone downloads and how soon it can be used.
//  - the JavaScript each entry page loads, gzipped, from the build's manifest (dist/.vite): the
//    page's own chunk, the app's entry and, for signed-in pages, the shell, with every chunk they
//    import statically (what the browser must have before the page draws);
//  - the first screen in Chromium on an emulated phone on a slow 4G link with an empty cache:
//    the sign-in form usable, and the technician's Today screen drawn.
// No timed tests: these are bench figures (targets from issue 17).
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { chromium, type BrowserContext } from 'playwright-core';

type ManifestChunk = { file: string; imports?: string[]; css?: string[]; isEntry?: boolean; isDynamicEntry?: boolean };
type Manifest = Record<string, ManifestChunk>;

export type PageScripts = { page: string; gzipBytes: number; rawBytes: number; files: number };

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** The files a chunk needs before it runs: itself and, recursively, what it imports statically. */
function closure(manifest: Manifest, key: string, into: Set<string>): Set<string> {
  const chunk = manifest[key];
  if (!chunk || into.has(chunk.file)) return into;
  into.add(chunk.file);
  for (const imported of chunk.imports ?? []) closure(manifest, imported, into);
  return into;
}

/**
 * The JavaScript each route module of src/app/routes costs on a first visit, gzipped at level 9
 * (as the build writes the .gz files). Sign-in and printed pages sit outside the app shell; every
 * other page loads the shell too (src/app/router.tsx).
 */
export function pageScriptSizes(distDir: string): PageScripts[] {
  const manifestPath = path.join(distDir, '.vite', 'manifest.json');
  if (!fs.existsSync(manifestPath)) throw new Error(`${manifestPath} is missing: build the client (vite.config.ts writes it).`);
  const manifest = JSON.parse(fs.readFileSync(manifestPath, 'utf8')) as Manifest;
  const entry = Object.keys(manifest).find((key) => manifest[key].isEntry && key.endsWith('index.html'));
  if (!entry) throw new Error('The manifest has no index.html entry.');
  const shell = Object.keys(manifest).find((key) => key.endsWith('src/app/routes/app/shell.tsx'));
  const sizes = new Map<string, { raw: number; gzip: number }>();
  const sizeOf = (file: string) => {
    let size = sizes.get(file);
    if (!size) {
      const content = fs.readFileSync(path.join(distDir, file));
      size = { raw: content.length, gzip: gzipSync(content, { level: 9 }).length };
      sizes.set(file, size);
    }
    return size;
  };
  const pages = Object.keys(manifest).filter((key) => manifest[key].isDynamicEntry && /src\/app\/routes\/.+\.tsx$/.test(key));
  return pages
    .map((key) => {
      const files = closure(manifest, entry, new Set());
      const outsideShell = /\/routes\/auth\/|-print\.tsx$/.test(key);
      if (!outsideShell && shell) closure(manifest, shell, files);
      closure(manifest, key, files);
      const scripts = [...files].filter((f) => f.endsWith('.js'));
      return {
        page: key.replace(/^.*src\/app\/routes\//, '').replace(/\.tsx$/, ''),
        gzipBytes: scripts.reduce((sum, f) => sum + sizeOf(f).gzip, 0),
        rawBytes: scripts.reduce((sum, f) => sum + sizeOf(f).raw, 0),
        files: scripts.length,
      };
    })
    .sort((a, b) => b.gzipBytes - a.gzipBytes);
}

/** Built scripts that still point at a source map (the build must keep them hidden). */
export function scriptsNamingTheirMap(distDir: string): string[] {
  const assets = path.join(distDir, 'assets');
  return fs
    .readdirSync(assets)
    .filter((f) => f.endsWith('.js') && /\/\/# sourceMappingURL=/.test(fs.readFileSync(path.join(assets, f), 'utf8')))
    .map((f) => `assets/${f}`);
}

/**
 * Network and CPU profiles. "brief" is the profile issue 17's target is measured on (1.6 Mbit/s
 * down, 750 kbit/s up, 150 ms round trip, CPU 4× slower: Lighthouse's mobile "slow 4G" settings,
 * lighthouse-core/config/constants.js `throttling.mobileSlow4G`). "devtools" is the same link as
 * Chrome DevTools' "Slow 4G" preset applies it per request (latency × 3.75, throughput × 0.9:
 * Lighthouse's `DEVTOOLS_RTT_ADJUSTMENT_FACTOR` and `DEVTOOLS_THROUGHPUT_ADJUSTMENT_FACTOR`),
 * which is harsher; reported, no target.
 */
export const linkProfiles = {
  brief: { latencyMs: 150, downKbps: 1600, upKbps: 750, cpu: 4 },
  devtools: { latencyMs: 562.5, downKbps: 1440, upKbps: 675, cpu: 4 },
} as const;
export type LinkProfile = (typeof linkProfiles)[keyof typeof linkProfiles];

async function throttledPage(context: BrowserContext, link: LinkProfile) {
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', {
    offline: false,
    latency: link.latencyMs,
    downloadThroughput: (link.downKbps * 1000) / 8,
    uploadThroughput: (link.upKbps * 1000) / 8,
  });
  await cdp.send('Emulation.setCPUThrottlingRate', { rate: link.cpu });
  return page;
}

/**
 * Notes, inside the page, the moment `selector` is in the document and painted: a DOM observer
 * sees it arrive, and the time is taken in a task queued from the next animation frame (after
 * that frame's paint). Milliseconds from the start of the navigation (performance.now()).
 */
async function markWhenShown(context: BrowserContext, selector: string) {
  await context.addInitScript({ content: 'window.__name = (f) => f;' }); // tsx's helper, absent in the page
  await context.addInitScript((wanted: string) => {
    const w = window as unknown as { __shownAt?: number };
    let seen = false;
    const check = () => {
      if (seen || !document.querySelector(wanted)) return;
      seen = true;
      observer.disconnect();
      requestAnimationFrame(() => setTimeout(() => (w.__shownAt = performance.now()), 0));
    };
    const observer = new MutationObserver(check);
    observer.observe(document, { childList: true, subtree: true });
  }, selector);
}

async function timeFirstScreen(
  base: string,
  url: string,
  selector: string,
  link: LinkProfile,
  account?: { email: string; password: string },
): Promise<number> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-sync'],
  });
  try {
    // A phone: 390 × 844, touch, an empty cache (a new context each time).
    const context = await browser.newContext({
      viewport: { width: 390, height: 844 },
      isMobile: true,
      hasTouch: true,
      deviceScaleFactor: 3,
    });
    if (account) {
      const login = await context.request.post(`${base}/api/auth/login`, { headers: { 'X-Requested-With': 'gridkeep' }, data: account });
      if (!login.ok()) throw new Error(`sign-in failed: ${login.status()}`);
    }
    await markWhenShown(context, selector);
    const page = await throttledPage(context, link);
    await page.goto(`${base}${url}`);
    await page.waitForFunction(() => (window as unknown as { __shownAt?: number }).__shownAt !== undefined, null, { timeout: 60_000 });
    return await page.evaluate(() => (window as unknown as { __shownAt: number }).__shownAt);
  } finally {
    await browser.close();
  }
}

/** Median over `rounds` cold loads of the sign-in form and of the technician's Today screen. */
export async function measureFirstScreen(base: string, technician: { email: string; password: string }, link: LinkProfile, rounds = 3) {
  const signIn: number[] = [];
  const today: number[] = [];
  for (let i = 0; i < rounds; i++) {
    signIn.push(await timeFirstScreen(base, '/sign-in', 'form[aria-label="Sign in"] input[type="email"]', link));
    today.push(await timeFirstScreen(base, '/', '#home-today-visits', link, technician));
  }
  return { signInMs: median(signIn), todayMs: median(today) };
}

type Result = { name: string; value: number; unit: string; target?: number };

/** The bench part: sizes of every page (targets: sign-in < 170 KB, each page < 300 KB) and first screens. */
export async function firstScreenResults(
  base: string,
  technician: { email: string; password: string },
  distDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../dist'),
): Promise<Result[]> {
  const results: Result[] = [];
  const leaking = scriptsNamingTheirMap(distDir);
  if (leaking.length) throw new Error(`Built scripts name their source map: ${leaking.slice(0, 3).join(', ')}`);
  const pages = pageScriptSizes(distDir);
  const kb = (bytes: number) => bytes / 1024;
  for (const p of pages) {
    const isSignIn = p.page === 'auth/sign-in';
    results.push({
      name: `JavaScript of ${p.page}, gzipped (${p.files} files, ${Math.round(kb(p.rawBytes))} KB raw)`,
      value: kb(p.gzipBytes),
      unit: 'KB',
      target: isSignIn ? 170 : 300,
    });
  }
  for (const [name, link] of Object.entries(linkProfiles)) {
    const t = await measureFirstScreen(base, technician, link);
    const what = `${link.downKbps / 1000} Mbit/s, ${link.latencyMs} ms, CPU ×${link.cpu}`;
    const target = name === 'brief' ? 3000 : undefined;
    results.push({
      name: `first screen, phone on slow 4G (${what}): sign-in form usable (median of 3)`,
      value: t.signInMs,
      unit: 'ms',
      target,
    });
    results.push({
      name: `first screen, phone on slow 4G (${what}): technician's Today drawn (median of 3)`,
      value: t.todayMs,
      unit: 'ms',
      target,
    });
  }
  return results;
}
