import type { WidgetStates } from '../types.js';
import type { PlateForcesResult } from './compute.js';
import type { PlateForcesParams } from './params.js';

const PLATE_FORCE_STATES = ['slab-pull-dominates', 'ridge-push-dominates'] as const;
export type PlateForceState = (typeof PLATE_FORCE_STATES)[number];

/**
 * Which force is bigger. A visitor decides by the slab's length: at 100 Myr the pull passes the
 * push once the slab is some 50 km long. The words are those a caption would use to say which wins.
 */
export const plateForcesStates: WidgetStates<PlateForcesParams, PlateForcesResult, PlateForceState> = {
  values: PLATE_FORCE_STATES,
  read: (result) => (result.slabPullDominates ? 'slab-pull-dominates' : 'ridge-push-dominates'),
  visitorChangesState: true,
  stateWords: {
    en: ['dominates', 'dominate', 'stronger', 'bigger', 'wins', 'outweighs'],
    fr: ['domine', 'dominent', 'plus forte', 'plus fort', "l'emporte"],
    es: ['domina', 'dominan', 'más fuerte', 'mayor', 'gana'],
    ar: ['يغلب', 'أقوى', 'أكبر', 'يتفوق'],
  },
};
