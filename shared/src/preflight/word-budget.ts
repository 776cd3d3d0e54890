import { panelText, wordCount } from '../panel/panel-text.js';
import { panelFindings } from './panel-findings.js';
import type { PreflightRule } from './types.js';

/** A panel's budget is what fits its screen at kiosk type sizes; the source text is measured, translations have their own length budgets. */
export const wordBudget: PreflightRule = {
  id: 'word-budget',
  severity: 'warning',
  run: (context) =>
    panelFindings(
      context,
      (panel, name) => {
        const { sourceLocale } = context.snapshot.story;
        const words = wordCount(panelText(panel.docs[sourceLocale], { locale: sourceLocale }), sourceLocale);
        const over = words - panel.wordBudget;
        return {
          problems: over > 0 ? [`${name} has ${words} words, ${over} over its budget of ${panel.wordBudget}. Cut ${over} ${over === 1 ? 'word' : 'words'}, or split the panel in two.`] : [],
          passed: `${name} has ${words} of its ${panel.wordBudget} words.`,
        };
      },
      'The story has no panels.',
    ),
};
