import { describe, expect, it } from 'vitest';
import { widgetOutputChoices } from '../../panel/live-value/live-value-reading.js';
import { convectionCell, type ConvectionCellParams } from './index.js';
import { physicalGroup, UPPER_MANTLE, UPPER_MANTLE_SOURCES } from './upper-mantle.js';

const names = (params: unknown) => widgetOutputChoices('convection-cell', params)?.map((choice) => choice.name);

describe('convection cell outputs', () => {
  it('offer Ra and its onset from the settings, and Nu and Vrms from the running solver', () => {
    expect(names(convectionCell.defaults)).toEqual(['rayleigh', 'onsetRayleigh', 'onsetRayleighInfiniteLayer', 'nusselt', 'vrms']);
    const nusselt = widgetOutputChoices('convection-cell', convectionCell.defaults)?.find((choice) => choice.name === 'nusselt');
    // Until the solver has reported, a live value of Nu has nothing to show (never the scaling estimate).
    expect(nusselt).toEqual({ name: 'nusselt', kind: 'number', unit: '', source: 'simulation', value: null });
  });

  it('take Nu and Vrms as the solver reports them: Blankenbach et al. (1989) case 1a, Nu = 4.884409, Vrms = 42.864947', () => {
    const report = { time: 0.2, nusselt: 4.884409, vrms: 42.864947 };
    const values = Object.fromEntries((widgetOutputChoices('convection-cell', convectionCell.defaults, report) ?? []).map((choice) => [choice.name, choice.value]));
    expect(values).toMatchObject({ nusselt: 4.884409, vrms: 42.864947, rayleigh: 1e4 });
  });

  it('add speed in cm/yr and elapsed time in Myr once the cell has physical properties', () => {
    const params = physicalGroup.switchOn({ ...convectionCell.defaults }) as ConvectionCellParams;
    expect(names(params)).toEqual(['rayleigh', 'onsetRayleigh', 'onsetRayleighInfiniteLayer', 'nusselt', 'vrms', 'speedCmYr', 'elapsedMyr']);
    const choices = widgetOutputChoices('convection-cell', params, { time: 0.1, nusselt: 4.884409, vrms: 42.864947 }) ?? [];
    const byName = new Map(choices.map((choice) => [choice.name, choice]));
    // By hand: speed scale κ/d = 1e-6 / 6.6e5 m/s = 1.51515e-12 m/s; × 31 557 600 s in a Julian year × 100
    // = 4.78145e-3 cm/yr; × Vrms 42.864947 = 0.204957 cm/yr.
    expect(byName.get('speedCmYr')).toMatchObject({ unit: 'cm/yr', source: 'simulation' });
    expect(byName.get('speedCmYr')?.value).toBeCloseTo(0.204957, 5);
    // Time scale d²/κ = (6.6e5 m)² / 1e-6 m²/s = 4.356e17 s = 13 803.3 Myr (1 Myr = 3.15576e13 s); × t 0.1 = 1380.33 Myr.
    expect(byName.get('elapsedMyr')).toMatchObject({ unit: 'Myr', source: 'simulation' });
    expect(byName.get('elapsedMyr')?.value).toBeCloseTo(1380.33, 1);
  });
});

describe('switching a convection cell to physical properties', () => {
  const switchedOn = physicalGroup.switchOn({ ...convectionCell.defaults });

  it('starts from typical upper-mantle values that validate, in place of Ra', () => {
    expect(switchedOn.physical).toEqual(UPPER_MANTLE);
    expect(switchedOn.rayleigh).toBeUndefined();
    expect(switchedOn.units).toBe('physical');
    const checked = convectionCell.validate(switchedOn);
    expect(checked.ok ? [] : checked.errors).toEqual([]);
  });

  it('gives Ra = 3.626 × 10⁵, as computed by hand', () => {
    // Ra = ρgαΔTd³/(κη) = 3300 × 9.8 × 3e-5 × 1300 × (6.6e5)³ / (1e-6 × 1e21) = 1261.26 × 2.87496e17 / 1e15 = 3.6261 × 10⁵.
    expect(convectionCell.compute(switchedOn as ConvectionCellParams).rayleigh).toBeCloseTo(3.6261e5, -1);
  });

  it('raises the grid so the thinner boundary layers of that Ra are resolved, and never lowers a finer one', () => {
    expect(switchedOn).toMatchObject({ nx: 64, nz: 128 });
    expect(physicalGroup.switchOn({ ...convectionCell.defaults, nx: 256, nz: 256 })).toMatchObject({ nx: 256, nz: 256 });
  });

  it('names a source for every starting value, or says it is common practice', () => {
    expect(Object.keys(UPPER_MANTLE_SOURCES).sort()).toEqual(Object.keys(UPPER_MANTLE).sort());
    for (const source of Object.values(UPPER_MANTLE_SOURCES)) expect(source).toMatch(/Turcotte and Schubert|CGPM|common practice, no source/);
    expect(UPPER_MANTLE_SOURCES.viscosityPas).toMatch(/common practice, no source/);
  });

  it('keeps the Ra the properties gave when switched back, so the picture does not jump', () => {
    const switchedOff = physicalGroup.switchOff(switchedOn);
    expect(switchedOff).toMatchObject({ rayleigh: 363_000, units: 'non-dimensional' });
    expect(switchedOff.physical).toBeUndefined();
    expect(convectionCell.validate(switchedOff).ok).toBe(true);
  });

  it('falls back to the default Ra when the properties were left half typed', () => {
    expect(physicalGroup.switchOff({ ...switchedOn, physical: { depthM: 1000 } })).toMatchObject({ rayleigh: 1e4 });
  });
});
