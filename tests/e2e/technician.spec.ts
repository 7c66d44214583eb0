import { expect, test, type Browser, type Page } from '@playwright/test';

// The technician's phone: the start page with their open tickets, the bottom navigation, and
// opening a cabinet from its label on the scan page (typed serial, and the camera where the
// browser reads QR codes), against the real app with the seeded demo data.

const technician = 'tech@gridkeep.test';
const password = 'gridkeep-demo';
const phone = { viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true, deviceScaleFactor: 2 };

interface Cabinet {
  serial: string;
  column: number;
  row: number;
}

async function signInOnPhone(browser: Browser): Promise<Page> {
  const context = await browser.newContext(phone);
  const page = await context.newPage();
  await page.goto('/sign-in');
  await page.getByLabel('E-mail address').fill(technician);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/$/);
  return page;
}

/** A cabinet installed on a demo wall, read through the API as the signed-in technician. */
async function demoCabinet(page: Page): Promise<Cabinet> {
  const walls = (await (await page.request.get('/api/walls?limit=100')).json()) as { items: { id: string }[] };
  for (const wall of walls.items) {
    const res = await page.request.get(`/api/walls/${wall.id}/cabinets`);
    expect(res.ok()).toBe(true);
    const cabinets = ((await res.json()) as { items: Cabinet[] }).items;
    if (cabinets.length > 0) return cabinets[Math.floor(cabinets.length / 2)];
  }
  throw new Error('The demo data has no wall with cabinets.');
}

test('a technician on a phone sees their open tickets, and opens a cabinet by typing its serial', async ({ browser }, testInfo) => {
  const page = await signInOnPhone(browser);
  const shot = async (name: string) =>
    testInfo.attach(name, {
      body: await page.screenshot({ fullPage: true, path: testInfo.outputPath(`${name}.png`) }),
      contentType: 'image/png',
    });

  // ---- start page: "My tickets" holds the open tickets assigned to them, the soonest due first ----
  await expect(page.getByRole('heading', { name: 'My tickets' })).toBeVisible();
  const mine = (await (await page.request.get('/api/tickets?assigneeId=me&open=true&sort=resolutionDueAt&dir=asc&limit=25')).json()) as {
    items: { id: string; ref: string; title: string }[];
  };
  const cards = page.getByRole('list', { name: 'Open tickets assigned to you' }).getByRole('listitem');
  if (mine.items.length > 0) {
    await expect(cards).toHaveCount(mine.items.length);
    for (const [i, t] of mine.items.entries()) {
      await expect(cards.nth(i)).toContainText(t.ref);
      await expect(cards.nth(i)).toContainText(t.title);
      await expect(cards.nth(i).getByRole('link')).toHaveAttribute('href', `/tickets/${t.id}`);
    }
  } else {
    await expect(page.getByText('Nothing assigned to you is open')).toBeVisible();
  }
  // The service cautions (product design, "Cautions the product shows").
  await expect(page.getByText('Isolate power before opening a cabinet; handle modules with ESD protection')).toBeVisible();
  await shot('technician-home');

  // ---- the bottom navigation: six places, each at least 44 × 44 CSS px (WCAG 2.2 SC 2.5.5) ----
  const nav = page.getByRole('navigation', { name: 'Main' });
  await expect(nav.getByRole('link')).toHaveText(['Today', 'Tickets', 'Walls', 'Scan', 'Van', 'Me']);
  for (const link of await nav.getByRole('link').all()) {
    const box = await link.boundingBox();
    expect(box?.height).toBeGreaterThanOrEqual(44);
    expect(box?.width).toBeGreaterThanOrEqual(44);
  }

  // ---- the scan page: the serial field has the focus and upper-cases what is typed ----
  const cabinet = await demoCabinet(page);
  await nav.getByRole('link', { name: 'Scan' }).click();
  await expect(page).toHaveURL(/\/scan$/);
  const serial = page.getByRole('textbox', { name: 'Serial' });
  await expect(serial).toBeFocused();
  await page.keyboard.type(cabinet.serial.toLowerCase());
  await expect(serial).toHaveValue(cabinet.serial.toUpperCase());
  // This browser (Chromium on Linux) has no BarcodeDetector: no camera button, but the hint.
  const hasDetector = await page.evaluate(() => 'BarcodeDetector' in window);
  if (!hasDetector) await expect(page.getByRole('button', { name: 'Use the camera' })).toHaveCount(0);
  await expect(page.getByText("Your phone's own camera app opens the labels too")).toBeVisible();
  await shot('scan-page');

  await page.getByRole('button', { name: 'Open cabinet' }).click();
  await expect(page).toHaveURL(`/c/${encodeURIComponent(cabinet.serial)}`);
  await expect(page.getByRole('heading', { level: 1, name: cabinet.serial })).toBeVisible();
  await expect(page.getByTestId('cabinet-position')).toHaveText(`C${cabinet.column}·R${cabinet.row}`);
});

test('the camera reads a label address and opens that cabinet, then the camera is off', async ({ browser }) => {
  const page = await signInOnPhone(browser);
  const cabinet = await demoCabinet(page);
  // A label printed by another installation (another origin): the serial is taken from the path.
  const label = `https://labels.example.net/c/${encodeURIComponent(cabinet.serial)}`;

  // Chromium on Linux has neither a BarcodeDetector nor a camera. They are stood in for here,
  // answering as the real ones do (shape-detection-api, Media Capture and Streams): the camera is
  // a canvas stream, and the detector sees nothing, then a Wi-Fi code, then the label.
  await page.addInitScript((labelAddress: string) => {
    const w = window as unknown as Record<string, unknown>;
    let looks = 0;
    class StandInDetector {
      static async getSupportedFormats() {
        return ['qr_code'];
      }
      async detect() {
        looks += 1;
        if (looks < 3) return [];
        if (looks < 6) return [{ rawValue: 'WIFI:S:venue;T:WPA;P:secret;;', format: 'qr_code' }];
        return [{ rawValue: labelAddress, format: 'qr_code' }];
      }
    }
    w.BarcodeDetector = StandInDetector;
    Object.defineProperty(navigator.mediaDevices, 'getUserMedia', {
      configurable: true,
      value: async (constraints: MediaStreamConstraints) => {
        w.cameraConstraints = constraints;
        const canvas = document.createElement('canvas');
        canvas.width = 320;
        canvas.height = 240;
        const ctx = canvas.getContext('2d')!;
        const paint = () => {
          ctx.fillStyle = `hsl(${Date.now() % 360} 20% 50%)`;
          ctx.fillRect(0, 0, 320, 240);
        };
        paint();
        setInterval(paint, 100);
        const stream = canvas.captureStream(10);
        w.cameraStream = stream;
        return stream;
      },
    });
  }, label);

  await page.goto('/scan');
  await page.getByRole('button', { name: 'Use the camera' }).click();
  // Lands on the cabinet named by the label.
  await expect(page).toHaveURL(`/c/${encodeURIComponent(cabinet.serial)}`, { timeout: 15_000 });
  await expect(page.getByTestId('cabinet-position')).toHaveText(`C${cabinet.column}·R${cabinet.row}`);

  // It asked for the rear camera, and the camera is off now.
  expect(await page.evaluate(() => (window as unknown as { cameraConstraints: unknown }).cameraConstraints)).toEqual({
    video: { facingMode: 'environment' },
    audio: false,
  });
  const tracks = await page.evaluate(() =>
    (window as unknown as { cameraStream: MediaStream }).cameraStream.getTracks().map((t) => t.readyState),
  );
  expect(tracks.length).toBeGreaterThan(0);
  expect(tracks.every((state) => state === 'ended')).toBe(true);
});

test('leaving the scan page turns the camera off', async ({ browser }) => {
  const page = await signInOnPhone(browser);
  await page.addInitScript(() => {
    const w = window as unknown as Record<string, unknown>;
    w.BarcodeDetector = class {
      static async getSupportedFormats() {
        return ['qr_code'];
      }
      async detect() {
        return [];
      }
    };
    Object.defineProperty(navigator.mediaDevices, 'getUserMedia', {
      configurable: true,
      value: async () => {
        const canvas = document.createElement('canvas');
        canvas.getContext('2d')!.fillRect(0, 0, 10, 10);
        const stream = canvas.captureStream(5);
        w.cameraStream = stream;
        return stream;
      },
    });
  });
  await page.goto('/scan');
  await page.getByRole('button', { name: 'Use the camera' }).click();
  await expect(page.getByRole('button', { name: 'Stop the camera' })).toBeVisible();
  const state = () =>
    page.evaluate(() => (window as unknown as { cameraStream: MediaStream }).cameraStream.getTracks().map((t) => t.readyState));
  expect(await state()).toEqual(['live']);

  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Today' }).click();
  await expect(page.getByRole('heading', { name: 'My tickets' })).toBeVisible();
  expect(await state()).toEqual(['ended']);
});
