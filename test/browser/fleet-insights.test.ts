import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import type { FleetPage, GalleryView, InsightsView, Page as ListPage, ReleaseView } from '@mantlepiece/shared';
import { baseUrl, demoPassword, launchBrowser, newContext, signIn } from '../support/browser';

// The seeded demo (server/src/seed): one gallery whose stories are approved and releasable.
const GALLERY = 'Moving Plates Hall';
const WIDGET_STORY = 'Sliding Off the Ridge';
// Heartbeats, manifest polls and event uploads every 2 s, so the test waits on states, not minutes.
const KIOSK_PATH = '/kiosk/?heartbeat=2&upload=2&poll=2';

let browser: Browser;
let studio: Page;
let kioskContext: BrowserContext;
let screen: Page;
const tokens: Record<'admin' | 'technician', string> = { admin: '', technician: '' };
let gallery: GalleryView;
let stationName: string;
let kioskId: number;
let liveRelease: { id: number; number: number };

async function call<T>(as: keyof typeof tokens, method: string, path: string, body?: unknown): Promise<T> {
  const response = await fetch(`${baseUrl}/api${path}`, {
    method,
    headers: { Authorization: `Bearer ${tokens[as]}`, ...(body === undefined ? {} : { 'Content-Type': 'application/json' }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${await response.text()}`);
  return (await response.json()) as T;
}

async function signInToken(email: string): Promise<string> {
  const response = await fetch(`${baseUrl}/api/auth/login`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password: demoPassword }) });
  return ((await response.json()) as { accessToken: string }).accessToken;
}

/** The gallery's Live release, built and published through the API when there is none yet. */
async function ensureLiveRelease(): Promise<{ id: number; number: number }> {
  const releases = await call<ListPage<ReleaseView>>('technician', 'GET', `/galleries/${gallery.id}/releases?pageSize=100`);
  const live = releases.items.find((release) => release.state === 'live');
  if (live) return live;
  const { id } = await call<{ id: number }>('technician', 'POST', `/galleries/${gallery.id}/releases`, {});
  await expect.poll(async () => (await call<ReleaseView>('technician', 'GET', `/releases/${id}`)).state, { timeout: 30_000 }).toBe('ready');
  return call<ReleaseView>('technician', 'POST', `/releases/${id}/publish`);
}

/** Today's figures for the demo gallery, as the API gives them. */
const insightsNow = () => call<InsightsView>('technician', 'GET', `/insights?galleryId=${gallery.id}`);

beforeAll(async () => {
  tokens.admin = await signInToken('admin@demo.test');
  tokens.technician = await signInToken('technician@demo.test');
  gallery = (await call<ListPage<GalleryView>>('admin', 'GET', '/galleries?pageSize=100')).items.find((candidate) => candidate.name === GALLERY)!;
  // A station of this suite's own, so pairing here replaces no kiosk another suite set up.
  stationName = `Fleet Watch Bench ${Math.random().toString(36).slice(2, 6)}`;
  const station = await call<{ id: number }>('admin', 'POST', '/stations', { galleryId: gallery.id, name: stationName, screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1100 });

  browser = await launchBrowser();
  studio = await (await newContext(browser)).newPage();
  await signIn(studio, 'technician@demo.test');
  kioskContext = await browser.newContext({ baseURL: baseUrl, locale: 'en-GB', viewport: { width: 1920, height: 1080 }, hasTouch: true });
  screen = await kioskContext.newPage();

  // Every test below meets a kiosk paired at the suite's station and playing the gallery's Live release.
  liveRelease = await ensureLiveRelease();
  await screen.goto(KIOSK_PATH);
  const shown = screen.locator('[data-pairing-code]');
  await shown.waitFor();
  ({ kioskId } = await call<{ kioskId: number }>('technician', 'POST', `/stations/${station.id}/pair`, { pairingCode: await shown.getAttribute('data-pairing-code') }));
  await screen.getByRole('button', { name: /Touch to begin/ }).waitFor({ timeout: 30_000 });
}, 120_000);

afterAll(async () => {
  await browser?.close();
});

describe('Fleet and Insights follow a kiosk running in a browser', () => {
  it('shows a newly paired kiosk online on the Fleet page, playing the live release', async () => {
    await studio.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Fleet' }).click();
    await studio.getByRole('heading', { level: 1, name: 'Fleet' }).waitFor();
    await studio.getByLabel('Gallery').selectOption({ label: GALLERY });
    const row = studio.locator(`tr[data-kiosk-id="${kioskId}"]`);
    // The page refreshes itself every 15 s; pressing Refresh only shortens the wait for the first heartbeat.
    await expect.poll(async () => {
      await studio.getByRole('button', { name: 'Refresh' }).click();
      return row.locator('[data-state]').first().getAttribute('data-state', { timeout: 2_000 }).catch(() => null);
    }, { timeout: 30_000, interval: 1_000 }).toBe('online');
    await row.getByText('Online', { exact: true }).waitFor();
    await row.getByText(`Release ${liveRelease.number}`, { exact: true }).waitFor();
    expect(await row.locator('[data-mismatch]').count()).toBe(0);
    await row.getByRole('link', { name: stationName }).waitFor();
  });

  it("shows a visitor's story and slope on the Insights page once the kiosk has uploaded them", async () => {
    const before = await insightsNow();
    const opensBefore = before.stories.find((story) => story.title === WIDGET_STORY)?.opens ?? 0;
    const angleBefore = before.widgets.find((use) => use.widgetType === 'slope-force')?.params.find((p) => p.param === 'angleDeg')?.touches ?? 0;

    await screen.getByRole('button', { name: /Touch to begin/ }).tap();
    await screen.getByRole('button', { name: new RegExp(WIDGET_STORY) }).tap();
    await screen.getByRole('heading', { name: 'A mountain range under the sea' }).waitFor();
    await screen.getByRole('button', { name: 'Next' }).tap();
    const slider = screen.getByRole('slider', { name: /Slope force box/ });
    const angle = Number(await slider.getAttribute('aria-valuenow'));
    await slider.focus();
    for (let press = 0; press < 5; press += 1) await slider.press('ArrowLeft');
    await expect.poll(async () => Number(await slider.getAttribute('aria-valuenow'))).toBeLessThan(angle);

    await studio.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Insights' }).click();
    await studio.getByRole('heading', { level: 1, name: 'Insights' }).waitFor();
    await studio.getByLabel('Gallery').selectOption({ label: GALLERY });
    const stories = studio.getByRole('table', { name: 'Stories by opens' });
    const widgets = studio.getByRole('table', { name: 'Widget use' });
    // Counts as the English studio writes them, with a thousands separator (the demo's visits pass a thousand).
    const shown = (count: number) => new Intl.NumberFormat('en').format(count);
    const opens = () => stories.getByRole('row').filter({ hasText: WIDGET_STORY }).getByRole('cell').last().textContent({ timeout: 1_000 }).catch(() => null);
    const angleTouches = () => widgets.getByRole('row').filter({ hasText: 'Slope angle (°)' }).getByRole('cell').last().textContent({ timeout: 1_000 }).catch(() => null);
    await expect.poll(async () => {
      await studio.reload();
      // Thirty days of the demo kiosk's visits are counted too, so the figures take a moment after a reload.
      await stories.waitFor({ timeout: 10_000 }).catch(() => null);
      return [await opens(), await angleTouches()];
    }, { timeout: 30_000, interval: 2_000 }).toEqual([shown(opensBefore + 1), shown(angleBefore + 1)]);
    // The same numbers are drawn as charts.
    await studio.getByRole('img', { name: 'Opens per story' }).waitFor();
    await studio.getByRole('img', { name: 'Touches per widget and setting' }).waitFor();

    // And they download as CSV, through the signed-in API client.
    const [download] = await Promise.all([studio.waitForEvent('download'), studio.getByRole('button', { name: 'Download CSV' }).click()]);
    expect(download.suggestedFilename()).toMatch(new RegExp(`^insights-gallery-${gallery.id}-\\d{4}-\\d{2}-\\d{2}_to_\\d{4}-\\d{2}-\\d{2}\\.csv$`));
    const csv = await readFile((await download.path())!, 'utf8');
    expect(csv.split('\r\n')[0]).toBe('"figure","story_id","story_title","panel_id","panel_position","widget_type","param","locale","switch","count","median_dwell_ms","from_day","to_day","time_zone"');
    // Every row names the days counted and the venue's zone they are days of (the demo venue's).
    expect(csv.split('\r\n')[1]).toMatch(/,"\d{4}-\d{2}-\d{2}","\d{4}-\d{2}-\d{2}","America\/Halifax"$/);
    expect(csv).toContain(`"story_opens","`);
  });

  it("revokes the kiosk from its page after a confirmation, which ends the kiosk's access at once", async () => {
    await studio.goto(`/fleet/${kioskId}`);
    await studio.getByRole('heading', { level: 1, name: `Kiosk at ${stationName}` }).waitFor();
    await studio.getByRole('table', { name: 'Heartbeat history' }).waitFor();
    // Watched from before the revoke: the kiosk's first refused call (its heartbeat or its manifest
    // poll, whichever comes first) ends its runtime, so a later watch could wait for nothing.
    const refused = screen.waitForResponse((response) => /\/api\/kiosk\/(heartbeat|manifest)$/.test(response.url()) && response.status() === 401, { timeout: 30_000 });
    await studio.getByRole('button', { name: 'Revoke…' }).click();
    const confirm = studio.getByRole('alertdialog', { name: 'Revoke this kiosk?' });
    await confirm.getByRole('button', { name: 'Revoke the kiosk' }).click();
    await confirm.waitFor({ state: 'detached' });
    await studio.getByText('Revoked', { exact: true }).waitFor();
    const fleet = await call<FleetPage>('technician', 'GET', `/kiosks?galleryId=${gallery.id}&pageSize=100`);
    expect(fleet.items.find((kiosk) => kiosk.id === kioskId)?.revokedAt).not.toBeNull();
    // The kiosk's next call is refused: its device token no longer opens anything.
    expect((await refused).status()).toBe(401);
  });
});
