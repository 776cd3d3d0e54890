import { describe, expect, it } from 'vitest';
import { relativeLuminance } from '../colour/colour.js';
import { COLOUR_RAMP_NAMES, rampLookupTable } from '../widgets/convection-cell/colour-ramps.js';
import { FlashGuard } from './flash-guard.js';

/** Counts flashes as WCAG 2.2 defines them: pairs of opposing luminance changes of at least 0.1. */
function countFlashes(luminances: number[]): number {
  let transitions = 0;
  let extreme = luminances[0]!;
  let direction = 0;
  for (const value of luminances) {
    const change = value - extreme;
    if (direction >= 0 && value > extreme) extreme = value;
    if (direction <= 0 && value < extreme) extreme = value;
    if (Math.abs(change) >= 0.1 && Math.sign(change) !== direction) {
      transitions += 1;
      direction = Math.sign(change);
      extreme = value;
    }
  }
  return Math.floor(transitions / 2);
}

describe('flash guard (WCAG 2.2, 2.3.1: no more than three flashes a second)', () => {
  for (const name of COLOUR_RAMP_NAMES) {
    it(`${name}: a cell whose temperature jumps cold↔hot every frame for a second flashes at most three times`, () => {
      const table = rampLookupTable(name);
      const guard = new FlashGuard(table);
      const cold = new Float32Array([0]);
      const hot = new Float32Array([255]);
      guard.follow(cold, 0);
      const luminances: number[] = [];
      for (let frame = 0; frame < 60; frame += 1) {
        const [position] = guard.follow(frame % 2 === 0 ? hot : cold, 1 / 60);
        // The drawn pixel: the table entry nearest the guarded position.
        const index = Math.round(position!) * 3;
        luminances.push(relativeLuminance([table[index]!, table[index + 1]!, table[index + 2]!]));
      }
      expect(countFlashes(luminances)).toBeLessThanOrEqual(3);
    });
  }

  it('still follows a slow change exactly', () => {
    const guard = new FlashGuard(rampLookupTable('mantle-heat'));
    guard.follow(new Float32Array([100]), 0);
    expect(guard.follow(new Float32Array([101]), 1 / 60)[0]).toBe(101);
  });

  it('moves a dark cell most of the way to hot within a second, as dark colours differ little in luminance', () => {
    const table = rampLookupTable('mantle-heat');
    const guard = new FlashGuard(table);
    guard.follow(new Float32Array([0]), 0);
    let position = 0;
    for (let frame = 0; frame < 60; frame += 1) position = guard.follow(new Float32Array([200]), 1 / 60)[0]!;
    expect(position).toBe(200);
  });

  it('counts flashes the way the test assumes: 20 half-cycles of full swings in a second are 19 transitions, 9 whole flashes', () => {
    const wave = Array.from({ length: 60 }, (_, frame) => (Math.floor(frame / 3) % 2 === 0 ? 0.05 : 0.9));
    expect(countFlashes(wave)).toBe(9);
  });
});
