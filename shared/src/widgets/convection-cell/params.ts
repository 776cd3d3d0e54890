import { z } from '../../zod.js';
import { boundedNumber } from '../validation.js';
import { COLOUR_RAMP_NAMES } from './colour-ramps.js';

/** Grid sizes the solver's sine transforms take (powers of two), points per side. */
export const GRID_SIZES = [16, 32, 64, 128, 256, 512] as const;

export const OVERLAYS = ['streamlines', 'particles', 'arrows', 'none'] as const;
export const UNIT_SYSTEMS = ['non-dimensional', 'physical'] as const;

/**
 * Ra the widget accepts. Below about 100 nothing moves for a long way either side of it; above
 * 10⁷ the boundary layers need a grid finer than a kiosk can step (the grid rule refuses most of
 * that range anyway).
 */
export const RAYLEIGH_RANGE = { min: 100, max: 1e7 } as const;

const gridSize = (label: string) => {
  const error = `${label} must be one of ${GRID_SIZES.join(', ')} grid points (the solver's transforms need a power of two).`;
  return z.literal(GRID_SIZES, { error }).meta({ title: label, unit: 'points' });
};

/** Physical properties of the rock in the box; broad enough for a lab tank of syrup as well as the mantle. */
export const physicalInputsSchema = z
  .strictObject({
    densityKgM3: boundedNumber({ label: 'Density', unit: 'kg/m³', min: 500, max: 15_000 }),
    gravityMs2: boundedNumber({ label: 'Gravity', unit: 'm/s²', min: 0.5, max: 25 }),
    expansivityPerK: boundedNumber({ label: 'Thermal expansivity', unit: '1/K', min: 1e-6, max: 1e-3 }),
    deltaTK: boundedNumber({ label: 'Temperature difference, bottom to top', unit: 'K', min: 0, max: 5000, minExclusive: true }),
    depthM: boundedNumber({ label: 'Depth of the box', unit: 'm', min: 0.01, max: 3e6, reason: 'a lab tank up to the whole mantle, 2900 km' }),
    diffusivityM2s: boundedNumber({ label: 'Thermal diffusivity', unit: 'm²/s', min: 1e-8, max: 1e-4 }),
    viscosityPas: boundedNumber({ label: 'Viscosity', unit: 'Pa·s', min: 1e-3, max: 1e25 }),
  })
  .meta({ title: 'Physical properties' });

export type PhysicalInputs = z.infer<typeof physicalInputsSchema>;

export const convectionCellFields = z.strictObject({
  rayleigh: boundedNumber({ label: 'Rayleigh number Ra', unit: '', ...RAYLEIGH_RANGE }).optional(),
  physical: physicalInputsSchema.optional(),
  aspectRatio: boundedNumber({ label: 'Aspect ratio (width ÷ depth)', unit: '', min: 0.5, max: 4 }),
  nx: gridSize('Grid width nx'),
  nz: gridSize('Grid height nz'),
  playbackSpeed: boundedNumber({ label: 'Playback speed', unit: 'steps per frame', min: 0.25, max: 8 }),
  colourRamp: z
    .enum(COLOUR_RAMP_NAMES, { error: `Colour ramp must be one of ${COLOUR_RAMP_NAMES.join(', ')}.` })
    .meta({ title: 'Colour ramp' }),
  overlay: z.enum(OVERLAYS, { error: `Overlay must be one of ${OVERLAYS.join(', ')}.` }).meta({ title: 'Overlay' }),
  units: z.enum(UNIT_SYSTEMS, { error: `Units must be one of ${UNIT_SYSTEMS.join(', ')}.` }).meta({ title: 'Units' }),
});

export type ConvectionCellParams = z.infer<typeof convectionCellFields>;

/** Blankenbach et al. (1989) case 1a: the unit square at Ra = 10⁴, on a grid that resolves it. */
export const convectionCellDefaults: ConvectionCellParams = {
  rayleigh: 1e4,
  aspectRatio: 1,
  nx: 64,
  nz: 64,
  playbackSpeed: 2,
  colourRamp: 'mantle-heat',
  overlay: 'streamlines',
  units: 'non-dimensional',
};
