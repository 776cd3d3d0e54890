import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { baseUrl, launchBrowser } from '../support/browser';

let browser: Browser;
let page: Page;

beforeAll(async () => {
  browser = await launchBrowser();
  page = await browser.newPage({ viewport: { width: 1920, height: 1080 }, hasTouch: true });
});
afterAll(async () => {
  await browser?.close();
});

/** The demo venue's key: its install URL names it. */
const DEMO_VENUE_SLUG = 'basalt-point';

describe('kiosk before pairing', () => {
  it('shows the name of the venue its install URL names, from the public venue endpoint', async () => {
    const venue = (await (await fetch(`${baseUrl}/api/kiosk/venue?slug=${DEMO_VENUE_SLUG}`)).json()) as { name: string };
    await page.goto(`${baseUrl}/kiosk/?venue=${DEMO_VENUE_SLUG}`);
    await page.getByText(venue.name, { exact: true }).waitFor();
    expect(await page.title()).toBe('Mantlepiece');
  });

  it('says, while not paired, that its stories are on their way', async () => {
    await page.getByRole('heading', { level: 1, name: 'Stories are on their way' }).waitFor();
  });
});
