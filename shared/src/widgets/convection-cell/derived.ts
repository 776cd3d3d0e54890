import { rayleighFromPhysical } from './solver.js';
import { GRID_SIZES, type ConvectionCellParams, type PhysicalInputs } from './params.js';

/**
 * Onset of convection in an infinite layer between free-slip boundaries, Ra_c = 27π⁴/4 ≈ 657.5 at
 * wavenumber π/√2 (Rayleigh 1916; Chandrasekhar 1961, Hydrodynamic and Hydromagnetic Stability).
 */
export const ONSET_RAYLEIGH_FREE_SLIP = (27 * Math.PI ** 4) / 4;

/**
 * Onset in our box: with free-slip, insulated side walls a box of aspect ratio A only holds the
 * horizontal wavenumbers k = nπ/A, and each needs Ra = (k² + π²)³ / k² (the same linear analysis),
 * so the box convects above the smallest of those. It equals 27π⁴/4 only when A is a multiple of √2.
 */
export function onsetRayleigh(aspectRatio: number): number {
  const critical = (k: number) => (k * k + Math.PI ** 2) ** 3 / (k * k);
  // Rolls narrower than the depth only cost more, so modes up to ~2A cover the minimum.
  const modes = Math.max(2, Math.ceil(2 * aspectRatio) + 1);
  let lowest = Number.POSITIVE_INFINITY;
  for (let n = 1; n <= modes; n += 1) lowest = Math.min(lowest, critical((n * Math.PI) / aspectRatio));
  return lowest;
}

/**
 * Boundary-layer theory gives Nu ∝ Ra^(1/3) (Turcotte and Schubert, Geodynamics); the prefactor is
 * fitted to Blankenbach et al. (1989) case 1a, Nu = 4.884409 at Ra = 10⁴. An estimate only: it
 * lands within a few per cent of their cases 1b and 1c (Ra = 10⁵, 10⁶) and is rough near onset.
 */
export const NUSSELT_PREFACTOR = 4.884409 / 1e4 ** (1 / 3);
/** Velocity scales as Ra^(2/3) in the same theory; prefactor fitted to case 1a's Vrms = 42.864947. */
export const VRMS_PREFACTOR = 42.864947 / 1e4 ** (2 / 3);

/**
 * Grid points needed across each thermal boundary layer. Three is the usual floor for resolving a
 * thermal boundary layer in convection simulations (from memory of the resolution studies for
 * Rayleigh–Bénard runs); at Ra = 10⁴ it asks for 32 rows, where δ spans 3.3 rows.
 */
export const POINTS_PER_BOUNDARY_LAYER = 3;
/** Plumes are about as wide as the layer that feeds them, so columns need only half the vertical rule. */
export const COLUMNS_PER_BOUNDARY_LAYER = 1.5;

/**
 * The kiosk frame budget, in grid points × solver steps per drawn frame. At 60 frames a second a
 * frame has 16.7 ms. A 128 × 128 step took 2.2 ms in Node on the development machine (about 0.13 µs
 * per point; `npm run bench -w shared` measures it); allowing a fanless kiosk PC to be three times
 * slower, two such steps (≈ 13 ms) still fit a frame while the main thread draws.
 */
export const FRAME_BUDGET_POINT_STEPS = 128 * 128 * 2;

const SECONDS_PER_MYR = 1e6 * 365.25 * 86_400;
const SECONDS_PER_YEAR = 365.25 * 86_400;

export const rayleighOf = (params: Pick<ConvectionCellParams, 'rayleigh' | 'physical'>): number =>
  params.rayleigh ?? rayleighFromPhysical(params.physical as PhysicalInputs);

export const estimatedNusselt = (rayleigh: number, aspectRatio: number): number =>
  rayleigh > onsetRayleigh(aspectRatio) ? Math.max(1, NUSSELT_PREFACTOR * Math.cbrt(rayleigh)) : 1;

/** Thickness of each thermal boundary layer as a fraction of the depth: it conducts the whole heat flux across half the temperature drop, δ = d / (2 Nu). */
export const boundaryLayerThickness = (nusselt: number): number => 1 / (2 * nusselt);

export const rowsNeeded = (thickness: number): number => POINTS_PER_BOUNDARY_LAYER / thickness;
export const columnsNeeded = (thickness: number, aspectRatio: number): number => (COLUMNS_PER_BOUNDARY_LAYER * aspectRatio) / thickness;
/** The smallest allowed grid size at or above a need, or undefined when even the largest is too coarse. */
export const smallestGridAtLeast = (need: number) => GRID_SIZES.find((size) => size >= need);

/** Time and speed in physical units, from the depth d and diffusivity κ: time in d²/κ, speed in κ/d. */
export function physicalScales(physical: Pick<PhysicalInputs, 'depthM' | 'diffusivityM2s'>) {
  return {
    timeScaleMyr: physical.depthM ** 2 / physical.diffusivityM2s / SECONDS_PER_MYR,
    velocityScaleCmYr: (physical.diffusivityM2s / physical.depthM) * SECONDS_PER_YEAR * 100,
  };
}

// A type alias (not an interface) so results fit Record<string, unknown> where live values read them.
export type ConvectionCellDerived = {
  rayleigh: number;
  /** Onset for this box's aspect ratio (see onsetRayleigh) and for an infinite layer, 27π⁴/4. */
  onsetRayleigh: number;
  onsetRayleighInfiniteLayer: number;
  aboveOnset: boolean;
  /** Figures from boundary-layer scaling, not from a run of the solver. */
  estimate: {
    basis: string;
    nusselt: number;
    vrms: number;
    boundaryLayerThickness: number;
  };
  grid: { rowsPerBoundaryLayer: number; pointStepsPerFrame: number; frameBudget: number };
  physical?: {
    depthM: number;
    timeScaleMyr: number;
    velocityScaleCmYr: number;
    boundaryLayerThicknessKm: number;
    estimatedSpeedCmYr: number;
    /** Time for rock at the estimated speed to cross the box's depth once. */
    transitTimeMyr: number | null;
    prandtl: number;
  };
};

export const ESTIMATE_BASIS =
  'Estimate from boundary-layer scaling, Nu ∝ Ra^(1/3) and Vrms ∝ Ra^(2/3) (Turcotte and Schubert, Geodynamics), fitted to Blankenbach et al. (1989) case 1a; not a run of the solver.';

/** The numbers that follow from a convection cell's settings, without running it. */
export function deriveConvectionCell(params: ConvectionCellParams): ConvectionCellDerived {
  const rayleigh = rayleighOf(params);
  const onset = onsetRayleigh(params.aspectRatio);
  const aboveOnset = rayleigh > onset;
  const nusselt = estimatedNusselt(rayleigh, params.aspectRatio);
  const thickness = boundaryLayerThickness(nusselt);
  const vrms = aboveOnset ? VRMS_PREFACTOR * rayleigh ** (2 / 3) : 0;
  const derived: ConvectionCellDerived = {
    rayleigh,
    onsetRayleigh: onset,
    onsetRayleighInfiniteLayer: ONSET_RAYLEIGH_FREE_SLIP,
    aboveOnset,
    estimate: { basis: ESTIMATE_BASIS, nusselt, vrms, boundaryLayerThickness: thickness },
    grid: {
      rowsPerBoundaryLayer: thickness * params.nz,
      pointStepsPerFrame: params.nx * params.nz * params.playbackSpeed,
      frameBudget: FRAME_BUDGET_POINT_STEPS,
    },
  };
  if (params.physical) {
    const { timeScaleMyr, velocityScaleCmYr } = physicalScales(params.physical);
    derived.physical = {
      depthM: params.physical.depthM,
      timeScaleMyr,
      velocityScaleCmYr,
      boundaryLayerThicknessKm: (thickness * params.physical.depthM) / 1000,
      estimatedSpeedCmYr: vrms * velocityScaleCmYr,
      transitTimeMyr: vrms > 0 ? timeScaleMyr / vrms : null,
      prandtl: params.physical.viscosityPas / (params.physical.densityKgM3 * params.physical.diffusivityM2s),
    };
  }
  return derived;
}
