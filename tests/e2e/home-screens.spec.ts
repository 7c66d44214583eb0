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
  // The demo's Cedar Hollow Fellowship contact (server/db/seed/register.ts): five walls on three
  // campuses, four open tickets. No other browser test opens or closes a ticket of theirs.
  const { page } = await signIn(browser, 'av@cedarhollow.test', phone);
  await expect(page.getByRole('heading', { level: 1, name: 'Welcome, Tobias' })).toBeVisible();
  const walls = ((await (await page.request.get('/api/walls?limit=200')).json()) as { items: Wall[] }).items;
  expect(walls.map((w) => w.name).sort()).toEqual([
    'Main hall centre wall',
    'Main hall left side wall',
    'Main hall right side wall',
    'Worship centre wall',
    'Youth room wall',
  ]);

  // One section per site, each wall once, with its open-ticket count.
  const section = page.getByRole('region', { name: 'Your walls' });
  for (const site of ['Main Campus', 'West Campus', 'Lakeside Campus']) {
    await expect(section.getByRole('heading', { name: site, exact: true })).toBeVisible();
  }
  const openByWall: Record<string, string> = {
    'Main hall centre wall': '1 open ticket',
    'Main hall left side wall': '1 open ticket',
    'Main hall right side wall': '1 open ticket',
    'Worship centre wall': '1 open ticket',
    'Youth room wall': 'No open tickets',
  };
  for (const wall of walls) {
    const row = section.getByRole('link', { name: new RegExp(`^${escapeRegExp(wall.name)}`) });
    await expect(row).toHaveCount(1);
    await expect(row).toHaveAttribute('href', `/walls/${wall.id}`);
    await expect(row).toContainText(openByWall[wall.name]);
  }

  // Their four open tickets, each with its status in the client's words (the order follows the
  // latest update, which other tests' comments move).
  const tickets = page.getByRole('list', { name: 'Your open tickets' }).getByRole('listitem');
  await expect(tickets).toHaveCount(4);
  for (const [title, status] of [
    ['Top-right of the left side wall flickers', 'New'],
    ['Dark cabinet at C9·R3', 'In progress'],
    ['Intermittent dropouts at C7·R4', 'Waiting for parts'],
    ['Right side wall looks dimmer than the left', 'Waiting for you'],
  ]) {
    const item = tickets.filter({ hasText: title });
    await expect(item).toHaveCount(1);
    await expect(item).toContainText(new RegExp(`Status:\\s*${status}`));
  }
  await attachShot(testInfo, page, 'client-overview', { fullPage: true });

  // The portal offers only places that exist.
  await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link')).toHaveText(['Overview', 'Walls', 'Tickets', 'Visits']);

  await page.getByRole('link', { name: 'Report a fault' }).click();
  await expect(page).toHaveURL(/\/tickets\/new$/);
});

test("the office's Today board: the counts in a sentence, then the walls, the worst first, with a drawing of each grid", async ({
  browser,
}, testInfo) => {
  const { page } = await signIn(browser, 'office@gridkeep.test', desktop);
  // No number tiles: the counts are words under the greeting.
  await expect(page.locator('[data-testid^="count-"]')).toHaveCount(0);
  const sentence = page.getByTestId('board-sentence');
  await expect(sentence).toContainText(/past (its|their) service clock/);

  // The demo's worst wall first: the exhibit hall's curved wall (a dead module waiting 10 days for
  // batch-matched parts, and a seam), drawn as its 16 × 4 grid with the three cabinets named.
  const walls = page.getByRole('region', { name: 'Walls that need attention' });
  const first = walls.getByRole('article').first();
  await expect(first.getByRole('heading', { level: 3 })).toHaveText('Exhibit hall curved wall');
  await expect(first.getByRole('img', { name: '16 × 4 cabinets, 3 reported' })).toBeVisible();
  await expect(first.getByRole('link', { name: /Dead module at C12·R1/ })).toBeVisible();
  await expect(first).toContainText('Past due');
  await attachShot(testInfo, page, 'office-board', { fullPage: true });

  // On a phone: one column, the sentence, then the walls, then the day's visits.
  const onPhone = await signIn(browser, 'office@gridkeep.test', phone);
  const phonePage = onPhone.page;
  const top = async (locator: ReturnType<typeof phonePage.locator>) => {
    await expect(locator).toBeVisible();
    return (await locator.boundingBox())!.y;
  };
  const order = [
    await top(phonePage.getByTestId('board-sentence')),
    await top(phonePage.getByRole('region', { name: 'Walls that need attention' })),
    await top(phonePage.getByRole('list', { name: 'Visits today' })),
  ];
  expect(order).toEqual([...order].sort((a, b) => a - b));
  await attachShot(testInfo, phonePage, 'office-board-phone', { fullPage: true });
  await onPhone.context.close();

  // The sentence's count opens the tickets past their clock, the worst wall's first ticket among them.
  await sentence.getByRole('link', { name: /past (its|their) service clock/ }).click();
  await expect(page).toHaveURL(/\/tickets\?clock=breached&open=true$/);
  await expect(page.getByRole('main').getByText('Dead module at C12·R1').first()).toBeVisible();
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
