import { describe, expect, it } from 'vitest';
import { GridLines, LineTransform, nodeSineSynthesis } from './transforms.js';

/** The series written out as plain O(N²) sums, the definitions in transforms.ts. */
const cosineSum = (c: Float64Array, i: number, n: number) =>
  c.reduce((sum, cm, m) => sum + cm * Math.cos((Math.PI * m * (2 * i + 1)) / (2 * n)), 0);
const sineSum = (s: Float64Array, i: number, n: number) =>
  s.reduce((sum, sn, k) => sum + sn * Math.sin((Math.PI * (k + 1) * (2 * i + 1)) / (2 * n)), 0);
const nodeSineSum = (b: Float64Array, j: number, n: number) =>
  b.reduce((sum, bm, k) => sum + bm * Math.sin((Math.PI * (k + 1) * j) / n), 0);

function randomLine(length: number, seed: number): Float64Array {
  let state = seed;
  return Float64Array.from({ length }, () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state / 2147483648 - 0.5;
  });
}

const maxDifference = (a: ArrayLike<number>, b: ArrayLike<number>) =>
  Array.from(a).reduce((worst, value, i) => Math.max(worst, Math.abs(value - b[i])), 0);

describe.each([4, 8, 16, 64])('line transforms of length %i', (n) => {
  const transform = new LineTransform(n);

  it('sums the cosine series like the direct sum, and analysis undoes it', () => {
    const p = randomLine(n, 1);
    const q = randomLine(n, 2);
    const values = [p, q].map((c) => Float64Array.from({ length: n }, (_, i) => cosineSum(c, i, n)));
    const [pp, qq] = [p.slice(), q.slice()];
    transform.cosineSynthesis(pp, qq);
    expect(maxDifference(pp, values[0])).toBeLessThan(1e-12);
    expect(maxDifference(qq, values[1])).toBeLessThan(1e-12);
    transform.cosineAnalysis(pp, qq);
    expect(maxDifference(pp, p)).toBeLessThan(1e-12);
    expect(maxDifference(qq, q)).toBeLessThan(1e-12);
  });

  it('sums the sine series like the direct sum, and analysis undoes it', () => {
    const p = randomLine(n, 3);
    const q = randomLine(n, 4);
    const values = [p, q].map((s) => Float64Array.from({ length: n }, (_, i) => sineSum(s, i, n)));
    const [pp, qq] = [p.slice(), q.slice()];
    transform.sineSynthesis(pp, qq);
    expect(maxDifference(pp, values[0])).toBeLessThan(1e-12);
    expect(maxDifference(qq, values[1])).toBeLessThan(1e-12);
    transform.sineAnalysis(pp, qq);
    expect(maxDifference(pp, p)).toBeLessThan(1e-12);
    expect(maxDifference(qq, q)).toBeLessThan(1e-12);
  });

  it('sums the node sine series like the direct sum', () => {
    const p = randomLine(n - 1, 5);
    const q = randomLine(n - 1, 6);
    const values = [p, q].map((b) => Float64Array.from({ length: n - 1 }, (_, k) => nodeSineSum(b, k + 1, n)));
    transform.nodeSineSynthesis(p, q);
    expect(maxDifference(p, values[0])).toBeLessThan(1e-12);
    expect(maxDifference(q, values[1])).toBeLessThan(1e-12);
  });
});

describe('grid lines', () => {
  it('transforms every row and column of a grid, odd line counts included', () => {
    const rows = 7;
    const columns = 15;
    const stride = 17;
    const grid = randomLine(rows * stride, 7);
    const expected = grid.slice();
    const rowWise = new GridLines(16);
    const columnWise = new GridLines(8);
    rowWise.rows(grid, rows, stride, columns, nodeSineSynthesis);
    columnWise.columns(grid, columns, stride, rows, nodeSineSynthesis);
    for (let r = 0; r < rows; r++) {
      const row = expected.slice(r * stride, r * stride + columns);
      const summed = Float64Array.from({ length: columns }, (_, k) => nodeSineSum(row, k + 1, 16));
      expected.set(summed, r * stride);
    }
    for (let c = 0; c < columns; c++) {
      const column = Float64Array.from({ length: rows }, (_, r) => expected[r * stride + c]);
      column.forEach((_, r) => (expected[r * stride + c] = nodeSineSum(column, r + 1, 8)));
    }
    expect(maxDifference(grid, expected)).toBeLessThan(1e-12);
  });
});
