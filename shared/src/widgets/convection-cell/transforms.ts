import FFT from 'fft.js';

/**
 * Fast cosine and sine transforms for the convection cell, built on one complex FFT of the line
 * length (fft.js). Every method transforms two real lines at once: one carried in the real part
 * of the complex FFT, the other in the imaginary part, so a pair costs one complex FFT.
 *
 * Conventions (N = line length, a power of two):
 * - cell-centre points x_i = (i + ½)/N, i = 0 … N−1;
 * - cosine series  f_i = Σ_{m=0}^{N−1} c_m cos(π m (2i+1) / 2N), c_m stored at index m;
 * - sine series    f_i = Σ_{n=1}^{N}   s_n sin(π n (2i+1) / 2N), s_n stored at index n−1;
 * - node sine series on the interior nodes j = 1 … N−1:
 *                  g_j = Σ_{m=1}^{N−1} b_m sin(π m j / N), b_m and g_j stored at index m−1, j−1.
 * "Analysis" turns point values into series coefficients, "synthesis" sums the series.
 */
export class LineTransform {
  readonly size: number;
  private readonly fft: FFT;
  private readonly input: Float64Array;
  private readonly output: Float64Array;
  /** cos and sin of π m / 2N: the quarter-sample shift between cell-centre and FFT points. */
  private readonly shiftCos: Float64Array;
  private readonly shiftSin: Float64Array;
  /** sin(π j / N), for the node sine series. */
  private readonly nodeSin: Float64Array;

  constructor(size: number) {
    if (!Number.isInteger(size) || size < 4 || (size & (size - 1)) !== 0) {
      throw new RangeError(`Transform length must be a power of two of at least 4, got ${size}.`);
    }
    this.size = size;
    this.fft = new FFT(size);
    this.input = new Float64Array(2 * size);
    this.output = new Float64Array(2 * size);
    this.shiftCos = new Float64Array(size);
    this.shiftSin = new Float64Array(size);
    this.nodeSin = new Float64Array(size);
    for (let m = 0; m < size; m++) {
      this.shiftCos[m] = Math.cos((Math.PI * m) / (2 * size));
      this.shiftSin[m] = Math.sin((Math.PI * m) / (2 * size));
      this.nodeSin[m] = Math.sin((Math.PI * m) / size);
    }
  }

  /** Point values → cosine coefficients, in place (Makhoul's even-odd reordering). */
  cosineAnalysis(p: Float64Array, q: Float64Array): void {
    const n = this.size;
    const half = n >> 1;
    const zin = this.input;
    const zout = this.output;
    for (let k = 0; k < half; k++) {
      zin[2 * k] = p[2 * k];
      zin[2 * k + 1] = q[2 * k];
      zin[2 * (n - 1 - k)] = p[2 * k + 1];
      zin[2 * (n - 1 - k) + 1] = q[2 * k + 1];
    }
    this.fft.transform(zout, zin);
    const scale0 = 1 / n;
    const scale = 2 / n;
    for (let m = 0; m < n; m++) {
      const ar = zout[2 * m];
      const ai = zout[2 * m + 1];
      const mirror = m === 0 ? 0 : n - m;
      const br = zout[2 * mirror];
      const bi = zout[2 * mirror + 1];
      // Split the paired spectrum into the two real lines' spectra V_p and V_q.
      const vpr = 0.5 * (ar + br);
      const vpi = 0.5 * (ai - bi);
      const vqr = 0.5 * (ai + bi);
      const vqi = 0.5 * (br - ar);
      const c = this.shiftCos[m];
      const s = this.shiftSin[m];
      const w = m === 0 ? scale0 : scale;
      p[m] = w * (c * vpr + s * vpi);
      q[m] = w * (c * vqr + s * vqi);
    }
  }

  /** Cosine coefficients → point values, in place. */
  cosineSynthesis(p: Float64Array, q: Float64Array): void {
    const n = this.size;
    const half = n >> 1;
    const zin = this.input;
    const zout = this.output;
    for (let m = 0; m < n; m++) {
      // Coefficients back to the unnormalised DCT-II values X_m (X_0 = N c_0, X_m = N c_m / 2).
      const w = m === 0 ? n : 0.5 * n;
      const xp = w * p[m];
      const xq = w * q[m];
      const xpMirror = m === 0 ? 0 : 0.5 * n * p[n - m];
      const xqMirror = m === 0 ? 0 : 0.5 * n * q[n - m];
      const c = this.shiftCos[m];
      const s = this.shiftSin[m];
      const vpr = c * xp + s * xpMirror;
      const vpi = s * xp - c * xpMirror;
      const vqr = c * xq + s * xqMirror;
      const vqi = s * xq - c * xqMirror;
      zin[2 * m] = vpr - vqi;
      zin[2 * m + 1] = vpi + vqr;
    }
    this.fft.inverseTransform(zout, zin);
    for (let k = 0; k < half; k++) {
      p[2 * k] = zout[2 * k];
      q[2 * k] = zout[2 * k + 1];
      p[2 * k + 1] = zout[2 * (n - 1 - k)];
      q[2 * k + 1] = zout[2 * (n - 1 - k) + 1];
    }
  }

  /**
   * Point values → sine coefficients, in place. sin(π n (2i+1)/2N) = (−1)^i cos(π (N−n)(2i+1)/2N),
   * so the sine series is the cosine series of the alternating line, read backwards.
   */
  sineAnalysis(p: Float64Array, q: Float64Array): void {
    alternateSigns(p, this.size);
    alternateSigns(q, this.size);
    this.cosineAnalysis(p, q);
    reverse(p, this.size);
    reverse(q, this.size);
  }

  /** Sine coefficients → point values, in place. */
  sineSynthesis(p: Float64Array, q: Float64Array): void {
    reverse(p, this.size);
    reverse(q, this.size);
    this.cosineSynthesis(p, q);
    alternateSigns(p, this.size);
    alternateSigns(q, this.size);
  }

  /**
   * Node sine coefficients → values on the interior nodes (a DST-I), in place on the first N−1
   * entries. Uses the symmetric/antisymmetric split of Press et al. (Numerical Recipes, "sinft"),
   * which needs one length-N FFT instead of the length-2N odd extension.
   */
  nodeSineSynthesis(p: Float64Array, q: Float64Array): void {
    const n = this.size;
    const half = n >> 1;
    const zin = this.input;
    const zout = this.output;
    zin[0] = 0;
    zin[1] = 0;
    for (let j = 1; j < n; j++) {
      const s = this.nodeSin[j];
      const pj = p[j - 1];
      const pm = p[n - j - 1];
      const qj = q[j - 1];
      const qm = q[n - j - 1];
      zin[2 * j] = s * (pj + pm) + 0.5 * (pj - pm);
      zin[2 * j + 1] = s * (qj + qm) + 0.5 * (qj - qm);
    }
    this.fft.transform(zout, zin);
    // With Y_k = R_k + i I_k the FFT of that line: F_{2k} = −I_k, F_{2k+1} = F_{2k−1} + R_k.
    let oddP = 0;
    let oddQ = 0;
    for (let k = 0; k < half; k++) {
      const ar = zout[2 * k];
      const ai = zout[2 * k + 1];
      const mirror = k === 0 ? 0 : n - k;
      const br = zout[2 * mirror];
      const bi = zout[2 * mirror + 1];
      const rp = 0.5 * (ar + br);
      const ip = 0.5 * (ai - bi);
      const rq = 0.5 * (ai + bi);
      const iq = 0.5 * (br - ar);
      if (k === 0) {
        oddP = 0.5 * rp;
        oddQ = 0.5 * rq;
      } else {
        p[2 * k - 1] = -ip;
        q[2 * k - 1] = -iq;
        oddP += rp;
        oddQ += rq;
      }
      p[2 * k] = oddP;
      q[2 * k] = oddQ;
    }
  }
}

function alternateSigns(line: Float64Array, length: number): void {
  for (let i = 1; i < length; i += 2) line[i] = -line[i];
}

function reverse(line: Float64Array, length: number): void {
  for (let i = 0, j = length - 1; i < j; i++, j--) {
    const t = line[i];
    line[i] = line[j];
    line[j] = t;
  }
}

type LineOperation = (transform: LineTransform, p: Float64Array, q: Float64Array) => void;

export const cosineAnalysis: LineOperation = (t, p, q) => t.cosineAnalysis(p, q);
export const cosineSynthesis: LineOperation = (t, p, q) => t.cosineSynthesis(p, q);
export const sineAnalysis: LineOperation = (t, p, q) => t.sineAnalysis(p, q);
export const sineSynthesis: LineOperation = (t, p, q) => t.sineSynthesis(p, q);
export const nodeSineSynthesis: LineOperation = (t, p, q) => t.nodeSineSynthesis(p, q);

/**
 * Applies a line transform to every row (along x) or every column (along z) of a row-major
 * grid, two lines per FFT. `count` lines of `length` values each are transformed; an odd last line
 * is paired with a scratch line of zeros.
 */
export class GridLines {
  private readonly transform: LineTransform;
  private readonly lineA: Float64Array;
  private readonly lineB: Float64Array;

  constructor(size: number) {
    this.transform = new LineTransform(size);
    this.lineA = new Float64Array(size);
    this.lineB = new Float64Array(size);
  }

  /** Rows `0 … rows−1` of a grid with row stride `stride`; the first `length` entries of each row. */
  rows(grid: Float64Array, rows: number, stride: number, length: number, op: LineOperation): void {
    const t = this.transform;
    let r = 0;
    for (; r + 1 < rows; r += 2) {
      op(t, grid.subarray(r * stride, r * stride + length), grid.subarray((r + 1) * stride, (r + 1) * stride + length));
    }
    if (r < rows) {
      this.lineB.fill(0);
      op(t, grid.subarray(r * stride, r * stride + length), this.lineB);
    }
  }

  /** Columns `0 … columns−1` of a grid with row stride `stride`; the first `length` rows. */
  columns(grid: Float64Array, columns: number, stride: number, length: number, op: LineOperation): void {
    const t = this.transform;
    const a = this.lineA;
    const b = this.lineB;
    for (let c = 0; c < columns; c += 2) {
      const paired = c + 1 < columns;
      for (let k = 0, at = c; k < length; k++, at += stride) {
        a[k] = grid[at];
        b[k] = paired ? grid[at + 1] : 0;
      }
      op(t, a, b);
      for (let k = 0, at = c; k < length; k++, at += stride) {
        grid[at] = a[k];
        if (paired) grid[at + 1] = b[k];
      }
    }
  }
}
