import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { PanelDocJSON } from '@mantlepiece/shared';
import { axeFindings } from '../support/axe.js';
import { apiAs, atRest, baseUrl, demoPassword, launchBrowser, newContext, signIn } from '../support/browser.js';
import { storyWithPanels } from '../support/stories.js';

// A fresh tag per run, so the test never meets a story an earlier run left behind.
const tag = Date.now().toString(36);
const firstLine = 'Rock grips until the slope is too steep.';
// μs = 0.6 on a 20° slope: the block holds (it slides above arctan 0.6 ≈ 30.96°, inclined plane with Coulomb friction, the brief's science).
const slopeParams = { massKg: 10, angleDeg: 20, staticFriction: 0.6, kineticFriction: 0.5 };
const slope = (widgetId: string) => ({ type: 'widget', attrs: { widgetType: 'slope-force', widgetId, params: slopeParams } });
const paragraph = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });

// Set SCREENSHOT_DIR to keep pictures of the changed screens (en and ar), for a person to look at.
const shots = process.env.SCREENSHOT_DIR;
/** Waits for a state the page or the server reaches by itself (an autosave after a pause), never a fixed sleep. */
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });

let browser: Browser;
let context: BrowserContext;
let curator: Page;
let asCurator: Awaited<ReturnType<typeof apiAs>>;

async function storyWith(title: string, doc: object): Promise<number> {
  return (await storyWithPanels(asCurator, { title: `${title} ${tag}` }, [doc])).storyId;
}

/** The first panel of a story as the server keeps it. */
async function savedPanel(storyId: number): Promise<{ doc: PanelDocJSON; version: number }> {
  return (await asCurator<{ panels: { doc: PanelDocJSON; version: number }[] }>('GET', `/stories/${storyId}`)).panels[0]!;
}
const blockTypes = (doc: PanelDocJSON) => (doc.content ?? []).map((node) => node.type);
// The editor keeps an empty paragraph after a widget that ends a panel (so there is somewhere to type), which the save carries.
const withoutTrailingParagraph = (types: string[]) => (types.at(-1) === 'paragraph' && types.at(-2) === 'widget' ? types.slice(0, -1) : types);
const savedAngle = (doc: PanelDocJSON) => ((doc.content ?? []).find((node) => node.type === 'widget')?.attrs?.params as { angleDeg?: number } | undefined)?.angleDeg;

async function openEditor(storyId: number): Promise<Locator> {
  await curator.goto(`/stories/${storyId}`);
  const text = curator.getByRole('textbox', { name: 'Panel text' });
  await text.waitFor();
  await curator.locator('.ProseMirror .mp-widget-node').waitFor();
  return text;
}

async function expectAccessible(page: Page, where: string): Promise<void> {
  const findings = await axeFindings(page);
  expect(findings, `${where}: ${JSON.stringify(findings, null, 1)}`).toEqual([]);
}

/** Keeps a picture of the page in English and in Arabic (the studio's right-to-left language). */
async function screenshotInBothDirections(page: Page, name: string, reopen: () => Promise<void>): Promise<void> {
  if (!shots) return;
  await atRest(page);
  await page.screenshot({ path: `${shots}/${name}-en.png` });
  // The studio speaks the account's own language, so the curator's account reads Arabic for the picture, and English again after.
  await asCurator('PATCH', '/auth/me', { uiLanguage: 'ar' });
  try {
    await page.reload();
    await page.waitForFunction(() => document.documentElement.dir === 'rtl');
    await reopen();
    await atRest(page);
    await page.screenshot({ path: `${shots}/${name}-ar.png` });
  } finally {
    await asCurator('PATCH', '/auth/me', { uiLanguage: 'en' });
    await page.evaluate(() => localStorage.setItem('mantlepiece.uiLanguage', 'en'));
    await page.reload();
    await page.waitForFunction(() => document.documentElement.dir === 'ltr');
  }
}

beforeAll(async () => {
  asCurator = await apiAs('curator@demo.test');
  browser = await launchBrowser();
  context = await newContext(browser);
  await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: baseUrl });
  curator = await context.newPage();
  await signIn(curator, 'curator@demo.test');
}, 120_000);
afterAll(() => browser?.close());

describe('a drag inside a widget in the editor', () => {
  let storyId: number;
  const slider = () => curator.locator('.ProseMirror').getByRole('slider', { name: 'Slope force box: Slope angle' });
  // Each test opens a story of its own: the paragraph, then the slope at 20°.
  beforeEach(async () => {
    storyId = await storyWith('Slope that stays put', { type: 'doc', content: [paragraph(firstLine), slope('stay-slope')] });
    await openEditor(storyId);
  });

  /** Drags the slope's free end (at 20°: (290.9, 206.5) in the 480 × 360 drawing, hinge at (56, 292)) up onto the paragraph above the widget. */
  async function dragSlopeOntoParagraph() {
    // The story's fields stand above the editor: bring the grip to the middle of the window, the paragraph above it and the slope below.
    await curator.locator('.mp-widget-node-handle').evaluate((grip) => grip.scrollIntoView({ block: 'center' }));
    await atRest(curator);
    const box = (await slider().boundingBox())!;
    const target = (await curator.locator('.ProseMirror > p').first().boundingBox())!;
    await curator.mouse.move(box.x + (290.9 / 480) * box.width, box.y + (206.5 / 360) * box.height);
    await curator.mouse.down();
    await curator.mouse.move(target.x + 20, target.y + target.height / 2, { steps: 15 });
    await curator.mouse.up();
  }

  it('tilts the drawing but neither moves the block nor saves the angle, even with the block selected', async () => {
    const before = await savedPanel(storyId);
    // Selected by its grip, the block is what a native drag would carry: the drawing must keep the drag to itself.
    await curator.locator('.mp-widget-node-handle').click();
    await eventually(() => curator.locator('.mp-widget-node').getAttribute('data-selected')).toBe('true');
    await dragSlopeOntoParagraph();
    await eventually(async () => Number(await slider().getAttribute('aria-valuenow'))).toBeGreaterThan(30.96);
    expect((await curator.locator('.ProseMirror').evaluate((editor) => Array.from(editor.children, (child) => child.tagName))).slice(0, 2)).toEqual(['P', 'DIV']);
    await curator.getByRole('button', { name: 'Use this as the starting setting' }).waitFor();
    await expectAccessible(curator, 'editor with a widget being tried');
    await curator.locator('.mp-widget-trial').scrollIntoViewIfNeeded();
    await screenshotInBothDirections(curator, 'editor-widget-trial', async () => {
      await curator.locator('.ProseMirror .mp-widget-node').waitFor();
      await curator.locator('.ProseMirror [role="slider"]').focus();
      await curator.keyboard.press('PageUp');
      await curator.locator('.mp-widget-trial').scrollIntoViewIfNeeded();
    });
    // Opening the panel may save the empty paragraph the editor keeps after a last widget, and nothing more.
    const after = (await savedPanel(storyId)).doc;
    expect(withoutTrailingParagraph(blockTypes(after))).toEqual(blockTypes(before.doc));
    expect(savedAngle(after)).toBe(20);
  });

  it('saves the text typed afterwards with the block still after the paragraph and the angle as it was', async () => {
    await dragSlopeOntoParagraph();
    await curator.getByRole('button', { name: 'Back to the saved setting' }).click();
    await eventually(() => slider().getAttribute('aria-valuenow')).toBe('20');
    await curator.locator('.ProseMirror > p').first().click();
    await curator.keyboard.press('End');
    await curator.keyboard.type(' Tilt it.');
    await eventually(async () => (await savedPanel(storyId)).doc.content?.[0]?.content?.[0]?.text).toBe(`${firstLine} Tilt it.`);
    const saved = await savedPanel(storyId);
    expect(withoutTrailingParagraph(blockTypes(saved.doc))).toEqual(['paragraph', 'widget']);
    expect(savedAngle(saved.doc)).toBe(20);
  });

  it('keeps a tried angle only when the curator uses it as the starting setting', async () => {
    await dragSlopeOntoParagraph();
    const tried = Number(await slider().getAttribute('aria-valuenow'));
    expect(tried).toBeGreaterThan(30.96);
    await curator.getByRole('button', { name: 'Use this as the starting setting' }).click();
    await eventually(async () => savedAngle((await savedPanel(storyId)).doc)).toBe(tried);
    expect(withoutTrailingParagraph(blockTypes((await savedPanel(storyId)).doc))).toEqual(['paragraph', 'widget']);
    expect(await curator.getByRole('button', { name: 'Use this as the starting setting' }).count()).toBe(0);
  });
});

describe('the cursor before a widget that starts a panel', () => {
  const widgetFirst = { type: 'doc', content: [slope('first-slope'), paragraph('Tilt the board.')] };

  it('Ctrl+Home puts it there: typed words become the panel’s first paragraph, before the widget', async () => {
    const storyId = await storyWith('Widget first, typed', widgetFirst);
    await openEditor(storyId);
    await curator.locator('.ProseMirror > p').first().click();
    await curator.keyboard.press('Control+Home');
    await curator.keyboard.type('First words.');
    await eventually(async () => blockTypes((await savedPanel(storyId)).doc)).toEqual(['paragraph', 'widget', 'paragraph']);
    const saved = (await savedPanel(storyId)).doc;
    expect(saved.content?.[0]?.content?.[0]?.text).toBe('First words.');
    expect(saved.content?.[2]?.content?.[0]?.text).toBe('Tilt the board.');
  });

  it('Ctrl+Home then paste puts the pasted words there too', async () => {
    const storyId = await storyWith('Widget first, pasted', widgetFirst);
    await openEditor(storyId);
    await curator.evaluate((text) => navigator.clipboard.writeText(text), 'Pasted words.');
    await curator.locator('.ProseMirror > p').first().click();
    await curator.keyboard.press('Control+Home');
    await curator.keyboard.press('Control+V');
    await eventually(async () => blockTypes((await savedPanel(storyId)).doc)).toEqual(['paragraph', 'widget', 'paragraph']);
    expect((await savedPanel(storyId)).doc.content?.[0]?.content?.[0]?.text).toBe('Pasted words.');
  });
});

/** The station screen in the open full-size preview fits inside the preview's viewport (a pixel of rounding allowed). */
async function screenFits(dialog: Locator, key: string): Promise<boolean> {
  const screen = (await dialog.locator(`[data-station-screen="${key}"]`).boundingBox())!;
  const viewport = (await dialog.locator('[data-station-preview]').boundingBox())!;
  return screen.width <= viewport.width + 1 && screen.height <= viewport.height + 1 && screen.x >= viewport.x - 1 && screen.y >= viewport.y - 1;
}

describe('live values while a widget is tried in the editor', () => {
  it('show what the trial shows, outlined as a trial, and the saved setting again after', async () => {
    const wordings = { holds: 'holds', slides: 'slides' };
    const storyId = await storyWith('Trial in the text', {
      type: 'doc',
      content: [
        { type: 'paragraph', content: [
          { type: 'text', text: 'The slope pulls with ' },
          { type: 'liveValue', attrs: { widgetId: 'text-slope', output: 'shearN', format: { digits: 3, unit: 'N' } } },
          { type: 'text', text: ' and the block ' },
          { type: 'livePhrase', attrs: { phraseId: 'ph-text', widgetId: 'text-slope', wordings } },
          { type: 'text', text: '.' },
        ] },
        slope('text-slope'),
      ],
    });
    await openEditor(storyId);
    const value = curator.locator('.ProseMirror .mp-live-value-node');
    const phrase = curator.locator('.ProseMirror .mp-live-phrase-node');
    const text = async (node: Locator) => ((await node.textContent()) ?? '').replace(/\s+/g, ' ');
    // Saved: 10 kg at 20°, S = m·g·sin θ = 10 × 9.80665 × sin 20° ≈ 33.5 N, below μs·N, so it holds (inclined plane, the brief's science).
    await eventually(() => text(value)).toBe('33.5 N');
    expect(await text(phrase)).toBe('holds');
    expect(await value.getAttribute('data-trying')).toBeNull();

    const slider = curator.locator('.ProseMirror').getByRole('slider', { name: 'Slope force box: Slope angle' });
    await slider.focus();
    await curator.keyboard.press('PageUp');
    await curator.keyboard.press('PageUp');
    const tried = Number(await slider.getAttribute('aria-valuenow'));
    expect(tried, 'tried past arctan 0.6 ≈ 30.96°, where it slides').toBeGreaterThan(30.96);
    const triedShear = 10 * 9.80665 * Math.sin((tried * Math.PI) / 180);
    await eventually(() => text(value)).toBe(`${new Intl.NumberFormat('en', { maximumSignificantDigits: 3 }).format(triedShear)} N`);
    expect(await text(phrase)).toBe('slides');
    expect(await value.getAttribute('data-trying')).toBe('true');
    expect(await phrase.getAttribute('data-trying')).toBe('true');
    expect(await value.getAttribute('title')).toContain('Shows the widget being tried, not its saved setting.');
    await expectAccessible(curator, 'editor with live values following a trial');
    await screenshotInBothDirections(curator, 'editor-trial-in-text', async () => {
      await curator.locator('.ProseMirror [role="slider"]').focus();
      await curator.keyboard.press('PageUp');
      await curator.keyboard.press('PageUp');
      await curator.locator('.ProseMirror .mp-live-value-node[data-trying]').waitFor();
    });

    await openEditor(storyId);
    await slider.focus();
    await curator.keyboard.press('PageUp');
    await curator.keyboard.press('PageUp');
    await curator.locator('.mp-widget-trial').waitFor();
    await curator.getByRole('button', { name: 'Back to the saved setting' }).click();
    await eventually(() => text(value)).toBe('33.5 N');
    expect(await text(phrase)).toBe('holds');
    expect(await value.getAttribute('data-trying')).toBeNull();
    expect(savedAngle((await savedPanel(storyId)).doc)).toBe(20);
  });
});

describe('the full-size preview', () => {
  it('opens in the editor at a station’s full size, and zooms to fit the window at either orientation', async () => {
    const storyId = await storyWith('Full-size preview', { type: 'doc', content: [paragraph(firstLine), slope('full-slope')] });
    await openEditor(storyId);
    await curator.getByRole('tab', { name: 'Preview' }).click();
    await curator.getByRole('button', { name: 'Full size' }).click();
    const dialog = curator.getByRole('dialog', { name: 'Panel 1 at full size' });
    await dialog.waitFor();
    const screenChoice = dialog.getByRole('combobox', { name: 'Station screen' });
    expect(await screenChoice.inputValue()).toBe('1920x1080');
    // The demo venue's stations are 1920 × 1080 screens (server/src/seed/demo-scenario.ts); the portrait one is always offered.
    expect(await screenChoice.locator('option').allTextContents()).toEqual(expect.arrayContaining([expect.stringMatching(/^1920 × 1080 landscape · .*Rift Table/), '1080 × 1920 portrait']));
    // At actual size one screen pixel is one CSS pixel: wider than the 1440-pixel window, so it scrolls.
    await eventually(async () => (await dialog.locator('[data-station-screen="1920x1080"]').boundingBox())?.width).toBe(1920);
    expect(await screenFits(dialog, '1920x1080')).toBe(false);
    await dialog.getByRole('button', { name: 'Zoom to fit' }).click();
    await eventually(() => screenFits(dialog, '1920x1080')).toBe(true);
    await screenChoice.selectOption('1080x1920');
    await eventually(() => screenFits(dialog, '1080x1920')).toBe(true);
    await expectAccessible(curator, 'full-size preview in the editor');
    await screenshotInBothDirections(curator, 'full-size-preview', async () => {
      await curator.locator('.ProseMirror .mp-widget-node').waitFor();
      // The side's third tab is the preview, whatever the language.
      await curator.getByRole('tab').nth(2).click();
      await curator.locator('[data-preview-layout] ~ button').click();
      await curator.locator('[data-station-screen]').waitFor();
    });
  });

  it('starts an English panel’s words at their left in an Arabic studio, at either orientation', async () => {
    const storyId = await storyWith('Preview in Arabic', { type: 'doc', content: [paragraph(firstLine), slope('arabic-slope')] });
    // Where each line of the paragraph starts, against the paragraph's own box: an English line starts at its left edge.
    const lineStartsLeft = (dialog: Locator) => dialog.locator('[data-station-preview] p', { hasText: firstLine }).first().evaluate((element) => {
      const range = document.createRange();
      range.selectNodeContents(element);
      return Math.abs(range.getClientRects()[0]!.left - element.getBoundingClientRect().left) < 2;
    });
    await asCurator('PATCH', '/auth/me', { uiLanguage: 'ar' });
    try {
      await curator.reload();
      await curator.waitForFunction(() => document.documentElement.dir === 'rtl');
      await curator.goto(`/stories/${storyId}`);
      await curator.locator('.ProseMirror .mp-widget-node').waitFor();
      // The side's third tab is the preview, whatever the language.
      await curator.getByRole('tab').nth(2).click();
      await curator.locator('[data-preview-layout] ~ button').click();
      const dialog = curator.getByRole('dialog');
      await dialog.locator('[data-station-screen="1920x1080"]').waitFor();
      expect(await dialog.locator('[data-station-preview] .mp-panel').getAttribute('dir')).toBe('ltr');
      expect(await lineStartsLeft(dialog), 'landscape: the line starts at the paragraph’s left').toBe(true);
      await dialog.getByRole('combobox').selectOption('1080x1920');
      await dialog.locator('[data-station-screen="1080x1920"]').waitFor();
      expect(await lineStartsLeft(dialog), 'portrait: the line starts at the paragraph’s left').toBe(true);
      await expectAccessible(curator, 'full-size preview in an Arabic studio');
    } finally {
      await asCurator('PATCH', '/auth/me', { uiLanguage: 'en' });
      await curator.evaluate(() => localStorage.setItem('mantlepiece.uiLanguage', 'en'));
      await curator.reload();
      await curator.waitForFunction(() => document.documentElement.dir === 'ltr');
    }
  });

  it('on the review page shows “This revision” at full size, where selecting words anchors a comment to them', async () => {
    const storyId = await storyWith('Review at full size', { type: 'doc', content: [paragraph(firstLine), slope('review-slope')] });
    const { revisionId } = await asCurator<{ revisionId: number }>('POST', `/stories/${storyId}/submit`, { note: 'Please check the wording.' });
    const educatorContext = await newContext(browser);
    try {
      const educator = await educatorContext.newPage();
      await signIn(educator, 'educator@demo.test', demoPassword);
      await educator.goto(`/reviews/${revisionId}`);
      await educator.getByRole('button', { name: 'Full size' }).first().click();
      const dialog = educator.getByRole('dialog', { name: 'Panel 1 at full size' });
      await dialog.waitFor();
      await dialog.getByRole('button', { name: 'Zoom to fit' }).click();
      await eventually(() => screenFits(dialog, '1920x1080')).toBe(true);
      // Selects "grips" (characters 5 to 10 of the first line) in the full-size drawing with the mouse.
      const [from, to] = await dialog.locator('[data-station-preview] p', { hasText: firstLine }).first().evaluate((element) => {
        const text = element.firstChild!;
        const characterBox = (at: number) => {
          const range = document.createRange();
          range.setStart(text, at);
          range.setEnd(text, at + 1);
          return range.getBoundingClientRect();
        };
        const first = characterBox(5);
        const last = characterBox(9);
        return [{ x: first.left + 1, y: first.top + first.height / 2 }, { x: last.right - 1, y: last.top + last.height / 2 }];
      });
      await educator.mouse.move(from!.x, from!.y);
      await educator.mouse.down();
      await educator.mouse.move(to!.x, to!.y, { steps: 5 });
      await educator.mouse.up();
      await dialog.getByText('Selected for a comment: “grips”').waitFor();
      await expectAccessible(educator, 'full-size preview on the review page, words selected');
      await dialog.getByRole('button', { name: 'Write the comment' }).click();
      await dialog.waitFor({ state: 'detached' });
      // "grips" runs from character 5 to 10 of the panel's first line.
      await eventually(() => educator.locator('[data-comment-range]').first().getAttribute('data-comment-range')).toBe('5-10');
    } finally {
      await educatorContext.close();
    }
  });
});

describe('every wrong widget setting at once', () => {
  it('shows a wrong mass and kinetic friction above static each at its own field, as the server’s check reports them', async () => {
    const storyId = await storyWith('Two wrong settings', { type: 'doc', content: [paragraph(firstLine), slope('wrong-slope')] });
    await openEditor(storyId);
    await curator.locator('.mp-widget-node-handle').click();
    const field = (label: string) => curator.getByRole('textbox', { name: label });
    await field('Mass').fill('0');
    await field('Kinetic (sliding) friction coefficient μk').fill('0.9');
    const messageOf = async (label: string) => {
      const ids = ((await field(label).getAttribute('aria-describedby')) ?? '').split(' ').filter(Boolean);
      return (await Promise.all(ids.map((id) => curator.locator(`[id="${id}"]`).textContent()))).join(' ');
    };
    await eventually(() => field('Mass').getAttribute('aria-invalid')).toBe('true');
    await eventually(() => field('Kinetic (sliding) friction coefficient μk').getAttribute('aria-invalid')).toBe('true');
    expect(await messageOf('Mass')).toContain('Mass must be a number more than 0 kg');
    expect(await messageOf('Kinetic (sliding) friction coefficient μk')).toContain('cannot be more than static friction μs (0.6)');
    await expectAccessible(curator, 'widget settings with two wrong settings');

    const login = await fetch(`${baseUrl}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email: 'curator@demo.test', password: demoPassword }) });
    const { accessToken } = (await login.json()) as { accessToken: string };
    const checked = await fetch(`${baseUrl}/api/widgets/validate`, {
      method: 'POST',
      headers: { Authorization: `Bearer ${accessToken}`, 'Content-Type': 'application/json' },
      body: JSON.stringify({ type: 'slope-force', params: { ...slopeParams, massKg: 0, kineticFriction: 0.9 } }),
    });
    expect(checked.status).toBe(422);
    const body = (await checked.json()) as { errors: { path: string[] }[] };
    expect(body.errors.map((error) => error.path.join('.'))).toEqual(['params.massKg', 'params.kineticFriction']);
  });
});
