import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page as ListPage, StoryView } from '@mantlepiece/shared';
import { apiAs, launchBrowser, newContext, signIn } from '../support/browser.js';

/**
 * The demo's two venues: Basalt Point (the demo exhibit's three stories) and Cinder Hollow (one
 * story of its own). The demo educator works at both; the demo curator at Basalt Point only.
 */
const FIRST = { venue: 'Basalt Point Earth Science Centre', story: 'Sinking Slabs' };
const SECOND = { venue: 'Cinder Hollow Volcano House', story: 'Volcanoes Along the Plate Edges' };

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const storiesPage = async (page: Page) => {
  await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Stories' }).click();
  await page.getByRole('heading', { level: 1, name: 'Stories' }).waitFor();
};
const storyLink = (page: Page, title: string) => page.getByRole('table', { name: 'Stories' }).getByRole('link', { name: title, exact: true });
/** Other suites add stories to the demo venue, so a story is looked for by title, not on page 1. */
const searchTitles = async (page: Page, title: string) => {
  await page.getByRole('search').getByRole('searchbox', { name: 'Search titles' }).fill(title);
  await page.waitForURL((url) => url.searchParams.get('q') === title);
};
/** The story is listed when its title is searched, and the other one is not, searched likewise. */
const listsOnly = async (page: Page, shown: string, hidden: string) => {
  await searchTitles(page, shown);
  await storyLink(page, shown).waitFor();
  await searchTitles(page, hidden);
  await page.getByText('No story matches these filters').waitFor();
  expect(await storyLink(page, hidden).count()).toBe(0);
};
const switcher = (page: Page) => page.getByRole('banner').getByRole('button', { name: /^Venue: / });

describe('the venue switcher', () => {
  it('lets a person of two venues switch between them, each showing only its own stories, and remembers the choice', async () => {
    const page = await (await newContext(browser)).newPage();
    await signIn(page, 'educator@demo.test');
    await storiesPage(page);
    await expect.poll(() => switcher(page).getAttribute('aria-label')).toBe(`Venue: ${FIRST.venue}`);
    await listsOnly(page, FIRST.story, SECOND.story);

    await switcher(page).click();
    await page.getByRole('menuitemradio', { name: SECOND.venue }).click();
    await expect.poll(() => switcher(page).getAttribute('aria-label')).toBe(`Venue: ${SECOND.venue}`);
    await listsOnly(page, SECOND.story, FIRST.story);

    await page.reload();
    await searchTitles(page, SECOND.story);
    await storyLink(page, SECOND.story).waitFor();
    expect(await switcher(page).getAttribute('aria-label')).toBe(`Venue: ${SECOND.venue}`);
    await page.context().close();
  });

  it('shows a curator of one venue no switcher, and never the other venue\'s story, not even at its address', async () => {
    const page = await (await newContext(browser)).newPage();
    await signIn(page, 'curator@demo.test');
    await storiesPage(page);
    await listsOnly(page, FIRST.story, SECOND.story);
    expect(await page.getByRole('banner').getByRole('button', { name: /^Venue: / }).count()).toBe(0);

    const asSecondCurator = await apiAs('curator2@demo.test');
    const found = await asSecondCurator<ListPage<StoryView>>('GET', `/stories?q=${encodeURIComponent(SECOND.story)}`);
    const story = found.items.find((item) => item.title === SECOND.story)!;
    await page.goto(`/stories/${story.id}`);
    await page.getByRole('heading', { name: 'Story not found' }).waitFor();
    expect(await page.getByText(SECOND.story).count()).toBe(0);
    await page.context().close();
  });
});
