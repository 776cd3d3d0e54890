import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { axeFindings } from '../support/axe.js';
import { apiAs, launchBrowser, newContext, signIn } from '../support/browser.js';
import { solidPng } from '../support/images.js';
import { screenshotsInEnglishAndArabic } from '../support/screenshots.js';

let browser: Browser;
let page: Page;
let storyId: number;

/** A word of this run's own, in a story title and an image's credit. */
const word = `Olivine${Date.now().toString(36)}`;
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });

const box = () => page.getByRole('searchbox', { name: 'Search stories, media and people' });
const results = () => page.locator('[data-search-results]');

beforeAll(async () => {
  const asCurator = await apiAs('curator@demo.test');
  storyId = (await asCurator<{ id: number }>('POST', '/stories', { title: `${word} and the mantle`, audience: 'family' })).id;
  const upload = new FormData();
  upload.append('file', new Blob([new Uint8Array(solidPng(64, 48, [90, 30, Math.floor(Math.random() * 256)]))], { type: 'image/png' }), `search-${word}.png`);
  const [image] = await asCurator<{ id: number }[]>('POST', '/media', upload);
  await asCurator('PATCH', `/media/${image!.id}`, { credit: `Photo: ${word} survey` });
  browser = await launchBrowser();
  page = await (await newContext(browser)).newPage();
  await signIn(page, 'curator@demo.test');
});

afterAll(async () => {
  await browser?.close();
});

describe('the studio’s search box', () => {
  it('lists what it finds grouped by kind, and the keyboard opens a hit', async () => {
    await box().fill(word.toLowerCase());
    await eventually(() => results().locator('[data-search-kind]').evaluateAll((groups) => groups.map((group) => group.getAttribute('data-search-kind')))).toEqual(['stories', 'media']);
    expect(await results().getByRole('region', { name: 'Stories' }).getByRole('link').allTextContents()).toEqual([`${word} and the mantle`]);
    expect(await results().getByRole('region', { name: 'Media' }).getByRole('link').first().textContent()).toBe(`search-${word}.pngPhoto: ${word} survey`);
    expect(await axeFindings(page), 'axe with the search results open').toEqual([]);
    // The box by its place, as its name changes with the language.
    await screenshotsInEnglishAndArabic(page, 'global-search', async () => {
      await page.locator('[role="search"] input').fill(word.toLowerCase());
      await results().locator('[data-search-kind]').first().waitFor();
    });

    await box().press('ArrowDown');
    await eventually(() => page.evaluate(() => document.activeElement?.textContent)).toBe(`${word} and the mantle`);
    await page.keyboard.press('ArrowDown');
    await eventually(() => page.evaluate(() => document.activeElement?.textContent)).toContain(`search-${word}.png`);
    await page.keyboard.press('ArrowUp');
    await page.keyboard.press('Enter');
    await page.waitForURL(new RegExp(`/stories/${storyId}$`));
    expect(await results().count()).toBe(0);
  });

  it('says nothing was found for a word no story, image or person has', async () => {
    const nothing = `${word}zzq`;
    // From a page that takes no focus of its own (the editor the last test opened does).
    await page.goto('/media');
    await box().fill(nothing);
    const said = results().getByRole('status');
    await eventually(() => said.textContent()).toBe(`Nothing found for “${nothing}”.`);
    expect(await results().locator('[data-search-kind]').count()).toBe(0);
    expect(await axeFindings(page), 'axe with “Nothing found” showing').toEqual([]);
    await box().press('Escape');
  });

  it('asks for two characters before it searches', async () => {
    await box().fill('x');
    await results().getByText('Type 2 characters or more.').waitFor();
  });
});
