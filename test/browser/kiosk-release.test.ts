import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { chromium, type Browser, type BrowserContext, type Locator, type Page, type Request } from 'playwright-core';
import type { FleetKioskView, KioskManifestResponse, KioskView, PublicationRecord, ReleaseManifest, ReleasePreview, ReleaseView } from '@mantlepiece/shared';
import { apiAs, baseUrl, chromiumOptions, launchBrowser, newContext, signIn } from '../support/browser';
import { publishedRelease } from '../support/releases';
import { touchDrag } from '../support/touch';

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
let technician: Awaited<ReturnType<typeof apiAs>>;
let galleryId: number;
let stationId: number;
/** The latest approved revision of every demo story but the one left out: what the first release carries. */
let keptRevisions: number[];
// Each test's own kiosk (see beforeEach).
let kioskProfile: string;
let kiosk: BrowserContext;
let screen: Page;
let kioskId: number;
/** Every answer this test's kiosk got from the manifest route, by its publication's sequence: what a replay would send again. */
let answers: Map<number, KioskManifestResponse>;
const sequenceOf = (answer: KioskManifestResponse) => (JSON.parse(answer.publication.record) as PublicationRecord).sequence;

/** The staff API as the technician, for checks the studio pages do not show in full. */
const staff = <T>(path: string) => technician<T>('GET', path);

async function manifestOf(releaseId: number): Promise<ReleaseManifest> {
  return JSON.parse((await staff<{ manifest: string }>(`/releases/${releaseId}/manifest`)).manifest) as ReleaseManifest;
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

/** The kiosk as the Fleet list shows it, from its last heartbeat. */
const fleetRow = async () => (await staff<{ items: FleetKioskView[] }>('/kiosks?pageSize=100')).items.find((item) => item.id === kioskId);

/** The first release, as the first test builds it in the studio (one story left out), built and made Live through the API. */
const publishFirstRelease = () => publishedRelease(technician, galleryId, 60_000, { revisionIds: keptRevisions });

/** Waits until the test's kiosk reports, by its heartbeat, that it plays this release; answers the publication it follows. */
async function playing(releaseId: number, sequence?: number): Promise<number> {
  const row = await vi.waitUntil(async () => {
    const current = await fleetRow();
    return current?.releasePlaying?.id === releaseId && current.publication && (sequence === undefined || current.publication.sequence === sequence) && current;
  }, { timeout: 60_000, interval: 250 });
  return row.publication!.sequence;
}

/**
 * The test's kiosk paired at the station through the API and playing the first release, taken on by the
 * technician's API up to `stage`: a second release (every story) published and followed, then the gallery
 * rolled back to the first. Answers the releases and the sequence of the first publication the kiosk followed.
 */
async function kioskFollowing(stage: 'first release' | 'second release' | 'rollback' = 'first release') {
  const first = await publishFirstRelease();
  await screen.goto(KIOSK_PATH);
  const shown = screen.locator('[data-pairing-code]');
  await shown.waitFor();
  ({ kioskId } = await technician<{ kioskId: number }>('POST', `/stations/${stationId}/pair`, { pairingCode: await shown.getAttribute('data-pairing-code') }));
  await screen.getByRole('button', { name: /Touch to begin/ }).waitFor({ timeout: 30_000 });
  const firstSequence = await playing(first.id);
  if (stage === 'first release') return { first, second: undefined, firstSequence };
  const second = await publishedRelease(technician, galleryId, 60_000);
  await playing(second.id, firstSequence + 1);
  if (stage === 'second release') return { first, second, firstSequence };
  await technician('POST', `/releases/${first.id}/publish`);
  await playing(first.id, firstSequence + 2);
  return { first, second, firstSequence };
}

beforeAll(async () => {
  technician = await apiAs('technician@demo.test');
  galleryId = (await staff<{ items: { id: number; name: string }[] }>('/galleries?pageSize=100')).items.find((gallery) => gallery.name === GALLERY)!.id;
  stationId = (await staff<{ items: { id: number; name: string }[] }>('/stations?pageSize=100')).items.find((station) => station.name === STATION)!.id;
  const preview = await staff<ReleasePreview>(`/galleries/${galleryId}/releases/preview`);
  keptRevisions = preview.stories.filter((story) => story.title !== LEFT_OUT).map((story) => story.revisionId);
  browser = await launchBrowser();
  studio = await (await newContext(browser)).newPage();
  await signIn(studio, 'technician@demo.test');
});

// Each test has a kiosk of its own, a new browser profile on disk as a gallery screen's is (storage outlives a reload), not yet paired.
beforeEach(async () => {
  kioskProfile = await mkdtemp(join(tmpdir(), 'mantlepiece-kiosk-'));
  kiosk = await chromium.launchPersistentContext(kioskProfile, {
    ...chromiumOptions, baseURL: baseUrl, locale: 'en-GB', viewport: { width: 1920, height: 1080 }, hasTouch: true,
  });
  screen = kiosk.pages()[0] ?? (await kiosk.newPage());
  const kept = new Map<number, KioskManifestResponse>();
  answers = kept;
  screen.on('response', (response) => {
    if (!response.url().endsWith('/api/kiosk/manifest') || response.status() !== 200) return;
    // A body is gone once the page navigated away (the kiosk reloads in tests); that answer is simply not kept.
    void response.json().then((answer: KioskManifestResponse) => kept.set(sequenceOf(answer), answer), () => undefined);
  });
});

afterEach(async () => {
  await kiosk?.close();
  if (kioskProfile) await rm(kioskProfile, { recursive: true, force: true });
});

afterAll(() => browser?.close());

describe('a release reaches a kiosk paired through the studio, plays offline and survives a tampered file', () => {
  it('builds a release of the demo gallery with one story left out, follows the build and publishes it', async () => {
    const firstRelease = await buildRelease(async (dialog) => {
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
    await publishFirstRelease();
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
    await kioskFollowing();
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
    await kioskFollowing();
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
    const { first: { id: firstRelease } } = await kioskFollowing();
    const secondRelease = await buildRelease();
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

    // It backs off: the polls that follow ask for the manifest and never fetch the refused file again.
    const servedWhenRefused = served;
    let polls = 0;
    const countPoll = (request: Request) => {
      if (request.url().endsWith('/api/kiosk/manifest')) polls++;
    };
    screen.on('request', countPoll);
    await expect.poll(() => polls, { timeout: 30_000 }).toBeGreaterThanOrEqual(3);
    screen.off('request', countPoll);
    expect(served).toBe(servedWhenRefused);
    expect((await report())?.lastError).toMatch(/Not downloaded again before \S+ unless the release changes\.$/);

    // Restarted, it boots into the release it kept: still without the left-out story.
    await screen.reload();
    await screen.getByRole('button', { name: /Touch to begin/ }).tap();
    await expect.poll(() => screen.locator('.story-card-title').allTextContents()).toEqual(KEPT);

    // The station page shows the kiosk's report to the technician.
    await studio.goto(`/stations/${(await report())!.station.id}`);
    await studio.locator(`tr[data-kiosk-error="${kioskId}"]`).getByText(`Last error: Release ${secondRelease} refused`, { exact: false }).waitFor();
  });

  it('rolls the gallery back to the first release from the studio', async () => {
    const { first, second, firstSequence } = await kioskFollowing('second release');
    const [firstRelease, secondRelease] = [first.id, second!.id];
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
    expect(Math.min(...answers.keys()), 'the first publication the kiosk received').toBe(firstSequence);
    await expect.poll(async () => (await fleetRow())?.publication?.sequence, { timeout: 30_000 }).toBe(firstSequence + 2);
    expect((await fleetRow())?.releasePlaying?.id).toBe(firstRelease);
  });

  it('refuses the withdrawn release’s answer sent again, signed as it is, and keeps playing the rollback', async () => {
    const { first, second } = await kioskFollowing('rollback');
    const [firstRelease, secondRelease] = [first.id, second!.id];
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
    await kioskFollowing();
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

describe('a kiosk revoked in the studio', () => {
  /** What the kiosk keeps in IndexedDB, counted in its own page. */
  const stored = () => screen.evaluate(async () => {
    const db = await new Promise<IDBDatabase>((resolve, reject) => {
      const request = indexedDB.open('mantlepiece-kiosk');
      request.onsuccess = () => resolve(request.result);
      request.onerror = () => reject(request.error ?? new Error('IndexedDB request failed'));
    });
    const count = (name: string) => new Promise<number>((resolve, reject) => {
      const request = db.transaction(name).objectStore(name).count();
      request.onsuccess = () => resolve(request.result);
      request.onerror = () => reject(request.error ?? new Error('IndexedDB request failed'));
    });
    const counts = { credential: await count('credential'), releases: await count('releases'), files: await count('files'), outbox: await count('outbox') };
    db.close();
    return counts;
  });
  const unpairedNotice = () => screen.getByText('This screen was unpaired in the studio. To use it again, pair it with the code below.');

  it('lets the visitor finish, then forgets its pairing and releases and shows that it was unpaired with a new pairing code, also after a restart, and pairs anew', async () => {
    await kioskFollowing();
    // A visitor who walks away after two seconds.
    await screen.goto('/kiosk/?poll=1&heartbeat=1&idle=2');
    await screen.getByRole('button', { name: /Touch to begin/ }).tap();
    await screen.getByRole('button', { name: new RegExp(KEPT[1]!.replace('?', '\\?')) }).tap();
    await screen.getByRole('heading', { name: 'Hot rock rises' }).waitFor();
    expect((await stored()).releases).toBeGreaterThan(0);
    // Something else kept in the browser's caches must go too.
    await screen.evaluate(async () => (await caches.open('mantlepiece-kiosk-leftover')).put('/kiosk/leftover', new Response('kept')));

    const station = (await fleetRow())!.station;
    await studio.goto(`/stations/${station.id}`);
    const refused = screen.waitForResponse((response) => response.url().includes('/api/kiosk/') && response.status() === 401);
    // Awaited below; a failure before that must not surface as an unhandled rejection.
    refused.catch(() => undefined);
    await studio.getByRole('button', { name: `Revoke Kiosk ${kioskId}` }).click();
    await studio.getByRole('alertdialog').getByRole('button', { name: 'Revoke', exact: true }).click();
    await studio.locator(`tr[data-kiosk-id="${kioskId}"]`).getByText('Revoked').waitFor();
    await refused;
    // The visitor is still reading: nothing is taken from them mid-story.
    expect(await screen.getByRole('heading', { name: 'Hot rock rises' }).isVisible()).toBe(true);

    // They walk away; after the warning the screen resets, and the pairing is forgotten.
    const code = screen.locator('[data-pairing-code]');
    await code.waitFor({ timeout: 60_000 });
    await unpairedNotice().waitFor();
    const firstCode = await code.getAttribute('data-pairing-code');
    expect(firstCode).toMatch(/^[2-9A-HJKMNP-TW-Z]{6}$/);
    expect(await stored()).toEqual({ credential: 0, releases: 0, files: 0, outbox: 0 });
    const cached = await screen.evaluate(async () => Promise.all((await caches.keys()).map(async (name) => ({ name, index: Boolean(await (await caches.open(name)).match('/kiosk/index.html')) }))));
    // Only the app's own files are back, fetched afresh by the service worker for the next offline start.
    expect(cached).toEqual([{ name: expect.stringMatching(/^mantlepiece-kiosk-app-/), index: true }]);

    // Restarted, it is still unpaired, says so, and shows a code of its own.
    await screen.reload();
    await code.waitFor();
    await unpairedNotice().waitFor();
    const secondCode = (await code.getAttribute('data-pairing-code'))!;
    expect(secondCode).not.toBe(firstCode);

    // The technician pairs it anew from the station page: it plays again and the notice is gone.
    await studio.getByLabel('Pairing code shown on the screen').fill(secondCode);
    await studio.getByRole('button', { name: 'Pair', exact: true }).click();
    await studio.getByRole('status').filter({ hasText: /Kiosk \d+ is paired/ }).waitFor();
    await screen.getByRole('button', { name: /Touch to begin/ }).waitFor({ timeout: 60_000 });
    expect(await unpairedNotice().count()).toBe(0);
  });
});
