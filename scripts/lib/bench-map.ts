// The wall map in a real browser (Debian's Chromium through playwright-core): how long a large
// wall takes to draw once its data has arrived, to flip to the rear view, and to open a
// cabinet card from a tap. Times are taken inside the page with performance.now().
import { chromium } from 'playwright-core';

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

export async function measureWallMap(
  base: string,
  account: { email: string; password: string },
  wallId: string,
  cabinets: number,
  rounds = 5,
) {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  try {
    const context = await browser.newContext({ viewport: { width: 1366, height: 800 } });
    const login = await context.request.post(`${base}/api/auth/login`, { headers: { 'X-Requested-With': 'gridkeep' }, data: account });
    if (!login.ok()) throw new Error(`sign-in failed: ${login.status()}`);
    // tsx keeps function names with a `__name` helper that does not exist inside the page.
    await context.addInitScript({ content: 'window.__name = (f) => f;' });
    // Notes the moment every cabinet cell is drawn: a DOM observer sees the cells arrive (no
    // polling delay), then the time is taken once the browser has styled, laid out and painted
    // them (a task queued from the next animation frame runs after that frame's paint).
    await context.addInitScript((expected: number) => {
      const w = window as unknown as { __mapReadyAt?: number };
      let seen = false;
      const observer = new MutationObserver(() => {
        if (!seen && document.querySelectorAll('[role="gridcell"][aria-label*="serial"]').length >= expected) {
          seen = true;
          observer.disconnect();
          requestAnimationFrame(() => setTimeout(() => (w.__mapReadyAt = performance.now()), 0));
        }
      });
      observer.observe(document, { childList: true, subtree: true, attributes: true, attributeFilter: ['aria-label'] });
    }, cabinets);
    const page = await context.newPage();
    const render: number[] = [];
    const toggle: number[] = [];
    const card: number[] = [];
    for (let i = 0; i < rounds; i++) {
      await page.goto(`${base}/walls/${wallId}`);
      await page
        .waitForFunction(() => (window as unknown as { __mapReadyAt?: number }).__mapReadyAt !== undefined, null, { timeout: 30_000 })
        .catch(async (err) => {
          const shot = `/tmp/gridkeep-bench-map-${Date.now()}.png`;
          await page.screenshot({ path: shot });
          const seen = await page.evaluate(() => ({
            cells: document.querySelectorAll('[role="gridcell"]').length,
            withSerial: document.querySelectorAll('[role="gridcell"][aria-label*="serial"]').length,
            sample: document.querySelector('[role="gridcell"]')?.getAttribute('aria-label'),
          }));
          console.error(JSON.stringify(seen));
          throw new Error(`${(err as Error).message} (screenshot: ${shot})`);
        });
      render.push(
        await page.evaluate((id) => {
          const entry = performance.getEntriesByType('resource').find((e) => e.name.includes(`/api/walls/${id}/cabinets`)) as
            PerformanceResourceTiming | undefined;
          if (!entry) throw new Error('the wall map data request was not seen');
          return (window as unknown as { __mapReadyAt: number }).__mapReadyAt - entry.responseEnd;
        }, wallId),
      );
      toggle.push(
        await page.evaluate(async () => {
          const button = [...document.querySelectorAll('[aria-label="Wall view"] button')].find((b) =>
            b.textContent?.includes('Rear'),
          ) as HTMLButtonElement;
          const frame = () => new Promise((r) => requestAnimationFrame(() => r(null)));
          const started = performance.now();
          button.click();
          while (!document.querySelector('svg[data-view="rear"]')) await frame();
          await frame();
          return performance.now() - started;
        }),
      );
      card.push(
        await page.evaluate(async () => {
          const cell = document.querySelector('[role="gridcell"][aria-label^="C7·R4,"]') as SVGGElement;
          const serial = /serial ([^,]+)/.exec(cell.getAttribute('aria-label') ?? '')?.[1] ?? '';
          const frame = () => new Promise((r) => requestAnimationFrame(() => r(null)));
          const started = performance.now();
          cell.dispatchEvent(new MouseEvent('click', { bubbles: true }));
          const shown = () =>
            [...document.querySelectorAll('aside[aria-label="Cabinet"], [role="dialog"]')].some((e) => e.textContent?.includes(serial));
          let frames = 0;
          while (!shown()) {
            if (performance.now() - started > 10_000) throw new Error('the cabinet card did not open');
            await frame();
            frames += 1;
          }
          // Until the frame that shows it is painted (a task queued from inside an animation
          // frame runs after that frame's paint).
          if (frames === 0) await frame();
          await new Promise((r) => setTimeout(r, 0));
          return performance.now() - started;
        }),
      );
    }
    return { renderMs: median(render), toggleMs: median(toggle), cardMs: median(card) };
  } finally {
    await browser.close();
  }
}
