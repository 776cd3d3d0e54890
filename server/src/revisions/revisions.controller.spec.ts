import { getModelToken } from '@nestjs/sequelize';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { paragraphDoc } from '../../test/authoring-fixtures.js';
import {
  createReviewApp, imageDoc, libraryImage, liveValueDoc, member, reviewVenue, SLOPE_PARAMS, storyWithPanels, submit, verdict, widgetNode, type Headers,
} from '../../test/review-fixtures.js';
import type { TestApp } from '../../test/test-app.js';
import { PanelDocument } from '../panels/models/panel-document.model.js';
import { Revision } from './models/revision.model.js';

let t: TestApp;
let curator: Headers;
let educator: Headers;
let venueId: number;
let exhibitId: number;

beforeAll(async () => {
  t = await createReviewApp();
  ({ venue: { id: venueId }, exhibit: { id: exhibitId } } = await reviewVenue(t, 'revisions'));
  curator = (await member(t, ['curator'], { name: 'Ayesha Karim' })).auth;
  educator = (await member(t, ['educator'])).auth;
});
afterAll(() => t.close());

const getRevision = async (id: number) => (await request(t.http).get(`/api/revisions/${id}`).set(educator)).body;

describe('a submitted revision', () => {
  it('stays exactly as submitted while the draft is edited, hash included', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [paragraphDoc('Plates move a few centimetres a year.')]);
    const submitted = await submit(t, curator, storyId);
    expect(submitted).toMatchObject({ number: 1, state: 'in_review', preflight: expect.arrayContaining([expect.objectContaining({ check: 'widget-params', passed: true })]) });
    const before = await getRevision(submitted.revisionId);
    expect(before).toMatchObject({ storyId, number: 1, state: 'open', hash: expect.stringMatching(/^[0-9a-f]{64}$/), submittedBy: { name: 'Ayesha Karim' }, previousApprovedRevisionId: null });
    expect(before.snapshot).toEqual([{ panelId: panelIds[0], position: 0, docs: { en: paragraphDoc('Plates move a few centimetres a year.') }, wordBudget: 60 }]);

    // In review the editor is closed (409); withdrawn, the story is a draft to write in again.
    const edit = () => request(t.http).put(`/api/panels/${panelIds[0]}`).set(curator).send({ doc: paragraphDoc('Plates move as fast as fingernails grow.'), version: 1 });
    expect((await edit()).status).toBe(409);
    expect((await request(t.http).post(`/api/stories/${storyId}/withdraw`).set(curator)).status).toBe(200);
    expect((await edit()).status).toBe(200);
    await request(t.http).patch(`/api/stories/${storyId}`).set(curator).send({ title: 'A new title' });

    const after = await getRevision(submitted.revisionId);
    expect({ snapshot: after.snapshot, hash: after.hash, storyTitle: after.storyTitle }).toEqual({ snapshot: before.snapshot, hash: before.hash, storyTitle: before.storyTitle });
    const draft = (await request(t.http).get(`/api/stories/${storyId}`).set(curator)).body;
    expect(draft.panels[0].doc).toEqual(paragraphDoc('Plates move as fast as fingernails grow.'));
    expect(draft.state).toBe('draft');
  });

  it('has no route that edits it, and its model refuses to change its content', async () => {
    const { storyId } = await storyWithPanels(t, curator, exhibitId);
    const { revisionId } = await submit(t, curator, storyId);
    for (const method of ['patch', 'put', 'delete'] as const) expect((await request(t.http)[method](`/api/revisions/${revisionId}`).set(curator).send({})).status).toBe(404);
    const revision = (await t.app.get<typeof Revision>(getModelToken(Revision)).findByPk(revisionId))!;
    await expect(revision.update({ hash: '0'.repeat(64) })).rejects.toThrow(/immutable: hash/);
    await expect(t.app.get<typeof Revision>(getModelToken(Revision)).update({ snapshot: { format: 1 } }, { where: { id: revisionId } })).rejects.toThrow(/immutable: snapshot/);
  });

  it('is superseded by the next submission, which is numbered after it', async () => {
    const { storyId } = await storyWithPanels(t, curator, exhibitId);
    const first = await submit(t, curator, storyId);
    const second = await submit(t, curator, storyId);
    expect(second.number).toBe(2);
    const list = (await request(t.http).get(`/api/stories/${storyId}/revisions`).set(curator)).body;
    expect(list.map((r: { id: number; state: string }) => [r.id, r.state])).toEqual([[second.revisionId, 'open'], [first.revisionId, 'superseded']]);
  });

  it('compares with the last approved revision after a revise: text and widget settings that changed', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [liveValueDoc('ridge', widgetNode('ridge'))]);
    const first = await submit(t, curator, storyId);
    expect((await request(t.http).get(`/api/revisions/${first.revisionId}/compare`).set(curator)).body).toMatchObject({ basis: 'first_review', base: null, diff: [{ panelId: panelIds[0], status: 'added' }] });
    await verdict(t, educator, first.revisionId, { verdict: 'approve' });

    expect((await request(t.http).post(`/api/stories/${storyId}/revise`).set(curator)).status).toBe(200);
    const changed = liveValueDoc('ridge', widgetNode('ridge', { ...SLOPE_PARAMS, angleDeg: 40 }));
    await request(t.http).put(`/api/panels/${panelIds[0]}`).set(curator).send({ doc: changed, version: 1 });
    const second = await submit(t, curator, storyId);
    const res = await request(t.http).get(`/api/revisions/${second.revisionId}/compare`).set(educator);
    expect(res.status).toBe(200);
    expect(res.body.basis).toBe('approved');
    expect(res.body.base).toMatchObject({ id: first.revisionId, state: 'approved', reviews: [{ verdict: 'approve' }] });
    expect(res.body.diff).toEqual([expect.objectContaining({
      panelId: panelIds[0], status: 'changed',
      widgets: [{ kind: 'changed', widgetId: 'ridge', widgetType: 'slope-force', params: [{ path: ['angleDeg'], before: 30, after: 40 }] }],
    })]);
    expect((await getRevision(second.revisionId)).previousApprovedRevisionId).toBe(first.revisionId);
  });

  it('compares a resubmission after changes were asked for with the revision they were asked on, while none is approved', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [paragraphDoc('Hot rock rises and cool rock sinks.')]);
    const first = await submit(t, curator, storyId);
    await verdict(t, educator, first.revisionId, { verdict: 'request_changes', note: 'Say how slowly.' });
    await request(t.http).put(`/api/panels/${panelIds[0]}`).set(curator).send({ doc: paragraphDoc('Hot rock rises and cool rock sinks, slowly.'), version: 1 });
    const second = await submit(t, curator, storyId);
    const res = await request(t.http).get(`/api/revisions/${second.revisionId}/compare`).set(educator);
    expect(res.body).toMatchObject({ basis: 'changes_requested', base: { id: first.revisionId, state: 'changes_requested' }, diff: [{ panelId: panelIds[0], status: 'changed' }] });
    expect(res.body.diff[0].text).toContainEqual({ kind: 'added', text: expect.stringContaining('slowly') });
  });

  it('keeps the curator’s note to the educators with the revision', async () => {
    const { storyId } = await storyWithPanels(t, curator, exhibitId);
    const { revisionId } = (await request(t.http).post(`/api/stories/${storyId}/submit`).set(curator).send({ note: '  Panel 1 now says how fast.  ' })).body;
    expect((await getRevision(revisionId)).note).toBe('Panel 1 now says how fast.');
    const unsaid = await submit(t, curator, (await storyWithPanels(t, curator, exhibitId)).storyId);
    expect((await getRevision(unsaid.revisionId)).note).toBeNull();
  });
});

describe('preflight blockers stop a submission (422 listing them) and show on the draft first', () => {
  async function expectBlocked(storyId: number, check: string, panelId: number, message: RegExp) {
    const draft = await request(t.http).get(`/api/stories/${storyId}/preflight`).set(curator);
    expect(draft.status).toBe(200);
    expect(draft.body).toContainEqual(expect.objectContaining({ check, severity: 'blocker', passed: false, panelId, message: expect.stringMatching(message) }));
    const res = await request(t.http).post(`/api/stories/${storyId}/submit`).set(curator).send({ note: 'Ready, I think.' });
    expect(res.status).toBe(422);
    expect(res.body).toMatchObject({ statusCode: 422, message: expect.stringMatching(/cannot be submitted for review while it has/) });
    expect(res.body.errors).toContainEqual({ path: ['preflight', check, panelId], message: expect.stringMatching(message) });
    expect((await request(t.http).get(`/api/stories/${storyId}`).set(curator)).body.state).toBe('draft');
    expect((await request(t.http).get(`/api/stories/${storyId}/revisions`).set(curator)).body).toEqual([]);
  }

  const rights = { credit: 'Map: Basalt Point', licence: { kind: 'spdx', id: 'CC-BY-4.0' }, licenceExpiresOn: '2030-12-31', alt: { en: 'A map of plate boundaries.' } };

  it('an image without alt text in the source locale', async () => {
    const mediaId = await libraryImage(t, curator, venueId, { ...rights, alt: { fr: 'Une carte.' } });
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [imageDoc(mediaId)]);
    await expectBlocked(storyId, 'image-alt-text', panelIds[0]!, /no alt text in English/);
  });

  it('an image without a credit line', async () => {
    const mediaId = await libraryImage(t, curator, venueId, { ...rights, credit: null });
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [imageDoc(mediaId)]);
    await expectBlocked(storyId, 'image-credit', panelIds[0]!, /no credit line/);
  });

  it('a licence that has expired', async () => {
    const mediaId = await libraryImage(t, curator, venueId, { ...rights, licenceExpiresOn: '2020-06-30' });
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [imageDoc(mediaId)]);
    await expectBlocked(storyId, 'image-licence-expiry', panelIds[0]!, /ran out on 2020-06-30/);
  });

  it('a licence that ends before the exhibit’s planned end', async () => {
    // The suite's exhibit ends on 2027-12-31; the licence is in force today but not that long.
    const expires = new Date(t.clock.now().getTime() + 86_400_000).toISOString().slice(0, 10);
    const mediaId = await libraryImage(t, curator, venueId, { ...rights, licenceExpiresOn: expires });
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [imageDoc(mediaId)]);
    await expectBlocked(storyId, 'image-licence-expiry', panelIds[0]!, /before the exhibit's planned end on 2027-12-31/);
  });

  it('a live value that no longer points at a widget on its panel', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [liveValueDoc('removed-widget', widgetNode('other'))]);
    await expectBlocked(storyId, 'live-value-target', panelIds[0]!, /Point it at a widget on this panel/);
  });

  /**
   * The API refuses such a document on save, so this cannot be built through it; the row is
   * written as one saved before the widget's validation was tightened would be.
   */
  it('widget settings that fail the shared validation, stored before it was tightened', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [liveValueDoc('ridge', widgetNode('ridge'))]);
    const refused = await request(t.http).put(`/api/panels/${panelIds[0]}`).set(curator).send({ doc: liveValueDoc('ridge', widgetNode('ridge', { ...SLOPE_PARAMS, angleDeg: 120 })), version: 1 });
    expect(refused.status).toBe(422);
    await t.app.get<typeof PanelDocument>(getModelToken(PanelDocument))
      .update({ doc: liveValueDoc('ridge', widgetNode('ridge', { ...SLOPE_PARAMS, angleDeg: 120 })) }, { where: { panelId: panelIds[0] } });
    await expectBlocked(storyId, 'widget-params', panelIds[0]!, /has settings to fix/);
  });

  it('an empty panel', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [paragraphDoc('Plates move.'), { type: 'doc', content: [{ type: 'paragraph' }] }]);
    await expectBlocked(storyId, 'panel-content', panelIds[1]!, /Panel 2 is empty/);
  });

  /** Submissions were not always checked: a revision stored with blockers still cannot be approved. */
  it('an approval of a revision stored with blockers', async () => {
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId);
    const { revisionId } = await submit(t, curator, storyId);
    const blocker = { check: 'image-credit', severity: 'blocker', passed: false, message: 'The image has no credit line.', panelId: panelIds[0] };
    await t.app.get<typeof Revision>(getModelToken(Revision)).sequelize!.query('UPDATE `revisions` SET `preflight` = ?, `blocker_count` = 1 WHERE `id` = ?', { replacements: [JSON.stringify([blocker]), revisionId] });
    const res = await verdict(t, educator, revisionId, { verdict: 'approve' });
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([{ path: ['preflight', 'image-credit', panelIds[0]], message: 'The image has no credit line.' }]);
    expect((await request(t.http).get(`/api/stories/${storyId}`).set(curator)).body.state).toBe('in_review');
  });

  it('lets warnings through: an over-long panel is submitted with its warning, and approved', async () => {
    const long = paragraphDoc(Array.from({ length: 80 }, () => 'rock').join(' '));
    const { storyId, panelIds } = await storyWithPanels(t, curator, exhibitId, [long]);
    const { revisionId, preflight } = await submit(t, curator, storyId);
    expect(preflight).toContainEqual(expect.objectContaining({ check: 'word-budget', severity: 'warning', passed: false, panelId: panelIds[0] }));
    expect((await verdict(t, educator, revisionId, { verdict: 'approve' })).status).toBe(201);
  });
});
