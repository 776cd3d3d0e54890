import { Node as ProseMirrorNode } from '@tiptap/pm/model';
import { describe, expect, it } from 'vitest';
import { examplePanelDoc } from './example-panel.js';
import { panelSchema } from './panel-extensions.js';

describe('panel schema', () => {
  it('holds exactly the nodes and marks a panel uses', () => {
    const schema = panelSchema();
    expect(Object.keys(schema.nodes).sort()).toEqual(
      ['blockquote', 'bulletList', 'doc', 'hardBreak', 'heading', 'listItem', 'livePhrase', 'liveValue', 'orderedList', 'panelImage', 'paragraph', 'text', 'widget'].sort(),
    );
    expect(Object.keys(schema.marks).sort()).toEqual(['bold', 'italic', 'link']);
  });

  it('round-trips a document with every node and mark type unchanged', () => {
    const schema = panelSchema();
    const example = examplePanelDoc();
    // The example panel, plus a live phrase following its slope.
    const livePhrase = { type: 'livePhrase', attrs: { phraseId: 'ph-1', widgetId: 'ridge-slope', wordings: { holds: 'holds', slides: 'slides' } } };
    const doc = { ...example, content: [...(example.content ?? []), { type: 'paragraph', content: [{ type: 'text', text: 'Now it ' }, livePhrase] }] };
    const node = ProseMirrorNode.fromJSON(schema, doc);
    node.check();
    expect(node.toJSON()).toEqual(doc);
    const used = new Set<string>();
    node.descendants((child) => {
      used.add(child.type.name);
      child.marks.forEach((mark) => used.add(`mark:${mark.type.name}`));
    });
    const everyType = [...Object.keys(schema.nodes).filter((name) => name !== 'doc'), ...Object.keys(schema.marks).map((name) => `mark:${name}`)];
    expect([...used].sort()).toEqual(everyType.sort());
  });

  it('allows headings of level 2 and 3 only', () => {
    const schema = panelSchema();
    const heading = (level: number) => ({ type: 'doc', content: [{ type: 'heading', attrs: { level }, content: [{ type: 'text', text: 'x' }] }] });
    expect(() => ProseMirrorNode.fromJSON(schema, heading(2)).check()).not.toThrow();
    expect(() => ProseMirrorNode.fromJSON(schema, heading(1)).check()).toThrow();
  });
});
