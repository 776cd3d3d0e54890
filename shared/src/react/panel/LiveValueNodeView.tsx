import { NodeViewWrapper, useEditorState, type ReactNodeViewProps } from '@tiptap/react';
import { DEFAULT_LIVE_VALUE_FORMAT, isLiveValueFormat } from '../../panel/live-value/live-value-format.js';
import { liveValueText, readLiveValue, readWidget, type LiveValueReading } from '../../panel/live-value/live-value-reading.js';
import { WIDGET_NODE } from '../../panel/panel-json.js';
import type { PanelEditorOptions } from './panel-editor-options.js';

/**
 * A live value in the studio editor. It watches the widget it points at, so moving a slider in the
 * side form changes the caption at once; a live value whose widget is gone says so in place.
 */
export function LiveValueNodeView({ node, editor, extension, selected }: ReactNodeViewProps) {
  const { locale } = extension.options as PanelEditorOptions;
  const widgetId = String(node.attrs.widgetId);
  const output = String(node.attrs.output);
  const reading = useEditorState({
    editor,
    selector: ({ editor: current }): LiveValueReading => {
      let widget: { widgetType: string; params: unknown } | null = null;
      current.state.doc.descendants((child) => {
        if (widget) return false;
        if (child.type.name === WIDGET_NODE && child.attrs.widgetId === widgetId) widget = { widgetType: String(child.attrs.widgetType), params: child.attrs.params };
        return child.type.name !== WIDGET_NODE;
      });
      const found = widget as { widgetType: string; params: unknown } | null;
      const readings = new Map(found ? [[widgetId, readWidget(found.widgetType, found.params)]] : []);
      return readLiveValue({ widgetId, output }, readings);
    },
  });
  const format = isLiveValueFormat(node.attrs.format) ? node.attrs.format : DEFAULT_LIVE_VALUE_FORMAT;
  return (
    <NodeViewWrapper
      as="span"
      className="mp-live-value-node"
      data-selected={selected || undefined}
      data-dangling={reading.ok ? undefined : reading.reason}
      title={reading.ok ? `${output} of ${widgetId}` : `No value: ${reading.reason}`}
    >
      {liveValueText(reading, format, locale)}
    </NodeViewWrapper>
  );
}
