import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { attachShot, desktop, escapeRegExp, getJson, phone, signIn } from './support';

// Finding things as people do: a ticket by the number said on the phone, a cabinet by the end of
// the serial read off its label (from the top bar's search box, and on the Scan page of a phone).
// The demo data is read through the list APIs, never through the search being tested.

const office = 'office@gridkeep.test';
const technician = 'tech@gridkeep.test';

interface Cabinet {
  id: string;
  serial: string;
  wallId: string | null;
  column: number | null;
  row: number | null;
}

/** Every cabinet the signed-in user may see, page by page through the register's list. */
async function allCabinets(request: APIRequestContext): Promise<Cabinet[]> {
  const all: Cabinet[] = [];
  let cursor: string | null = null;
  do {
    const page: { items: Cabinet[]; nextCursor: string | null } = await getJson(
      request,
      `/api/cabinets?limit=500${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ''}`,
    );
    all.push(...page.items);
    cursor = page.nextCursor;
  } while (cursor);
  return all;
}

/** The shortest end (of at least five characters) that only this installed cabinet's serial has. */
function uniqueTail(cabinets: Cabinet[]): { cabinet: Cabinet; tail: string } {
  for (const cabinet of cabinets.filter((c) => c.wallId)) {
    for (let n = 5; n < cabinet.serial.length; n += 1) {
      const tail = cabinet.serial.slice(-n);
      if (cabinets.filter((c) => c.serial.endsWith(tail)).length === 1) return { cabinet, tail };
    }
  }
  throw new Error('No demo serial has an end of its own.');
}

/** An end of three characters that a few serials share. */
function sharedTail(cabinets: Cabinet[]): { tail: string; serials: string[] } {
  const byTail = new Map<string, Cabinet[]>();
  for (const c of cabinets) byTail.set(c.serial.slice(-3), [...(byTail.get(c.serial.slice(-3)) ?? []), c]);
  for (const [tail, group] of byTail) {
    if (group.length >= 2 && group.length <= 20) return { tail, serials: group.map((c) => c.serial).sort() };
  }
  throw new Error('No two demo serials end alike.');
}

async function searchFromTopBar(page: Page, text: string) {
  const box = page.getByRole('searchbox', { name: 'Search Gridkeep' });
  await box.fill(text);
  await box.press('Enter');
  await expect(page.getByRole('heading', { level: 1, name: `Results for “${text}”` })).toBeVisible();
}

test('the top bar finds a ticket by its number and a cabinet by the end of its serial', async ({ browser }, testInfo) => {
  const { page } = await signIn(browser, office, desktop);
  const tickets: { items: { id: string; number: number; ref: string; title: string }[] } = await getJson(
    page.request,
    '/api/tickets?limit=5',
  );
  const ticket = tickets.items[tickets.items.length - 1];

  // As said on the phone ("ten forty-one of twenty-six"), typed with spaces around the slash.
  await searchFromTopBar(page, ticket.ref.replace('/', ' / '));
  const ticketsGroup = page.getByRole('region', { name: /^Tickets/ });
  const ticketLink = ticketsGroup.getByRole('link', { name: new RegExp(`^${escapeRegExp(ticket.ref)} ${escapeRegExp(ticket.title)}`) });
  await expect(ticketLink).toBeVisible();
  await attachShot(testInfo, page, 'search-ticket-number');
  await ticketLink.click();
  await expect(page).toHaveURL(`/tickets/${ticket.id}`);

  // The bare number finds it too, and so does a reference of before the year was in it (old e-mails).
  for (const q of [String(ticket.number), `gk-${ticket.number}`]) {
    await searchFromTopBar(page, q);
    await expect(
      page
        .getByRole('region', { name: /^Tickets/ })
        .getByRole('link')
        .first(),
    ).toHaveAttribute('href', `/tickets/${ticket.id}`);
  }

  // The end of a serial, as read off a label: the cabinet, which opens on its wall's map.
  const { cabinet, tail } = uniqueTail(await allCabinets(page.request));
  await searchFromTopBar(page, tail);
  const cabinetsGroup = page.getByRole('region', { name: /^Cabinets/ });
  await expect(cabinetsGroup.getByRole('heading')).toHaveText(/^Cabinets \(\d+/);
  const cabinetLink = cabinetsGroup.getByRole('link', { name: new RegExp(`^${escapeRegExp(cabinet.serial)}`) });
  await expect(cabinetLink).toBeVisible();
  await attachShot(testInfo, page, 'search-serial-tail');
  await cabinetLink.click();
  await expect(page).toHaveURL(new RegExp(`/walls/${cabinet.wallId}\\?col=${cabinet.column}&row=${cabinet.row}$`));
});

test('on a phone, the Scan page opens a cabinet from the end of its serial, or lists the ones to pick from', async ({
  browser,
}, testInfo) => {
  const { page } = await signIn(browser, technician, phone);
  const cabinets = await allCabinets(page.request);

  // One serial ends in it: that cabinet opens.
  const { cabinet, tail } = uniqueTail(cabinets);
  await page.goto('/scan');
  const serial = page.getByRole('textbox', { name: 'Serial' });
  await serial.fill(tail.toLowerCase());
  await page.getByRole('button', { name: 'Open cabinet' }).click();
  await expect(page).toHaveURL(`/c/${encodeURIComponent(cabinet.serial)}`);
  await expect(page.getByTestId('cabinet-position')).toHaveText(`C${cabinet.column}·R${cabinet.row}`);

  // Several end in it: they are listed, each a large target, and the typed text stays.
  const shared = sharedTail(cabinets);
  await page.goto('/scan');
  await serial.fill(shared.tail);
  await page.getByRole('button', { name: 'Open cabinet' }).click();
  const picks = page.getByRole('region', { name: new RegExp(`cabinets end in “${escapeRegExp(shared.tail)}”`) }).getByRole('link');
  await expect(picks).toHaveCount(shared.serials.length);
  const listed = (await picks.allInnerTexts()).map((t) => t.split('\n')[0].trim()).sort();
  expect(listed).toEqual(shared.serials);
  for (const link of await picks.all()) {
    const box = await link.boundingBox();
    expect(box?.height).toBeGreaterThanOrEqual(44); // WCAG 2.2 SC 2.5.5 target size
  }
  await expect(serial).toHaveValue(shared.tail);
  await attachShot(testInfo, page, 'scan-pick-a-serial', { fullPage: true });
  await picks.first().click();
  await expect(page).toHaveURL(`/c/${encodeURIComponent(shared.serials[0])}`);

  // No serial ends in it: said at the field, nothing lost.
  await page.goto('/scan');
  await serial.fill('QQ9Z9Z');
  await page.getByRole('button', { name: 'Open cabinet' }).click();
  await expect(page.getByText("No cabinet's serial is or ends in QQ9Z9Z.")).toBeVisible();
  await expect(serial).toHaveValue('QQ9Z9Z');
});
