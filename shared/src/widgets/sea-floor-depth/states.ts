import type { WidgetStates } from '../types.js';
import type { SeaFloorDepthResult } from './compute.js';
import type { SeaFloorDepthParams } from './params.js';

/** Parsons and Sclater (1977) found depth growing as √age only up to about 70 Myr; older floor levels off. */
export const HALF_SPACE_HOLDS_UP_TO_MYR = 70;

const SEA_FLOOR_STATES = ['still-sinking', 'levelling-off'] as const;
export type SeaFloorState = (typeof SEA_FLOOR_STATES)[number];

/**
 * Whether the floor the visitor sees still sinks as √age or levels off. The plate model levels off
 * past 70 Myr (Parsons and Sclater 1977); the half-space model, drawn when a curator chooses it,
 * sinks as √age at any age, so a caption never says the chosen curve flattens where it does not.
 */
export const seaFloorDepthStates: WidgetStates<SeaFloorDepthParams, SeaFloorDepthResult, SeaFloorState> = {
  values: SEA_FLOOR_STATES,
  read: (_result, params) => (params.model === 'plate' && params.ageMyr > HALF_SPACE_HOLDS_UP_TO_MYR ? 'levelling-off' : 'still-sinking'),
  visitorChangesState: true,
  // Only words that name the levelling: "sinks" is everywhere in a story about slabs.
  stateWords: {
    en: ['levels', 'levelling', 'leveling', 'flattens', 'flattening'],
    fr: ['stabilise', 'aplatit'],
    es: ['estabiliza', 'aplana'],
    ar: ['يستقر'],
  },
};
