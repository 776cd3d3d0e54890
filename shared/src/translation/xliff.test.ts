import { XMLValidator } from 'fast-xml-parser';
import js2xliff from 'xliff/js2xliff';
import xliff2js from 'xliff/xliff2js';
import { describe, expect, it } from 'vitest';
import { checkPanelDocument } from '../panel/check-panel-document.js';
import { examplePanelDoc } from '../panel/example-panel.js';
import type { PanelNodeJSON } from '../panel/panel-json.js';
import { applyTranslations } from './apply-translations.js';
import { segmentAltText, segmentPanel } from './segment-panel.js';
import type { TranslationUnit } from './translation-unit.js';
import { exportXliff } from './xliff-export.js';
import { planXliffImport } from './xliff-import.js';
import { parseXliff } from './xliff-parse.js';

const expected = { storyId: 7, srcLang: 'en', trgLang: 'fr' };

async function storyUnits(): Promise<TranslationUnit[]> {
  return [...(await segmentPanel(examplePanelDoc(), { panelId: 42, sourceLocale: 'en', panelNumber: 1 })), await segmentAltText('ridge-photo', 'Dark basalt on a ridge.', { sourceLocale: 'en' })];
}

const exported = async (translations = {}) => exportXliff({ storyId: 7, srcLang: 'en', trgLang: 'fr', units: await storyUnits(), translations });

/** Inline content as the xliff package gives it: strings, and objects for its <pc>/<ph> element types. */
type LibraryInline = string | { Span?: { id: string; contents: LibraryInline | LibraryInline[] }; Standalone?: { id: string } };
type LibraryUnit = { source: LibraryInline | LibraryInline[]; target?: LibraryInline | LibraryInline[] };
type LibraryDocument = { resources: Record<string, Record<string, LibraryUnit>> };

const codes = (source: LibraryInline | LibraryInline[]) => (Array.isArray(source) ? source : [source]).filter((part): part is Exclude<LibraryInline, string> => typeof part !== 'string');

/** A translator's work in a tool built on the xliff package: targets filled, codes moved, never touched. */
const FRENCH: Record<string, (source: LibraryInline | LibraryInline[]) => LibraryInline[]> = {
  'p42.heading.1': () => ['Pourquoi la roche glisse-t-elle ?'],
  'p42.paragraph.1': (source) => {
    const [bold, italic, live, lineBreak, link] = codes(source);
    const span = (code: typeof bold, contents: string) => ({ Span: { ...code!.Span!, contents } });
    return ['Au-delà de ', live!, ', le bloc glisse : il est ', span(italic, 'pressé'), ' contre la roche et tiré vers le ', span(bold, 'bas'), '.', lineBreak!, 'En savoir plus sur ', span(link, 'notre site'), '.'];
  },
  'p42.listItem.1': () => ['Inclinez la pente.'],
  'mridge-photo.alt': () => ['Basalte sombre sur une dorsale.'],
};

async function translatedWithLibrary(xml: string, edit: (unitId: string, unit: LibraryUnit) => void = () => {}): Promise<string> {
  const document = (await xliff2js(xml)) as LibraryDocument;
  const file = document.resources.s7 as Record<string, LibraryUnit>;
  for (const [unitId, translate] of Object.entries(FRENCH)) file[unitId]!.target = translate(file[unitId]!.source);
  for (const [unitId, unit] of Object.entries(file)) edit(unitId, unit);
  // No indentation: the package's pretty printer would otherwise put line breaks inside <source>.
  return js2xliff(document, { indent: '' });
}

const problemsOf = (plan: ReturnType<typeof planXliffImport>) => (plan.ok ? [] : plan.problems);

describe('exportXliff', () => {
  it('writes one well-formed XLIFF 2.1 file per story with one unit per translation unit', async () => {
    const xml = await exported();
    // A second, independent parser checks well-formedness.
    expect(XMLValidator.validate(xml)).toBe(true);
    expect(xml).toContain('<xliff xmlns="urn:oasis:names:tc:xliff:document:2.0" version="2.1" srcLang="en" trgLang="fr">');
    expect(xml.match(/<file /g)).toHaveLength(1);
    expect(xml.match(/<unit /g)).toHaveLength((await storyUnits()).length);
  });

  it('carries the budget, the context and the source hash in notes, and the placeholders as <pc> and <ph>', async () => {
    const units = await storyUnits();
    const xml = await exported();
    expect(xml).toContain('<note category="context">Panel 1, paragraph</note>');
    expect(xml).toContain('<note category="budget" appliesTo="target">At most 153 characters.</note>');
    expect(xml).toContain(`<note category="sourceHash">sha256:${units[1]!.sourceHash}</note>`);
    expect(xml).toContain(
      '<source>A block on a slope is pulled <pc id="1" canCopy="no" canDelete="no" type="fmt" subType="xlf:b">down</pc> and pressed <pc id="2" canCopy="no" canDelete="no" type="fmt" subType="xlf:i">into</pc> the rock. It starts to slide above <ph id="3" canCopy="no" canDelete="no" type="ui" subType="xlf:var" disp="{criticalAngleDeg}"/>.<ph id="4" canCopy="no" canDelete="no" type="fmt" subType="xlf:lb" equiv=" "/>Read more at <pc id="5" canCopy="no" canDelete="no" type="link" dispStart="https://basalt-point.example/slopes">our website</pc>.</source>',
    );
  });

  it('writes a target only for units translated from the current source', async () => {
    const units = await storyUnits();
    const xml = exportXliff({
      storyId: 7, srcLang: 'en', trgLang: 'fr', units,
      translations: { 'p42.heading.1': { sourceHash: units[0]!.sourceHash, text: 'Pourquoi ?' }, 'p42.heading.2': { sourceHash: 'older', text: 'Essayez' } },
    });
    expect(xml.match(/<target>/g)).toHaveLength(1);
    expect(xml).toContain('<target>Pourquoi ?</target>');
  });

  it('escapes markup in text and carries characters XML cannot hold as <cp>', async () => {
    const doc = { type: 'doc' as const, content: [{ type: 'paragraph', content: [{ type: 'text', text: 'a < b & c\u0007' }] }] };
    const units = await segmentPanel(doc, { panelId: 1, sourceLocale: 'en' });
    const xml = exportXliff({ storyId: 7, srcLang: 'en', trgLang: 'fr', units, translations: {} });
    expect(xml).toContain('<source>a &lt; b &amp; c<cp hex="0007"/></source>');
    const parsed = parseXliff(xml);
    expect(parsed.ok && parsed.xliff.units[0]?.sourceRuns).toEqual([{ type: 'text', text: 'a < b & c\u0007' }]);
  });
});

describe('the XLIFF round trip through a general-purpose XLIFF library', () => {
  it('brings the translations back with marks and live values intact in the target document', async () => {
    const units = await storyUnits();
    const returned = await translatedWithLibrary(await exported());
    expect(XMLValidator.validate(returned)).toBe(true);
    const plan = planXliffImport({ parsed: parseXliff(returned), expected, currentUnits: units });
    if (!plan.ok) throw new Error(`expected the import to be accepted, got ${JSON.stringify(plan.problems)}`);
    expect(plan.updates.map((update) => update.unitId)).toEqual(['p42.heading.1', 'p42.paragraph.1', 'p42.listItem.1', 'mridge-photo.alt']);
    expect(plan.unchanged).toEqual(['p42.heading.2', 'p42.listItem.2', 'p42.listItem.3', 'p42.quote.1']);
    expect(plan.updates[1]?.text).toBe('Au-delà de {3}, le bloc glisse : il est {2}pressé{/2} contre la roche et tiré vers le {1}bas{/1}.{4}En savoir plus sur {5}notre site{/5}.');

    const translations = Object.fromEntries(plan.updates.map((update) => [update.unitId, update.text]));
    const { doc, refused } = applyTranslations(examplePanelDoc(), units, translations);
    expect(refused).toEqual([]);
    const paragraph = (doc.content as PanelNodeJSON[])[1]!.content as PanelNodeJSON[];
    expect(paragraph.filter((node) => node.type !== 'text' || node.marks)).toEqual([
      { type: 'liveValue', attrs: { widgetId: 'ridge-slope', output: 'criticalAngleDeg', format: { digits: 2, unit: '°' } } },
      { type: 'text', text: 'pressé', marks: [{ type: 'italic' }] },
      { type: 'text', text: 'bas', marks: [{ type: 'bold' }] },
      { type: 'hardBreak' },
      { type: 'text', text: 'notre site', marks: [{ type: 'link', attrs: { href: 'https://basalt-point.example/slopes' } }] },
    ]);
    expect(checkPanelDocument(doc).ok).toBe(true);
  });

  it('reads the source hash even when the tool wrote the notes back without their categories', async () => {
    const returned = await translatedWithLibrary(await exported());
    expect(returned).not.toContain('category="sourceHash"');
    const parsed = parseXliff(returned);
    expect(parsed.ok && parsed.xliff.units[0]?.sourceHash).toBe((await storyUnits())[0]!.sourceHash);
  });

  it('reports nothing to update when the same file is imported again', async () => {
    const units = await storyUnits();
    const returned = await translatedWithLibrary(await exported());
    const first = planXliffImport({ parsed: parseXliff(returned), expected, currentUnits: units });
    const stored = Object.fromEntries((first.ok ? first.updates : []).map((update) => [update.unitId, { sourceHash: update.sourceHash, text: update.text }]));
    const again = planXliffImport({ parsed: parseXliff(returned), expected, currentUnits: units, currentTranslations: stored });
    expect(again.ok && again.updates).toEqual([]);
  });
});

describe('planXliffImport refuses the whole file', () => {
  it('when the XML is malformed', async () => {
    const plan = planXliffImport({ parsed: parseXliff((await exported()).replace('</source>', '</sauce>')), expected, currentUnits: await storyUnits() });
    expect(problemsOf(plan)[0]?.message).toMatch(/^The file is not well-formed XML/);
  });

  it('naming the line of a malformed file once, in words', async () => {
    const broken = (await exported()).replace('</source>', '</sauce>');
    const line = broken.slice(0, broken.indexOf('</sauce>')).split('\n').length;
    const plan = planXliffImport({ parsed: parseXliff(broken), expected, currentUnits: await storyUnits() });
    const message = problemsOf(plan)[0]?.message ?? '';
    expect(message).toMatch(new RegExp(`^The file is not well-formed XML at line ${line}, column \\d+: `));
    expect(message).not.toMatch(/\d+:\d+:/);
  });

  it('when it is not XLIFF 2.0 or 2.1', () => {
    expect(problemsOf(planXliffImport({ parsed: parseXliff('<xliff version="1.2" xmlns="urn:oasis:names:tc:xliff:document:1.2"/>'), expected, currentUnits: [] }))[0]?.message).toMatch(/not an XLIFF 2 file/);
    expect(problemsOf(planXliffImport({ parsed: parseXliff('<xliff version="2.2" xmlns="urn:oasis:names:tc:xliff:document:2.0" srcLang="en"/>'), expected, currentUnits: [] }))[0]?.message).toMatch(/version 2.2 is not supported/);
  });

  it('when the languages do not match the story and the upload', async () => {
    const units = await storyUnits();
    const xml = exportXliff({ storyId: 7, srcLang: 'en', trgLang: 'es', units, translations: {} });
    expect(problemsOf(planXliffImport({ parsed: parseXliff(xml), expected, currentUnits: units }))).toEqual([{ message: "The file's target language is es; this upload is for fr." }]);
    expect(planXliffImport({ parsed: parseXliff(xml), expected: { storyId: 7, srcLang: 'EN', trgLang: 'es' }, currentUnits: units }).ok).toBe(true);
  });

  it('when a unit id is unknown', async () => {
    const units = await storyUnits();
    const plan = planXliffImport({ parsed: parseXliff(await translatedWithLibrary(await exported())), expected, currentUnits: units.filter((unit) => unit.id !== 'p42.quote.1') });
    expect(problemsOf(plan)).toEqual([{ unitId: 'p42.quote.1', message: 'Unit p42.quote.1 is not in this story; the file may be from another story or the text was removed.' }]);
  });

  it('when a placeholder is missing or added', async () => {
    const units = await storyUnits();
    const dropped = await translatedWithLibrary(await exported(), (unitId, unit) => {
      if (unitId === 'p42.paragraph.1') unit.target = (unit.target as LibraryInline[]).filter((part) => typeof part === 'string' || !part.Standalone || part.Standalone.id !== '3');
    });
    expect(problemsOf(planXliffImport({ parsed: parseXliff(dropped), expected, currentUnits: units }))).toEqual([
      { unitId: 'p42.paragraph.1', message: 'Placeholder {3} is missing; every placeholder in the source must stay.' },
    ]);
    const added = await translatedWithLibrary(await exported(), (unitId, unit) => {
      if (unitId === 'p42.listItem.1') unit.target = ['Inclinez ', { Standalone: { id: '9' } }, 'la pente.'];
    });
    expect(problemsOf(planXliffImport({ parsed: parseXliff(added), expected, currentUnits: units }))).toEqual([{ unitId: 'p42.listItem.1', message: 'Placeholder {9} is not in the source; remove it.' }]);
  });

  it('when a unit was exported from a source the curator has since edited, and changes nothing', async () => {
    const returned = await translatedWithLibrary(await exported());
    const edited = examplePanelDoc();
    (edited.content as PanelNodeJSON[])[0]!.content = [{ type: 'text', text: 'Why do rocks slip?' }];
    const currentUnits = [...(await segmentPanel(edited, { panelId: 42, sourceLocale: 'en', panelNumber: 1 })), (await storyUnits()).at(-1)!];
    expect(planXliffImport({ parsed: parseXliff(returned), expected, currentUnits })).toEqual({
      ok: false,
      problems: [{ unitId: 'p42.heading.1', message: 'The source of unit p42.heading.1 has changed since this file was exported; export it again and translate the new source.' }],
    });
  });

  it('when the file has no hash notes and its source text differs from the current source', async () => {
    const units = await storyUnits();
    const withoutNotes = (await exported()).replace(/<notes>[\s\S]*?<\/notes>/g, '').replace('<source>Try it</source>', '<source>Try this</source>');
    expect(problemsOf(planXliffImport({ parsed: parseXliff(withoutNotes), expected, currentUnits: units })).map((problem) => problem.unitId)).toEqual(['p42.heading.2']);
  });
});

describe('planXliffImport checks the story and the length of each target', () => {
  it('refuses a file whose original names another story, with that one problem', async () => {
    const units = await storyUnits();
    const fromStory3 = (await exported()).replace('original="story/7"', 'original="story/3"');
    expect(planXliffImport({ parsed: parseXliff(fromStory3), expected, currentUnits: units })).toEqual({
      ok: false,
      otherStory: { attribute: 'original', value: 'story/3' },
      problems: [{ message: 'The file\'s original is "story/3": it was exported from another story, and this story\'s is "story/7". Export this story\'s own file and translate that.' }],
    });
  });

  it('refuses a file whose tool dropped the original but kept another story\'s file id', async () => {
    const units = await storyUnits();
    const returned = await translatedWithLibrary(await exported());
    expect(returned).not.toContain('original=');
    expect(planXliffImport({ parsed: parseXliff(returned), expected, currentUnits: units }).ok).toBe(true);
    const fromStory3 = planXliffImport({ parsed: parseXliff(returned.replace('<file id="s7"', '<file id="s3"')), expected, currentUnits: units });
    expect(!fromStory3.ok && fromStory3.otherStory).toEqual({ attribute: 'id', value: 's3' });
  });

  it('takes a file whose tool renamed the file and dropped the original', async () => {
    const renamed = (await exported()).replace(' original="story/7"', '').replace('<file id="s7"', '<file id="f1"');
    expect(planXliffImport({ parsed: parseXliff(renamed), expected, currentUnits: await storyUnits() }).ok).toBe(true);
  });

  it('takes a target over its length budget with a warning for that unit', async () => {
    const units = await storyUnits();
    const long = 'Pourquoi '.repeat(20).trim();
    const returned = await translatedWithLibrary(await exported(), (unitId, unit) => {
      if (unitId === 'p42.heading.1') unit.target = [long];
    });
    const plan = planXliffImport({ parsed: parseXliff(returned), expected, currentUnits: units });
    if (!plan.ok) throw new Error(`expected the import to be accepted, got ${JSON.stringify(plan.problems)}`);
    expect(plan.updates.find((update) => update.unitId === 'p42.heading.1')?.text).toBe(long);
    // "Why does rock slide?" is 20 characters: × 1.25 for French, × 1.4 for a short text (see length-budget.ts).
    expect(plan.warnings).toEqual([
      { unitId: 'p42.heading.1', kind: 'heading', panelNumber: 1, length: long.length, budget: 35, message: `Unit p42.heading.1 is ${long.length} characters long, ${long.length - 35} over its budget of 35: the text may not fit on the screen.` },
    ]);
  });

  it('refuses a target longer than a translation may be stored', async () => {
    const units = await storyUnits();
    const returned = await translatedWithLibrary(await exported(), (unitId, unit) => {
      if (unitId === 'p42.heading.1') unit.target = ['x'.repeat(10_001)];
    });
    expect(problemsOf(planXliffImport({ parsed: parseXliff(returned), expected, currentUnits: units }))).toEqual([
      { unitId: 'p42.heading.1', message: 'The target of unit p42.heading.1 is 10001 characters long; a translation may be at most 10000.' },
    ]);
  });
});

describe('parseXliff against hostile XML', () => {
  const laughs = [
    '<?xml version="1.0"?>',
    '<!DOCTYPE xliff [',
    '  <!ENTITY lol "lol">',
    ...Array.from({ length: 9 }, (_, level) => `  <!ENTITY lol${level + 1} "${`&lol${level === 0 ? '' : level};`.repeat(10)}">`),
    ']>',
    '<xliff xmlns="urn:oasis:names:tc:xliff:document:2.0" version="2.1" srcLang="en" trgLang="fr"><file id="s7"><unit id="p42.heading.1"><segment><source>Why does rock slide?</source><target>&lol9;</target></segment></unit></file></xliff>',
  ].join('\n');

  it('refuses a billion-laughs document at its DOCTYPE, without expanding anything', () => {
    const parsed = parseXliff(laughs);
    expect(parsed).toEqual({ ok: false, problems: [{ message: expect.stringMatching(/DOCTYPE/) }] });
    expect(JSON.stringify(parsed)).not.toContain('lollol');
  });

  it('refuses an external entity (XXE) without reading the file it names', () => {
    const xxe = '<?xml version="1.0"?><!DOCTYPE xliff [<!ENTITY x SYSTEM "file:///etc/passwd">]><xliff xmlns="urn:oasis:names:tc:xliff:document:2.0" version="2.1" srcLang="en" trgLang="fr"><file id="s7"><unit id="p42.heading.1"><segment><source>Why does rock slide?</source><target>&x;</target></segment></unit></file></xliff>';
    const parsed = parseXliff(xxe);
    expect(parsed).toEqual({ ok: false, problems: [{ message: expect.stringMatching(/DOCTYPE/) }] });
    expect(JSON.stringify(parsed)).not.toContain('root:');
  });

  it('treats a reference to an undeclared entity as malformed, and decodes only the predefined ones', () => {
    const wrap = (target: string) => `<xliff xmlns="urn:oasis:names:tc:xliff:document:2.0" version="2.1" srcLang="en" trgLang="fr"><file id="s7"><unit id="u"><segment><source>a</source><target>${target}</target></segment></unit></file></xliff>`;
    expect(parseXliff(wrap('&nbsp;')).ok).toBe(false);
    const parsed = parseXliff(wrap('&lt;&gt;&amp;&quot;&apos;&#xE9;'));
    expect(parsed.ok && parsed.xliff.units[0]?.targetRuns).toEqual([{ type: 'text', text: '<>&"\'é' }]);
  });
});
