import { flesch } from 'flesch';
import { fleschKincaid } from 'flesch-kincaid';
import { syllable } from 'syllable';
import { wordsOf } from './panel-text.js';

export interface ReadingLevel {
  sentences: number;
  words: number;
  syllables: number;
  /** Flesch (1948): higher is easier; 60–70 suits 13- to 15-year-olds. */
  fleschReadingEase: number;
  /** Kincaid et al. (1975): a US school grade. */
  fleschKincaidGrade: number;
}

/** Sentences per line: a heading or list item ends where its line ends even without a full stop. */
function sentenceCount(text: string): number {
  const segmenter = new Intl.Segmenter('en', { granularity: 'sentence' });
  return text
    .split('\n')
    .flatMap((line) => Array.from(segmenter.segment(line), (segment) => segment.segment))
    .filter((sentence) => wordsOf(sentence).length > 0).length;
}

/**
 * Flesch Reading Ease and Flesch–Kincaid grade of English text, or null when there is nothing to
 * measure. The formulas are English-only, so callers ask this only of English panels.
 */
export function readingLevel(text: string): ReadingLevel | null {
  const words = wordsOf(text);
  if (words.length === 0) return null;
  // A number read aloud has at least one syllable; the syllable counter gives figures none.
  const syllables = words.reduce((sum, word) => sum + Math.max(1, syllable(word)), 0);
  const counts = { sentence: sentenceCount(text), word: words.length, syllable: syllables };
  return {
    sentences: counts.sentence,
    words: counts.word,
    syllables,
    fleschReadingEase: flesch(counts),
    fleschKincaidGrade: fleschKincaid(counts),
  };
}
