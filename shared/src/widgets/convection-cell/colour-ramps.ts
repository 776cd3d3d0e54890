import { parseHexColour } from '../../colour/colour.js';

/**
 * Our own sequential colour ramps for temperature fields, cold to hot. Each rises steadily in CIE
 * lightness (L*) from stop to stop, so the order of temperatures reads from lightness alone, which
 * holds for every kind of colour vision deficiency and in greyscale print (colour-ramps.test.ts
 * checks it). Hue only adds a second cue.
 */
export const COLOUR_RAMPS = {
  /** Basalt blue-black through plum and magma orange to pale sediment sand. */
  'mantle-heat': ['#0b1a2c', '#2a2a5a', '#5f2e6e', '#9c3656', '#d0522c', '#eb8a2c', '#f5c163', '#fdf0c8'],
  /** Deep-sea navy through sea-floor blue and teal to pale foam. */
  'deep-sea': ['#071726', '#0e2f4f', '#134c74', '#1b6b8f', '#2f8ba3', '#5eaab3', '#9dccc6', '#e4f3ea'],
  /** Basalt greys, for screens or prints without colour. */
  'basalt-greys': ['#121212', '#2e2e2e', '#4b4b4b', '#6b6b6b', '#8d8d8d', '#b1b1b1', '#d5d5d5', '#f6f6f6'],
} as const;

export type ColourRampName = keyof typeof COLOUR_RAMPS;
export const COLOUR_RAMP_NAMES = Object.keys(COLOUR_RAMPS) as [ColourRampName, ...ColourRampName[]];

/**
 * A lookup table (RGB triples) for drawing, interpolated between stops in encoded sRGB; the test
 * checks that every entry of the table, not only the stops, rises in lightness.
 */
export function rampLookupTable(name: ColourRampName, size = 256): Uint8ClampedArray {
  const stops = COLOUR_RAMPS[name].map(parseHexColour);
  const table = new Uint8ClampedArray(size * 3);
  for (let i = 0; i < size; i += 1) {
    const position = (i / (size - 1)) * (stops.length - 1);
    const lower = Math.min(Math.floor(position), stops.length - 2);
    const fraction = position - lower;
    const from = stops[lower]!;
    const to = stops[lower + 1]!;
    for (let channel = 0; channel < 3; channel += 1) {
      table[i * 3 + channel] = Math.round(from[channel]! + (to[channel]! - from[channel]!) * fraction);
    }
  }
  return table;
}
