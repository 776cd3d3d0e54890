// @vitest-environment jsdom
import { act, cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { EditorContent, useEditor, type Editor } from '@tiptap/react';
import { useEffect } from 'react';
import { Editor as CoreEditor, getSchema } from '@tiptap/core';
import { GapCursor } from '@tiptap/pm/gapcursor';
import { afterEach, describe, expect, it } from 'vitest';
import { examplePanelDoc } from '../../panel/example-panel.js';
import { panelExtensions, panelSchema } from '../../panel/panel-extensions.js';
import { widgetsIn } from '../../panel/panel-queries.js';
import type { PanelDocJSON } from '../../panel/panel-json.js';
import { panelEdgeSelection } from './document-edges.js';
import { panelEditorExtensions } from './panel-editor-extensions.js';
import { isWidgetDrawingEvent } from './WidgetNodeView.js';
import type { PanelEditorOptions } from './panel-editor-options.js';

const options: PanelEditorOptions = {
  locale: 'en',
  resolveMedia: (mediaId) => (mediaId === 'ridge-photo' ? { src: '/media/ridge.webp', alt: 'Basalt block on a slab', credit: 'Basalt Point' } : null),
  missingMediaLabel: 'Image not found in the media library',
  widgetTrialLabels: { trying: 'Trying it out: not saved', keep: 'Use this as the starting setting', reset: 'Back to the saved setting' },
};

let captured: Editor | null = null;

function PanelEditor() {
  const editor = useEditor({ extensions: panelEditorExtensions(options), content: examplePanelDoc(), immediatelyRender: true });
  useEffect(() => {
    captured = editor;
  });
  return <EditorContent editor={editor} />;
}

afterEach(() => {
  cleanup();
  captured = null;
});

describe('panelEditorExtensions', () => {
  it('has the same schema as the server check', () => {
    const editorSchema = getSchema(panelEditorExtensions(options));
    expect(Object.keys(editorSchema.nodes)).toEqual(Object.keys(panelSchema().nodes));
    expect(Object.keys(editorSchema.marks)).toEqual(Object.keys(panelSchema().marks));
  });

  it('draws live values from the widget and updates them when the widget changes', async () => {
    const { container } = render(<PanelEditor />);
    await waitFor(() => expect(container.querySelector('.mp-live-value-node')?.textContent).toBe('40°'));
    act(() => {
      captured?.commands.setWidgetParams('ridge-slope', { massKg: 10, angleDeg: 30, staticFriction: 1, kineticFriction: 0.6 });
    });
    // arctan 1 = 45°.
    await waitFor(() => expect(container.querySelector('.mp-live-value-node')?.textContent).toBe('45°'));
  });

  it('marks a live value whose widget was deleted', async () => {
    const { container } = render(<PanelEditor />);
    await waitFor(() => expect(container.querySelector('.mp-widget-node')).not.toBeNull());
    act(() => {
      const editor = captured;
      editor?.state.doc.forEach((node, offset) => {
        if (node.type.name === 'widget') editor.commands.deleteRange({ from: offset, to: offset + node.nodeSize });
      });
    });
    await waitFor(() => expect(container.querySelector('.mp-live-value-node')?.getAttribute('data-dangling')).toBe('no-widget'));
  });

  it('draws images with the media asset\'s alt text and widgets by the shared component', async () => {
    const { container } = render(<PanelEditor />);
    expect(await screen.findByAltText('Basalt block on a slab')).toBeTruthy();
    expect(container.querySelector('.mp-widget-node [data-widget-type="slope-force"]')).not.toBeNull();
  });
});

const slopeParams = { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 };
const startsWithWidget = (): PanelDocJSON => ({
  type: 'doc',
  content: [
    { type: 'widget', attrs: { widgetType: 'slope-force', widgetId: 'first-slope', params: slopeParams } },
    { type: 'paragraph', content: [{ type: 'text', text: 'Tilt it.' }] },
  ],
});

// Rendering a widget in jsdom is slow on a busy machine; waits end as soon as the state is there.
const settled = { timeout: 5_000 };

describe('a widget tried in the editor', () => {
  it('shows the trial in the drawing but keeps the saved setting until the curator keeps the trial', async () => {
    const { container } = render(<PanelEditor />);
    const slider = await screen.findByRole('slider', { name: 'Slope force box: Slope angle' }, settled);
    fireEvent.keyDown(slider, { key: 'ArrowUp' });
    await waitFor(() => expect(slider.getAttribute('aria-valuenow')).toBe('31'), settled);
    expect(widgetsIn(captured!.getJSON())[0]?.params.angleDeg).toBe(30);
    expect(container.querySelector('.mp-widget-node')?.hasAttribute('data-trying')).toBe(true);
    fireEvent.click(screen.getByRole('button', { name: 'Use this as the starting setting' }));
    await waitFor(() => expect(widgetsIn(captured!.getJSON())[0]?.params.angleDeg).toBe(31), settled);
    expect(screen.queryByRole('button', { name: 'Use this as the starting setting' })).toBeNull();
  });

  it('goes back to the saved setting on request', async () => {
    render(<PanelEditor />);
    const slider = await screen.findByRole('slider', { name: 'Slope force box: Slope angle' }, settled);
    fireEvent.keyDown(slider, { key: 'PageUp' });
    await waitFor(() => expect(slider.getAttribute('aria-valuenow')).toBe('40'), settled);
    fireEvent.click(screen.getByRole('button', { name: 'Back to the saved setting' }));
    await waitFor(() => expect(slider.getAttribute('aria-valuenow')).toBe('30'), settled);
    expect(widgetsIn(captured!.getJSON())[0]?.params.angleDeg).toBe(30);
  });

  it('leaves a drag that starts in the drawing to the widget, but lets drops over it reach the editor', () => {
    const drawing = document.createElement('div');
    drawing.className = 'mp-widget-drawing';
    const inside = drawing.appendChild(document.createElement('span'));
    const at = (type: string) => {
      const event = new Event(type, { bubbles: true });
      Object.defineProperty(event, 'target', { value: inside });
      return isWidgetDrawingEvent({ event });
    };
    expect(at('dragstart')).toBe(true);
    expect(at('mousedown')).toBe(true);
    expect(at('dragover')).toBe(false);
    expect(at('drop')).toBe(false);
    // Outside the drawing (the grip) a drag is the editor's: that is how the block is moved.
    expect(isWidgetDrawingEvent({ event: new Event('dragstart') })).toBe(false);
  });
});

describe('the panel edges', () => {
  let editor: CoreEditor | undefined;
  afterEach(() => editor?.destroy());

  it('puts the cursor before a widget that starts the panel, where typing makes a new first paragraph', () => {
    editor = new CoreEditor({ extensions: panelExtensions, content: startsWithWidget() });
    const selection = panelEdgeSelection(editor.state.doc, 'start');
    expect(selection).toBeInstanceOf(GapCursor);
    expect(selection.from).toBe(0);
    editor.view.dispatch(editor.state.tr.setSelection(selection).insertText('First words.'));
    expect(editor.getJSON().content?.map((node) => node.type)).toEqual(['paragraph', 'widget', 'paragraph']);
    expect(editor.state.doc.firstChild?.textContent).toBe('First words.');
  });

  it('puts the cursor in the first text when the panel starts with text', () => {
    editor = new CoreEditor({ extensions: panelExtensions, content: examplePanelDoc() });
    const selection = panelEdgeSelection(editor.state.doc, 'start');
    expect(selection).not.toBeInstanceOf(GapCursor);
    expect(selection.from).toBe(1);
  });
});
