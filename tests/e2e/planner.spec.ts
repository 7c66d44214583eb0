import { expect, test, type Page } from '@playwright/test';

// The planner against the real app and its demo data (scripts/start.ts seeds it): plan a
// 12 × 6 wall of 500 mm cabinets, find the grid again from a target size in feet, save the
// plan onto the demo wall of that model and grid, and read the stored runs on its runs page.

interface WallRow {
  id: string;
  name: string;
  columns: number;
  rows: number;
  cabinetModel: { id: string; name: string };
}
interface Model {
  id: string;
  name: string;
  widthMm: number;
  heightMm: number;
  pixelsWide: number;
  pixelsHigh: number;
}

async function signIn(page: Page) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('office@gridkeep.test');
  await page.getByLabel('Password', { exact: true }).fill('gridkeep-demo');
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

/** A demo wall of 12 × 6 cabinets of 500 × 500 mm, found through the API as the office sees it. */
async function demoWall(page: Page): Promise<{ wall: WallRow; model: Model }> {
  const walls = (await (await page.request.get('/api/walls?limit=500')).json()) as { items: WallRow[] };
  const models = (await (await page.request.get('/api/cabinet-models')).json()) as { items: Model[] };
  for (const wall of walls.items.filter((w) => w.columns === 12 && w.rows === 6)) {
    const model = models.items.find((m) => m.id === wall.cabinetModel.id);
    if (model && model.widthMm === 500 && model.heightMm === 500) return { wall, model };
  }
  throw new Error('The demo data has no 12 × 6 wall of 500 mm cabinets.');
}

async function chooseOption(select: ReturnType<Page['getByLabel']>, containing: string) {
  await select.locator('option', { hasText: containing }).first().waitFor({ state: 'attached' });
  const labels = await select.locator('option').allTextContents();
  const label = labels.find((l) => l.includes(containing));
  expect(label, `an option containing “${containing}”`).toBeTruthy();
  await select.selectOption({ label: label! });
}

for (const viewport of [
  { name: 'desktop', width: 1366, height: 800 },
  { name: 'phone', width: 390, height: 844 },
]) {
  test(`plans a 12 × 6 wall, saves it onto the demo wall and shows its runs (${viewport.name})`, async ({ page }, testInfo) => {
    // A long walk through four screens; the first visit also waits for the server's first answers.
    test.setTimeout(120_000);
    const errors: string[] = [];
    page.on('pageerror', (err) => errors.push(err.message));
    await page.setViewportSize({ width: viewport.width, height: viewport.height });
    await signIn(page);
    const { wall, model } = await demoWall(page);

    await page.goto('/planner');
    await expect(page.getByRole('heading', { name: 'Planner', level: 1 })).toBeVisible();
    await chooseOption(page.getByLabel('Cabinet model'), model.name);
    await page.getByRole('spinbutton', { name: 'Columns' }).fill('12');
    await page.getByRole('spinbutton', { name: 'Rows' }).fill('6');

    // 12 × 6 = 72 cabinets; 12 × 500 mm = 6.00 m by 6 × 500 mm = 3.00 m (common practice: size = count × cabinet).
    const figures = page.locator('section', { has: page.getByRole('heading', { name: 'Wall plan' }) });
    await expect(figures.locator('[data-figure="cabinets"]')).toContainText('72 cabinets');
    await expect(figures.locator('[data-figure="size"]')).toContainText('6.00 m × 3.00 m');
    // 6,000 mm ÷ 25.4 = 236.22 in = 19' 8-1/4" to the nearest eighth (1 in = 25.4 mm, NIST Handbook 44).
    await expect(figures.locator('[data-figure="size"]')).toContainText(`19' 8-1/4"`);
    await expect(
      page
        .getByText('circuits and connections are designed and signed off by a licensed electrician under the local code', { exact: false })
        .first(),
    ).toBeVisible();
    await page.screenshot({ path: testInfo.outputPath(`planner-${viewport.name}.png`), fullPage: true });

    // 20 ft × 10 ft = 6,096 × 3,048 mm: 12.19 × 6.10 cabinets of 500 mm, so 12 × 6 comes closest.
    await page.getByText('Target size', { exact: true }).click();
    await page.getByText('Feet', { exact: true }).click();
    await page.getByRole('spinbutton', { name: 'Width (ft)' }).fill('20');
    await page.getByRole('spinbutton', { name: 'Height (ft)' }).fill('10');
    const nearest = page.getByRole('group', { name: 'Nearest grids' });
    await expect(nearest.getByRole('radio').first()).toBeChecked();
    await expect(nearest.locator('label').first()).toContainText('12 × 6');
    await expect(figures.locator('[data-figure="cabinets"]')).toContainText('72 cabinets');

    await page.getByRole('button', { name: 'Save onto a wall…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Save onto a wall' });
    await dialog.getByText('An existing wall', { exact: true }).click();
    await chooseOption(dialog.getByLabel('Wall', { exact: true }), `${wall.name} (12 × 6)`);
    await dialog.getByRole('button', { name: 'Save onto wall' }).click();
    await expect(dialog.getByText('Plan saved')).toBeVisible();
    await dialog.getByRole('link', { name: `Open the runs of ${wall.name}` }).click();

    await expect(page).toHaveURL(new RegExp(`/walls/${wall.id}/runs$`));
    await expect(page.getByRole('heading', { name: `Runs of ${wall.name}` })).toBeVisible();
    await expect(page.getByText('No runs are stored for this wall yet')).toHaveCount(0);
    // Data runs by whole rows (common practice): a row of 12 × 36,864 px = 442,368 px fits one
    // 650,000 px output, so six runs of 12 cabinets, one per row.
    await expect(page.getByTestId('data-run-totals')).toContainText('6 runs · 72 cabinets');
    await expect(page.getByTestId('data-runs-sound')).toBeVisible();
    await expect(page.getByRole('button', { name: /Run 1 · 12 cabinets/ })).toBeVisible();

    // What the page shows is what the server stored.
    const stored = (await (await page.request.get(`/api/walls/${wall.id}`)).json()) as {
      dataRuns: { pattern: string; runs: { cells: unknown[] }[]; limit: number };
      powerRuns: { runs: { cells: unknown[] }[] };
    };
    expect(stored.dataRuns.pattern).toBe('rows');
    expect(stored.dataRuns.limit).toBe(650_000);
    expect(stored.dataRuns.runs.reduce((n, r) => n + r.cells.length, 0)).toBe(72);
    expect(stored.powerRuns.runs.reduce((n, r) => n + r.cells.length, 0)).toBe(72);
    await page.screenshot({ path: testInfo.outputPath(`runs-${viewport.name}.png`), fullPage: true });

    await page.getByRole('link', { name: 'Print for the crew' }).click();
    await expect(page.getByRole('heading', { name: wall.name, level: 1 })).toBeVisible();
    await page.emulateMedia({ media: 'print' });
    // On paper: no app shell and no screen controls, the cautions printed with the runs.
    await expect(page.getByRole('button', { name: 'Print' })).toBeHidden();
    await expect(page.getByRole('navigation')).toHaveCount(0);
    await expect(page.getByTestId('sheet-data-totals')).toContainText('6 runs · 72 cabinets');
    await expect(page.getByText('ballast and rigging are not computed here', { exact: false })).toBeVisible();
    await page.screenshot({ path: testInfo.outputPath(`print-${viewport.name}.png`), fullPage: true });

    expect(errors).toEqual([]);
  });
}

test('plans the power of a three-phase supply, refuses a supply the cabinet cannot take, and refuses a chain over its limit', async ({
  page,
}, testInfo) => {
  test.setTimeout(120_000);
  const errors: string[] = [];
  page.on('pageerror', (err) => errors.push(err.message));
  await page.setViewportSize({ width: 1366, height: 900 });
  await signIn(page);
  const { wall, model } = await demoWall(page);

  await page.goto('/planner');
  await chooseOption(page.getByLabel('Cabinet model'), model.name);
  await page.getByRole('spinbutton', { name: 'Columns' }).fill('12');
  await page.getByRole('spinbutton', { name: 'Rows' }).fill('6');
  await page.getByRole('spinbutton', { name: 'Voltage (V)' }).fill('208');
  await page.getByLabel('Phases').selectOption({ label: 'Three phase' });

  // 208 V three-phase: each chain is one 208 V line-to-line circuit, never √3 × 208 V.
  const figures = page.locator('section', { has: page.getByRole('heading', { name: 'Wall plan' }) });
  await expect(figures.locator('[data-figure="supply"]')).toContainText('each chain one 208 V line-to-line (two phases) circuit');
  // The demo model's datasheet allows 12 per chain (the maker's limit): one chain per row, 6 circuits.
  await expect(figures.locator('[data-figure="circuits"]')).toContainText('6 × 20 A');
  await expect(figures.locator('[data-figure="chain-limit"]')).toContainText("set by the maker's limit");
  const circuits = page.getByRole('region', { name: 'Circuits', exact: true });
  await expect(circuits.getByRole('row')).toHaveCount(7);
  await expect(circuits.getByRole('row').nth(1)).toContainText('A-B');
  await expect(circuits.getByRole('row').nth(2)).toContainText('B-C');
  await expect(circuits.getByRole('row').nth(3)).toContainText('C-A');
  await expect(figures.locator('[data-figure="phase-currents"]')).toContainText('A ');
  await expect(page.getByRole('region', { name: 'Checks', exact: true }).locator('[data-check="inrush"]')).toBeVisible();
  await expect(page.getByText('NEC 210.19(A), 210.20(A)', { exact: false }).first()).toBeVisible();
  await page.screenshot({ path: testInfo.outputPath('planner-three-phase.png'), fullPage: true });

  // 480 V is outside the cabinet's 100–240 V input: refused on the field, with the remedy.
  await page.getByRole('spinbutton', { name: 'Voltage (V)' }).fill('480');
  await expect(page.getByText('Neither 480 V line-to-line nor 277.1 V line-to-neutral', { exact: false }).first()).toBeVisible();
  await expect(page.getByText('Fix the figures below to see the plan.')).toBeVisible();

  // The wall as built: 208 V three-phase, one data line and one power chain per row (12 cabinets
  // of 180 W = 2,160 W, exactly the maker's 12 per chain).
  const rowRuns = Array.from({ length: 6 }, (_, r) => ({
    index: r + 1,
    cells: Array.from({ length: 12 }, (_, c) => ({ column: c + 1, row: r + 1 })),
  }));
  const saved = await page.request.put(`/api/walls/${wall.id}/plan`, {
    headers: { 'X-Requested-With': 'gridkeep' },
    data: {
      settings: { supply: { voltage: 208, phases: 3, breakerAmps: 20, continuousFactor: 0.8 }, outputCapacityPixels: 650_000 },
      dataRuns: { pattern: 'rows', runs: rowRuns },
      powerRuns: { pattern: 'rows', runs: rowRuns },
    },
  });
  expect(saved.status()).toBe(200);

  // On the wall's runs page, a power chain made longer than its limit is refused before saving:
  // C12·R2 added to run 1 makes 13 cabinets, 2,340 W over the chain's 2,160 W.
  await page.goto(`/walls/${wall.id}/runs`);
  await page.locator('label', { hasText: /^Power runs$/ }).click();
  await page.getByRole('button', { name: 'Edit by hand' }).click();
  await page.getByRole('button', { name: /Run 1 · 12 cabinets/ }).click();
  await page.getByRole('gridcell', { name: /^C12·R2,/ }).click();
  await expect(page.getByText('Run 1 draws 2,340 W, over the chain capacity of 2,160 W.')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Save runs' })).toBeDisabled();
  await page.screenshot({ path: testInfo.outputPath('runs-over-limit.png'), fullPage: true });
  expect(errors).toEqual([]);
});
