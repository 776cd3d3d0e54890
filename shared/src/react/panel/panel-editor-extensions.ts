import type { AnyExtension, Extensions } from '@tiptap/core';
import { ReactNodeViewRenderer, type ReactNodeViewProps } from '@tiptap/react';
import type { ComponentType } from 'react';
import { panelExtensions } from '../../panel/panel-extensions.js';
import { PanelDocumentEdges } from './document-edges.js';
import { LIVE_PHRASE_NODE, LIVE_VALUE_NODE, PANEL_IMAGE_NODE, WIDGET_NODE } from '../../panel/panel-json.js';
import { LivePhraseNodeView } from './LivePhraseNodeView.js';
import { LiveValueNodeView } from './LiveValueNodeView.js';
import type { PanelEditorOptions } from './panel-editor-options.js';
import { PanelImageNodeView } from './PanelImageNodeView.js';
import { SimulationReports, WidgetTrials } from './simulation-reports.js';
import { isWidgetDrawingEvent, WidgetNodeView } from './WidgetNodeView.js';

const nodeViews: Record<string, ComponentType<ReactNodeViewProps>> = {
  [WIDGET_NODE]: WidgetNodeView,
  [LIVE_VALUE_NODE]: LiveValueNodeView,
  [LIVE_PHRASE_NODE]: LivePhraseNodeView,
  [PANEL_IMAGE_NODE]: PanelImageNodeView,
};

function withNodeView(extension: AnyExtension, options: PanelEditorOptions): AnyExtension {
  const view = nodeViews[extension.name];
  if (!view) return extension;
  return extension.extend({
    addOptions() {
      return { ...(this.parent?.() as object | undefined), ...options };
    },
    addNodeView() {
      return ReactNodeViewRenderer(view, {
        as: extension.name === LIVE_VALUE_NODE || extension.name === LIVE_PHRASE_NODE ? 'span' : 'div',
        stopEvent: extension.name === WIDGET_NODE ? isWidgetDrawingEvent : null,
      });
    },
  });
}

/**
 * `panelExtensions` with React node views for the studio editor, and the keys that reach the
 * panel's edges. Only views and keys are added, so the editor's schema is the server's schema.
 */
export function panelEditorExtensions(options: PanelEditorOptions): Extensions {
  const shared = { ...options, simulationReports: options.simulationReports ?? new SimulationReports(), widgetTrials: options.widgetTrials ?? new WidgetTrials() };
  return [...panelExtensions.map((extension) => withNodeView(extension, shared)), PanelDocumentEdges];
}
