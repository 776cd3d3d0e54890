import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import type { GalleryView, Page as ListPage, StationView } from '@mantlepiece/shared';
import { apiAs, baseUrl, launchBrowser, signIn } from '../support/browser';
import { publishedRelease } from '../support/releases';
import { touchDrag } from '../support/touch';

// The seeded demo (server/src/seed): its Sinking Slabs story shows sea floor 100 Myr old (plate
// model) on panel 2 and a 100 Myr plate with a 700 km slab dipping at 60° on panel 3.
const GALLERY = 'Moving Plates Hall';
const STORY = 'Sinking Slabs';
const KIOSK_PATH = '/kiosk/?poll=1&heartbeat=1';
const tag = `plates-${Date.now().toString(36)}`;
/** Touch targets well above WCAG 2.2's 24 px minimum: the kiosk's own rule for widget controls. */
const SMALLEST_TARGET_PX = 64;

let browser: Browser;
let technician: Awaited<ReturnType<typeof apiAs>>;
let admin: Awaited<ReturnType<typeof apiAs>>;
let station: StationView | undefined;
let kioskId: number | undefined;

/** A point of a drawing given in its viewBox units (both widgets draw in 480 × 330). */
async function pointOf(drawing: Locator, x: number, y: number) {
  const box = (await drawing.boundingBox())!;
  return { x: box.x + (x / 480) * box.width, y: box.y + (y / 330) * box.height };
}

const valueOf = async (slider: Locator) => Number(await slider.getAttribute('aria-valuenow'));

/** Set SCREENSHOT_DIR to keep a picture of each widget as the test leaves it. */
async function picture(page: Page, name: string) {
  if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: join(process.env.SCREENSHOT_DIR, `${name}.png`) });
}

beforeAll(async () => {
  browser = await launchBrowser();
  admin = await apiAs('admin@demo.test');
  technician = await apiAs('technician@demo.test');
});

afterAll(async () => {
  await browser?.close();
  if (kioskId !== undefined) await technician('POST', `/kiosks/${kioskId}/revoke`).catch(() => undefined);
  if (station) await admin('DELETE', `/stations/${station.id}`).catch(() => undefined);
});

describe('the sea-floor depth and plate-forces widgets in the studio', () => {
  let page: Page;

  beforeAll(async () => {
    page = await (await browser.newContext({ baseURL: baseUrl, locale: 'en-GB', viewport: { width: 1440, height: 900 }, hasTouch: true })).newPage();
    await signIn(page, 'curator@demo.test');
    await page.goto('/widgets');
    await page.getByRole('heading', { level: 1, name: 'Widget workbench' }).waitFor();
  });

  it('draws the sea floor, shows its model card, and follows a finger dragged to older floor', async () => {
    await page.getByRole('tab', { name: 'Sea-floor depth', exact: true }).tap();
    const slider = page.getByRole('slider', { name: 'Sea-floor depth: Age of the sea floor' });
    await expect.poll(() => valueOf(slider)).toBe(50);
    const card = page.locator('[data-model-card-of="sea-floor-depth"]');
    await card.getByText(/Stein, C\. A\. and Stein, S\. \(1992\)/).waitFor();
    expect(await card.locator('[data-model-card="equations"] code').first().textContent()).toBe('d = d_ridge + 2ρm·αv·ΔT / (ρm − ρw) · √(κt / π)');
    // Age runs from x = 56 (0 Myr) to x = 464 (200 Myr): 50 Myr at x = 158, 150 Myr at x = 362.
    await touchDrag(page, await pointOf(slider, 158, 120), await pointOf(slider, 362, 120));
    await expect.poll(() => valueOf(slider)).toBe(150);
    // GDH1 at 150 Myr: 5651 − 2473·e^(−4.17) = 5612.8 m (Stein and Stein 1992).
    await expect.poll(() => page.locator('[data-readout="depth"]').textContent()).toBe('5.61\u00a0km');
    expect(await page.getByTestId('widget-description').textContent()).toContain('Sea floor 150 million years old');
    // Taps on the steppers move the age 5 Myr at a time; each tap is waited for before the next.
    await page.getByRole('button', { name: 'Age of the sea floor: Younger' }).tap();
    await expect.poll(() => valueOf(slider)).toBe(145);
    await page.getByRole('button', { name: 'Age of the sea floor: Older' }).tap();
    await expect.poll(() => valueOf(slider)).toBe(150);
    await picture(page, 'studio-sea-floor-depth');
  });

  it('draws both plate forces and lets ridge push win when taps shorten the slab', async () => {
    await page.getByRole('tab', { name: 'Plate forces', exact: true }).tap();
    const status = page.locator('.mp-plate-forces [role="status"]');
    await expect.poll(() => status.getAttribute('data-state')).toBe('slab-pull-dominates');
    await page.locator('[data-model-card-of="plate-forces"]').getByText(/Forsyth, D\. and Uyeda, S\. \(1975\)/).waitFor();
    // At 100 Myr ridge push beats the pull of a slab shorter than about 52 km: seven taps take 700 km to 0.
    const slider = page.getByRole('slider', { name: 'Plate forces: Length of the sinking slab' });
    await expect.poll(() => valueOf(slider)).toBe(700);
    const shorter = page.getByRole('button', { name: 'Length of the sinking slab: Less' });
    // Each tap is waited for before the next, so none lands while the last one still renders.
    for (let km = 600; km >= 0; km -= 100) {
      await shorter.tap();
      await expect.poll(() => valueOf(slider)).toBe(km);
    }
    await expect.poll(() => status.getAttribute('data-state')).toBe('ridge-push-dominates');
    expect(await shorter.isDisabled()).toBe(true);
    await picture(page, 'studio-plate-forces');
  });
});

describe('the sea-floor depth and plate-forces widgets on a kiosk', () => {
  let screen: Page;

  beforeAll(async () => {
    const gallery = (await admin<ListPage<GalleryView>>('GET', '/galleries?pageSize=100')).items.find((candidate) => candidate.name === GALLERY)!;
    await publishedRelease(technician, gallery.id);
    station = await admin<StationView>('POST', '/stations', { galleryId: gallery.id, name: `Slab table ${tag}`, screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1100 });
    const context = await browser.newContext({ baseURL: baseUrl, locale: 'en-GB', viewport: { width: 1920, height: 1080 }, hasTouch: true });
    screen = await context.newPage();
    await screen.goto(KIOSK_PATH);
    const code = (await screen.locator('[data-pairing-code]').getAttribute('data-pairing-code'))!;
    kioskId = (await technician<{ kioskId: number }>('POST', `/stations/${station.id}/pair`, { pairingCode: code })).kioskId;
    await screen.getByRole('button', { name: /Touch to begin/ }).waitFor({ timeout: 60_000 });
    await screen.getByRole('button', { name: /Touch to begin/ }).tap();
    await screen.getByRole('button', { name: new RegExp(STORY) }).tap();
    await screen.getByRole('heading', { name: 'Old plates sink' }).waitFor();
    await screen.getByRole('button', { name: 'Next' }).tap();
  }, 180_000);

  it('sinks the sea floor deeper as a finger drags it older', async () => {
    const slider = screen.getByRole('slider', { name: 'Sea-floor depth: Age of the sea floor' });
    await expect.poll(() => valueOf(slider)).toBe(100);
    // GDH1 at 100 Myr: 5651 − 2473·e^(−2.78) = 5497.6 m, which the caption's live value rounds to 5,500 m.
    await expect.poll(() => screen.locator('.mp-sea-floor-depth [data-readout="depth"]').textContent()).toBe('5.5\u00a0km');
    await touchDrag(screen, await pointOf(slider, 260, 120), await pointOf(slider, 362, 120));
    await expect.poll(() => valueOf(slider)).toBe(150);
    await expect.poll(() => screen.locator('.mp-sea-floor-depth [data-readout="depth"]').textContent()).toBe('5.61\u00a0km');
    await picture(screen, 'kiosk-sea-floor-depth');
  });

  it('gives the age buttons touch-sized targets that grow with Larger text', async () => {
    const older = screen.getByRole('button', { name: 'Age of the sea floor: Older' });
    const before = (await older.boundingBox())!;
    expect(Math.min(before.width, before.height)).toBeGreaterThanOrEqual(SMALLEST_TARGET_PX);
    const slider = screen.getByRole('slider', { name: 'Sea-floor depth: Age of the sea floor' });
    const age = await valueOf(slider);
    await older.tap();
    await expect.poll(() => valueOf(slider)).toBe(age + 5);
    await screen.getByRole('switch', { name: 'Larger text' }).tap();
    await expect.poll(async () => (await older.boundingBox())!.width).toBeGreaterThan(before.width);
    await picture(screen, 'kiosk-sea-floor-depth-larger-text');
    await screen.getByRole('switch', { name: 'Larger text' }).tap();
    await expect.poll(() => screen.locator('.player').getAttribute('data-large-text')).toBeNull();
  });

  it('lets a finger drag the slab short until ridge push wins, and a tap lengthen it again', async () => {
    await screen.getByRole('button', { name: 'Next' }).tap();
    const slider = screen.getByRole('slider', { name: 'Plate forces: Length of the sinking slab' });
    const status = screen.locator('.mp-plate-forces [role="status"]');
    await expect.poll(() => status.getAttribute('data-state')).toBe('slab-pull-dominates');
    // The slab starts at the trench (250, 62) and dips at 60°; 700 km is drawn 54.6 units long, its tip near (277, 109).
    await touchDrag(screen, await pointOf(slider, 277, 109), await pointOf(slider, 250, 62));
    await expect.poll(() => valueOf(slider)).toBeLessThan(50);
    await expect.poll(() => status.getAttribute('data-state')).toBe('ridge-push-dominates');
    const longer = screen.getByRole('button', { name: 'Length of the sinking slab: More' });
    const target = (await longer.boundingBox())!;
    expect(Math.min(target.width, target.height)).toBeGreaterThanOrEqual(SMALLEST_TARGET_PX);
    const length = await valueOf(slider);
    await longer.tap();
    await expect.poll(() => valueOf(slider)).toBe(Math.round((length + 100) / 10) * 10);
    await expect.poll(() => status.getAttribute('data-state')).toBe('slab-pull-dominates');
    await picture(screen, 'kiosk-plate-forces');
  });
});
