import { describe, expect, it } from 'vitest';
import { carryAnchor } from './comment-anchor.js';

describe('carryAnchor', () => {
  const range = { from: 4, to: 8, quote: 'rock' };

  it('keeps a range whose words are still in place', () => {
    expect(carryAnchor(range, 'Hot rock rises.')).toEqual({ range, changed: false });
  });

  it('follows words that moved because text before them changed, to the nearest occurrence', () => {
    expect(carryAnchor(range, 'Very hot rock rises; cold rock sinks.')).toEqual({ range: { from: 9, to: 13, quote: 'rock' }, changed: false });
  });

  it('marks the anchor changed when the words were rewritten, keeping the range inside the text', () => {
    expect(carryAnchor(range, 'Hot stone')).toEqual({ range: { from: 4, to: 8, quote: 'rock' }, changed: true });
    expect(carryAnchor(range, 'Hot')).toEqual({ range: { from: 3, to: 3, quote: 'rock' }, changed: true });
  });
});
