import type { ResolveMedia } from './panel-media.js';
import type { SimulationReports, WidgetTrials } from './simulation-reports.js';

/** The studio's words for a widget being tried in the editor, in the studio's language. */
export interface WidgetTrialLabels {
  /** Says the drawing shows a trial, not the saved setting. */
  trying: string;
  /** Makes the trial the widget's saved starting setting. */
  keep: string;
  /** Drops the trial and shows the saved setting again. */
  reset: string;
  /** Said of a live value or phrase while its widget is tried: it follows the trial, not the saved setting. */
  trialValue?: string;
}

/** What the studio tells the editor's node views; the schema itself never depends on it. */
export interface PanelEditorOptions {
  locale: string;
  resolveMedia: ResolveMedia;
  /** Shown where an image's media asset cannot be found (deleted, or not yet loaded). */
  missingMediaLabel: string;
  /** Without them a widget can still be tried in the editor, but its trial cannot be kept. */
  widgetTrialLabels?: WidgetTrialLabels;
  /** Shared by the node views of one editor; panelEditorExtensions makes one when none is given. */
  simulationReports?: SimulationReports;
  /** Shared by the node views of one editor, like simulationReports. */
  widgetTrials?: WidgetTrials;
}
