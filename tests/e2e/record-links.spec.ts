// No dead ends between records, in a real browser against the demo data: from a ticket, its
// client's page lists the client's tickets and visits; a reported cell of the ticket's map opens
// that cabinet's card; the card links the open ticket naming the position; a visit of the ticket
// opens in dispatch for the office; a toast leaves the ticket's details panel in sight.
import { expect, test, type Locator, type Page } from '@playwright/test';
import type { Page as ListPage } from '../../shared/schemas/common.js';
import type { TicketDetail, TicketListItem } from '../../shared/schemas/tickets.js';
import type { VisitListItem } from '../../shared/schemas/visits.js';
import type { WallCabinet } from '../../shared/schemas/walls.js';
import { attachShot, escapeRegExp, getJson, signIn } from './support.js';

const office = 'office@gridkeep.test';

interface Chosen {
  ticket: TicketDetail;
  cabinet: WallCabinet;
  visits: VisitListItem[];
}

/**
 * An open ticket of the demo data on a wall, with a reported cell that holds a cabinet, whose
 * client has visits: found through the API as the office sees it.
 */
async function chooseTicket(page: Page): Promise<Chosen> {
  const open = await getJson<ListPage<TicketListItem>>(page.request, '/api/tickets?open=true&limit=100');
  for (const item of open.items.filter((t) => t.wall && t.cellCount > 0)) {
    const ticket = await getJson<TicketDetail>(page.request, `/api/tickets/${item.id}`);
    const cabinets = await getJson<{ items: WallCabinet[] }>(page.request, `/api/walls/${ticket.wall!.id}/cabinets`);
    const cabinet = cabinets.items.find((c) => ticket.cells.some((p) => p.column === c.column && p.row === c.row));
    const visits = await getJson<ListPage<VisitListItem>>(page.request, `/api/visits?clientId=${ticket.client.id}&dir=desc&limit=100`);
    if (cabinet && visits.items.length > 0) return { ticket, cabinet, visits: visits.items };
  }
  throw new Error('no open ticket with a reported cabinet at a client with visits in the demo data');
}

const overlaps = (a: { x: number; y: number; width: number; height: number }, b: typeof a) =>
  a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

async function boxOf(locator: Locator) {
  const box = await locator.boundingBox();
  expect(box, 'drawn on the screen').not.toBeNull();
  return box!;
}

test('from a ticket: the client page lists its tickets and visits; a map cell opens the cabinet card, whose ticket link opens the ticket', async ({
  browser,
}, testInfo) => {
  const { context, page } = await signIn(browser, office);
  const { ticket, cabinet, visits } = await chooseTicket(page);
  const position = `C${cabinet.column}·R${cabinet.row}`;

  // ---- the ticket names its client, site and wall as links ----
  await page.goto(`/tickets/${ticket.id}`);
  const details = page.getByRole('navigation', { name: 'Installation' });
  await expect(details.getByRole('link', { name: ticket.site.name, exact: true })).toHaveAttribute('href', `/sites/${ticket.site.id}`);
  await expect(details.getByRole('link', { name: ticket.wall!.name, exact: true })).toHaveAttribute('href', `/walls/${ticket.wall!.id}`);

  // ---- the client link: the client's page lists this ticket and the client's visits ----
  await details.getByRole('link', { name: ticket.client.name, exact: true }).click();
  await expect(page).toHaveURL(new RegExp(`/clients/${ticket.client.id}$`));
  await expect(page.getByRole('heading', { level: 1 })).toContainText(ticket.client.name);
  const tickets = page.getByRole('list', { name: `Tickets of ${ticket.client.name}` });
  const ticketLink = tickets.getByRole('link', { name: new RegExp(`^${escapeRegExp(ticket.ref)}\\b`) });
  await expect(ticketLink).toHaveAttribute('href', `/tickets/${ticket.id}`);
  // Open first: no resolved or closed ticket comes before an open one.
  const statuses = await tickets.getByRole('link').evaluateAll((links) => links.map((a) => a.textContent ?? ''));
  const firstDone = statuses.findIndex((s) => /Resolved|Closed/.test(s));
  if (firstDone >= 0)
    expect(
      statuses.slice(firstDone).some((s) => !/Resolved|Closed/.test(s)),
      'open tickets first',
    ).toBe(false);
  // Visits, the latest first, each opening its page.
  const visitList = page.getByRole('region', { name: 'Visits' }).getByRole('list', { name: 'Visits' });
  await expect(visitList.getByRole('listitem')).toHaveCount(Math.min(visits.length, 100));
  await expect(visitList.locator('a[href^="/visits/"]').first()).toHaveAttribute('href', `/visits/${visits[0].id}`);
  await attachShot(testInfo, page, 'client-page', { fullPage: true });

  // ---- back on the ticket, a reported cell opens its cabinet card ----
  await ticketLink.click();
  await expect(page).toHaveURL(new RegExp(`/tickets/${ticket.id}$`));
  await page.getByRole('gridcell', { name: new RegExp(`^${escapeRegExp(position)},`) }).click();
  const dialog = page.getByRole('dialog', { name: `Cabinet at ${position}` });
  const card = dialog.getByTestId('cabinet-card');
  await expect(card.getByRole('heading', { name: cabinet.serial })).toBeVisible();
  // The ticket names this position: on its own page it says so instead of linking to itself.
  await expect(card.getByText(`${ticket.ref} (this ticket)`)).toBeVisible();
  await attachShot(testInfo, page, 'ticket-cabinet-card');

  // ---- the same card on the wall page links the ticket, and the link opens it ----
  await dialog.getByRole('link', { name: 'Open on the wall page' }).click();
  await expect(page).toHaveURL(new RegExp(`/walls/${ticket.wall!.id}\\?col=${cabinet.column}&row=${cabinet.row}`));
  const wallCard = page.getByTestId('cabinet-card');
  await expect(wallCard.getByRole('heading', { name: cabinet.serial })).toBeVisible();
  await wallCard.getByRole('link', { name: ticket.ref, exact: true }).click();
  await expect(page).toHaveURL(new RegExp(`/tickets/${ticket.id}$`));
  await expect(page.getByRole('heading', { level: 1 })).toContainText(ticket.title);

  await context.close();
});

test('a visit on a ticket opens its page, and for the office its edit dialog in dispatch; a toast leaves the details in sight', async ({
  browser,
}, testInfo) => {
  const { context, page } = await signIn(browser, office);
  // The oldest such ticket first: the dispatch test books and cancels a visit on the newest one.
  const open = await getJson<ListPage<TicketListItem>>(page.request, '/api/tickets?open=true&sort=createdAt&dir=asc&limit=100');
  let ticket: TicketDetail | undefined;
  for (const item of open.items) {
    const t = await getJson<TicketDetail>(page.request, `/api/tickets/${item.id}`);
    if (t.visits.some((v) => v.status === 'planned')) {
      ticket = t;
      break;
    }
  }
  expect(ticket, 'an open ticket with a planned visit in the demo data').toBeDefined();
  const visit = ticket!.visits.find((v) => v.status === 'planned')!;

  await page.goto(`/tickets/${ticket!.id}`);
  const visitsCard = page.getByRole('list', { name: 'Visits for this ticket' });
  await expect(visitsCard.locator(`a[href="/visits/${visit.id}"]`)).toBeVisible();

  // ---- a toast: bottom left, clear of the handling strip under the title ----
  const triage = page.getByRole('form', { name: 'Handling' });
  const priority = triage.getByLabel('Priority');
  await priority.selectOption(ticket!.priority === 'low' ? 'normal' : 'low');
  await triage.getByRole('button', { name: /^Save/ }).click();
  const toast = page.getByText(`${ticket!.ref} is updated.`);
  await expect(toast).toBeVisible();
  const aside = await boxOf(triage);
  const toastBox = await boxOf(toast.locator('xpath=..'));
  expect(overlaps(toastBox, aside), 'the toast covers the handling strip').toBe(false);
  await attachShot(testInfo, page, 'ticket-toast');
  expect(toastBox.x + toastBox.width, 'the toast sits on the left').toBeLessThan(page.viewportSize()!.width / 2);

  // ---- move or cancel: dispatch opens on the visit's week with its edit dialog ----
  await visitsCard.getByRole('link', { name: /^Move or cancel the visit/ }).click();
  await expect(page).toHaveURL(/\/dispatch\?week=\d{4}-\d{2}-\d{2}&visit=/);
  const edit = page.getByRole('dialog');
  await expect(edit.getByRole('button', { name: /^Cancel visit/ })).toBeVisible();
  await expect(edit).toContainText(ticket!.ref);
  await page.keyboard.press('Escape');
  await expect(page).not.toHaveURL(/visit=/);

  await context.close();
});
