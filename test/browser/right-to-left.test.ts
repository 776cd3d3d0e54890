import type { Page as ListPage, UserView, VenueView } from '@mantlepiece/shared';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiAs, launchBrowser, newContext, signIn } from '../support/browser.js';

let browser: Browser;
let page: Page;
let admin: Awaited<ReturnType<typeof apiAs>>;
let venue: VenueView;
let translator: UserView;

/** The demo translator's languages at the demo venue, as the seed gives them. */
const demoLocales = () => translator.memberships.find((membership) => membership.venueId === venue.id)?.locales ?? [];

/** Waits for a state the page reaches by itself, without a fixed sleep. */
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });

// The demo venue translates into French and Spanish only; Arabic is added for this file and taken away after.
beforeAll(async () => {
  admin = await apiAs('admin@demo.test');
  venue = (await admin<ListPage<VenueView>>('GET', '/venues?pageSize=100')).items.find((candidate) => candidate.slug === 'basalt-point')!;
  translator = (await admin<ListPage<UserView>>('GET', '/users?q=translator@demo.test')).items[0]!;
  await admin('PATCH', `/venues/${venue.id}`, { targetLocales: [...venue.targetLocales, 'ar'] });
  // The demo translator translates at the demo venue through a membership there: Arabic joins its languages.
  await admin('PUT', `/users/${translator.id}/memberships/${venue.id}`, { roles: ['translator'], locales: [...demoLocales(), 'ar'] });
  browser = await launchBrowser();
  page = await (await newContext(browser)).newPage();
  await signIn(page, 'translator@demo.test');
});

afterAll(async () => {
  await browser?.close();
  // Choosing a language in the menu saves it to the account: the demo translator reads English again.
  const asTranslator = await apiAs('translator@demo.test');
  await asTranslator('PATCH', '/auth/me', { uiLanguage: 'en' });
  await admin('PUT', `/users/${translator.id}/memberships/${venue.id}`, { roles: ['translator'], locales: demoLocales() });
  await admin('PATCH', `/venues/${venue.id}`, { targetLocales: venue.targetLocales });
});

describe('the studio in Arabic', () => {
  it('turns the whole page right to left when the translator chooses العربية from the language menu', async () => {
    await page.getByRole('button', { name: 'Language: English' }).click();
    await page.getByRole('menuitemradio', { name: 'العربية' }).click();
    await eventually(() => page.evaluate(() => [document.documentElement.lang, document.documentElement.dir])).toEqual(['ar', 'rtl']);
    expect(await page.locator('.fui-FluentProvider').first().getAttribute('dir')).toBe('rtl');
    await page.getByRole('navigation', { name: 'أقسام الاستوديو' }).waitFor();
  });

  it('mirrors the layout: the navigation sits on the right of the page', async () => {
    const navigation = await page.getByRole('navigation', { name: 'أقسام الاستوديو' }).boundingBox();
    const width = page.viewportSize()!.width;
    expect(navigation, 'navigation box').not.toBeNull();
    expect(navigation!.x + navigation!.width, 'right edge of the navigation').toBeGreaterThan(width - 10);
    expect(navigation!.x, 'left edge of the navigation').toBeGreaterThan(width / 2);
  });

  it('saves the choice to the account, so the next sign-in is in Arabic too', async () => {
    const asTranslator = await apiAs('translator@demo.test');
    await eventually(async () => (await asTranslator<UserView>('GET', '/auth/me')).uiLanguage).toBe('ar');
  });

  it('draws an Arabic panel preview right to left in the translator’s workspace', async () => {
    await page.getByRole('navigation', { name: 'أقسام الاستوديو' }).getByRole('link', { name: 'الترجمات' }).click();
    await page.getByRole('heading', { level: 1, name: 'الترجمات' }).waitFor();
    await page.locator('[data-worklist-locale="ar"]').first().getByRole('link').first().click();
    // A unit of panel 1: the story's title, a unit too, is listed first and has no panel.
    await page.locator('[data-unit-row]').filter({ has: page.locator('td:first-child', { hasText: /^1$/ }) }).first().locator('button').click();
    const preview = page.locator('[data-translation-preview="ar"]');
    await eventually(() => preview.locator('article.mp-panel').getAttribute('dir')).toBe('rtl');
    expect(await preview.getAttribute('data-dir')).toBe('rtl');
    await page.getByText('من اليمين إلى اليسار، بتخطيط معكوس').waitFor();
  });
});
