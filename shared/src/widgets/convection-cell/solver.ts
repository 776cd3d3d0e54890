import { FiniteVolumeAdvection } from './advection.js';
import {
  cosineAnalysis,
  cosineSynthesis,
  GridLines,
  nodeSineSynthesis,
  sineAnalysis,
  sineSynthesis,
} from './transforms.js';

/**
 * Two-dimensional, infinite-Prandtl Boussinesq convection with constant viscosity in the box
 * [0, A] × [0, 1], heated from below (T = 1 at z = 0, T = 0 at z = 1), insulated sides, free slip
 * on every wall. Non-dimensional: lengths in the depth d, time in the diffusion time d²/κ,
 * velocities in κ/d. Equations:
 *   ∇⁴ψ = Ra ∂T/∂x,   u = ∂ψ/∂z,   w = −∂ψ/∂x,   ∂T/∂t + u·∇T = ∇²T.
 * (Curl of the Stokes equation −∇p + ∇²u + Ra T ẑ = 0; with this sign hot fluid rises.)
 *
 * Method: free slip makes ψ a pure sine series in x and z and T − (1 − z) a cosine-in-x, sine-in-z
 * series, so the biharmonic inversion is diagonal, ψ̂ = −Ra kx T̂ / (kx² + kz²)², done with fast
 * transforms (transforms.ts). Each step is Strang-split: half a step of diffusion, applied exactly
 * to the spectral coefficients (integrating factor, no diffusive step limit); a finite-volume TVD
 * advection step (advection.ts) with the mid-step velocity, extrapolated from the last two steps;
 * another exact half step of diffusion. The step is CFL-limited.
 *
 * Grid: `nx` × `nz` cells, each a power of two from 8 to 1024. `temperature` and
 * `streamFunction` are row-major, nz rows of nx values, row 0 at the BOTTOM: the value at index
 * j·nx + i belongs to the cell centre x = (i + ½)·A/nx, z = (j + ½)/nz.
 */

export interface ConvectionOptions {
  rayleigh: number;
  aspectRatio: number;
  nx: number;
  nz: number;
  /**
   * With a seed, the start is seeded random noise on the lowest modes (reproducible for the same
   * seed). Without one, it is the single mode cos(m π x / A) sin(π z) whose cell width is
   * nearest the critical wavelength (one cell in a unit square, as in Blankenbach et al. 1989).
   */
  seed?: number;
  /** Amplitude of the starting perturbation of T (default 0.01). */
  perturbation?: number;
  /** A temperature field to start from instead, on any allowed grid; resampled spectrally. */
  initialTemperature?: TemperatureField;
  /** Advective Courant number of each step, at most 1 (default 0.8). */
  courant?: number;
  /** Longest time step, for when the flow is slow (default 1e-3 diffusion times). */
  maxTimeStep?: number;
}

/** A temperature field in the layout of `ConvectionSimulation.temperature`. */
export interface TemperatureField {
  nx: number;
  nz: number;
  values: Float64Array;
}

export interface Velocity {
  /** horizontal, positive towards larger x */
  u: number;
  /** vertical, positive upwards */
  w: number;
}

export interface ConvectionSimulation {
  readonly rayleigh: number;
  readonly aspectRatio: number;
  readonly nx: number;
  readonly nz: number;
  /** Non-dimensional time, in diffusion times d²/κ. */
  readonly time: number;
  /** Number of steps taken. */
  readonly steps: number;
  /** The last step's length (0 before the first step). */
  readonly lastTimeStep: number;
  /** Cell-centre temperature, row 0 at the bottom; a fresh view after each step (do not write). */
  readonly temperature: Float64Array;
  /** Cell-centre stream function, same layout as temperature. */
  readonly streamFunction: Float64Array;
  step(count?: number): void;
  /** Top-boundary heat flux over the conductive one, −(1/A) ∫ ∂T/∂z(x, 1) dx (Blankenbach et al.). */
  nusselt(): number;
  /** Root-mean-square speed over the box, √((1/A) ∫∫ (u² + w²) dx dz). */
  vrms(): number;
  /** Velocity at (x, z), x in [0, A], z in [0, 1], bilinear in the staggered face velocities. */
  velocityAt(x: number, z: number): Velocity;
}

export const MIN_GRID_SIZE = 8;
export const MAX_GRID_SIZE = 1024;

export const isAllowedGridSize = (n: number): boolean =>
  Number.isInteger(n) && n >= MIN_GRID_SIZE && n <= MAX_GRID_SIZE && (n & (n - 1)) === 0;

const DEFAULT_PERTURBATION = 0.01;
const DEFAULT_COURANT = 0.8;
const DEFAULT_MAX_TIME_STEP = 1e-3;

export interface PhysicalConvectionInputs {
  densityKgM3: number;
  gravityMs2: number;
  expansivityPerK: number;
  deltaTK: number;
  depthM: number;
  diffusivityM2s: number;
  viscosityPas: number;
}

/** Ra = ρ g α ΔT d³ / (κ η). */
export function rayleighFromPhysical(p: PhysicalConvectionInputs): number {
  return (p.densityKgM3 * p.gravityMs2 * p.expansivityPerK * p.deltaTK * p.depthM ** 3) / (p.diffusivityM2s * p.viscosityPas);
}

export function createConvection(options: ConvectionOptions): ConvectionSimulation {
  return new SpectralConvection(options);
}

class SpectralConvection implements ConvectionSimulation {
  readonly rayleigh: number;
  readonly aspectRatio: number;
  readonly nx: number;
  readonly nz: number;
  time = 0;
  steps = 0;
  lastTimeStep = 0;

  private readonly courant: number;
  private readonly maxTimeStep: number;
  /**
   * While the flow is still slow, the CFL limit allows long steps, but a perturbation can grow at
   * up to Ra kx²/K⁴ ≤ Ra/(4π²) per unit time; this bound keeps that growth under ~20 % a step.
   */
  private readonly growthLimitedStep: number;
  private readonly dx: number;
  private readonly dz: number;
  private readonly rows: GridLines;
  private readonly columns: GridLines;
  private readonly advection: FiniteVolumeAdvection;
  /** Coefficients of T − (1 − z): index (n − 1)·nx + m for cos(m π x / A) sin(n π z). */
  private readonly coefficients: Float64Array;
  /** −Ra kx / K⁴ per coefficient, the biharmonic inversion (0 where ψ has no mode). */
  private readonly inversion: Float64Array;
  /** kx² and kz² per mode, for the separable diffusion factor exp(−(kx² + kz²) t). */
  private readonly kx2: Float64Array;
  private readonly kz2: Float64Array;
  private readonly decayX: Float64Array;
  private readonly decayZ: Float64Array;
  /** ψ on the (nx + 1) × (nz + 1) cell corners, zero on the walls; now, one step ago, mid-step. */
  private psi: Float64Array;
  private psiPrevious: Float64Array;
  private readonly psiMid: Float64Array;
  private readonly work: Float64Array;
  private readonly temperatureView: Float64Array;
  private readonly streamView: Float64Array;
  private temperatureStep = -1;
  private streamStep = -1;

  constructor(options: ConvectionOptions) {
    const { rayleigh, aspectRatio, nx, nz } = options;
    if (!Number.isFinite(rayleigh) || rayleigh < 0) throw new RangeError(`Rayleigh number must be finite and not negative, got ${rayleigh}.`);
    if (!Number.isFinite(aspectRatio) || aspectRatio <= 0) throw new RangeError(`Aspect ratio must be positive, got ${aspectRatio}.`);
    for (const [name, n] of [['nx', nx], ['nz', nz]] as const) {
      if (!isAllowedGridSize(n)) throw new RangeError(`${name} must be a power of two from ${MIN_GRID_SIZE} to ${MAX_GRID_SIZE}, got ${n}.`);
    }
    const courant = options.courant ?? DEFAULT_COURANT;
    if (!(courant > 0 && courant <= 1)) throw new RangeError(`Courant number must be in (0, 1], got ${courant}.`);
    const maxTimeStep = options.maxTimeStep ?? DEFAULT_MAX_TIME_STEP;
    if (!(maxTimeStep > 0 && Number.isFinite(maxTimeStep))) throw new RangeError(`Longest time step must be positive, got ${maxTimeStep}.`);

    this.rayleigh = rayleigh;
    this.aspectRatio = aspectRatio;
    this.nx = nx;
    this.nz = nz;
    this.courant = courant;
    this.maxTimeStep = maxTimeStep;
    this.growthLimitedStep = rayleigh > 0 ? (0.2 * 4 * Math.PI ** 2) / rayleigh : Infinity;
    this.dx = aspectRatio / nx;
    this.dz = 1 / nz;
    this.rows = new GridLines(nx);
    this.columns = new GridLines(nz);
    this.advection = new FiniteVolumeAdvection(nx, nz, this.dx, this.dz);

    const cells = nx * nz;
    const corners = (nx + 1) * (nz + 1);
    this.coefficients = new Float64Array(cells);
    this.inversion = new Float64Array(cells);
    this.kx2 = Float64Array.from({ length: nx }, (_, m) => ((m * Math.PI) / aspectRatio) ** 2);
    this.kz2 = Float64Array.from({ length: nz }, (_, j) => ((j + 1) * Math.PI) ** 2);
    this.decayX = new Float64Array(nx);
    this.decayZ = new Float64Array(nz);
    for (let j = 0; j < nz - 1; j++) {
      for (let m = 1; m < nx; m++) {
        const k2 = this.kx2[m] + this.kz2[j];
        this.inversion[j * nx + m] = (-rayleigh * ((m * Math.PI) / aspectRatio)) / (k2 * k2);
      }
    }
    this.psi = new Float64Array(corners);
    this.psiPrevious = new Float64Array(corners);
    this.psiMid = new Float64Array(corners);
    this.work = new Float64Array(cells);
    this.temperatureView = new Float64Array(cells);
    this.streamView = new Float64Array(cells);

    this.setInitialTemperature(options);
    this.updateStreamFunction();
    this.psiPrevious.set(this.psi);
  }

  get temperature(): Float64Array {
    if (this.temperatureStep !== this.steps) {
      this.synthesiseTemperature(this.coefficients, this.temperatureView);
      this.temperatureStep = this.steps;
    }
    return this.temperatureView;
  }

  get streamFunction(): Float64Array {
    if (this.streamStep !== this.steps) {
      const { nx, nz } = this;
      const s = this.streamView;
      // Sine coefficient of ψ for mode (m, n) at index (n − 1)·nx + (m − 1); m = nx, n = nz are zero.
      s.fill(0);
      for (let j = 0; j < nz - 1; j++) {
        for (let m = 1; m < nx; m++) s[j * nx + m - 1] = this.inversion[j * nx + m] * this.coefficients[j * nx + m];
      }
      this.rows.rows(s, nz, nx, nx, sineSynthesis);
      this.columns.columns(s, nx, nx, nz, sineSynthesis);
      this.streamStep = this.steps;
    }
    return this.streamView;
  }

  step(count = 1): void {
    for (let s = 0; s < count; s++) this.advance();
  }

  nusselt(): number {
    const { nx, nz } = this;
    // ∂T/∂z at z = 1 averaged over x keeps only the m = 0 modes: −1 + Σ a_0n n π cos(n π).
    let gradient = -1;
    for (let j = 0; j < nz; j++) {
      const n = j + 1;
      gradient += this.coefficients[j * nx] * n * Math.PI * (n % 2 === 0 ? 1 : -1);
    }
    return -gradient;
  }

  vrms(): number {
    // Parseval: each sin·sin mode of ψ with amplitude b carries mean u² + w² = b² K² / 4.
    const { nx, nz } = this;
    let sum = 0;
    for (let j = 0; j < nz - 1; j++) {
      for (let m = 1; m < nx; m++) {
        const b = this.inversion[j * nx + m] * this.coefficients[j * nx + m];
        sum += b * b * (this.kx2[m] + this.kz2[j]);
      }
    }
    return Math.sqrt(0.25 * sum);
  }

  velocityAt(x: number, z: number): Velocity {
    const { nx, nz, dx, dz } = this;
    const psi = this.psi;
    const stride = nx + 1;
    // u = ∂ψ/∂z lives on x-faces (i dx, (j + ½) dz); free slip: ∂u/∂z = 0 on top and bottom.
    const ux = clampedCell(x / dx, nx);
    const uz = clampedCell(z / dz - 0.5, nz - 1);
    const uAt = (i: number, j: number) => (psi[(j + 1) * stride + i] - psi[j * stride + i]) / dz;
    const u = bilinear(uAt, ux.index, uz.index, ux.fraction, uz.fraction);
    // w = −∂ψ/∂x lives on z-faces ((i + ½) dx, j dz); free slip: ∂w/∂x = 0 on the sides.
    const wx = clampedCell(x / dx - 0.5, nx - 1);
    const wzCell = clampedCell(z / dz, nz);
    const wAt = (i: number, j: number) => -(psi[j * stride + i + 1] - psi[j * stride + i]) / dx;
    const w = bilinear(wAt, wx.index, wzCell.index, wx.fraction, wzCell.fraction);
    return { u, w };
  }

  private advance(): void {
    this.advection.setStreamFunction(this.psi);
    const rate = this.advection.courantRate();
    const longest = Math.min(this.maxTimeStep, this.growthLimitedStep);
    const dt = rate > 0 ? Math.min(longest, this.courant / rate) : longest;

    // Mid-step ψ, extrapolated linearly from this step and the last; a steady flow is unchanged.
    const r = this.lastTimeStep > 0 ? Math.min(1, dt / (2 * this.lastTimeStep)) : 0;
    const mid = this.psiMid;
    const now = this.psi;
    const before = this.psiPrevious;
    for (let k = 0; k < mid.length; k++) mid[k] = now[k] + r * (now[k] - before[k]);
    this.advection.setStreamFunction(mid);

    this.setDecay(0.5 * dt);
    const t = this.work;
    t.set(this.coefficients);
    this.applyDecay(t);
    this.synthesiseTemperature(t, t);
    this.advection.advance(t, dt);
    this.analyseTemperature(t, this.coefficients);
    this.applyDecay(this.coefficients);

    this.psiPrevious = now;
    this.psi = before;
    this.updateStreamFunction();
    this.time += dt;
    this.lastTimeStep = dt;
    this.steps += 1;
  }

  private setDecay(duration: number): void {
    for (let m = 0; m < this.nx; m++) this.decayX[m] = Math.exp(-this.kx2[m] * duration);
    for (let j = 0; j < this.nz; j++) this.decayZ[j] = Math.exp(-this.kz2[j] * duration);
  }

  private applyDecay(c: Float64Array): void {
    const { nx, nz, decayX, decayZ } = this;
    for (let j = 0; j < nz; j++) {
      const dz = decayZ[j];
      for (let m = 0; m < nx; m++) c[j * nx + m] *= dz * decayX[m];
    }
  }

  /** ψ on the corners from the temperature coefficients (two node-sine syntheses). */
  private updateStreamFunction(): void {
    const { nx, nz } = this;
    const stride = nx + 1;
    const psi = this.psi;
    for (let j = 1; j < nz; j++) {
      for (let i = 1; i < nx; i++) {
        const k = (j - 1) * nx + i;
        psi[j * stride + i] = this.inversion[k] * this.coefficients[k];
      }
    }
    const interior = psi.subarray(stride + 1);
    this.rows.rows(interior, nz - 1, stride, nx - 1, nodeSineSynthesis);
    this.columns.columns(interior, nx - 1, stride, nz - 1, nodeSineSynthesis);
  }

  /** Coefficients → full temperature at the cell centres (`from` and `to` may be the same). */
  private synthesiseTemperature(from: Float64Array, to: Float64Array): void {
    const { nx, nz } = this;
    if (to !== from) to.set(from);
    this.columns.columns(to, nx, nx, nz, sineSynthesis);
    this.rows.rows(to, nz, nx, nx, cosineSynthesis);
    for (let j = 0; j < nz; j++) {
      const background = 1 - (j + 0.5) / nz;
      for (let i = 0; i < nx; i++) to[j * nx + i] += background;
    }
  }

  /** Full temperature at the cell centres → coefficients of T − (1 − z); `values` is overwritten. */
  private analyseTemperature(values: Float64Array, to: Float64Array): void {
    const { nx, nz } = this;
    for (let j = 0; j < nz; j++) {
      const background = 1 - (j + 0.5) / nz;
      for (let i = 0; i < nx; i++) values[j * nx + i] -= background;
    }
    this.rows.rows(values, nz, nx, nx, cosineAnalysis);
    this.columns.columns(values, nx, nx, nz, sineAnalysis);
    if (to !== values) to.set(values);
  }

  private setInitialTemperature(options: ConvectionOptions): void {
    const { nx, nz, aspectRatio } = this;
    const c = this.coefficients;
    if (options.initialTemperature) {
      const source = resampleCoefficients(options.initialTemperature);
      const sourceNx = options.initialTemperature.nx;
      for (let j = 0; j < Math.min(nz, options.initialTemperature.nz); j++) {
        for (let m = 0; m < Math.min(nx, sourceNx); m++) c[j * nx + m] = source[j * sourceNx + m];
      }
      return;
    }
    const amplitude = options.perturbation ?? DEFAULT_PERTURBATION;
    if (options.seed === undefined) {
      const m = Math.min(nx - 1, Math.max(1, Math.round(aspectRatio / Math.SQRT2)));
      c[m] = amplitude;
      return;
    }
    const random = mulberry32(options.seed);
    const highestM = Math.min(nx - 1, Math.max(2, Math.round(2 * aspectRatio)));
    for (let j = 0; j < 2; j++) {
      for (let m = 0; m <= highestM; m++) c[j * nx + m] = amplitude * (2 * random() - 1);
    }
  }
}

/** Coefficients of T − (1 − z) for a field on its own grid (which must be an allowed one). */
function resampleCoefficients(field: TemperatureField): Float64Array {
  const { nx, nz, values } = field;
  if (!isAllowedGridSize(nx) || !isAllowedGridSize(nz) || values.length !== nx * nz) {
    throw new RangeError(`Initial temperature must be an allowed grid with nx·nz values, got ${nx} × ${nz} with ${values.length}.`);
  }
  const c = Float64Array.from(values);
  for (let j = 0; j < nz; j++) {
    const background = 1 - (j + 0.5) / nz;
    for (let i = 0; i < nx; i++) c[j * nx + i] -= background;
  }
  new GridLines(nx).rows(c, nz, nx, nx, cosineAnalysis);
  new GridLines(nz).columns(c, nx, nx, nz, sineAnalysis);
  return c;
}

/** Lower sample index and fraction for a position in sample units, clamped to [0, last]. */
function clampedCell(position: number, last: number): { index: number; fraction: number } {
  const p = Math.min(Math.max(position, 0), last);
  const index = Math.min(Math.floor(p), last - 1);
  return { index, fraction: p - index };
}

function bilinear(at: (i: number, j: number) => number, i: number, j: number, fx: number, fz: number): number {
  return (
    (1 - fx) * (1 - fz) * at(i, j) + fx * (1 - fz) * at(i + 1, j) + (1 - fx) * fz * at(i, j + 1) + fx * fz * at(i + 1, j + 1)
  );
}

/** A small seeded PRNG (mulberry32), so a seed gives the same start in every browser. */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface SteadyStateOptions {
  /** Largest relative change of Nu and Vrms per unit time that counts as steady (default 1e-4). */
  tolerance?: number;
  maxSteps?: number;
}

export interface SteadyState {
  nusselt: number;
  vrms: number;
  steps: number;
  time: number;
  /** false when maxSteps ran out first */
  converged: boolean;
  temperature: Float64Array;
}

const STEADY_CHECK_STEPS = 20;

/**
 * Steps until Nu and Vrms stop changing: their relative change per unit time, measured over
 * windows of 20 steps, stays below `tolerance` for three windows in a row.
 */
export function runToSteadyState(options: ConvectionOptions, { tolerance = 1e-4, maxSteps = 200_000 }: SteadyStateOptions = {}): SteadyState {
  const sim = createConvection(options);
  let nusselt = sim.nusselt();
  let vrms = sim.vrms();
  let calmWindows = 0;
  while (sim.steps < maxSteps && calmWindows < 3) {
    const start = sim.time;
    sim.step(Math.min(STEADY_CHECK_STEPS, maxSteps - sim.steps));
    const nextNusselt = sim.nusselt();
    const nextVrms = sim.vrms();
    const change = Math.max(Math.abs(nextNusselt - nusselt) / nextNusselt, Math.abs(nextVrms - vrms) / Math.max(nextVrms, 1));
    calmWindows = change / (sim.time - start) < tolerance ? calmWindows + 1 : 0;
    nusselt = nextNusselt;
    vrms = nextVrms;
  }
  return { nusselt, vrms, steps: sim.steps, time: sim.time, converged: calmWindows >= 3, temperature: sim.temperature.slice() };
}
