import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, newContext, signIn } from '../support/browser';

// The seeded demo (server/src/seed): a Live release, a demo kiosk at its own station, thirty days of invented visits.
const GALLERY = 'Moving Plates Hall';
const DEMO_STATION = 'Plate Map Wall';
// Each role's lists on the home page, by the heading the studio gives them.
const LISTS: Record<string, string[]> = {
  'curator@demo.test': ['Your drafts', 'Changes requested on your stories', 'Open comments on your stories'],
  'educator@demo.test': ['Waiting for your review'],
  'translator@demo.test': ['Texts to translate'],
  'technician@demo.test': ['Kiosks late or offline', 'Releases ready or failed'],
  'admin@demo.test': ['Invitations not yet accepted', 'Licences ending within 60 days'],
};

let browser: Browser;
// Set SCREENSHOT_DIR to keep a picture of each page this suite visits, for a person to look at.
const shots = process.env.SCREENSHOT_DIR;
const shoot = async (page: Page, name: string) => {
  if (shots) await page.screenshot({ path: join(shots, `${name}.png`), fullPage: true });
};

async function pageAs(email: string): Promise<Page> {
  const page = await (await newContext(browser)).newPage();
  await signIn(page, email);
  return page;
}

beforeAll(async () => {
  if (shots) await mkdir(shots, { recursive: true });
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('a first start shows the whole job', () => {
  it.each(Object.entries(LISTS))('shows %s the work waiting for them on the home page, each item a link to where it is done', async (email, headings) => {
    const page = await pageAs(email);
    for (const heading of headings) {
      const list = page.getByRole('region', { name: new RegExp(`^${heading}`) });
      await list.waitFor();
      const count = Number(await list.locator('[data-count]').getAttribute('data-count'));
      const links = list.getByRole('listitem').getByRole('link');
      expect(await links.count()).toBe(Math.min(count, 10));
      if (count === 0) await list.getByText('Nothing waiting.').waitFor();
    }
    await shoot(page, `home-${email.split('@')[0]}`);
    const first = page.locator('[data-work-list] li a').first();
    if (await first.count()) {
      const target = await first.getAttribute('href');
      await first.click();
      await page.waitForURL((url) => `${url.pathname}${url.search}` === target);
    }
    await page.context().close();
  });

  it('has a release Live and a demo kiosk, marked as demo, on the Fleet page with its heartbeat history', async () => {
    const page = await pageAs('technician@demo.test');
    await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Fleet' }).click();
    await page.getByRole('heading', { level: 1, name: 'Fleet' }).waitFor();
    const row = page.getByRole('row').filter({ hasText: DEMO_STATION });
    await row.locator('[data-demo]').waitFor();
    await row.getByText(/^Release \d+$/).waitFor();
    await shoot(page, 'fleet');
    await row.getByRole('link', { name: DEMO_STATION }).click();
    await page.getByRole('heading', { level: 1, name: `Kiosk at ${DEMO_STATION}` }).waitFor();
    await page.getByText(/Invented for the demo venue/).waitFor();
    const history = page.getByRole('table', { name: 'Heartbeat history' });
    await history.waitFor();
    expect(await history.getByRole('row').count()).toBeGreaterThan(10);
    await shoot(page, 'fleet-kiosk');
    await page.context().close();
  });

  it('has thirty days of visits on the Insights page, said to be invented', async () => {
    const page = await pageAs('technician@demo.test');
    await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Insights' }).click();
    await page.getByRole('heading', { level: 1, name: 'Insights' }).waitFor();
    await page.getByLabel('Gallery').selectOption({ label: GALLERY });
    await page.getByText(/of these events (is|are) invented demo visits? from the demo kiosk/).waitFor();
    const stories = page.getByRole('table', { name: 'Stories by opens' });
    await stories.waitFor();
    expect(await stories.getByRole('row').count()).toBeGreaterThan(1);
    await page.getByRole('img', { name: 'Opens per story' }).waitFor();
    await shoot(page, 'insights');
    await page.context().close();
  });
});
