import type { Audience } from '@mantlepiece/shared';

/**
 * Highest Flesch–Kincaid grade (Kincaid et al. 1975) a panel should read at, per audience. Museum
 * practice (common practice, from memory) writes for a reading age of about 12, a US grade of 6 to
 * 7; families include younger readers, adults read a little above it.
 */
export const READING_GRADE_TARGET: Record<Audience, number> = {
  family: 6,
  school: 7,
  adult: 9,
};

/** The formulas are English ones, so they are shown only for panels written in English. */
export const measuresReadingLevel = (locale: string) => locale.toLowerCase().split('-')[0] === 'en';
