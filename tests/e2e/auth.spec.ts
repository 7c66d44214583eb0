// Signing in and out as each kind of person, and the shell each one sees. Runs against the
// real app with the demo data (server/db/seed/register.ts: every demo account uses the
// password below).
import { expect, test, type Page } from '@playwright/test';

const demoPassword = 'gridkeep-demo';
const csrf = { 'X-Requested-With': 'gridkeep' };

interface Me {
  id: string;
  email: string;
  name: string;
  role: string;
  clientName?: string | null;
}

async function signIn(page: Page, email: string, password = demoPassword) {
  if (!page.url().includes('/sign-in')) await page.goto('/sign-in');
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** The signed-in person as the server sees them (the page's cookie is shared with page.request). */
async function whoAmI(page: Page): Promise<Me> {
  const res = await page.request.get('/api/auth/me');
  expect(res.status()).toBe(200);
  return ((await res.json()) as { user: Me }).user;
}

async function signOutFromUserMenu(page: Page, me: Me) {
  await page.getByRole('button', { name: `${me.name}, account menu` }).click();
  await page.getByRole('group', { name: 'Account menu' }).getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
  await expect(page.getByRole('heading', { name: 'Sign in to Gridkeep' })).toBeVisible();
  // The session is really over, not just hidden.
  expect((await page.request.get('/api/auth/me')).status()).toBe(401);
}

test.describe('office staff', () => {
  test('an admin signs in to the office shell with the administration links, and signs out', async ({ page }) => {
    await signIn(page, 'admin@gridkeep.test');
    await expect(page).toHaveURL(/\/$/);
    const me = await whoAmI(page);
    expect(me).toMatchObject({ role: 'admin', email: 'admin@gridkeep.test', name: 'Marisol Vantreece' });

    // The greeting changes with the hour; the first name is the demo admin's.
    await expect(page.getByRole('heading', { level: 1, name: /^Good (morning|afternoon|evening), Marisol$/ })).toBeVisible();
    const nav = page.getByRole('navigation', { name: 'Main' });
    for (const label of ['Today', 'Clients', 'Walls', 'Tickets', 'Planner', 'Users', 'Audit log', 'Mailbox']) {
      await expect(nav.getByRole('link', { name: label, exact: true })).toBeVisible();
    }
    await expect(page.getByRole('searchbox', { name: 'Search Gridkeep' })).toBeVisible();

    // The search box leads to the results route.
    await page.getByRole('searchbox', { name: 'Search Gridkeep' }).fill('cabinet 42');
    await page.getByRole('searchbox', { name: 'Search Gridkeep' }).press('Enter');
    await expect(page).toHaveURL(/\/search\?q=cabinet(\+|%20)42$/);

    await signOutFromUserMenu(page, me);
  });

  test('a coordinator gets the office shell without the administration links', async ({ page }) => {
    await signIn(page, 'office@gridkeep.test');
    await expect(page).toHaveURL(/\/$/);
    const me = await whoAmI(page);
    expect(me).toMatchObject({ role: 'coordinator', email: 'office@gridkeep.test', name: 'Priya Halloway' });

    const nav = page.getByRole('navigation', { name: 'Main' });
    await expect(nav.getByRole('link', { name: 'Tickets', exact: true })).toBeVisible();
    await expect(nav.getByRole('link', { name: 'Planner', exact: true })).toBeVisible();
    await expect(nav.getByRole('link', { name: 'Users', exact: true })).toHaveCount(0);
    await expect(nav.getByRole('link', { name: 'Audit log', exact: true })).toHaveCount(0);

    // The admin screens answer "not found" to a coordinator, as the API does.
    await page.goto('/admin/users');
    await expect(page.getByText('We could not find that page')).toBeVisible();

    await signOutFromUserMenu(page, me);
  });
});

test.describe('technician on a phone', () => {
  test.use({ viewport: { width: 390, height: 844 }, hasTouch: true });

  test('a technician gets the bottom navigation with large targets, and signs out', async ({ page }) => {
    await signIn(page, 'tech@gridkeep.test');
    await expect(page).toHaveURL(/\/$/);
    const me = await whoAmI(page);
    expect(me).toMatchObject({ role: 'technician', email: 'tech@gridkeep.test', name: 'Jonah Ellery' });

    await expect(page.getByRole('heading', { level: 1, name: /^Good (morning|afternoon|evening), Jonah$/ })).toBeVisible();
    const nav = page.getByRole('navigation', { name: 'Main' });
    const viewport = page.viewportSize()!;
    for (const label of ['Today', 'Tickets', 'Walls', 'Scan', 'Me']) {
      const link = nav.getByRole('link', { name: label, exact: true });
      await expect(link).toBeVisible();
      const box = (await link.boundingBox())!;
      // At the bottom of the screen, and at least 44 × 44 CSS px (WCAG 2.2, SC 2.5.5).
      expect(box.y + box.height).toBeGreaterThan(viewport.height - 100);
      expect(box.height).toBeGreaterThanOrEqual(44);
      expect(box.width).toBeGreaterThanOrEqual(44);
    }
    // Office-only parts are not in this shell.
    await expect(page.getByRole('searchbox')).toHaveCount(0);
    await expect(page.getByRole('link', { name: 'Clients', exact: true })).toHaveCount(0);

    // "Me" is the account page.
    await nav.getByRole('link', { name: 'Me', exact: true }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Your account' })).toBeVisible();
    await expect(page.getByText('tech@gridkeep.test')).toBeVisible();

    await signOutFromUserMenu(page, me);
  });
});

test.describe('client portal', () => {
  test("a client contact sees their organisation's portal, and signs out", async ({ page }) => {
    // The demo's Cedar Hollow Fellowship contact (server/db/seed/register.ts).
    const contact = { email: 'av@cedarhollow.test', name: 'Tobias Wrenfield', clientName: 'Cedar Hollow Fellowship' };

    await signIn(page, contact.email);
    await expect(page).toHaveURL(/\/$/);
    const me = await whoAmI(page);
    expect(me).toMatchObject({ role: 'client', ...contact });

    await expect(page.getByRole('banner').getByText(contact.clientName, { exact: true })).toBeVisible();
    await expect(page.getByRole('heading', { level: 1, name: 'Welcome, Tobias' })).toBeVisible();
    const nav = page.getByRole('navigation', { name: 'Main' });
    for (const label of ['Overview', 'Walls', 'Tickets']) {
      await expect(nav.getByRole('link', { name: label, exact: true })).toBeVisible();
    }
    await expect(page.getByRole('link', { name: 'Stock', exact: true })).toHaveCount(0);
    await expect(page.getByRole('searchbox')).toHaveCount(0);

    await signOutFromUserMenu(page, me);
  });
});

test.describe('signing in', () => {
  test('a wrong password shows the error and stays on sign-in', async ({ page }) => {
    await signIn(page, 'admin@gridkeep.test', 'not-the-demo-password');
    await expect(page.getByRole('alert')).toContainText('That e-mail address and password do not match an account');
    await expect(page).toHaveURL(/\/sign-in$/);
    await expect(page.getByLabel('Password', { exact: true })).toHaveValue('');
    expect((await page.request.get('/api/auth/me')).status()).toBe(401);
  });

  test("a QR label's address survives the sign-in redirect", async ({ page }) => {
    await page.goto('/c/GK-0042-TEST');
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fc%2FGK-0042-TEST$/);
    await signIn(page, 'tech@gridkeep.test');
    await expect(page).toHaveURL(/\/c\/GK-0042-TEST$/);
    // The cabinet screen for that serial: no demo cabinet carries it.
    await expect(page.getByRole('main')).toContainText('No cabinet has the serial “GK-0042-TEST”');
  });

  test('a session that ends while the app is open sends the person to sign-in and back', async ({ page }) => {
    await signIn(page, 'admin@gridkeep.test');
    await expect(page).toHaveURL(/\/$/);
    // The board has every answer it asked for before the session ends.
    await page.waitForLoadState('networkidle');
    // Another tab signs out: the cookie is gone, but this page still believes it is signed in.
    await page.context().clearCookies();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Audit log' }).click();
    await expect(page).toHaveURL(/\/sign-in\?next=%2Fadmin%2Faudit$/);

    await signIn(page, 'admin@gridkeep.test');
    await expect(page).toHaveURL(/\/admin\/audit$/);
    await expect(page.getByRole('heading', { level: 1, name: 'Audit log' })).toBeVisible();
  });
});

test.describe('choosing a password', () => {
  test.use({ viewport: { width: 390, height: 844 } });

  // OWASP ASVS 5.0 6.2.11: a password built from the product's or the person's own words is
  // refused, and the form says why on the field, keeping what was typed.
  test('the account page refuses a password built from “Gridkeep” and says why on the field', async ({ page }) => {
    await signIn(page, 'tech@gridkeep.test');
    await expect(page).not.toHaveURL(/sign-in/);
    await page.goto('/account');
    const form = page.getByRole('form', { name: 'Change password' });
    await form.getByLabel('Current password', { exact: true }).fill(demoPassword);
    const next = form.getByLabel('New password', { exact: true });
    await next.fill('Gridkeep2026!');
    await form.getByRole('button', { name: 'Change password' }).click();
    await expect(next).toHaveAttribute('aria-invalid', 'true');
    await expect(form).toContainText('Too easy to guess: it is built from your name, e-mail address, organisation or “Gridkeep”.');
    await expect(next).toHaveValue('Gridkeep2026!');
    // Nothing changed: the demo password still signs in.
    const again = await page.request.post('/api/auth/login', {
      headers: csrf,
      data: { email: 'tech@gridkeep.test', password: demoPassword },
    });
    expect(again.status()).toBe(200);
  });
});
