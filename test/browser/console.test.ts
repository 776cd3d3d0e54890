import { afterAll, beforeAll, describe, expect, it, onTestFinished } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { apiAs, baseUrl, launchBrowser, newContext, signIn } from '../support/browser';
import { joinVenue, leaveVenue } from '../support/venues';

// Expected states (nobody signed in yet, a page left while its requests run, a kiosk whose gallery
// has nothing published) are answered as states, so the browser's console stays free of errors and
// a real one stands out.
let browser: Browser;
// Many pages in a row, or several kiosk polls, on a machine shared with other suites.
const LONG = 240_000;

/** Every console error and uncaught exception the page produces from now on. */
function consoleErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(`${message.text()} (${message.location().url})`);
  });
  page.on('pageerror', (error) => errors.push(`uncaught: ${error.message}`));
  return errors;
}

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('the browser console has no errors', () => {
  it('on the sign-in page of someone not signed in', async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    const errors = consoleErrors(page);
    const refresh = page.waitForResponse((response) => response.url().endsWith('/api/auth/refresh'));
    await page.goto('/');
    expect((await refresh).status()).toBe(204);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    expect(errors).toEqual([]);
    await context.close();
  });

  it('on the main pages of a signed-in admin, left one after another without waiting for them', async () => {
    const context = await newContext(browser);
    const page = await context.newPage();
    const errors = consoleErrors(page);
    await signIn(page, 'admin@demo.test');
    for (const path of ['/stories', '/media', '/reviews', '/translations', '/releases', '/stations', '/fleet', '/insights', '/people', '/settings', '/notifications', '/audit']) {
      await page.goto(path);
      await page.locator('main h1').first().waitFor();
    }
    await page.waitForLoadState('networkidle');
    expect(errors).toEqual([]);
    await context.close();
  }, LONG);

  it('on a paired kiosk whose gallery has nothing published, poll after poll', async () => {
    const asAdmin = await apiAs('admin@demo.test');
    const suffix = Math.random().toString(36).slice(2, 7);
    const venue = await asAdmin<{ id: number }>('POST', '/venues', { name: `Quiet venue ${suffix}`, slug: `quiet-${suffix}`, sourceLocale: 'en', targetLocales: ['fr'], fallbackToSource: false });
    const gallery = await asAdmin<{ id: number }>('POST', '/galleries', { venueId: venue.id, name: 'Empty hall' });
    const station = await asAdmin<{ id: number }>('POST', '/stations', { galleryId: gallery.id, name: `Empty bench ${suffix}`, screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1100 });
    await joinVenue(asAdmin, 'technician@demo.test', venue.id, ['technician']);
    onTestFinished(() => leaveVenue(asAdmin, 'technician@demo.test', venue.id));
    const context = await browser.newContext({ baseURL: baseUrl, locale: 'en-GB', viewport: { width: 1920, height: 1080 }, hasTouch: true });
    const screen = await context.newPage();
    const errors = consoleErrors(screen);
    await screen.goto('/kiosk/?poll=1&heartbeat=1');
    const code = screen.locator('[data-pairing-code]');
    await code.waitFor();
    await (await apiAs('technician@demo.test'))('POST', `/stations/${station.id}/pair`, { pairingCode: await code.getAttribute('data-pairing-code') });
    const manifestPoll = () => screen.waitForResponse((response) => response.url().endsWith('/api/kiosk/manifest'), { timeout: 30_000 });
    for (let poll = 0; poll < 3; poll++) expect((await manifestPoll()).status()).toBe(204);
    expect(errors).toEqual([]);
    await context.close();
  }, LONG);
});
