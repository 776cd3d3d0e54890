import { describe, expect, it } from 'vitest';
import { movedTo } from './panel-order';

describe('moving a panel in the strip', () => {
  it('moves a panel one place later or earlier', () => {
    expect(movedTo([1, 2, 3], 1, 1)).toEqual([2, 1, 3]);
    expect(movedTo([1, 2, 3], 3, 1)).toEqual([1, 3, 2]);
  });

  it('stops at the ends of the story', () => {
    expect(movedTo([1, 2, 3], 1, -1)).toEqual([1, 2, 3]);
    expect(movedTo([1, 2, 3], 3, 7)).toEqual([1, 2, 3]);
  });

  it('drops a dragged panel where another one was', () => {
    expect(movedTo([1, 2, 3, 4], 4, 0)).toEqual([4, 1, 2, 3]);
  });
});
