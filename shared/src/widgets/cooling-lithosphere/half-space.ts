import type { LithosphereProperties } from './properties.js';

/** A million Julian years (365.25 days), in seconds. */
export const SECONDS_PER_MYR = 1e6 * 365.25 * 86_400;

/**
 * 2·erfc⁻¹(0.1) ≈ 2.32: the depth, in units of √(κt), where a cooling half-space has come back to
 * 90 % of the mantle's temperature; Turcotte and Schubert take it as the lithosphere's base.
 */
const THICKNESS_FACTOR = 2.32;

type Properties = Pick<LithosphereProperties, 'mantleDensityKgM3' | 'waterDensityKgM3' | 'expansivityPerK' | 'deltaTK' | 'diffusivityM2s'>;

/** √(κt/π) in metres: the length over which a half-space of age t has cooled. */
const coolingLength = (ageMyr: number, diffusivityM2s: number) => Math.sqrt((diffusivityM2s * ageMyr * SECONDS_PER_MYR) / Math.PI);

/**
 * How far sea floor of this age has sunk below the ridge crest, in metres: isostasy of a cooling
 * half-space, w = 2ρm·αv·ΔT/(ρm − ρw) · √(κt/π) (Turcotte and Schubert, Geodynamics, section on
 * the subsidence of the sea floor).
 */
export function subsidenceM(ageMyr: number, p: Properties): number {
  return ((2 * p.mantleDensityKgM3 * p.expansivityPerK * p.deltaTK) / (p.mantleDensityKgM3 - p.waterDensityKgM3)) * coolingLength(ageMyr, p.diffusivityM2s);
}

/** Surface heat flow of the cooling half-space, q = k·ΔT/√(πκt), in mW/m² (Turcotte and Schubert, Geodynamics). */
export function halfSpaceHeatFlowMWm2(ageMyr: number, p: Pick<LithosphereProperties, 'conductivityWmK' | 'deltaTK' | 'diffusivityM2s'>): number {
  return ((p.conductivityWmK * p.deltaTK) / Math.sqrt(Math.PI * p.diffusivityM2s * ageMyr * SECONDS_PER_MYR)) * 1000;
}

/** Thickness of the cooled lithosphere, yL = 2.32·√(κt), in km (Turcotte and Schubert, Geodynamics). */
export function lithosphereThicknessKm(ageMyr: number, diffusivityM2s: number): number {
  return (THICKNESS_FACTOR * Math.sqrt(diffusivityM2s * ageMyr * SECONDS_PER_MYR)) / 1000;
}

/**
 * Ridge push per metre of ridge on a plate of age t, F = g·ρm·αv·ΔT·κ·t·[1 + 2ρm·αv·ΔT/(π(ρm − ρw))]
 * (Turcotte and Schubert, Geodynamics, chapter on plate driving forces): the sideways push of the
 * raised, warm ridge on the older, colder and deeper plate.
 */
export function ridgePushNPerM(ageMyr: number, p: Properties & Pick<LithosphereProperties, 'gravityMs2'>): number {
  const thermal = p.mantleDensityKgM3 * p.expansivityPerK * p.deltaTK;
  const seconds = ageMyr * SECONDS_PER_MYR;
  return p.gravityMs2 * thermal * p.diffusivityM2s * seconds * (1 + (2 * thermal) / (Math.PI * (p.mantleDensityKgM3 - p.waterDensityKgM3)));
}

/**
 * The cooled plate's temperature deficit integrated through its thickness, ∫(T_mantle − T)dy =
 * 2ΔT·√(κt/π), in K·m; times ρm·αv it is the extra mass per square metre that makes an old plate
 * sink (Turcotte and Schubert, Geodynamics).
 */
export const temperatureDeficitKelvinMetres = (ageMyr: number, p: Pick<LithosphereProperties, 'deltaTK' | 'diffusivityM2s'>): number =>
  2 * p.deltaTK * coolingLength(ageMyr, p.diffusivityM2s);
