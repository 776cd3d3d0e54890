import { z } from '../../zod.js';
import { boundedNumber } from '../validation.js';
import { conductivityField, lithosphereFields, ridgeDepthField } from '../cooling-lithosphere/properties.js';

const SEA_FLOOR_MODELS = ['half-space', 'plate'] as const;
export type SeaFloorModel = (typeof SEA_FLOOR_MODELS)[number];

/** From the ridge crest (0) to older than any sea floor left on Earth, about 180 Myr (common practice, no source). */
export const SEA_FLOOR_AGE_MAX_MYR = 200;

export const seaFloorDepthSchema = z
  .strictObject({
    ageMyr: boundedNumber({
      label: 'Age of the sea floor',
      unit: 'Myr',
      min: 0,
      max: SEA_FLOOR_AGE_MAX_MYR,
      minExclusive: true,
      reason: 'at the crest itself, age 0, the models give an endless heat flow',
    }),
    model: z.enum(SEA_FLOOR_MODELS, { error: `Model must be one of ${SEA_FLOOR_MODELS.join(', ')}.` }).meta({ title: 'Model' }),
    ...lithosphereFields,
    ridgeDepthM: ridgeDepthField,
    conductivityWmK: conductivityField,
  })
  .meta({ title: 'Sea-floor depth' });

export type SeaFloorDepthParams = z.infer<typeof seaFloorDepthSchema>;

/** Sea floor as old as the Atlantic's middle, where the two models are still close. */
export const seaFloorDepthDefaults: SeaFloorDepthParams = { ageMyr: 50, model: 'plate' };
