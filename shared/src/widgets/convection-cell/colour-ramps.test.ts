import { describe, expect, it } from 'vitest';
import { lightness, parseHexColour } from '../../colour/colour.js';
import { COLOUR_RAMP_NAMES, COLOUR_RAMPS, rampLookupTable } from './colour-ramps.js';

describe('colour ramps', () => {
  it('computes CIE L* of black, white and sRGB mid grey #777777 (L* ≈ 50, from the CIE 1976 formula)', () => {
    expect(lightness([0, 0, 0])).toBe(0);
    expect(lightness([255, 255, 255])).toBeCloseTo(100, 6);
    expect(lightness(parseHexColour('#777777'))).toBeCloseTo(50.03, 1);
  });

  for (const name of COLOUR_RAMP_NAMES) {
    it(`${name}: every stop is lighter than the one before, by at least 8 L* units`, () => {
      const values = COLOUR_RAMPS[name].map((hex) => lightness(parseHexColour(hex)));
      for (let i = 1; i < values.length; i += 1) expect(values[i]! - values[i - 1]!).toBeGreaterThanOrEqual(8);
    });

    it(`${name}: the drawn lookup table never falls in lightness, spanning at least 85 L* units`, () => {
      const table = rampLookupTable(name);
      let previous = -1;
      for (let i = 0; i < table.length; i += 3) {
        const value = lightness([table[i]!, table[i + 1]!, table[i + 2]!]);
        expect(value).toBeGreaterThanOrEqual(previous);
        previous = value;
      }
      expect(lightness([table[table.length - 3]!, table[table.length - 2]!, table[table.length - 1]!]) - lightness([table[0]!, table[1]!, table[2]!])).toBeGreaterThanOrEqual(85);
    });
  }
});
