import {
  expect,
  type APIRequestContext,
  type Browser,
  type BrowserContext,
  type BrowserContextOptions,
  type Page,
  type TestInfo,
} from '@playwright/test';

// What the browser specs share: the demo users' password, the screens they are seen on, signing
// in (through the form, or straight to the API), and screenshots kept with the test's own
// report. Not a spec itself: the runner only picks *.spec.ts.

/** Every demo user's password (server/db/seed). */
export const demoPassword = 'gridkeep-demo';
/** The header every state-changing API call carries (the server's CSRF check). */
export const csrf = { 'X-Requested-With': 'gridkeep' };
/** A phone held upright, as technicians and clients use the app. */
export const phone: BrowserContextOptions = {
  viewport: { width: 390, height: 844 },
  hasTouch: true,
  isMobile: true,
  deviceScaleFactor: 2,
};
/** An office screen. */
export const desktop: BrowserContextOptions = { viewport: { width: 1366, height: 800 } };

export const escapeRegExp = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** Signs `email` in through the sign-in form on `page` and waits until the app has left it. */
export async function signInOn(page: Page, email: string): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(demoPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).not.toHaveURL(/\/sign-in/);
}

/** A browser of its own (the screen `options` describes) with `email` signed in through the form. */
export async function signIn(
  browser: Browser,
  email: string,
  options: BrowserContextOptions = desktop,
): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext(options);
  const page = await context.newPage();
  await signInOn(page, email);
  return { context, page };
}

/** A context with `email` signed in to the API only (no page), for setting up and checking data. */
export async function signInToApi(browser: Browser, email: string): Promise<BrowserContext> {
  const context = await browser.newContext();
  const res = await context.request.post('/api/auth/login', { data: { email, password: demoPassword }, headers: csrf });
  expect(res.status(), `sign-in of ${email}`).toBe(200);
  return context;
}

/** GET `url`, which must answer 2xx, as JSON. */
export async function getJson<T>(request: APIRequestContext, url: string): Promise<T> {
  const res = await request.get(url);
  expect(res.ok(), `GET ${url}`).toBe(true);
  return (await res.json()) as T;
}

/** A screenshot attached to the test's report: nothing is written outside the test output. */
export async function attachShot(testInfo: TestInfo, page: Page, name: string, options: { fullPage?: boolean } = {}): Promise<void> {
  await testInfo.attach(name, { body: await page.screenshot(options), contentType: 'image/png' });
}
