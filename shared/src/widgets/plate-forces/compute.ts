import { ridgePushNPerM, temperatureDeficitKelvinMetres } from '../cooling-lithosphere/half-space.js';
import { lithosphereProperties } from '../cooling-lithosphere/properties.js';
import type { PlateForcesParams } from './params.js';

// A type alias (not an interface) so results fit Record<string, unknown> where live values read them.
export type PlateForcesResult = {
  /** Per metre along the ridge, from the plate's age at the trench. */
  ridgePushNPerM: number;
  /** Excess weight of the slab per metre along the trench. */
  slabPullNPerM: number;
  slabToRidgeRatio: number;
  slabPullDominates: boolean;
  /** How deep the slab's tip is, L·sin(dip). */
  slabTipDepthKm: number;
};

const DEG = Math.PI / 180;

/**
 * Ridge push and slab pull per metre of plate boundary (Turcotte and Schubert, Geodynamics, plate
 * driving forces). Slab pull is the weight of the slab's thermal density excess: its temperature
 * deficit 2ΔT·√(κt/π) per square metre of slab, times ρm·αv·g, along its length L.
 */
export function computePlateForces(params: PlateForcesParams): PlateForcesResult {
  const p = lithosphereProperties(params);
  const ridgePush = ridgePushNPerM(params.ageMyr, p);
  const slabPull = p.mantleDensityKgM3 * p.expansivityPerK * p.gravityMs2 * temperatureDeficitKelvinMetres(params.ageMyr, p) * params.slabLengthKm * 1000;
  return {
    ridgePushNPerM: ridgePush,
    slabPullNPerM: slabPull,
    slabToRidgeRatio: slabPull / ridgePush,
    slabPullDominates: slabPull > ridgePush,
    slabTipDepthKm: params.slabDipDeg === 90 ? params.slabLengthKm : params.slabLengthKm * Math.sin(params.slabDipDeg * DEG),
  };
}
