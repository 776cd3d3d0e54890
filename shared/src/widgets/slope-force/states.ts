import type { WidgetState, WidgetStates } from '../types.js';
import type { SlopeForceResult } from './compute.js';
import type { SlopeForceParams } from './params.js';

/**
 * The block holds or slides, and the visitor decides which by tilting the slope. The words are
 * the verbs a caption would use for either state in each visitor language.
 */
export const slopeForceStates: WidgetStates<SlopeForceParams, SlopeForceResult, WidgetState> = {
  values: ['holds', 'slides'],
  read: (result) => (result.slides ? 'slides' : 'holds'),
  visitorChangesState: true,
  stateWords: {
    en: ['holds', 'hold', 'holding', 'slides', 'slide', 'sliding', 'slips', 'slipping'],
    fr: ['tient', 'tenir', 'glisse', 'glisser', 'glissent'],
    es: ['sostiene', 'sostenerse', 'desliza', 'deslizarse', 'resbala'],
    ar: ['ثابت', 'ثابتة', 'ينزلق', 'تنزلق', 'الانزلاق'],
  },
};
