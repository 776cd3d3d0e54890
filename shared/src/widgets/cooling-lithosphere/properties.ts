import { boundedNumber } from '../validation.js';
import { STANDARD_GRAVITY } from '../slope-force/params.js';

/**
 * The half-space model's physical properties, each optional with a default. The defaults are the
 * values Turcotte and Schubert (Geodynamics, chapter 4, sea-floor subsidence and heat flow) work
 * their examples with (from memory of the book, not checked against a copy at hand); the ridge depth
 * is Parsons and Sclater's (1977, Journal of Geophysical Research 82, 803–827) fit.
 */
const LITHOSPHERE_DEFAULTS = {
  mantleDensityKgM3: 3300,
  waterDensityKgM3: 1000,
  expansivityPerK: 3e-5,
  deltaTK: 1300,
  diffusivityM2s: 1e-6,
  ridgeDepthM: 2500,
  conductivityWmK: 3.3,
  gravityMs2: STANDARD_GRAVITY,
} as const;

export type LithosphereProperties = { -readonly [K in keyof typeof LITHOSPHERE_DEFAULTS]: number };

const TEXTBOOK = 'Turcotte and Schubert, Geodynamics; value from memory';

/** Where each default comes from, in a few words for a form's range message. */
const LITHOSPHERE_SOURCES: Readonly<Record<keyof LithosphereProperties, string>> = {
  mantleDensityKgM3: TEXTBOOK,
  waterDensityKgM3: TEXTBOOK,
  expansivityPerK: TEXTBOOK,
  deltaTK: TEXTBOOK,
  diffusivityM2s: TEXTBOOK,
  ridgeDepthM: 'Parsons and Sclater 1977',
  conductivityWmK: TEXTBOOK,
  gravityMs2: 'standard gravity, 3rd CGPM 1901',
};

const leaveOut = (key: keyof LithosphereProperties, shown: string) => `leave it out for ${shown}, ${LITHOSPHERE_SOURCES[key]}`;

/**
 * Each property's field. The ranges hold Earth's oceanic lithosphere and upper mantle with room to
 * spare (common practice, no source); outside them the model would describe some other planet.
 */
export const lithosphereFields = {
  mantleDensityKgM3: boundedNumber({ label: 'Mantle density ρm', unit: 'kg/m³', min: 3000, max: 3600, reason: leaveOut('mantleDensityKgM3', '3300 kg/m³') }).optional(),
  waterDensityKgM3: boundedNumber({ label: 'Sea-water density ρw', unit: 'kg/m³', min: 1000, max: 1100, reason: leaveOut('waterDensityKgM3', '1000 kg/m³') }).optional(),
  expansivityPerK: boundedNumber({ label: 'Thermal expansivity αv', unit: '1/K', min: 1e-5, max: 5e-5, reason: leaveOut('expansivityPerK', '3 × 10^-5 1/K') }).optional(),
  deltaTK: boundedNumber({ label: 'Mantle temperature above the sea floor ΔT', unit: 'K', min: 500, max: 2000, reason: leaveOut('deltaTK', '1300 K') }).optional(),
  diffusivityM2s: boundedNumber({ label: 'Thermal diffusivity κ', unit: 'm²/s', min: 3e-7, max: 3e-6, reason: leaveOut('diffusivityM2s', '10^-6 m²/s') }).optional(),
} as const;

export const ridgeDepthField = boundedNumber({ label: 'Depth of the ridge crest', unit: 'm', min: 1000, max: 4000, reason: leaveOut('ridgeDepthM', '2500 m') }).optional();
export const conductivityField = boundedNumber({ label: 'Thermal conductivity k', unit: 'W/(m·K)', min: 1, max: 6, reason: leaveOut('conductivityWmK', '3.3 W/(m·K)') }).optional();
export const gravityField = boundedNumber({ label: 'Gravity g', unit: 'm/s²', min: 9.7, max: 10, reason: `Earth's, from the poles to the equator and rounded to 10 in textbooks; ${leaveOut('gravityMs2', '9.80665 m/s²')}` }).optional();

/** The properties a widget's params leave out, filled with the defaults. */
export const lithosphereProperties = (params: Partial<LithosphereProperties>): LithosphereProperties => ({
  mantleDensityKgM3: params.mantleDensityKgM3 ?? LITHOSPHERE_DEFAULTS.mantleDensityKgM3,
  waterDensityKgM3: params.waterDensityKgM3 ?? LITHOSPHERE_DEFAULTS.waterDensityKgM3,
  expansivityPerK: params.expansivityPerK ?? LITHOSPHERE_DEFAULTS.expansivityPerK,
  deltaTK: params.deltaTK ?? LITHOSPHERE_DEFAULTS.deltaTK,
  diffusivityM2s: params.diffusivityM2s ?? LITHOSPHERE_DEFAULTS.diffusivityM2s,
  ridgeDepthM: params.ridgeDepthM ?? LITHOSPHERE_DEFAULTS.ridgeDepthM,
  conductivityWmK: params.conductivityWmK ?? LITHOSPHERE_DEFAULTS.conductivityWmK,
  gravityMs2: params.gravityMs2 ?? LITHOSPHERE_DEFAULTS.gravityMs2,
});
