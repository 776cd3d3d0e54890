import type { PanelPath } from '../panel/panel-json.js';
import type { SnapshotPanel } from '../review/revision-snapshot.js';
import { languageName, panelFindings } from './panel-findings.js';
import type { PreflightContext, PreflightFinding } from './types.js';

/** The panel's languages, the source first: a problem in the source is read before its copies. */
export function localesSourceFirst(panel: SnapshotPanel, sourceLocale: string): string[] {
  return Object.keys(panel.docs).sort((a, b) => Number(b === sourceLocale) - Number(a === sourceLocale) || a.localeCompare(b));
}

/** How a message names a panel in one of its languages: its name, plus the language when it is a translation. */
export const panelInLocale = (name: string, locale: string, sourceLocale: string) => (locale === sourceLocale ? name : `${name}, ${languageName(locale)} text`);

interface InlineTargetCheck {
  /** The inline nodes of this kind in one document. */
  nodesIn: (doc: unknown) => readonly unknown[];
  /** Those that point at nothing they can read. */
  dangling: (doc: unknown) => readonly { path: PanelPath; message: string }[];
  fix: string;
  passed: (panelName: string) => string;
  noneApply: string;
}

/**
 * Findings for inline nodes that read a widget on their panel (live values, live phrases): one
 * problem per node, in every language, that has nothing to read.
 */
export function inlineTargetFindings(context: PreflightContext, check: InlineTargetCheck): PreflightFinding[] {
  const { sourceLocale } = context.snapshot.story;
  return panelFindings(
    context,
    (panel, name) => {
      const locales = localesSourceFirst(panel, sourceLocale);
      if (!locales.some((locale) => check.nodesIn(panel.docs[locale]).length > 0)) return null;
      const problems = locales.flatMap((locale) =>
        check.dangling(panel.docs[locale]).map((dangling) => `${panelInLocale(name, locale, sourceLocale)}: ${dangling.message} ${check.fix}`),
      );
      return { problems, passed: check.passed(name) };
    },
    check.noneApply,
  );
}
