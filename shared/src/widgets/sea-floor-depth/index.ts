import { interpolate, widgetStrings } from '../../i18n/index.js';
import { formatMillionYears } from '../convection-cell/index.js';
import type { ModelLimitWarning, WidgetModule } from '../types.js';
import { formatLimit, validateWith } from '../validation.js';
import { computeSeaFloorDepth, gdh1DepthM, type SeaFloorDepthResult } from './compute.js';
import { seaFloorDepthModel } from './model-card.js';
import { seaFloorDepthOutputs } from './outputs.js';
import { seaFloorDepthDefaults, seaFloorDepthSchema, type SeaFloorDepthParams } from './params.js';
import { HALF_SPACE_HOLDS_UP_TO_MYR, seaFloorDepthStates } from './states.js';
import { formatDepthKm, formatHeatFlow, formatThicknessKm } from './units.js';

export * from './compute.js';
export * from './model-card.js';
export * from './outputs.js';
export * from './params.js';
export * from './states.js';
export * from './units.js';

/** Hardly any sea floor is older (common practice, no source). */
const OLDEST_SEA_FLOOR_MYR = 180;

function describeSeaFloorDepth(params: SeaFloorDepthParams, locale: string): string {
  const result = computeSeaFloorDepth(params);
  const strings = widgetStrings(locale).seaFloorDepth;
  return interpolate(strings.describe, {
    age: formatMillionYears(params.ageMyr, locale),
    depth: formatDepthKm(result.depthM, locale),
    model: (params.model === 'plate' ? strings.plate : strings.halfSpace).toLocaleLowerCase(locale),
    heatFlow: formatHeatFlow(result.heatFlowMWm2, locale),
    thickness: formatThicknessKm(result.lithosphereThicknessKm, locale),
    halfSpace: formatDepthKm(result.halfSpaceDepthM, locale),
    plate: formatDepthKm(result.plateDepthM, locale),
  });
}

/** Where the model card's range says the chosen model stops matching the sea floor. */
function seaFloorDepthLimits(params: SeaFloorDepthParams): ModelLimitWarning[] {
  const warnings: ModelLimitWarning[] = [];
  if (params.model === 'half-space' && params.ageMyr > HALF_SPACE_HOLDS_UP_TO_MYR) {
    const result = computeSeaFloorDepth(params);
    warnings.push({
      path: ['ageMyr'],
      code: 'half-space-old-floor',
      message: `The half-space model matches measured depths only up to about ${HALF_SPACE_HOLDS_UP_TO_MYR} Myr (Parsons and Sclater 1977); at ${formatLimit(params.ageMyr)} Myr it puts the floor ${formatLimit(Math.round(result.halfSpaceDepthM - gdh1DepthM(params.ageMyr)))} m deeper than the plate model fitted to measurements (GDH1, Stein and Stein 1992). Choose the plate model, or a younger floor.`,
    });
  }
  if (params.ageMyr > OLDEST_SEA_FLOOR_MYR) {
    warnings.push({
      path: ['ageMyr'],
      code: 'older-than-any-sea-floor',
      message: `Hardly any sea floor is older than about ${OLDEST_SEA_FLOOR_MYR} Myr: older floor has sunk back into the mantle, so no measurement checks the model at ${formatLimit(params.ageMyr)} Myr.`,
    });
  }
  return warnings;
}

export const seaFloorDepth: WidgetModule<SeaFloorDepthParams, SeaFloorDepthResult, 'sea-floor-depth'> = {
  type: 'sea-floor-depth',
  version: 1,
  schema: seaFloorDepthSchema,
  defaults: seaFloorDepthDefaults,
  validate: (params) => validateWith(seaFloorDepthSchema, params, 'sea-floor depth widget'),
  compute: computeSeaFloorDepth,
  describe: describeSeaFloorDepth,
  modelLimits: seaFloorDepthLimits,
  outputs: seaFloorDepthOutputs,
  model: seaFloorDepthModel,
  states: seaFloorDepthStates,
};
