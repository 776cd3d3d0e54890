import type { Browser, Locator, Page } from 'playwright-core';
import type { Can, KioskCan, MediaCan, ReleaseCan, RevisionCan, Role, StationCan, StoryCan, TranslationCan } from '@mantlepiece/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiAs, baseUrl, launchBrowser, newContext, signIn } from '../support/browser.js';
import { solidPng } from '../support/images.js';
import { joinVenue, leaveVenue } from '../support/venues.js';

/**
 * Each demo role, admin included, signed in to the studio: on every page of the areas the role
 * works in, the actions offered are exactly those the API's `can` allows for the same object, so
 * none is offered that the server would refuse (server/test/can.spec.ts checks that each `can` is
 * what the server then does, role by role); and the offered actions that are safe on this suite's
 * own data are carried out in the browser and succeed.
 *
 * Which areas a role works in is the brief's role table: curators write stories and keep the media
 * library, educators review, translators translate, technicians release and look after the fleet,
 * admins may do all of it.
 */

type Api = Awaited<ReturnType<typeof apiAs>>;
type Area = 'stories' | 'media' | 'reviews' | 'translations' | 'releases' | 'fleet';

const ROLES = ['curator', 'educator', 'translator', 'technician', 'admin'] as const satisfies readonly Role[];
const email = (role: Role) => `${role}@demo.test`;
const AREAS: Record<Role, readonly Area[]> = {
  curator: ['stories', 'media', 'reviews'],
  educator: ['stories', 'reviews'],
  translator: ['translations'],
  technician: ['releases', 'fleet'],
  admin: ['stories', 'media', 'reviews', 'translations', 'releases', 'fleet'],
};

const tag = Date.now().toString(36);
// Long enough for a page's first requests and a release build on a busy machine; waiting ends as soon as the state is there.
const settled = { timeout: 30_000 };
const panelDoc = (text: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });

let browser: Browser;
const api = {} as Record<Role, Api>;
const userIds = {} as Record<Role, number>;
let demoVenueId: number;
let ownVenueId: number | undefined;
let galleryId: number;
let stationId: number;
let kioskId: number | undefined;

/** Stories of the suite's own in each state, and an image no panel shows, one set per role that works on stories. */
interface OwnStories { title: string; draft: number; inReview: number; revisionId: number; approved: number; imageId: number }
type StoryRole = Exclude<Role, 'technician'>;
const own = {} as Record<StoryRole, OwnStories>;

async function storyWithPanel(title: string, where: { venueId: number } | { exhibitId: number }): Promise<number> {
  const { id } = await api.curator<{ id: number }>('POST', '/stories', { title, audience: 'family', ...where });
  await api.curator('POST', `/stories/${id}/panels`, { doc: panelDoc('Hot rock rises a few centimetres a year.'), position: 0, wordBudget: 60 });
  return id;
}

async function approved(storyId: number): Promise<void> {
  const { revisionId } = await api.curator<{ revisionId: number }>('POST', `/stories/${storyId}/submit`, {});
  await api.educator('POST', `/revisions/${revisionId}/reviews`, { verdict: 'approve' });
}

async function ownStories(role: StoryRole, index: number): Promise<OwnStories> {
  const title = `Role check ${role} ${tag}`;
  const at = { venueId: demoVenueId };
  const draft = await storyWithPanel(`${title} draft`, at);
  const inReview = await storyWithPanel(`${title} in review`, at);
  const { revisionId } = await api.curator<{ revisionId: number }>('POST', `/stories/${inReview}/submit`, {});
  const approvedStory = await storyWithPanel(`${title} approved`, at);
  await approved(approvedStory);
  const upload = new FormData();
  upload.append('venueId', String(demoVenueId));
  // A colour of this run's own: the library keeps one asset per picture, and an earlier run's would come back under its old name.
  const colour = [index * 50, Math.floor(Math.random() * 256), Math.floor(Math.random() * 256)] as const;
  upload.append('file', new Blob([new Uint8Array(solidPng(40, 30, colour))], { type: 'image/png' }), `role-${role}-${tag}.png`);
  const [image] = await api.curator<{ id: number }[]>('POST', '/media', upload);
  return { title, draft, inReview, revisionId, approved: approvedStory, imageId: image!.id };
}

beforeAll(async () => {
  for (const role of ROLES) {
    api[role] = await apiAs(email(role));
    userIds[role] = (await api[role]<{ id: number }>('GET', '/auth/me')).id;
  }
  demoVenueId = (await api.admin<{ items: { id: number; slug: string }[] }>('GET', '/venues?pageSize=100')).items.find((venue) => venue.slug === 'basalt-point')!.id;
  // A venue of the suite's own for a release, a station and a kiosk, so nothing here changes what the demo gallery plays.
  ownVenueId = (await api.admin<{ id: number }>('POST', '/venues', { name: `Role check venue ${tag}`, slug: `role-check-${tag}`, sourceLocale: 'en', targetLocales: ['fr'], fallbackToSource: true })).id;
  for (const role of ['curator', 'educator', 'technician'] as const) await joinVenue(api.admin, email(role), ownVenueId, [role]);
  galleryId = (await api.admin<{ id: number }>('POST', '/galleries', { venueId: ownVenueId, name: `Role check hall ${tag}` })).id;
  const exhibit = await api.admin<{ id: number }>('POST', '/exhibits', { galleryId, name: 'Rock that flows' });
  stationId = (await api.admin<{ id: number }>('POST', '/stations', { galleryId, name: `Role check bench ${tag}`, screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1100 })).id;
  // One approved story in the gallery, so a release of it can be built.
  await approved(await storyWithPanel(`Role check release ${tag}`, { exhibitId: exhibit.id }));
  for (const [index, role] of (['curator', 'educator', 'translator', 'admin'] as const).entries()) own[role] = await ownStories(role, index);
  browser = await launchBrowser();
}, 180_000);

afterAll(async () => {
  await browser?.close();
  if (ownVenueId) for (const role of ['curator', 'educator', 'technician'] as const) await leaveVenue(api.admin, email(role), ownVenueId);
});

/** A studio page signed in as the role, working at `venueId` (what the venue switcher remembers). */
async function studioAs(role: Role): Promise<Page> {
  const context = await newContext(browser);
  const page = await context.newPage();
  await signIn(page, email(role));
  return page;
}

async function atVenue(page: Page, role: Role, venueId: number): Promise<void> {
  await page.evaluate(([key, value]) => window.localStorage.setItem(key!, value!), [`mantlepiece.venue.${userIds[role]}`, String(venueId)]);
}

const isOffered = async (locator: Locator) => (await locator.count()) > 0;

/** Every action of one object is offered exactly when its `can` allows it. */
async function expectOffers(role: Role, what: string, offers: Record<string, Locator>, can: Record<string, boolean>): Promise<void> {
  const seen: Record<string, boolean> = {};
  for (const [action, locator] of Object.entries(offers)) seen[action] = await isOffered(locator);
  const allowed = Object.fromEntries(Object.keys(offers).map((action) => [action, can[action]]));
  expect({ role, what, offered: seen }).toEqual({ role, what, offered: allowed });
}

const storyBadge = (page: Page) => page.locator('header [data-story-state]').first();

async function checkStoryList(page: Page, role: StoryRole): Promise<void> {
  const { title } = own[role];
  const list = await api[role]<{ can: Can<'stories'> }>('GET', `/stories?pageSize=1&venueId=${demoVenueId}`);
  await page.goto(`/stories?q=${encodeURIComponent(`${title} draft`)}`);
  // The list and its can come in one answer: once the row is there, so is the offer.
  await page.getByRole('link', { name: `${title} draft` }).waitFor(settled);
  await expectOffers(role, 'story list', { create: page.getByRole('button', { name: 'New story' }) }, list.can);
}

/** Opens a story and compares its actions with its can; answers the can. */
async function checkStory(page: Page, role: Role, storyId: number, what: string): Promise<StoryCan> {
  const story = await api[role]<{ can: StoryCan; state: string }>('GET', `/stories/${storyId}`);
  await page.goto(`/stories/${storyId}`);
  await storyBadge(page).waitFor(settled);
  const text = page.getByRole('textbox', { name: 'Panel text' }).first();
  await text.waitFor(settled);
  // Submitting an open submission again is withdraw's job, so the studio offers Submit outside In review only, once the draft's preflight has no blocker.
  const submit = story.can.submit && story.state !== 'in_review';
  if (submit) await page.getByRole('button', { name: 'Submit for review' }).waitFor(settled);
  await expectOffers(role, what, {
    submit: page.getByRole('button', { name: 'Submit for review' }),
    withdraw: page.getByRole('button', { name: 'Withdraw', exact: true }),
    revise: page.getByRole('button', { name: 'Revise', exact: true }),
    retire: page.getByRole('button', { name: 'Retire', exact: true }),
  }, { ...story.can, submit });
  expect({ role, what, editable: await text.getAttribute('contenteditable') }).toEqual({ role, what, editable: String(story.can.edit) });
  return story.can;
}

async function checkRevision(page: Page, role: StoryRole): Promise<RevisionCan> {
  const { revisionId } = own[role];
  const revision = await api[role]<{ can: RevisionCan }>('GET', `/revisions/${revisionId}`);
  await page.goto(`/reviews/${revisionId}`);
  // The section and its thread list carry the same name.
  await page.getByRole('region', { name: 'Comments on the whole revision' }).first().waitFor(settled);
  await expectOffers(role, 'revision', {
    approve: page.getByRole('radio', { name: 'Approve', disabled: false }),
    requestChanges: page.getByRole('radio', { name: 'Request changes', disabled: false }),
    comment: page.getByRole('button', { name: 'Add comment' }),
  }, revision.can);
  return revision.can;
}

async function checkReviewPage(page: Page, role: Role): Promise<void> {
  const list = await api[role]<{ can: Can<'stories'> }>('GET', `/stories?pageSize=1&venueId=${demoVenueId}`);
  await page.goto('/reviews');
  const queue = page.getByText('Revisions waiting for a verdict', { exact: false });
  const followed = page.getByText('Stories on their way through review', { exact: false });
  await queue.or(followed).waitFor(settled);
  expect({ role, reviewQueue: await isOffered(queue) }).toEqual({ role, reviewQueue: list.can.review });
}

async function checkMedia(page: Page, role: StoryRole): Promise<MediaCan> {
  const { imageId } = own[role];
  const library = await api[role]<{ can: Can<'mediaLibrary'> }>('GET', `/media?pageSize=1&venueId=${demoVenueId}`);
  await page.goto(`/media?q=${encodeURIComponent(`role-${role}-${tag}`)}`);
  await page.getByText(`role-${role}-${tag}`, { exact: false }).first().waitFor(settled);
  await expectOffers(role, 'media library', { upload: page.getByTestId('media-dropzone') }, library.can);
  const asset = await api[role]<{ can: MediaCan }>('GET', `/media/${imageId}`);
  await page.goto(`/media/${imageId}`);
  await page.getByRole('textbox', { name: 'Credit line' }).waitFor(settled);
  await expectOffers(role, 'image', { delete: page.getByRole('button', { name: 'Delete image' }), edit: page.getByRole('button', { name: 'Save', exact: true }) }, asset.can);
  return asset.can;
}

async function checkTranslation(page: Page, role: StoryRole): Promise<TranslationCan> {
  const storyId = own[role].draft;
  const { can } = await api[role]<{ can: TranslationCan }>('GET', `/stories/${storyId}/translations/fr/units?pageSize=1`);
  await page.goto(`/translations/${storyId}/fr`);
  await page.locator('[data-unit-editor]').waitFor(settled);
  await expectOffers(role, 'translation into French', {
    translate: page.getByRole('button', { name: 'Save', exact: true }),
    export: page.getByRole('button', { name: 'Download XLIFF' }),
    import: page.getByRole('button', { name: 'Choose a file' }),
  }, can);
  expect({ role, writable: await page.getByRole('textbox', { name: /^Translation \(French\)/ }).isEditable() }).toEqual({ role, writable: can.translate });
  return can;
}

/** The releases of the suite's gallery; answers the list's can. */
async function checkReleases(page: Page, role: Role): Promise<Can<'releases'>> {
  const list = await api[role]<{ can: Can<'releases'>; items: { id: number; can: ReleaseCan }[] }>('GET', `/galleries/${galleryId}/releases?pageSize=25`);
  await page.goto(`/releases?gallery=${galleryId}`);
  // The list and its can come in one answer: once its first row (or its empty state) is there, so is the offer.
  const first = list.items[0];
  await (first ? page.locator(`tr[data-release-id="${first.id}"]`) : page.getByText('No release of', { exact: false })).waitFor(settled);
  await expectOffers(role, 'releases', { build: page.getByRole('button', { name: 'Build release' }) }, list.can);
  for (const release of list.items) {
    const row = page.locator(`tr[data-release-id="${release.id}"]`);
    await expectOffers(role, `release ${release.id}`, { publish: row.getByRole('button', { name: /^(Publish|Roll back|Go forward)/ }) }, release.can);
  }
  return list.can;
}

async function checkStation(page: Page, role: Role): Promise<StationCan> {
  const station = await api[role]<{ can: StationCan }>('GET', `/stations/${stationId}`);
  await page.goto(`/stations/${stationId}`);
  await page.getByRole('heading', { level: 1, name: `Role check bench ${tag}` }).waitFor(settled);
  await expectOffers(role, 'station', { pair: page.getByLabel('Pairing code shown on the screen') }, station.can);
  if (kioskId !== undefined) {
    const kiosk = await api[role]<{ can: KioskCan }>('GET', `/kiosks/${kioskId}`);
    const row = page.locator(`tr[data-kiosk-id="${kioskId}"]`);
    await row.waitFor(settled);
    await expectOffers(role, `kiosk ${kioskId} at its station`, { revoke: row.getByRole('button', { name: `Revoke Kiosk ${kioskId}` }) }, kiosk.can);
  }
  return station.can;
}

async function checkFleetKiosk(page: Page, role: Role): Promise<KioskCan> {
  const kiosk = await api[role]<{ can: KioskCan }>('GET', `/kiosks/${kioskId}`);
  await page.goto(`/fleet/${kioskId}`);
  await page.getByRole('heading', { level: 1, name: `Kiosk at Role check bench ${tag}` }).waitFor(settled);
  await expectOffers(role, `kiosk ${kioskId}`, { revoke: page.getByRole('button', { name: 'Revoke…' }) }, kiosk.can);
  return kiosk.can;
}

/** A pairing code as a new kiosk screen asks for one. */
async function pairingCode(): Promise<string> {
  const response = await fetch(`${baseUrl}/api/kiosk/pair/start`, { method: 'POST' });
  expect(response.status, 'pairing start').toBe(201);
  return ((await response.json()) as { pairingCode: string }).pairingCode;
}

describe('each role is offered in the studio what the server lets it do, and what it is offered works', () => {
  it('curator: starts a story, submits and withdraws a draft, revises an approved story and deletes an unused image', async () => {
    const page = await studioAs('curator');
    await atVenue(page, 'curator', demoVenueId);
    await checkStoryList(page, 'curator');
    await page.getByRole('button', { name: 'New story' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('textbox', { name: /^Title/ }).fill(`Role check started ${tag}`);
    await dialog.getByRole('button', { name: 'Create story' }).click();
    await page.getByRole('heading', { level: 1, name: `Role check started ${tag}` }).waitFor(settled);

    const { draft, inReview, approved: approvedStory } = own.curator;
    const draftCan = await checkStory(page, 'curator', draft, 'draft story');
    expect(draftCan.submit).toBe(true);
    await page.getByRole('button', { name: 'Submit for review' }).click();
    const submitDialog = page.getByRole('dialog');
    await submitDialog.getByRole('textbox', { name: 'Note to the educator (optional)' }).fill('Checked by the role suite.');
    await submitDialog.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByText('Revision 1 is submitted', { exact: false }).waitFor(settled);
    await expect.poll(() => storyBadge(page).getAttribute('data-story-state'), settled).toBe('in_review');
    await page.getByRole('button', { name: 'Withdraw', exact: true }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Withdraw submission' }).click();
    await page.getByText('The submission is withdrawn; the story is a draft again.').waitFor(settled);

    await checkStory(page, 'curator', inReview, 'story in review');
    expect((await checkStory(page, 'curator', approvedStory, 'approved story')).revise).toBe(true);
    await page.getByRole('button', { name: 'Revise', exact: true }).click();
    await page.getByText('A new draft is open.', { exact: false }).waitFor(settled);
    await expect.poll(() => page.getByRole('textbox', { name: 'Panel text' }).first().getAttribute('contenteditable'), settled).toBe('true');

    await checkRevision(page, 'curator');
    await checkReviewPage(page, 'curator');
    expect((await checkMedia(page, 'curator')).delete).toBe(true);
    await page.getByRole('button', { name: 'Delete image' }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Delete', exact: true }).click();
    await page.waitForURL(/\/media$/, settled);
    await page.context().close();
  }, 240_000);

  it('educator: comments on a revision and sends it back for changes; offered no writing', async () => {
    const page = await studioAs('educator');
    await atVenue(page, 'educator', demoVenueId);
    await checkStoryList(page, 'educator');
    for (const [what, storyId] of [['draft story', own.educator.draft], ['story in review', own.educator.inReview], ['approved story', own.educator.approved]] as const) {
      await checkStory(page, 'educator', storyId, what);
    }
    await checkReviewPage(page, 'educator');
    const can = await checkRevision(page, 'educator');
    expect(can).toEqual({ approve: true, requestChanges: true, comment: true });
    const comments = page.getByRole('region', { name: 'Comments on the whole revision' }).last();
    await comments.getByRole('textbox', { name: 'Comment on the revision' }).fill('Say which rock rises.');
    await comments.getByRole('button', { name: 'Add comment' }).click();
    await comments.getByText('Say which rock rises.').waitFor(settled);
    await page.getByRole('radio', { name: 'Request changes' }).check();
    await page.getByRole('textbox', { name: 'What should change' }).fill('Name the rock: hot mantle rock.');
    await page.getByRole('button', { name: 'Send back for changes' }).click();
    await page.locator('[data-verdict-outcome="changes_requested"]').waitFor(settled);
    await page.context().close();
  }, 240_000);

  it('translator: saves a French unit and is offered the XLIFF file both ways; no story pages', async () => {
    const page = await studioAs('translator');
    const can = await checkTranslation(page, 'translator');
    expect(can).toEqual({ translate: true, import: true, export: true });
    const unitId = await page.locator('[data-unit-editor]').getAttribute('data-unit-editor');
    await page.getByRole('textbox', { name: /^Translation \(French\)/ }).fill('La roche chaude monte de quelques centimètres par an.');
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await expect.poll(() => page.locator(`[data-unit-row="${unitId}"]`).getAttribute('data-unit-status'), settled).toBe('translated');
    await page.context().close();
  }, 240_000);

  it('technician: builds and publishes a release of the suite’s gallery and pairs a kiosk at its station', async () => {
    const page = await studioAs('technician');
    await atVenue(page, 'technician', ownVenueId!);
    expect((await checkReleases(page, 'technician')).build).toBe(true);
    await page.getByRole('button', { name: 'Build release' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Build', exact: true }).click();
    const built = page.locator('tr[data-release-id][data-state="ready"]').first();
    await built.waitFor({ timeout: 90_000 });
    const releaseId = await built.getAttribute('data-release-id');
    await checkReleases(page, 'technician');
    await built.getByRole('button', { name: /^Publish/ }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: /^Publish Release \d+$/ }).click();
    await page.locator(`tr[data-release-id="${releaseId}"][data-state="live"]`).waitFor(settled);
    await checkReleases(page, 'technician');

    expect((await checkStation(page, 'technician')).pair).toBe(true);
    await page.getByLabel('Pairing code shown on the screen').fill(await pairingCode());
    await page.getByRole('button', { name: 'Pair', exact: true }).click();
    const paired = page.getByRole('status').filter({ hasText: /Kiosk \d+ is paired/ });
    await paired.waitFor(settled);
    kioskId = Number(/Kiosk (\d+)/.exec((await paired.textContent())!)![1]);
    await checkStation(page, 'technician');
    await checkFleetKiosk(page, 'technician');
    await page.context().close();
  }, 240_000);

  it('admin: offered no writing, reviewing or translating, but releases and the fleet; revokes the suite’s kiosk', async () => {
    // A kiosk of this test's own at the suite's station (pairing it replaces any other there), so it needs nothing the technician's test left.
    kioskId = (await api.technician<{ kioskId: number }>('POST', `/stations/${stationId}/pair`, { pairingCode: await pairingCode() })).kioskId;
    const page = await studioAs('admin');
    await atVenue(page, 'admin', demoVenueId);
    await checkStoryList(page, 'admin');
    for (const [what, storyId] of [['draft story', own.admin.draft], ['story in review', own.admin.inReview], ['approved story', own.admin.approved]] as const) {
      await checkStory(page, 'admin', storyId, what);
    }
    await checkRevision(page, 'admin');
    await checkReviewPage(page, 'admin');
    await checkMedia(page, 'admin');
    await checkTranslation(page, 'admin');
    await atVenue(page, 'admin', ownVenueId!);
    await checkReleases(page, 'admin');
    await checkStation(page, 'admin');
    expect((await checkFleetKiosk(page, 'admin')).revoke).toBe(true);
    await page.getByRole('button', { name: 'Revoke…' }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Revoke the kiosk' }).click();
    await page.getByText('Revoked', { exact: false }).first().waitFor(settled);
    await expect.poll(async () => (await api.admin<{ can: KioskCan }>('GET', `/kiosks/${kioskId}`)).can.revoke, settled).toBe(false);
    await checkFleetKiosk(page, 'admin');
    await page.context().close();
  }, 240_000);

  it('every role’s areas are the ones checked above: nothing else is offered in the navigation', async () => {
    const labels: Record<Area, string> = { stories: 'Stories', media: 'Media', reviews: 'Reviews', translations: 'Translations', releases: 'Releases', fleet: 'Fleet' };
    for (const role of ROLES) {
      const page = await studioAs(role);
      const nav = page.getByRole('navigation', { name: 'Studio areas' });
      // The areas follow the roles at the current venue, read after sign-in: once the first is there, all are.
      await nav.getByRole('link', { name: labels[AREAS[role][0]!], exact: true }).waitFor(settled);
      const shown = Object.fromEntries(await Promise.all(Object.entries(labels).map(async ([area, label]) => [area, await isOffered(nav.getByRole('link', { name: label, exact: true }))] as const)));
      expect({ role, shown }).toEqual({ role, shown: Object.fromEntries(Object.keys(labels).map((area) => [area, AREAS[role].includes(area as Area)])) });
      await page.context().close();
    }
  }, 120_000);
});
