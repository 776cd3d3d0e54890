import { STANDARD_GRAVITY, type SlopeForceParams } from './params.js';

// A type alias (not an interface) so results fit Record<string, unknown> where live values read them.
export type SlopeForceResult = {
  weightN: number;
  /** Component of the weight pressing into the slope, N = W·cos θ. */
  normalN: number;
  /** Component of the weight pulling down the slope, S = W·sin θ. */
  shearN: number;
  /** The most static friction can hold, μs·N. */
  maxStaticFrictionN: number;
  /** Friction actually acting: equal to S while it holds, μk·N once it slides. */
  frictionN: number;
  netForceN: number;
  slides: boolean;
  accelerationMs2: number;
  /** θc = arctan μs: the tilt above which the block slides. */
  criticalAngleDeg: number;
};

const DEG = Math.PI / 180;

/** cos and sin that are exact at 0° and 90°, so a flat or vertical slope shows a true zero. */
function cosSinDeg(angleDeg: number): [number, number] {
  if (angleDeg === 0) return [1, 0];
  if (angleDeg === 90) return [0, 1];
  return [Math.cos(angleDeg * DEG), Math.sin(angleDeg * DEG)];
}

export const criticalAngleDeg = (staticFriction: number): number => Math.atan(staticFriction) / DEG;

/** The inclined-plane relations of the brief (textbook statics with Coulomb friction). */
export function computeSlopeForce(params: SlopeForceParams): SlopeForceResult {
  const g = params.gravity ?? STANDARD_GRAVITY;
  const [cos, sin] = cosSinDeg(params.angleDeg);
  const weightN = params.massKg * g;
  const normalN = weightN * cos;
  const shearN = weightN * sin;
  const maxStaticFrictionN = params.staticFriction * normalN;
  const critical = criticalAngleDeg(params.staticFriction);
  // Decided on the angle, not on S against μs·N, so a block set to exactly θc holds: S = μs·N is
  // still held by static friction, and rounding in sin/cos must not tip it over.
  const slides = params.angleDeg > critical;
  const frictionN = slides ? params.kineticFriction * normalN : shearN;
  const netForceN = shearN - frictionN;
  return {
    weightN,
    normalN,
    shearN,
    maxStaticFrictionN,
    frictionN,
    netForceN,
    slides,
    accelerationMs2: slides ? g * (sin - params.kineticFriction * cos) : 0,
    criticalAngleDeg: critical,
  };
}
