import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildRevisionSnapshot, type PanelNodeJSON, type TranslationUnitView } from '@mantlepiece/shared';
import { signedInAs } from '../../test/authoring-fixtures.js';
import { bearer, createPerson, signIn, type TestApp } from '../../test/test-app.js';
import { createTranslationTestApp, examplePanelWithImage, translationRowCounts, translationWorld } from '../../test/translation-fixtures.js';
import { TranslationsService } from './translations.service.js';

let t: TestApp;
let world: Awaited<ReturnType<typeof translationWorld>>;
const units = (locale: string, query = '') => request(t.http).get(`/api/stories/${world.story.id}/translations/${locale}/units${query}`);
const unitPath = (locale: string, unitId: string) => `/api/stories/${world.story.id}/translations/${locale}/units/${unitId}`;
const heading = () => `p${world.panel.id}.heading.1`;
const paragraph = () => `p${world.panel.id}.paragraph.1`;
const storyTitle = () => `s${world.story.id}.title`;

beforeAll(async () => {
  t = await createTranslationTestApp();
  world = await translationWorld(t, 'units');
});
afterAll(() => t?.close());

describe('locale scoping', () => {
  it('answers 403 to a translator outside their locales, for every read and write', async () => {
    const story = `/api/stories/${world.story.id}/translations/es`;
    const calls = [
      request(t.http).get('/api/translations/stories?locale=es'),
      request(t.http).get(`${story}/units`),
      request(t.http).put(`${story}/units/${heading()}`).send({ text: 'Hola', version: 0 }),
      request(t.http).get(`${story}/preview`),
      request(t.http).get(`${story}/xliff`),
      request(t.http).put(`${story}/xliff`).set('Content-Type', 'application/xliff+xml').send('<xliff/>'),
    ];
    for (const call of calls) {
      const res = await call.set(world.translator);
      expect({ status: res.status, body: res.body }).toEqual({ status: 403, body: { statusCode: 403, message: 'You translate into fr, not es.' } });
    }
  });

  it('shows a translator only their own locales, and admins and curators every target locale', async () => {
    const own = await request(t.http).get(`/api/stories/${world.story.id}/translations`).set(world.translator).expect(200);
    expect(own.body.map((entry: { locale: string }) => entry.locale)).toEqual(['fr']);
    for (const reader of [world.admin, world.curator]) {
      const all = await request(t.http).get(`/api/stories/${world.story.id}/translations`).set(reader).expect(200);
      expect(all.body.map((entry: { locale: string }) => entry.locale)).toEqual(['fr', 'es']);
      await units('es').set(reader).expect(200);
    }
    const worklist = await request(t.http).get(`/api/translations/stories?q=${encodeURIComponent(world.story.title)}`).set(world.translator).expect(200);
    expect(worklist.body.items.map((item: { locale: string }) => item.locale)).toEqual(['fr']);
  });

  it('lets only translators write, and only into their own locales', async () => {
    const curatorSave = await request(t.http).put(unitPath('fr', heading())).set(world.curator).send({ text: 'Bonjour', version: 0 });
    expect(curatorSave.status).toBe(403);
    const noLocales = bearer((await signIn(t, (await createPerson(t, { roles: ['translator'] })).email)).accessToken);
    const res = await units('fr').set(noLocales);
    expect(res.body).toEqual({ statusCode: 403, message: 'You have no translator locales; an admin gives them in People.' });
    expect((await units('fr').set(await signedInAs(t, 'educator'))).status).toBe(403);
  });

  it('answers 404 for a locale the venue does not translate into', async () => {
    const res = await units('de').set(world.admin);
    expect(res.body).toEqual({ statusCode: 404, message: "This story's venue is not translated into de." });
  });
});

describe('units', () => {
  it('lists every unit in reading order with its source, placeholders and budget', async () => {
    const res = await units('fr').set(world.translator).expect(200);
    expect(res.body.total).toBe(10);
    expect(res.body.items.map((unit: TranslationUnitView) => unit.unitId)).toEqual([
      storyTitle(), heading(), paragraph(), `p${world.panel.id}.heading.2`, `p${world.panel.id}.listItem.1`, `p${world.panel.id}.listItem.2`,
      `p${world.panel.id}.listItem.3`, `p${world.panel.id}.quote.1`, `m${world.image.id}.alt`, `p${world.second.id}.paragraph.1`,
    ]);
    expect(res.body.items[0]).toMatchObject({ panelId: null, panelNumber: null, mediaId: null, kind: 'storyTitle', source: world.story.title, placeholders: [] });
    const body = res.body.items[2] as TranslationUnitView;
    expect(body).toMatchObject({
      panelId: world.panel.id, panelNumber: 1, mediaId: null, kind: 'paragraph', status: 'untranslated', target: null, previousSource: null, version: 0,
      source: 'A block on a slope is pulled {1}down{/1} and pressed {2}into{/2} the rock. It starts to slide above {3}.{4}Read more at {5}our website{/5}.',
    });
    expect(body.placeholders.map((placeholder) => placeholder.id)).toEqual(['1', '2', '3', '4', '5']);
    // French runs about a quarter longer than English (the shared lengthBudget's rule of thumb).
    expect(body.budget).toBeGreaterThan(body.source.length);
    expect(res.body.items[8]).toMatchObject({ panelId: null, mediaId: world.image.id, kind: 'altText', source: 'Dark basalt on a ridge.' });
  });

  it('saves a unit by compare-and-set: a second save from the same version gets 409 with the current text', async () => {
    const first = await request(t.http).put(unitPath('fr', heading())).set(world.translator).send({ text: 'Pourquoi la roche glisse-t-elle ?', version: 0 });
    expect(first.status).toBe(200);
    expect(first.body).toEqual({ version: 1, status: 'translated', warnings: [] });
    const before = await translationRowCounts(t);
    const late = await request(t.http).put(unitPath('fr', heading())).set(world.translator).send({ text: 'Pourquoi ça glisse ?', version: 0 });
    expect(late.status).toBe(409);
    expect(late.body).toEqual({ statusCode: 409, message: 'Someone else saved this unit after you started translating it.', currentVersion: 1, text: 'Pourquoi la roche glisse-t-elle ?' });
    const older = await request(t.http).put(unitPath('fr', heading())).set(world.translator).send({ text: 'Pourquoi ça glisse ?', version: 3 });
    expect(older.body.currentVersion).toBe(1);
    expect(await translationRowCounts(t)).toEqual(before);
    const next = await request(t.http).put(unitPath('fr', heading())).set(world.translator).send({ text: 'Pourquoi la roche glisse-t-elle ?', version: 1 });
    expect(next.body).toEqual({ version: 2, status: 'translated', warnings: [] });
  });

  it('refuses a translation with a placeholder missing, added or unclosed, naming each problem and changing nothing', async () => {
    const before = await translationRowCounts(t);
    const res = await request(t.http).put(unitPath('fr', paragraph())).set(world.translator)
      .send({ text: 'Un bloc est tiré vers le {1}bas{/1} et pressé {2}contre la roche. Il glisse au-delà de {9}.{4}Plus sur {5}notre site{/5}.', version: 0 });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      statusCode: 400,
      message: 'The placeholders of this translation do not match the source.',
      errors: [
        { path: ['text'], message: 'Placeholder {9} is not in the source; remove it.' },
        { path: ['text'], message: '{2} is never closed; add {/2}.' },
        { path: ['text'], message: 'Placeholder {3} is missing; every placeholder in the source must stay.' },
      ],
    });
    expect(await translationRowCounts(t)).toEqual(before);
  });

  it('saves a translation over its length budget, with a warning, as an XLIFF import does', async () => {
    // A world of its own, so the completeness figures below stay as they are.
    const own = await translationWorld(t, 'budget');
    const unitId = `p${own.panel.id}.heading.1`;
    const unit = ((await request(t.http).get(`/api/stories/${own.story.id}/translations/fr/units`).set(own.translator).expect(200)).body.items as TranslationUnitView[])
      .find((each) => each.unitId === unitId);
    const long = 'Pourquoi la roche glisse-t-elle ? '.repeat(10).trim();
    const res = await request(t.http).put(`/api/stories/${own.story.id}/translations/fr/units/${unitId}`).set(own.translator).send({ text: long, version: 0 });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      version: 1,
      status: 'translated',
      warnings: [{ unitId, kind: 'heading', panelNumber: 1, length: long.length, budget: unit!.budget, message: expect.stringContaining(`over its budget of ${unit!.budget}`) }],
    });
  });

  it('answers 404 for a unit the story does not have', async () => {
    const res = await request(t.http).put(unitPath('fr', 'p999999.paragraph.1')).set(world.translator).send({ text: 'x', version: 0 });
    expect(res.status).toBe(404);
  });

  it('writes an alt text translation to the media library too', async () => {
    await request(t.http).put(unitPath('fr', `m${world.image.id}.alt`)).set(world.translator).send({ text: 'Basalte sombre sur une dorsale.', version: 0 }).expect(200);
    const media = await request(t.http).get(`/api/media/${world.image.id}`).set(world.curator).expect(200);
    expect(media.body.alt).toEqual({ en: 'Dark basalt on a ridge.', fr: 'Basalte sombre sur une dorsale.' });
  });

  it('marks a unit stale after the curator edits its source through PUT /api/panels/:id, keeping the source it was made from', async () => {
    const story = await request(t.http).get(`/api/stories/${world.second.storyId}`).set(world.curator).expect(200);
    const panel = story.body.panels[1];
    await request(t.http).put(unitPath('fr', `p${panel.id}.paragraph.1`)).set(world.translator).send({ text: 'Le fond marin s’enfonce en refroidissant.', version: 0 }).expect(200);
    await request(t.http).put(`/api/panels/${panel.id}`).set(world.curator)
      .send({ doc: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'The sea floor sinks as it cools and ages.' }] }] }, version: panel.version })
      .expect(200);
    const stale = await units('fr', '?status=stale').set(world.translator).expect(200);
    expect(stale.body.items).toEqual([
      expect.objectContaining({
        unitId: `p${panel.id}.paragraph.1`, status: 'stale', source: 'The sea floor sinks as it cools and ages.',
        previousSource: 'The sea floor sinks as it cools.', target: 'Le fond marin s’enfonce en refroidissant.', version: 1,
      }),
    ]);
    const retranslated = await request(t.http).put(unitPath('fr', `p${panel.id}.paragraph.1`)).set(world.translator)
      .send({ text: 'Le fond marin s’enfonce en refroidissant et en vieillissant.', version: 1 });
    expect(retranslated.body).toEqual({ version: 2, status: 'translated', warnings: [] });
    expect((await units('fr', '?status=stale').set(world.translator)).body.total).toBe(0);
  });
});

describe('completeness and preview', () => {
  it('counts total, translated and stale units per locale, the same in the worklist', async () => {
    const res = await request(t.http).get(`/api/stories/${world.story.id}/translations`).set(world.admin).expect(200);
    // An admin or curator reads every locale and translates none (can.spec.ts covers `can` role by role).
    const reads = { translate: false, import: false, export: true };
    expect(res.body).toEqual([
      { locale: 'fr', total: 10, translated: 3, stale: 0, can: reads },
      { locale: 'es', total: 10, translated: 0, stale: 0, can: reads },
    ]);
    const worklist = await request(t.http).get(`/api/translations/stories?q=${encodeURIComponent(world.story.title)}`).set(world.curator).expect(200);
    expect(worklist.body).toEqual({
      items: [
        { storyId: world.story.id, storyTitle: world.story.title, locale: 'es', total: 10, translated: 0, stale: 0, can: reads },
        { storyId: world.story.id, storyTitle: world.story.title, locale: 'fr', total: 10, translated: 3, stale: 0, can: reads },
      ],
      total: 2, page: 1, pageSize: 25,
      can: { translate: false },
      locales: expect.arrayContaining(['es', 'fr']),
    });
  });

  it('gives the release build each story’s completeness and what is missing', async () => {
    // The story as a revision would freeze it; the release build asks about revisions.
    const story = (await request(t.http).get(`/api/stories/${world.story.id}`).set(world.curator).expect(200)).body;
    const snapshot = buildRevisionSnapshot({
      ...story,
      panels: story.panels.map((panel: { id: number; position: number; wordBudget: number; doc: object }) => ({ ...panel, docs: { en: panel.doc } })),
    });
    const [fr, es] = await t.app.get(TranslationsService).completenessForRelease([{ id: 0, storyId: world.story.id, snapshot }], ['fr', 'es']);
    expect(fr).toMatchObject({ storyId: world.story.id, locale: 'fr', total: 10, translated: 3, stale: 0, complete: false });
    expect(fr!.missing.map((unit) => unit.unitId)).toEqual([
      storyTitle(), paragraph(), `p${world.panel.id}.heading.2`, `p${world.panel.id}.listItem.1`, `p${world.panel.id}.listItem.2`, `p${world.panel.id}.listItem.3`, `p${world.panel.id}.quote.1`,
    ]);
    expect(es).toMatchObject({ translated: 0, complete: false });
    expect(es!.missing).toHaveLength(10);
  });

  it('previews the target documents, with the source where a unit is untranslated and marks and live values kept', async () => {
    await request(t.http).put(unitPath('fr', paragraph())).set(world.translator)
      .send({ text: 'Au-delà de {3}, le bloc glisse : il est {2}pressé{/2} contre la roche et tiré vers le {1}bas{/1}.{4}En savoir plus sur {5}notre site{/5}.', version: 0 })
      .expect(200);
    const res = await request(t.http).get(`/api/stories/${world.story.id}/translations/fr/preview`).set(world.translator).expect(200);
    // The title is not translated yet: null, and the kiosk shows the source's where the venue allows it.
    expect(res.body).toMatchObject({ storyId: world.story.id, locale: 'fr', dir: 'ltr', title: null, alt: { [String(world.image.id)]: 'Basalte sombre sur une dorsale.' } });
    const [first] = res.body.panels;
    const [title, body, widget, tryIt] = first.doc.content as PanelNodeJSON[];
    expect(title!.content).toEqual([{ type: 'text', text: 'Pourquoi la roche glisse-t-elle ?' }]);
    expect(body!.content!.filter((node) => node.type !== 'text' || node.marks)).toEqual([
      { type: 'liveValue', attrs: { widgetId: 'ridge-slope', output: 'criticalAngleDeg', format: { digits: 2, unit: '°' } } },
      { type: 'text', text: 'pressé', marks: [{ type: 'italic' }] },
      { type: 'text', text: 'bas', marks: [{ type: 'bold' }] },
      { type: 'hardBreak' },
      { type: 'text', text: 'notre site', marks: [{ type: 'link', attrs: { href: 'https://basalt-point.example/slopes' } }] },
    ]);
    expect(widget).toEqual((examplePanelWithImage(world.image.id).content as PanelNodeJSON[])[2]);
    expect(tryIt!.content).toEqual([{ type: 'text', text: 'Try it' }]);
    expect(first.fallbackUnitIds).toContain(`p${world.panel.id}.heading.2`);
  });
});

describe('story titles', () => {
  it('are units of their own: translated like any text, stale once the curator renames the story, shown in the preview', async () => {
    const own = await translationWorld(t, 'titles');
    const titleUnit = `s${own.story.id}.title`;
    const ownUnits = (query = '') => request(t.http).get(`/api/stories/${own.story.id}/translations/fr/units${query}`).set(own.translator).expect(200);
    // Short, as the title is ("titles story"): within its length budget.
    const saved = await request(t.http).put(`/api/stories/${own.story.id}/translations/fr/units/${titleUnit}`).set(own.translator).send({ text: 'Les titres', version: 0 });
    expect(saved.body).toEqual({ version: 1, status: 'translated', warnings: [] });
    expect((await request(t.http).get(`/api/stories/${own.story.id}/translations/fr/preview`).set(own.translator).expect(200)).body.title).toBe('Les titres');

    await request(t.http).patch(`/api/stories/${own.story.id}`).set(own.curator).send({ title: `${own.story.title} again` }).expect(200);
    expect((await ownUnits('?status=stale')).body.items).toEqual([
      expect.objectContaining({ unitId: titleUnit, kind: 'storyTitle', status: 'stale', source: `${own.story.title} again`, previousSource: own.story.title, target: 'Les titres', version: 1 }),
    ]);
    // Stale is not current: the preview goes back to the source's title until it is translated again.
    expect((await request(t.http).get(`/api/stories/${own.story.id}/translations/fr/preview`).set(own.translator).expect(200)).body.title).toBeNull();
    await request(t.http).put(`/api/stories/${own.story.id}/translations/fr/units/${titleUnit}`).set(own.translator).send({ text: 'Les titres encore', version: 1 }).expect(200);
    expect((await ownUnits('?status=stale')).body.total).toBe(0);
  });

  it('refuses a title translation that adds a placeholder, as any unit without placeholders does', async () => {
    const own = await translationWorld(t, 'title-placeholder');
    const res = await request(t.http).put(`/api/stories/${own.story.id}/translations/fr/units/s${own.story.id}.title`).set(own.translator).send({ text: 'Pourquoi {1}', version: 0 });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ path: ['text'], message: 'Placeholder {1} is not in the source; remove it.' }]);
  });
});

describe('venue fallback policy', () => {
  it('is off by default and set by an admin through PATCH /api/venues/:id', async () => {
    expect((await request(t.http).get(`/api/venues/${world.venue.id}`).set(world.curator)).body.fallbackToSource).toBe(false);
    const res = await request(t.http).patch(`/api/venues/${world.venue.id}`).set(world.admin).send({ fallbackToSource: true }).expect(200);
    expect(res.body.fallbackToSource).toBe(true);
    const wrong = await request(t.http).patch(`/api/venues/${world.venue.id}`).set(world.admin).send({ fallbackToSource: 'yes' });
    expect(wrong.body.errors).toEqual([{ path: ['fallbackToSource'], message: 'Say true or false.' }]);
  });
});
