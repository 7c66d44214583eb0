import { expect, test } from '@playwright/test';
import { attachShot, desktop, escapeRegExp, getJson, phone, signIn } from './support.js';

// The client portal's overview and the navigation of each shell, against the real app with the
// seeded demo data: every place the navigation offers exists, and the overview shows the
// organisation's walls by site with their open tickets.

interface Wall {
  id: string;
  name: string;
  siteId: string;
  siteName: string;
  openTicketCount: number;
}

test('a client sees their walls by site with open tickets, their open tickets, and reports a fault from the overview', async ({
  browser,
}, testInfo) => {
  // A client user of the demo data whose organisation has walls, found as the admin.
  const admin = await signIn(browser, 'admin@gridkeep.test', desktop);
  const users = (await (await admin.page.request.get('/api/users?role=client&limit=100')).json()) as {
    items: { email: string; disabled: boolean; invitePending: boolean }[];
  };
  const email = users.items.find((u) => !u.disabled && !u.invitePending)?.email;
  expect(email).toBeTruthy();
  await admin.context.close();

  const { page } = await signIn(browser, email!, phone);
  await expect(page.getByRole('heading', { level: 1, name: /^Welcome/ })).toBeVisible();
  const walls = ((await (await page.request.get('/api/walls?limit=200')).json()) as { items: Wall[] }).items;
  expect(walls.length).toBeGreaterThan(0);

  // One section per site, each wall once, with its open-ticket count.
  const section = page.getByRole('region', { name: 'Your walls' });
  const siteNames = [...new Set(walls.map((w) => w.siteName))];
  for (const site of siteNames) await expect(section.getByRole('heading', { name: site, exact: true })).toBeVisible();
  for (const wall of walls) {
    const row = section.getByRole('link', { name: new RegExp(`^${escapeRegExp(wall.name)}`) });
    await expect(row).toHaveCount(1);
    await expect(row).toHaveAttribute('href', `/walls/${wall.id}`);
    await expect(row).toContainText(
      wall.openTicketCount === 0
        ? 'No open tickets'
        : wall.openTicketCount === 1
          ? '1 open ticket'
          : `${wall.openTicketCount} open tickets`,
    );
  }

  // Their open tickets: as many as the API has (up to five), each with its status.
  const open = (await (await page.request.get('/api/tickets?open=true&limit=5')).json()) as { items: { ref: string }[] };
  const tickets = page.getByRole('list', { name: 'Your open tickets' }).getByRole('listitem');
  if (open.items.length > 0) {
    await expect(tickets).toHaveCount(open.items.length);
    await expect(tickets.first()).toContainText('Status:');
  }
  await attachShot(testInfo, page, 'client-overview', { fullPage: true });

  // The portal offers only places that exist.
  await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link')).toHaveText(['Overview', 'Walls', 'Tickets', 'Visits']);

  await page.getByRole('link', { name: 'Report a fault' }).click();
  await expect(page).toHaveURL(/\/tickets\/new$/);
});

test("the office's navigation offers only screens that exist", async ({ browser }) => {
  const { page } = await signIn(browser, 'office@gridkeep.test', desktop);
  // The board's visits of the day include the demo's visit under way (other tests may book more today).
  const start = new Date();
  start.setHours(0, 0, 0, 0);
  const end = new Date(start.getTime() + 24 * 3600_000);
  const onSite = await getJson<{ items: { site: { name: string } }[] }>(
    page.request,
    `/api/visits?from=${encodeURIComponent(start.toISOString())}&to=${encodeURIComponent(end.toISOString())}&status=in_progress&limit=500`,
  );
  expect(onSite.items.length, 'the demo keeps a visit under way today').toBeGreaterThan(0);
  const visitsToday = page.getByRole('list', { name: 'Visits today' });
  await expect(visitsToday.getByRole('listitem').filter({ hasText: onSite.items[0].site.name }).first()).toContainText('On site');
  const nav = page.getByRole('navigation', { name: 'Main' });
  await expect(nav.getByRole('link')).toHaveText([
    'Today',
    'Clients',
    'Sites',
    'Walls',
    'Cabinets',
    'Catalogue',
    'Tickets',
    'Dispatch',
    'Stock',
    'Planner',
  ]);
  // Each of them opens a page of its own, not "not found".
  for (const name of ['Clients', 'Sites', 'Walls', 'Cabinets', 'Catalogue', 'Tickets', 'Dispatch', 'Stock', 'Planner']) {
    await nav.getByRole('link', { name }).click();
    await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
    await expect(page.getByText('We could not find that page')).toHaveCount(0);
  }
  // Addresses of screens that are not built answer "not found".
  for (const path of ['/schedule', '/reports', '/van']) {
    await page.goto(path);
    await expect(page.getByText('We could not find that page')).toBeVisible();
  }
});
