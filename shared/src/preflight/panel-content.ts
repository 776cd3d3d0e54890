import { panelText } from '../panel/panel-text.js';
import { panelFindings } from './panel-findings.js';
import type { PreflightRule } from './types.js';

/** A panel with nothing on it would show visitors a blank screen between two others. */
export const panelContent: PreflightRule = {
  id: 'panel-content',
  severity: 'blocker',
  run: (context) =>
    panelFindings(
      context,
      (panel, name) => {
        const { sourceLocale } = context.snapshot.story;
        const doc = panel.docs[sourceLocale];
        const hasText = doc ? panelText(doc, { locale: sourceLocale }).trim() !== '' : false;
        const empty = !hasText && panel.widgets.length === 0 && panel.mediaIds.length === 0;
        return {
          problems: empty ? [`${name} is empty. Write its text, add an image or a widget, or delete the panel.`] : [],
          passed: `${name} has something to show.`,
        };
      },
      'The story has no panels.',
    ),
};
