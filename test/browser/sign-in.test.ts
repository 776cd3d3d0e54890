import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchBrowser, newContext, signIn, submitSignIn } from '../support/browser';

// The studio's role → area table, as a visitor of each demo account should see it (brief: "Studio areas").
const ALL_AREAS = ['Stories', 'Media', 'Reviews', 'Translations', 'Releases', 'Fleet', 'Insights', 'People', 'Settings'];
const AREAS_BY_ACCOUNT: Record<string, string[]> = {
  'admin@demo.test': ALL_AREAS,
  'curator@demo.test': ['Stories', 'Media', 'Reviews', 'Insights'],
  'educator@demo.test': ['Reviews', 'Stories', 'Insights'],
  'translator@demo.test': ['Translations'],
  'technician@demo.test': ['Releases', 'Fleet', 'Insights'],
};

let browser: Browser;
let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});
beforeEach(async () => {
  context = await newContext(browser);
  page = await context.newPage();
});
afterEach(async () => {
  await context?.close();
});

/**
 * The studio areas in the navigation, in order (other links, such as Home, are left out). The areas
 * of a venue's roles follow once the venue list has come, a moment after the navigation: poll this.
 */
async function areaLinks(): Promise<string[]> {
  const names = await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link').allInnerTexts();
  return names.map((name) => name.trim()).filter((name) => ALL_AREAS.includes(name));
}

describe('signing in to the studio', () => {
  it.each(Object.entries(AREAS_BY_ACCOUNT))('%s sees exactly the areas of that role', async (email, expected) => {
    await signIn(page, email);
    await expect.poll(areaLinks, { message: `${email}'s areas` }).toEqual(expected);
    const hidden = ALL_AREAS.filter((area) => !expected.includes(area));
    for (const area of hidden) {
      expect(await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: area, exact: true }).count(), `${email} must not see ${area}`).toBe(0);
    }
  });

  it('refuses a wrong password and says so without telling which part was wrong', async () => {
    await submitSignIn(page, 'curator@demo.test', 'not-the-password');
    const alert = page.locator('.fui-MessageBar');
    await alert.waitFor();
    expect(await alert.innerText()).toContain('Email or password is incorrect.');
    expect(new URL(page.url()).pathname).toBe('/sign-in');
  });

  it('keeps the person signed in across a page reload (the refresh cookie restores the session)', async () => {
    await signIn(page, 'technician@demo.test');
    await page.reload();
    await expect.poll(areaLinks).toEqual(AREAS_BY_ACCOUNT['technician@demo.test']);
  });

  it('signs out and then asks to sign in again for a studio page', async () => {
    await signIn(page, 'educator@demo.test');
    await page.getByRole('button', { name: /^Account/ }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.goto('/reviews');
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
  });

  it('lists the demo accounts on the admin People page, from the server', async () => {
    await signIn(page, 'admin@demo.test');
    await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'People', exact: true }).click();
    const table = page.getByRole('table', { name: 'People' });
    await table.waitFor();
    expect(await table.getByRole('cell', { name: 'translator@demo.test' }).count()).toBe(1);
  });
});
