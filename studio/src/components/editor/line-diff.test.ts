import { describe, expect, it } from 'vitest';
import { lineDiff } from './line-diff';

describe('lineDiff', () => {
  it('keeps shared lines and marks each side’s own lines', () => {
    expect(lineDiff('Rock slides.\nFriction holds.\nTry it', 'Rock slides.\nFriction grips.\nTry it')).toEqual([
      { kind: 'same', text: 'Rock slides.' },
      { kind: 'yours', text: 'Friction grips.' },
      { kind: 'theirs', text: 'Friction holds.' },
      { kind: 'same', text: 'Try it' },
    ]);
  });

  it('shows a panel that was empty on one side as wholly the other’s', () => {
    expect(lineDiff('', 'New line')).toEqual([{ kind: 'yours', text: 'New line' }]);
    expect(lineDiff('Old line', '')).toEqual([{ kind: 'theirs', text: 'Old line' }]);
  });

  it('finds nothing to mark when both sides agree', () => {
    expect(lineDiff('a\nb', 'a\nb').every((line) => line.kind === 'same')).toBe(true);
  });
});
