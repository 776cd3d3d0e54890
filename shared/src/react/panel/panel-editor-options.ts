import type { ResolveMedia } from './panel-media.js';
import type { SimulationReports } from './simulation-reports.js';

/** What the studio tells the editor's node views; the schema itself never depends on it. */
export interface PanelEditorOptions {
  locale: string;
  resolveMedia: ResolveMedia;
  /** Shown where an image's media asset cannot be found (deleted, or not yet loaded). */
  missingMediaLabel: string;
  /** Shared by the node views of one editor; panelEditorExtensions makes one when none is given. */
  simulationReports?: SimulationReports;
}
