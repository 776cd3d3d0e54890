import { describe, expect, it } from 'vitest';
import { convectionCell, onsetRayleigh, ONSET_RAYLEIGH_FREE_SLIP, physicalScales, rayleighFromPhysical, type ConvectionCellParams } from './index.js';

const defaults = convectionCell.defaults;
const withParams = (changes: Partial<ConvectionCellParams>) => ({ ...defaults, ...changes });
const errorsOf = (input: unknown) => {
  const result = convectionCell.validate(input);
  return result.ok ? [] : result.errors;
};

// An upper-mantle-like box: ρ = 3300 kg/m³, g = 9.8 m/s², α = 3 × 10⁻⁵ /K, ΔT = 1300 K, d = 660 km,
// κ = 10⁻⁶ m²/s, η = 10²¹ Pa·s. Ra = 3300 × 9.8 × 3e-5 × 1300 × (6.6e5)³ / (1e-6 × 1e21)
// = 1261.26 × 2.87496e17 / 1e15 = 3.6261 × 10⁵.
const upperMantle = {
  densityKgM3: 3300,
  gravityMs2: 9.8,
  expansivityPerK: 3e-5,
  deltaTK: 1300,
  depthM: 660e3,
  diffusivityM2s: 1e-6,
  viscosityPas: 1e21,
};

describe('convection cell: onset of convection', () => {
  it('is 27π⁴/4 ≈ 657.5 in an infinite free-slip layer (Rayleigh 1916; Chandrasekhar 1961)', () => {
    expect(ONSET_RAYLEIGH_FREE_SLIP).toBeCloseTo(657.511, 3);
  });

  it('reaches 27π⁴/4 in a box of aspect ratio √2, which holds the critical wavenumber π/√2', () => {
    expect(onsetRayleigh(Math.SQRT2)).toBeCloseTo(ONSET_RAYLEIGH_FREE_SLIP, 9);
  });

  it('is higher in the unit square, (2π²)³/π² = 8π⁴ ≈ 779.3, as the square only holds wavenumber π', () => {
    expect(onsetRayleigh(1)).toBeCloseTo(8 * Math.PI ** 4, 9);
  });
});

describe('convection cell: derived numbers', () => {
  it('reports Blankenbach et al. (1989) case 1a’s Nu and Vrms at Ra = 10⁴, as the estimate is fitted there', () => {
    const derived = convectionCell.compute(defaults);
    expect(derived.rayleigh).toBe(1e4);
    expect(derived.aboveOnset).toBe(true);
    expect(derived.estimate.nusselt).toBeCloseTo(4.884409, 6);
    expect(derived.estimate.vrms).toBeCloseTo(42.864947, 6);
    expect(derived.estimate.basis).toMatch(/^Estimate from boundary-layer scaling/);
    expect(derived.physical).toBeUndefined();
  });

  it('lands within 5 % of Blankenbach et al. (1989) case 1c, Nu = 21.972 at Ra = 10⁶, with Nu ∝ Ra^(1/3)', () => {
    const derived = convectionCell.compute(withParams({ rayleigh: 1e6, nx: 256, nz: 256, playbackSpeed: 0.25 }));
    expect(Math.abs(derived.estimate.nusselt / 21.972 - 1)).toBeLessThan(0.05);
  });

  it('thins the boundary layer as Ra^(-1/3): a thousand times the Ra, a tenth the thickness', () => {
    const at = (rayleigh: number) => convectionCell.compute(withParams({ rayleigh, nx: 256, nz: 256, playbackSpeed: 0.25 })).estimate.boundaryLayerThickness;
    expect(at(1e4) / at(1e7)).toBeCloseTo(10, 9);
  });

  it('says nothing moves below onset: Nu = 1 (conduction only), no speed', () => {
    const derived = convectionCell.compute(withParams({ rayleigh: 500 }));
    expect(derived.aboveOnset).toBe(false);
    expect(derived.estimate.nusselt).toBe(1);
    expect(derived.estimate.vrms).toBe(0);
  });

  it('computes Ra from physical properties and gives time in Myr and speed in cm/yr from d and κ', () => {
    const params = withParams({ rayleigh: undefined, physical: upperMantle, units: 'physical', nx: 128, nz: 128 });
    const derived = convectionCell.compute(params);
    expect(derived.rayleigh).toBeCloseTo(3.6261e5, -1);
    expect(derived.rayleigh).toBe(rayleighFromPhysical(upperMantle));
    // d²/κ = (6.6e5)² / 1e-6 = 4.356e17 s; a Julian year is 3.15576e7 s, so 13 803 Myr.
    expect(derived.physical?.timeScaleMyr).toBeCloseTo(13_803.3, 0);
    // κ/d = 1e-6 / 6.6e5 = 1.51515e-12 m/s = 1.51515e-12 × 3.15576e7 × 100 cm/yr = 4.7815e-3 cm/yr.
    expect(derived.physical?.velocityScaleCmYr).toBeCloseTo(4.7815e-3, 6);
    // Prandtl number η/(ρκ) = 1e21 / (3300 × 1e-6) = 3.03e23: inertia is negligible, as the model assumes.
    expect(derived.physical?.prandtl).toBeCloseTo(3.0303e23, -20);
  });

  it('keeps the physical scales consistent: a speed times a time is a length in units of the depth', () => {
    const { timeScaleMyr, velocityScaleCmYr } = physicalScales({ depthM: 2.9e6, diffusivityM2s: 1e-6 });
    const depthCm = timeScaleMyr * 1e6 * velocityScaleCmYr;
    expect(depthCm).toBeCloseTo(2.9e8, -1);
  });
});

describe('convection cell: validation', () => {
  it('accepts the defaults', () => {
    expect(convectionCell.validate(defaults)).toEqual({ ok: true, params: defaults });
  });

  it('accepts the physical properties in place of Ra', () => {
    expect(convectionCell.validate(withParams({ rayleigh: undefined, physical: upperMantle, units: 'physical', nx: 128, nz: 128 })).ok).toBe(true);
  });

  it('refuses both Ra and physical properties at once, and neither', () => {
    expect(errorsOf(withParams({ physical: upperMantle }))).toEqual([
      { path: ['physical'], message: 'Set either the Rayleigh number Ra or the physical properties it is computed from, not both.' },
    ]);
    expect(errorsOf(withParams({ rayleigh: undefined })).map((error) => error.path)).toEqual([['rayleigh']]);
  });

  it('refuses physical units without the physical properties that set the scales', () => {
    const errors = errorsOf(withParams({ units: 'physical' }));
    expect(errors.map((error) => error.path)).toEqual([['units']]);
    expect(errors[0]?.message).toContain('depth and diffusivity');
  });

  it('refuses physical properties whose Ra is out of range, saying what lowers it', () => {
    const errors = errorsOf(withParams({ rayleigh: undefined, physical: { ...upperMantle, depthM: 2.9e6, viscosityPas: 1e19 } }));
    expect(errors).toHaveLength(1);
    expect(errors[0]?.path).toEqual(['physical']);
    expect(errors[0]?.message).toMatch(/^These properties give Ra = 3\.07\d* × 10\^9; the convection cell handles Ra from 100 to 1 × 10\^7\./);
  });

  it('refuses a grid too coarse for the boundary layer at that Ra, and names the grid to pick', () => {
    // Ra = 10⁵: Nu ≈ 0.2267 × 46.42 = 10.52, δ = 1/(2 Nu) = 0.0475 of the depth; 32 rows give 1.5 across it, 64 give 3.0.
    const errors = errorsOf(withParams({ rayleigh: 1e5, nz: 32 }));
    expect(errors.map((error) => error.path)).toEqual([['nz']]);
    expect(errors[0]?.message).toBe(
      'At Ra = 100,000 the thermal boundary layers are about 4.8 % of the depth thick; nz = 32 puts 1.5 rows across each, and at least 3 are needed to resolve it. Pick nz = 64 or more.',
    );
  });

  it('refuses a wide box with too few columns for its plumes', () => {
    const errors = errorsOf(withParams({ rayleigh: 1e5, aspectRatio: 4, nx: 64, nz: 64, playbackSpeed: 1 }));
    expect(errors.map((error) => error.path)).toEqual([['nx']]);
    expect(errors[0]?.message).toContain('Pick nx = 128 or more.');
  });

  it('says when no grid is fine enough and what to change', () => {
    // Ra = 10⁷ in a box 4 wide: δ ≈ 0.0102, plumes need 1.5 × 4 / 0.0102 ≈ 586 columns, more than 512.
    const errors = errorsOf(withParams({ rayleigh: 1e7, aspectRatio: 4, nx: 512, nz: 512, playbackSpeed: 0.25 }));
    expect(errors.map((error) => error.path)).toEqual([['nx'], ['nx']]);
    expect(errors[0]?.message).toMatch(/Even nx = 512 is too coarse: lower Ra or make the box narrower\.$/);
  });

  it('does not ask for boundary-layer resolution below onset, where the rock is still', () => {
    expect(convectionCell.validate(withParams({ rayleigh: 500, nx: 16, nz: 16 })).ok).toBe(true);
  });

  it('refuses a grid and speed over the kiosk frame budget, pointing at the speed when a slower one fits', () => {
    const errors = errorsOf(withParams({ nx: 128, nz: 128, playbackSpeed: 4 }));
    expect(errors.map((error) => error.path)).toEqual([['playbackSpeed']]);
    expect(errors[0]?.message).toContain('16.7 ms frame');
    expect(errors[0]?.message).toContain('Pick a playback speed of at most 2, or a coarser grid.');
  });

  it('reports a rule over the settings it reads even while an unrelated setting is wrong (an unknown ramp does not hide the frame budget)', () => {
    const errors = errorsOf(withParams({ colourRamp: 'rainbow' as never, nx: 128, nz: 128, playbackSpeed: 4 }));
    expect(errors.map((error) => error.path)).toEqual([['colourRamp'], ['playbackSpeed']]);
  });

  it('refuses a grid too fine even at the slowest speed, pointing at the grid', () => {
    const errors = errorsOf(withParams({ nx: 512, nz: 512, aspectRatio: 1, playbackSpeed: 0.25 }));
    expect(errors.map((error) => error.path)).toEqual([['nx']]);
    expect(errors[0]?.message).toContain('at most 131,072 points in all');
  });

  it('refuses grid sizes the transforms cannot take, and names the allowed ones', () => {
    expect(errorsOf(withParams({ nx: 100 as never }))).toEqual([
      { path: ['nx'], message: "Grid width nx must be one of 16, 32, 64, 128, 256, 512 grid points (the solver's transforms need a power of two)." },
    ]);
  });

  it('refuses unknown ramps and overlays, listing ours', () => {
    const errors = errorsOf(withParams({ colourRamp: 'rainbow' as never, overlay: 'smoke' as never }));
    expect(errors.map((error) => error.message)).toEqual([
      'Colour ramp must be one of mantle-heat, deep-sea, basalt-greys.',
      'Overlay must be one of streamlines, particles, arrows, none.',
    ]);
  });

  it('refuses a physical property out of range by its nested path', () => {
    const errors = errorsOf(withParams({ rayleigh: undefined, physical: { ...upperMantle, viscosityPas: -1 } }));
    expect(errors).toEqual([{ path: ['physical', 'viscosityPas'], message: 'Viscosity must be a number from 0.001 Pa·s to 1 × 10^25 Pa·s.' }]);
  });
});

describe('convection cell: model limits', () => {
  it('warns that nothing moves below onset', () => {
    expect(convectionCell.modelLimits(withParams({ rayleigh: 500 }))).toEqual([
      expect.objectContaining({ path: ['rayleigh'], code: 'below-onset', message: expect.stringContaining('nothing moves') }),
    ]);
  });

  it('warns that the estimates are rough near onset, and nothing at Blankenbach’s Ra = 10⁴', () => {
    expect(convectionCell.modelLimits(withParams({ rayleigh: 2000 })).map((warning) => warning.code)).toEqual(['estimate-rough']);
    expect(convectionCell.modelLimits(defaults)).toEqual([]);
  });

  it('warns when the properties are of a runny fluid, not rock, so inertia would matter', () => {
    const water = { densityKgM3: 1000, gravityMs2: 9.81, expansivityPerK: 2e-4, deltaTK: 2, depthM: 0.01, diffusivityM2s: 1.4e-7, viscosityPas: 1e-3 };
    const params = withParams({ rayleigh: undefined, physical: water, units: 'physical' });
    expect(convectionCell.validate(params).ok).toBe(true);
    expect(convectionCell.modelLimits(params).map((warning) => warning.code)).toContain('finite-prandtl');
  });
});

describe('convection cell: describe', () => {
  it('describes the default cell in English as convecting, with the estimate labelled', () => {
    expect(convectionCell.describe(defaults, 'en')).toBe(
      'A box of mantle rock, 1 times as wide as it is deep, heated from below and cooled from above. Its Rayleigh number is 10,000, above the 779.3 needed to start convection, so hot rock rises, cools at the top and sinks again. It carries roughly 4.9 times as much heat as conduction alone would (an estimate).',
    );
  });

  it('describes a still cell in French', () => {
    expect(convectionCell.describe(withParams({ rayleigh: 500 }), 'fr')).toContain('sous le seuil de 779,3 qui déclenche la convection');
  });

  it('describes a still cell in Spanish and a convecting one in Arabic', () => {
    expect(convectionCell.describe(withParams({ rayleigh: 500 }), 'es')).toContain('por debajo del 779,3 necesario para que empiece la convección');
    expect(convectionCell.describe(defaults, 'ar')).toContain('لذا ترتفع الصخور الساخنة');
  });

  it('adds depth, speed in cm/yr and crossing time in million years in physical units', () => {
    const params = withParams({ rayleigh: undefined, physical: upperMantle, units: 'physical', nx: 128, nz: 128 });
    expect(convectionCell.describe(params, 'en')).toMatch(/The box is 660\u00a0km deep; the rock moves at roughly [\d.]+\u00a0cm\/yr and crosses the box in about [\d.,]+ million years\.$/);
    expect(convectionCell.describe(params, 'fr')).toMatch(/cm\/an .* millions d’années environ\.$/);
    expect(convectionCell.describe(params, 'es')).toMatch(/cm\/año y cruza la caja en unos .* millones de años\.$/);
  });
});
