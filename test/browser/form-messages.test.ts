import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiAs, launchBrowser, newContext, signIn } from '../support/browser.js';
import { solidPng } from '../support/images.js';
import { storyWithPanels } from '../support/stories.js';

/**
 * Each form message where it belongs and in words a person reads once: the invite dialog's role
 * message, the image page's licence check and suggestions and its "Where it is used", the XLIFF
 * refusal, the alt-text length warning and the review page's hint.
 */
let browser: Browser;
let asCurator: Awaited<ReturnType<typeof apiAs>>;
let storyId: number;
let mediaId: number;
let revisionId: number;

const suffix = Date.now().toString(36);
const filename = `messages-${suffix}.png`;
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });
const paragraph = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });

/** A page signed in as a demo account, in a context of its own, closed after `steps`. */
async function as(email: string, steps: (page: Page) => Promise<void>) {
  const context: BrowserContext = await newContext(browser);
  try {
    const page = await context.newPage();
    await signIn(page, email);
    await steps(page);
  } finally {
    await context.close();
  }
}

/** The text of the elements a control's aria-describedby names: where Fluent puts a field's message. */
async function describedText(page: Page, control: ReturnType<Page['getByRole']>): Promise<string> {
  const ids = ((await control.getAttribute('aria-describedby')) ?? '').split(' ').filter(Boolean);
  return ids.length === 0 ? '' : (await page.locator(ids.map((id) => `#${id}`).join(', ')).allTextContents()).join(' ');
}

/** The image's page with "An open licence" chosen; answers its SPDX identifier box. */
async function openLicenceOf(page: Page): Promise<Locator> {
  await page.goto(`/media/${mediaId}`);
  await page.getByRole('radio', { name: 'An open licence (SPDX identifier)' }).check();
  return page.getByRole('combobox', { name: 'SPDX identifier' });
}

/** An image of its own (a colour no other upload has: the library keeps identical bytes once) with English alt text; answers its id. */
async function imageWithAlt(name: string): Promise<number> {
  const upload = new FormData();
  upload.append('file', new Blob([new Uint8Array(solidPng(64, 48, [30, Math.floor(Math.random() * 256), Math.floor(Math.random() * 256)]))], { type: 'image/png' }), name);
  const id = (await asCurator<{ id: number }[]>('POST', '/media', upload))[0]!.id;
  await asCurator('PATCH', `/media/${id}`, { alt: { en: 'A map of the plates around the Pacific Ocean' } });
  return id;
}

beforeAll(async () => {
  asCurator = await apiAs('curator@demo.test');
  mediaId = await imageWithAlt(filename);
  // The image on the story's third panel, so its page names "Panel 3".
  storyId = (await asCurator<{ id: number }>('POST', '/stories', { title: `Messages ${suffix}`, audience: 'family' })).id;
  await asCurator('POST', `/stories/${storyId}/panels`, { doc: { type: 'doc', content: [paragraph('Plates move.')] } });
  await asCurator('POST', `/stories/${storyId}/panels`, { doc: { type: 'doc', content: [paragraph('Ridges push.')] } });
  // A second story, submitted, for the educator's revision page.
  const reviewed = (await asCurator<{ id: number }>('POST', '/stories', { title: `Messages review ${suffix}`, audience: 'family' })).id;
  await asCurator('POST', `/stories/${reviewed}/panels`, { doc: { type: 'doc', content: [paragraph('Hot rock rises slowly.')] } });
  revisionId = (await asCurator<{ revisionId: number }>('POST', `/stories/${reviewed}/submit`, {})).revisionId;
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('the invite dialog', () => {
  it('says "Choose at least one role." on sending without one, and no longer once a role is ticked', async () => {
    await as('admin@demo.test', async (page) => {
      await page.goto('/people');
      await page.getByRole('button', { name: 'Invite someone' }).click();
      const dialog = page.getByRole('dialog');
      await dialog.getByRole('textbox', { name: 'Email' }).fill(`messages-${suffix}@example.org`);
      await dialog.getByRole('textbox', { name: 'Name' }).fill('Messages Check');
      await dialog.getByRole('button', { name: 'Send invitation' }).click();
      const roles = dialog.getByRole('group', { name: 'Roles' });
      await eventually(() => roles.textContent()).toContain('Choose at least one role.');
      await roles.getByRole('checkbox', { name: 'Curator' }).check();
      await eventually(() => roles.textContent()).not.toContain('Choose at least one role.');
      await dialog.getByRole('button', { name: 'Cancel' }).click();
    });
  });
});

describe('the image page', () => {
  it('says where the image is used by the panel’s place in its story, apart from its heading', async () => {
    await as('curator@demo.test', async (page) => {
      await page.goto(`/media/${mediaId}`);
      await page.getByRole('heading', { level: 1, name: filename }).waitFor();
      const heading = page.getByRole('heading', { level: 2, name: 'Where it is used' });
      // Nothing shows it yet: the sentence is a paragraph of its own under the heading.
      await eventually(() => page.getByText('No panel uses this image.').count()).toBe(1);
      expect(await heading.textContent()).toBe('Where it is used');

      await asCurator('POST', `/stories/${storyId}/panels`, { doc: { type: 'doc', content: [paragraph('Slabs pull.'), { type: 'panelImage', attrs: { mediaId: String(mediaId) } }] } });
      await page.reload();
      await page.getByRole('link', { name: `Messages ${suffix}, panel 3` }).waitFor();
      expect(await page.getByText('No panel uses this image.').count()).toBe(0);
    });
  });

  it('puts the server’s refusal of an incomplete SPDX identifier at that field, outlined, and suggests from the server’s list', async () => {
    await as('curator@demo.test', async (page) => {
      const spdx = await openLicenceOf(page);
      await spdx.fill('CC-BY');
      const refusal = page.waitForResponse((response) => response.url().endsWith(`/api/media/${mediaId}`) && response.request().method() === 'PATCH');
      await page.getByRole('button', { name: 'Save' }).click();
      expect((await refusal).status()).toBe(400);
      await eventually(() => spdx.getAttribute('aria-invalid')).toBe('true');
      expect(await describedText(page, spdx)).toContain('Use an SPDX licence identifier such as CC-BY-4.0 or CC0-1.0.');
      // The radio group above says nothing of it.
      expect(await describedText(page, page.getByRole('radiogroup'))).not.toContain('SPDX licence identifier');

      // Suggestions come from the server's list of accepted identifiers, the common image licences first.
      await spdx.fill('');
      await spdx.pressSequentially('CC-BY');
      await eventually(() => page.getByRole('option').first().textContent()).toBe('CC-BY-4.0');
    });
  });

  it('keeps and saves a licence chosen beyond the first suggestions, typed or picked', async () => {
    // MIT and MIT-0 are on the SPDX License List (spdx.org/licenses); neither is among the image licences suggested first.
    await as('curator@demo.test', async (page) => {
      const spdx = await openLicenceOf(page);
      await spdx.fill('');
      await spdx.pressSequentially('MIT');
      expect(await spdx.inputValue(), 'what was typed stays in the box').toBe('MIT');
      await eventually(() => page.getByRole('option').first().textContent()).toBe('MIT');
      await page.getByRole('option', { name: 'MIT-0', exact: true }).click();
      expect(await spdx.inputValue()).toBe('MIT-0');
      await page.getByRole('button', { name: 'Save' }).click();
      await eventually(() => page.getByText('Saved.').count()).toBe(1);
      expect((await asCurator<{ licence: unknown }>('GET', `/media/${mediaId}`)).licence).toEqual({ kind: 'spdx', id: 'MIT-0' });
      await page.reload();
      await eventually(() => spdx.inputValue()).toBe('MIT-0');
    });
  });
});

describe('the translator’s workspace', () => {
  it('refuses a file that is not well-formed XML in one sentence that names the line and column', async () => {
    await as('translator@demo.test', async (page) => {
      await page.goto(`/translations/${storyId}/fr`);
      await page.locator('[data-unit-row]').first().waitFor();
      const broken = '<?xml version="1.0"?>\n<xliff xmlns="urn:oasis:names:tc:xliff:document:2.0" version="2.1" srcLang="en" trgLang="fr">\n<file id="f1"><unit id="u1">\n</xliff>';
      await page.locator('[data-testid="xliff-file-input"]').setInputFiles({ name: 'broken.xlf', mimeType: 'application/xliff+xml', buffer: Buffer.from(broken) });
      const problems = page.locator('[data-xliff-problems]');
      await problems.waitFor();
      const text = (await problems.textContent()) ?? '';
      expect(text).toMatch(/The file is not well-formed XML at line 4, column \d+: /);
      expect(text.match(/nothing (was )?changed/g), 'said once').toHaveLength(1);
    });
  });

  it('warns of alt text over its budget as text read aloud, not text that may not fit', async () => {
    // An image and a story of the test's own: the image's alt text is a unit to translate once a panel shows it.
    const shown = await imageWithAlt(`alt-budget-${suffix}.png`);
    const { storyId: showing } = await storyWithPanels(asCurator, { title: `Alt budget ${suffix}` }, [
      { type: 'doc', content: [paragraph('Plates move.'), { type: 'panelImage', attrs: { mediaId: String(shown) } }] },
    ]);
    await as('translator@demo.test', async (page) => {
      await page.goto(`/translations/${showing}/fr`);
      await page.locator(`[data-unit-row="m${shown}.alt"] button`).click();
      await page.getByRole('textbox', { name: /^Translation \(French\)/ }).fill('Une carte des plaques autour de l’océan Pacifique, '.repeat(12));
      const over = page.locator('[data-unit-editor] [data-budget-over]');
      await over.waitFor();
      expect(await over.textContent()).toContain('read aloud by screen readers');
      expect(await over.textContent()).not.toContain('may not fit');
    });
  });
});

describe('the review page', () => {
  it('asks the educator to select words in this panel', async () => {
    await as('educator@demo.test', async (page) => {
      await page.goto(`/reviews/${revisionId}`);
      await page.getByText('Select words in this panel to comment on them.').first().waitFor();
      expect(await page.getByText(/in this drawing/).count()).toBe(0);
    });
  });
});
