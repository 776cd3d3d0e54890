import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { WIDGET_LOCALES, widgetStrings } from '../../i18n/index.js';
import { phraseStatesOf } from '../../panel/live-phrase/live-phrase-reading.js';
import { liveValueText, widgetOutputChoices } from '../../panel/live-value/live-value-reading.js';
import type { WidgetState } from '../types.js';
import { computePlateForces, formatForcePerMetre, plateForces, plateForcesDefaults } from './index.js';

// Plate driving forces (Turcotte and Schubert, Geodynamics, chapter on plate driving forces):
// ridge push F_RP = g·ρm·αv·ΔT·κ·t·[1 + 2ρm·αv·ΔT/(π(ρm − ρw))]; slab pull F_SP = ρm·αv·g·2ΔT·√(κt/π)·L.
// 1 Myr = 3.15576e13 s (Julian years).
const textbook = { mantleDensityKgM3: 3300, waterDensityKgM3: 1000, expansivityPerK: 3e-5, deltaTK: 1200, diffusivityM2s: 1e-6, gravityMs2: 10 };

describe('plate forces: ridge push', () => {
  it('is about 3.9 × 10¹² N/m on a 100 Myr plate, the book’s worked magnitude (value from memory)', () => {
    // By hand: 10 × 3300 × 3e-5 × 1200 × 1e-6 × 3.15576e15 = 3.749043e12; bracket 1 + 237.6/(π × 2300) = 1.032883;
    // product 3.872322e12 N/m. Turcotte and Schubert quote about 3.9 × 10¹² N/m for these values (from memory).
    const result = plateForces.compute({ ageMyr: 100, slabLengthKm: 700, slabDipDeg: 60, ...textbook });
    expect(result.ridgePushNPerM).toBeCloseTo(3.872322e12, -7);
    expect(Number(result.ridgePushNPerM.toPrecision(2))).toBe(3.9e12);
  });

  it('grows in proportion to the plate’s age', () => {
    const at = (ageMyr: number) => plateForces.compute({ ...plateForcesDefaults, ageMyr }).ridgePushNPerM;
    expect(at(80) / at(40)).toBeCloseTo(2, 12);
  });
});

describe('plate forces: slab pull', () => {
  it('is the slab’s thermal excess weight: 5.27 × 10¹³ N/m for 700 km of a 100 Myr plate', () => {
    // By hand: √(κt/π) = √(3.15576e9/π) = 31694.0 m; 2ΔT·√(κt/π) = 2400 × 31694.0 = 7.60656e7 K·m;
    // × ρm·αv·g = 3300 × 3e-5 × 10 = 0.99 → 7.53049e7 N/m²; × 7e5 m = 5.27135e13 N/m.
    const result = plateForces.compute({ ageMyr: 100, slabLengthKm: 700, slabDipDeg: 60, ...textbook });
    expect(result.slabPullNPerM).toBeCloseTo(5.27135e13, -9);
    // 5.27135e13 / 3.87232e12 = 13.613: slab pull is an order of magnitude above ridge push, as the book argues.
    expect(result.slabToRidgeRatio).toBeCloseTo(13.613, 2);
    expect(result.slabPullDominates).toBe(true);
    // The tip of a slab 700 km long dipping at 60° is 700 × sin 60° = 606.22 km down.
    expect(result.slabTipDepthKm).toBeCloseTo(606.218, 3);
  });

  it('uses standard gravity and ΔT = 1300 K by default: ratio 13.58 at 100 Myr and 700 km', () => {
    // With g 9.80665 and ΔT 1300: F_RP = 4.12482e12, F_SP = 5.60021e13 N/m (same steps as above).
    const result = plateForces.compute(plateForcesDefaults);
    expect(result.ridgePushNPerM).toBeCloseTo(4.12482e12, -8);
    expect(result.slabPullNPerM).toBeCloseTo(5.60021e13, -9);
  });

  it('is nothing without a slab, so ridge push then dominates', () => {
    const result = plateForces.compute({ ...plateForcesDefaults, slabLengthKm: 0 });
    expect(result.slabPullNPerM).toBe(0);
    expect(plateForces.states?.read(result, { ...plateForcesDefaults, slabLengthKm: 0 })).toBe('ridge-push-dominates');
    expect(plateForces.states?.read(computePlateForces(plateForcesDefaults), plateForcesDefaults)).toBe('slab-pull-dominates');
  });
});

describe('plate forces: validation and properties (property tests)', () => {
  const validParams = fc.record({
    ageMyr: fc.double({ min: 1e-3, max: 200, noNaN: true }),
    slabLengthKm: fc.double({ min: 0, max: 2800, noNaN: true }),
    slabDipDeg: fc.double({ min: 10, max: 90, noNaN: true }),
    gravityMs2: fc.double({ min: 9.7, max: 10, noNaN: true }),
  });

  it('never throws on validation, whatever it is given', () => {
    fc.assert(
      fc.property(fc.oneof(fc.anything(), fc.record({ ageMyr: fc.anything(), slabLengthKm: fc.double(), slabDipDeg: fc.double() })), (input) => {
        expect(typeof plateForces.validate(input).ok).toBe('boolean');
      }),
      { numRuns: 2000 },
    );
  });

  it('computes finite forces for any valid params', () => {
    fc.assert(
      fc.property(validParams, (input) => {
        const checked = plateForces.validate(input);
        expect(checked.ok).toBe(true);
        if (!checked.ok) return;
        for (const value of Object.values(plateForces.compute(checked.params))) if (typeof value === 'number') expect(Number.isFinite(value)).toBe(true);
      }),
      { numRuns: 1000 },
    );
  });

  it('pulls harder with a longer slab and pushes harder with an older plate', () => {
    fc.assert(
      fc.property(validParams, fc.double({ min: 1, max: 2800, noNaN: true }), (input, extraKm) => {
        const longer = { ...input, slabLengthKm: Math.min(2800, input.slabLengthKm + extraKm) };
        fc.pre(longer.slabLengthKm > input.slabLengthKm * (1 + 1e-9));
        expect(computePlateForces(longer).slabPullNPerM).toBeGreaterThan(computePlateForces(input).slabPullNPerM);
        const older = { ...input, ageMyr: Math.min(200, input.ageMyr * 1.5) };
        fc.pre(older.ageMyr > input.ageMyr * (1 + 1e-9));
        expect(computePlateForces(older).ridgePushNPerM).toBeGreaterThan(computePlateForces(input).ridgePushNPerM);
      }),
      { numRuns: 1000 },
    );
  });

  it('refuses a slab longer than the mantle is deep and a dip under 10°, naming range and unit', () => {
    const result = plateForces.validate({ ageMyr: 100, slabLengthKm: 3000, slabDipDeg: 5 });
    expect(result.ok ? [] : result.errors.map((error) => error.path)).toEqual([['slabLengthKm'], ['slabDipDeg']]);
    expect(result.ok ? '' : result.errors[0]!.message).toBe('Length of the sinking slab must be a number from 0 km to 2,800 km (down to the bottom of the mantle, about 2890 km).');
  });
});

describe('plate forces: model limits, description and outputs', () => {
  it('warns when the slab reaches below 660 km and when the plate is too young to sink', () => {
    expect(plateForces.modelLimits(plateForcesDefaults)).toEqual([]);
    expect(plateForces.modelLimits({ ...plateForcesDefaults, slabLengthKm: 1000 }).map((warning) => warning.code)).toEqual(['slab-below-upper-mantle']);
    expect(plateForces.modelLimits({ ...plateForcesDefaults, ageMyr: 5 }).map((warning) => warning.code)).toEqual(['young-plate']);
  });

  it('writes forces per metre in powers of ten', () => {
    expect(formatForcePerMetre(3.872e12, 'en')).toBe('3.9\u00a0×\u00a010¹²\u00a0N/m');
    expect(formatForcePerMetre(5.6e13, 'fr')).toBe('5,6\u00a0×\u00a010¹³\u00a0N/m');
  });

  it('describes both forces in English, French, Spanish and Arabic', () => {
    expect(plateForces.describe(plateForcesDefaults, 'en')).toBe(
      'A plate 100 million years old sinks at a trench, its slab 700\u00a0km long and dipping at 60°. Ridge push on it is about 4.1\u00a0×\u00a010¹²\u00a0N/m per metre of plate edge; the slab pulls with about 5.6\u00a0×\u00a010¹³\u00a0N/m, 14 times as much. Both are rough estimates, and the mantle resists much of the pull.',
    );
    expect(plateForces.describe(plateForcesDefaults, 'fr')).toContain('14 fois plus');
    expect(plateForces.describe(plateForcesDefaults, 'es')).toContain('14 veces más');
    expect(plateForces.describe(plateForcesDefaults, 'ar')).toContain('14 مرة');
  });

  it('offers both forces, their ratio and the slab’s depth as live values', () => {
    expect((widgetOutputChoices('plate-forces', plateForcesDefaults) ?? []).map(({ name, unit }) => [name, unit])).toEqual([
      ['ridgePushNPerM', 'N/m'],
      ['slabPullNPerM', 'N/m'],
      ['slabToRidgeRatio', ''],
      ['dominantForce', ''],
      ['slabTipDepthKm', 'km'],
    ]);
  });

  it('says which force is bigger, as a live value and for a live phrase, in every visitor language', () => {
    // Defaults: 100 Myr, 700 km of slab, pull 13.58 times the push (above); without a slab only the push is left.
    const dominant = (slabLengthKm: number) => widgetOutputChoices('plate-forces', { ...plateForcesDefaults, slabLengthKm })?.find((choice) => choice.name === 'dominantForce');
    expect(dominant(700)).toMatchObject({ kind: 'state', value: 'slab-pull-dominates' });
    expect(dominant(0)).toMatchObject({ kind: 'state', value: 'ridge-push-dominates' });
    expect(phraseStatesOf({ widgetType: 'plate-forces' })).toEqual(['slab-pull-dominates', 'ridge-push-dominates']);
    expect(liveValueText({ ok: true, state: 'slab-pull-dominates' }, { digits: 3, unit: '' }, 'en')).toBe('slab pull is bigger');
    for (const locale of WIDGET_LOCALES) {
      for (const state of plateForces.states!.values) expect(widgetStrings(locale).states[state as WidgetState], `${state} in ${locale}`).toMatch(/\p{L}/u);
    }
  });
});
