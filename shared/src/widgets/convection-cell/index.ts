import { formatQuantity, interpolate, widgetStrings } from '../../i18n/index.js';
import type { ModelLimitWarning, WidgetModule } from '../types.js';
import { convectionCellModel } from './model-card.js';
import { formatLimit, validateWith, whenFieldsValid } from '../validation.js';
import { deriveConvectionCell, type ConvectionCellDerived } from './derived.js';
import { convectionCellDefaults, convectionCellFields, type ConvectionCellParams } from './params.js';
import { convectionCellOutputs } from './outputs.js';
import { checkFrameBudget, checkResolution, checkSource } from './rules.js';
import { physicalGroup } from './upper-mantle.js';

export * from './colour-ramps.js';
export * from './derived.js';
export * from './model-card.js';
export * from './outputs.js';
export * from './params.js';
export * from './solver.js';
export * from './upper-mantle.js';

/** The rules no single field can check, each run once the settings it reads are valid on their own. */
export const convectionCellSchema = convectionCellFields
  .superRefine(checkSource, whenFieldsValid('rayleigh', 'physical', 'units'))
  .superRefine(checkResolution, whenFieldsValid('rayleigh', 'physical', 'aspectRatio', 'nx', 'nz'))
  .superRefine(checkFrameBudget, whenFieldsValid('nx', 'nz', 'playbackSpeed'))
  .meta({ title: 'Convection cell' });

export function formatMillionYears(myr: number, locale: string): string {
  return interpolate(widgetStrings(locale).convectionCell.millionYears, { value: formatQuantity(myr, '', locale) });
}

export const formatSpeedCmYr = (cmYr: number, locale: string): string =>
  formatQuantity(cmYr, widgetStrings(locale).convectionCell.speedUnit, locale);

const formatDepth = (metres: number, locale: string) =>
  metres >= 1000 ? formatQuantity(metres / 1000, 'km', locale) : formatQuantity(metres, 'm', locale);

function describeConvectionCell(params: ConvectionCellParams, locale: string): string {
  const derived = deriveConvectionCell(params);
  const strings = widgetStrings(locale).convectionCell;
  const values = {
    aspect: formatQuantity(params.aspectRatio, '', locale),
    rayleigh: formatQuantity(derived.rayleigh, '', locale),
    onset: formatQuantity(derived.onsetRayleigh, '', locale, 4),
    nusselt: formatQuantity(derived.estimate.nusselt, '', locale, 2),
  };
  const state = interpolate(derived.aboveOnset ? strings.describeConvecting : strings.describeStill, values);
  const physical = derived.physical;
  if (!physical || physical.transitTimeMyr === null) return state;
  return `${state} ${interpolate(strings.describePhysical, {
    depth: formatDepth(physical.depthM, locale),
    speed: formatSpeedCmYr(physical.estimatedSpeedCmYr, locale),
    transit: formatMillionYears(physical.transitTimeMyr, locale),
  })}`;
}

/** Settings that pass validation but take the model where it no longer describes the rock. */
function convectionCellLimits(params: ConvectionCellParams): ModelLimitWarning[] {
  const derived = deriveConvectionCell(params);
  const warnings: ModelLimitWarning[] = [];
  const source = params.physical ? ['physical'] : ['rayleigh'];
  if (!derived.aboveOnset) {
    warnings.push({
      path: source,
      code: 'below-onset',
      message: `Ra = ${formatLimit(derived.rayleigh)} is below the onset of convection for this box (${formatLimit(Math.round(derived.onsetRayleigh))}): nothing moves, heat only conducts.`,
    });
  } else if (derived.rayleigh < 1e4) {
    warnings.push({
      path: source,
      code: 'estimate-rough',
      message: `Close to onset (Ra below 10^4) the boundary-layer estimates of heat flow and speed are rough; the live readouts from the solver are the ones to quote.`,
    });
  }
  if (derived.physical && derived.physical.prandtl < 100) {
    warnings.push({
      path: ['physical', 'viscosityPas'],
      code: 'finite-prandtl',
      message: `The model ignores the rock's inertia, which holds when the Prandtl number is large (mantle rock: about 10^23); these properties give ${formatLimit(derived.physical.prandtl)}, so a real fluid like this would flow differently.`,
    });
  }
  return warnings;
}

export const convectionCell: WidgetModule<ConvectionCellParams, ConvectionCellDerived, 'convection-cell'> = {
  type: 'convection-cell',
  version: 1,
  schema: convectionCellSchema,
  defaults: convectionCellDefaults,
  validate: (params) => validateWith(convectionCellSchema, params, 'convection cell'),
  compute: deriveConvectionCell,
  describe: describeConvectionCell,
  modelLimits: convectionCellLimits,
  outputs: convectionCellOutputs,
  model: convectionCellModel,
  paramGroups: { physical: physicalGroup },
};
