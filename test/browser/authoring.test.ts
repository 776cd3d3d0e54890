import type { Browser, BrowserContext, Page } from 'playwright-core';
import sharp from 'sharp';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { apiAs, launchBrowser, newContext, signIn } from '../support/browser.js';
import { paragraphs, storyWithPanels } from '../support/stories.js';

let browser: Browser;
let page: Page;
let asCurator: Awaited<ReturnType<typeof apiAs>>;

/** A name no other test or run has, so a test never finds a story or an image made elsewhere. */
const fresh = (start: string) => `${start} ${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
const typed = 'A block rests on the slope until the slope gets too steep.';
const altText = 'An orange square standing in for a photograph of a basalt slab';
const emptyPanel = { type: 'doc', content: [{ type: 'paragraph' }] };
// The settings the tests below give the slope force box: it grips at μs 0.5 and slides at μk 0.4.
const slopeBox = { type: 'widget', attrs: { widgetType: 'slope-force', widgetId: 'authoring-slope', params: { massKg: 10, angleDeg: 20, staticFriction: 0.5, kineticFriction: 0.4 } } };

/** Waits for a value the page reaches by itself (an autosave after a pause, an upload), without a fixed sleep. */
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });

const saveStatus = (on = page) => on.locator('[data-save-status]').getAttribute('data-save-status');
const editorText = (on = page) => on.getByRole('textbox', { name: 'Panel text' });
const field = (label: string) => page.getByRole('textbox', { name: label });

/**
 * A small PNG drawn here, so the upload needs no file from anywhere. Its colour differs per upload:
 * the library stores identical bytes once, and each test must start with an asset of its own.
 */
let uploads = 0;
const testImage = () => {
  uploads += 1;
  return sharp({ create: { width: 640, height: 480, channels: 3, background: { r: Math.floor(Math.random() * 256), g: uploads, b: 30 } } }).png().toBuffer();
};

/** A story of the test's own with these panels, open in the editor; answers its title. */
async function openStory(docs: object[]): Promise<string> {
  const title = fresh('Why slopes give way');
  const { storyId } = await storyWithPanels(asCurator, { title }, docs);
  await page.goto(`/stories/${storyId}`);
  await editorText().waitFor();
  return title;
}

/**
 * A story whose panel holds the typed text, the slope force box and an image of its own with English alt
 * text, as the curator leaves it in the editor, made through the API (upload, alt text, panel).
 * Answers the story's title and id and the image's alt text, unique to the test.
 */
async function storyWithImage(): Promise<{ title: string; storyId: number; alt: string }> {
  const upload = new FormData();
  upload.append('file', new Blob([new Uint8Array(await testImage())], { type: 'image/png' }), 'basalt-slab.png');
  const [image] = await asCurator<{ id: number }[]>('POST', '/media', upload);
  const alt = fresh(altText);
  await asCurator('PATCH', `/media/${image!.id}`, { alt: { en: alt } });
  const title = fresh('Why slopes give way');
  const panel = { type: 'doc', content: [...paragraphs(typed).content, slopeBox, { type: 'panelImage', attrs: { mediaId: String(image!.id) } }] };
  const { storyId } = await storyWithPanels(asCurator, { title }, [panel]);
  return { title, storyId, alt };
}

beforeAll(async () => {
  asCurator = await apiAs('curator@demo.test');
  browser = await launchBrowser();
  page = await (await newContext(browser)).newPage();
  await signIn(page, 'curator@demo.test');
});
afterAll(() => browser?.close());

describe('a curator writes a panel', () => {
  it('creates a story from the Stories page and lands on its editor', async () => {
    await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Stories' }).click();
    await page.getByRole('heading', { level: 1, name: 'Stories' }).waitFor();
    await page.getByRole('button', { name: 'New story' }).first().click();
    const dialog = page.getByRole('dialog', { name: 'New story' });
    await dialog.getByRole('button', { name: 'Create story' }).click();
    await eventually(() => dialog.getByText('Required').count()).toBe(1);
    const title = fresh('Why slopes give way');
    await dialog.getByRole('textbox', { name: 'Title' }).fill(title);
    await dialog.getByRole('button', { name: 'Create story' }).click();
    await page.getByRole('heading', { level: 1, name: title }).waitFor();
    await page.getByRole('button', { name: 'Add the first panel' }).click();
    await editorText().waitFor();
    // An empty panel says what goes in it (a drawn hint, never part of the document).
    await eventually(() => page.locator('.ProseMirror .is-editor-empty').getAttribute('data-placeholder')).toMatch(/^Write this panel here/);
  });

  it('types text, and the word count follows', async () => {
    await openStory([emptyPanel]);
    await editorText().click();
    await page.keyboard.type(typed);
    await eventually(() => page.locator('[data-measure="words"]').textContent()).toMatch(/^12 of \d+ words$/);
    await eventually(saveStatus).toBe('saved');
  });

  it('inserts a slope force box and refuses kinetic friction above static friction, with the shared message', async () => {
    await openStory([paragraphs(typed)]);
    await editorText().press('End');
    await page.keyboard.press('Enter');
    await page.getByRole('button', { name: 'Widget' }).click();
    await page.getByRole('menuitem', { name: 'Slope force box' }).click();
    await page.locator('.mp-widget-node').waitFor();
    await field('Static friction coefficient μs').fill('0.5');
    await field('Kinetic (sliding) friction coefficient μk').fill('0.7');
    // The slope force box's own rule (shared validation): a sliding block never grips harder than one at rest.
    await eventually(() => page.getByText(/cannot be more than static friction/).count()).toBeGreaterThan(0);
    await eventually(saveStatus).toBe('invalid');
  });

  it('saves once the friction is fixed', async () => {
    await openStory([{ type: 'doc', content: [...paragraphs(typed).content, slopeBox] }]);
    await field('Kinetic (sliding) friction coefficient μk').fill('0.7');
    await eventually(saveStatus).toBe('invalid');
    await field('Kinetic (sliding) friction coefficient μk').fill('0.4');
    await eventually(() => page.getByText(/cannot be more than static friction/).count()).toBe(0);
    await eventually(saveStatus).toBe('saved');
  });

  it('uploads an image in the picker, gives it alt text and puts it on the panel', async () => {
    await openStory([paragraphs(typed)]);
    await editorText().press('End');
    await page.getByRole('button', { name: 'Image' }).click();
    const picker = page.getByRole('dialog', { name: 'Choose an image' });
    await picker.getByTestId('media-file-input').setInputFiles({ name: 'basalt-slab.png', mimeType: 'image/png', buffer: await testImage() });
    await eventually(() => picker.locator('[data-upload-status]').first().getAttribute('data-upload-status')).toBe('done');
    await picker.getByRole('textbox', { name: 'Alt text (en)' }).fill(altText);
    await picker.getByRole('button', { name: 'Insert image' }).click();
    await eventually(() => page.locator('.mp-panel-image-node img').getAttribute('alt')).toBe(altText);
    await eventually(saveStatus).toBe('saved');
  });

  it('finds the text, the widget’s settings and the image again after a reload', async () => {
    const { storyId, alt } = await storyWithImage();
    await page.goto(`/stories/${storyId}`);
    await editorText().waitFor();
    await page.reload();
    await editorText().waitFor();
    await eventually(() => editorText().textContent()).toContain(typed);
    await eventually(() => field('Static friction coefficient μs').inputValue()).toBe('0.5');
    expect(await field('Kinetic (sliding) friction coefficient μk').inputValue()).toBe('0.4');
    await eventually(() => page.locator('.mp-panel-image-node img').getAttribute('alt')).toBe(alt);
    expect(await saveStatus()).toBe('saved');
  });
});

/** The cursor after the panel's first sentence (a click on the widget would move its slope instead). */
async function endOfFirstLine(on: Page) {
  await editorText(on).locator('p').first().click();
  await on.keyboard.press('End');
}

describe('two curators on one panel', () => {
  let otherContext: BrowserContext;
  let other: Page;

  beforeAll(async () => {
    otherContext = await newContext(browser);
    other = await otherContext.newPage();
    await signIn(other, 'curator@demo.test');
  });
  // Both open a story of the test's own whose panel holds the typed sentence.
  beforeEach(async () => {
    await openStory([paragraphs(typed)]);
    await other.goto(page.url());
    await editorText(other).waitFor();
  });
  afterAll(() => otherContext?.close());

  it('shows the other version line by line on a stale save, and keeps mine on request', async () => {
    await endOfFirstLine(page);
    await page.keyboard.type(' Theirs.');
    await eventually(() => saveStatus()).toBe('saved');

    await endOfFirstLine(other);
    await other.keyboard.type(' Mine.');
    const conflict = other.getByRole('alertdialog', { name: 'This panel changed while you were writing' });
    await conflict.waitFor();
    expect(await conflict.getByRole('list', { name: 'Differences, line by line' }).textContent()).toContain(`Theirs:${typed} Theirs.`);
    expect(await conflict.getByRole('list', { name: 'Differences, line by line' }).textContent()).toContain(`Yours:${typed} Mine.`);
    await conflict.getByRole('button', { name: 'Keep mine' }).click();
    await eventually(() => saveStatus(other)).toBe('saved');

    await page.reload();
    await eventually(() => editorText().textContent()).toContain(`${typed} Mine.`);
    expect(await editorText().textContent()).not.toContain('Theirs.');
  });

  it('keeps what was typed while the server could not be reached, and saves it after a reload', async () => {
    await otherContext.setOffline(true);
    await endOfFirstLine(other);
    await other.keyboard.type(' Typed offline.');
    await eventually(() => saveStatus(other)).toBe('error');
    await otherContext.setOffline(false);
    await other.reload();
    await editorText(other).waitFor();
    await eventually(() => other.getByText('Unsaved changes from this tab were restored').count()).toBe(1);
    expect(await editorText(other).textContent()).toContain(`${typed} Typed offline.`);
    await eventually(() => saveStatus(other)).toBe('saved');
  });
});

describe('the media library', () => {
  it('says per file why the server refused it: an SVG is not an accepted image type (415)', async () => {
    await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Media' }).click();
    await page.getByRole('heading', { level: 1, name: 'Media' }).waitFor();
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script></svg>');
    await page.getByTestId('media-file-input').setInputFiles({ name: 'drawing.svg', mimeType: 'image/svg+xml', buffer: svg });
    const row = page.locator('[data-upload-status]').first();
    await eventually(() => row.getAttribute('data-upload-status')).toBe('failed');
    expect(await row.getByRole('alert').textContent()).toMatch(/^Not an image type the studio accepts/);
  });

  it('finds the uploaded image by its missing credit and shows where it is used', async () => {
    const { title, alt } = await storyWithImage();
    await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Media' }).click();
    await page.getByRole('combobox', { name: 'Show' }).selectOption('missing-credit');
    await page.getByRole('link', { name: alt }).first().click();
    await page.getByRole('heading', { level: 1, name: 'basalt-slab.png' }).waitFor();
    // The server's renditions job made the WebP renditions after the upload answered; the page shows them once ready.
    await eventually(() => page.getByText('Screen renditions: 640 px wide').count()).toBe(1);
    expect(await page.getByText('Preparing…').count()).toBe(0);
    await eventually(() => page.getByRole('link', { name: new RegExp(title) }).count()).toBeGreaterThan(0);
    await page.getByRole('textbox', { name: 'Credit line' }).fill('Drawing: Basalt Point Earth Science Centre');
    await page.getByRole('radio', { name: 'An open licence (SPDX identifier)' }).check();
    const spdx = page.getByRole('combobox', { name: 'SPDX identifier' });
    // An incomplete identifier is refused by the server, and its message stands at the SPDX box, which is outlined.
    await spdx.fill('CC-BY');
    await page.getByRole('button', { name: 'Save' }).click();
    await eventually(() => spdx.getAttribute('aria-invalid')).toBe('true');
    const describedBy = (await spdx.getAttribute('aria-describedby')) ?? '';
    expect(await page.locator(describedBy.split(' ').map((id) => `#${id}`).join(', ')).allTextContents()).toContainEqual(expect.stringContaining('SPDX licence identifier'));
    // Typing offers the common licences that match; choosing one fills the box.
    await spdx.fill('');
    await spdx.pressSequentially('CC-BY-S');
    await page.getByRole('option', { name: 'CC-BY-SA-4.0' }).waitFor();
    expect(await page.getByRole('option', { name: 'CC-BY-4.0', exact: true }).count()).toBe(0);
    await spdx.fill('');
    await spdx.pressSequentially('CC-BY-4');
    await page.getByRole('option', { name: 'CC-BY-4.0', exact: true }).click();
    expect(await spdx.inputValue()).toBe('CC-BY-4.0');
    await page.getByRole('button', { name: 'Save' }).click();
    await eventually(() => page.getByText('Saved.').count()).toBe(1);
  });
});

describe('the panel strip', () => {
  const cards = () => page.getByRole('list', { name: 'Panels of this story' }).getByRole('button');

  it('adds a panel and moves it first with Alt+←, which survives a reload', async () => {
    await openStory([paragraphs(typed)]);
    await page.getByRole('button', { name: 'Add panel' }).click();
    await eventually(() => cards().count()).toBe(2);
    // The new panel opens in the editor: wait for its empty page before typing into it.
    await eventually(() => page.locator('[aria-current="true"]').textContent()).toBe('Panel 2Empty panel');
    await eventually(() => editorText().textContent()).toBe('');
    await editorText().click();
    await page.keyboard.type('A second screen.');
    await eventually(() => cards().nth(1).textContent()).toBe('Panel 2A second screen.');
    await cards().nth(1).focus();
    await page.keyboard.press('Alt+ArrowLeft');
    await eventually(() => cards().first().textContent()).toBe('Panel 1A second screen.');
    await page.reload();
    await eventually(() => cards().first().textContent()).toBe('Panel 1A second screen.');
  });

  it('deletes a panel only after confirmation', async () => {
    await openStory([paragraphs('A second screen.'), paragraphs(typed)]);
    await cards().first().click();
    await page.getByRole('button', { name: 'Delete panel' }).click();
    const confirm = page.getByRole('alertdialog', { name: 'Delete panel 1?' });
    await confirm.getByRole('button', { name: 'Delete panel' }).click();
    await eventually(() => cards().count()).toBe(1);
    expect(await cards().first().textContent()).toContain(typed);
  });
});
