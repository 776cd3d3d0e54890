import { halfSpaceHeatFlowMWm2, lithosphereThicknessKm, subsidenceM } from '../cooling-lithosphere/half-space.js';
import { lithosphereProperties } from '../cooling-lithosphere/properties.js';
import type { SeaFloorDepthParams, SeaFloorModel } from './params.js';

/**
 * GDH1, the plate model fitted to sea-floor depth and heat flow by Stein and Stein (1992, Nature
 * 359, 123–129): a plate 95 km thick whose base is held at 1450 °C, with ρm = 3330 kg/m³, ρw =
 * 1000 kg/m³, αv = 3.1 × 10⁻⁵ /K and k = 3.138 W/(m·K). Its closed-form fits, t in Myr:
 *   depth  d = 2600 + 365·√t m for t < 20, d = 5651 − 2473·e^(−0.0278·t) m from 20 on;
 *   heat   q = 510/√t mW/m² for t ≤ 55,   q = 48 + 96·e^(−0.0278·t) mW/m² beyond.
 * (Constants as remembered from the paper; the two branches of each meet within 1 m and 0.1 mW/m²,
 * which the tests check.)
 */
export const GDH1 = {
  plateThicknessKm: 95,
  depth: { youngUpToMyr: 20, ridgeM: 2600, sqrtM: 365, asymptoteM: 5651, dropM: 2473, rate: 0.0278 },
  heatFlow: { youngUpToMyr: 55, sqrtMWm2: 510, asymptoteMWm2: 48, dropMWm2: 96, rate: 0.0278 },
} as const;

export function gdh1DepthM(ageMyr: number): number {
  const d = GDH1.depth;
  return ageMyr < d.youngUpToMyr ? d.ridgeM + d.sqrtM * Math.sqrt(ageMyr) : d.asymptoteM - d.dropM * Math.exp(-d.rate * ageMyr);
}

export function gdh1HeatFlowMWm2(ageMyr: number): number {
  const q = GDH1.heatFlow;
  return ageMyr <= q.youngUpToMyr ? q.sqrtMWm2 / Math.sqrt(ageMyr) : q.asymptoteMWm2 + q.dropMWm2 * Math.exp(-q.rate * ageMyr);
}

// A type alias (not an interface) so results fit Record<string, unknown> where live values read them.
export type SeaFloorDepthResult = {
  model: SeaFloorModel;
  /** Below sea level, by the chosen model. */
  depthM: number;
  heatFlowMWm2: number;
  halfSpaceDepthM: number;
  halfSpaceHeatFlowMWm2: number;
  plateDepthM: number;
  plateHeatFlowMWm2: number;
  /** 2.32·√(κt); in the plate model it cannot grow past the plate, 95 km. */
  lithosphereThicknessKm: number;
};

/** Depth, heat flow and lithosphere thickness of sea floor of one age, by both models. */
export function computeSeaFloorDepth(params: SeaFloorDepthParams): SeaFloorDepthResult {
  const properties = lithosphereProperties(params);
  const halfSpaceDepthM = properties.ridgeDepthM + subsidenceM(params.ageMyr, properties);
  const halfSpaceHeatFlow = halfSpaceHeatFlowMWm2(params.ageMyr, properties);
  const plateDepthM = gdh1DepthM(params.ageMyr);
  const plateHeatFlowMWm2 = gdh1HeatFlowMWm2(params.ageMyr);
  const coolingThickness = lithosphereThicknessKm(params.ageMyr, properties.diffusivityM2s);
  const plate = params.model === 'plate';
  return {
    model: params.model,
    depthM: plate ? plateDepthM : halfSpaceDepthM,
    heatFlowMWm2: plate ? plateHeatFlowMWm2 : halfSpaceHeatFlow,
    halfSpaceDepthM,
    halfSpaceHeatFlowMWm2: halfSpaceHeatFlow,
    plateDepthM,
    plateHeatFlowMWm2,
    lithosphereThicknessKm: plate ? Math.min(coolingThickness, GDH1.plateThicknessKm) : coolingThickness,
  };
}
