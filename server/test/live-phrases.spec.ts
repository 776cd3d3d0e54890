import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PanelDocJSON, PanelNodeJSON, PreflightEntry, TranslationUnitView } from '@mantlepiece/shared';
import type { TestApp } from './test-app.js';
import { createTranslationTestApp, translationWorld } from './translation-fixtures.js';

// μs = 0.6 and a 20° slope: the block holds, since it slides only above arctan 0.6 ≈ 30.96° (inclined plane with Coulomb friction).
const slope: PanelNodeJSON = { type: 'widget', attrs: { widgetType: 'slope-force', widgetId: 'grip-slope', params: { massKg: 10, angleDeg: 20, staticFriction: 0.6, kineticFriction: 0.5 } } };
const wordings = { holds: 'holds fast', slides: 'starts to slide' };
const phraseDoc = (phraseWordings: Record<string, string> = wordings): PanelDocJSON => ({
  type: 'doc',
  content: [
    { type: 'paragraph', content: [{ type: 'text', text: 'Tilt the board: the block ' }, { type: 'livePhrase', attrs: { phraseId: 'ph-grip', widgetId: 'grip-slope', wordings: phraseWordings } }, { type: 'text', text: '.' }] },
    slope,
  ],
});

let t: TestApp;
let world: Awaited<ReturnType<typeof translationWorld>>;
let panel: { id: number; version: number; storyId: number };
const unitPath = (unitId: string) => `/api/stories/${world.story.id}/translations/fr/units/${unitId}`;
const phraseUnit = (state: string) => `p${panel.id}.phrase.ph-grip.${state}`;
const sentenceUnit = () => `p${panel.id}.paragraph.1`;
const frUnits = async (): Promise<TranslationUnitView[]> =>
  (await request(t.http).get(`/api/stories/${world.story.id}/translations/fr/units?pageSize=100`).set(world.translator).expect(200)).body.items;

beforeAll(async () => {
  t = await createTranslationTestApp();
  world = await translationWorld(t, 'phrases');
  panel = (await request(t.http).post(`/api/stories/${world.story.id}/panels`).set(world.curator).send({ doc: phraseDoc() }).expect(201)).body;
});
afterAll(() => t?.close());

describe('live phrases as translation units', () => {
  it('list one unit per wording, with the sentence holding the phrase as a placeholder', async () => {
    const units = (await frUnits()).filter((unit) => unit.panelId === panel.id);
    expect(units.map(({ unitId, kind, source, status }) => ({ unitId, kind, source, status }))).toEqual([
      { unitId: sentenceUnit(), kind: 'paragraph', source: 'Tilt the board: the block {1}.', status: 'untranslated' },
      { unitId: phraseUnit('holds'), kind: 'livePhrase', source: 'holds fast', status: 'untranslated' },
      { unitId: phraseUnit('slides'), kind: 'livePhrase', source: 'starts to slide', status: 'untranslated' },
    ]);
  });

  it('are translated like any unit and shown in the preview on the phrase itself', async () => {
    await request(t.http).put(unitPath(sentenceUnit())).set(world.translator).send({ text: 'Inclinez la planche : le bloc {1}.', version: 0 }).expect(200);
    await request(t.http).put(unitPath(phraseUnit('holds'))).set(world.translator).send({ text: 'tient bon', version: 0 }).expect(200);
    await request(t.http).put(unitPath(phraseUnit('slides'))).set(world.translator).send({ text: 'se met à glisser', version: 0 }).expect(200);
    const preview = await request(t.http).get(`/api/stories/${world.story.id}/translations/fr/preview`).set(world.translator).expect(200);
    const shown = preview.body.panels.find((candidate: { panelId: number }) => candidate.panelId === panel.id);
    expect(shown.doc.content[0].content).toEqual([
      { type: 'text', text: 'Inclinez la planche : le bloc ' },
      { type: 'livePhrase', attrs: { phraseId: 'ph-grip', widgetId: 'grip-slope', wordings: { holds: 'tient bon', slides: 'se met à glisser' } } },
      { type: 'text', text: '.' },
    ]);
  });

  it('go stale one wording at a time: rewording "slides" leaves the sentence and "holds" translated', async () => {
    const current = (await request(t.http).get(`/api/stories/${world.story.id}`).set(world.curator).expect(200)).body.panels.find((candidate: { id: number }) => candidate.id === panel.id);
    await request(t.http).put(`/api/panels/${panel.id}`).set(world.curator).send({ doc: phraseDoc({ ...wordings, slides: 'begins to slip' }), version: current.version }).expect(200);
    const statuses = Object.fromEntries((await frUnits()).filter((unit) => unit.panelId === panel.id).map((unit) => [unit.unitId, unit.status]));
    expect(statuses).toEqual({ [sentenceUnit()]: 'translated', [phraseUnit('holds')]: 'translated', [phraseUnit('slides')]: 'stale' });
  });
});

describe('preflight of live phrases', () => {
  const draftPreflight = async (doc: PanelDocJSON): Promise<PreflightEntry[]> => {
    const story = (await request(t.http).post('/api/stories').set(world.curator).send({ title: `Phrases preflight ${Date.now().toString(36)}`, venueId: world.venue.id }).expect(201)).body;
    await request(t.http).post(`/api/stories/${story.id}/panels`).set(world.curator).send({ doc }).expect(201);
    return (await request(t.http).get(`/api/stories/${story.id}/preflight`).set(world.curator).expect(200)).body;
  };
  const failed = (entries: PreflightEntry[], check: string) => entries.filter((entry) => entry.check === check && !entry.passed);

  it('warns when plain text says "slides" on a panel whose slope the visitor tilts', async () => {
    const entries = await draftPreflight({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Tilt the board and the block slides.' }] }, slope] });
    expect(failed(entries, 'live-phrase-state-words')).toEqual([
      expect.objectContaining({
        severity: 'warning',
        message: 'Panel 1 (“Tilt the board and the block slides.”): the text says “slides”, but a visitor can change the state of the slope force box “grip-slope” on this panel. Use a live phrase, so the words follow the widget.',
      }),
    ]);
  });

  it('passes the same words in a live phrase, and blocks a phrase missing a state’s wording', async () => {
    expect(failed(await draftPreflight(phraseDoc()), 'live-phrase-state-words')).toEqual([]);
    const missing = await draftPreflight(phraseDoc({ holds: 'holds fast' }));
    expect(failed(missing, 'live-phrase-target')).toEqual([expect.objectContaining({ severity: 'blocker', message: expect.stringContaining('no wording for "slides"') })]);
  });

  it('refuses a panel whose live phrase has no wordings with 422, naming where it is', async () => {
    const story = (await request(t.http).post('/api/stories').set(world.curator).send({ title: `Phrases refused ${Date.now().toString(36)}`, venueId: world.venue.id }).expect(201)).body;
    const res = await request(t.http).post(`/api/stories/${story.id}/panels`).set(world.curator).send({ doc: phraseDoc({}) });
    expect(res.status).toBe(422);
    // The path leads to the phrase: the second inline node of the first paragraph.
    expect(res.body.errors).toEqual([expect.objectContaining({ path: expect.arrayContaining(['content', 0, 'content', 1]), message: expect.stringContaining("A live phrase's wordings are") })]);
  });
});
