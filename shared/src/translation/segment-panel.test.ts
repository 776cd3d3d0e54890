/// <reference types="node" />
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { examplePanelDoc } from '../panel/example-panel.js';
import type { PanelDocJSON, PanelNodeJSON } from '../panel/panel-json.js';
import { segmentAltText, segmentPanel } from './segment-panel.js';
import { translatableParams } from './translatable-params.js';
import { canonicalSource } from './translation-unit.js';

const options = { panelId: 42, sourceLocale: 'en', panelNumber: 1 };
const blocks = (doc: PanelDocJSON) => doc.content as PanelNodeJSON[];
const paragraph = (...content: PanelNodeJSON[]): PanelNodeJSON => ({ type: 'paragraph', content });
const text = (value: string, ...marks: string[]): PanelNodeJSON => ({ type: 'text', text: value, ...(marks.length ? { marks: marks.map((type) => ({ type })) } : {}) });

describe('segmentPanel', () => {
  it('cuts a panel with every node and mark type into one unit per text block, in document order', async () => {
    const units = await segmentPanel(examplePanelDoc(), options);
    expect(units.map(({ id, kind, display }) => [id, kind, display])).toEqual([
      ['p42.heading.1', 'heading', 'Why does rock slide?'],
      ['p42.paragraph.1', 'paragraph', 'A block on a slope is pulled {1}down{/1} and pressed {2}into{/2} the rock. It starts to slide above {3}.{4}Read more at {5}our website{/5}.'],
      ['p42.heading.2', 'heading', 'Try it'],
      ['p42.listItem.1', 'listItem', 'Tilt the slope.'],
      ['p42.listItem.2', 'listItem', 'Watch the block.'],
      ['p42.listItem.3', 'listItem', 'Ask a guide.'],
      ['p42.quote.1', 'quote', 'Rock holds until it does not.'],
    ]);
    expect(units[0]?.context).toEqual({ panelId: '42', panelNumber: 1, headingLevel: 2 });
    expect(units[2]?.context.headingLevel).toBe(3);
  });

  it('turns bold, italic and links into paired placeholders and live values and line breaks into standalone ones', async () => {
    const [, paragraphUnit] = await segmentPanel(examplePanelDoc(), options);
    expect(paragraphUnit?.placeholders).toEqual([
      { id: '1', kind: 'paired', mark: { type: 'bold' } },
      { id: '2', kind: 'paired', mark: { type: 'italic' } },
      { id: '3', kind: 'standalone', node: { type: 'liveValue', attrs: { widgetId: 'ridge-slope', output: 'criticalAngleDeg', format: { digits: 2, unit: '°' } } } },
      { id: '4', kind: 'standalone', node: { type: 'hardBreak' } },
      { id: '5', kind: 'paired', mark: { type: 'link', attrs: { href: 'https://basalt-point.example/slopes' } } },
    ]);
    expect(paragraphUnit?.runs.slice(0, 4)).toEqual([
      { type: 'text', text: 'A block on a slope is pulled ' },
      { type: 'open', id: '1' },
      { type: 'text', text: 'down' },
      { type: 'close', id: '1' },
    ]);
  });

  it('keeps a mark that spans neighbouring text nodes as one pair, with the inner mark nested inside', async () => {
    const doc: PanelDocJSON = { type: 'doc', content: [paragraph(text('Hot '), text('rock ', 'bold'), text('rises', 'bold', 'italic'), text(' fast', 'bold'))] };
    const [unit] = await segmentPanel(doc, options);
    expect(unit?.display).toBe('Hot {1}rock {2}rises{/2} fast{/1}');
  });

  it('counts a live value at the width it is drawn and a line break as nothing', async () => {
    const [, paragraphUnit] = await segmentPanel(examplePanelDoc(), options);
    const textLength = 'A block on a slope is pulled down and pressed into the rock. It starts to slide above .Read more at our website.'.length;
    // Two significant digits, a decimal sign and "°".
    expect(paragraphUnit?.sourceLength).toBe(textLength + 4);
  });

  it('skips blocks with no words and images, whose alt text belongs to the media asset', async () => {
    const doc: PanelDocJSON = { type: 'doc', content: [{ type: 'paragraph' }, paragraph(text('  ')), { type: 'panelImage', attrs: { mediaId: 'ridge-photo' } }, paragraph(text('Lava cools.'))] };
    expect((await segmentPanel(doc, options)).map((unit) => unit.id)).toEqual(['p42.paragraph.1']);
  });

  it('hashes the canonical source with SHA-256', async () => {
    const [unit] = await segmentPanel(examplePanelDoc(), options);
    expect(unit?.sourceHash).toBe(createHash('sha256').update(canonicalSource(unit!)).digest('hex'));
  });

  it('changes the hash when the words or a placeholder change, not when a link target or rounding changes', async () => {
    const hashOf = async (edit: (doc: PanelDocJSON) => void) => {
      const doc = examplePanelDoc();
      edit(doc);
      return (await segmentPanel(doc, options))[1]?.sourceHash;
    };
    const original = await hashOf(() => {});
    const inline = (doc: PanelDocJSON) => blocks(doc)[1]!.content as PanelNodeJSON[];
    expect(await hashOf((doc) => (inline(doc)[0]!.text = 'A block on a hill is pulled '))).not.toBe(original);
    expect(await hashOf((doc) => (inline(doc)[1]!.marks = [{ type: 'italic' }]))).not.toBe(original);
    expect(await hashOf((doc) => (inline(doc)[5]!.attrs = { widgetId: 'ridge-slope', output: 'weightN', format: { digits: 2, unit: 'N' } }))).not.toBe(original);
    expect(await hashOf((doc) => (inline(doc)[9]!.marks = [{ type: 'link', attrs: { href: 'https://basalt-point.example/other' } }]))).toBe(original);
    expect(await hashOf((doc) => (inline(doc)[5]!.attrs = { widgetId: 'ridge-slope', output: 'criticalAngleDeg', format: { digits: 3, unit: '°' } }))).toBe(original);
  });

  it('keeps unit ids when words change and when blocks of other kinds, widgets or images are added', async () => {
    const before = await segmentPanel(examplePanelDoc(), options);
    const doc = examplePanelDoc();
    blocks(doc)[0]!.content = [text('Why do rocks slip?')];
    blocks(doc).splice(1, 0, { type: 'heading', attrs: { level: 3 }, content: [text('First')] }, { type: 'panelImage', attrs: { mediaId: 'm2' } });
    const after = await segmentPanel(doc, options);
    const paragraphs = (units: typeof before) => units.filter((unit) => unit.kind !== 'heading').map((unit) => [unit.id, unit.sourceHash]);
    expect(paragraphs(after)).toEqual(paragraphs(before));
    expect(after[0]).toMatchObject({ id: 'p42.heading.1', display: 'Why do rocks slip?' });
  });

  it('gives the current widgets no units: none has a param a curator writes text into', async () => {
    const units = await segmentPanel(examplePanelDoc(), options);
    expect(units.some((unit) => unit.kind === 'widgetText')).toBe(false);
  });
});

describe('translatableParams', () => {
  it('finds string params a widget schema marks translatable, nested ones too, and nothing else', () => {
    const schema = z.strictObject({
      caption: z.string().meta({ translatable: true }),
      massKg: z.number(),
      colourRamp: z.enum(['a', 'b']),
      axis: z.strictObject({ label: z.string().meta({ translatable: true }), unit: z.string() }),
    });
    const params = { caption: 'A block at rest', massKg: 10, colourRamp: 'a', axis: { label: 'Angle', unit: '°' } };
    expect(translatableParams(z.toJSONSchema(schema) as Record<string, unknown>, params)).toEqual([
      { param: ['caption'], text: 'A block at rest' },
      { param: ['axis', 'label'], text: 'Angle' },
    ]);
  });
});

describe('segmentAltText', () => {
  it('makes the alt text of a media asset a unit of the asset, not of a panel', async () => {
    const unit = await segmentAltText('ridge-photo', 'A ridge of dark basalt under the sea.', { sourceLocale: 'en' });
    expect(unit).toMatchObject({ id: 'mridge-photo.alt', kind: 'altText', location: { type: 'altText', mediaId: 'ridge-photo' }, display: 'A ridge of dark basalt under the sea.', placeholders: [] });
    expect(unit.sourceHash).toMatch(/^[0-9a-f]{64}$/);
  });
});
