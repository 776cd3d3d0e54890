import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { WIDGET_LOCALES, widgetStrings } from '../../i18n/index.js';
import { phraseStatesOf } from '../../panel/live-phrase/live-phrase-reading.js';
import { stateWordsInPlainText } from '../../panel/live-phrase/state-words.js';
import { liveValueText, widgetOutputChoices } from '../../panel/live-value/live-value-reading.js';
import type { WidgetState } from '../types.js';
import { computeSeaFloorDepth, GDH1, gdh1DepthM, gdh1HeatFlowMWm2, seaFloorDepth, seaFloorDepthDefaults } from './index.js';

// Half-space cooling (Turcotte and Schubert, Geodynamics, ch. 4): depth below the ridge
// w = 2ρm·αv·ΔT/(ρm − ρw)·√(κt/π), heat flow q = k·ΔT/√(πκt), thickness 2.32·√(κt). Their example
// properties (from memory of the book): ρm 3300, ρw 1000 kg/m³, αv 3e-5 /K, ΔT 1300 K, κ 1e-6 m²/s,
// k 3.3 W/(m·K); ridge crest 2500 m (Parsons and Sclater 1977). 1 Myr = 3.15576e13 s (Julian years).
// By hand: √(κ·1 Myr/π) = √(3.15576e7/π) = √(1.004507e7) = 3169.40 m; 2·3300·3e-5·1300/2300 = 0.1119130;
// so w = 0.1119130 × 3169.40 = 354.697 m per √Myr.
const params = (ageMyr: number, model: 'half-space' | 'plate' = 'half-space') => ({ ageMyr, model });

describe('sea-floor depth: half-space cooling (Turcotte and Schubert, Geodynamics)', () => {
  it('sinks 354.7 m × √t below a 2500 m ridge: 4273.5 m at 25 Myr, 6047.0 m at 100 Myr', () => {
    // 2500 + 354.697 × 5 = 4273.49 m; 2500 + 354.697 × 10 = 6046.97 m.
    expect(seaFloorDepth.compute(params(25)).halfSpaceDepthM).toBeCloseTo(4273.49, 1);
    expect(seaFloorDepth.compute(params(100)).depthM).toBeCloseTo(6046.97, 1);
  });

  it('lets out k·ΔT/√(πκt) = 430.85 mW/m² at 1 Myr, and 43.09 at 100 Myr', () => {
    // 3.3 × 1300 / √(π × 1e-6 × 3.15576e13) = 4290 / 9957.0 = 0.430854 W/m².
    expect(seaFloorDepth.compute(params(1)).heatFlowMWm2).toBeCloseTo(430.854, 2);
    expect(seaFloorDepth.compute(params(100)).halfSpaceHeatFlowMWm2).toBeCloseTo(43.0854, 3);
  });

  it('cools a lithosphere 2.32·√(κt) thick: 13.03 km at 1 Myr, 130.3 km at 100 Myr', () => {
    // 2.32 × √(3.15576e7 m²) = 2.32 × 5617.62 m = 13.0329 km.
    expect(seaFloorDepth.compute(params(1)).lithosphereThicknessKm).toBeCloseTo(13.0329, 3);
    expect(seaFloorDepth.compute(params(100)).lithosphereThicknessKm).toBeCloseTo(130.329, 2);
  });

  it('matches Parsons and Sclater’s (1977) young-floor fit, 2500 + 350·√t m, within 1 % up to 70 Myr', () => {
    for (const age of [1, 4, 10, 25, 50, 70]) {
      const fit = 2500 + 350 * Math.sqrt(age);
      expect(Math.abs(seaFloorDepth.compute(params(age)).halfSpaceDepthM / fit - 1), `${age} Myr`).toBeLessThan(0.01);
    }
  });

  it('follows the properties a curator sets: a denser mantle sinks the floor less', () => {
    // 2·3400·3e-5·1300/2400 = 0.1105 < 0.1119: less subsidence.
    const denser = seaFloorDepth.compute({ ...params(25), mantleDensityKgM3: 3400 });
    expect(denser.halfSpaceDepthM).toBeCloseTo(2500 + ((2 * 3400 * 3e-5 * 1300) / 2400) * 3169.4 * 5, 0);
  });
});

describe('sea-floor depth: the GDH1 plate model (Stein and Stein 1992, Nature 359)', () => {
  it('gives 2600 + 365·√t m while young: 3754.2 m at 10 Myr', () => {
    // 2600 + 365 × 3.162278 = 3754.23 m.
    expect(seaFloorDepth.compute(params(10, 'plate')).depthM).toBeCloseTo(3754.23, 1);
  });

  it('flattens to 5651 − 2473·e^(−0.0278t) m when older: 5035.0 m at 50 Myr, 5497.6 m at 100 Myr', () => {
    // e^(−1.39) = 0.249075 → 5651 − 615.96 = 5035.04; e^(−2.78) = 0.062059 → 5651 − 153.47 = 5497.58.
    expect(gdh1DepthM(50)).toBeCloseTo(5035.04, 1);
    expect(seaFloorDepth.compute(params(100, 'plate')).depthM).toBeCloseTo(5497.58, 1);
  });

  it('gives heat flow 510/√t mW/m² to 55 Myr and 48 + 96·e^(−0.0278t) beyond: 102 at 25 Myr, 53.96 at 100 Myr', () => {
    expect(seaFloorDepth.compute(params(25, 'plate')).heatFlowMWm2).toBeCloseTo(102, 10);
    // 48 + 96 × 0.062059 = 53.957.
    expect(gdh1HeatFlowMWm2(100)).toBeCloseTo(53.957, 2);
  });

  it('joins its two branches where they meet, within 1 m at 20 Myr and 0.1 mW/m² at 55 Myr', () => {
    const depth = GDH1.depth;
    expect(Math.abs(depth.ridgeM + depth.sqrtM * Math.sqrt(20) - (depth.asymptoteM - depth.dropM * Math.exp(-depth.rate * 20)))).toBeLessThan(1);
    const heat = GDH1.heatFlow;
    expect(Math.abs(heat.sqrtMWm2 / Math.sqrt(55) - (heat.asymptoteMWm2 + heat.dropMWm2 * Math.exp(-heat.rate * 55)))).toBeLessThan(0.1);
  });

  it('keeps the lithosphere within its 95 km plate', () => {
    expect(seaFloorDepth.compute(params(100, 'plate')).lithosphereThicknessKm).toBe(95);
    expect(seaFloorDepth.compute(params(25, 'plate')).lithosphereThicknessKm).toBeCloseTo(65.164, 2);
  });

  it('is shallower than the half-space for old floor, as measured depths are (Parsons and Sclater 1977)', () => {
    const old = seaFloorDepth.compute(params(150));
    expect(old.plateDepthM).toBeLessThan(old.halfSpaceDepthM - 500);
  });
});

describe('sea-floor depth: validation and properties (property tests)', () => {
  const validParams = fc.record({
    ageMyr: fc.double({ min: 1e-3, max: 200, noNaN: true }),
    model: fc.constantFrom('half-space' as const, 'plate' as const),
    deltaTK: fc.option(fc.double({ min: 500, max: 2000, noNaN: true }), { nil: undefined }),
    diffusivityM2s: fc.option(fc.double({ min: 3e-7, max: 3e-6, noNaN: true }), { nil: undefined }),
  }).map((record) => Object.fromEntries(Object.entries(record).filter(([, value]) => value !== undefined)));

  it('never throws on validation, whatever it is given', () => {
    fc.assert(
      fc.property(fc.oneof(fc.anything(), fc.record({ ageMyr: fc.anything(), model: fc.anything(), deltaTK: fc.double() })), (input) => {
        expect(typeof seaFloorDepth.validate(input).ok).toBe('boolean');
      }),
      { numRuns: 2000 },
    );
  });

  it('computes finite numbers for any valid params', () => {
    fc.assert(
      fc.property(validParams, (input) => {
        const checked = seaFloorDepth.validate(input);
        expect(checked.ok).toBe(true);
        if (!checked.ok) return;
        for (const value of Object.values(seaFloorDepth.compute(checked.params))) if (typeof value === 'number') expect(Number.isFinite(value)).toBe(true);
      }),
      { numRuns: 1000 },
    );
  });

  it('gets deeper and lets out less heat as the floor ages, in both models', () => {
    fc.assert(
      fc.property(validParams, fc.double({ min: 1e-3, max: 200, noNaN: true }), (input, otherAge) => {
        const [young, old] = [Math.min(input.ageMyr as number, otherAge), Math.max(input.ageMyr as number, otherAge)];
        // Ages a rounding error apart give the same depth; the physics speaks of ages measurably apart.
        fc.pre(old > young * (1 + 1e-9));
        const a = computeSeaFloorDepth({ ...(input as { model: 'plate' }), ageMyr: young });
        const b = computeSeaFloorDepth({ ...(input as { model: 'plate' }), ageMyr: old });
        expect(b.depthM).toBeGreaterThan(a.depthM);
        expect(b.heatFlowMWm2).toBeLessThan(a.heatFlowMWm2);
        expect(b.lithosphereThicknessKm).toBeGreaterThanOrEqual(a.lithosphereThicknessKm);
      }),
      { numRuns: 1000 },
    );
  });

  it('refuses age 0 and older than 200 Myr, naming the range and why', () => {
    expect(seaFloorDepth.validate({ ageMyr: 0, model: 'plate' })).toEqual({
      ok: false,
      errors: [{ path: ['ageMyr'], message: 'Age of the sea floor must be a number more than 0 Myr and at most 200 Myr (at the crest itself, age 0, the models give an endless heat flow).' }],
    });
    expect(seaFloorDepth.validate({ ageMyr: 250, model: 'plate' }).ok).toBe(false);
    expect(seaFloorDepth.validate({ ageMyr: 50, model: 'slab' }).ok).toBe(false);
  });
});

describe('sea-floor depth: model limits, description and outputs', () => {
  it('warns when the half-space model is set past 70 Myr (Parsons and Sclater 1977) and past any sea floor left', () => {
    expect(seaFloorDepth.modelLimits(params(60))).toEqual([]);
    expect(seaFloorDepth.modelLimits(params(100)).map((warning) => warning.code)).toEqual(['half-space-old-floor']);
    expect(seaFloorDepth.modelLimits(params(100, 'plate'))).toEqual([]);
    expect(seaFloorDepth.modelLimits(params(190, 'plate')).map((warning) => warning.code)).toEqual(['older-than-any-sea-floor']);
  });

  it('describes the floor in English, French, Spanish and Arabic', () => {
    expect(seaFloorDepth.describe(seaFloorDepthDefaults, 'en')).toBe(
      'Sea floor 50 million years old lies 5.04\u00a0km below sea level in the plate model. Heat flows out of it at 72.1\u00a0mW/m², and the cooled lithosphere under it is 92.2\u00a0km thick. The half-space model puts it at 5.01\u00a0km, the plate model at 5.04\u00a0km.',
    );
    expect(seaFloorDepth.describe(seaFloorDepthDefaults, 'fr')).toContain('5,04\u00a0km sous le niveau de la mer dans le modèle de plaque');
    expect(seaFloorDepth.describe(seaFloorDepthDefaults, 'es')).toContain('en el modelo de placa');
    expect(seaFloorDepth.describe(seaFloorDepthDefaults, 'ar')).toContain('نموذج الصفيحة');
  });

  it('offers depth, heat flow and thickness as live values', () => {
    const choices = widgetOutputChoices('sea-floor-depth', seaFloorDepthDefaults) ?? [];
    expect(choices.map(({ name, unit }) => [name, unit])).toEqual([
      ['depthM', 'm'],
      ['heatFlowMWm2', 'mW/m²'],
      ['lithosphereThicknessKm', 'km'],
      ['halfSpaceDepthM', 'm'],
      ['plateDepthM', 'm'],
      ['ageMyr', 'Myr'],
      ['depthTrend', ''],
    ]);
  });

  it('says whether the floor still sinks or levels off past 70 Myr (Parsons and Sclater 1977), as a live value and for a live phrase', () => {
    const trend = (ageMyr: number, model: 'half-space' | 'plate') => widgetOutputChoices('sea-floor-depth', params(ageMyr, model))?.find((choice) => choice.name === 'depthTrend')?.value;
    expect(trend(50, 'plate')).toBe('still-sinking');
    expect(trend(100, 'plate')).toBe('levelling-off');
    // The half-space floor sinks as √age at any age, so its curve never levels off.
    expect(trend(150, 'half-space')).toBe('still-sinking');
    expect(phraseStatesOf({ widgetType: 'sea-floor-depth' })).toEqual(['still-sinking', 'levelling-off']);
    expect(liveValueText({ ok: true, state: 'levelling-off' }, { digits: 3, unit: '' }, 'fr')).toBe('se stabilise');
    for (const locale of WIDGET_LOCALES) {
      for (const state of seaFloorDepth.states!.values) expect(widgetStrings(locale).states[state as WidgetState], `${state} in ${locale}`).toMatch(/\p{L}/u);
    }
  });

  it('flags a caption that says the floor levels off on a panel where the visitor drags its age', () => {
    const panel = { type: 'doc', content: [
      { type: 'widget', attrs: { widgetType: 'sea-floor-depth', widgetId: 'floor', params: params(100, 'plate') } },
      { type: 'paragraph', content: [{ type: 'text', text: 'Old sea floor levels off.' }] },
    ] };
    expect(stateWordsInPlainText(panel, 'en')).toEqual([{ word: 'levels', widgetId: 'floor', widgetType: 'sea-floor-depth' }]);
  });
});
