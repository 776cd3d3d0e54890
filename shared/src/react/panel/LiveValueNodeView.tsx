import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { DEFAULT_LIVE_VALUE_FORMAT, isLiveValueFormat } from '../../panel/live-value/live-value-format.js';
import { liveValueText, readLiveValue, type LiveValueReading } from '../../panel/live-value/live-value-reading.js';
import type { PanelEditorOptions } from './panel-editor-options.js';
import { useWidgetReadings } from './use-widget-reading.js';

/**
 * A live value in the studio editor. It follows the widget it points at (while the widget is tried
 * in the editor, the trial, marked as one), and one whose widget is gone says so in place.
 */
export function LiveValueNodeView({ node, editor, extension, selected }: ReactNodeViewProps) {
  const options = extension.options as PanelEditorOptions;
  const widgetId = String(node.attrs.widgetId);
  const output = String(node.attrs.output);
  const { readings, trying } = useWidgetReadings(editor, widgetId, options);
  const reading: LiveValueReading = readLiveValue({ widgetId, output }, readings);
  const format = isLiveValueFormat(node.attrs.format) ? node.attrs.format : DEFAULT_LIVE_VALUE_FORMAT;
  const title = reading.ok ? `${output} of ${widgetId}` : `No value: ${reading.reason}`;
  return (
    <NodeViewWrapper
      as="span"
      className="mp-live-value-node"
      data-selected={selected || undefined}
      data-dangling={reading.ok ? undefined : reading.reason}
      data-trying={trying || undefined}
      title={trying && options.widgetTrialLabels?.trialValue ? `${options.widgetTrialLabels.trialValue} ${title}` : title}
    >
      {liveValueText(reading, format, options.locale)}
    </NodeViewWrapper>
  );
}
