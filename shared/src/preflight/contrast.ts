import { relativeLuminance, type Rgb } from '../widgets/convection-cell/colour-ramps.js';

/** Contrast minimums of WCAG 2.2 success criterion 1.4.3 (AA): large text is 18 pt, or 14 pt bold, and up. */
export const WCAG_AA_CONTRAST = { normalText: 4.5, largeText: 3 } as const;

/** Red, green and blue, 0–255, from "#rrggbb" or "#rgb". */
export function parseHexColour(colour: string): Rgb {
  const match = /^#([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(colour.trim());
  if (!match) throw new RangeError(`"${colour}" is not a colour written as #rrggbb or #rgb.`);
  const hex = match[1]!.length === 3 ? [...match[1]!].map((digit) => digit + digit).join('') : match[1]!;
  return [0, 2, 4].map((start) => Number.parseInt(hex.slice(start, start + 2), 16)) as Rgb;
}

/**
 * WCAG 2.2's contrast ratio (L1 + 0.05) / (L2 + 0.05), the lighter colour's relative luminance
 * over the darker's: from 1 to 21. The luminance is the colour ramps' own, the same sRGB Y.
 */
export function contrastRatio(foreground: string, background: string): number {
  const [lighter, darker] = [foreground, background].map((colour) => relativeLuminance(parseHexColour(colour))).sort((a, b) => b - a) as [number, number];
  return (lighter + 0.05) / (darker + 0.05);
}
