import { describe, expect, it } from 'vitest';
import { checkPanelDocument } from './check-panel-document.js';
import { examplePanelDoc } from './example-panel.js';
import type { PanelDocJSON, PanelNodeJSON } from './panel-json.js';

const withBlocks = (...blocks: unknown[]) => ({ type: 'doc', content: blocks });
const paragraph = (...content: unknown[]) => ({ type: 'paragraph', content });
const linked = (href: string) => paragraph({ type: 'text', text: 'tap here', marks: [{ type: 'link', attrs: { href } }] });

function refusal(json: unknown) {
  const result = checkPanelDocument(json);
  if (result.ok) throw new Error(`expected a refusal, the document was accepted: ${JSON.stringify(json)}`);
  return result.errors;
}

describe('checkPanelDocument', () => {
  it('runs where there is no DOM, as on the server', () => {
    expect(typeof document).toBe('undefined');
    expect(checkPanelDocument(examplePanelDoc()).ok).toBe(true);
  });

  it('accepts a document with every node and mark type and returns it unchanged', () => {
    const result = checkPanelDocument(examplePanelDoc());
    expect(result).toEqual({ ok: true, doc: examplePanelDoc() });
  });

  it('fills in attribute defaults so the stored document is canonical', () => {
    const result = checkPanelDocument(withBlocks({ type: 'heading', content: [{ type: 'text', text: 'Plates' }] }));
    expect(result.ok && result.doc.content?.[0]?.attrs).toEqual({ level: 2 });
  });

  it('refuses a script node, naming where it is', () => {
    expect(refusal(withBlocks(paragraph({ type: 'text', text: 'ok' }), { type: 'script', content: [{ type: 'text', text: 'alert(1)' }] }))).toEqual([
      { path: ['content', 1, 'type'], message: '"script" is not something a panel can contain.' },
    ]);
  });

  it('refuses node types the panel schema does not have, such as a code block or an image by URL', () => {
    expect(refusal(withBlocks({ type: 'codeBlock' }))[0]?.path).toEqual(['content', 0, 'type']);
    expect(refusal(withBlocks({ type: 'image', attrs: { src: 'https://x.example/a.png' } }))[0]?.path).toEqual(['content', 0, 'type']);
  });

  it('refuses names inherited from Object.prototype as node or mark types', () => {
    expect(refusal(withBlocks({ type: 'constructor' }))[0]?.path).toEqual(['content', 0, 'type']);
    expect(refusal(withBlocks(paragraph({ type: 'text', text: 'a', marks: [{ type: 'toString' }] })))[0]?.path).toEqual(['content', 0, 'content', 0, 'marks', 0, 'type']);
  });

  it('refuses attributes a node does not declare, such as an event handler or a raw src on an image', () => {
    expect(refusal(withBlocks({ type: 'paragraph', attrs: { onclick: 'alert(1)' } }))).toEqual([
      { path: ['content', 0, 'attrs', 'onclick'], message: '"onclick" is not an attribute this node can have.' },
    ]);
    expect(refusal(withBlocks({ type: 'panelImage', attrs: { mediaId: 'm1', src: 'javascript:alert(1)' } }))[0]?.path).toEqual(['content', 0, 'attrs', 'src']);
  });

  it('refuses a javascript: link, however it is disguised', () => {
    for (const href of ['javascript:alert(1)', ' JavaScript:alert(1)', 'java\tscript:alert(1)', 'jav&#x61;script:alert(1)']) {
      expect(refusal(withBlocks(linked(href)))).toEqual([
        { path: ['content', 0, 'content', 0, 'marks', 0, 'attrs', 'href'], message: 'A link must start with http://, https:// or mailto:.' },
      ]);
    }
  });

  it('refuses data:, file: and relative links, and accepts http, https and mailto', () => {
    for (const href of ['data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==', 'file:///etc/passwd', '/admin', 'vbscript:x']) {
      expect(refusal(withBlocks(linked(href)))[0]?.path).toEqual(['content', 0, 'content', 0, 'marks', 0, 'attrs', 'href']);
    }
    for (const href of ['http://basalt-point.example', 'https://basalt-point.example/a?b=c', 'mailto:visits@basalt-point.example']) {
      expect(checkPanelDocument(withBlocks(linked(href))).ok).toBe(true);
    }
  });

  it('refuses a link attribute other than href (a target or class is the renderer\'s choice)', () => {
    const json = withBlocks(paragraph({ type: 'text', text: 'a', marks: [{ type: 'link', attrs: { href: 'https://a.example', target: '_top' } }] }));
    expect(refusal(json)[0]?.path).toEqual(['content', 0, 'content', 0, 'marks', 0, 'attrs', 'target']);
  });

  it('refuses content in the wrong place, pointing at the node that holds it', () => {
    const errors = refusal(withBlocks({ type: 'bulletList', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'loose' }] }] }));
    expect(errors).toHaveLength(1);
    expect(errors[0]?.path).toEqual(['content', 0]);
    expect(errors[0]?.message).toMatch(/bulletList/);
  });

  it('refuses a heading level a panel does not use', () => {
    const errors = refusal(withBlocks({ type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Too big' }] }));
    expect(errors).toEqual([{ path: ['content', 0], message: 'A panel heading is level 2 or 3.' }]);
  });

  it('refuses an empty document, a document that is not a doc, and things that are not documents', () => {
    expect(refusal({ type: 'doc', content: [] })[0]?.path).toEqual([]);
    expect(refusal({ type: 'paragraph' })).toEqual([{ path: ['type'], message: 'A panel document starts with a "doc" node.' }]);
    expect(refusal('<p>hello</p>')).toEqual([{ path: [], message: 'Expected a node with a "type".' }]);
    expect(refusal(null)).toEqual([{ path: [], message: 'Expected a node with a "type".' }]);
  });

  it('refuses bad widget params with the path from the root into the params', () => {
    const doc = examplePanelDoc();
    const widget = doc.content?.[2] as PanelNodeJSON;
    widget.attrs = { ...widget.attrs, params: { massKg: 10, angleDeg: 30, staticFriction: 5, kineticFriction: 0.6 } };
    const errors = refusal(doc);
    expect(errors).toHaveLength(1);
    expect(errors[0]?.path).toEqual(['content', 2, 'attrs', 'params', 'staticFriction']);
    expect(errors[0]?.message).toMatch(/Static friction/);
  });

  it('reports every bad widget, not only the first', () => {
    const slope = (widgetId: string, params: Record<string, unknown>) => ({ type: 'widget', attrs: { widgetType: 'slope-force', widgetId, params } });
    const errors = refusal(withBlocks(slope('a', { massKg: -1, angleDeg: 30, staticFriction: 0.5, kineticFriction: 0.4 }), paragraph({ type: 'text', text: 'x' }), slope('b', { massKg: 1, angleDeg: 95, staticFriction: 0.5, kineticFriction: 0.4 })));
    expect(errors.map((error) => error.path)).toEqual([
      ['content', 0, 'attrs', 'params', 'massKg'],
      ['content', 2, 'attrs', 'params', 'angleDeg'],
    ]);
  });

  it('refuses an unknown widget type and two widgets sharing an id', () => {
    const widget = (widgetType: string, widgetId: string) => ({ type: 'widget', attrs: { widgetType, widgetId, params: {} } });
    expect(refusal(withBlocks(widget('volcano-cam', 'v1')))).toEqual([{ path: ['content', 0, 'attrs', 'widgetType'], message: '"volcano-cam" is not a widget Mantlepiece has.' }]);
    const doc = examplePanelDoc();
    doc.content?.push(structuredClone(doc.content[2] as PanelNodeJSON));
    expect(refusal(doc)[0]).toEqual({ path: ['content', 8, 'attrs', 'widgetId'], message: 'Another widget on this panel already has the id ridge-slope.' });
  });

  it('refuses live value formats and image ids outside their rules', () => {
    const live = (format: unknown) => withBlocks(paragraph({ type: 'liveValue', attrs: { widgetId: 'w', output: 'weightN', format } }));
    expect(refusal(live({ digits: 9, unit: '°' }))[0]?.path).toEqual(['content', 0, 'content', 0]);
    expect(refusal(live({ digits: 2, unit: '<b>' }))[0]?.path).toEqual(['content', 0, 'content', 0]);
    expect(refusal(withBlocks({ type: 'panelImage', attrs: { mediaId: '../../etc/passwd' } }))[0]?.path).toEqual(['content', 0]);
  });

  it('keeps text that looks like markup as plain text, since nothing ever renders it as HTML', () => {
    const doc: PanelDocJSON = { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: '<script>alert(1)</script>' }] }] };
    expect(checkPanelDocument(doc)).toEqual({ ok: true, doc });
  });
});
