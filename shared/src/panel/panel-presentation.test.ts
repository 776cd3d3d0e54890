import { describe, expect, it } from 'vitest';
import { layoutOfScreen } from './panel-presentation.js';

describe('layoutOfScreen', () => {
  // CSS Media Queries Level 4, the `orientation` feature: portrait when the height is greater than the width, landscape when the width is.
  it.each([
    [1920, 1080, 'landscape'],
    [1080, 1920, 'portrait'],
    [3840, 2160, 'landscape'],
    [1280, 1024, 'landscape'],
    [768, 1366, 'portrait'],
  ] as const)('lays a %i × %i screen out as %s', (width, height, layout) => {
    expect(layoutOfScreen({ width, height })).toBe(layout);
  });
});
