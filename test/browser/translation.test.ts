import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, demoPassword, launchBrowser, newContext, signIn } from '../support/browser.js';

let browser: Browser;
let page: Page;

/** Waits for a state the page reaches by itself (a save, a refetched preview), without a fixed sleep. */
const eventually = <T>(read: () => Promise<T> | T) => expect.poll(read, { timeout: 15_000, interval: 100 });

// A mark per run, so the preview can only show this run's words.
const mark = `[fr ${Date.now().toString(36)}]`;

const editor = () => page.locator('[data-unit-editor]');
const editorUnitId = () => editor().getAttribute('data-unit-editor');

/** The source as the translator reads it, placeholders as their `{n}` tokens (each chip carries its token). */
const sourceDisplay = (source: Locator) =>
  source.evaluate((element) =>
    [...element.querySelectorAll('p > span')].map((span) => (span as HTMLElement).dataset.placeholder ?? span.textContent ?? '').join(''),
  );

beforeAll(async () => {
  browser = await launchBrowser();
  page = await (await newContext(browser)).newPage();
  await signIn(page, 'translator@demo.test');
});
afterAll(() => browser?.close());

describe('a translator takes a demo story into French', () => {
  it('finds the story in French on the worklist, with only their locales', async () => {
    await page.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Translations' }).click();
    await page.getByRole('heading', { level: 1, name: 'Translations' }).waitFor();
    await page.locator('[data-worklist-locale]').first().waitFor();
    const locales = await page.locator('[data-worklist-locale]').evaluateAll((rows) => [...new Set(rows.map((row) => row.getAttribute('data-worklist-locale')))]);
    expect(locales.sort()).toEqual(['es', 'fr']);
    await page.locator('[data-worklist-locale="fr"]').first().getByRole('link', { name: /into French$/ }).click();
    await page.getByRole('heading', { level: 1, name: /· French$/ }).waitFor();
  });

  it('translates every unit of the first panel with its placeholders kept, saving with Ctrl+Enter', async () => {
    await page.locator('[data-unit-row]').first().waitFor();
    const firstPanelRows = page.locator('[data-unit-row]').filter({ has: page.locator('td:first-child', { hasText: /^1$/ }) });
    const unitIds = await firstPanelRows.evaluateAll((rows) => rows.map((row) => row.getAttribute('data-unit-row')));
    expect(unitIds.length, 'units on panel 1').toBeGreaterThan(0);
    await page.locator(`[data-unit-row="${unitIds[0]}"] button`).click();
    for (const [index, unitId] of unitIds.entries()) {
      await eventually(editorUnitId).toBe(unitId);
      const source = await sourceDisplay(editor().locator('[data-unit-source]'));
      const field = editor().getByRole('textbox', { name: /^Translation \(French\)/ });
      await field.fill(`${mark} ${index + 1} ${source}`);
      expect(await editor().locator('[data-use="missing"], [data-use="repeated"]').count(), 'placeholders not placed once').toBe(0);
      await field.press('Control+Enter');
      await eventually(() => page.locator(`[data-unit-row="${unitId}"]`).getAttribute('data-unit-status')).toBe('translated');
    }
  });

  /** A unit of panel 1: the story's title, a unit too, is listed first and has no panel. */
  const firstPanelRow = () => page.locator('[data-unit-row]').filter({ has: page.locator('td:first-child', { hasText: /^1$/ }) }).first();

  it('shows the panel in French as the kiosk draws it, left to right', async () => {
    await firstPanelRow().locator('button').click();
    const preview = page.locator('[data-translation-preview="fr"]');
    await eventually(() => preview.locator('article.mp-panel').getAttribute('lang')).toBe('fr');
    await eventually(() => preview.locator('article.mp-panel').textContent()).toContain(`${mark} 1`);
    expect(await preview.locator('article.mp-panel').getAttribute('dir')).toBe('ltr');
  });

  it('keeps the translation after a reload', async () => {
    await page.reload();
    await page.locator('[data-unit-row]').first().waitFor();
    await eventually(() => firstPanelRow().getAttribute('data-unit-status')).toBe('translated');
    await firstPanelRow().locator('button').click();
    await eventually(() => editor().getByRole('textbox', { name: /^Translation \(French\)/ }).inputValue()).toContain(mark);
  });
});

describe('the translator brings an XLIFF file back', () => {
  /** The workspace's story id and the XLIFF export of it in French, fetched as the translator. */
  async function exportedFile(): Promise<{ storyId: number; xml: string }> {
    const storyId = Number(new URL(page.url()).pathname.split('/')[2]);
    const login = await fetch(`${baseUrl}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email: 'translator@demo.test', password: demoPassword }) });
    const { accessToken } = (await login.json()) as { accessToken: string };
    const res = await fetch(`${baseUrl}/api/stories/${storyId}/translations/fr/xliff`, { headers: { Authorization: `Bearer ${accessToken}` } });
    expect(res.status).toBe(200);
    return { storyId, xml: await res.text() };
  }
  const uploadFile = (xml: string) =>
    page.locator('[data-testid="xliff-file-input"]').setInputFiles({ name: 'story.fr.xlf', mimeType: 'application/xliff+xml', buffer: Buffer.from(xml) });

  it('imports a target over its length budget and lists it, a link that opens the unit with the budget warning', async () => {
    const { xml } = await exportedFile();
    // The first unit whose target has no inline codes, its target made far longer than any budget.
    const long = `${mark} ${'une phrase bien trop longue pour cet écran, '.repeat(12).trim()}`;
    const units = xml.split('<unit ');
    const index = units.findIndex((unit, i) => i > 0 && /<target>[^<]*<\/target>/.test(unit));
    expect(index, 'a translated unit without inline codes in the export').toBeGreaterThan(0);
    const unitId = /^id="([^"]+)"/.exec(units[index]!)?.[1];
    units[index] = units[index]!.replace(/<target>[^<]*<\/target>/, `<target>${long}</target>`);
    const edited = units.join('<unit ');
    await uploadFile(edited);
    const warning = page.locator(`[data-xliff-warnings] [data-xliff-warning="${unitId}"]`);
    await warning.waitFor();
    await warning.getByRole('link').click();
    await eventually(editorUnitId).toBe(unitId);
    await eventually(() => editor().getByRole('textbox', { name: /^Translation \(French\)/ }).inputValue()).toBe(long);
    await editor().locator('[data-budget-over]').waitFor();
  });

  it('refuses a file from another story whole, saying so', async () => {
    const { storyId, xml } = await exportedFile();
    await uploadFile(xml.replace(`original="story/${storyId}"`, 'original="story/999999"'));
    const problems = page.locator('[data-xliff-problems]');
    await problems.waitFor();
    expect(await problems.textContent()).toContain('"story/999999": it was exported from another story');
  });
});
