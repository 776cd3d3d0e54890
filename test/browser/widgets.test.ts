import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newContext, signIn } from '../support/browser.js';

let browser: Browser;
let page: Page;

beforeAll(async () => {
  browser = await launchBrowser();
  page = await (await newContext(browser)).newPage();
  await signIn(page, 'curator@demo.test');
  await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Widget workbench' }).click();
  await page.getByRole('heading', { level: 1, name: 'Widget workbench' }).waitFor();
});
afterAll(() => browser?.close());

describe('widget workbench', () => {
  it('offers every widget, with the simplified-model caution', async () => {
    // Fluent's Tab repeats its label in a hidden element that reserves the bold width, so the tabs are
    // read by accessible name, as a screen reader would.
    await expect.poll(() => page.getByRole('tab').count()).toBe(4);
    await expect(page.getByRole('tab', { name: 'Slope force box', exact: true }).count()).resolves.toBe(1);
    await expect(page.getByRole('tab', { name: 'Convection cell', exact: true }).count()).resolves.toBe(1);
    expect(await page.getByRole('note').first().textContent()).toMatch(/^Simplified teaching model/);
  });

  it('switches the slope force box from "Holds" to "Slides" when the slope is dragged past arctan 0.85 ≈ 40.4° (Byerlee 1978)', async () => {
    await page.getByRole('tab', { name: 'Slope force box' }).click();
    const slider = page.getByRole('slider', { name: 'Slope force box: Slope angle' });
    const status = page.getByRole('status').filter({ hasText: /Holds|Slides/ });
    await expect.poll(() => status.textContent()).toMatch(/^■Holds/);
    const box = (await slider.boundingBox())!;
    // The drawing is 480 × 360 with the slope's hinge at (56, 292) and its 250-unit board's free end at 30°, (272.5, 167).
    const at = (x: number, y: number) => [box.x + (x / 480) * box.width, box.y + (y / 360) * box.height] as const;
    await page.mouse.move(...at(272.5, 167));
    await page.mouse.down();
    // 74 units right of the hinge and 262 above it: a tilt of about 74°.
    await page.mouse.move(...at(130, 30), { steps: 12 });
    await page.mouse.up();
    await expect.poll(async () => Number(await slider.getAttribute('aria-valuenow'))).toBeGreaterThan(40.4);
    await expect.poll(() => status.textContent()).toMatch(/^↘Slides/);
    expect(await page.getByTestId('widget-description').textContent()).toContain('so the block slides');
  });

  it('keeps the convection cell’s frames coming from its worker, time moving on between reads', async () => {
    await page.getByRole('tab', { name: 'Convection cell' }).click();
    const picture = page.getByRole('img', { name: 'Convection cell' });
    await picture.waitFor();
    const time = page.locator('[data-readout="time"]');
    const frames = async () => Number((await picture.getAttribute('data-frames')) ?? 0);
    await expect.poll(frames).toBeGreaterThan(0);
    const firstFrames = await frames();
    const firstTime = Number(await time.textContent());
    await expect.poll(frames).toBeGreaterThan(firstFrames);
    await expect.poll(async () => Number(await time.textContent())).toBeGreaterThan(firstTime);
    expect(Number(await page.locator('[data-readout="nusselt"]').textContent())).toBeGreaterThan(0);
  });
});
