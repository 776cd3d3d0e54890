import type { Audience } from '../authoring/views.js';
import { panelText } from '../panel/panel-text.js';
import { readingLevel } from '../panel/reading-level.js';
import { languageName, panelFindings } from './panel-findings.js';
import type { PreflightRule } from './types.js';

export interface ReadingTarget {
  /** Highest Flesch–Kincaid grade (Kincaid et al. 1975), a US school grade. */
  maxGrade: number;
  /** Lowest Flesch Reading Ease (Flesch 1948); higher is easier. */
  minEase: number;
}

/**
 * Targets per audience. Museum practice (common practice, from memory) writes gallery text for a
 * reading age of about 12, that is US grade 6 to 7: the family target. Flesch's own bands (Flesch
 * 1948, from memory) put 70–80 at "fairly easy" (about grade 7), 60–70 at "standard" (grades 8–9)
 * and 50–60 at "fairly difficult" (grades 10–12), which set the ease floors beside the grades:
 * school groups up to grade 8, adults up to grade 10, still short of dense print because gallery
 * visitors read standing up.
 */
export const READING_TARGETS: Readonly<Record<Audience, ReadingTarget>> = {
  family: { maxGrade: 6, minEase: 70 },
  school: { maxGrade: 8, minEase: 60 },
  adult: { maxGrade: 10, minEase: 50 },
};

/** The Flesch formulas are fitted to English, so text in other languages is not measured (editor and preflight alike). */
export const measuresReadingLevel = (locale: string) => locale.toLowerCase().split(/[-_]/)[0] === 'en';
const oneDecimal = (value: number) => value.toFixed(1);

/** Other languages than English are left to the reviewer. */
export const readingLevelRule: PreflightRule = {
  id: 'reading-level',
  severity: 'warning',
  run: (context) => {
    const { audience, sourceLocale } = context.snapshot.story;
    if (!measuresReadingLevel(sourceLocale)) {
      return [{ passed: true, message: `Reading level is measured for English text only; this story is written in ${languageName(sourceLocale)}, so it was not measured.` }];
    }
    const target = READING_TARGETS[audience];
    const targetText = `the ${audience} target of grade ${target.maxGrade} or below and reading ease ${target.minEase} or above`;
    return panelFindings(
      context,
      (panel, name) => {
        const level = readingLevel(panelText(panel.docs[sourceLocale], { locale: sourceLocale }));
        if (!level) return null;
        const measured = `grade ${oneDecimal(level.fleschKincaidGrade)} (Flesch–Kincaid) and reading ease ${oneDecimal(level.fleschReadingEase)} (Flesch)`;
        const tooHard = level.fleschKincaidGrade > target.maxGrade || level.fleschReadingEase < target.minEase;
        return {
          problems: tooHard ? [`${name} reads at ${measured}, harder than ${targetText}. Use shorter sentences and shorter, everyday words.`] : [],
          passed: `${name} reads at ${measured}, within ${targetText}.`,
        };
      },
      'No panel has text to measure.',
    );
  },
};
