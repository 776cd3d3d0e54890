import fs from 'node:fs';
import path from 'node:path';
import mailparser, { type ParsedMail } from 'mailparser';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, demoPassword, launchBrowser, newContext, signIn } from '../support/browser.js';
import { publishedRelease } from '../support/releases.js';
import { joinVenue, leaveVenue } from '../support/venues.js';

// A fresh title per run, so the test never meets a story an earlier run left behind.
const title = `How fast plates move ${Date.now().toString(36)}`;
// The first draft is wrong on purpose: plates move a few cm per year, about 1 to 15 (brief, facts of the trade).
const wrongText = 'The plates under our feet move about 50 metres every year.';
const fixedText = 'The plates under our feet move a few centimetres every year.';
const note = 'Plates move a few centimetres a year, not 50 metres. Please fix the rate.';

let browser: Browser;
let curator: Page;
let educator: Page;
let storyId: number;

// Long enough for the editor's autosave pause and a page's first requests; polling ends as soon as the state is there.
const settled = { timeout: 10_000 };

const panelDoc = (text: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });

async function apiAs(email: string) {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: demoPassword }),
  });
  expect(login.status, `sign-in of ${email}`).toBe(200);
  const { accessToken } = (await login.json()) as { accessToken: string };
  return async <T>(method: string, url: string, body?: unknown): Promise<T> => {
    const response = await fetch(`${baseUrl}/api${url}`, {
      method,
      headers: { Authorization: `Bearer ${accessToken}`, 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    expect(response.ok, `${method} ${url} answered ${response.status}: ${await response.clone().text()}`).toBe(true);
    return (await response.json()) as T;
  };
}

const submissionNote = 'First draft of the plate-speed panel; please check the rate.';

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
  const asCurator = await apiAs('curator@demo.test');
  const story = await asCurator<{ id: number }>('POST', '/stories', { title, audience: 'family' });
  storyId = story.id;
  await asCurator('POST', `/stories/${storyId}/panels`, { doc: panelDoc(wrongText), position: 0, wordBudget: 60 });

  browser = await launchBrowser();
  curator = await (await newContext(browser)).newPage();
  educator = await (await newContext(browser)).newPage();
  await signIn(curator, 'curator@demo.test');
  await signIn(educator, 'educator@demo.test');
});
afterAll(() => browser?.close());

describe('a story goes through review in the browser', () => {
  it('the curator sees the draft’s preflight, submits the story with a note through the dialog, and sees the In review badge', async () => {
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
    await curator.reload();
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
    await submitWithNote(curator, 'The rate is fixed.');
    await curator.getByText('Revision 2 is submitted', { exact: false }).waitFor();
    await expect.poll(() => stateBadge(curator), settled).toBe('In review');
  });

  it('the educator sees the word-level change since the revision they asked changes on, and approves', async () => {
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
    await curator.reload();
    await expect.poll(() => stateBadge(curator), settled).toBe('Approved');
    await expect.poll(async () => Number(await curator.locator('[data-unread]').first().getAttribute('data-unread')), { timeout: 40_000 }).toBeGreaterThan(0);
    await curator.getByRole('link', { name: /^Notifications, \d+ unread$/ }).click();
    await curator.getByRole('heading', { level: 1, name: 'Notifications' }).waitFor();
    const approval = curator.getByRole('link', { name: `“${title}”: revision 2 approved` });
    await approval.waitFor();
    expect(await approval.getAttribute('href')).toMatch(/^\/reviews\/\d+$/);
  });

  it('the approval e-mail reaches the curator with the subject and a link to the revision', async () => {
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
    const link = await curator.getByRole('link', { name: subject }).getAttribute('href');
    expect(approval!.text, 'the mail links to the revision page the notification opens').toContain(`${(process.env.PUBLIC_URL ?? baseUrl).replace(/\/$/, '')}${link}`);
  });
});

describe('an approved, translated, released story is fixed in the browser', () => {
  const typoTitle = `Ridges and trenches ${Date.now().toString(36)}`;
  const typo = 'New sea floor forms at mid-ocean rdiges and sinks at trenches.';
  const fixed = 'New sea floor forms at mid-ocean ridges and sinks at trenches.';
  let typoStoryId: number;
  let firstRevisionId: number;
  const badge = (page: Page) => page.locator('header [data-story-state]').first().textContent();

  let galleryId: number;
  let demoVenueId: number;
  let typoVenueId: number;
  afterAll(async () => {
    const asAdmin = await apiAs('admin@demo.test');
    if (typoVenueId) for (const email of ['curator@demo.test', 'educator@demo.test', 'translator@demo.test', 'technician@demo.test']) await leaveVenue(asAdmin, email, typoVenueId);
  });
  type Unit = { unitId: string; source: string; status: string; version: number };

  /** The translator puts every French unit that is not translated from its current source into French. */
  async function translateIntoFrench(): Promise<Unit[]> {
    const asTranslator = await apiAs('translator@demo.test');
    const units = (await asTranslator<{ items: Unit[] }>('GET', `/stories/${typoStoryId}/translations/fr/units?pageSize=100`)).items;
    for (const unit of units.filter((each) => each.status !== 'translated')) {
      await asTranslator('PUT', `/stories/${typoStoryId}/translations/fr/units/${encodeURIComponent(unit.unitId)}`, { text: `FR: ${unit.source}`, version: unit.version });
    }
    return units;
  }

  /** The technician builds a release of the story's gallery, waits for it to be Ready and publishes it; answers its manifest's story. */
  async function releaseAndPublish() {
    const asTechnician = await apiAs('technician@demo.test');
    const release = await publishedRelease(asTechnician, galleryId, 60_000);
    expect(release, 'the release build').toMatchObject({ state: 'ready' });
    const { manifest } = await asTechnician<{ manifest: string }>('GET', `/releases/${release.id}/manifest`);
    return JSON.parse(manifest).stories.find((story: { id: number }) => story.id === typoStoryId) as { revisionId: number; panels: { docs: Record<string, unknown> }[] };
  }

  // A venue of the test's own, translated into French without falling back to English, so a release needs every text in French.
  beforeAll(async () => {
    const suffix = Date.now().toString(36);
    const asAdmin = await apiAs('admin@demo.test');
    const venue = await asAdmin<{ id: number }>('POST', '/venues', { name: `Typo venue ${suffix}`, slug: `typo-${suffix}`, sourceLocale: 'en', targetLocales: ['fr'], fallbackToSource: false });
    galleryId = (await asAdmin<{ id: number }>('POST', '/galleries', { venueId: venue.id, name: 'Ocean hall' })).id;
    const exhibit = await asAdmin<{ id: number }>('POST', '/exhibits', { galleryId, name: 'The moving sea floor' });
    // The demo staff act here through memberships of this venue too, so stories they start below name their venue.
    demoVenueId = (await asAdmin<{ items: { id: number; slug: string }[] }>('GET', '/venues?pageSize=100')).items.find((candidate) => candidate.slug === 'basalt-point')!.id;
    for (const [email, roles, locales] of [
      ['curator@demo.test', ['curator'], []], ['educator@demo.test', ['educator'], []], ['translator@demo.test', ['translator'], ['fr']], ['technician@demo.test', ['technician'], []],
    ] as const) await joinVenue(asAdmin, email, venue.id, [...roles], [...locales]);
    typoVenueId = venue.id;
    const asCurator = await apiAs('curator@demo.test');
    const asEducator = await apiAs('educator@demo.test');
    typoStoryId = (await asCurator<{ id: number }>('POST', '/stories', { title: typoTitle, audience: 'family', exhibitId: exhibit.id })).id;
    await asCurator('POST', `/stories/${typoStoryId}/panels`, { doc: panelDoc(typo), position: 0, wordBudget: 60 });
    firstRevisionId = (await asCurator<{ revisionId: number }>('POST', `/stories/${typoStoryId}/submit`, {})).revisionId;
    await asEducator('POST', `/revisions/${firstRevisionId}/reviews`, { verdict: 'approve' });
    await translateIntoFrench();
    expect((await releaseAndPublish()).revisionId).toBe(firstRevisionId);
  });

  it('the curator revises it, fixes the typo and submits; the educator sees only the fix against the approved revision and approves', async () => {
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
    const units = await translateIntoFrench();
    // Only the fixed sentence needs the translator again; the story's title, a unit too, stays translated.
    expect(units.filter((unit) => unit.status !== 'translated').map((unit) => [unit.source, unit.status])).toEqual([[fixed, 'stale']]);
    const released = await releaseAndPublish();
    expect(released.revisionId).not.toBe(firstRevisionId);
    expect(JSON.stringify(released.panels[0]!.docs.en)).toContain('mid-ocean ridges');
    expect(JSON.stringify(released.panels[0]!.docs.fr)).toContain(`FR: ${fixed}`);
  });

  it('the curator withdraws a submission no educator has decided on, and can write again', async () => {
    const asCurator = await apiAs('curator@demo.test');
    const story = await asCurator<{ id: number }>('POST', '/stories', { title: `Withdrawn ${Date.now().toString(36)}`, audience: 'family', venueId: demoVenueId });
    await asCurator('POST', `/stories/${story.id}/panels`, { doc: panelDoc(fixed), position: 0, wordBudget: 60 });
    await asCurator('POST', `/stories/${story.id}/submit`, {});
    await curator.goto(`/stories/${story.id}`);
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
    const asCurator = await apiAs('curator@demo.test');
    const blocked = await asCurator<{ id: number }>('POST', '/stories', { title: `Empty panel ${Date.now().toString(36)}`, audience: 'family', venueId: demoVenueId });
    await asCurator('POST', `/stories/${blocked.id}/panels`, { doc: panelDoc(fixed), position: 0, wordBudget: 60 });
    await asCurator('POST', `/stories/${blocked.id}/panels`, { doc: { type: 'doc', content: [{ type: 'paragraph' }] }, position: 1, wordBudget: 60 });
    await curator.goto(`/stories/${blocked.id}`);
    const preflight = curator.locator('[data-draft-preflight]');
    await preflight.getByText('Preflight: 1 blocker to fix before this story can be submitted').waitFor();
    await preflight.locator('[data-preflight="blocker"]').getByText('Panel 2 is empty', { exact: false }).waitFor();
    expect(await curator.getByRole('button', { name: 'Submit for review' }).count()).toBe(0);
  });
});
