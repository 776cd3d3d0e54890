import { mergeAttributes, Node } from '@tiptap/core';
import { PANEL_IMAGE_NODE } from '../panel-json.js';
import { assertPanelId, isPanelId } from '../widget/widget-id.js';

export interface PanelImageAttributes {
  mediaId: string;
}

export interface PanelImageOptions {
  HTMLAttributes: Record<string, unknown>;
}

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    panelImage: {
      /** Inserts an image from the media library. */
      insertPanelImage: (attributes: PanelImageAttributes) => ReturnType;
    };
  }
}

/**
 * An image from the media library, referenced by id only. No src, alt or credit in the document:
 * the asset carries its renditions, rights and per-locale alt text, so a licence change or a new
 * translation of the alt text reaches every panel, and a document cannot smuggle in a URL.
 */
export const PanelImage = Node.create<PanelImageOptions>({
  name: PANEL_IMAGE_NODE,
  group: 'block',
  atom: true,
  selectable: true,
  draggable: true,

  addOptions() {
    return { HTMLAttributes: {} };
  },

  addAttributes() {
    return {
      mediaId: {
        default: null,
        validate: assertPanelId,
        parseHTML: (element: HTMLElement) => element.getAttribute('data-media-id'),
        renderHTML: (attributes: Record<string, unknown>) => ({ 'data-media-id': attributes.mediaId }),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'figure[data-media-id]', getAttrs: (element: HTMLElement) => (isPanelId(element.getAttribute('data-media-id')) ? null : false) }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['figure', mergeAttributes(this.options.HTMLAttributes, HTMLAttributes)];
  },

  addCommands() {
    return {
      insertPanelImage:
        ({ mediaId }) =>
          ({ commands }) =>
            commands.insertContent({ type: this.name, attrs: { mediaId } }),
    };
  },
});
