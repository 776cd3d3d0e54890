import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import type { GalleryView, Page as ListPage, ReleaseView } from '@mantlepiece/shared';
import { apiAs, baseUrl, launchBrowser, newContext, signIn } from '../support/browser';
import { axeFindings, tabLandsOnSentinel, type AxeFinding } from '../support/axe';
import { solidPng } from '../support/images';

// axe-core with the WCAG 2.2 AA tags on every studio screen each demo role reaches (server/src/seed),
// every dialog open, and the kiosk's screens. The kiosk's one allowed finding is its zoom lock
// (meta-viewport, WCAG 1.4.4): a gallery screen is touched by passers-by, a pinch would strand the
// next visitor in a zoomed page, and the kiosk's own Larger text switch gives the bigger type instead.
const KIOSK_ALLOWED = ['meta-viewport'] as const;
const GALLERY = 'Moving Plates Hall';
const suffix = Math.random().toString(36).slice(2, 7);
// A role's whole round of pages, dialogs and axe runs, on a machine shared with other suites.
const ROUND = 480_000;

let browser: Browser;
let storyId: number;
let revisionId: number;
let mediaId: number;
let stationId: number;
let gallery: GalleryView;

function report(where: string, findings: AxeFinding[]): string {
  return `${where}: ${findings.map((finding) => `\n  ${finding.rule} (${finding.impact}):${finding.nodes.map((node) => `\n    ${node}`).join('')}`).join('')}`;
}

/** Nothing axe counts as a WCAG 2.2 AA failure on the page as it stands, and Tab never rests on a focus sentinel. */
async function expectAccessible(page: Page, where: string, allowedRules: readonly string[] = []): Promise<void> {
  const findings = await axeFindings(page, { allowedRules });
  expect(findings, report(where, findings)).toEqual([]);
}

/** Waits until a studio page has drawn its content: its heading is there and nothing is still loading. */
async function settled(page: Page): Promise<void> {
  await page.locator('main h1').first().waitFor();
  await page.waitForLoadState('networkidle');
  await page.locator('[role="progressbar"][aria-busy="true"], .fui-Spinner').first().waitFor({ state: 'detached', timeout: 15_000 }).catch(() => undefined);
}

async function visit(page: Page, path: string): Promise<void> {
  await page.goto(path);
  await settled(page);
  await expectAccessible(page, path);
}

/** Opens a dialog with `opener`, checks it open, closes it with Escape and checks the page it leaves. */
async function throughDialog(page: Page, where: string, opener: Locator): Promise<void> {
  await opener.click();
  const dialog = page.locator('[role="dialog"], [role="alertdialog"]').last();
  await dialog.waitFor();
  await expectAccessible(page, `${where}, dialog “${(await dialog.getAttribute('aria-label')) ?? (await dialog.locator('h2').first().textContent())}” open`);
  await page.keyboard.press('Escape');
  await closed(page, dialog);
  await expectAccessible(page, `${where}, after the dialog closed`);
}

/**
 * Waits until a dialog is gone and the page is given back: Fluent's focus manager (Tabster) lifts
 * aria-hidden from the page a moment after the dialog is gone, not in the same frame.
 */
async function closed(page: Page, dialog: Locator): Promise<void> {
  await dialog.waitFor({ state: 'detached' });
  await page.locator('#root:not([aria-hidden])').waitFor({ timeout: 5_000 });
}

async function asRole(email: string, steps: (page: Page) => Promise<void>): Promise<void> {
  const context: BrowserContext = await newContext(browser);
  try {
    const page = await context.newPage();
    await signIn(page, email);
    await settled(page);
    await expectAccessible(page, `${email} home`);
    await steps(page);
    expect(await tabLandsOnSentinel(page), 'Tab rested on a Tabster focus sentinel').toBe(false);
  } finally {
    await context.close();
  }
}

beforeAll(async () => {
  const asCurator = await apiAs('curator@demo.test');
  const asAdmin = await apiAs('admin@demo.test');
  // A draft of this suite's own, with a panel, so the editor shows its toolbar and every action.
  storyId = (await asCurator<{ id: number }>('POST', '/stories', { title: `Axe check ${suffix}`, audience: 'family' })).id;
  const doc = { type: 'doc', content: [{ type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'Rock that flows' }] }, { type: 'paragraph', content: [{ type: 'text', text: 'Hot rock rises slowly, a few centimetres a year.' }] }] };
  await asCurator('POST', `/stories/${storyId}/panels`, { doc, position: 0, wordBudget: 60 });
  // A second story, submitted, for the educator's revision page.
  const submitted = (await asCurator<{ id: number }>('POST', '/stories', { title: `Axe review ${suffix}`, audience: 'family' })).id;
  await asCurator('POST', `/stories/${submitted}/panels`, { doc, position: 0, wordBudget: 60 });
  revisionId = (await asCurator<{ revisionId: number }>('POST', `/stories/${submitted}/submit`, {})).revisionId;
  // An image of this suite's own that no panel shows, so its page offers Delete.
  const upload = new FormData();
  upload.append('file', new Blob([new Uint8Array(solidPng(64, 48, [Math.floor(Math.random() * 256), 96, 160]))], { type: 'image/png' }), `axe-${suffix}.png`);
  mediaId = (await asCurator<{ id: number }[]>('POST', '/media', upload))[0]!.id;
  gallery = (await asAdmin<ListPage<GalleryView>>('GET', '/galleries?pageSize=100')).items.find((candidate) => candidate.name === GALLERY)!;
  stationId = (await asAdmin<{ id: number }>('POST', '/stations', { galleryId: gallery.id, name: `Axe Bench ${suffix}`, screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1100 })).id;
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('every studio screen meets WCAG 2.2 AA as axe-core checks it', () => {
  it('as a curator: stories, the editor with its dialogs and menus, media, reviews, insights, notifications, widgets', async () => {
    await asRole('curator@demo.test', async (page) => {
      await visit(page, '/stories');
      await throughDialog(page, '/stories', page.getByRole('button', { name: 'New story' }));
      await visit(page, `/stories/${storyId}`);
      const where = `/stories/${storyId}`;
      await page.getByRole('toolbar').waitFor();
      await page.locator('.ProseMirror').first().click();
      await expectAccessible(page, `${where}, editing`);
      await throughDialog(page, where, page.getByRole('button', { name: 'Link' }));
      await throughDialog(page, where, page.getByRole('button', { name: 'Image' }));
      await page.getByRole('button', { name: 'Widget' }).first().click();
      await page.getByRole('menu').waitFor();
      await expectAccessible(page, `${where}, widget menu open`);
      await page.keyboard.press('Escape');
      await throughDialog(page, where, page.getByRole('button', { name: 'Submit for review' }));
      await throughDialog(page, where, page.getByRole('button', { name: 'Delete panel' }).first());
      await page.getByRole('link', { name: 'Back to stories' }).click();
      await page.waitForURL(/\/stories$/);
      await visit(page, '/media');
      await visit(page, `/media/${mediaId}`);
      await throughDialog(page, `/media/${mediaId}`, page.getByRole('button', { name: 'Delete image' }));
      for (const path of ['/reviews', '/insights', '/notifications', '/widgets']) await visit(page, path);
    });
  }, ROUND);

  it('as an educator: the review queue, a revision, stories, insights', async () => {
    await asRole('educator@demo.test', async (page) => {
      for (const path of ['/reviews', `/reviews/${revisionId}`, '/stories', `/stories/${storyId}`, '/insights', '/notifications', '/widgets']) await visit(page, path);
    });
  }, ROUND);

  it('as a translator: the worklist and a translation workspace', async () => {
    await asRole('translator@demo.test', async (page) => {
      await visit(page, '/translations');
      await page.locator('[data-worklist-locale="fr"]').first().getByRole('link', { name: /into French$/ }).click();
      await settled(page);
      await expectAccessible(page, 'translation workspace');
      await page.getByRole('textbox', { name: /^Translation \(French\)/ }).first().waitFor();
      await expectAccessible(page, 'translation workspace, a unit open');
      await visit(page, '/notifications');
    });
  }, ROUND);

  it('as a technician: releases with a build and its dialogs, stations, fleet, insights', async () => {
    await asRole('technician@demo.test', async (page) => {
      await visit(page, '/releases');
      await page.getByLabel('Gallery', { exact: true }).selectOption({ label: GALLERY });
      await settled(page);
      await expectAccessible(page, `/releases of ${GALLERY}`);
      await page.getByRole('button', { name: 'Build release' }).click();
      const build = page.getByRole('dialog', { name: `Build a release of ${GALLERY}` });
      // Judged once the server's preview has come and Build is offered, and the dialog has stopped fading in.
      await build.getByRole('button', { name: 'Build', exact: true, disabled: false }).waitFor();
      await settled(page);
      await expectAccessible(page, '/releases, build dialog open');
      await build.getByRole('button', { name: 'Build', exact: true }).click();
      await closed(page, build);
      await expectAccessible(page, '/releases, a build running');
      await page.getByText(/is Ready with \d+ stor/).waitFor({ timeout: 30_000 });
      await expectAccessible(page, '/releases, a build ready');
      await throughDialog(page, '/releases', page.getByRole('button', { name: 'Publish…' }).first());
      const rollBack = page.getByRole('button', { name: /^Roll back to Release \d+$/ }).first();
      if (await rollBack.count()) await throughDialog(page, '/releases', rollBack);
      const releases = await (await apiAs('technician@demo.test'))<ListPage<ReleaseView>>('GET', `/galleries/${gallery.id}/releases?pageSize=2`);
      await visit(page, `/releases/compare?a=${releases.items[1]!.id}&b=${releases.items[0]!.id}`);
      await visit(page, '/stations');
      await visit(page, `/stations/${stationId}`);
      await visit(page, '/fleet');
      await page.locator('tr[data-kiosk-id] a').first().click();
      await settled(page);
      await expectAccessible(page, 'a kiosk on the Fleet page');
      const revoke = page.getByRole('button', { name: 'Revoke…' });
      if (await revoke.count()) await throughDialog(page, 'a kiosk on the Fleet page', revoke);
      for (const path of ['/insights', '/notifications', '/widgets']) await visit(page, path);
    });
  }, ROUND);

  it('as an admin: people, settings, the audit trail and captured mail, with their dialogs', async () => {
    await asRole('admin@demo.test', async (page) => {
      await visit(page, '/people');
      await throughDialog(page, '/people', page.getByRole('button', { name: 'Invite someone' }));
      await throughDialog(page, '/people', page.getByRole('button', { name: /^Edit / }).first());
      await throughDialog(page, '/people', page.getByRole('button', { name: 'Deactivate' }).first());
      await visit(page, '/settings');
      for (const tab of ['Venues', 'Galleries', 'Stations', 'Exhibits']) {
        await page.getByRole('tab', { name: tab }).click();
        await settled(page);
        await expectAccessible(page, `/settings, ${tab}`);
        await throughDialog(page, `/settings, ${tab}`, page.getByRole('button', { name: /^Add / }));
        await throughDialog(page, `/settings, ${tab}`, page.getByRole('button', { name: /^Edit / }).first());
        await throughDialog(page, `/settings, ${tab}`, page.getByRole('button', { name: /^Delete / }).first());
      }
      for (const path of ['/audit', '/dev/mail', '/translations', '/releases', '/fleet', '/stories']) await visit(page, path);
    });
  }, ROUND);
});

describe('what the studio shows for a moment meets WCAG 2.2 AA too', () => {
  it('the Undo toast after deleting a panel, and the search box with hits and with nothing found', async () => {
    const asCurator = await apiAs('curator@demo.test');
    const story = (await asCurator<{ id: number }>('POST', '/stories', { title: `Axe undo ${suffix}`, audience: 'family' })).id;
    for (const text of ['Plates move.', 'Ridges push.']) {
      await asCurator('POST', `/stories/${story}/panels`, { doc: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] }, wordBudget: 60 });
    }
    await asRole('curator@demo.test', async (page) => {
      await visit(page, `/stories/${story}`);
      await page.getByRole('button', { name: 'Delete panel' }).first().click();
      await page.getByRole('alertdialog').getByRole('button', { name: 'Delete panel' }).click();
      const toast = page.locator('[data-undo-toast]');
      await toast.waitFor();
      await expectAccessible(page, `/stories/${story}, Undo toast showing`);
      await toast.getByRole('button', { name: 'Undo' }).click();
      await page.locator('.fui-Toast').filter({ hasText: 'Restored.' }).waitFor();
      await expectAccessible(page, `/stories/${story}, Restored toast showing`);

      const search = page.getByRole('searchbox', { name: 'Search stories, media and people' });
      await search.fill(`axe undo ${suffix}`);
      await page.locator('[data-search-results] [data-search-kind]').first().waitFor();
      await expectAccessible(page, 'search results open');
      await search.fill(`zz${suffix}qq`);
      await page.locator('[data-search-results]').getByText(`Nothing found for “zz${suffix}qq”.`).waitFor();
      await expectAccessible(page, 'search saying nothing found');
      await search.press('Escape');
    });
  }, ROUND);
});

describe('the kiosk meets WCAG 2.2 AA but for its zoom lock', () => {
  it('on its pairing screen, its story menu and a panel', async () => {
    const context = await browser.newContext({ baseURL: baseUrl, locale: 'en-GB', viewport: { width: 1920, height: 1080 }, hasTouch: true });
    try {
      const screen = await context.newPage();
      await screen.goto('/kiosk/?poll=1&heartbeat=1');
      const code = screen.locator('[data-pairing-code]');
      await code.waitFor();
      await expectAccessible(screen, 'kiosk pairing screen', KIOSK_ALLOWED);
      const asTechnician = await apiAs('technician@demo.test');
      const releases = await asTechnician<ListPage<ReleaseView>>('GET', `/galleries/${gallery.id}/releases?pageSize=100`);
      if (!releases.items.some((release) => release.state === 'live')) {
        const { id } = await asTechnician<{ id: number }>('POST', `/galleries/${gallery.id}/releases`, {});
        await expect.poll(async () => (await asTechnician<ReleaseView>('GET', `/releases/${id}`)).state, { timeout: 30_000 }).toBe('ready');
        await asTechnician('POST', `/releases/${id}/publish`);
      }
      await asTechnician('POST', `/stations/${stationId}/pair`, { pairingCode: await code.getAttribute('data-pairing-code') });
      await screen.getByRole('button', { name: /Touch to begin/ }).waitFor({ timeout: 30_000 });
      await expectAccessible(screen, 'kiosk attract loop', KIOSK_ALLOWED);
      await screen.getByRole('button', { name: /Touch to begin/ }).tap();
      const story = screen.locator('.story-card-title').first();
      await story.waitFor();
      await expectAccessible(screen, 'kiosk story menu', KIOSK_ALLOWED);
      await story.tap();
      await screen.getByRole('button', { name: 'Next' }).waitFor();
      await expectAccessible(screen, 'kiosk panel', KIOSK_ALLOWED);
    } finally {
      await context.close();
    }
  }, ROUND);
});
