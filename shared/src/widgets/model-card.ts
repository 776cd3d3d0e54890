import { resolveWidgetLocale } from '../i18n/index.js';
import type { ModelCard, ModelSource } from './types.js';

/** A model card in one language, as a reviewer or visitor reads it: each equation beside what it says. */
export interface ModelCardView {
  summary: string;
  equations: { formula: string; meaning: string }[];
  assumptions: readonly string[];
  range: readonly string[];
  sources: readonly ModelSource[];
}

/** The card in the best language for a BCP 47 tag (the exact language, else English). */
export function modelCardIn(card: ModelCard, locale: string): ModelCardView {
  const words = card.words[resolveWidgetLocale(locale)];
  return {
    summary: words.summary,
    equations: card.equations.map((formula, index) => ({ formula, meaning: words.equations[index] ?? '' })),
    assumptions: words.assumptions,
    range: words.range,
    sources: card.sources,
  };
}
