import { describe, expect, it } from 'vitest';
import { readingLevel } from './reading-level.js';

// Flesch Reading Ease = 206.835 − 1.015·(words/sentences) − 84.6·(syllables/words) (Flesch 1948);
// Flesch–Kincaid grade = 0.39·(words/sentences) + 11.8·(syllables/words) − 15.59 (Kincaid et al. 1975).
describe('readingLevel', () => {
  it('matches the flesch package\'s own documented example, "The cat sat on the mat" (1 sentence, 6 words, 6 syllables)', () => {
    const level = readingLevel('The cat sat on the mat.');
    expect(level).toMatchObject({ sentences: 1, words: 6, syllables: 6 });
    // The package readme gives 116.14500…; by hand 206.835 − 1.015·6 − 84.6·1 = 116.145.
    expect(level?.fleschReadingEase).toBeCloseTo(116.145, 9);
    // 0.39·6 + 11.8·1 − 15.59 = −1.45.
    expect(level?.fleschKincaidGrade).toBeCloseTo(-1.45, 9);
  });

  it('computes a panel sentence counted by hand: "Hot rock rises slowly." (1 sentence, 4 words, hot-rock-ris·es-slow·ly = 6 syllables)', () => {
    const level = readingLevel('Hot rock rises slowly.');
    expect(level).toMatchObject({ sentences: 1, words: 4, syllables: 6 });
    // 206.835 − 1.015·4 − 84.6·1.5 = 75.875; 0.39·4 + 11.8·1.5 − 15.59 = 3.67.
    expect(level?.fleschReadingEase).toBeCloseTo(75.875, 9);
    expect(level?.fleschKincaidGrade).toBeCloseTo(3.67, 9);
  });

  it('treats each line as ending a sentence, so a heading without a full stop is not run into the next', () => {
    const level = readingLevel('Hot rock\nThe cat sat on the mat.');
    expect(level).toMatchObject({ sentences: 2, words: 8, syllables: 8 });
  });

  it('counts a number as a word of at least one syllable', () => {
    expect(readingLevel('It is 35 degrees.')).toMatchObject({ words: 4, syllables: 5 });
  });

  it('has nothing to say about an empty panel', () => {
    expect(readingLevel('  \n ')).toBeNull();
  });
});
