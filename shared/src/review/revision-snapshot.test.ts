import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { examplePanelDoc } from '../panel/example-panel.js';
import type { PanelDocJSON } from '../panel/panel-json.js';
import { buildRevisionSnapshot, canonicalJson, revisionHash, sha256Hex, type SnapshotStoryInput } from './revision-snapshot.js';

const paragraph = (text: string): PanelDocJSON => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });
const imageDoc = (mediaId: string): PanelDocJSON => ({ type: 'doc', content: [{ type: 'panelImage', attrs: { mediaId } }] });

const story = (): SnapshotStoryInput => ({
  id: 7,
  title: 'Why plates move',
  audience: 'family',
  sourceLocale: 'en',
  panels: [
    { id: 12, position: 2, wordBudget: 60, docs: { en: imageDoc('31'), fr: imageDoc('32') } },
    { id: 11, position: 1, wordBudget: 80, docs: { fr: examplePanelDoc(), en: examplePanelDoc() } },
  ],
});

describe('sha256Hex', () => {
  // FIPS 180-4 example computations (NIST CSRC, "SHA256.pdf"): one-block and two-block messages.
  it('gives the FIPS 180-4 one-block example: "abc" → ba7816bf…', async () => {
    expect(await sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('gives the FIPS 180-4 two-block example (448 bits, "abcdbcdecdef…nopq")', async () => {
    expect(await sha256Hex('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe('248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1');
  });

  it('gives the well-known digest of the empty message', async () => {
    expect(await sha256Hex('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });

  it("hashes the UTF-8 bytes of non-ASCII text, as Node's own hash of the same bytes does", async () => {
    const text = 'Température du manteau : 1 300 °C — 地幔';
    expect(await sha256Hex(text)).toBe(createHash('sha256').update(text, 'utf8').digest('hex'));
  });
});

describe('canonicalJson', () => {
  it('sorts keys at every depth and writes no whitespace', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { z: true, y: null }], c: 'x' } })).toBe('{"a":{"c":"x","d":[3,{"y":null,"z":true}]},"b":1}');
  });

  it('leaves out undefined properties, as JSON does, and refuses numbers JSON cannot hold', () => {
    expect(canonicalJson({ a: undefined, b: 2 })).toBe('{"b":2}');
    expect(() => canonicalJson({ a: Number.NaN })).toThrow(TypeError);
    expect(() => canonicalJson({ a: Infinity })).toThrow(TypeError);
  });

  it('orders keys by UTF-16 code units (RFC 8785 §3.2.3), so upper case sorts before lower case', () => {
    expect(canonicalJson({ b: 0, B: 0, a: 0, é: 0 })).toBe('{"B":0,"a":0,"b":0,"é":0}');
  });
});

describe('buildRevisionSnapshot', () => {
  it('puts panels in position order, with the source-locale widgets and every locale\'s media', () => {
    const snapshot = buildRevisionSnapshot(story());
    expect(snapshot.panels.map((panel) => panel.id)).toEqual([11, 12]);
    expect(snapshot.panels[0]?.widgets).toEqual([
      { widgetId: 'ridge-slope', widgetType: 'slope-force', params: { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 } },
    ]);
    expect(snapshot.panels[1]?.mediaIds).toEqual(['31', '32']);
    expect(snapshot.mediaIds).toEqual(['ridge-photo', '31', '32']);
    expect(Object.keys(snapshot.panels[0]!.docs).sort()).toEqual(['en', 'fr']);
  });

  it('copies the documents, so editing the draft afterwards leaves the revision as it was', () => {
    const input = story();
    const snapshot = buildRevisionSnapshot(input);
    const before = canonicalJson(snapshot);
    input.panels[1]!.docs.en!.content!.push({ type: 'paragraph' });
    (input.panels[1]!.docs.en!.content![2]!.attrs!.params as Record<string, unknown>).angleDeg = 45;
    expect(canonicalJson(snapshot)).toBe(before);
  });

  it('refuses a panel without a document in the source locale', () => {
    const input: SnapshotStoryInput = { ...story(), panels: [{ id: 1, position: 1, wordBudget: 50, docs: { fr: paragraph('Bonjour') } }] };
    expect(() => buildRevisionSnapshot(input)).toThrow(/source locale en/);
  });
});

describe('revisionHash', () => {
  it('does not depend on the order of keys in the documents or of locales in the input', async () => {
    const base = story();
    const reordered = { ...base, panels: [{ docs: { fr: imageDoc('32'), en: imageDoc('31') }, wordBudget: 60, position: 2, id: 12 }, base.panels[1]!] };
    const widget = reordered.panels[1].docs.en!.content![2]!;
    widget.attrs = { params: { kineticFriction: 0.6, staticFriction: 0.85, angleDeg: 30, massKg: 10 }, visitorModelCard: false, widgetId: 'ridge-slope', widgetType: 'slope-force' };
    expect(await revisionHash(buildRevisionSnapshot(reordered))).toBe(await revisionHash(buildRevisionSnapshot(story())));
  });

  it('changes when a widget parameter changes', async () => {
    const changed = story();
    (changed.panels[1]!.docs.en!.content![2]!.attrs!.params as Record<string, unknown>).angleDeg = 31;
    expect(await revisionHash(buildRevisionSnapshot(changed))).not.toBe(await revisionHash(buildRevisionSnapshot(story())));
  });

  it('is the SHA-256 of the canonical JSON, as 64 hex digits', async () => {
    const snapshot = buildRevisionSnapshot(story());
    const hash = await revisionHash(snapshot);
    expect(hash).toMatch(/^[0-9a-f]{64}$/);
    expect(hash).toBe(createHash('sha256').update(canonicalJson(snapshot), 'utf8').digest('hex'));
  });
});
