import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { PanelImageFigure } from './PanelImageFigure.js';
import type { PanelEditorOptions } from './panel-editor-options.js';

/** The image block in the studio editor, with the alt text and credit of its media asset. */
export function PanelImageNodeView({ node, extension, selected }: ReactNodeViewProps) {
  const { resolveMedia, missingMediaLabel } = extension.options as PanelEditorOptions;
  return (
    <NodeViewWrapper className="mp-panel-image-node" data-selected={selected || undefined} data-drag-handle="">
      <PanelImageFigure media={resolveMedia(String(node.attrs.mediaId))} missingLabel={missingMediaLabel} />
    </NodeViewWrapper>
  );
}
