import { UPPER_MANTLE_BASE_KM } from '../widgets/plate-forces/index.js';
import { textBox, type DrawnLabel } from './drawing-text.js';

/**
 * Where the plate-forces drawing puts its words, for one language and text size: a pure function,
 * so a test can check every language at both text sizes for labels that leave the frame or meet.
 * The slab's own geometry follows its dip and length; these words stay put whatever the visitor sets.
 */

export const PLATE_VIEW = { width: 480, height: 330 } as const;
export const SEA_LEVEL = 40;
export const PLATE = { top: 62, thickness: 18 } as const;
export const RIDGE_X = 30;
export const TRENCH = { x: 250, y: PLATE.top } as const;
/** Drawing units per km of slab, so the longest slab at the gentlest dip still fits to the right of the trench. */
export const UNITS_PER_KM = 0.078;
export const DISCONTINUITY_Y = PLATE.top + UPPER_MANTLE_BASE_KM * UNITS_PER_KM;
/** Ridge push's arrow, under the plate between ridge and trench. */
export const RIDGE_PUSH_ARROW = { from: { x: RIDGE_X + 40, y: PLATE.top + 34 }, to: { x: RIDGE_X + 130, y: PLATE.top + 34 } } as const;
/** Sizes at the kiosk's standard text; Larger text scales them all. */
export const PLATE_FONT = { place: 14, depth: 13, force: 13 } as const;

export type PlateLabel = DrawnLabel;

export interface PlateLabelTexts {
  ridge: string;
  trench: string;
  /** "660 km", as the locale writes it. */
  discontinuity: string;
  ridgePush: string;
  slabPull: string;
}

export interface PlateLabels {
  ridge: PlateLabel;
  trench: PlateLabel;
  discontinuity: PlateLabel;
  ridgePush: PlateLabel;
  slabPull: PlateLabel;
}

const label = (text: string, fontSize: number, anchor: PlateLabel['anchor'], x: number, y: number): PlateLabel => ({ text, x, y, anchor, fontSize, box: textBox(text, fontSize, anchor, x, y) });

export function layoutPlateLabels(texts: PlateLabelTexts, textScale = 1): PlateLabels {
  const font = { place: PLATE_FONT.place * textScale, depth: PLATE_FONT.depth * textScale, force: PLATE_FONT.force * textScale };
  const placeMiddle = SEA_LEVEL - 4 - font.place * 0.7;
  const pushMiddle = RIDGE_PUSH_ARROW.from.y - 8 - font.force * 0.7;
  return {
    ridge: label(texts.ridge, font.place, 'start', RIDGE_X, placeMiddle),
    trench: label(texts.trench, font.place, 'middle', TRENCH.x, placeMiddle),
    discontinuity: label(texts.discontinuity, font.depth, 'end', PLATE_VIEW.width - 6, DISCONTINUITY_Y - 3 - font.depth * 0.7),
    ridgePush: label(texts.ridgePush, font.force, 'middle', (RIDGE_PUSH_ARROW.from.x + RIDGE_PUSH_ARROW.to.x) / 2, pushMiddle),
    // Slab pull is named under the plate, ending just before the trench: a name centred on its arrow
    // ran into ridge push's in longer languages (French), wherever the slab's dip put it.
    slabPull: label(texts.slabPull, font.force, 'end', TRENCH.x - 12, RIDGE_PUSH_ARROW.from.y + 8 + font.force * 0.7),
  };
}
