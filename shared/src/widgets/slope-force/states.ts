import type { WidgetState, WidgetStates } from '../types.js';
import type { SlopeForceResult } from './compute.js';
import type { SlopeForceParams } from './params.js';

/**
 * The block holds or slides, and the visitor decides which by tilting the slope. The words are
 * the verbs a caption uses to say the block is in one state now; infinitives ("starts to slide")
 * are left out, since they state the rule rather than what the block does.
 */
export const slopeForceStates: WidgetStates<SlopeForceParams, SlopeForceResult, WidgetState> = {
  values: ['holds', 'slides'],
  read: (result) => (result.slides ? 'slides' : 'holds'),
  visitorChangesState: true,
  stateWords: {
    en: ['holds', 'slides', 'sliding', 'slips'],
    fr: ['tient', 'glisse', 'glissent'],
    es: ['sostiene', 'desliza', 'resbala'],
    ar: ['ثابت', 'ثابتة', 'ينزلق', 'تنزلق'],
  },
};
