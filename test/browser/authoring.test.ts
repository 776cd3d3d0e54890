import type { Browser, Page } from 'playwright-core';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newContext, signIn } from '../support/browser.js';

let browser: Browser;
let page: Page;

// A fresh title per run, so the test never finds a story an earlier run left behind.
const title = `Why slopes give way ${Date.now().toString(36)}`;
const typed = 'A block rests on the slope until the slope gets too steep.';
const altText = 'An orange square standing in for a photograph of a basalt slab';

/** Waits for a value the page reaches by itself (an autosave after a pause, an upload), without a fixed sleep. */
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });

const saveStatus = () => page.locator('[data-save-status]').getAttribute('data-save-status');
const editorText = () => page.getByRole('textbox', { name: 'Panel text' });
const field = (label: string) => page.getByRole('textbox', { name: label });

/** A small PNG drawn here, so the upload needs no file from anywhere. */
const testImage = () => sharp({ create: { width: 640, height: 480, channels: 3, background: { r: 200, g: 90, b: 30 } } }).png().toBuffer();

beforeAll(async () => {
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
    await dialog.getByRole('textbox', { name: 'Title' }).fill(title);
    await dialog.getByRole('button', { name: 'Create story' }).click();
    await page.getByRole('heading', { level: 1, name: title }).waitFor();
    await page.getByRole('button', { name: 'Add the first panel' }).click();
    await editorText().waitFor();
  });

  it('types text, and the word count follows', async () => {
    await editorText().click();
    await page.keyboard.type(typed);
    await eventually(() => page.locator('[data-measure="words"]').textContent()).toMatch(/^12 of \d+ words$/);
    await eventually(saveStatus).toBe('saved');
  });

  it('inserts a slope force box and refuses kinetic friction above static friction, with the shared message', async () => {
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
    await field('Kinetic (sliding) friction coefficient μk').fill('0.4');
    await eventually(() => page.getByText(/cannot be more than static friction/).count()).toBe(0);
    await eventually(saveStatus).toBe('saved');
  });

  it('uploads an image in the picker, gives it alt text and puts it on the panel', async () => {
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
    await page.reload();
    await editorText().waitFor();
    await eventually(() => editorText().textContent()).toContain(typed);
    await eventually(() => field('Static friction coefficient μs').inputValue()).toBe('0.5');
    expect(await field('Kinetic (sliding) friction coefficient μk').inputValue()).toBe('0.4');
    await eventually(() => page.locator('.mp-panel-image-node img').getAttribute('alt')).toBe(altText);
    expect(await saveStatus()).toBe('saved');
  });
});
