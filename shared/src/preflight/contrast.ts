/** Contrast minimums of WCAG 2.2 success criterion 1.4.3 (AA): large text is 18 pt, or 14 pt bold, and up. */
export const WCAG_AA_CONTRAST = { normalText: 4.5, largeText: 3 } as const;

/** Red, green and blue, 0–255, from "#rrggbb" or "#rgb". */
export function parseHexColour(colour: string): [number, number, number] {
  const match = /^#([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(colour.trim());
  if (!match) throw new RangeError(`"${colour}" is not a colour written as #rrggbb or #rgb.`);
  const hex = match[1]!.length === 3 ? [...match[1]!].map((digit) => digit + digit).join('') : match[1]!;
  return [0, 2, 4].map((start) => Number.parseInt(hex.slice(start, start + 2), 16)) as [number, number, number];
}

/** WCAG 2.2's relative luminance of an sRGB colour (the definition's 0.04045 threshold, as in IEC 61966-2-1). */
export function relativeLuminance(colour: string): number {
  const [red, green, blue] = parseHexColour(colour).map((channel) => {
    const c = channel / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * red + 0.7152 * green + 0.0722 * blue;
}

/** (L1 + 0.05) / (L2 + 0.05), the lighter colour's luminance over the darker's: from 1 to 21. */
export function contrastRatio(foreground: string, background: string): number {
  const [lighter, darker] = [relativeLuminance(foreground), relativeLuminance(background)].sort((a, b) => b - a) as [number, number];
  return (lighter + 0.05) / (darker + 0.05);
}
