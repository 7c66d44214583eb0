import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Browser, type BrowserContextOptions, type ConsoleMessage, type Page } from '@playwright/test';
import { desktop, getJson, phone, signIn, signInToApi } from './support.js';

// The main screens of each role, checked with axe-core against the real app and the seeded demo
// data: no serious or critical finding (axe's impact levels; the rules are WCAG 2.0–2.2 A/AA and
// axe's best practices, plus "label in name", WCAG 2.5.3, which axe still files as experimental).
// And a first load, signed out or in, logs no error in the browser's console.

const office = 'office@gridkeep.test';
const technician = 'tech@gridkeep.test';

interface Item {
  id: string;
}

/** axe on what `page` shows now; every serious or critical finding, one line each with where. */
async function seriousFindings(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).options({ rules: { 'label-content-name-mismatch': { enabled: true } } }).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.impact} ${v.id} (${v.help}): ${v.nodes.map((n) => n.target.join(' ')).join(' | ')}`);
}

/** Opens `url`, waits for its heading and its data, and expects axe to find nothing serious. */
async function check(page: Page, url: string, heading?: string | RegExp) {
  await page.goto(url);
  await expect(page.getByRole('heading', { level: 1, ...(heading ? { name: heading } : {}) }).first()).toBeVisible();
  await page.waitForLoadState('networkidle');
  await expect(page.locator('[aria-busy="true"]')).toHaveCount(0);
  expect(await seriousFindings(page), `axe on ${url}`).toEqual([]);
}

/** A browser with `email` signed in on `screen`. */
async function as(browser: Browser, email: string, screen: BrowserContextOptions) {
  return signIn(browser, email, screen);
}

/** Any active client user of the demo data (found as the admin). */
async function demoClientEmail(browser: Browser): Promise<string> {
  const admin = await signInToApi(browser, 'admin@gridkeep.test');
  const users = await getJson<{ items: { email: string; disabled: boolean; invitePending: boolean }[] }>(
    admin.request,
    '/api/users?role=client&limit=100',
  );
  await admin.close();
  const email = users.items.find((u) => !u.disabled && !u.invitePending)?.email;
  expect(email, 'a client user in the demo data').toBeTruthy();
  return email!;
}

test('the office screens have no serious or critical axe finding', async ({ browser }) => {
  const { context, page } = await as(browser, office, desktop);
  const [ticket] = (await getJson<{ items: Item[] }>(page.request, '/api/tickets?open=true&limit=1')).items;
  const [wall] = (await getJson<{ items: Item[] }>(page.request, '/api/walls?limit=1')).items;
  await check(page, '/');
  await check(page, '/tickets', 'Tickets');
  await check(page, `/tickets/${ticket.id}`);
  await check(page, `/walls/${wall.id}`);
  await check(page, '/dispatch', 'Dispatch');
  await check(page, '/stock', 'Stock');
  await context.close();
});

test('the technician screens on a phone have no serious or critical axe finding', async ({ browser }) => {
  const { context, page } = await as(browser, technician, phone);
  const [visit] = (await getJson<{ items: Item[] }>(page.request, '/api/visits?limit=1')).items;
  expect(visit, 'a visit in the demo data').toBeTruthy();
  await check(page, '/');
  await check(page, `/visits/${visit.id}`);
  await check(page, `/repairs/new?visitId=${visit.id}`, 'Log a repair');
  await check(page, '/stock', 'My van');
  await context.close();
});

test('the client portal has no serious or critical axe finding', async ({ browser }) => {
  const { context, page } = await as(browser, await demoClientEmail(browser), phone);
  const [ticket] = (await getJson<{ items: Item[] }>(page.request, '/api/tickets?limit=1')).items;
  expect(ticket, 'a ticket of the client in the demo data').toBeTruthy();
  await check(page, '/', /^Welcome/);
  await check(page, '/tickets/new');
  await check(page, `/tickets/${ticket.id}`);
  await check(page, '/visits', 'Visits');
  await context.close();
});

/** Errors the page logs from now on (console errors, failed requests the console reports, uncaught exceptions). */
function consoleErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (m: ConsoleMessage) => {
    if (m.type() === 'error') errors.push(`${m.text()} ${m.location().url}`);
  });
  page.on('pageerror', (e) => errors.push(`uncaught: ${e.message}`));
  return errors;
}

test('a first load logs no console error, signed out or signed in', async ({ browser }) => {
  const context = await browser.newContext(desktop);
  const page = await context.newPage();
  const errors = consoleErrors(page);
  // Signed out: the app asks who is signed in and goes to the sign-in page.
  await page.goto('/');
  await expect(page).toHaveURL(/\/sign-in/);
  await expect(page.getByRole('heading', { name: 'Sign in to Gridkeep' })).toBeVisible();
  await page.waitForLoadState('networkidle');
  expect(errors, 'console errors signed out').toEqual([]);
  await context.close();

  // Signed in: a fresh load of the home screen (the session cookie, no sign-in form on the way).
  const signedIn = await as(browser, office, desktop);
  const again = consoleErrors(signedIn.page);
  await signedIn.page.reload();
  await expect(signedIn.page.getByRole('heading', { level: 1 }).first()).toBeVisible();
  await signedIn.page.waitForLoadState('networkidle');
  expect(again, 'console errors signed in').toEqual([]);
  await signedIn.context.close();
});
