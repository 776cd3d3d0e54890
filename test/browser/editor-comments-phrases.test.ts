import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiAs, launchBrowser, newContext, signIn } from '../support/browser.js';

// A fresh title per run, so the test never meets a story an earlier run left behind.
const title = `Rock that grips ${Date.now().toString(36)}`;
const firstLine = 'Rock on a slope grips until the slope is too steep.';
const commentBody = 'Say what makes it grip: friction between the rock and the slope.';
const reply = 'Done: the next revision names friction.';
// μs = 0.6 and a 20° slope: the block holds, since it slides only above arctan 0.6 ≈ 30.96° (inclined plane with Coulomb friction, the brief's science).
const slopeParams = { massKg: 10, angleDeg: 20, staticFriction: 0.6, kineticFriction: 0.5 };
const wordings = { holds: 'holds fast', slides: 'starts to slide' };

const panelDoc = {
  type: 'doc',
  content: [
    { type: 'paragraph', content: [{ type: 'text', text: firstLine }] },
    {
      type: 'paragraph',
      content: [
        { type: 'text', text: 'Tilt the board: the block ' },
        { type: 'livePhrase', attrs: { phraseId: 'ph-grip', widgetId: 'grip-slope', wordings } },
        { type: 'text', text: '.' },
      ],
    },
    { type: 'widget', attrs: { widgetType: 'slope-force', widgetId: 'grip-slope', params: slopeParams } },
  ],
};

// Set SCREENSHOT_DIR to keep a picture of the editor with its comments, for a person to look at.
const shots = process.env.SCREENSHOT_DIR;
// Long enough for a page's first requests; polling ends as soon as the state is there.
const settled = { timeout: 10_000 };

let browser: Browser;
let curator: Page;
let storyId: number;
let commentId: number;
let asEducator: Awaited<ReturnType<typeof apiAs>>;

beforeAll(async () => {
  const asCurator = await apiAs('curator@demo.test');
  asEducator = await apiAs('educator@demo.test');
  storyId = (await asCurator<{ id: number }>('POST', '/stories', { title, audience: 'family' })).id;
  const panel = await asCurator<{ id: number }>('POST', `/stories/${storyId}/panels`, { doc: panelDoc, position: 0, wordBudget: 60 });
  const submitted = await asCurator<{ revisionId: number }>('POST', `/stories/${storyId}/submit`, { note: 'Please check the friction panel.' });
  const from = firstLine.indexOf('grips');
  commentId = (await asEducator<{ id: number }>('POST', `/revisions/${submitted.revisionId}/comments`, { panelId: panel.id, range: { from, to: from + 'grips'.length, quote: 'grips' }, body: commentBody })).id;
  await asEducator('POST', `/revisions/${submitted.revisionId}/reviews`, { verdict: 'request_changes', note: 'See my comment on the first panel.' });

  browser = await launchBrowser();
  curator = await (await newContext(browser)).newPage();
  await signIn(curator, 'curator@demo.test');
  // Three sign-ins, each a password hash on purpose slow, and a story sent through review: more than the default minute on a busy machine.
}, 180_000);
afterAll(() => browser?.close());

describe('review comments in the story editor', () => {
  it('marks the words an educator commented on, and counts the open thread', async () => {
    await curator.goto(`/stories/${storyId}`);
    await curator.getByRole('heading', { level: 1, name: title }).waitFor();
    const marked = curator.locator('.ProseMirror .mp-comment-anchor');
    await expect.poll(() => marked.textContent(), settled).toBe('grips');
    const tab = curator.getByRole('tab', { name: 'Comments (1)' });
    await tab.waitFor();
    await tab.click();
    await curator.getByTestId('draft-comments').getByText(commentBody).waitFor();
    if (shots) await curator.screenshot({ path: `${shots}/editor-comments.png`, fullPage: true });
  });

  it('lets the curator reply there; once the educator who wrote it resolves it, the words are no longer marked', async () => {
    const comments = curator.getByTestId('draft-comments');
    await comments.getByRole('button', { name: 'Reply' }).click();
    await comments.getByRole('textbox').fill(reply);
    await comments.getByRole('button', { name: 'Send reply' }).click();
    await comments.getByText(reply).waitFor();
    // A comment is resolved by its author or a reviewer of the revision, so the curator is not offered it.
    expect(await comments.getByRole('button', { name: 'Resolve' }).count()).toBe(0);
    await asEducator('PATCH', `/comments/${commentId}`, { resolved: true });
    await curator.reload();
    await curator.getByRole('tab', { name: 'Comments (0)' }).click();
    await expect.poll(() => curator.locator('.ProseMirror .mp-comment-anchor').count(), settled).toBe(0);
    await comments.getByText('No open comments on this panel.').waitFor();
  });
});

describe('a live phrase in the studio preview', () => {
  it('switches from the "holds" wording to the "slides" wording when the slope is dragged past arctan 0.6 ≈ 30.96°', async () => {
    await curator.getByRole('tab', { name: 'Preview' }).click();
    const preview = curator.locator('[data-preview-layout]');
    const phrase = preview.locator('.mp-live-phrase');
    await expect.poll(() => phrase.textContent(), settled).toBe('holds fast');
    const slider = preview.getByRole('slider', { name: 'Slope force box: Slope angle' });
    const box = (await slider.boundingBox())!;
    // The drawing is 480 × 360 with the slope's hinge at (56, 292) and a 250-unit board: at 20° its free end is at (290.9, 206.5).
    const at = (x: number, y: number) => [box.x + (x / 480) * box.width, box.y + (y / 360) * box.height] as const;
    await curator.mouse.move(...at(290.9, 206.5));
    await curator.mouse.down();
    // 74 units right of the hinge and 262 above it: a tilt of about 74°.
    await curator.mouse.move(...at(130, 30), { steps: 12 });
    await curator.mouse.up();
    await expect.poll(async () => Number(await slider.getAttribute('aria-valuenow')), settled).toBeGreaterThan(30.96);
    await expect.poll(() => phrase.textContent(), settled).toBe('starts to slide');
    expect(await phrase.getAttribute('data-state')).toBe('slides');
  });
});
