import type { PanelView } from '@mantlepiece/shared';
import type { PanelDocument } from './models/panel-document.model.js';
import type { Panel } from './models/panel.model.js';

/** A panel with the document of its story's source locale. */
export const toPanelView = (panel: Panel, source: PanelDocument): PanelView => ({
  id: panel.id,
  storyId: panel.storyId,
  position: panel.position,
  version: source.version,
  doc: source.doc,
  wordBudget: panel.wordBudget,
  updatedAt: (source.updatedAt > panel.updatedAt ? source.updatedAt : panel.updatedAt).toISOString(),
});
