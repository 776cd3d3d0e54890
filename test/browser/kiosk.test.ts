import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { baseUrl, launchBrowser } from '../support/browser';

// WCAG 2.2 §2.5.8 asks at least 24 × 24 CSS px; the kiosk's own floor is 44 × 44.
const KIOSK_MINIMUM_TARGET = 44;

let browser: Browser;
let page: Page;

beforeAll(async () => {
  browser = await launchBrowser();
  page = await browser.newPage({ viewport: { width: 1920, height: 1080 }, hasTouch: true });
});
afterAll(async () => {
  await browser?.close();
});

async function expectLargeTarget(name: RegExp) {
  const box = await page.getByRole('button', { name }).boundingBox();
  expect(box, `a button named ${name}`).not.toBeNull();
  expect(Math.min(box!.width, box!.height)).toBeGreaterThanOrEqual(KIOSK_MINIMUM_TARGET);
}

describe('kiosk attract screen', () => {
  it("shows the venue's name from the public venue endpoint", async () => {
    const venue = (await (await fetch(`${baseUrl}/api/kiosk/venue`)).json()) as { name: string };
    await page.goto(`${baseUrl}/kiosk/`);
    await page.getByText(venue.name, { exact: true }).waitFor();
    expect(await page.title()).toBe('Mantlepiece');
  });

  it('offers a large touch target and answers a touch honestly', async () => {
    await expectLargeTarget(/Touch to begin/);
    await page.getByRole('button', { name: /Touch to begin/ }).tap();
    await page.getByText(/not yet paired with a station/).waitFor();
    await expectLargeTarget(/Back/);
  });
});
