import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type Browser, type BrowserContext, type Locator, type Page } from 'playwright-core';
import type { FleetKioskView, KioskManifestResponse, KioskView, PublicationRecord, ReleaseManifest, ReleaseView } from '@mantlepiece/shared';
import { baseUrl, chromiumOptions, demoPassword, launchBrowser, newContext, signIn } from '../support/browser';

// The seeded demo (server/src/seed): one gallery, one station, three approved stories.
const GALLERY = 'Moving Plates Hall';
const STATION = 'Rift Table';
const LEFT_OUT = 'Sinking Slabs';
const WIDGET_STORY = 'Sliding Off the Ridge';
// In the release's order: stories of an exhibit by title.
const KEPT = [WIDGET_STORY, 'Why Does Rock Deep Inside Earth Move?'];
// Manifest polls and heartbeats every second, so the test waits on states, not on the default minute.
const KIOSK_PATH = '/kiosk/?poll=1&heartbeat=1';

let browser: Browser;
let studio: Page;
let kioskProfile: string;
let kiosk: BrowserContext;
let screen: Page;
let technicianToken: string;
let firstRelease: number;
let secondRelease: number;
let kioskId: number;
/** Every answer the kiosk got from the manifest route, by its publication's sequence: what a replay would send again. */
const answers = new Map<number, KioskManifestResponse>();
const sequenceOf = (answer: KioskManifestResponse) => (JSON.parse(answer.publication.record) as PublicationRecord).sequence;

/** The staff API as the technician, for checks the studio pages do not show in full. */
async function staff<T>(path: string): Promise<T> {
  const response = await fetch(`${baseUrl}/api${path}`, { headers: { Authorization: `Bearer ${technicianToken}` } });
  if (!response.ok) throw new Error(`GET ${path} answered ${response.status}: ${await response.text()}`);
  return (await response.json()) as T;
}

async function manifestOf(releaseId: number): Promise<ReleaseManifest> {
  return JSON.parse((await staff<{ manifest: string }>(`/releases/${releaseId}/manifest`)).manifest) as ReleaseManifest;
}

/** A finger on the kiosk's screen, through Chromium's touch input: press, slide, lift. */
async function touchDrag(page: Page, from: { x: number; y: number }, to: { x: number; y: number }, steps = 8): Promise<void> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: [from] });
  for (let step = 1; step <= steps; step++) {
    const x = from.x + ((to.x - from.x) * step) / steps;
    const y = from.y + ((to.y - from.y) * step) / steps;
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: [{ x, y }] });
  }
  await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
  await cdp.detach();
}

/** Builds a release in the studio, waits for the build to finish and returns the release id the page follows. */
async function buildRelease(choose?: (dialog: Locator) => Promise<void>): Promise<number> {
  await studio.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Releases' }).click();
  await studio.getByLabel('Gallery', { exact: true }).selectOption({ label: GALLERY });
  await studio.getByRole('button', { name: 'Build release' }).click();
  const dialog = studio.getByRole('dialog', { name: `Build a release of ${GALLERY}` });
  if (choose) await choose(dialog);
  await dialog.getByRole('button', { name: 'Build', exact: true }).click();
  await dialog.waitFor({ state: 'detached' });
  await studio.waitForURL(/[?&]build=\d+/);
  const id = Number(new URL(studio.url()).searchParams.get('build'));
  const progress = studio.locator(`section[data-release-id="${id}"]`);
  await progress.getByRole('progressbar').waitFor();
  await progress.getByText(/is Ready with \d+ stor/).waitFor({ timeout: 30_000 });
  return id;
}

beforeAll(async () => {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: 'technician@demo.test', password: demoPassword }),
  });
  technicianToken = ((await login.json()) as { accessToken: string }).accessToken;
  browser = await launchBrowser();
  studio = await (await newContext(browser)).newPage();
  await signIn(studio, 'technician@demo.test');
  // The kiosk is its own browser profile on disk, as a gallery screen's is: storage outlives a reload.
  kioskProfile = await mkdtemp(join(tmpdir(), 'mantlepiece-kiosk-'));
  kiosk = await chromium.launchPersistentContext(kioskProfile, {
    ...chromiumOptions, baseURL: baseUrl, locale: 'en-GB', viewport: { width: 1920, height: 1080 }, hasTouch: true,
  });
  screen = kiosk.pages()[0] ?? (await kiosk.newPage());
  screen.on('response', (response) => {
    if (!response.url().endsWith('/api/kiosk/manifest') || response.status() !== 200) return;
    // A body is gone once the page navigated away (the kiosk reloads between tests); that answer is simply not kept.
    void response.json().then((answer: KioskManifestResponse) => answers.set(sequenceOf(answer), answer), () => undefined);
  });
});

/** The kiosk as the Fleet list shows it, from its last heartbeat. */
const fleetRow = async () => (await staff<{ items: FleetKioskView[] }>('/kiosks?pageSize=100')).items.find((item) => item.id === kioskId);

afterAll(async () => {
  await kiosk?.close();
  await browser?.close();
  if (kioskProfile) await rm(kioskProfile, { recursive: true, force: true });
});

describe('a release reaches a kiosk paired through the studio, plays offline and survives a tampered file', () => {
  it('builds a release of the demo gallery with one story left out, follows the build and publishes it', async () => {
    firstRelease = await buildRelease(async (dialog) => {
      await dialog.getByRole('radio', { name: 'Choose revisions' }).check();
      await dialog.getByLabel(`Revision of ${LEFT_OUT}`).selectOption({ label: 'Leave out' });
    });
    await studio.locator(`section[data-release-id="${firstRelease}"]`).getByRole('button', { name: 'Publish…' }).click();
    const confirm = studio.getByRole('alertdialog');
    await confirm.getByText('It carries 2 stories:').waitFor();
    for (const title of KEPT) await confirm.getByText(new RegExp(`^${title.replace('?', '\\?')} \\(revision \\d+\\)$`)).waitFor();
    expect(await confirm.getByText(LEFT_OUT).count()).toBe(0);
    await confirm.getByRole('button', { name: /^Publish Release \d+$/ }).click();
    await studio.locator(`tr[data-release-id="${firstRelease}"][data-state="live"]`).waitFor();
  });

  it('pairs a new kiosk by the code on its screen, entered on the station page', async () => {
    await screen.goto(KIOSK_PATH);
    const shown = screen.locator('[data-pairing-code]');
    await shown.waitFor();
    const code = (await shown.getAttribute('data-pairing-code'))!;
    expect(code).toMatch(/^[2-9A-HJKMNP-TW-Z]{6}$/);

    await studio.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Stations' }).click();
    await studio.getByRole('link', { name: STATION }).click();
    await studio.getByRole('heading', { level: 1, name: STATION }).waitFor();
    await studio.getByLabel('Pairing code shown on the screen').fill(code.toLowerCase());
    await studio.getByRole('button', { name: 'Pair', exact: true }).click();
    const paired = studio.getByRole('status').filter({ hasText: /Kiosk \d+ is paired/ });
    await paired.waitFor();
    kioskId = Number(/Kiosk (\d+)/.exec((await paired.textContent())!)![1]);
    await studio.locator(`tr[data-kiosk-id="${kioskId}"]`).getByText('Active').waitFor();

    // The kiosk collects its credential, downloads and checks the release, then shows its attract loop.
    await screen.getByRole('button', { name: /Touch to begin/ }).waitFor({ timeout: 30_000 });
  });

  it('plays the published stories, and its slope force box follows a finger', async () => {
    await screen.getByRole('button', { name: /Touch to begin/ }).tap();
    const cards = screen.locator('.story-card-title');
    await expect.poll(() => cards.allTextContents()).toEqual(KEPT);
    await screen.getByRole('button', { name: new RegExp(WIDGET_STORY) }).tap();
    await screen.getByRole('heading', { name: 'A mountain range under the sea' }).waitFor();
    await screen.getByRole('button', { name: 'Next' }).tap();

    const slider = screen.getByRole('slider', { name: /Slope force box/ });
    const state = screen.locator('.mp-slope-force-box [role="status"]');
    // Seeded at 35° with static friction 0.6: steeper than arctan 0.6 ≈ 31.0°, so it slides.
    await expect.poll(() => state.getAttribute('data-state')).toBe('slides');
    const box = (await slider.boundingBox())!;
    // The drawing is 480 × 360 with the hinge at (56, 292); its free end at 35° is 250 units up the slope.
    const at = (x: number, y: number) => ({ x: box.x + (x / 480) * box.width, y: box.y + (y / 360) * box.height });
    const rad = (deg: number) => (deg * Math.PI) / 180;
    await touchDrag(screen, at(56 + 250 * Math.cos(rad(35)), 292 - 250 * Math.sin(rad(35))), at(56 + 200 * Math.cos(rad(15)), 292 - 200 * Math.sin(rad(15))));
    await expect.poll(async () => Number(await slider.getAttribute('aria-valuenow'))).toBeLessThan(31);
    await expect.poll(() => state.getAttribute('data-state')).toBe('holds');
  });

  it('still plays after a reload with the network cut', async () => {
    await screen.waitForFunction(() => navigator.serviceWorker.controller !== null);
    await kiosk.setOffline(true);
    await screen.reload();
    await screen.getByRole('button', { name: /Touch to begin/ }).tap();
    await expect.poll(() => screen.locator('.story-card-title').allTextContents()).toEqual(KEPT);
    await screen.getByRole('button', { name: new RegExp(KEPT[1]!.replace('?', '\\?')) }).tap();
    await screen.getByRole('heading', { name: 'Hot rock rises' }).waitFor();
    await kiosk.setOffline(false);
  });

  it('rejects a newer release whose file was changed on the way, keeps playing the old one and reports why', async () => {
    secondRelease = await buildRelease();
    const [before, after] = await Promise.all([manifestOf(firstRelease), manifestOf(secondRelease)]);
    const known = new Set(before.files.map((file) => file.sha256));
    const fresh = after.files.filter((file) => !known.has(file.sha256));
    expect(fresh.length, 'files the left-out story brings').toBeGreaterThan(0);
    const tampered = fresh[0]!.sha256;
    let served = 0;
    await kiosk.route(`**/api/kiosk/files/${tampered}`, async (route) => {
      const response = await route.fetch();
      const body = Buffer.from(await response.body());
      body[body.length - 1] = body[body.length - 1]! ^ 0xff;
      served++;
      await route.fulfill({ response, body });
    });

    await studio.locator(`section[data-release-id="${secondRelease}"]`).getByRole('button', { name: 'Publish…' }).click();
    const confirm = studio.getByRole('alertdialog');
    await confirm.getByText(/It replaces Release \d+, Live since/).waitFor();
    await confirm.getByRole('button', { name: /^Publish Release \d+$/ }).click();
    await studio.locator(`tr[data-release-id="${secondRelease}"][data-state="live"]`).waitFor();

    const report = async () => (await staff<{ items: KioskView[] }>('/kiosks?pageSize=100')).items.find((item) => item.id === kioskId);
    await expect.poll(async () => (await report())?.lastError ?? '', { timeout: 30_000 }).toContain(`Release ${secondRelease} refused`);
    expect(served).toBeGreaterThan(0);
    expect((await report())?.releasePlaying?.id).toBe(firstRelease);

    // Restarted, it boots into the release it kept: still without the left-out story.
    await screen.reload();
    await screen.getByRole('button', { name: /Touch to begin/ }).tap();
    await expect.poll(() => screen.locator('.story-card-title').allTextContents()).toEqual(KEPT);

    // The station page shows the kiosk's report to the technician.
    await studio.goto(`/stations/${(await report())!.station.id}`);
    await studio.locator(`tr[data-kiosk-error="${kioskId}"]`).getByText(`Last error: Release ${secondRelease} refused`, { exact: false }).waitFor();
  });

  it('rolls the gallery back to the first release from the studio', async () => {
    await studio.goto('/releases');
    await studio.getByLabel('Gallery', { exact: true }).selectOption({ label: GALLERY });
    await studio.locator(`tr[data-release-id="${firstRelease}"]`).getByRole('button', { name: /^Roll back to Release \d+$/ }).click();
    const confirm = studio.getByRole('alertdialog');
    await confirm.getByText(/It replaces Release \d+/).waitFor();
    await confirm.getByRole('button', { name: /^Roll back to Release \d+$/ }).click();
    await studio.locator(`tr[data-release-id="${firstRelease}"][data-state="live"]`).waitFor();
    await studio.locator(`tr[data-release-id="${secondRelease}"][data-state="superseded"]`).waitFor();
    const release = await staff<ReleaseView>(`/releases/${firstRelease}`);
    expect(release.state).toBe('live');
    await expect.poll(async () => (await staff<{ items: KioskView[] }>('/kiosks?pageSize=100')).items.find((item) => item.id === kioskId)?.releaseLive?.id).toBe(firstRelease);

    // The rollback is a new publication, two after the one the kiosk first followed: it follows it.
    const [firstSequence] = [...answers.keys()].sort((a, b) => a - b);
    expect(firstSequence, 'the first publication the kiosk received').toBeDefined();
    await expect.poll(async () => (await fleetRow())?.publication?.sequence, { timeout: 30_000 }).toBe(firstSequence! + 2);
    expect((await fleetRow())?.releasePlaying?.id).toBe(firstRelease);
  });

  it('refuses the withdrawn release’s answer sent again, signed as it is, and keeps playing the rollback', async () => {
    const followed = (await fleetRow())!.publication!.sequence;
    const withdrawn = answers.get(followed - 1);
    expect(withdrawn && JSON.parse(withdrawn.manifest).releaseId, 'the answer that carried the second release').toBe(secondRelease);
    // Someone on the gallery network answers the kiosk's manifest request with that old, correctly signed answer.
    await kiosk.route('**/api/kiosk/manifest', (route) => route.fulfill({ status: 200, contentType: 'application/json', headers: { ETag: '"replayed"' }, body: JSON.stringify(withdrawn) }));
    try {
      await expect.poll(async () => (await fleetRow())?.lastError ?? '', { timeout: 30_000 })
        .toBe(`Publication ${followed - 1} is older than publication ${followed}, which this kiosk already follows: an old answer sent again is refused.`);
      expect(await fleetRow()).toMatchObject({ releasePlaying: { id: firstRelease }, publication: { sequence: followed, expired: false } });
    } finally {
      await kiosk.unroute('**/api/kiosk/manifest');
    }
  });

  it('keeps playing once its publication has expired by its clock, says so, and the Fleet page shows it', async () => {
    const followed = (await fleetRow())!.publication!;
    // The kiosk's clock moves past the record's expiry, as when nothing fresh reached it for weeks.
    await screen.clock.setFixedTime(new Date(Date.parse(followed.expiresAt) + 86_400_000));
    await expect.poll(async () => (await fleetRow())?.publication?.expired, { timeout: 30_000 }).toBe(true);
    await screen.reload();
    await screen.getByRole('button', { name: /Touch to begin/ }).tap();
    await expect.poll(() => screen.locator('.story-card-title').allTextContents()).toEqual(KEPT);

    await studio.goto('/fleet');
    const row = studio.locator(`tr[data-kiosk-id="${kioskId}"]`);
    await row.getByText(`Publication ${followed.sequence} expired`).waitFor();
    await studio.goto(`/fleet/${kioskId}`);
    await studio.locator('[data-publication-expired]').getByText(new RegExp(`^Number ${followed.sequence}, expired .+ The kiosk plays on`)).waitFor();
  });
});
