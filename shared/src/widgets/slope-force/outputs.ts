import type { WidgetOutput } from '../types.js';
import type { SlopeForceResult } from './compute.js';
import type { SlopeForceParams } from './params.js';
import { slopeForceStates } from './states.js';

type Output = WidgetOutput<SlopeForceParams, SlopeForceResult>;

const force = (name: keyof SlopeForceResult & `${string}N`): Output => ({
  name,
  kind: 'number',
  unit: 'N',
  source: 'settings',
  read: (result) => result[name],
});

/** What the slope force box puts out: the split of the weight, friction, whether the block holds, and where it starts to slide. */
export const slopeForceOutputs: readonly Output[] = [
  force('weightN'),
  force('normalN'),
  force('shearN'),
  force('maxStaticFrictionN'),
  force('frictionN'),
  force('netForceN'),
  { name: 'state', kind: 'state', states: ['holds', 'slides'], source: 'settings', read: slopeForceStates.read },
  { name: 'criticalAngleDeg', kind: 'number', unit: '°', source: 'settings', read: (result) => result.criticalAngleDeg },
  { name: 'accelerationMs2', kind: 'number', unit: 'm/s²', source: 'settings', read: (result) => result.accelerationMs2 },
];
