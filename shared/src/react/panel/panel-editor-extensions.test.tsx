// @vitest-environment jsdom
import { act, cleanup, render, screen, waitFor } from '@testing-library/react';
import { EditorContent, useEditor, type Editor } from '@tiptap/react';
import { getSchema } from '@tiptap/core';
import { afterEach, describe, expect, it } from 'vitest';
import { examplePanelDoc } from '../../panel/example-panel.js';
import { panelSchema } from '../../panel/panel-extensions.js';
import { panelEditorExtensions } from './panel-editor-extensions.js';
import type { PanelEditorOptions } from './panel-editor-options.js';

const options: PanelEditorOptions = {
  locale: 'en',
  resolveMedia: (mediaId) => (mediaId === 'ridge-photo' ? { src: '/media/ridge.webp', alt: 'Basalt block on a slab', credit: 'Basalt Point' } : null),
  missingMediaLabel: 'Image not found in the media library',
};

let captured: Editor | null = null;

function PanelEditor() {
  const editor = useEditor({ extensions: panelEditorExtensions(options), content: examplePanelDoc(), immediatelyRender: true });
  captured = editor;
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
