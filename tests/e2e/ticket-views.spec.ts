import { expect, test } from '@playwright/test';
import { attachShot, desktop, getJson, signIn } from './support.js';

// The office's tickets list opens on the open tickets; after any filtering, the "Open tickets"
// chip brings that default back in one tap and says when it is what the list shows.

test('the Open tickets chip brings back the default list after filtering, and is marked current only then', async ({
  browser,
}, testInfo) => {
  test.setTimeout(120_000);
  const { context, page } = await signIn(browser, 'office@gridkeep.test', desktop);
  const open = await getJson<{ items: { ref: string }[] }>(page.request, '/api/tickets?open=true&sort=createdAt&dir=desc&limit=5');
  expect(open.items.length).toBeGreaterThan(0);

  await page.goto('/tickets');
  const views = page.getByRole('group', { name: 'Saved views' });
  const openChip = views.getByRole('button', { name: 'Open tickets', exact: true });
  const allChip = views.getByRole('button', { name: 'All tickets', exact: true });
  const status = page.getByLabel('Status', { exact: true });
  const firstRef = page.getByRole('table', { name: 'Service tickets' }).getByRole('row').locator('td:first-child').first();
  await expect(openChip).toHaveAttribute('aria-pressed', 'true');
  await expect(allChip).toHaveAttribute('aria-pressed', 'false');
  await expect(firstRef).toHaveText(open.items[0]!.ref);
  // The default is not offered for saving: the chip already is that view.
  await expect(views.getByRole('button', { name: 'Save view' })).toHaveCount(0);

  // Filtered: the chip lets go, the filter can be saved.
  await page.getByLabel('Priority', { exact: true }).selectOption('low');
  await expect(page).toHaveURL(/[?&]priority=low/);
  await expect(openChip).toHaveAttribute('aria-pressed', 'false');
  await expect(views.getByRole('button', { name: 'Save view' })).toBeVisible();
  await attachShot(testInfo, page, 'tickets-filtered');

  // One tap back to the open tickets.
  await openChip.click();
  await expect(page).not.toHaveURL(/priority=/);
  await expect(openChip).toHaveAttribute('aria-pressed', 'true');
  await expect(status.locator('option:checked')).toHaveText('All open');
  await expect(page.getByLabel('Priority', { exact: true }).locator('option:checked')).toHaveText('Any priority');
  await expect(firstRef).toHaveText(open.items[0]!.ref);

  // Every ticket is another view; the chip comes back from it too, and survives a reload.
  await allChip.click();
  await expect(page).toHaveURL(/[?&]open=all/);
  await expect(allChip).toHaveAttribute('aria-pressed', 'true');
  await expect(openChip).toHaveAttribute('aria-pressed', 'false');
  await openChip.click();
  await expect(page).toHaveURL(/[?&]open=true/);
  await page.reload();
  await expect(openChip).toHaveAttribute('aria-pressed', 'true');
  await expect(allChip).toHaveAttribute('aria-pressed', 'false');
  await attachShot(testInfo, page, 'tickets-open-chip');
  await context.close();
});
