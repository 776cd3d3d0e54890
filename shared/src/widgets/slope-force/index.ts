import { interpolate, widgetStrings } from '../../i18n/index.js';
import type { ModelLimitWarning, WidgetModule } from '../types.js';
import { slopeForceModel } from './model-card.js';
import { validateWith } from '../validation.js';
import { computeSlopeForce, type SlopeForceResult } from './compute.js';
import { slopeForceOutputs } from './outputs.js';
import { slopeForceDefaults, slopeForceSchema, type SlopeForceParams } from './params.js';
import { slopeForceStates } from './states.js';
import { formatAcceleration, formatAngle, formatForce, formatMass } from './units.js';

export { computeSlopeForce, criticalAngleDeg, type SlopeForceResult } from './compute.js';
export * from './model-card.js';
export * from './outputs.js';
export * from './params.js';
export * from './states.js';
export * from './units.js';

function describeSlopeForce(params: SlopeForceParams, locale: string): string {
  const result = computeSlopeForce(params);
  const strings = widgetStrings(locale).slopeForce;
  return interpolate(result.slides ? strings.describeSlides : strings.describeHolds, {
    mass: formatMass(params.massKg, locale),
    angle: formatAngle(params.angleDeg, locale),
    weight: formatForce(result.weightN, locale),
    normal: formatForce(result.normalN, locale),
    shear: formatForce(result.shearN, locale),
    maxFriction: formatForce(result.maxStaticFrictionN, locale),
    acceleration: formatAcceleration(result.accelerationMs2, locale),
    critical: formatAngle(result.criticalAngleDeg, locale),
  });
}

/**
 * Where the textbook block on a slope stops being a fair picture of rock: Coulomb friction with one
 * coefficient is an idealisation, and rock on rock rarely grips harder than Byerlee's 0.85.
 */
function slopeForceLimits(params: SlopeForceParams): ModelLimitWarning[] {
  const warnings: ModelLimitWarning[] = [];
  if (params.staticFriction === 0) {
    warnings.push({
      path: ['staticFriction'],
      code: 'frictionless',
      message: 'With no friction at all the block slides at any tilt above 0°; no real surface is frictionless.',
    });
  }
  if (params.staticFriction > 1) {
    warnings.push({
      path: ['staticFriction'],
      code: 'beyond-rock-friction',
      message: `Static friction ${params.staticFriction} is more than rock on rock reaches (about 0.6 to 0.85, Byerlee 1978); only rubber-like contacts grip this hard.`,
    });
  }
  return warnings;
}

export const slopeForce: WidgetModule<SlopeForceParams, SlopeForceResult, 'slope-force'> = {
  type: 'slope-force',
  version: 1,
  schema: slopeForceSchema,
  defaults: slopeForceDefaults,
  validate: (params) => validateWith(slopeForceSchema, params, 'slope force box'),
  compute: computeSlopeForce,
  describe: describeSlopeForce,
  modelLimits: slopeForceLimits,
  outputs: slopeForceOutputs,
  model: slopeForceModel,
  states: slopeForceStates,
};
