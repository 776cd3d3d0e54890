import { textBox, textWidth, type DrawnLabel } from './drawing-text.js';

/**
 * Where the sea-floor depth drawing puts its axis and its words, for one age, language and text
 * size: a pure function, so a test can sweep them all and check that every label stays inside the
 * frame and apart from the others.
 */

export const SEA_FLOOR_VIEW = { width: 480, height: 330 } as const;
/** Upper band: the sea, from sea level down to 8 km (the half-space floor reaches 7.5 km at 200 Myr). */
export const SEA = { top: 34, bottom: 180, deepestM: 8000 } as const;
/** Lower band: the cooled lithosphere under the floor, down to 150 km (a different scale, said on the drawing). */
export const LITHOSPHERE = { top: 206, bottom: 316, deepestKm: 150 } as const;
/** Where age 0 is drawn at the standard text size; larger depth labels push it right. */
const AXIS_LEFT = 56;
const AXIS_RIGHT = 464;
export const DEPTH_TICKS_M = [2000, 4000, 6000] as const;
/** The lithosphere's scale: 150 km, its foot, is left unnamed, as the age label takes that corner. */
export const THICKNESS_TICKS_KM = [50, 100] as const;
/** Sizes at the kiosk's standard text; Larger text scales them all. */
export const SEA_FLOOR_FONT = { name: 14, tick: 13, age: 13 } as const;
/** Space between a tick's words and the axis. */
const TICK_GAP = 6;
/** Air between a label and the frame. */
const MARGIN = 1;

export type SeaFloorLabel = DrawnLabel;

export interface SeaFloorLabelTexts {
  ridge: string;
  seaLevel: string;
  thickness: string;
  /** The depths of DEPTH_TICKS_M and the thicknesses of THICKNESS_TICKS_KM, as the locale writes them. */
  depthTicks: readonly string[];
  thicknessTicks: readonly string[];
  age: string;
}

export interface SeaFloorLayout {
  axis: { left: number; right: number };
  ridge: SeaFloorLabel;
  seaLevel: SeaFloorLabel;
  thickness: SeaFloorLabel;
  depthTicks: SeaFloorLabel[];
  thicknessTicks: SeaFloorLabel[];
  age: SeaFloorLabel;
}

export const seaY = (depthM: number): number => SEA.top + (depthM / SEA.deepestM) * (SEA.bottom - SEA.top);
export const lithosphereY = (km: number): number => LITHOSPHERE.top + (Math.min(km, LITHOSPHERE.deepestKm) / LITHOSPHERE.deepestKm) * (LITHOSPHERE.bottom - LITHOSPHERE.top);

const label = (text: string, fontSize: number, anchor: SeaFloorLabel['anchor'], x: number, y: number): SeaFloorLabel => ({ text, x, y, anchor, fontSize, box: textBox(text, fontSize, anchor, x, y) });

export function layoutSeaFloor({ texts, ageMyr, maxAgeMyr, textScale = 1 }: { texts: SeaFloorLabelTexts; ageMyr: number; maxAgeMyr: number; textScale?: number }): SeaFloorLayout {
  const font = { name: SEA_FLOOR_FONT.name * textScale, tick: SEA_FLOOR_FONT.tick * textScale, age: SEA_FLOOR_FONT.age * textScale };
  const widestTick = Math.max(...[...texts.depthTicks, ...texts.thicknessTicks].map((text) => textWidth(text, font.tick)));
  // The depth scale's words sit left of the axis: the axis moves right as they grow.
  const left = Math.max(AXIS_LEFT, Math.ceil(MARGIN + widestTick + TICK_GAP));
  const axis = { left, right: AXIS_RIGHT };
  const xOf = (age: number) => left + (age / maxAgeMyr) * (AXIS_RIGHT - left);
  const nameMiddle = SEA.top - 4 - font.name * 0.7;
  const ageWidth = textWidth(texts.age, font.age);
  const ageX = Math.min(Math.max(xOf(ageMyr), MARGIN + ageWidth / 2), SEA_FLOOR_VIEW.width - MARGIN - ageWidth / 2);
  return {
    axis,
    ridge: label(texts.ridge, font.name, 'start', left, nameMiddle),
    seaLevel: label(texts.seaLevel, font.name, 'end', AXIS_RIGHT, nameMiddle),
    thickness: label(texts.thickness, font.name, 'start', left + 4, LITHOSPHERE.top + 4 + font.name * 0.7),
    depthTicks: DEPTH_TICKS_M.map((depthM, index) => label(texts.depthTicks[index] ?? '', font.tick, 'end', left - TICK_GAP, seaY(depthM))),
    thicknessTicks: THICKNESS_TICKS_KM.map((km, index) => label(texts.thicknessTicks[index] ?? '', font.tick, 'end', left - TICK_GAP, lithosphereY(km))),
    age: label(texts.age, font.age, 'middle', ageX, SEA_FLOOR_VIEW.height - MARGIN - font.age * 0.7),
  };
}

/** Every label of a layout, for drawing and for the sweep test. */
export const seaFloorLabels = (layout: SeaFloorLayout): SeaFloorLabel[] => [layout.ridge, layout.seaLevel, layout.thickness, ...layout.depthTicks, ...layout.thicknessTicks, layout.age];
