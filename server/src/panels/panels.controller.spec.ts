import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { examplePanelDoc } from '@mantlepiece/shared';
import { galleryWithExhibit, paragraphDoc, signedInAs } from '../../test/authoring-fixtures.js';
import { createTestApp, type TestApp } from '../../test/test-app.js';

let t: TestApp;
let curator: Record<string, string>;
let venueId: number;

beforeAll(async () => {
  t = await createTestApp();
  curator = await signedInAs(t, 'curator');
  venueId = (await galleryWithExhibit(t, await signedInAs(t, 'admin'), 'panels')).venue.id;
});
afterAll(() => t.close());

const newStory = async () => (await request(t.http).post('/api/stories').set(curator).send({ title: 'Panels suite', venueId })).body as { id: number };
const addPanel = async (storyId: number, body: Record<string, unknown> = {}) => {
  const res = await request(t.http).post(`/api/stories/${storyId}/panels`).set(curator).send(body);
  if (res.status !== 201) throw new Error(`expected 201, got ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; version: number; position: number };
};
const save = (panelId: number, doc: unknown, version: number) => request(t.http).put(`/api/panels/${panelId}`).set(curator).send({ doc, version });

/** The example panel without its image, which would need a library asset. */
const docWithWidget = () => ({ ...examplePanelDoc(), content: examplePanelDoc().content!.filter((node) => node.type !== 'panelImage') });

describe('POST /api/stories/:id/panels', () => {
  it('appends an empty panel at version 1 with the default word budget, and the story lists it', async () => {
    const story = await newStory();
    const panel = await addPanel(story.id);
    expect(panel).toMatchObject({ storyId: story.id, position: 0, version: 1, wordBudget: 60, doc: { type: 'doc', content: [{ type: 'paragraph' }] } });
    const detail = await request(t.http).get(`/api/stories/${story.id}`).set(curator);
    expect(detail.body.panelCount).toBe(1);
    expect(detail.body.panels.map((p: { id: number }) => p.id)).toEqual([panel.id]);
  });

  it('inserts at a position and moves the later panels along', async () => {
    const story = await newStory();
    const a = await addPanel(story.id);
    const b = await addPanel(story.id);
    const c = await addPanel(story.id, { position: 1, doc: paragraphDoc('in between') });
    const detail = await request(t.http).get(`/api/stories/${story.id}`).set(curator);
    expect(detail.body.panels.map((p: { id: number; position: number }) => [p.id, p.position])).toEqual([[a.id, 0], [c.id, 1], [b.id, 2]]);
  });
});

describe('PUT /api/panels/:id', () => {
  it('saves a document with widgets, live values and links, and answers with the next version', async () => {
    const panel = await addPanel((await newStory()).id);
    const res = await save(panel.id, docWithWidget(), 1);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ version: 2 });
  });

  it('answers a stale version with 409, the current version and the document saved in between', async () => {
    const panel = await addPanel((await newStory()).id);
    expect((await save(panel.id, paragraphDoc('First editor'), 1)).status).toBe(200);
    const stale = await save(panel.id, paragraphDoc('Second editor, from version 1'), 1);
    expect(stale.status).toBe(409);
    expect(stale.body).toEqual({ statusCode: 409, message: expect.any(String), currentVersion: 2, doc: paragraphDoc('First editor') });
  });

  it('answers an impossible widget setting with 422 and a path from the root through the widget into its params', async () => {
    const panel = await addPanel((await newStory()).id);
    const doc = docWithWidget();
    const widgetIndex = doc.content!.findIndex((node) => node.type === 'widget');
    doc.content![widgetIndex]!.attrs = { ...doc.content![widgetIndex]!.attrs, params: { massKg: 10, angleDeg: 30, staticFriction: 0.4, kineticFriction: 0.6 } };
    const res = await save(panel.id, doc, 1);
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([{ path: ['content', widgetIndex, 'attrs', 'params', 'kineticFriction'], message: expect.stringMatching(/cannot be more than static friction/) }]);
  });

  it.each([
    ['a script node', { type: 'doc', content: [{ type: 'script', content: [{ type: 'text', text: 'alert(1)' }] }] }, ['content', 0, 'type']],
    ['an unknown node type', { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'iframe', attrs: { src: 'https://x.test' } }] }] }, ['content', 0, 'content', 0, 'type']],
    ['a javascript: link', { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'tap', marks: [{ type: 'link', attrs: { href: 'javascript:alert(1)' } }] }] }] }, ['content', 0, 'content', 0, 'marks', 0, 'attrs', 'href']],
    ['a javascript: link hidden by a tab', { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'tap', marks: [{ type: 'link', attrs: { href: 'java\tscript:alert(1)' } }] }] }] }, ['content', 0, 'content', 0, 'marks', 0, 'attrs', 'href']],
    ['an onclick attribute', { type: 'doc', content: [{ type: 'paragraph', attrs: { onclick: 'alert(1)' } }] }, ['content', 0, 'attrs', 'onclick']],
  ])('refuses %s with 422 at its path, and keeps the saved document', async (_label, doc, path) => {
    const story = await newStory();
    const panel = await addPanel(story.id, { doc: paragraphDoc('Safe text') });
    const res = await save(panel.id, doc, 1);
    expect(res.status).toBe(422);
    expect(res.body.errors.map((error: { path: unknown }) => error.path)).toContainEqual(path);
    const after = await request(t.http).get(`/api/stories/${story.id}`).set(curator);
    expect(after.body.panels[0]).toMatchObject({ version: 1, doc: paragraphDoc('Safe text') });
  });

  it('refuses an image that is not in the media library', async () => {
    const panel = await addPanel((await newStory()).id);
    const res = await save(panel.id, { type: 'doc', content: [{ type: 'panelImage', attrs: { mediaId: '999999' } }] }, 1);
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([{ path: ['content', 0, 'attrs', 'mediaId'], message: 'There is no image 999999 in the media library.' }]);
  });

  it('refuses a translator with 403', async () => {
    const panel = await addPanel((await newStory()).id);
    const translator = await signedInAs(t, 'translator');
    const res = await request(t.http).put(`/api/panels/${panel.id}`).set(translator).send({ doc: paragraphDoc('x'), version: 1 });
    expect(res.status).toBe(403);
  });
});

describe('reorder, word budget and delete', () => {
  it('reorders every panel in one go and refuses a list that leaves one out', async () => {
    const story = await newStory();
    const [a, b, c] = [await addPanel(story.id), await addPanel(story.id), await addPanel(story.id)];
    const res = await request(t.http).post(`/api/stories/${story.id}/panels/reorder`).set(curator).send({ panelIds: [c!.id, a!.id, b!.id] });
    expect(res.status).toBe(200);
    expect(res.body.map((p: { id: number; position: number }) => [p.id, p.position])).toEqual([[c!.id, 0], [a!.id, 1], [b!.id, 2]]);
    const partial = await request(t.http).post(`/api/stories/${story.id}/panels/reorder`).set(curator).send({ panelIds: [a!.id, b!.id] });
    expect(partial.status).toBe(409);
  });

  it('sets a word budget', async () => {
    const panel = await addPanel((await newStory()).id);
    const res = await request(t.http).patch(`/api/panels/${panel.id}`).set(curator).send({ wordBudget: 45 });
    expect(res.body).toMatchObject({ id: panel.id, wordBudget: 45 });
  });

  it('deletes a panel and closes the gap it leaves', async () => {
    const story = await newStory();
    const [a, b, c] = [await addPanel(story.id), await addPanel(story.id), await addPanel(story.id)];
    expect((await request(t.http).delete(`/api/panels/${b!.id}`).set(curator)).status).toBe(204);
    const detail = await request(t.http).get(`/api/stories/${story.id}`).set(curator);
    expect(detail.body.panels.map((p: { id: number; position: number }) => [p.id, p.position])).toEqual([[a!.id, 0], [c!.id, 1]]);
  });
});
