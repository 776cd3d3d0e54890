import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { widgetOutputChoices } from '../../panel/live-value/live-value-reading.js';
import { criticalAngleDeg, MAX_FRICTION, slopeForce, slopeForceDefaults, STANDARD_GRAVITY } from './index.js';

// Standard gravity g0 = 9.80665 m/s² (3rd CGPM, 1901). Relations: W = m·g, N = W·cos θ, S = W·sin θ,
// holds while S ≤ μs·N, θc = arctan μs, sliding a = g·(sin θ − μk·cos θ) (textbook inclined plane).
const g0 = 9.80665;

describe('slope force box: inclined-plane values with standard gravity', () => {
  it('uses standard gravity, 9.80665 m/s², when none is given', () => {
    expect(STANDARD_GRAVITY).toBe(g0);
  });

  it('splits the weight of 10 kg on a 30° slope and holds at Byerlee friction 0.85', () => {
    // W = 10 × 9.80665 = 98.0665 N; N = 98.0665 × cos 30° = 98.0665 × 0.8660254 = 84.92808 N;
    // S = 98.0665 × 0.5 = 49.03325 N; μs·N = 0.85 × 84.92808 = 72.18887 N > S, so it holds and
    // static friction matches S exactly.
    const result = slopeForce.compute({ massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 });
    expect(result.weightN).toBeCloseTo(98.0665, 10);
    expect(result.normalN).toBeCloseTo(84.92808, 4);
    expect(result.shearN).toBeCloseTo(49.03325, 10);
    expect(result.maxStaticFrictionN).toBeCloseTo(72.18887, 4);
    expect(result.slides).toBe(false);
    expect(result.frictionN).toBeCloseTo(49.03325, 10);
    expect(result.netForceN).toBe(0);
    expect(result.accelerationMs2).toBe(0);
  });

  it('slides 2 kg at 45° with μs 0.6, μk 0.5, accelerating at g·(sin θ − μk·cos θ)', () => {
    // W = 19.6133 N; N = S = 19.6133 / √2 = 13.868696 N; θc = arctan 0.6 = 30.96° < 45°, so it slides;
    // friction = 0.5 × 13.868696 = 6.934348 N; net = 6.934348 N; a = 9.80665 × 0.7071068 × 0.5 = 3.467174 m/s².
    const result = slopeForce.compute({ massKg: 2, angleDeg: 45, staticFriction: 0.6, kineticFriction: 0.5 });
    expect(result.normalN).toBeCloseTo(13.868696, 5);
    expect(result.shearN).toBeCloseTo(13.868696, 5);
    expect(result.slides).toBe(true);
    expect(result.frictionN).toBeCloseTo(6.934348, 5);
    expect(result.netForceN).toBeCloseTo(6.934348, 5);
    expect(result.accelerationMs2).toBeCloseTo(3.467174, 5);
    expect(result.criticalAngleDeg).toBeCloseTo(30.9638, 4);
  });

  it('slides 5 kg at 60° with μs 0.3, μk 0.2', () => {
    // W = 49.03325 N; N = 49.03325 × 0.5 = 24.516625 N; S = 49.03325 × 0.8660254 = 42.46405 N;
    // a = 9.80665 × (0.8660254 − 0.2 × 0.5) = 9.80665 × 0.7660254 = 7.512142 m/s² = net / m.
    const result = slopeForce.compute({ massKg: 5, angleDeg: 60, staticFriction: 0.3, kineticFriction: 0.2 });
    expect(result.normalN).toBeCloseTo(24.516625, 6);
    expect(result.shearN).toBeCloseTo(42.46405, 4);
    expect(result.accelerationMs2).toBeCloseTo(7.512142, 5);
    expect(result.netForceN / 5).toBeCloseTo(result.accelerationMs2, 10);
  });

  it('presses all its weight into a flat slope and hangs all of it on a vertical one', () => {
    const flat = slopeForce.compute({ massKg: 1, angleDeg: 0, staticFriction: 0.5, kineticFriction: 0.4 });
    expect([flat.normalN, flat.shearN, flat.slides]).toEqual([g0, 0, false]);
    const vertical = slopeForce.compute({ massKg: 1, angleDeg: 90, staticFriction: 0.5, kineticFriction: 0.4 });
    expect([vertical.normalN, vertical.shearN, vertical.slides, vertical.accelerationMs2]).toEqual([0, g0, true, g0]);
  });

  it('uses the gravity a curator sets, here the Moon’s 1.62 m/s²', () => {
    const moon = slopeForce.compute({ massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6, gravity: 1.62 });
    expect(moon.weightN).toBeCloseTo(16.2, 10);
    // The critical angle depends on friction only, not on gravity.
    expect(moon.criticalAngleDeg).toBeCloseTo(criticalAngleDeg(0.85), 12);
  });
});

describe('slope force box: the critical angle', () => {
  it('starts sliding at arctan 0.85 ≈ 40.36° for Byerlee’s (1978) rock friction', () => {
    // Byerlee (1978, Pure and Applied Geophysics 116): τ ≈ 0.85·σn; arctan 0.85 = 40.3645°.
    expect(criticalAngleDeg(0.85)).toBeCloseTo(40.3645, 4);
  });

  it('holds at exactly the critical angle and slides just past it', () => {
    const base = { massKg: 10, staticFriction: 0.85, kineticFriction: 0.6 };
    const critical = criticalAngleDeg(0.85);
    expect(slopeForce.compute({ ...base, angleDeg: critical }).slides).toBe(false);
    expect(slopeForce.compute({ ...base, angleDeg: critical + 1e-9 }).slides).toBe(true);
  });

  it('holds at exactly the critical angle even when μs = μk, with no net force', () => {
    const result = slopeForce.compute({ massKg: 3, angleDeg: 45, staticFriction: 1, kineticFriction: 1 });
    expect(result.criticalAngleDeg).toBe(45);
    expect(result.slides).toBe(false);
    expect(result.netForceN).toBe(0);
  });
});

describe('slope force box: validation', () => {
  const valid = { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 };

  it('accepts the defaults and leaves gravity out', () => {
    expect(slopeForce.validate(slopeForce.defaults)).toEqual({ ok: true, params: slopeForce.defaults });
  });

  it('refuses a mass of zero or less, naming the range and unit', () => {
    const result = slopeForce.validate({ ...valid, massKg: 0 });
    expect(result).toEqual({
      ok: false,
      errors: [{ path: ['massKg'], message: 'Mass must be a number more than 0 kg and at most 1,000,000 kg.' }],
    });
  });

  it('refuses an angle past 90°, naming degrees', () => {
    const result = slopeForce.validate({ ...valid, angleDeg: 95 });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors).toEqual([{ path: ['angleDeg'], message: 'Slope angle must be a number from 0° to 90°.' }]);
  });

  it(`refuses static friction above ${MAX_FRICTION}, more than real materials reach`, () => {
    const result = slopeForce.validate({ ...valid, staticFriction: 3 });
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors[0]?.path).toEqual(['staticFriction']);
      expect(result.errors[0]?.message).toMatch(/from 0 to 2 \(rubber on dry rock reaches about 2/);
    }
  });

  it('refuses kinetic friction above static friction, saying which to change', () => {
    const result = slopeForce.validate({ ...valid, staticFriction: 0.4, kineticFriction: 0.5 });
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors).toHaveLength(1);
      expect(result.errors[0]?.path).toEqual(['kineticFriction']);
      expect(result.errors[0]?.message).toContain('cannot be more than static friction μs (0.4)');
    }
  });

  it('reports every wrong setting at once: a wrong mass does not hide kinetic friction above static', () => {
    const result = slopeForce.validate({ ...valid, massKg: 0, staticFriction: 0.4, kineticFriction: 0.5, colour: 'red' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.map((error) => error.path)).toEqual([['massKg'], ['colour'], ['kineticFriction']]);
  });

  it('refuses text where a number belongs, unknown settings, and a missing field, each by path', () => {
    const result = slopeForce.validate({ massKg: '10', angleDeg: 30, staticFriction: 0.85, colour: 'red' });
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors.map((error) => error.path)).toEqual([['massKg'], ['kineticFriction'], ['colour']]);
      expect(result.errors[2]?.message).toBe('"colour" is not a setting of the slope force box.');
    }
  });

  it('refuses something that is not a set of settings at all', () => {
    expect(slopeForce.validate(null)).toEqual({
      ok: false,
      errors: [{ path: [], message: "The slope force box's settings must be a set of named values." }],
    });
  });

  it('never throws, whatever it is given (property test)', () => {
    fc.assert(
      fc.property(fc.oneof(fc.anything(), fc.record({ massKg: fc.anything(), angleDeg: fc.double(), staticFriction: fc.double(), kineticFriction: fc.double() })), (input) => {
        const result = slopeForce.validate(input);
        expect(typeof result.ok).toBe('boolean');
      }),
      { numRuns: 2000 },
    );
  });

  it('computes finite forces with N² + S² = W² for any valid params (property test)', () => {
    const validParams = fc
      .record({
        massKg: fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
        angleDeg: fc.double({ min: 0, max: 90, noNaN: true }),
        staticFriction: fc.double({ min: 0, max: MAX_FRICTION, noNaN: true }),
        kineticShare: fc.double({ min: 0, max: 1, noNaN: true }),
        gravity: fc.option(fc.double({ min: 0.5, max: 25, noNaN: true }), { nil: undefined }),
      })
      .map(({ kineticShare, gravity, ...rest }) => ({ ...rest, kineticFriction: rest.staticFriction * kineticShare, ...(gravity === undefined ? {} : { gravity }) }));
    fc.assert(
      fc.property(validParams, (params) => {
        const checked = slopeForce.validate(params);
        expect(checked.ok).toBe(true);
        if (!checked.ok) return;
        const result = slopeForce.compute(checked.params);
        for (const value of Object.values(result)) if (typeof value === 'number') expect(Number.isFinite(value)).toBe(true);
        const { normalN, shearN, weightN } = result;
        expect(Math.abs(normalN ** 2 + shearN ** 2 - weightN ** 2)).toBeLessThanOrEqual(1e-12 * weightN ** 2);
        expect(result.netForceN).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('slope force box: describe', () => {
  const params = { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 };

  it('tells in English that the block holds, with forces in newtons', () => {
    expect(slopeForce.describe(params, 'en')).toBe(
      'A block of 10\u00a0kg rests on a slope tilted at 30°. Its weight of 98.1\u00a0N presses into the slope with 84.9\u00a0N and pulls it down the slope with 49\u00a0N. Friction can hold up to 72.2\u00a0N, so the block holds still. It would start to slide above 40.4°.',
    );
  });

  it('tells in French that the block slides, with French decimal commas', () => {
    const text = slopeForce.describe({ ...params, angleDeg: 50 }, 'fr-CA');
    expect(text).toContain('Un bloc de 10\u00a0kg repose sur une pente inclinée de 50°.');
    expect(text).toContain('le bloc glisse et accélère de 3,73\u00a0m/s²');
  });

  it('tells in Spanish that the block slides, with decimal commas for Spain', () => {
    const text = slopeForce.describe({ ...params, angleDeg: 50 }, 'es');
    expect(text).toContain('Un bloque de 10\u00a0kg descansa en una pendiente inclinada 50°.');
    expect(text).toContain('el bloque desliza y acelera 3,73\u00a0m/s²');
  });

  it('tells in Arabic that the block holds, for a regional tag too', () => {
    const text = slopeForce.describe(params, 'ar-MA');
    expect(text).toMatch(/^صندوق كتلته /);
    expect(text).toContain('لذا يبقى الصندوق ثابتًا');
  });

  it('switches to kilonewtons for a heavy block', () => {
    expect(slopeForce.describe({ ...params, massKg: 2000 }, 'en')).toContain('Its weight of 19.6\u00a0kN');
  });

  it('falls back to English for a locale without widget text yet', () => {
    expect(slopeForce.describe(params, 'sw')).toBe(slopeForce.describe(params, 'en'));
  });
});

describe('slope force box: model limits', () => {
  it('warns when friction is beyond what rock reaches, and when there is none', () => {
    const base = { massKg: 1, angleDeg: 10, kineticFriction: 0 };
    expect(slopeForce.modelLimits({ ...base, staticFriction: 1.5 }).map((warning) => warning.code)).toEqual(['beyond-rock-friction']);
    expect(slopeForce.modelLimits({ ...base, staticFriction: 0 }).map((warning) => warning.code)).toEqual(['frictionless']);
    expect(slopeForce.modelLimits({ ...base, staticFriction: 0.85 })).toEqual([]);
  });
});

describe('slope force box outputs', () => {
  const choices = (params: unknown) => widgetOutputChoices('slope-force', params) ?? [];

  it('offer the forces in N, the state, the critical angle in degrees and the acceleration', () => {
    expect(choices(slopeForceDefaults).map(({ name, kind, unit }) => [name, kind, unit])).toEqual([
      ['weightN', 'number', 'N'],
      ['normalN', 'number', 'N'],
      ['shearN', 'number', 'N'],
      ['maxStaticFrictionN', 'number', 'N'],
      ['frictionN', 'number', 'N'],
      ['netForceN', 'number', 'N'],
      ['state', 'state', ''],
      ['criticalAngleDeg', 'number', '°'],
      ['accelerationMs2', 'number', 'm/s²'],
    ]);
  });

  it('say the block holds below arctan μs and slides above it (arctan 0.85 ≈ 40.36°)', () => {
    const state = (angleDeg: number) => choices({ ...slopeForceDefaults, angleDeg }).find((choice) => choice.name === 'state')?.value;
    expect(state(40)).toBe('holds');
    expect(state(41)).toBe('slides');
  });

  it('give the shear as W·sin θ by hand: 10 kg × 9.80665 m/s² × sin 30° = 49.03325 N (g0 from the 3rd CGPM, 1901)', () => {
    expect(choices(slopeForceDefaults).find((choice) => choice.name === 'shearN')?.value).toBeCloseTo(49.03325, 10);
  });
});
