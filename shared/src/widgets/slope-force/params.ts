import { z } from '../../zod.js';
import { boundedNumber, whenFieldsValid } from '../validation.js';

/** Standard acceleration of gravity, g0 = 9.80665 m/s², as fixed by the 3rd CGPM (1901). */
export const STANDARD_GRAVITY = 9.80665;

/**
 * Upper bound on either friction coefficient. Rock on rock sits near 0.6–0.85 (Byerlee 1978, Pure
 * and Applied Geophysics 116); the grippiest everyday contacts, soft rubber on clean dry rock or
 * concrete, reach about 1 to 2. That rubber figure is from memory of engineering friction tables,
 * not from a handbook at hand, so the bound is generous rather than tight.
 */
export const MAX_FRICTION = 2;

/** A 1000-tonne block (about 370 m³ of granite) covers any boulder or rock slab a panel would show. */
export const MAX_MASS_KG = 1_000_000;

/**
 * Surface gravity from Pluto (0.62 m/s²) to Jupiter's cloud tops (24.8 m/s²), values from memory,
 * so a panel can compare Earth with the Moon (1.62) or Mars (3.71).
 */
export const GRAVITY_RANGE = { min: 0.5, max: 25 } as const;

const friction = (label: string) =>
  boundedNumber({ label, unit: '', min: 0, max: MAX_FRICTION, reason: 'rubber on dry rock reaches about 2; rock on rock about 0.85' });

export const slopeForceSchema = z
  .strictObject({
    massKg: boundedNumber({ label: 'Mass', unit: 'kg', min: 0, max: MAX_MASS_KG, minExclusive: true }),
    angleDeg: boundedNumber({ label: 'Slope angle', unit: '°', min: 0, max: 90 }),
    staticFriction: friction('Static friction coefficient μs'),
    kineticFriction: friction('Kinetic (sliding) friction coefficient μk'),
    gravity: boundedNumber({
      label: 'Gravity',
      unit: 'm/s²',
      ...GRAVITY_RANGE,
      reason: 'Pluto to Jupiter; leave it out for standard Earth gravity, 9.80665 m/s²',
    }).optional(),
  })
  .superRefine((params, ctx) => {
    if (params.kineticFriction > params.staticFriction) {
      ctx.addIssue({
        code: 'custom',
        path: ['kineticFriction'],
        message: `Kinetic friction μk (${params.kineticFriction}) cannot be more than static friction μs (${params.staticFriction}): a block that slides never grips harder than one at rest. Lower μk or raise μs.`,
      });
    }
  }, whenFieldsValid('staticFriction', 'kineticFriction'))
  .meta({ title: 'Slope force box' });

export type SlopeForceParams = z.infer<typeof slopeForceSchema>;

/** A granite block on a granite slope at Byerlee's friction, held just below the critical angle. */
export const slopeForceDefaults: SlopeForceParams = {
  massKg: 10,
  angleDeg: 30,
  staticFriction: 0.85,
  kineticFriction: 0.6,
};
