import type { WidgetParamGroup } from '../types.js';
import { columnsNeeded, boundaryLayerThickness, estimatedNusselt, rowsNeeded, smallestGridAtLeast } from './derived.js';
import { convectionCellDefaults, RAYLEIGH_RANGE, type PhysicalInputs } from './params.js';
import { rayleighFromPhysical } from './solver.js';

/**
 * Typical upper-mantle properties, where a curator starts when switching a convection cell to
 * physical properties. They give Ra ≈ 3.6 × 10⁵.
 */
export const UPPER_MANTLE: PhysicalInputs = {
  densityKgM3: 3300,
  gravityMs2: 9.8,
  expansivityPerK: 3e-5,
  deltaTK: 1300,
  depthM: 660_000,
  diffusivityM2s: 1e-6,
  viscosityPas: 1e21,
};

export const UPPER_MANTLE_SOURCES: Readonly<Record<keyof PhysicalInputs, string>> = {
  densityKgM3: 'Typical upper-mantle rock, about 3300 kg/m³ (Turcotte and Schubert, Geodynamics; value from memory).',
  gravityMs2: 'Close to standard gravity, 9.80665 m/s² (3rd CGPM, 1901); gravity changes little through the upper mantle (common practice, no source).',
  expansivityPerK: 'Typical mantle rock, about 3 × 10⁻⁵ per kelvin (Turcotte and Schubert, Geodynamics; value from memory).',
  deltaTK: 'About the mantle’s potential temperature above the surface, some 1300 K (common practice, no source).',
  depthM: 'The upper mantle ends near the seismic discontinuity at 660 km (common practice, no source).',
  diffusivityM2s: 'Typical mantle rock, about 10⁻⁶ m²/s (Turcotte and Schubert, Geodynamics; value from memory).',
  viscosityPas: 'Upper-mantle viscosity is of order 10²¹ Pa·s (common practice, no source).',
};

const numberOr = (value: unknown, fallback: number) => (typeof value === 'number' && Number.isFinite(value) ? value : fallback);

/** Grid sizes raised (never lowered) until they resolve the boundary layers of this Ra, as the resolution rule asks. */
function gridFor(params: Record<string, unknown>, rayleigh: number): { nx: number; nz: number } {
  const aspectRatio = numberOr(params.aspectRatio, convectionCellDefaults.aspectRatio);
  const thickness = boundaryLayerThickness(estimatedNusselt(rayleigh, aspectRatio));
  const fit = (current: unknown, need: number) => Math.max(numberOr(current, 0), smallestGridAtLeast(need) ?? 0);
  return { nx: fit(params.nx, columnsNeeded(thickness, aspectRatio)), nz: fit(params.nz, rowsNeeded(thickness)) };
}

/**
 * The convection cell's physical properties as an optional group. Ra and physical properties are
 * two ways of setting the same thing, so switching one on takes the other off; the Ra kept on the
 * way back is the one the properties gave, so the picture does not jump.
 */
export const physicalGroup: WidgetParamGroup = {
  switchOn(params) {
    const { rayleigh: _replaced, ...rest } = params;
    return { ...rest, ...gridFor(rest, rayleighFromPhysical(UPPER_MANTLE)), physical: { ...UPPER_MANTLE }, units: 'physical' };
  },
  switchOff(params) {
    const { physical, ...rest } = params;
    // Properties that give no usable Ra (half typed, out of range) leave the default one.
    const computed = typeof physical === 'object' && physical !== null ? rayleighFromPhysical(physical as PhysicalInputs) : Number.NaN;
    const usable = computed >= RAYLEIGH_RANGE.min && computed <= RAYLEIGH_RANGE.max;
    return { ...rest, rayleigh: usable ? Number(computed.toPrecision(3)) : convectionCellDefaults.rayleigh, units: 'non-dimensional' };
  },
  sources: UPPER_MANTLE_SOURCES,
};
