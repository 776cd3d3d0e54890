import { z } from '../../zod.js';
import { boundedNumber } from '../validation.js';
import { gravityField, lithosphereFields } from '../cooling-lithosphere/properties.js';

/** A slab can reach at most the core–mantle boundary, about 2890 km down (common practice, no source). */
export const SLAB_LENGTH_MAX_KM = 2800;

export const plateForcesSchema = z
  .strictObject({
    ageMyr: boundedNumber({
      label: 'Age of the plate at the trench',
      unit: 'Myr',
      min: 0,
      max: 200,
      minExclusive: true,
      reason: 'new plate at the ridge, age 0, has no cooled lithosphere to push or pull',
    }),
    slabLengthKm: boundedNumber({ label: 'Length of the sinking slab', unit: 'km', min: 0, max: SLAB_LENGTH_MAX_KM, reason: 'down to the bottom of the mantle, about 2890 km' }),
    slabDipDeg: boundedNumber({ label: 'Dip of the slab', unit: '°', min: 10, max: 90, reason: 'from gently sloping to straight down' }),
    ...lithosphereFields,
    gravityMs2: gravityField,
  })
  .meta({ title: 'Plate forces' });

export type PlateForcesParams = z.infer<typeof plateForcesSchema>;

/** An old Pacific-like plate whose slab reaches the bottom of the upper mantle, about 660 km down. */
export const plateForcesDefaults: PlateForcesParams = { ageMyr: 100, slabLengthKm: 700, slabDipDeg: 60 };
