// The JavaScript each entry page loads, as a browser really loads it: Chromium (playwright-core)
// opens the page, every script response from the app's own origin is noted, and the matching
// files of dist/ are gzipped (level 9, what a precompressed build serves) and summed. Whatever
// the build splits or preloads, this counts what the page fetched before it settled.
import fs from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';

export interface PageJs {
  page: string;
  path: string;
  files: number;
  rawBytes: number;
  gzipBytes: number;
}

export async function measurePageJs(
  base: string,
  distDir: string,
  account: { email: string; password: string },
  pages: { page: string; path: string; signedIn: boolean }[],
): Promise<PageJs[]> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update'],
  });
  const out: PageJs[] = [];
  try {
    for (const p of pages) {
      // A fresh context per page: nothing cached from the page before.
      const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
      if (p.signedIn) {
        const login = await context.request.post(`${base}/api/auth/login`, {
          headers: { 'X-Requested-With': 'gridkeep' },
          data: account,
        });
        if (!login.ok()) throw new Error(`sign-in failed: ${login.status()}`);
      }
      const page = await context.newPage();
      const scripts = new Set<string>();
      page.on('response', (res) => {
        const url = new URL(res.url());
        if (url.origin === new URL(base).origin && url.pathname.endsWith('.js') && !url.pathname.endsWith('/sw.js'))
          scripts.add(url.pathname);
      });
      await page.goto(`${base}${p.path}`, { waitUntil: 'networkidle' });
      let rawBytes = 0;
      let gzipBytes = 0;
      for (const file of scripts) {
        const onDisk = path.join(distDir, decodeURIComponent(file));
        if (!fs.existsSync(onDisk)) continue;
        const body = fs.readFileSync(onDisk);
        rawBytes += body.length;
        gzipBytes += gzipSync(body, { level: 9 }).length;
      }
      out.push({ page: p.page, path: p.path, files: scripts.size, rawBytes, gzipBytes });
      await context.close();
    }
  } finally {
    await browser.close();
  }
  return out;
}
