import request from 'supertest';
import js2xliff from 'xliff/js2xliff';
import xliff2js from 'xliff/xliff2js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PanelNodeJSON } from '@mantlepiece/shared';
import type { TestApp } from '../../test/test-app.js';
import { createTranslationTestApp, translationRowCounts, translationWorld } from '../../test/translation-fixtures.js';
import { XLIFF_MAX_BYTES } from './xliff-exchange.service.js';

/** Inline content as the xliff package gives it: strings, and objects for its <pc>/<ph> element types. */
type LibraryInline = string | { Span?: { id: string; contents: LibraryInline | LibraryInline[] }; Standalone?: { id: string } };
type LibraryUnit = { source: LibraryInline | LibraryInline[]; target?: LibraryInline | LibraryInline[] };
type LibraryDocument = { resources: Record<string, Record<string, LibraryUnit>> };

let t: TestApp;
let world: Awaited<ReturnType<typeof translationWorld>>;
const xliffPath = (locale: string) => `/api/stories/${world.story.id}/translations/${locale}/xliff`;
const exported = async (locale = 'fr') => (await request(t.http).get(xliffPath(locale)).set(world.translator).expect(200)).text;
const upload = (xml: string, locale = 'fr') => request(t.http).put(xliffPath(locale)).set(world.translator).set('Content-Type', 'application/xliff+xml').send(xml);

const asList = (inline: LibraryInline | LibraryInline[]) => (Array.isArray(inline) ? inline : [inline]);

/** French for every unit: the codes are kept in order, each text part marked as translated. */
function translatedContent(inline: LibraryInline | LibraryInline[]): LibraryInline[] {
  return asList(inline).map((part) => {
    if (typeof part === 'string') return part.trim() === '' ? part : `«${part}»`;
    if (part.Span) return { Span: { ...part.Span, contents: translatedContent(part.Span.contents) } };
    return part;
  });
}

/** What a translator's tool built on the xliff package sends back; `edit` changes one unit afterwards. */
async function translatedWithLibrary(xml: string, edit: (unitId: string, unit: LibraryUnit) => void = () => {}): Promise<string> {
  const document = (await xliff2js(xml)) as LibraryDocument;
  const file = document.resources[`s${world.story.id}`]!;
  for (const [unitId, unit] of Object.entries(file)) {
    unit.target = translatedContent(unit.source);
    edit(unitId, unit);
  }
  // No indentation: the package's pretty printer would otherwise put line breaks inside <source>.
  return js2xliff(document, { indent: '' });
}

async function expectRefusedUnchanged(xml: string, messages: RegExp[]) {
  const before = await translationRowCounts(t);
  const res = await upload(xml);
  expect(res.status).toBe(400);
  expect(res.body.message).toBe('The file was not imported, and nothing was changed.');
  expect(res.body.errors).toHaveLength(messages.length);
  messages.forEach((message, index) => expect(res.body.errors[index].message).toMatch(message));
  expect(await translationRowCounts(t)).toEqual(before);
  return res.body.errors as { path: (string | number)[]; message: string }[];
}

beforeAll(async () => {
  t = await createTranslationTestApp();
  world = await translationWorld(t, 'xliff');
});
afterAll(() => t?.close());

describe('XLIFF export', () => {
  it('sends one XLIFF 2.1 attachment for the story and locale', async () => {
    const res = await request(t.http).get(xliffPath('fr')).set(world.translator).expect(200);
    expect(res.headers['content-type']).toBe('application/xliff+xml; charset=utf-8');
    expect(res.headers['content-disposition']).toBe(`attachment; filename=story-${world.story.id}.fr.xlf`);
    expect(res.text).toContain('<xliff xmlns="urn:oasis:names:tc:xliff:document:2.0" version="2.1" srcLang="en" trgLang="fr">');
    expect(res.text.match(/<unit /g)).toHaveLength(10);
    expect(res.text).toContain(`<unit id="s${world.story.id}.title"`);
  });
});

describe('the XLIFF round trip through the API, with targets filled by the xliff package', () => {
  it('imports every unit, and the preview carries the text with marks and live values intact', async () => {
    const res = await upload(await translatedWithLibrary(await exported()));
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ updated: 10, unchanged: 0, stale: 0, warnings: [] });

    const figures = await request(t.http).get(`/api/stories/${world.story.id}/translations`).set(world.translator).expect(200);
    expect(figures.body).toEqual([{ locale: 'fr', total: 10, translated: 10, stale: 0, can: { translate: true, import: true, export: true } }]);

    const preview = await request(t.http).get(`/api/stories/${world.story.id}/translations/fr/preview`).set(world.translator).expect(200);
    const [first] = preview.body.panels;
    expect(first.fallbackUnitIds).toEqual([]);
    const body = (first.doc.content as PanelNodeJSON[])[1]!.content!;
    expect(body).toEqual([
      { type: 'text', text: '«A block on a slope is pulled »' },
      { type: 'text', text: '«down»', marks: [{ type: 'bold' }] },
      { type: 'text', text: '« and pressed »' },
      { type: 'text', text: '«into»', marks: [{ type: 'italic' }] },
      { type: 'text', text: '« the rock. It starts to slide above »' },
      { type: 'liveValue', attrs: { widgetId: 'ridge-slope', output: 'criticalAngleDeg', format: { digits: 2, unit: '°' } } },
      { type: 'text', text: '«.»' },
      { type: 'hardBreak' },
      { type: 'text', text: '«Read more at »' },
      { type: 'text', text: '«our website»', marks: [{ type: 'link', attrs: { href: 'https://basalt-point.example/slopes' } }] },
      { type: 'text', text: '«.»' },
    ]);
    expect(preview.body.alt).toEqual({ [String(world.image.id)]: '«Dark basalt on a ridge.»' });
    expect(preview.body.title).toBe(`«${world.story.title}»`);
  });

  it('reports everything unchanged when the same file comes back again', async () => {
    const before = await translationRowCounts(t);
    const res = await upload(await translatedWithLibrary(await exported()));
    expect(res.body).toEqual({ updated: 0, unchanged: 10, stale: 0, warnings: [] });
    expect(await translationRowCounts(t)).toEqual(before);
  });
});

describe('an XLIFF target over its length budget', () => {
  it('is imported, with a warning for that unit in the answer', async () => {
    const heading = `p${world.panel.id}.heading.1`;
    const long = 'Pourquoi la roche glisse-t-elle ? '.repeat(150).trim();
    const xml = await translatedWithLibrary(await exported(), (unitId, unit) => {
      if (unitId === heading) unit.target = [long];
    });
    const res = await upload(xml);
    expect(res.status).toBe(200);
    expect(res.body.updated).toBe(1);
    const [budgetOf] = (await request(t.http).get(`/api/stories/${world.story.id}/translations/fr/units`).set(world.translator).expect(200)).body.items
      .filter((unit: { unitId: string }) => unit.unitId === heading)
      .map((unit: { budget: number }) => unit.budget);
    expect(res.body.warnings).toEqual([
      { unitId: heading, kind: 'heading', panelNumber: 1, length: long.length, budget: budgetOf, message: expect.stringMatching(new RegExp(`^Unit ${heading} is ${long.length} characters long, ${long.length - budgetOf} over its budget of ${budgetOf}`)) },
    ]);
    const units = await request(t.http).get(`/api/stories/${world.story.id}/translations/fr/units`).set(world.translator).expect(200);
    expect(units.body.items.find((unit: { unitId: string }) => unit.unitId === heading).target).toBe(long);
  });
});

describe('an XLIFF file from another story', () => {
  /** A second story of the venue, its file cut down to the image's alt text, which the first story shares (its title unit left out). */
  async function storySharingTheImage() {
    const story = (await request(t.http).post('/api/stories').set(world.curator).send({ title: 'xliff second story', exhibitId: world.story.exhibitId }).expect(201)).body;
    const doc = { type: 'doc', content: [{ type: 'panelImage', attrs: { mediaId: String(world.image.id) } }] };
    await request(t.http).post(`/api/stories/${story.id}/panels`).set(world.curator).send({ doc }).expect(201);
    const xml = (await request(t.http).get(`/api/stories/${story.id}/translations/fr/xliff`).set(world.translator).expect(200)).text
      .replace(/<unit id="s\d+\.title"[\s\S]*?<\/unit>\s*/, '');
    expect(xml.match(/<unit /g)).toHaveLength(1);
    return { story, translated: xml.replace(/<source>([^<]*)<\/source>/, '<source>$1</source><target>Basalte noir sur une dorsale.</target>') };
  }

  it('is refused whole with 422 naming its original, though every unit in it is one this story has too', async () => {
    const other = await storySharingTheImage();
    const before = await translationRowCounts(t);
    const res = await upload(other.translated);
    expect(res.status).toBe(422);
    expect(res.body).toEqual({
      statusCode: 422,
      message: 'The file is from another story.',
      errors: [{ path: ['file', 'original'], message: `The file's original is "story/${other.story.id}": it was exported from another story, and this story's is "story/${world.story.id}". Export this story's own file and translate that.` }],
    });
    expect(await translationRowCounts(t)).toEqual(before);
    // The same file goes into the story it came from.
    const own = await request(t.http).put(`/api/stories/${other.story.id}/translations/fr/xliff`).set(world.translator).set('Content-Type', 'application/xliff+xml').send(other.translated);
    expect(own.status).toBe(200);
  });

  it('is refused with 422 naming the file id when a tool dropped the original', async () => {
    const other = await storySharingTheImage();
    const returned = (await translatedWithLibrary(await exported())).replace(`<file id="s${world.story.id}"`, `<file id="s${other.story.id}"`);
    const res = await upload(returned);
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([{ path: ['file', 'id'], message: expect.stringContaining(`"s${other.story.id}"`) }]);
  });
});

describe('an XLIFF upload is refused whole, with nothing changed', () => {
  it('when the XML is malformed', async () => {
    const xml = (await translatedWithLibrary(await exported())).replace('</source>', '</sauce>');
    await expectRefusedUnchanged(xml, [/^The file is not well-formed XML/]);
  });

  it('when the languages do not match the story and the upload', async () => {
    const xml = (await translatedWithLibrary(await exported())).replace('trgLang="fr"', 'trgLang="es"').replace('srcLang="en"', 'srcLang="de"');
    await expectRefusedUnchanged(xml, [/source language is de/, /target language is es; this upload is for fr/]);
  });

  it('when a unit id is unknown', async () => {
    const xml = (await translatedWithLibrary(await exported())).replace(`id="p${world.second.id}.paragraph.1"`, 'id="p999999.paragraph.1"');
    const [problem] = await expectRefusedUnchanged(xml, [/Unit p999999.paragraph.1 is not in this story/]);
    expect(problem!.path).toEqual(['xliff', 'p999999.paragraph.1']);
  });

  it('when a placeholder is missing or added', async () => {
    const paragraph = `p${world.panel.id}.paragraph.1`;
    const listItem = `p${world.panel.id}.listItem.1`;
    const xml = await translatedWithLibrary(await exported(), (unitId, unit) => {
      if (unitId === paragraph) unit.target = asList(unit.target!).filter((part) => typeof part === 'string' || part.Standalone?.id !== '3');
      if (unitId === listItem) unit.target = ['Inclinez ', { Standalone: { id: '9' } }, 'la pente.'];
    });
    await expectRefusedUnchanged(xml, [/Placeholder \{3\} is missing/, /Placeholder \{9\} is not in the source/]);
  });

  it('when the source changed since the export, reporting the stale unit instead of overwriting it', async () => {
    const file = await translatedWithLibrary(await exported(), (_unitId, unit) => {
      unit.target = asList(unit.target!).map((part) => (typeof part === 'string' ? part.replaceAll('«', '‹') : part));
    });
    const story = await request(t.http).get(`/api/stories/${world.story.id}`).set(world.curator).expect(200);
    const second = story.body.panels[1];
    await request(t.http).put(`/api/panels/${second.id}`).set(world.curator)
      .send({ doc: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Old sea floor is deep.' }] }] }, version: second.version })
      .expect(200);
    await expectRefusedUnchanged(file, [new RegExp(`The source of unit p${second.id}.paragraph.1 has changed since this file was exported`)]);
  });

  it('when it is a billion-laughs document', async () => {
    const laughs = [
      '<?xml version="1.0"?>',
      '<!DOCTYPE xliff [',
      '  <!ENTITY lol "lol">',
      ...Array.from({ length: 9 }, (_, level) => `  <!ENTITY lol${level + 1} "${`&lol${level === 0 ? '' : level};`.repeat(10)}">`),
      ']>',
      `<xliff xmlns="urn:oasis:names:tc:xliff:document:2.0" version="2.1" srcLang="en" trgLang="fr"><file id="s${world.story.id}"><unit id="p${world.panel.id}.heading.1"><segment><source>Why does rock slide?</source><target>&lol9;</target></segment></unit></file></xliff>`,
    ].join('\n');
    const [problem] = await expectRefusedUnchanged(laughs, [/DOCTYPE/]);
    expect(JSON.stringify(problem)).not.toContain('lollol');
  });

  it('when it names an external entity (XXE)', async () => {
    const xxe = `<?xml version="1.0"?><!DOCTYPE xliff [<!ENTITY x SYSTEM "file:///etc/passwd">]><xliff xmlns="urn:oasis:names:tc:xliff:document:2.0" version="2.1" srcLang="en" trgLang="fr"><file id="s${world.story.id}"><unit id="p${world.panel.id}.heading.1"><segment><source>Why does rock slide?</source><target>&x;</target></segment></unit></file></xliff>`;
    const [problem] = await expectRefusedUnchanged(xxe, [/DOCTYPE/]);
    expect(JSON.stringify(problem)).not.toContain('root:');
  });

  it('with 413 when the body is over the size limit', async () => {
    const before = await translationRowCounts(t);
    const padding = `<!--${'x'.repeat(XLIFF_MAX_BYTES)}-->`;
    const res = await upload(`${await exported()}${padding}`);
    expect(res.status).toBe(413);
    expect(res.body).toEqual({ statusCode: 413, message: 'The request body is too large.' });
    expect(await translationRowCounts(t)).toEqual(before);
  });

  it('with 415 when the body is not an XLIFF document', async () => {
    const res = await request(t.http).put(xliffPath('fr')).set(world.translator).send({ xliff: 'no' });
    expect(res.status).toBe(415);
  });
});
