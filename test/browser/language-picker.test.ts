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
  // A venue of this suite's own, named to sort first, so the demo venue's languages stay as other suites expect them.
  const suffix = Math.random().toString(36).slice(2, 8);
  venue = await api<VenueView>('POST', '/venues', { name: `Aa Lava Tube ${suffix}`, slug: `tongues-${suffix}`, sourceLocale: 'en', targetLocales: ['fr'], timeZone: 'UTC' });
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  if (venue) await api('DELETE', `/venues/${venue.id}`);
});

/** The texts of the options in the list a combobox opened (the chosen-language tags are options of a list of their own). */
async function optionTexts(page: Page, box: ReturnType<Page['getByRole']>): Promise<string[]> {
  const list = await box.getAttribute('aria-controls');
  return list ? page.locator(`[id="${list}"]`).getByRole('option').allTextContents() : [];
}

const shoot = async (page: Page, name: string) => {
  if (!shots) return;
  await mkdir(shots, { recursive: true });
  await atRest(page);
  await page.screenshot({ path: join(shots, `${name}.png`) });
};

describe('languages are picked by name', () => {
  it('sets a venue’s languages by searching their names, and stores canonical BCP 47 tags', async () => {
    const page = await (await newContext(browser)).newPage();
    await signIn(page, 'admin@demo.test');
    await page.goto('/settings?tab=venues');
    await page.getByRole('button', { name: `Edit ${venue.name}` }).click();
    const dialog = page.getByRole('dialog');

    // Names as CLDR gives them through Intl.DisplayNames in English: en-GB is "British English", pt-BR "Brazilian Portuguese".
    const source = dialog.getByRole('combobox', { name: 'Source language' });
    await expect.poll(() => source.inputValue()).toBe('English (en)');
    await source.fill('');
    await source.pressSequentially('british');
    await expect.poll(() => optionTexts(page, source)).toEqual(['British English en-GB']);
    await page.getByRole('option', { name: 'British English en-GB' }).click();
    await expect.poll(() => source.inputValue()).toBe('British English (en-GB)');

    const targets = dialog.getByRole('combobox', { name: 'Translated into' });
    // A language found by its own name, typed in its own script ("العربية", CLDR's name of Arabic in Arabic).
    await targets.pressSequentially('عرب');
    await expect.poll(() => optionTexts(page, targets)).toEqual(expect.arrayContaining(['Arabic ar']));
    await targets.fill('');
    await targets.pressSequentially('portug');
    await expect.poll(() => optionTexts(page, targets)).toEqual(expect.arrayContaining(['Brazilian Portuguese pt-BR', 'Portuguese pt']));
    await shoot(page, 'language-picker');
    await page.getByRole('option', { name: 'Brazilian Portuguese pt-BR' }).click();
    const chosen = dialog.getByRole('listbox', { name: 'Chosen languages' }).getByRole('option');
    await expect.poll(() => chosen.allTextContents()).toEqual(['French', 'Brazilian Portuguese']);

    await dialog.getByRole('button', { name: 'Save' }).click();
    await dialog.waitFor({ state: 'detached' });
    const saved = await api<VenueView>('GET', `/venues/${venue.id}`);
    expect({ sourceLocale: saved.sourceLocale, targetLocales: saved.targetLocales }).toEqual({ sourceLocale: 'en-GB', targetLocales: ['fr', 'pt-BR'] });
    await page.context().close();
  });
});
