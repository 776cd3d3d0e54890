/** The two station screens a panel is written for, in CSS pixels. */
export const PANEL_LAYOUTS = {
  landscape: { width: 1920, height: 1080 },
  portrait: { width: 1080, height: 1920 },
} as const;

export type PanelLayout = keyof typeof PANEL_LAYOUTS;

/** The layout the kiosk gives a screen of this size: portrait when it is taller than wide, else landscape. */
export const layoutOfScreen = ({ width, height }: { width: number; height: number }): PanelLayout => (height > width ? 'portrait' : 'landscape');

export type TextDirection = 'ltr' | 'rtl';

/** Languages written right to left (primary subtags, BCP 47) that a venue may plausibly offer. */
const RIGHT_TO_LEFT = new Set(['ar', 'he', 'fa', 'ur', 'ps', 'sd', 'ug', 'yi', 'dv', 'ckb']);

/** Direction from a locale tag, honouring an explicit script subtag such as "ks-Arab" or "az-Latn". */
export function directionOf(locale: string): TextDirection {
  const [language = '', ...rest] = locale.toLowerCase().split(/[-_]/);
  const script = rest.find((part) => part.length === 4);
  if (script) return ['arab', 'hebr', 'thaa', 'syrc', 'nkoo', 'adlm', 'rohg'].includes(script) ? 'rtl' : 'ltr';
  return RIGHT_TO_LEFT.has(language) ? 'rtl' : 'ltr';
}
