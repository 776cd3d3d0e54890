import { relativeLuminance } from '../colour/colour.js';

/**
 * Keeps the drawn temperature field under WCAG 2.2 success criterion 2.3.1 (no more than three
 * flashes in any second). A flash is a pair of opposing changes in relative luminance of 10 % or
 * more; if every change that large takes at least 1/6 s, a pair takes at least 1/3 s, so no region
 * can flash more than three times a second. The guard therefore limits how fast each drawn cell's
 * relative luminance may change, to 0.1 per 1/6 s, by moving it along the ramp only as far as that
 * allows. The solver's own field is untouched; only the picture follows it at that pace. Our ramps
 * rise in lightness throughout (colour-ramps.test.ts), so luminance picks one ramp position.
 */
export const FLASH_LUMINANCE_STEP = 0.1;
export const SHORTEST_TRANSITION_S = 1 / 6;
const LUMINANCE_PER_SECOND = FLASH_LUMINANCE_STEP / SHORTEST_TRANSITION_S;

export class FlashGuard {
  /** Ramp position of each drawn cell, in table entries (0 … size − 1, fractional). */
  shown: Float32Array = new Float32Array(0);
  private readonly luminance: Float64Array;

  /** `table` is a ramp lookup table of RGB triples. */
  constructor(table: Uint8ClampedArray) {
    this.luminance = new Float64Array(table.length / 3);
    for (let i = 0; i < this.luminance.length; i += 1) {
      this.luminance[i] = relativeLuminance([table[i * 3]!, table[i * 3 + 1]!, table[i * 3 + 2]!]);
    }
  }

  /** Shows `target` as it is, unpaced (a frame asked for on demand). */
  jumpTo(target: Float32Array): Float32Array {
    this.shown = Float32Array.from(target);
    return this.shown;
  }

  /** Moves the drawn field towards `target` by what `seconds` of wall time allow; a new grid size starts from the target. */
  follow(target: Float32Array, seconds: number): Float32Array {
    if (this.shown.length !== target.length) return this.jumpTo(target);
    const limit = LUMINANCE_PER_SECOND * Math.max(0, seconds);
    const shown = this.shown;
    for (let k = 0; k < target.length; k += 1) {
      const from = this.luminanceAt(shown[k]!);
      const to = this.luminanceAt(target[k]!);
      if (Math.abs(to - from) <= limit) shown[k] = target[k]!;
      else shown[k] = this.positionOf(to > from ? from + limit : from - limit);
    }
    return shown;
  }

  private luminanceAt(position: number): number {
    const last = this.luminance.length - 1;
    const p = Math.min(Math.max(position, 0), last);
    const lower = Math.min(Math.floor(p), last - 1);
    return this.luminance[lower]! + (this.luminance[lower + 1]! - this.luminance[lower]!) * (p - lower);
  }

  /** The ramp position with this luminance (binary search on the rising table). */
  private positionOf(luminance: number): number {
    const table = this.luminance;
    let low = 0;
    let high = table.length - 1;
    if (luminance <= table[low]!) return low;
    if (luminance >= table[high]!) return high;
    while (high - low > 1) {
      const middle = (low + high) >> 1;
      if (table[middle]! <= luminance) low = middle;
      else high = middle;
    }
    const span = table[high]! - table[low]!;
    return span > 0 ? low + (luminance - table[low]!) / span : low;
  }
}
