import { describe, expect, it } from 'vitest';
import { contrastRatio, parseHexColour, relativeLuminance } from '@mantlepiece/shared';
import { header, magma, mantlepieceTheme as theme, sediment } from './theme';

// WCAG 2.2 §1.4.3 Contrast (Minimum): text needs at least 4.5:1 against its background.
const WCAG_TEXT_MINIMUM = 4.5;

describe('contrast ratio (WCAG 2.2 definition)', () => {
  it('gives 21:1 for black on white and 1:1 for a colour on itself', () => {
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 5);
    expect(contrastRatio('#1a659b', '#1a659b')).toBeCloseTo(1, 5);
  });

  it('matches the luminance of mid grey #777777 from the sRGB formula (about 0.184)', () => {
    expect(relativeLuminance(parseHexColour('#777777'))).toBeCloseTo(0.1845, 3);
  });
});

describe('the brand theme keeps text readable (WCAG 2.2 §1.4.3, 4.5:1)', () => {
  const pairs: [string, string, string][] = [
    ['body text on surfaces', theme.colorNeutralForeground1, theme.colorNeutralBackground1],
    ['body text on the sand canvas', theme.colorNeutralForeground1, sediment.canvas],
    ['secondary text on surfaces', theme.colorNeutralForeground2, theme.colorNeutralBackground1],
    ['tertiary text on surfaces', theme.colorNeutralForeground3, theme.colorNeutralBackground1],
    ['tertiary text on the sand canvas', theme.colorNeutralForeground3, sediment.canvas],
    ['links on the sand canvas', theme.colorBrandForegroundLink, sediment.canvas],
    ['brand text on surfaces', theme.colorBrandForeground1, theme.colorNeutralBackground1],
    ['text on primary buttons', theme.colorNeutralForegroundOnBrand, theme.colorBrandBackground],
    ['text on hovered primary buttons', theme.colorNeutralForegroundOnBrand, theme.colorBrandBackgroundHover],
    ['header text on the header band', header.foreground, header.background],
    ['header highlight on the header band', header.highlight, header.background],
    ['text on magma calls to action', magma.foregroundOnMagma, magma.background],
    ['magma text on the sand canvas', magma.foreground, sediment.canvas],
  ];

  it.each(pairs)('%s', (_name, foreground, background) => {
    const ratio = contrastRatio(foreground, background);
    expect(ratio, `${foreground} on ${background} is ${ratio.toFixed(2)}:1`).toBeGreaterThanOrEqual(WCAG_TEXT_MINIMUM);
  });
});
