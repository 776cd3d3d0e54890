import { danglingLiveValues } from '../panel/live-value/live-value-reading.js';
import { liveValuesIn } from '../panel/panel-queries.js';
import { languageName, panelFindings } from './panel-findings.js';
import type { PreflightRule } from './types.js';

/** A live value with no widget to read would show a dash where the caption's number should be, in any language. */
export const liveValueTarget: PreflightRule = {
  id: 'live-value-target',
  severity: 'blocker',
  run: (context) =>
    panelFindings(
      context,
      (panel, name) => {
        const { sourceLocale } = context.snapshot.story;
        const locales = Object.keys(panel.docs).sort((a, b) => Number(b === sourceLocale) - Number(a === sourceLocale) || a.localeCompare(b));
        if (!locales.some((locale) => liveValuesIn(panel.docs[locale]).length > 0)) return null;
        const problems = locales.flatMap((locale) => {
          const where = locale === sourceLocale ? name : `${name}, ${languageName(locale)} text`;
          return danglingLiveValues(panel.docs[locale]).map((dangling) => `${where}: ${dangling.message} Point it at a widget on this panel, or remove it.`);
        });
        return { problems, passed: `${name}: every live value reads a widget on this panel.` };
      },
      'No panel has a live value.',
    ),
};
