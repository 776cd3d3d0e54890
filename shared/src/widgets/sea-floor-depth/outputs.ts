import type { WidgetOutput } from '../types.js';
import type { SeaFloorDepthResult } from './compute.js';
import type { SeaFloorDepthParams } from './params.js';
import { seaFloorDepthStates } from './states.js';

type Output = WidgetOutput<SeaFloorDepthParams, SeaFloorDepthResult>;

const depth = (name: 'depthM' | 'halfSpaceDepthM' | 'plateDepthM'): Output => ({ name, kind: 'number', unit: 'm', source: 'settings', read: (result) => result[name] });

/** What the sea-floor depth widget puts out: depth by the chosen model and by each, heat flow, the lithosphere's thickness, and whether the floor still sinks. */
export const seaFloorDepthOutputs: readonly Output[] = [
  depth('depthM'),
  { name: 'heatFlowMWm2', kind: 'number', unit: 'mW/m²', source: 'settings', read: (result) => result.heatFlowMWm2 },
  { name: 'lithosphereThicknessKm', kind: 'number', unit: 'km', source: 'settings', read: (result) => result.lithosphereThicknessKm },
  depth('halfSpaceDepthM'),
  depth('plateDepthM'),
  { name: 'ageMyr', kind: 'number', unit: 'Myr', source: 'settings', read: (_result, params) => params.ageMyr },
  { name: 'depthTrend', kind: 'state', states: seaFloorDepthStates.values, source: 'settings', read: seaFloorDepthStates.read },
];
