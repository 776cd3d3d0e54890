/**
 * Finite-volume advection of temperature on the cell-centred grid (row 0 at the bottom), with
 * face velocities on a staggered grid: `ux` on the x-faces ((nx + 1) per row, nz rows) and `wz` on
 * the z-faces (nx per row, nz + 1 rows). Face values come from piecewise-linear reconstruction with
 * the monotonised-central (MC) limiter (van Leer 1977), so the scheme is TVD: it creates no new
 * extrema and keeps temperature inside [0, 1]. Walls carry no advective flux (zero normal
 * velocity); their temperatures enter only the limiter, through mirror cells.
 */
export class FiniteVolumeAdvection {
  private readonly nx: number;
  private readonly nz: number;
  private readonly dx: number;
  private readonly dz: number;
  private readonly tendencyBuffer: Float64Array;
  private readonly stageA: Float64Array;
  private readonly stageB: Float64Array;
  private readonly slopeX: Float64Array;
  private readonly slopeZ: Float64Array;

  constructor(nx: number, nz: number, dx: number, dz: number) {
    this.nx = nx;
    this.nz = nz;
    this.dx = dx;
    this.dz = dz;
    const cells = nx * nz;
    this.tendencyBuffer = new Float64Array(cells);
    this.stageA = new Float64Array(cells);
    this.stageB = new Float64Array(cells);
    this.slopeX = new Float64Array(nx);
    this.slopeZ = new Float64Array(cells);
  }

  /**
   * Largest Courant-number rate of the face velocities: dt times this is the sum over both
   * directions of |velocity| · dt / cell size, taken at the fastest cell.
   */
  courantRate(ux: Float64Array, wz: Float64Array): number {
    const { nx, nz, dx, dz } = this;
    let rate = 0;
    for (let j = 0; j < nz; j++) {
      for (let i = 0; i < nx; i++) {
        const u = Math.max(Math.abs(ux[j * (nx + 1) + i]), Math.abs(ux[j * (nx + 1) + i + 1]));
        const w = Math.max(Math.abs(wz[j * nx + i]), Math.abs(wz[(j + 1) * nx + i]));
        const cell = u / dx + w / dz;
        if (cell > rate) rate = cell;
      }
    }
    return rate;
  }

  /**
   * Advances `temperature` in place by dt with the three-stage, second-order strong-stability-
   * preserving Runge–Kutta method (SSP coefficient 2; Gottlieb, Shu and Tadmor 2001, SIAM Review
   * 43), which keeps the limiter's TVD bound up to a Courant number of 1.
   */
  advance(temperature: Float64Array, ux: Float64Array, wz: Float64Array, dt: number): void {
    const half = 0.5 * dt;
    const l = this.tendencyBuffer;
    const a = this.stageA;
    const b = this.stageB;
    const cells = temperature.length;
    this.tendency(temperature, ux, wz);
    for (let k = 0; k < cells; k++) a[k] = temperature[k] + half * l[k];
    this.tendency(a, ux, wz);
    for (let k = 0; k < cells; k++) b[k] = a[k] + half * l[k];
    this.tendency(b, ux, wz);
    for (let k = 0; k < cells; k++) temperature[k] = (temperature[k] + 2 * (b[k] + half * l[k])) / 3;
  }

  /** −∇·(u T) per cell, into the tendency buffer. */
  private tendency(t: Float64Array, ux: Float64Array, wz: Float64Array): void {
    const { nx, nz } = this;
    const out = this.tendencyBuffer;
    const sx = this.slopeX;
    const sz = this.slopeZ;
    const invDx = 1 / this.dx;
    const invDz = 1 / this.dz;
    out.fill(0);
    for (let j = 0; j < nz; j++) {
      const row = j * nx;
      const faces = j * (nx + 1);
      // Insulated side walls: mirror cells, so the wall cells get a zero slope.
      sx[0] = 0;
      sx[nx - 1] = 0;
      for (let i = 1; i < nx - 1; i++) {
        sx[i] = limitedSlope(t[row + i] - t[row + i - 1], t[row + i + 1] - t[row + i]);
      }
      for (let i = 1; i < nx; i++) {
        const u = ux[faces + i];
        const face = u > 0 ? t[row + i - 1] + 0.5 * sx[i - 1] : t[row + i] - 0.5 * sx[i];
        const flux = u * face * invDx;
        out[row + i - 1] -= flux;
        out[row + i] += flux;
      }
    }
    const top = (nz - 1) * nx;
    for (let i = 0; i < nx; i++) {
      // Fixed-temperature walls (1 below, 0 above): mirror cells 2·T_wall − T.
      sz[i] = limitedSlope(2 * (t[i] - 1), t[i + nx] - t[i]);
      sz[top + i] = limitedSlope(t[top + i] - t[top + i - nx], -2 * t[top + i]);
    }
    for (let k = nx; k < top; k++) sz[k] = limitedSlope(t[k] - t[k - nx], t[k + nx] - t[k]);
    for (let k = nx; k < nz * nx; k++) {
      const w = wz[k];
      const face = w > 0 ? t[k - nx] + 0.5 * sz[k - nx] : t[k] - 0.5 * sz[k];
      const flux = w * face * invDz;
      out[k - nx] -= flux;
      out[k] += flux;
    }
  }
}

/** Monotonised-central limiter: minmod(2a, 2b, (a + b)/2). */
function limitedSlope(a: number, b: number): number {
  if (a * b <= 0) return 0;
  const size = Math.min(2 * Math.abs(a), 2 * Math.abs(b), 0.5 * Math.abs(a + b));
  return a > 0 ? size : -size;
}
