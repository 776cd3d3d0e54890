import { describe, expect, it } from 'vitest';
import { contrastRatio, parseHexColour, WCAG_AA_CONTRAST } from './colour.js';

// Relative luminance and contrast ratio as WCAG 2.2 defines them (Understanding SC 1.4.3; glossary "relative luminance").
describe('WCAG 2.2 contrast', () => {
  it('gives black on white 21:1, the largest ratio there is, and any colour on itself 1:1', () => {
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 10);
    expect(contrastRatio('#0b3f5c', '#0b3f5c')).toBe(1);
  });

  it('gives #767676 on white about 4.54:1, the lightest grey that passes AA for text, and #777777 about 4.48:1, which fails', () => {
    expect(contrastRatio('#767676', '#ffffff')).toBeCloseTo(4.54, 2);
    expect(contrastRatio('#767676', '#ffffff')).toBeGreaterThanOrEqual(WCAG_AA_CONTRAST.normalText);
    expect(contrastRatio('#777777', '#ffffff')).toBeCloseTo(4.48, 2);
    expect(contrastRatio('#777777', '#ffffff')).toBeLessThan(WCAG_AA_CONTRAST.normalText);
  });

  it('does not depend on which colour is the text', () => {
    expect(contrastRatio('#ffffff', '#767676')).toBe(contrastRatio('#767676', '#ffffff'));
  });

  it('gives mid grey #808080 on black (128/255 linearised by the sRGB curve: luminance 0.2159) a ratio of 5.32:1', () => {
    expect(contrastRatio('#808080', '#000')).toBeCloseTo((0.21586 + 0.05) / 0.05, 3);
  });

  it('reads #rgb and #rrggbb, and refuses anything else', () => {
    expect(parseHexColour('#fA0')).toEqual([255, 170, 0]);
    expect(parseHexColour('#0b3f5c')).toEqual([11, 63, 92]);
    for (const bad of ['0b3f5c', '#0b3f5', 'red', 'rgb(0,0,0)']) expect(() => parseHexColour(bad)).toThrow(RangeError);
  });
});
