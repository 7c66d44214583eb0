import { expect, test, type Locator, type Page } from '@playwright/test';
import { attachShot, csrf, desktop, escapeRegExp, getJson, phone, signIn } from './support.js';

// Lists on a phone are cards with targets a thumb can hit, the walls list says how full each
// wall is, the client's map of a wide wall starts zoomed to fingertip-sized cells, and the office's
// tickets list opens on the open tickets with its last column in reach at 1366 px.
// Target size: WCAG 2.2 SC 2.5.5 (Target Size, Enhanced) asks at least 44 × 44 CSS px.

const office = 'office@gridkeep.test';
const admin = 'admin@gridkeep.test';
const MIN_TARGET = 44;

interface WallRow {
  id: string;
  name: string;
  siteId: string;
  columns: number;
  rows: number;
  cabinetModel: { id: string };
}

/** The page does not scroll sideways: everything fits the screen's width. */
async function expectNoSidewaysScroll(page: Page) {
  const { scrollWidth, innerWidth } = await page.evaluate(() => ({
    scrollWidth: document.scrollingElement!.scrollWidth,
    innerWidth: window.innerWidth,
  }));
  expect(scrollWidth, 'page width against the screen').toBeLessThanOrEqual(innerWidth);
}

/** Every link and button inside `scope` is at least 44 × 44 CSS px. */
async function expectLargeTargets(scope: Locator) {
  const small = await scope.locator('a, button').evaluateAll(
    (els, min) =>
      els
        .map((el) => ({ el, box: el.getBoundingClientRect() }))
        .filter(({ box }) => box.width > 0 && (box.width < min - 0.5 || box.height < min - 0.5))
        .map(
          ({ el, box }) =>
            `${el.tagName.toLowerCase()} “${el.textContent?.trim() || el.getAttribute('aria-label')}” ${box.width}×${box.height}`,
        ),
    MIN_TARGET,
  );
  expect(small, 'targets under 44 × 44 px').toEqual([]);
}

/** A list page on the phone: cards, no table, no desk tools, no sideways scroll, large targets. */
async function expectCardList(page: Page, name: string) {
  const cards = page.getByRole('list', { name });
  await expect(cards.getByRole('listitem').first()).toBeVisible();
  await expect(page.getByRole('table')).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Export CSV' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Columns' })).toHaveCount(0);
  await expectNoSidewaysScroll(page);
  await expectLargeTargets(cards);
  // The filters and the order above the cards are as easy to hit.
  for (const box of await page.getByRole('main').locator('input, select').all()) {
    if (await box.isVisible()) expect((await box.boundingBox())!.height).toBeGreaterThanOrEqual(MIN_TARGET - 0.5);
  }
  return cards;
}

test('on a phone the walls and cabinets lists are cards with large targets, and the walls say filled / free', async ({
  browser,
}, testInfo) => {
  test.setTimeout(120_000);
  const { context, page } = await signIn(browser, office, phone);

  // A wall with no cabinet yet, so that "free" is every position (5 × 3).
  const [full] = (await getJson<{ items: WallRow[] }>(page.request, '/api/walls?limit=1')).items;
  const name = `Foyer test wall ${Date.now().toString(36)}`;
  const created = await page.request.post('/api/walls', {
    headers: csrf,
    data: { siteId: full!.siteId, name, cabinetModelId: full!.cabinetModel.id, columns: 5, rows: 3 },
  });
  expect(created.status()).toBe(201);

  await page.goto('/walls');
  const walls = await expectCardList(page, 'Walls');
  await attachShot(testInfo, page, 'walls-phone', { fullPage: true });

  // The record's name is the link to it; the counts come from the list query.
  const fullCard = walls.getByRole('listitem').filter({ has: page.getByRole('link', { name: full!.name, exact: true }) });
  const detail = await getJson<{ installedCabinets: number; columns: number; rows: number }>(page.request, `/api/walls/${full!.id}`);
  const free = detail.columns * detail.rows - detail.installedCabinets;
  await expect(fullCard).toContainText(new RegExp(`Positions\\s*${detail.installedCabinets} filled · ${free} free`));
  await page.getByLabel('Search', { exact: true }).fill(name);
  const emptyCard = walls.getByRole('listitem').filter({ has: page.getByRole('link', { name, exact: true }) });
  await expect(emptyCard).toContainText(/Positions\s*0 filled · 15 free/);
  await page.getByRole('link', { name, exact: true }).click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText(name);

  await page.goto('/cabinets');
  const cabinets = await expectCardList(page, 'Cabinets');
  const serial = (await cabinets.getByRole('listitem').first().getByRole('link').first().textContent())!.trim();
  expect(serial).not.toBe('');
  await attachShot(testInfo, page, 'cabinets-phone', { fullPage: true });

  // The same list on a desk is still the table, with its column chooser and export.
  await page.setViewportSize(desktop.viewport!);
  await expect(page.getByRole('table', { name: 'Cabinets' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Export CSV' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Columns' })).toBeVisible();
  await context.close();
});

test('a client on a phone sees a 12-column wall start zoomed to 44 px cells, the whole wall one tap away', async ({
  browser,
}, testInfo) => {
  test.setTimeout(120_000);
  // A client user whose organisation has a wall of at least 12 columns (25 px cells at 390 px).
  const adminSession = await signIn(browser, admin);
  const wide = (
    await getJson<{ items: (WallRow & { clientId: string })[] }>(adminSession.page.request, '/api/walls?limit=100')
  ).items.filter((w) => w.columns >= 12);
  const users = await getJson<{ items: { email: string; clientId: string | null; disabled: boolean; invitePending: boolean }[] }>(
    adminSession.page.request,
    '/api/users?role=client&limit=100',
  );
  const user = users.items.find((u) => !u.disabled && !u.invitePending && wide.some((w) => w.clientId === u.clientId));
  expect(user, 'a client user with a wall of 12 columns or more').toBeDefined();
  const wall = wide.find((w) => w.clientId === user!.clientId)!;
  await adminSession.context.close();

  const { context, page } = await signIn(browser, user!.email, phone);
  await page.goto('/tickets/new');
  // The form settles (its saved draft is read back) a moment after it shows: choose until it holds.
  const siteSelect = page.getByLabel('Site', { exact: true });
  const wallChoice = page.getByRole('radio', { name: new RegExp(`^${escapeRegExp(wall.name)}`) });
  await expect(async () => {
    if (await siteSelect.count()) await siteSelect.selectOption(wall.siteId);
    await page.getByText(wall.name, { exact: true }).click({ timeout: 2_000 });
    await expect(wallChoice).toBeChecked({ timeout: 1_000 });
  }).toPass({ timeout: 30_000 });

  const cell = page.getByRole('gridcell', { name: /^C1·R1,/ });
  await expect(cell).toBeVisible();
  const size = async () => {
    const box = (await cell.boundingBox())!;
    return Math.min(box.width, box.height);
  };
  // Whole, the wall's cells would be about 25 px: the map starts zoomed so they are a fingertip.
  await expect.poll(size, { message: 'a cell at the start' }).toBeGreaterThanOrEqual(MIN_TARGET);
  const map = page.getByRole('grid');
  const lastColumn = page.getByRole('gridcell', { name: new RegExp(`^C${wall.columns}·R1,`) });
  const inside = async (target: Locator) => {
    const [frame, box] = [(await map.boundingBox())!, (await target.boundingBox())!];
    return box.x >= frame.x - 0.5 && box.x + box.width <= frame.x + frame.width + 0.5;
  };
  expect(await inside(cell), 'C1 in view at the start (top-left)').toBe(true);
  expect(await inside(lastColumn), 'the last column is off screen at the start').toBe(false);
  await attachShot(testInfo, page, 'new-ticket-map-start-phone');

  // The whole wall is one tap away, and shows every column; the zoom brings the cells back.
  const whole = page.getByRole('button', { name: 'Show the whole wall' });
  expect((await whole.boundingBox())!.height).toBeGreaterThanOrEqual(MIN_TARGET - 0.5);
  await whole.click();
  await expect.poll(() => inside(lastColumn), { message: 'every column after "whole wall"' }).toBe(true);
  expect(await inside(cell)).toBe(true);
  expect(await size()).toBeLessThan(MIN_TARGET);
  const zoomIn = page.getByRole('button', { name: 'Zoom in' });
  expect((await zoomIn.boundingBox())!.height).toBeGreaterThanOrEqual(MIN_TARGET - 0.5);
  for (let i = 0; i < 6 && (await size()) < MIN_TARGET; i++) await zoomIn.click();
  expect(await size()).toBeGreaterThanOrEqual(MIN_TARGET);
  // The zoom keeps the middle of the wall in view: tap the cabinet there.
  const middle = await page.getByRole('grid').evaluate((svg) => {
    const frame = svg.getBoundingClientRect();
    const hit = document.elementFromPoint(frame.left + frame.width / 2, frame.top + frame.height / 2);
    return hit?.closest('[role=gridcell]')?.getAttribute('aria-label') ?? hit?.getAttribute('aria-label') ?? '';
  });
  expect(middle).toMatch(/^C\d+·R\d+,/);
  const tapped = page.getByRole('gridcell', { name: middle, exact: true });
  const box = (await tapped.boundingBox())!;
  expect(Math.min(box.width, box.height)).toBeGreaterThanOrEqual(MIN_TARGET);
  await tapped.click();
  await expect(tapped).toHaveAttribute('aria-selected', 'true');
  await expectNoSidewaysScroll(page);
  await attachShot(testInfo, page, 'new-ticket-map-zoomed-phone');
  await context.close();
});

test('the office tickets list opens on the open tickets, and its last column stays in reach at 1366 px', async ({ browser }, testInfo) => {
  test.setTimeout(120_000);
  const { context, page } = await signIn(browser, office, desktop);
  const open = await getJson<{ items: { ref: string }[] }>(page.request, '/api/tickets?open=true&sort=createdAt&dir=desc&limit=10');
  const done = await getJson<{ items: { ref: string }[] }>(page.request, '/api/tickets?open=false&limit=1');
  expect(open.items.length).toBeGreaterThan(0);
  expect(done.items.length, 'a resolved or closed ticket in the demo data').toBeGreaterThan(0);
  const closedRef = done.items[0]!.ref;

  await page.goto('/tickets');
  const table = page.getByRole('table', { name: 'Service tickets' });
  const refs = table.getByRole('row').locator('td:first-child');
  await expect(refs.first()).toHaveText(open.items[0]!.ref);
  expect((await refs.allTextContents()).slice(0, open.items.length)).toEqual(open.items.map((t) => t.ref));
  // The filter says so, and choosing every status shows the closed ones too (and says so in the address).
  const status = page.getByLabel('Status', { exact: true });
  await expect(status.locator('option:checked')).toHaveText('All open');
  await page.getByLabel('Search', { exact: true }).fill(closedRef);
  await expect(table.getByText('No tickets match these filters')).toBeVisible();
  await status.selectOption('');
  await expect(table.getByRole('link', { name: closedRef })).toBeVisible();
  await expect(page).toHaveURL(/[?&]open=all/);
  await page.reload();
  await expect(table.getByRole('link', { name: closedRef })).toBeVisible();

  // At 1366 px the page does not scroll sideways; the table's own box holds its last column,
  // shown or a scroll away, and the box fits the screen so its scrollbar is in sight.
  await page.goto('/tickets');
  await expect(refs.first()).toBeVisible();
  await expectNoSidewaysScroll(page);
  const reach = await table.evaluate((el) => {
    const box = el.closest<HTMLElement>('[data-table-box]')!;
    box.scrollLeft = box.scrollWidth;
    const lastHeader = [...el.querySelectorAll('thead th')].at(-1)!.getBoundingClientRect();
    const frame = box.getBoundingClientRect();
    return { lastRight: lastHeader.right, boxRight: frame.right, boxHeight: frame.height, screen: window.innerHeight };
  });
  expect(reach.lastRight).toBeLessThanOrEqual(reach.boxRight + 0.5);
  expect(reach.boxHeight, 'the table box fits the screen').toBeLessThan(reach.screen);
  await attachShot(testInfo, page, 'tickets-1366');
  await context.close();
});

test('on a phone the filters fold behind a Filters button that counts them; the search and the first card stay on screen', async ({
  browser,
}, testInfo) => {
  test.setTimeout(120_000);
  const { context, page } = await signIn(browser, office, phone);
  const filtersButton = page.getByRole('button', { name: /^Filters/ });

  // Every list with filters: the first card on the first screen, the search (if any) in sight.
  for (const [path, name, search] of [
    ['/tickets', 'Service tickets', 'Search'],
    ['/walls', 'Walls', 'Search'],
    ['/cabinets', 'Cabinets', 'Serial'],
    ['/visits', 'Visits', null],
  ] as const) {
    await page.goto(path);
    const first = page.getByRole('list', { name, exact: true }).getByRole('listitem').first();
    await expect(first).toBeVisible();
    await expect(first.getByRole('link').first(), `the first card of ${path} without scrolling`).toBeInViewport({ ratio: 1 });
    if (search) await expect(page.getByLabel(search, { exact: true })).toBeInViewport();
    await expect(filtersButton).toHaveAttribute('aria-expanded', 'false');
    expect((await filtersButton.boundingBox())!.height).toBeGreaterThanOrEqual(MIN_TARGET - 0.5);
  }

  // The tickets list: its status filter (open tickets) counts; opening shows the filters; a second one adds to the count.
  await page.goto('/tickets');
  const priority = page.getByLabel('Priority', { exact: true });
  await expect(filtersButton).toHaveAttribute('aria-expanded', 'false');
  await expect(priority).toBeHidden();
  await expect(filtersButton.getByTestId('active-filter-count')).toHaveText(/^1\b/);
  await filtersButton.click();
  await expect(filtersButton).toHaveAttribute('aria-expanded', 'true');
  await expect(priority).toBeVisible();
  await priority.selectOption('high');
  await expect(page).toHaveURL(/[?&]priority=high/);
  await expect(filtersButton.getByTestId('active-filter-count')).toHaveText(/^2\b/);
  await attachShot(testInfo, page, 'tickets-filters-open-phone');
  // Folded again, the count still says what is applied.
  await filtersButton.click();
  await expect(priority).toBeHidden();
  await expect(filtersButton).toHaveAccessibleName(/Filters\s*2 applied/);

  // A list with nothing applied shows no count until a filter is chosen.
  await page.goto('/walls');
  await expect(filtersButton.getByTestId('active-filter-count')).toHaveCount(0);
  await filtersButton.click();
  const client = page.getByLabel('Client', { exact: true });
  const clientId = await client.locator('option').nth(1).getAttribute('value');
  await client.selectOption(clientId!);
  await expect(filtersButton.getByTestId('active-filter-count')).toHaveText(/^1\b/);

  // On a desk the filters stand in a row, with no Filters button.
  await page.setViewportSize(desktop.viewport!);
  await expect(filtersButton).toHaveCount(0);
  await expect(page.getByLabel('Client', { exact: true })).toBeVisible();
  await context.close();
});
