import { stateWordsInPlainText } from '../panel/live-phrase/index.js';
import { isWidgetType, widgetModule } from '../widgets/registry.js';
import { localesSourceFirst, panelInLocale } from './inline-targets.js';
import { panelFindings } from './panel-findings.js';
import type { PreflightRule } from './types.js';
import { widgetName } from './widget-findings.js';

const visitorChangesState = (widgetType: string) => isWidgetType(widgetType) && widgetModule(widgetType).states?.visitorChangesState === true;

/**
 * Plain text that names a state the visitor can change ("the block slides" beside a slope the
 * visitor tilts) is true only until the visitor moves the widget; a live phrase follows it.
 */
export const livePhraseStateWords: PreflightRule = {
  id: 'live-phrase-state-words',
  severity: 'warning',
  run: (context) => {
    const { sourceLocale } = context.snapshot.story;
    return panelFindings(
      context,
      (panel, name) => {
        const changeable = panel.widgets.filter((widget) => visitorChangesState(widget.widgetType));
        if (changeable.length === 0) return null;
        const problems = localesSourceFirst(panel, sourceLocale).flatMap((locale) =>
          stateWordsInPlainText(panel.docs[locale], locale).map(({ word, widgetId }) => {
            const widget = changeable.find((candidate) => candidate.widgetId === widgetId);
            return `${panelInLocale(name, locale, sourceLocale)}: the text says “${word}”, but a visitor can change the state of ${widget ? widgetName(widget) : widgetId} on this panel. Use a live phrase, so the words follow the widget.`;
          }),
        );
        return { problems, passed: `${name}: no plain text names a state the visitor can change.` };
      },
      'No panel has a widget whose state a visitor changes.',
    );
  },
};
