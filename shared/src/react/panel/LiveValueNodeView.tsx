import { NodeViewWrapper, useEditorState, type ReactNodeViewProps } from '@tiptap/react';
import { useSyncExternalStore } from 'react';
import { DEFAULT_LIVE_VALUE_FORMAT, isLiveValueFormat } from '../../panel/live-value/live-value-format.js';
import { liveValueText, readLiveValue, readWidget, type LiveValueReading } from '../../panel/live-value/live-value-reading.js';
import { WIDGET_NODE } from '../../panel/panel-json.js';
import type { PanelEditorOptions } from './panel-editor-options.js';

interface FoundWidget {
  widgetType: string;
  params: unknown;
}

const noSubscription = () => () => undefined;

/**
 * A live value in the studio editor. It watches the widget it points at, so moving a slider in the
 * side form changes the caption at once, and one of a simulation's outputs follows the running
 * drawing; a live value whose widget is gone says so in place.
 */
export function LiveValueNodeView({ node, editor, extension, selected }: ReactNodeViewProps) {
  const { locale, simulationReports } = extension.options as PanelEditorOptions;
  const widgetId = String(node.attrs.widgetId);
  const output = String(node.attrs.output);
  const widget = useEditorState({
    editor,
    selector: ({ editor: current }): FoundWidget | null => {
      let found: FoundWidget | null = null;
      current.state.doc.descendants((child) => {
        if (found) return false;
        if (child.type.name === WIDGET_NODE && child.attrs.widgetId === widgetId) found = { widgetType: String(child.attrs.widgetType), params: child.attrs.params };
        return child.type.name !== WIDGET_NODE;
      });
      return found;
    },
  });
  const report = useSyncExternalStore(simulationReports?.subscribe ?? noSubscription, () => simulationReports?.get(widgetId));
  const readings = new Map(widget ? [[widgetId, readWidget(widget.widgetType, widget.params, report)]] : []);
  const reading: LiveValueReading = readLiveValue({ widgetId, output }, readings);
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
