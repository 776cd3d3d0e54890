import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import type { ExhibitView, GalleryView, Page as ListPage, StationView, StoryView, UserView, VenueView } from '@mantlepiece/shared';
import { axeFindings } from '../support/axe';
import { apiAs, atRest, baseUrl, launchBrowser } from '../support/browser';
import { publishedRelease } from '../support/releases';
import { touchDrag } from '../support/touch';

// The seeded demo (server/src/seed): the Basalt Point venue (English, with French and Spanish), its
// Moving Plates Hall and three approved stories. This file adds Arabic, with its own Arabic texts,
// and a station of its own, and puts the venue and translator back after.
const VENUE = 'basalt-point';
const GALLERY = 'Moving Plates Hall';
const SCREENS = { landscape: { width: 1920, height: 1080 }, portrait: { width: 1080, height: 1920 } } as const;
const KIOSK_PATH = '/kiosk/?poll=1&heartbeat=1';
const tag = `layout-${Date.now().toString(36)}`;

// Set SCREENSHOT_DIR to keep a picture of every panel in every orientation, language and text size.
const shots = process.env.SCREENSHOT_DIR;

let browser: Browser;
let context: BrowserContext;
let screen: Page;
let admin: Awaited<ReturnType<typeof apiAs>>;
let technician: Awaited<ReturnType<typeof apiAs>>;
let venue: VenueView;
let translator: UserView;
let station: StationView;
let kioskId: number | undefined;
let locales: string[];
let panelCounts: number[];
/** How many numbers with units the Arabic checks read, so a walk that found none cannot pass unnoticed. */
let arabicQuantities = 0;
/** Whether scrolling by wheel and finger was tried on a long panel in this orientation. */
let scrollingChecked = false;
/** Whether axe-core looked at a widget panel in this orientation. */
let axeChecked = false;
/** Whether a widget's "How do we know?" card was opened and checked in this orientation. */
let modelCardChecked = false;
/** Heights of the words drawn in each panel's widgets at the standard text size, by orientation, language, story and panel. */
const drawnLabelHeights = new Map<string, number[]>();
/** How many drawn labels were compared between the two text sizes, so a walk that found none cannot pass unnoticed. */
let labelsCompared = 0;

const eventually = <T>(read: () => Promise<T> | T, timeout = 15_000) => expect.poll(read, { timeout, interval: 100 });

/** Arabic words to stand in for a text of about the same length, keeping its placeholders where they were. */
const ARABIC_WORDS = ['الصخور', 'تتحرك', 'ببطء', 'تحت', 'قاع', 'البحر', 'والحرارة', 'ترفعها', 'نحو', 'السطح', 'بقوة', '562', 'نيوتن'];
function arabicLike(source: string): string {
  return source
    .split(/(\{\/?\d+\})/)
    .map((part, index) => {
      if (index % 2 === 1 || !/\p{L}/u.test(part)) return part;
      const words: string[] = [];
      while (words.join(' ').length < part.trim().length) words.push(ARABIC_WORDS[(words.length + index) % ARABIC_WORDS.length]!);
      return `${part.startsWith(' ') ? ' ' : ''}${words.join(' ')}${part.endsWith(' ') ? ' ' : ''}`;
    })
    .join('');
}

interface Unit {
  unitId: string;
  source: string;
  version: number;
  status: string;
}

async function translateIntoArabic(asTranslator: Awaited<ReturnType<typeof apiAs>>, storyId: number) {
  const units = (await asTranslator<ListPage<Unit>>('GET', `/stories/${storyId}/translations/ar/units?pageSize=100`)).items;
  for (const unit of units.filter((candidate) => candidate.status !== 'translated')) {
    await asTranslator('PUT', `/stories/${storyId}/translations/ar/units/${encodeURIComponent(unit.unitId)}`, { text: arabicLike(unit.source), version: unit.version });
  }
}

beforeAll(async () => {
  admin = await apiAs('admin@demo.test');
  technician = await apiAs('technician@demo.test');
  venue = (await admin<ListPage<VenueView>>('GET', '/venues?pageSize=100')).items.find((candidate) => candidate.slug === VENUE)!;
  translator = (await admin<ListPage<UserView>>('GET', '/users?q=translator@demo.test')).items[0]!;
  await admin('PATCH', `/venues/${venue.id}`, { targetLocales: [...new Set([...venue.targetLocales, 'ar'])] });
  await admin('PATCH', `/users/${translator.id}`, { locales: [...new Set([...translator.locales, 'ar'])] });
  const asTranslator = await apiAs('translator@demo.test');
  const gallery = (await admin<ListPage<GalleryView>>(`GET`, `/galleries?pageSize=100&venueId=${venue.id}`)).items.find((candidate) => candidate.name === GALLERY)!;
  const exhibits = new Set((await admin<ListPage<ExhibitView>>('GET', '/exhibits?pageSize=100')).items.filter((exhibit) => exhibit.galleryId === gallery.id).map((exhibit) => exhibit.id));
  const stories = (await admin<ListPage<StoryView>>('GET', '/stories?pageSize=100')).items.filter((story) => story.approvedRevision && story.exhibitId !== null && exhibits.has(story.exhibitId));
  for (const story of stories) await translateIntoArabic(asTranslator, story.id);
  const release = await publishedRelease(technician, gallery.id);
  station = await admin<StationView>('POST', '/stations', { galleryId: gallery.id, name: `Layout wall ${tag}`, screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1200 });

  browser = await launchBrowser();
  context = await browser.newContext({ baseURL: baseUrl, locale: 'en-GB', viewport: SCREENS.landscape, hasTouch: true });
  screen = await context.newPage();
  await screen.goto(KIOSK_PATH);
  const code = (await screen.locator('[data-pairing-code]').getAttribute('data-pairing-code'))!;
  kioskId = (await technician<{ kioskId: number }>('POST', `/stations/${station.id}/pair`, { pairingCode: code })).kioskId;
  await screen.getByRole('button', { name: /Touch to begin/ }).waitFor({ timeout: 60_000 });
  const manifest = JSON.parse((await technician<{ manifest: string }>('GET', `/releases/${release.id}/manifest`)).manifest) as { venue: { locales: string[] }; stories: { panels: unknown[] }[] };
  locales = manifest.venue.locales;
  panelCounts = manifest.stories.map((story) => story.panels.length);
  if (shots) await mkdir(shots, { recursive: true });
}, 180_000);

afterAll(async () => {
  await browser?.close();
  if (kioskId !== undefined) await technician('POST', `/kiosks/${kioskId}/revoke`).catch(() => undefined);
  if (station) await admin('DELETE', `/stations/${station.id}`).catch(() => undefined);
  await admin('PATCH', `/users/${translator.id}`, { locales: translator.locales });
  await admin('PATCH', `/venues/${venue.id}`, { targetLocales: venue.targetLocales });
});

/** What is hidden on the screen as it stands: every problem in words, or none. */
function hiddenContent(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const problems: string[] = [];
    const describe = (element: Element) => `${element.tagName.toLowerCase()}${element.className && typeof element.className === 'string' ? `.${element.className.split(' ')[0]}` : ''} "${(element.textContent ?? '').trim().slice(0, 40)}"`;
    const viewport = { left: 0, top: 0, right: window.innerWidth, bottom: window.innerHeight };
    const inside = (box: DOMRect, frame: { left: number; top: number; right: number; bottom: number }, slack = 1) =>
      box.left >= frame.left - slack && box.right <= frame.right + slack && box.top >= frame.top - slack && box.bottom <= frame.bottom + slack;
    const shows = (element: Element) => {
      const box = element.getBoundingClientRect();
      return box.width > 1 && box.height > 1 && getComputedStyle(element).visibility !== 'hidden';
    };

    // The kiosk's own controls: on the glass, whole.
    for (const element of document.querySelectorAll('.story-top, .story-top > *, .turn, .dots, .visitor-bar, .visitor-bar button, .stage')) {
      if (shows(element) && !inside(element.getBoundingClientRect(), viewport)) problems.push(`${describe(element)} runs off the screen`);
    }
    const panel = document.querySelector<HTMLElement>('article.mp-panel');
    const frame = document.querySelector('.mp-panel-frame');
    if (!panel || !frame) return ['no panel on the screen'];
    const panelBox = frame.getBoundingClientRect();
    if (!inside(panelBox, viewport)) problems.push('the panel runs off the screen');

    // A panel longer than its screen must scroll, and say so until the visitor reaches its end.
    const scrolls = panel.scrollHeight > panel.clientHeight + 1;
    if (scrolls) {
      if (!['auto', 'scroll'].includes(getComputedStyle(panel).overflowY)) problems.push('the panel is longer than the screen and does not scroll');
      const atEnd = panel.scrollHeight - panel.scrollTop - panel.clientHeight <= 2;
      const cue = panel.querySelector('.mp-more-below svg');
      if (!atEnd && !(cue && inside(cue.getBoundingClientRect(), panelBox))) problems.push(`${panel.scrollHeight - panel.clientHeight} px below the panel's edge with no cue`);
    }
    if (panel.scrollWidth > panel.clientWidth + 1) problems.push(`the panel is ${panel.scrollWidth - panel.clientWidth} px too wide`);

    for (const element of panel.querySelectorAll('*')) {
      if (element.closest('.mp-more-below') || !shows(element)) continue;
      const box = element.getBoundingClientRect();
      // Sideways nothing may leave the panel; downwards only what the panel scrolls to.
      if (box.left < panelBox.left - 1 || box.right > panelBox.right + 1) problems.push(`${describe(element)} runs past the panel's side`);
      if (!scrolls && box.bottom > panelBox.bottom + 1) problems.push(`${describe(element)} runs past the panel's foot`);
      if (element instanceof HTMLElement && element !== panel) {
        const style = getComputedStyle(element);
        const clips = (value: string) => value === 'hidden' || value === 'clip';
        if ((clips(style.overflowX) && element.scrollWidth > element.clientWidth + 1) || (clips(style.overflowY) && element.scrollHeight > element.clientHeight + 1)) {
          problems.push(`${describe(element)} cuts off its own content`);
        }
      }
    }
    // Labels drawn in a widget stay inside its drawing and clear of each other.
    for (const drawing of panel.querySelectorAll('.mp-widget svg[role]')) {
      const drawingBox = drawing.getBoundingClientRect();
      const labels = [...drawing.querySelectorAll('text')].map((text) => ({ text, box: text.getBoundingClientRect() }));
      for (const { text, box } of labels) if (!inside(box, drawingBox)) problems.push(`drawing label "${text.textContent}" cut at the drawing's edge`);
      labels.forEach((a, index) => {
        for (const b of labels.slice(index + 1)) {
          if (a.box.left < b.box.right && b.box.left < a.box.right && a.box.top < b.box.bottom && b.box.top < a.box.bottom) problems.push(`drawing labels "${a.text.textContent}" and "${b.text.textContent}" overlap`);
        }
      });
    }
    // Widget controls are kiosk controls (WCAG 2.2 2.5.8 asks 24 px; the kiosk keeps 64).
    for (const button of panel.querySelectorAll('.mp-widget button')) {
      const box = button.getBoundingClientRect();
      if (box.width < 64 || box.height < 64) problems.push(`widget control ${describe(button)} is ${Math.round(box.width)}×${Math.round(box.height)} px`);
    }
    return problems;
  });
}

/**
 * The height of every word drawn in the panel's widget drawings, in document order, in the panel's
 * own CSS px: the stage scales the whole panel to the room the visitor bar leaves, and that bar
 * takes two rows in some languages with Larger text.
 */
const labelHeights = (page: Page) =>
  page.locator('article.mp-panel .mp-widget svg[role] text').evaluateAll((texts) => {
    const panel = document.querySelector<HTMLElement>('article.mp-panel')!;
    const stageScale = panel.getBoundingClientRect().width / panel.offsetWidth;
    return texts.map((text) => text.getBoundingClientRect().height / stageScale);
  });

/** How much of the menu the story cards take, across and down, as fractions of the space under its heading. */
function menuCoverage(page: Page): Promise<{ across: number; down: number; cards: number; offScreen: number }> {
  return page.evaluate(() => {
    const list = document.querySelector('.story-cards')!.getBoundingClientRect();
    const menu = document.querySelector('.menu')!.getBoundingClientRect();
    const cards = [...document.querySelectorAll('.story-card')].map((card) => card.getBoundingClientRect());
    const left = Math.min(...cards.map((box) => box.left));
    const right = Math.max(...cards.map((box) => box.right));
    const top = Math.min(...cards.map((box) => box.top));
    const bottom = Math.max(...cards.map((box) => box.bottom));
    return {
      across: (right - left) / list.width,
      down: (bottom - top) / (menu.bottom - list.top),
      cards: cards.length,
      offScreen: cards.filter((box) => box.bottom > menu.bottom + 1 || box.right > window.innerWidth + 1 || box.left < -1).length,
    };
  });
}

const panelScrollTop = () => screen.locator('article.mp-panel').evaluate((panel) => panel.scrollTop);

/** A long panel scrolls under a finger and under a mouse wheel held over its words, and the cue goes at its end. */
async function scrollingProblems(where: string): Promise<string[]> {
  const panel = screen.locator('article.mp-panel');
  const box = (await panel.boundingBox())!;
  const problems: string[] = [];
  const words = (await screen.locator('.mp-panel-text').count()) ? screen.locator('.mp-panel-text') : panel;
  const over = (await words.boundingBox())!;
  await screen.mouse.move(over.x + over.width / 2, over.y + Math.min(over.height / 2, box.height / 2));
  await screen.mouse.wheel(0, 400);
  await eventually(panelScrollTop).toBeGreaterThan(0).catch(() => problems.push(`${where}: a mouse wheel over the words does not scroll the panel`));
  await panel.evaluate((element) => element.scrollTo({ top: 0, behavior: 'instant' }));
  // In the panel's margin, where no widget takes the finger for itself.
  await touchDrag(screen, { x: box.x + 20, y: box.y + box.height * 0.8 }, { x: box.x + 25, y: box.y + box.height * 0.3 });
  await eventually(panelScrollTop).toBeGreaterThan(0).catch(() => problems.push(`${where}: a finger does not scroll the panel`));
  await panel.evaluate((element) => element.scrollTo({ top: element.scrollHeight, behavior: 'instant' }));
  await eventually(() => screen.locator('.mp-more-below').count()).toBe(0).catch(() => problems.push(`${where}: the cue stays at the panel's end`));
  await panel.evaluate((element) => element.scrollTo({ top: 0, behavior: 'instant' }));
  return problems;
}

/** The first widget's model card opened by a finger: nothing hidden with it open, axe-core has nothing to say, and it closes again. */
async function modelCardProblems(where: string): Promise<string[]> {
  const card = screen.locator('.mp-model-card').first();
  await card.locator('summary').tap();
  await eventually(() => card.evaluate((details) => (details as HTMLDetailsElement).open)).toBe(true);
  await card.locator('[data-model-card="sources"]').scrollIntoViewIfNeeded();
  await atRest(screen);
  if (shots) await screen.screenshot({ path: join(shots, `${where.replace(/[^\w]+/g, '-')}-model-card.png`) });
  const problems = [
    ...(await hiddenContent(screen)).map((problem) => `${where}, model card open: ${problem}`),
    ...(await axeFindings(screen, { allowedRules: ['meta-viewport'] })).map((finding) => `${where}, model card open: axe ${finding.rule} on ${finding.nodes.join(', ').slice(0, 200)}`),
  ];
  await card.locator('summary').tap();
  await eventually(() => card.evaluate((details) => (details as HTMLDetailsElement).open)).toBe(false);
  await screen.locator('article.mp-panel').evaluate((panel) => panel.scrollTo({ top: 0, behavior: 'instant' }));
  return problems;
}

/** The visitor's Larger text switch, found by place, as its name changes with the language. */
/**
 * What reads out of order or overlaps in a right-to-left story: the arrows must point the way it
 * reads (next on the left, pointing left), a number and its unit must keep their order inside the
 * Arabic (the digits left of "N" or "°"), and a widget's words must not sit on each other.
 */
function rightToLeftProblems(page: Page): Promise<{ problems: string[]; quantities: number }> {
  return page.evaluate(() => {
    const problems: string[] = [];
    let quantities = 0;
    const story = document.querySelector('.story');
    if (story?.getAttribute('dir') !== 'rtl') problems.push('the story is not right to left');
    const [previous, next] = [...document.querySelectorAll('.turn')];
    if (previous && next) {
      if (next.getBoundingClientRect().right > previous.getBoundingClientRect().left) problems.push('“next” is not on the left of “previous”');
      // Each chevron is drawn pointing right; in Arabic the one for “next” must be mirrored to point left, outward.
      const mirrored = (button: Element) => new DOMMatrix(getComputedStyle(button.querySelector('.arrow')!).transform === 'none' ? undefined : getComputedStyle(button.querySelector('.arrow')!).transform).a < 0;
      if (!mirrored(next) || !mirrored(previous)) problems.push('an arrow points against the reading direction');
      const nextTip = next.querySelector('.arrow path')!.getBoundingClientRect();
      const nextBox = next.getBoundingClientRect();
      if (nextTip.left - nextBox.left > nextBox.right - nextTip.right) problems.push('the “next” arrow points inward');
    }
    // A number with its unit, in HTML: the first digit's box left of the unit's last character.
    const characterBox = (node: Text, index: number) => {
      const range = document.createRange();
      range.setStart(node, index);
      range.setEnd(node, index + 1);
      return range.getBoundingClientRect();
    };
    for (const element of document.querySelectorAll('article.mp-panel .mp-live-value, article.mp-panel bdi')) {
      const text = element.textContent ?? '';
      const match = /^(\d[\d.,\u00a0 ]*)\u00a0?(\S*)$/u.exec(text.trim());
      if (!match || !match[2]) continue;
      const node = [...element.childNodes].find((child): child is Text => child.nodeType === Node.TEXT_NODE);
      if (!node) continue;
      quantities += 1;
      const first = characterBox(node, node.data.search(/\d/));
      const last = characterBox(node, node.data.trimEnd().length - 1);
      if (first.left >= last.left) problems.push(`“${text}” reads out of order`);
    }
    // The same in the drawings' SVG labels, by where the browser put each character.
    for (const label of document.querySelectorAll<SVGTextElement>('article.mp-panel svg text')) {
      const text = label.textContent ?? '';
      const digit = text.search(/\d/);
      const degree = text.indexOf('°');
      if (digit < 0 || degree < 0) continue;
      quantities += 1;
      if (label.getStartPositionOfChar(digit).x >= label.getStartPositionOfChar(degree).x) problems.push(`drawing label “${text}” reads out of order`);
    }
    // A widget's own words (state, force key, instructions, buttons) each keep their own space.
    for (const widget of document.querySelectorAll('article.mp-panel .mp-widget')) {
      const parts = [...widget.querySelectorAll('[role="status"], li, figcaption, button')].map((part) => ({ part, box: part.getBoundingClientRect() }));
      parts.forEach((a, index) => {
        for (const b of parts.slice(index + 1)) {
          if (a.part.contains(b.part) || b.part.contains(a.part)) continue;
          if (a.box.left < b.box.right - 1 && b.box.left < a.box.right - 1 && a.box.top < b.box.bottom - 1 && b.box.top < a.box.bottom - 1) problems.push(`“${a.part.textContent?.slice(0, 30)}” and “${b.part.textContent?.slice(0, 30)}” overlap`);
        }
      });
    }
    return { problems, quantities };
  });
}

async function setLargerText(on: boolean) {
  const toggle = screen.locator('.switches [role="switch"]').first();
  if ((await toggle.getAttribute('aria-checked')) !== String(on)) await toggle.tap();
  await eventually(() => screen.locator('.player').getAttribute('data-large-text')).toBe(on ? 'true' : null);
}

/** Every panel of every story in the current orientation, language and text size; the screen ends on the menu. */
async function walkPanels(label: string): Promise<string[]> {
  const problems: string[] = [];
  for (const [storyIndex, count] of panelCounts.entries()) {
    await screen.locator('.story-card').nth(storyIndex).tap();
    for (let panel = 1; panel <= count; panel++) {
      await screen.locator('.position').filter({ hasText: new RegExp(`${panel}\\D+${count}`) }).waitFor();
      await screen.locator('article.mp-panel').waitFor();
      // Pictures and fonts settle before anything is measured.
      await screen.waitForFunction(() => document.fonts.status === 'loaded' && [...document.querySelectorAll('article.mp-panel img')].every((image) => (image as HTMLImageElement).complete));
      await atRest(screen);
      const where = `${label}, story ${storyIndex + 1} panel ${panel}`;
      if (shots) await screen.screenshot({ path: join(shots, `${where.replace(/[^\w]+/g, '-')}.png`) });
      problems.push(...(await hiddenContent(screen)).map((problem) => `${where}: ${problem}`));
      // Words drawn in a widget follow Larger text as the panel's words do (drawn 1.35 times as large, panel-theme's LARGE_TEXT_SCALE).
      const heights = await labelHeights(screen);
      const sameScreen = `${label.replace(/, (larger|standard) text$/, '')}, story ${storyIndex + 1} panel ${panel}`;
      if (label.endsWith('standard text')) drawnLabelHeights.set(sameScreen, heights);
      else {
        const standard = drawnLabelHeights.get(sameScreen) ?? [];
        if (standard.length !== heights.length) problems.push(`${where}: ${heights.length} drawn labels, ${standard.length} at the standard size`);
        heights.forEach((height, index) => {
          labelsCompared += 1;
          if (height < standard[index]! * 1.2) problems.push(`${where}: drawn label ${index + 1} is ${height.toFixed(1)} px high, ${standard[index]!.toFixed(1)} px at the standard size`);
        });
      }
      // axe-core on a widget panel in Arabic with larger text, once per orientation; the kiosk's zoom lock is its one allowed finding.
      if (!axeChecked && label.endsWith(', ar, larger text') && (await screen.locator('.mp-widget').count())) {
        axeChecked = true;
        const findings = await axeFindings(screen, { allowedRules: ['meta-viewport'] });
        problems.push(...findings.map((finding) => `${where}: axe ${finding.rule} on ${finding.nodes.join(', ').slice(0, 200)}`));
      }
      // A widget's "How do we know?" card, opened as a visitor opens it, in Arabic with larger text.
      if (!modelCardChecked && label.endsWith(', ar, larger text') && (await screen.locator('.mp-model-card').count())) {
        modelCardChecked = true;
        problems.push(...(await modelCardProblems(where)));
      }
      if (!scrollingChecked && (await screen.locator('.mp-more-below').count())) {
        scrollingChecked = true;
        problems.push(...(await scrollingProblems(where)));
      }
      if (label.includes(', ar,')) {
        const rightToLeft = await rightToLeftProblems(screen);
        arabicQuantities += rightToLeft.quantities;
        problems.push(...rightToLeft.problems.map((problem) => `${where}: ${problem}`));
      }
      if (panel < count) await screen.locator('.turn').nth(1).tap();
    }
    await screen.locator('.back-to-menu').tap();
    await screen.locator('.story-cards').waitFor();
  }
  return problems;
}

describe('every demo panel on the kiosk, in every orientation, language and text size', () => {
  it.each(Object.keys(SCREENS) as (keyof typeof SCREENS)[])('hides nothing in %s: what is longer than the screen scrolls, with a cue', async (orientation) => {
    await screen.setViewportSize(SCREENS[orientation]);
    if (await screen.getByRole('button', { name: /Touch to begin/ }).isVisible()) await screen.getByRole('button', { name: /Touch to begin/ }).tap();
    await screen.locator('.story-cards').waitFor();
    scrollingChecked = false;
    axeChecked = false;
    modelCardChecked = false;
    const problems: string[] = [];
    for (const locale of locales) {
      await screen.locator(`.languages button[lang="${locale}"]`).tap();
      await eventually(() => screen.locator('.player').getAttribute('lang')).toBe(locale);
      for (const larger of [false, true]) {
        await setLargerText(larger);
        const label = `${orientation}, ${locale}, ${larger ? 'larger text' : 'standard text'}`;
        if (shots) await screen.screenshot({ path: join(shots, `${label.replace(/[^\w]+/g, '-')}-menu.png`) });
        // The menu's cards share out its whole space: across the screen and down to the visitor bar.
        const menu = await menuCoverage(screen);
        if (menu.across < 0.95 || menu.down < 0.85 || menu.offScreen > 0) problems.push(`${label}, menu: ${JSON.stringify(menu)}`);
        problems.push(...(await walkPanels(label)));
      }
      await setLargerText(false);
    }
    expect(problems).toEqual([]);
    expect(scrollingChecked, 'no panel was long enough to try scrolling').toBe(true);
    expect(axeChecked, 'axe-core saw no widget panel').toBe(true);
    expect(labelsCompared, 'no drawn label was compared between the text sizes').toBeGreaterThan(0);
    expect(modelCardChecked, 'no "How do we know?" card was opened').toBe(true);
  }, 600_000);

  it('read numbers with their units in order in Arabic, on the drawings and in the text', () => {
    expect(locales).toContain('ar');
    expect(arabicQuantities).toBeGreaterThan(0);
  });
});
