import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import type { VenueView } from '@mantlepiece/shared';
import { apiAs, atRest, launchBrowser, newContext, signIn } from '../support/browser';

let browser: Browser;
let api: Awaited<ReturnType<typeof apiAs>>;
let venue: VenueView;
const shots = process.env.SCREENSHOT_DIR;

beforeAll(async () => {
  api = await apiAs('admin@demo.test');
  // A venue of this suite's own: the demo venue's clock stays as other suites expect it.
  const suffix = Math.random().toString(36).slice(2, 8);
  venue = await api<VenueView>('POST', '/venues', { name: `Ammonite Annex ${suffix}`, slug: `clockwork-${suffix}`, sourceLocale: 'en', targetLocales: [], timeZone: 'UTC' });
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  if (venue) await api('DELETE', `/venues/${venue.id}`);
});

/** The venue's edit dialog; its name sorts it onto the list's first page. */
async function editVenueDialog(page: Page, editLabel: string) {
  await page.goto('/settings?tab=venues');
  await page.getByRole('button', { name: editLabel }).click();
  return page.getByRole('dialog');
}

describe("a venue's time zone in Settings", () => {
  it('is chosen by searching the zones, each shown with its offset now, and saved as its IANA name', async () => {
    const page = await (await newContext(browser)).newPage();
    await signIn(page, 'admin@demo.test');
    const dialog = await editVenueDialog(page, `Edit ${venue.name}`);
    const zone = dialog.getByRole('combobox', { name: 'Time zone' });
    await expect.poll(() => zone.inputValue()).toBe('UTC (UTC+00:00)');
    await zone.fill('');
    await zone.pressSequentially('kiritimati');
    // Kiritimati keeps UTC+14 all year (tz database, `australasia`): its offset does not hang on the date the test runs.
    const options = page.getByRole('listbox').getByRole('option');
    await expect.poll(() => options.allTextContents()).toEqual(['Pacific/KiritimatiUTC+14:00']);
    const option = options.first();
    if (shots) {
      await mkdir(shots, { recursive: true });
      await atRest(page);
      await page.screenshot({ path: join(shots, 'venue-time-zone.png') });
    }
    await option.click();
    await dialog.getByRole('button', { name: 'Save' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByRole('cell', { name: 'Pacific/Kiritimati' }).waitFor();
    expect((await api<VenueView>('GET', `/venues/${venue.id}`)).timeZone).toBe('Pacific/Kiritimati');
    await page.context().close();
  });
});
