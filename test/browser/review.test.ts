import fs from 'node:fs';
import path from 'node:path';
import mailparser, { type ParsedMail } from 'mailparser';
import type { Browser, Page } from 'playwright-core';
import type { PanelView } from '@mantlepiece/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiAs, baseUrl, launchBrowser, newContext, signIn } from '../support/browser.js';
import { publishedRelease } from '../support/releases.js';
import { paragraphs, storyWithPanels } from '../support/stories.js';
import { joinVenue, leaveVenue } from '../support/venues.js';

// The first draft is wrong on purpose: plates move a few cm per year, about 1 to 15 (brief, facts of the trade).
const wrongText = 'The plates under our feet move about 50 metres every year.';
const fixedText = 'The plates under our feet move a few centimetres every year.';
const note = 'Plates move a few centimetres a year, not 50 metres. Please fix the rate.';
const submissionNote = 'First draft of the plate-speed panel; please check the rate.';
const resubmissionNote = 'The rate is fixed.';

let browser: Browser;
let curator: Page;
let educator: Page;
let demoVenueId: number;

// Long enough for the editor's autosave pause and a page's first requests; polling ends as soon as the state is there.
const settled = { timeout: 10_000 };

/** A title no other test or run has, so a test never meets a story made elsewhere. */
const freshTitle = (start: string) => `${start} ${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

/** How far through review the API takes a plate-speed story before a test goes on in the browser. */
type ReviewStage = 'draft' | 'submitted' | 'changes requested' | 'resubmitted' | 'approved';
const STAGES: readonly ReviewStage[] = ['draft', 'submitted', 'changes requested', 'resubmitted', 'approved'];

/**
 * A plate-speed story of the test's own at the demo venue, written with the wrong rate and taken through
 * review up to `stage` by the API, as the curator and the educator would have in the studio: submitted with
 * a note, sent back with a note, fixed and resubmitted, approved. Answers its title, id and latest revision.
 */
async function plateSpeedStory(stage: ReviewStage): Promise<{ title: string; storyId: number; revisionId?: number }> {
  const reached = (step: ReviewStage) => STAGES.indexOf(stage) >= STAGES.indexOf(step);
  const [asCurator, asEducator] = await Promise.all([apiAs('curator@demo.test'), apiAs('educator@demo.test')]);
  const title = freshTitle('How fast plates move');
  const { storyId, panels: [panel] } = await storyWithPanels(asCurator, { title, venueId: demoVenueId }, [paragraphs(wrongText)]);
  let revisionId: number | undefined;
  if (reached('submitted')) ({ revisionId } = await asCurator<{ revisionId: number }>('POST', `/stories/${storyId}/submit`, { note: submissionNote }));
  if (reached('changes requested')) await asEducator('POST', `/revisions/${revisionId}/reviews`, { verdict: 'request_changes', note });
  if (reached('resubmitted')) {
    await asCurator('PUT', `/panels/${panel!.id}`, { doc: paragraphs(fixedText), version: panel!.version });
    ({ revisionId } = await asCurator<{ revisionId: number }>('POST', `/stories/${storyId}/submit`, { note: resubmissionNote }));
  }
  if (reached('approved')) await asEducator('POST', `/revisions/${revisionId}/reviews`, { verdict: 'approve' });
  return { title, storyId, revisionId };
}

/** Submit for review through its dialog, with a note to the educator. */
async function submitWithNote(page: Page, text: string) {
  await page.getByRole('button', { name: 'Submit for review' }).click();
  const dialog = page.getByRole('dialog');
  await dialog.getByRole('textbox', { name: 'Note to the educator (optional)' }).fill(text);
  await dialog.getByRole('button', { name: 'Submit for review' }).click();
  await dialog.waitFor({ state: 'detached' });
}

const stateBadge = (page: Page) => page.locator('header').getByText(/^(Draft|In review|Changes requested|Approved|Retired)$/).first().textContent();

/** Every captured message the stand-in wrote for one recipient, parsed. */
async function mailTo(recipient: string): Promise<ParsedMail[]> {
  const dir = process.env.MAIL_DIR;
  if (!dir) throw new Error('MAIL_DIR must point at the SMTP stand-in’s folder');
  const files = fs.readdirSync(dir).filter((name) => name.endsWith('.eml') && !name.startsWith('.'));
  const parsed = await Promise.all(files.map((name) => mailparser.simpleParser(fs.readFileSync(path.join(dir, name)))));
  // The stand-in records the envelope's RCPT TO as a header.
  return parsed.filter((mail) => mail.headers.get('x-envelope-to') === recipient);
}

beforeAll(async () => {
  const asAdmin = await apiAs('admin@demo.test');
  // Stories a test starts belong to the demo venue, whose review queue the educator's studio shows, whatever other venue the staff join.
  demoVenueId = (await asAdmin<{ items: { id: number; slug: string }[] }>('GET', '/venues?pageSize=100')).items.find((candidate) => candidate.slug === 'basalt-point')!.id;
  browser = await launchBrowser();
  curator = await (await newContext(browser)).newPage();
  educator = await (await newContext(browser)).newPage();
  await signIn(curator, 'curator@demo.test');
  await signIn(educator, 'educator@demo.test');
});
afterAll(() => browser?.close());

describe('a story goes through review in the browser', () => {
  it('the curator sees the draft’s preflight, submits the story with a note through the dialog, and sees the In review badge', async () => {
    const { title, storyId } = await plateSpeedStory('draft');
    await curator.goto(`/stories/${storyId}`);
    await curator.getByRole('heading', { level: 1, name: title }).waitFor();
    expect(await stateBadge(curator)).toBe('Draft');
    await curator.locator('[data-draft-preflight]').getByText('Preflight: nothing blocks a submission').waitFor();
    await submitWithNote(curator, submissionNote);
    await curator.getByText('Revision 1 is submitted', { exact: false }).waitFor();
    await expect.poll(() => stateBadge(curator), settled).toBe('In review');
    // The editor is closed while an educator reads it; Withdraw would open it again.
    await curator.getByRole('button', { name: 'Withdraw' }).waitFor();
    expect(await curator.getByRole('button', { name: 'Submit for review' }).count()).toBe(0);
  });

  it('the educator finds it in the review queue and asks for changes with a note', async () => {
    const { title } = await plateSpeedStory('submitted');
    await educator.getByRole('navigation', { name: 'Studio areas' }).getByRole('link', { name: 'Reviews' }).click();
    await educator.getByRole('heading', { level: 1, name: 'Reviews' }).waitFor();
    await educator.getByRole('link', { name: title }).click();
    await educator.getByRole('heading', { level: 1, name: `${title} · revision 1` }).waitFor();
    await educator.locator('[data-submission-note]').getByText(submissionNote).waitFor();
    await educator.locator('[data-comparison-basis="first_review"]').waitFor();
    await educator.getByRole('radio', { name: 'Request changes' }).check();
    // A request for changes without a note is refused before it is sent.
    await educator.getByRole('button', { name: 'Send back for changes' }).click();
    await educator.getByText('a request for changes needs a note', { exact: false }).waitFor();
    await educator.getByRole('textbox', { name: 'What should change' }).fill(note);
    await educator.getByRole('button', { name: 'Send back for changes' }).click();
    await educator.locator('[data-verdict-outcome="changes_requested"]').getByText('Sent back to the curator with your note.').waitFor();
    await expect.poll(() => educator.locator('header').getByText(/^Changes requested$/).count(), settled).toBeGreaterThan(0);
  });

  it('the curator sees the note, fixes the panel and resubmits', async () => {
    const { storyId } = await plateSpeedStory('changes requested');
    await curator.goto(`/stories/${storyId}`);
    await expect.poll(() => stateBadge(curator), settled).toBe('Changes requested');
    await curator.getByText(/^Revisions? \(1\)$/).click();
    await curator.locator('[data-story-revisions]').getByRole('link', { name: 'Revision 1' }).click();
    await curator.locator('[data-verdict="request_changes"]').getByText(note).waitFor();

    await curator.getByRole('link', { name: 'Open the story' }).first().click();
    const editor = curator.getByRole('textbox', { name: 'Panel text' });
    await editor.waitFor();
    await editor.click();
    await curator.keyboard.press('ControlOrMeta+a');
    await curator.keyboard.type(fixedText);
    await expect.poll(() => curator.locator('[data-save-status]').getAttribute('data-save-status'), settled).toBe('saved');
    await submitWithNote(curator, resubmissionNote);
    await curator.getByText('Revision 2 is submitted', { exact: false }).waitFor();
    await expect.poll(() => stateBadge(curator), settled).toBe('In review');
  });

  it('the educator sees the word-level change since the revision they asked changes on, and approves', async () => {
    const { title } = await plateSpeedStory('resubmitted');
    await educator.goto('/reviews');
    await educator.getByRole('link', { name: title }).click();
    await educator.getByRole('heading', { level: 1, name: `${title} · revision 2` }).waitFor();
    // Nothing is approved yet, so the comparison is with revision 1, where the changes were asked for: only the rate changed.
    await educator.locator('[data-comparison-basis="changes_requested"]').waitFor();
    const marked = async (tag: 'ins' | 'del') => (await educator.locator(`[data-text-diff] ${tag}`).allTextContents()).join(' ');
    await expect.poll(() => marked('ins'), settled).toContain('centimetres');
    expect(await marked('ins')).not.toContain('plates under our feet');
    expect(await marked('del')).toContain('50');
    await educator.getByRole('radio', { name: 'Approve' }).check();
    await educator.getByRole('button', { name: 'Approve this revision' }).click();
    // The state is what counts; the confirmation stays once the verdict form has left with the open revision.
    await educator.locator('[data-verdict-outcome="approved"]').getByText('Approved. The story can now go into a release.').waitFor();
    await expect.poll(() => educator.getByRole('button', { name: 'Approve this revision' }).count(), settled).toBe(0);
    await educator.locator('[data-verdict="approve"]').waitFor();
  });

  it('the curator sees the approval: the state badge and a notification', async () => {
    const { title, storyId } = await plateSpeedStory('approved');
    await curator.goto(`/stories/${storyId}`);
    await expect.poll(() => stateBadge(curator), settled).toBe('Approved');
    await expect.poll(async () => Number(await curator.locator('[data-unread]').first().getAttribute('data-unread')), { timeout: 40_000 }).toBeGreaterThan(0);
    await curator.getByRole('link', { name: /^Notifications, \d+ unread$/ }).click();
    await curator.getByRole('heading', { level: 1, name: 'Notifications' }).waitFor();
    const approval = curator.getByRole('link', { name: `“${title}”: revision 2 approved` });
    await approval.waitFor();
    expect(await approval.getAttribute('href')).toMatch(/^\/reviews\/\d+$/);
  });

  it('the approval e-mail reaches the curator with the subject and a link to the revision', async () => {
    const { title, revisionId } = await plateSpeedStory('approved');
    const subject = `“${title}”: revision 2 approved`;
    let approval: ParsedMail | undefined;
    await expect
      .poll(async () => {
        approval = (await mailTo('curator@demo.test')).find((mail) => mail.subject === subject);
        return approval?.subject;
      }, { timeout: 30_000, interval: 500 })
      .toBe(subject);
    const to = Array.isArray(approval!.to) ? approval!.to.map((address) => address.text).join(', ') : approval!.to?.text;
    expect(to).toContain('curator@demo.test');
    expect(approval!.text, 'the mail links to the approved revision’s page, which the notification opens too').toContain(`${(process.env.PUBLIC_URL ?? baseUrl).replace(/\/$/, '')}/reviews/${revisionId}`);
  });
});

describe('an approved, translated, released story is fixed in the browser', () => {
  const typo = 'New sea floor forms at mid-ocean rdiges and sinks at trenches.';
  const fixed = 'New sea floor forms at mid-ocean ridges and sinks at trenches.';
  const badge = (page: Page) => page.locator('header [data-story-state]').first().textContent();

  let typoVenueId: number;
  afterAll(async () => {
    const asAdmin = await apiAs('admin@demo.test');
    if (typoVenueId) for (const email of ['curator@demo.test', 'educator@demo.test', 'translator@demo.test', 'technician@demo.test']) await leaveVenue(asAdmin, email, typoVenueId);
  });
  type Unit = { unitId: string; source: string; status: string; version: number };
  type ReleasedStory = { title: string; storyId: number; galleryId: number; firstRevisionId: number };

  /** The translator puts every French unit of the story that is not translated from its current source into French. */
  async function translateIntoFrench(storyId: number): Promise<Unit[]> {
    const asTranslator = await apiAs('translator@demo.test');
    const units = (await asTranslator<{ items: Unit[] }>('GET', `/stories/${storyId}/translations/fr/units?pageSize=100`)).items;
    for (const unit of units.filter((each) => each.status !== 'translated')) {
      await asTranslator('PUT', `/stories/${storyId}/translations/fr/units/${encodeURIComponent(unit.unitId)}`, { text: `FR: ${unit.source}`, version: unit.version });
    }
    return units;
  }

  /** The technician builds a release of the story's gallery, waits for it to be Ready and publishes it; answers its manifest's story. */
  async function releaseAndPublish({ storyId, galleryId }: ReleasedStory) {
    const asTechnician = await apiAs('technician@demo.test');
    const release = await publishedRelease(asTechnician, galleryId, 60_000);
    expect(release, 'the release build').toMatchObject({ state: 'ready' });
    const { manifest } = await asTechnician<{ manifest: string }>('GET', `/releases/${release.id}/manifest`);
    return JSON.parse(manifest).stories.find((story: { id: number }) => story.id === storyId) as { revisionId: number; panels: { docs: Record<string, unknown> }[] };
  }

  /**
   * A story with a typo, alone in a gallery of its own at the typo venue (so no other test's story joins its
   * releases): approved, translated into French and released, as it stands before the curator fixes it.
   */
  async function releasedStoryWithTypo(): Promise<ReleasedStory> {
    const [asAdmin, asCurator, asEducator] = await Promise.all([apiAs('admin@demo.test'), apiAs('curator@demo.test'), apiAs('educator@demo.test')]);
    const galleryId = (await asAdmin<{ id: number }>('POST', '/galleries', { venueId: typoVenueId, name: freshTitle('Ocean hall') })).id;
    const exhibit = await asAdmin<{ id: number }>('POST', '/exhibits', { galleryId, name: 'The moving sea floor' });
    const title = freshTitle('Ridges and trenches');
    const { storyId } = await storyWithPanels(asCurator, { title, exhibitId: exhibit.id }, [paragraphs(typo)]);
    const firstRevisionId = (await asCurator<{ revisionId: number }>('POST', `/stories/${storyId}/submit`, {})).revisionId;
    await asEducator('POST', `/revisions/${firstRevisionId}/reviews`, { verdict: 'approve' });
    const story = { title, storyId, galleryId, firstRevisionId };
    await translateIntoFrench(storyId);
    expect((await releaseAndPublish(story)).revisionId).toBe(firstRevisionId);
    return story;
  }

  // A venue of the suite's own, translated into French without falling back to English, so a release needs every text in French.
  beforeAll(async () => {
    const suffix = Date.now().toString(36);
    const asAdmin = await apiAs('admin@demo.test');
    const venue = await asAdmin<{ id: number }>('POST', '/venues', { name: `Typo venue ${suffix}`, slug: `typo-${suffix}`, sourceLocale: 'en', targetLocales: ['fr'], fallbackToSource: false });
    // The demo staff act here through memberships of this venue too, so stories they start below name their venue.
    for (const [email, roles, locales] of [
      ['curator@demo.test', ['curator'], []], ['educator@demo.test', ['educator'], []], ['translator@demo.test', ['translator'], ['fr']], ['technician@demo.test', ['technician'], []],
    ] as const) await joinVenue(asAdmin, email, venue.id, [...roles], [...locales]);
    typoVenueId = venue.id;
  });

  it('the curator revises it, fixes the typo and submits; the educator sees only the fix against the approved revision and approves', async () => {
    const { title: typoTitle, storyId: typoStoryId } = await releasedStoryWithTypo();
    await curator.goto(`/stories/${typoStoryId}`);
    await curator.getByRole('heading', { level: 1, name: typoTitle }).waitFor();
    expect(await badge(curator)).toBe('Approved');
    expect(await curator.getByRole('textbox', { name: 'Panel text' }).getAttribute('contenteditable')).toBe('false');

    await curator.getByRole('button', { name: 'Revise' }).click();
    await expect.poll(() => badge(curator), settled).toBe('Approved · draft in progress');
    const editor = curator.getByRole('textbox', { name: 'Panel text' });
    await expect.poll(() => editor.getAttribute('contenteditable'), settled).toBe('true');
    await editor.click();
    await curator.keyboard.press('ControlOrMeta+a');
    await curator.keyboard.type(fixed);
    await expect.poll(() => curator.locator('[data-save-status]').getAttribute('data-save-status'), settled).toBe('saved');
    await submitWithNote(curator, 'Typo: “rdiges”.');
    await curator.getByText('Revision 2 is submitted', { exact: false }).waitFor();
    await expect.poll(() => badge(curator), settled).toBe('Approved · new revision in review');

    // The typo venue is not the educator's first, so the queue (of the studio's current venue) does not list it: open the revision itself.
    const [submitted] = await (await apiAs('educator@demo.test'))<{ id: number }[]>('GET', `/stories/${typoStoryId}/revisions`);
    await educator.goto(`/reviews/${submitted!.id}`);
    await educator.getByRole('heading', { level: 1, name: `${typoTitle} · revision 2` }).waitFor();
    await educator.locator('[data-comparison-basis="approved"]').getByRole('link', { name: 'Revision 1' }).waitFor();
    const marked = async (tag: 'ins' | 'del') => (await educator.locator(`[data-text-diff] ${tag}`).allTextContents()).join(' ');
    await expect.poll(() => marked('ins'), settled).toContain('ridges');
    expect(await marked('del')).toContain('rdiges');
    expect(await marked('ins')).not.toContain('sea floor');
    await educator.getByRole('radio', { name: 'Approve' }).check();
    await educator.getByRole('button', { name: 'Approve this revision' }).click();
    await educator.locator('[data-verdict-outcome="approved"]').waitFor();

    await curator.reload();
    await expect.poll(() => badge(curator), settled).toBe('Approved');
  });

  it('the fixed sentence’s French goes stale, is translated again, and a new release carries the fix', async () => {
    const story = await releasedStoryWithTypo();
    // The curator revises the story, fixes the typo and submits; the educator approves the fix.
    const [asCurator, asEducator] = await Promise.all([apiAs('curator@demo.test'), apiAs('educator@demo.test')]);
    await asCurator('POST', `/stories/${story.storyId}/revise`, {});
    const [panel] = (await asCurator<{ panels: PanelView[] }>('GET', `/stories/${story.storyId}`)).panels;
    await asCurator('PUT', `/panels/${panel!.id}`, { doc: paragraphs(fixed), version: panel!.version });
    const { revisionId } = await asCurator<{ revisionId: number }>('POST', `/stories/${story.storyId}/submit`, {});
    await asEducator('POST', `/revisions/${revisionId}/reviews`, { verdict: 'approve' });

    const units = await translateIntoFrench(story.storyId);
    // Only the fixed sentence needs the translator again; the story's title, a unit too, stays translated.
    expect(units.filter((unit) => unit.status !== 'translated').map((unit) => [unit.source, unit.status])).toEqual([[fixed, 'stale']]);
    const released = await releaseAndPublish(story);
    expect(released.revisionId).not.toBe(story.firstRevisionId);
    expect(JSON.stringify(released.panels[0]!.docs.en)).toContain('mid-ocean ridges');
    expect(JSON.stringify(released.panels[0]!.docs.fr)).toContain(`FR: ${fixed}`);
  });

  it('the curator withdraws a submission no educator has decided on, and can write again', async () => {
    const asCurator = await apiAs('curator@demo.test');
    const { storyId } = await storyWithPanels(asCurator, { title: freshTitle('Withdrawn'), venueId: demoVenueId }, [paragraphs(fixed)]);
    await asCurator('POST', `/stories/${storyId}/submit`, {});
    await curator.goto(`/stories/${storyId}`);
    await expect.poll(() => badge(curator), settled).toBe('In review');
    expect(await curator.getByRole('textbox', { name: 'Panel text' }).getAttribute('contenteditable')).toBe('false');
    await curator.getByRole('button', { name: 'Withdraw' }).click();
    await curator.getByRole('alertdialog').getByRole('button', { name: 'Withdraw submission' }).click();
    await curator.getByText('The submission is withdrawn; the story is a draft again.').waitFor();
    await expect.poll(() => badge(curator), settled).toBe('Draft');
    await expect.poll(() => curator.getByRole('textbox', { name: 'Panel text' }).getAttribute('contenteditable'), settled).toBe('true');
    await curator.getByText(/^Revisions? \(1\)$/).click();
    await curator.locator('[data-story-revisions]').getByText('Withdrawn').waitFor();
  });

  it('does not offer Submit on a draft whose preflight has a blocker, and says which panel to fix', async () => {
    const { storyId } = await storyWithPanels(await apiAs('curator@demo.test'), { title: freshTitle('Empty panel'), venueId: demoVenueId }, [
      paragraphs(fixed), { type: 'doc', content: [{ type: 'paragraph' }] },
    ]);
    await curator.goto(`/stories/${storyId}`);
    const preflight = curator.locator('[data-draft-preflight]');
    await preflight.getByText('Preflight: 1 blocker to fix before this story can be submitted').waitFor();
    await preflight.locator('[data-preflight="blocker"]').getByText('Panel 2 is empty', { exact: false }).waitFor();
    expect(await curator.getByRole('button', { name: 'Submit for review' }).count()).toBe(0);
  });
});
