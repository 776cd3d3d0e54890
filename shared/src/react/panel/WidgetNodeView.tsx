import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { isPlainObject } from '../../panel/panel-json.js';
import { PanelWidget } from './PanelWidget.js';
import type { PanelEditorOptions } from './panel-editor-options.js';

/** The widget block in the studio editor, drawn live by the same component the kiosk uses. */
export function WidgetNodeView({ node, extension, selected, updateAttributes }: ReactNodeViewProps) {
  const { locale } = extension.options as PanelEditorOptions;
  return (
    <NodeViewWrapper className="mp-widget-node" data-selected={selected || undefined} data-drag-handle="">
      <PanelWidget
        widgetType={String(node.attrs.widgetType)}
        params={isPlainObject(node.attrs.params) ? node.attrs.params : {}}
        locale={locale}
        reducedMotion
        highContrast={false}
        onParamsChange={(params) => updateAttributes({ params })}
      />
    </NodeViewWrapper>
  );
}
