import type { WidgetOutput } from '../types.js';
import type { PlateForcesResult } from './compute.js';
import type { PlateForcesParams } from './params.js';
import { plateForcesStates } from './states.js';

type Output = WidgetOutput<PlateForcesParams, PlateForcesResult>;

/** What the plate-forces widget puts out: both forces per metre of boundary, how they compare, which is bigger, and how deep the slab reaches. */
export const plateForcesOutputs: readonly Output[] = [
  { name: 'ridgePushNPerM', kind: 'number', unit: 'N/m', source: 'settings', read: (result) => result.ridgePushNPerM },
  { name: 'slabPullNPerM', kind: 'number', unit: 'N/m', source: 'settings', read: (result) => result.slabPullNPerM },
  { name: 'slabToRidgeRatio', kind: 'number', unit: '', source: 'settings', read: (result) => result.slabToRidgeRatio },
  { name: 'dominantForce', kind: 'state', states: plateForcesStates.values, source: 'settings', read: plateForcesStates.read },
  { name: 'slabTipDepthKm', kind: 'number', unit: 'km', source: 'settings', read: (result) => result.slabTipDepthKm },
];
