// @vitest-environment jsdom
import { Editor } from '@tiptap/core';
import { afterEach, describe, expect, it } from 'vitest';
import { checkPanelDocument } from './check-panel-document.js';
import { emptyPanelDoc, examplePanelDoc } from './example-panel.js';
import { panelExtensions } from './panel-extensions.js';
import { widgetsIn } from './panel-queries.js';

const slopeParams = { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 };
let editor: Editor | undefined;

const open = (content: object) => {
  editor = new Editor({ extensions: panelExtensions, content });
  return editor;
};

afterEach(() => editor?.destroy());

describe('panel editor commands', () => {
  it('insert a widget and a live value that the server then accepts', () => {
    const current = open(emptyPanelDoc());
    current.chain().focus('end').insertWidget({ widgetType: 'slope-force', params: slopeParams, widgetId: 'slope-1' }).run();
    current.chain().focus('end').insertContent('Slides above ').insertLiveValue({ widgetId: 'slope-1', output: 'criticalAngleDeg', format: { digits: 2, unit: '°' } }).run();
    const doc = current.getJSON();
    expect(widgetsIn(doc).map((widget) => widget.widgetId)).toEqual(['slope-1']);
    expect(JSON.stringify(doc)).toContain('"output":"criticalAngleDeg"');
    expect(checkPanelDocument(doc).ok).toBe(true);
  });

  it('give an inserted widget an id when none is asked for', () => {
    const current = open(emptyPanelDoc());
    current.commands.insertWidget({ widgetType: 'slope-force', params: slopeParams });
    expect(widgetsIn(current.getJSON())[0]?.widgetId).toMatch(/^w-[0-9a-z]{10}$/);
  });

  it('rename a pasted copy of a widget so live values keep pointing at the original', () => {
    const current = open(examplePanelDoc());
    const original = examplePanelDoc().content?.[2];
    current.chain().focus('end').insertContent(original ?? {}).run();
    const ids = widgetsIn(current.getJSON()).map((widget) => widget.widgetId);
    expect(ids).toHaveLength(2);
    expect(ids[0]).toBe('ridge-slope');
    expect(ids[1]).not.toBe('ridge-slope');
  });

  it('set the params of a widget by its id', () => {
    const current = open(examplePanelDoc());
    expect(current.commands.setWidgetParams('ridge-slope', { ...slopeParams, angleDeg: 45 })).toBe(true);
    expect(widgetsIn(current.getJSON())[0]?.params.angleDeg).toBe(45);
    expect(current.commands.setWidgetParams('no-such-widget', slopeParams)).toBe(false);
  });

  it('refuse a javascript: link from the link command', () => {
    const current = open(emptyPanelDoc());
    current.chain().focus().insertContent('tap').selectAll().run();
    expect(current.commands.setLink({ href: 'javascript:alert(1)' })).toBe(false);
    expect(current.commands.setLink({ href: 'https://basalt-point.example' })).toBe(true);
    expect(JSON.stringify(current.getJSON())).toContain('"href":"https://basalt-point.example"');
  });

  it('drop pasted HTML the panel does not allow: scripts, event handlers, images by URL', () => {
    const current = open(emptyPanelDoc());
    current.commands.setContent('<h1>Title</h1><p onclick="alert(1)">Hi <a href="javascript:alert(1)">there</a></p><script>alert(1)</script><img src="https://x.example/a.png"><pre><code>x</code></pre>');
    const doc = current.getJSON();
    expect(checkPanelDocument(doc).ok).toBe(true);
    expect(JSON.stringify(doc)).not.toMatch(/script|onclick|img|src|codeBlock/);
  });

  it('round-trip a stored document through the editor unchanged', () => {
    expect(open(examplePanelDoc()).getJSON()).toEqual(examplePanelDoc());
  });
});
