/**
 * sRGB colour maths that studio, kiosk, preflight and the colour ramps share: one parser, one
 * relative luminance, one contrast ratio.
 */

/** Red, green and blue, 0–255. */
export type Rgb = [number, number, number];

/** Contrast minimums of WCAG 2.2 success criterion 1.4.3 (AA): large text is 18 pt, or 14 pt bold, and up. */
export const WCAG_AA_CONTRAST = { normalText: 4.5, largeText: 3 } as const;

/** Red, green and blue from "#rrggbb" or "#rgb". */
export function parseHexColour(colour: string): Rgb {
  const match = /^#([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(colour.trim());
  if (!match) throw new RangeError(`"${colour}" is not a colour written as #rrggbb or #rgb.`);
  const hex = match[1]!.length === 3 ? [...match[1]!].map((digit) => digit + digit).join('') : match[1]!;
  return [0, 2, 4].map((start) => Number.parseInt(hex.slice(start, start + 2), 16)) as Rgb;
}

/** Relative luminance of an sRGB colour (the sRGB transfer curve, IEC 61966-2-1; the same Y as WCAG 2.2 uses). */
export function relativeLuminance([r, g, b]: Rgb): number {
  const linear = (channel: number) => {
    const c = channel / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * linear(r) + 0.7152 * linear(g) + 0.0722 * linear(b);
}

/** CIE 1976 L* (D65) of an sRGB colour, from its relative luminance. */
export function lightness(rgb: Rgb): number {
  const y = relativeLuminance(rgb);
  return y > 216 / 24389 ? 116 * Math.cbrt(y) - 16 : (24389 / 27) * y;
}

/**
 * WCAG 2.2's contrast ratio (L1 + 0.05) / (L2 + 0.05), the lighter colour's relative luminance
 * over the darker's: from 1 to 21.
 */
export function contrastRatio(foreground: string, background: string): number {
  const [lighter, darker] = [foreground, background].map((colour) => relativeLuminance(parseHexColour(colour))).sort((a, b) => b - a) as [number, number];
  return (lighter + 0.05) / (darker + 0.05);
}
