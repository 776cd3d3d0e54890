import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { livePhraseText, readLivePhrase } from '../../panel/live-phrase/live-phrase-reading.js';
import { isLivePhraseWordings } from '../../panel/live-phrase/live-phrase-wordings.js';
import type { PanelEditorOptions } from './panel-editor-options.js';
import { useWidgetReadings } from './use-widget-reading.js';

/**
 * A live phrase in the studio editor: the wording for the state its widget is in with the settings
 * the curator has made, so tilting the slope in the side form changes the sentence at once; while
 * the widget is tried in the editor, the wording for the state the trial shows, marked as a trial.
 */
export function LivePhraseNodeView({ node, editor, extension, selected }: ReactNodeViewProps) {
  const options = extension.options as PanelEditorOptions;
  const widgetId = String(node.attrs.widgetId);
  const wordings = isLivePhraseWordings(node.attrs.wordings) ? node.attrs.wordings : {};
  const { readings, trying } = useWidgetReadings(editor, widgetId, options);
  const reading = readLivePhrase({ widgetId, wordings }, readings);
  const wordingsTitle = Object.entries(wordings).map(([state, text]) => `${state}: ${text}`).join(' · ');
  return (
    <NodeViewWrapper
      as="span"
      className="mp-live-phrase-node"
      data-selected={selected || undefined}
      data-state={reading.ok ? reading.state : undefined}
      data-dangling={reading.ok ? undefined : reading.reason}
      data-trying={trying || undefined}
      title={trying && options.widgetTrialLabels?.trialValue ? `${options.widgetTrialLabels.trialValue} ${wordingsTitle}` : wordingsTitle}
    >
      {livePhraseText(reading)}
    </NodeViewWrapper>
  );
}
