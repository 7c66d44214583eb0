import { expect, test } from '@playwright/test';
import { attachShot, csrf, desktop, escapeRegExp, getJson, signIn } from './support.js';

// The admin's audit log against the real app with the demo data: each entry names its record
// (linked to its page) and opens on what changed, field by field, before and after.

interface Client {
  id: string;
  name: string;
  notes: string;
}

test('the audit log names each record with a link and shows a change field by field', async ({ browser }, testInfo) => {
  const { context, page } = await signIn(browser, 'admin@gridkeep.test', desktop);

  // A change made now: a client's notes.
  const [listed] = (await getJson<{ items: Client[] }>(page.request, '/api/clients?limit=1')).items;
  const client = await getJson<Client>(page.request, `/api/clients/${listed.id}`);
  const notes = `Gate code changed ${Date.now()}`;
  expect((await page.request.patch(`/api/clients/${client.id}`, { headers: csrf, data: { notes } })).ok()).toBe(true);

  // The whole log: the demo's tickets and cabinets appear by reference and serial, as links.
  await page.goto('/admin/audit');
  const log = page.getByRole('table', { name: 'Audit log, newest first' });
  await expect(log.getByRole('link', { name: client.name, exact: true }).first()).toHaveAttribute('href', `/clients/${client.id}`);
  await expect(log.locator('a[href^="/tickets/"]').first()).toBeVisible();
  // No record shown by a bare id.
  await expect(log.getByText(/^[0-9a-f]{8}…$/)).toHaveCount(0);
  await page.goto('/admin/audit?entity=cabinet');
  await expect(log.locator('a[href^="/c/"]').first()).toBeVisible();
  await expect(log.getByText(/^[0-9a-f]{8}…$/)).toHaveCount(0);
  await page.goto('/admin/audit');

  // This client's history alone, from the entry's "History" button.
  await log
    .getByRole('button', { name: `History of client ${client.name}` })
    .first()
    .click();
  await expect(page).toHaveURL(new RegExp(`entityId=${client.id}`));
  const row = log
    .getByRole('row')
    .filter({ has: page.getByRole('link', { name: client.name, exact: true }) })
    .first();
  await expect(row).toContainText('Updated');
  await expect(row).toContainText('Notes');
  await row.getByRole('button', { name: new RegExp(`^Show changes: Updated client ${escapeRegExp(client.name)}`) }).click();

  const changes = page.getByRole('table', { name: 'Changed fields, before and after' });
  await expect(changes).toBeVisible();
  const notesRow = changes.getByRole('row').filter({ has: page.getByRole('rowheader', { name: 'Notes' }) });
  await expect(notesRow.getByRole('cell').nth(0)).toHaveText(client.notes ? `was: ${client.notes}` : 'empty');
  await expect(notesRow.getByRole('cell').nth(1)).toHaveText(`now: ${notes}`);
  // Only what changed, and no raw JSON.
  await expect(changes.getByRole('rowheader')).toHaveText(['Notes']);
  await expect(changes).not.toContainText('{');
  await attachShot(testInfo, page, 'audit-log-change');
  await context.close();
});
