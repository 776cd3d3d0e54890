import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ReleaseView } from '@mantlepiece/shared';
import { axeFindings } from '../support/axe';
import { apiAs, launchBrowser, newContext, signIn } from '../support/browser';
import { joinVenue, leaveVenue } from '../support/venues';

// A venue of the test's own, translated into French and never showing English in its place, with
// two approved stories: one translated throughout, one not at all.
const suffix = Date.now().toString(36);
const VENUE = `Strict venue ${suffix}`;
const GALLERY = 'Trench hall';
const TRANSLATED = `Cooling plates ${suffix}`;
const UNTRANSLATED = `Hot spots ${suffix}`;
const STAFF = [
  ['curator@demo.test', ['curator'], []], ['educator@demo.test', ['educator'], []], ['translator@demo.test', ['translator'], ['fr']], ['technician@demo.test', ['technician'], []],
] as const;
// The Build release button in each studio language (studio/src/app/i18n/locales/release.*.ts), for the screenshots.
const BUILD_RELEASE = { en: 'Build release', fr: 'Construire une version', es: 'Construir publicación', ar: 'بناء إصدار' } as const;
type Language = keyof typeof BUILD_RELEASE;
const LANGUAGES = Object.keys(BUILD_RELEASE) as Language[];

let browser: Browser;
let page: Page;
let venueId: number;
let galleryId: number;
let untranslatedId: number;
let translatedId: number;

const paragraph = (text: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });

async function approvedStory(exhibitId: number, title: string, text: string): Promise<number> {
  const [asCurator, asEducator] = [await apiAs('curator@demo.test'), await apiAs('educator@demo.test')];
  const { id } = await asCurator<{ id: number }>('POST', '/stories', { title, audience: 'family', exhibitId });
  await asCurator('POST', `/stories/${id}/panels`, { doc: paragraph(text), position: 0, wordBudget: 60 });
  const { revisionId } = await asCurator<{ revisionId: number }>('POST', `/stories/${id}/submit`, {});
  await asEducator('POST', `/revisions/${revisionId}/reviews`, { verdict: 'approve' });
  return id;
}

beforeAll(async () => {
  const asAdmin = await apiAs('admin@demo.test');
  venueId = (await asAdmin<{ id: number }>('POST', '/venues', { name: VENUE, slug: `strict-${suffix}`, sourceLocale: 'en', targetLocales: ['fr'], fallbackToSource: false })).id;
  galleryId = (await asAdmin<{ id: number }>('POST', '/galleries', { venueId, name: GALLERY })).id;
  const exhibit = await asAdmin<{ id: number }>('POST', '/exhibits', { galleryId, name: 'Plates that sink' });
  for (const [email, roles, locales] of STAFF) await joinVenue(asAdmin, email, venueId, [...roles], [...locales]);
  translatedId = await approvedStory(exhibit.id, TRANSLATED, 'Old sea floor is cold and heavy.');
  untranslatedId = await approvedStory(exhibit.id, UNTRANSLATED, 'Some volcanoes sit far from any plate edge.');
  const asTranslator = await apiAs('translator@demo.test');
  type Unit = { unitId: string; source: string; status: string; version: number };
  for (const unit of (await asTranslator<{ items: Unit[] }>('GET', `/stories/${translatedId}/translations/fr/units?pageSize=100`)).items) {
    await asTranslator('PUT', `/stories/${translatedId}/translations/fr/units/${encodeURIComponent(unit.unitId)}`, { text: `FR : ${unit.source}`, version: unit.version });
  }
  browser = await launchBrowser();
  page = await (await newContext(browser)).newPage();
  await signIn(page, 'technician@demo.test');
  // The technician now works at two venues: the studio shows one at a time.
  await page.getByRole('banner').getByRole('button', { name: /^Venue: / }).click();
  await page.getByRole('menuitemradio', { name: VENUE }).click();
});

afterAll(async () => {
  await browser?.close();
  const asAdmin = await apiAs('admin@demo.test');
  await (await apiAs('technician@demo.test'))('PATCH', '/auth/me', { uiLanguage: 'en' });
  if (venueId) for (const [email] of STAFF) await leaveVenue(asAdmin, email, venueId);
});

/** Nothing axe-core counts as a WCAG 2.2 AA failure (test/support/axe.ts). */
async function expectAccessible(where: string): Promise<void> {
  expect(await axeFindings(page), where).toEqual([]);
}

async function openBuildDialog(language: Language = 'en'): Promise<Locator> {
  await page.goto(`/releases?gallery=${galleryId}`);
  await page.getByRole('button', { name: BUILD_RELEASE[language] }).click();
  const dialog = page.getByRole('dialog');
  await dialog.waitFor();
  return dialog;
}

/** When SCREENSHOT_DIR is set: the open dialog in each studio language, set on the account as the language menu does, then English again. */
async function screenshots(name: string, arrange: (language: Language) => Promise<unknown>): Promise<void> {
  const shots = process.env.SCREENSHOT_DIR;
  if (!shots) return;
  await mkdir(shots, { recursive: true });
  const asTechnician = await apiAs('technician@demo.test');
  try {
    for (const language of LANGUAGES) {
      await asTechnician('PATCH', '/auth/me', { uiLanguage: language });
      await page.reload();
      await arrange(language);
      await page.screenshot({ path: join(shots, `${name}-${language}.png`), fullPage: true });
    }
  } finally {
    await asTechnician('PATCH', '/auth/me', { uiLanguage: 'en' });
    await page.reload();
  }
}

describe('building a release while a translation is missing', () => {
  it('lists the story and locale missing, builds only once the story is left out, and the release carries the rest', async () => {
    let dialog = await openBuildDialog();
    await dialog.getByText('1 story is not fully translated').waitFor();
    const row = dialog.locator(`tr[data-story-id="${untranslatedId}"]`);
    // Counted by hand: the story's title and its one paragraph, neither translated.
    await row.getByText('French: 2 untranslated of 2 texts').waitFor();
    expect(await dialog.locator(`tr[data-story-id="${translatedId}"]`).count()).toBe(0);
    const build = dialog.getByRole('button', { name: 'Build', exact: true });
    expect(await build.isDisabled()).toBe(true);
    await expectAccessible('build dialog, a translation missing');
    await screenshots('release-missing', async (language) => {
      dialog = await openBuildDialog(language);
      await dialog.getByRole('checkbox').waitFor();
    });

    dialog = await openBuildDialog();
    await dialog.getByRole('checkbox', { name: 'Leave out of this release' }).check();
    await expect.poll(() => build.isEnabled()).toBe(true);
    await expectAccessible('build dialog, the story left out');
    await build.click();
    await dialog.waitFor({ state: 'detached' });
    await page.waitForURL(/[?&]build=\d+/);
    const releaseId = Number(new URL(page.url()).searchParams.get('build'));
    await page.locator(`section[data-release-id="${releaseId}"]`).getByText(/is Ready with 1 stor/).waitFor({ timeout: 60_000 });
    const release = await (await apiAs('technician@demo.test'))<ReleaseView>('GET', `/releases/${releaseId}`);
    expect(release.stories.map((story) => story.title)).toEqual([TRANSLATED]);

    await page.locator(`section[data-release-id="${releaseId}"]`).getByRole('button', { name: 'Publish…' }).click();
    const confirm = page.getByRole('alertdialog');
    await confirm.getByRole('button', { name: /^Publish Release \d+$/ }).click();
    await page.locator(`tr[data-release-id="${releaseId}"][data-state="live"]`).waitFor();

    // Build again with the same choice: the release would carry just what the Live one does, and the dialog says so first.
    dialog = await openBuildDialog();
    await dialog.getByRole('checkbox', { name: 'Leave out of this release' }).check();
    const same = dialog.locator(`[data-same-as-live="${release.number}"]`);
    await same.waitFor();
    expect(await same.textContent()).toBe(`Nothing would change` +
      `This release would carry exactly what Release ${release.number}, Live now, carries: the same revisions, translations and files. Building it changes nothing on the gallery’s screens.`);
    // The technician still decides: Build stays offered.
    await expect.poll(() => build.isEnabled()).toBe(true);
    await expectAccessible('build dialog, the same as the Live release');
    await screenshots('release-same-as-live', async (language) => {
      dialog = await openBuildDialog(language);
      await dialog.getByRole('checkbox').check();
      await dialog.locator('[data-same-as-live]').waitFor();
    });
  });
});

describe('the Fleet', () => {
  it('shows the active kiosks unless asked for the revoked ones', async () => {
    await page.goto('/fleet');
    const access = page.getByLabel('Access');
    await access.waitFor();
    expect(await access.inputValue()).toBe('active');
    await expectAccessible('/fleet, active kiosks');
    await access.selectOption({ label: 'Revoked kiosks' });
    await page.waitForURL(/[?&]access=revoked/);
    await expectAccessible('/fleet, revoked kiosks');
    await screenshots('fleet-revoked', async () => {
      await page.getByRole('heading', { level: 1 }).waitFor();
      await page.getByRole('table').or(page.locator('main h2')).first().waitFor();
    });
  });
});
