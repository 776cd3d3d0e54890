import { PANEL_COLOURS } from '../panel/panel-colours.js';
import { contrastRatio, WCAG_AA_CONTRAST } from '../colour/colour.js';
import type { PreflightRule } from './types.js';

/** A panel colour scheme: its surface and the colour of each kind of text drawn on it. */
export interface PanelColourScheme {
  surface: string;
  text: string;
  heading: string;
  link: string;
  liveValue: string;
}

const TEXT_KINDS = { text: 'body text', heading: 'headings', link: 'links', liveValue: 'live values' } as const;
const SCHEME_NAMES: Readonly<Record<string, string>> = { standard: 'standard', highContrast: 'high-contrast' };

const ratioText = (ratio: number) => `${(Math.floor(ratio * 100) / 100).toFixed(2)}:1`;

/**
 * The panel schema has no text-colour mark (bold, italic and links only), so a curator cannot set
 * a custom colour; what a visitor sees is the kiosk's own palette, checked here for every story so
 * a palette change that fails WCAG 2.2 AA cannot slip through. Every kind of text is held to the
 * normal-text 4.5:1, not the 3:1 for large text: kiosk type is large at full size, but the panel
 * is scaled down to fit smaller station screens and the studio preview.
 */
export function textContrastRule(schemes: Readonly<Record<string, PanelColourScheme>>): PreflightRule {
  return {
    id: 'text-contrast',
    severity: 'warning',
    run: () => {
      const pairs = Object.entries(schemes).flatMap(([scheme, colours]) =>
        Object.entries(TEXT_KINDS).map(([kind, label]) => {
          const foreground = colours[kind as keyof typeof TEXT_KINDS];
          return { scheme: SCHEME_NAMES[scheme] ?? scheme, label, foreground, surface: colours.surface, ratio: contrastRatio(foreground, colours.surface) };
        }),
      );
      const failing = pairs.filter((pair) => pair.ratio < WCAG_AA_CONTRAST.normalText);
      if (failing.length > 0) {
        return failing.map((pair) => ({
          passed: false,
          message: `In the kiosk's ${pair.scheme} colours, ${pair.label} (${pair.foreground}) on the panel surface (${pair.surface}) have a contrast of ${ratioText(pair.ratio)}, below the ${WCAG_AA_CONTRAST.normalText}:1 that WCAG 2.2 AA asks for text. The panel palette needs a darker or lighter colour; tell the Mantlepiece developers.`,
        }));
      }
      const lowest = pairs.reduce((low, pair) => (pair.ratio < low.ratio ? pair : low));
      return [
        {
          passed: true,
          message: `Panels use the kiosk's own text colours (custom colours cannot be set), and all meet WCAG 2.2 AA's ${WCAG_AA_CONTRAST.normalText}:1; the lowest is ${lowest.label} in the ${lowest.scheme} colours at ${ratioText(lowest.ratio)}.`,
        },
      ];
    },
  };
}

export const textContrast: PreflightRule = textContrastRule(PANEL_COLOURS);
