import { formatQuantity, interpolate, widgetStrings } from '../../i18n/index.js';
import { formatLiveValue } from '../../panel/live-value/live-value-format.js';
import { formatMillionYears } from '../convection-cell/index.js';
import type { ModelLimitWarning, WidgetModule } from '../types.js';
import { formatLimit, validateWith } from '../validation.js';
import { computePlateForces, type PlateForcesResult } from './compute.js';
import { plateForcesModel } from './model-card.js';
import { plateForcesOutputs } from './outputs.js';
import { plateForcesDefaults, plateForcesSchema, type PlateForcesParams } from './params.js';
import { plateForcesStates } from './states.js';

export * from './compute.js';
export * from './model-card.js';
export * from './outputs.js';
export * from './params.js';
export * from './states.js';

/** Below the 660 km discontinuity the mantle stiffens and minerals change phase (common practice, no source). */
export const UPPER_MANTLE_BASE_KM = 660;
/** Plates younger than this are warm and light, and rarely sink on their own (common practice, no source). */
const YOUNGEST_SINKING_PLATE_MYR = 10;

/** "3.9 × 10¹² N/m": forces per metre of boundary are far past any everyday number. */
export const formatForcePerMetre = (newtonsPerMetre: number, locale: string): string => formatLiveValue(newtonsPerMetre, { digits: 2, unit: 'N/m' }, locale);

function describePlateForces(params: PlateForcesParams, locale: string): string {
  const result = computePlateForces(params);
  return interpolate(widgetStrings(locale).plateForces.describe, {
    age: formatMillionYears(params.ageMyr, locale),
    length: formatQuantity(params.slabLengthKm, 'km', locale),
    dip: formatQuantity(params.slabDipDeg, '°', locale),
    ridgePush: formatForcePerMetre(result.ridgePushNPerM, locale),
    slabPull: formatForcePerMetre(result.slabPullNPerM, locale),
    ratio: formatQuantity(result.slabToRidgeRatio, '', locale, 2),
  });
}

/** Where the model card's range says the estimate gets rougher still. */
function plateForcesLimits(params: PlateForcesParams): ModelLimitWarning[] {
  const warnings: ModelLimitWarning[] = [];
  const { slabTipDepthKm } = computePlateForces(params);
  if (slabTipDepthKm > UPPER_MANTLE_BASE_KM) {
    warnings.push({
      path: ['slabLengthKm'],
      code: 'slab-below-upper-mantle',
      message: `The slab's tip is ${formatLimit(Math.round(slabTipDepthKm))} km down, below the ${UPPER_MANTLE_BASE_KM} km discontinuity, where the mantle stiffens and minerals change phase; the model counts neither, so its pull is rougher still.`,
    });
  }
  if (params.ageMyr < YOUNGEST_SINKING_PLATE_MYR) {
    warnings.push({
      path: ['ageMyr'],
      code: 'young-plate',
      message: `A plate ${formatLimit(params.ageMyr)} Myr old is still warm and light; plates this young rarely sink on their own, so the pull shown is not one a real trench would see.`,
    });
  }
  return warnings;
}

export const plateForces: WidgetModule<PlateForcesParams, PlateForcesResult, 'plate-forces'> = {
  type: 'plate-forces',
  version: 1,
  schema: plateForcesSchema,
  defaults: plateForcesDefaults,
  validate: (params) => validateWith(plateForcesSchema, params, 'plate-forces widget'),
  compute: computePlateForces,
  describe: describePlateForces,
  modelLimits: plateForcesLimits,
  outputs: plateForcesOutputs,
  model: plateForcesModel,
  states: plateForcesStates,
};
