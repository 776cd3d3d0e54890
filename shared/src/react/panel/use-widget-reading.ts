import { useEditorState, type Editor } from '@tiptap/react';
import { useSyncExternalStore } from 'react';
import { readWidget, type WidgetReading } from '../../panel/live-value/live-value-reading.js';
import { WIDGET_NODE } from '../../panel/panel-json.js';
import type { SimulationReports, WidgetTrials } from './simulation-reports.js';

interface FoundWidget {
  widgetType: string;
  params: unknown;
}

const noSubscription = () => () => undefined;

/**
 * What the widget with this id puts out now, for a live value's or live phrase's node view. It
 * watches the editor's document, so moving a slider in the side form changes the caption at once,
 * the simulation's reports, so an output of a running drawing follows it, and the widget's trial,
 * so the text says what a widget being tried shows (`trying` tells the view to mark it).
 */
export function useWidgetReadings(
  editor: Editor,
  widgetId: string,
  { simulationReports, widgetTrials }: { simulationReports?: SimulationReports; widgetTrials?: WidgetTrials },
): { readings: ReadonlyMap<string, WidgetReading>; trying: boolean } {
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
  const trial = useSyncExternalStore(widgetTrials?.subscribe ?? noSubscription, () => widgetTrials?.get(widgetId));
  const trying = Boolean(widget && trial);
  return { readings: new Map(widget ? [[widgetId, readWidget(widget.widgetType, trial ?? widget.params, report)]] : []), trying };
}
