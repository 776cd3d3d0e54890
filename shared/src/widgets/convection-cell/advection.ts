/**
 * Finite-volume advection of temperature on the cell-centred grid (row 0 at the bottom), with
 * face velocities on a staggered grid (u on the x-faces, w on the z-faces) taken from the stream
 * function on the cell corners. Face values come from piecewise-linear reconstruction with
 * the monotonised-central (MC) limiter (van Leer 1977), so the scheme is TVD: it creates no new
 * extrema and keeps temperature inside [0, 1]. Walls carry no advective flux (zero normal
 * velocity); their temperatures enter only the limiter, through mirror cells.
 */
export class FiniteVolumeAdvection {
  private readonly nx: number;
  private readonly nz: number;
  private readonly dx: number;
  private readonly dz: number;
  /** Face velocities divided by the cell size: x-faces (nx + 1 per row), z-faces (nz + 1 rows). */
  private readonly rateX: Float64Array;
  private readonly rateZ: Float64Array;
  private readonly tendencyBuffer: Float64Array;
  private readonly stageA: Float64Array;
  private readonly stageB: Float64Array;
  private slopeBelow: Float64Array;
  private slopeHere: Float64Array;

  constructor(nx: number, nz: number, dx: number, dz: number) {
    this.nx = nx;
    this.nz = nz;
    this.dx = dx;
    this.dz = dz;
    const cells = nx * nz;
    this.rateX = new Float64Array(nz * (nx + 1));
    this.rateZ = new Float64Array((nz + 1) * nx);
    this.tendencyBuffer = new Float64Array(cells);
    this.stageA = new Float64Array(cells);
    this.stageB = new Float64Array(cells);
    this.slopeBelow = new Float64Array(nx);
    this.slopeHere = new Float64Array(nx);
  }

  /**
   * Face velocities from the stream function on the (nx + 1) × (nz + 1) cell corners:
   * u = ∂ψ/∂z and w = −∂ψ/∂x as exact differences along each face, so the discrete divergence of
   * every cell is zero and no flux crosses a wall (ψ = 0 there).
   */
  setStreamFunction(psi: Float64Array): void {
    const { nx, nz } = this;
    const stride = nx + 1;
    const toRateX = 1 / (this.dz * this.dx);
    const toRateZ = -1 / (this.dx * this.dz);
    const rx = this.rateX;
    const rz = this.rateZ;
    for (let j = 0; j < nz; j++) {
      for (let i = 0; i <= nx; i++) rx[j * stride + i] = (psi[(j + 1) * stride + i] - psi[j * stride + i]) * toRateX;
    }
    for (let j = 0; j <= nz; j++) {
      for (let i = 0; i < nx; i++) rz[j * nx + i] = (psi[j * stride + i + 1] - psi[j * stride + i]) * toRateZ;
    }
  }

  /**
   * Largest Courant-number rate of the face velocities: dt times this is the sum over both
   * directions of |velocity| · dt / cell size, taken at the fastest cell.
   */
  courantRate(): number {
    const { nx, nz } = this;
    const rx = this.rateX;
    const rz = this.rateZ;
    let rate = 0;
    for (let j = 0; j < nz; j++) {
      for (let i = 0; i < nx; i++) {
        const u = Math.max(Math.abs(rx[j * (nx + 1) + i]), Math.abs(rx[j * (nx + 1) + i + 1]));
        const w = Math.max(Math.abs(rz[j * nx + i]), Math.abs(rz[(j + 1) * nx + i]));
        if (u + w > rate) rate = u + w;
      }
    }
    return rate;
  }

  /**
   * Advances `temperature` in place by dt with the three-stage, second-order strong-stability-
   * preserving Runge–Kutta method (SSP coefficient 2; Gottlieb, Shu and Tadmor 2001, SIAM Review
   * 43), which keeps the limiter's TVD bound up to a Courant number of 1.
   */
  advance(temperature: Float64Array, dt: number): void {
    const half = 0.5 * dt;
    const l = this.tendencyBuffer;
    const a = this.stageA;
    const b = this.stageB;
    const cells = temperature.length;
    this.tendency(temperature);
    for (let k = 0; k < cells; k++) a[k] = temperature[k] + half * l[k];
    this.tendency(a);
    for (let k = 0; k < cells; k++) b[k] = a[k] + half * l[k];
    this.tendency(b);
    for (let k = 0; k < cells; k++) temperature[k] = (temperature[k] + 2 * (b[k] + half * l[k])) / 3;
  }

  /**
   * −∇·(u T) per cell, into the tendency buffer, row by row from the bottom: the x-faces of row j,
   * then the z-faces between rows j − 1 and j, with the limited z-slopes of both rows at hand.
   */
  private tendency(t: Float64Array): void {
    const { nx, nz } = this;
    const out = this.tendencyBuffer;
    const rx = this.rateX;
    const rz = this.rateZ;
    let under = this.slopeBelow;
    let slopes = this.slopeHere;
    for (let j = 0; j < nz; j++) {
      const row = j * nx;
      const faces = j * (nx + 1);
      // Insulated side walls: mirror cells, so the wall cells get a zero x-slope.
      let slopeLeft = 0;
      let left = t[row];
      let here = t[row + 1];
      out[row] = 0;
      for (let i = 1; i < nx - 1; i++) {
        const right = t[row + i + 1];
        const slope = limitedSlope(here - left, right - here);
        const u = rx[faces + i];
        const flux = u * (u > 0 ? left + 0.5 * slopeLeft : here - 0.5 * slope);
        out[row + i - 1] -= flux;
        out[row + i] = flux;
        slopeLeft = slope;
        left = here;
        here = right;
      }
      const u = rx[faces + nx - 1];
      const flux = u * (u > 0 ? left + 0.5 * slopeLeft : here);
      out[row + nx - 2] -= flux;
      out[row + nx - 1] = flux;

      // Fixed-temperature walls (1 below, 0 above): mirror cells 2·T_wall − T.
      if (j === 0) {
        for (let i = 0; i < nx; i++) slopes[i] = limitedSlope(2 * (t[i] - 1), t[i + nx] - t[i]);
      } else if (j === nz - 1) {
        for (let i = 0, k = row; i < nx; i++, k++) slopes[i] = limitedSlope(t[k] - t[k - nx], -2 * t[k]);
      } else {
        for (let i = 0, k = row; i < nx; i++, k++) slopes[i] = limitedSlope(t[k] - t[k - nx], t[k + nx] - t[k]);
      }
      if (j > 0) {
        for (let i = 0, k = row; i < nx; i++, k++) {
          const w = rz[k];
          const flux = w * (w > 0 ? t[k - nx] + 0.5 * under[i] : t[k] - 0.5 * slopes[i]);
          out[k - nx] -= flux;
          out[k] += flux;
        }
      }
      const swap = under;
      under = slopes;
      slopes = swap;
    }
    this.slopeBelow = under;
    this.slopeHere = slopes;
  }
}

/** Monotonised-central limiter: minmod(2a, 2b, (a + b)/2). */
function limitedSlope(a: number, b: number): number {
  if (a * b <= 0) return 0;
  const centred = 0.5 * (a + b);
  if (a > 0) {
    const steep = a < b ? 2 * a : 2 * b;
    return centred < steep ? centred : steep;
  }
  const steep = a > b ? 2 * a : 2 * b;
  return centred > steep ? centred : steep;
}
