import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiAs, launchBrowser, newContext, signIn } from '../support/browser.js';
import { solidPng } from '../support/images.js';
import { screenshotsInEnglishAndArabic } from '../support/screenshots.js';

let browser: Browser;
let page: Page;
let asCurator: Awaited<ReturnType<typeof apiAs>>;
let storyId: number;
let panelIds: number[];
let mediaId: number;

const suffix = Date.now().toString(36);
const texts = ['Plates move.', 'Ridges push.', 'Slabs pull.'];
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });

const cards = () => page.getByRole('list', { name: 'Panels of this story' }).getByRole('button');
const toast = (text: string) => page.locator('.fui-Toast').filter({ hasText: text });

/** Switches the studio's language with the header's menu, as a person does (their account keeps it). */
async function chooseLanguage(name: string): Promise<void> {
  await page.getByRole('button', { name: /^(Language|Langue|Idioma|اللغة)/ }).click();
  await page.getByRole('menuitemradio', { name }).click();
  await eventually(() => page.getByRole('button', { name: /^(Language|Langue|Idioma|اللغة)/ }).textContent()).toBe(name);
}

beforeAll(async () => {
  asCurator = await apiAs('curator@demo.test');
  storyId = (await asCurator<{ id: number }>('POST', '/stories', { title: `Undo check ${suffix}`, audience: 'family' })).id;
  panelIds = [];
  for (const text of texts) {
    const doc = { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] };
    panelIds.push((await asCurator<{ id: number }>('POST', `/stories/${storyId}/panels`, { doc, wordBudget: 60 })).id);
  }
  const upload = new FormData();
  upload.append('file', new Blob([new Uint8Array(solidPng(64, 48, [Math.floor(Math.random() * 256), 140, 60]))], { type: 'image/png' }), `undo-${suffix}.png`);
  mediaId = (await asCurator<{ id: number }[]>('POST', '/media', upload))[0]!.id;
  browser = await launchBrowser();
  page = await (await newContext(browser)).newPage();
  await signIn(page, 'curator@demo.test');
});

afterAll(async () => {
  await browser?.close();
});

describe('deleting offers Undo for a while', () => {
  it('deletes panel 2, and Undo puts it back in its place', async () => {
    await page.goto(`/stories/${storyId}?panel=${panelIds[1]}`);
    await eventually(() => cards().count()).toBe(3);
    await page.getByRole('button', { name: 'Delete panel' }).first().click();
    await page.getByRole('alertdialog', { name: 'Delete panel 2?' }).getByRole('button', { name: 'Delete panel' }).click();
    await eventually(() => cards().count()).toBe(2);
    const offered = toast('Panel 2 deleted.');
    await offered.waitFor();
    await screenshotsInEnglishAndArabic(page, 'undo-panel');

    await offered.getByRole('button', { name: 'Undo' }).click();
    await toast('Restored.').waitFor();
    await eventually(() => cards().allTextContents()).toEqual(texts.map((text, index) => `Panel ${index + 1}${text}`));
    await page.reload();
    await eventually(() => cards().allTextContents()).toEqual(texts.map((text, index) => `Panel ${index + 1}${text}`));
  });

  it('words the Undo toast in the language the studio is switched to while it shows', async () => {
    await page.goto(`/stories/${storyId}?panel=${panelIds[2]}`);
    await eventually(() => cards().count()).toBe(3);
    await page.getByRole('button', { name: 'Delete panel' }).first().click();
    await page.getByRole('alertdialog', { name: 'Delete panel 3?' }).getByRole('button', { name: 'Delete panel' }).click();
    await toast('Panel 3 deleted.').waitFor();
    // The studio's own French and Spanish words (studio/src/app/i18n/locales/undo.*.ts).
    await chooseLanguage('Français');
    const offered = toast('Panneau 3 supprimé.');
    await offered.waitFor();
    expect(await toast('Panel 3 deleted.').count()).toBe(0);
    await chooseLanguage('Español');
    await toast('Panel 3 eliminado.').getByRole('button', { name: 'Deshacer' }).click();
    await toast('Restaurado.').waitFor();
    await chooseLanguage('English');
    await eventually(() => cards().count()).toBe(3);
  });

  it('deletes an image from its page, and Undo brings it back to the library', async () => {
    await page.goto(`/media/${mediaId}`);
    await page.getByRole('heading', { level: 1, name: `undo-${suffix}.png` }).waitFor();
    await page.getByRole('button', { name: 'Delete image' }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Delete', exact: true }).click();
    await page.waitForURL(/\/media$/);
    const offered = toast(`“undo-${suffix}.png” deleted.`);
    await offered.waitFor();
    await expect(asCurator('GET', `/media/${mediaId}`)).rejects.toThrow(/answered 404/);
    await screenshotsInEnglishAndArabic(page, 'undo-image');

    await offered.getByRole('button', { name: 'Undo' }).click();
    await toast('Restored.').waitFor();
    expect(await asCurator<{ id: number }>('GET', `/media/${mediaId}`)).toMatchObject({ id: mediaId });
    await page.getByRole('searchbox').first().fill(`undo-${suffix}`);
    await eventually(() => page.getByRole('link', { name: new RegExp(`undo-${suffix}`) }).count()).toBeGreaterThan(0);
  });
});
