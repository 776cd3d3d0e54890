import { beforeAll, describe, expect, it } from 'vitest';
import { createConvection, runToSteadyState, rayleighFromPhysical, type SteadyState } from './solver.js';

/** Free-slip critical Rayleigh number 27π⁴/4 ≈ 657.51 at wavenumber π/√2 (Rayleigh 1916; Chandrasekhar 1961). */
const CRITICAL_RAYLEIGH = (27 * Math.PI ** 4) / 4;
const CRITICAL_WAVENUMBER = Math.PI / Math.SQRT2;
/** One cell at the critical wavenumber spans half a wavelength: A = π / k_c = √2. */
const CRITICAL_ASPECT = Math.SQRT2;

/**
 * Linear growth rate of the mode cos(kx x) sin(π z) between free-slip walls at infinite Prandtl
 * number. With θ ∝ e^{σt}, ψ = −Ra kx θ / K⁴ and w = Ra kx² θ / K⁴ (K² = kx² + π²), the heat
 * equation ∂θ/∂t − w = ∇²θ gives σ = Ra kx² / K⁴ − K², which is zero at Ra = K⁶ / kx², smallest
 * (27π⁴/4) at kx = π/√2.
 */
const growthRate = (rayleigh: number, kx: number) => {
  const k2 = kx * kx + Math.PI * Math.PI;
  return (rayleigh * kx * kx) / (k2 * k2) - k2;
};

/** Blankenbach et al. (1989, Geophys. J. Int. 98, 23–38), case 1a: Ra = 10⁴, unit square. */
const CASE_1A = { rayleigh: 1e4, aspectRatio: 1, nusselt: 4.884409, vrms: 42.864947 };

const relativeError = (value: number, reference: number) => Math.abs(value / reference - 1);

describe('rayleighFromPhysical', () => {
  it('matches a hand computation for the upper mantle', () => {
    // ρ = 3300 kg/m³, g = 9.80665 m/s² (standard gravity, 3rd CGPM 1901), α = 3e-5 /K, ΔT = 1300 K,
    // d = 700 km, κ = 1e-6 m²/s, η = 1e21 Pa·s (upper-mantle order, common practice, no source).
    // ρg = 32 361.945; ·α = 0.970 858 35; ·ΔT = 1262.115 855; d³ = 3.43e17 m³;
    // numerator = 4.329 057 38e20; κη = 1e15; Ra = 432 905.738.
    const ra = rayleighFromPhysical({
      densityKgM3: 3300,
      gravityMs2: 9.80665,
      expansivityPerK: 3e-5,
      deltaTK: 1300,
      depthM: 7e5,
      diffusivityM2s: 1e-6,
      viscosityPas: 1e21,
    });
    expect(ra).toBeCloseTo(432_905.738, 2);
  });

  it('matches a hand computation for the whole mantle', () => {
    // Same ρ, g, α, κ; ΔT = 3000 K, d = 2900 km, η = 1e22 Pa·s.
    // ρgαΔT = 2912.575 05; d³ = 2.4389e19 m³; numerator = 7.103 479 29e22; κη = 1e16; Ra = 7 103 479.29.
    const ra = rayleighFromPhysical({
      densityKgM3: 3300,
      gravityMs2: 9.80665,
      expansivityPerK: 3e-5,
      deltaTK: 3000,
      depthM: 2.9e6,
      diffusivityM2s: 1e-6,
      viscosityPas: 1e22,
    });
    expect(ra).toBeCloseTo(7_103_479.29, 1);
  });
});

describe('onset of convection between free-slip walls (Rayleigh 1916; Chandrasekhar 1961)', () => {
  /** Growth rate of Vrms over t in [0.2, 0.7], after the faster-decaying modes have gone. */
  function measuredGrowthRate(rayleigh: number, n: number, seed?: number): number {
    const sim = createConvection({ rayleigh, aspectRatio: CRITICAL_ASPECT, nx: n, nz: n, seed, perturbation: 1e-3 });
    sim.step(200);
    const [t1, v1] = [sim.time, sim.vrms()];
    sim.step(500);
    return Math.log(sim.vrms() / v1) / (sim.time - t1);
  }

  it.each([
    [0.9, 'decays'],
    [1.1, 'grows'],
  ])('at %f × 657.5 a small random perturbation %s', (factor, behaviour) => {
    const sigma = measuredGrowthRate(factor * 657.5, 32, 11);
    if (behaviour === 'grows') expect(sigma).toBeGreaterThan(0);
    else expect(sigma).toBeLessThan(0);
  });

  it.each([0.9, 1.1])('at %f × 657.5 the critical mode grows at the analytic linear rate within 2 %', (factor) => {
    const expected = growthRate(factor * 657.5, CRITICAL_WAVENUMBER);
    expect(Math.abs(expected)).toBeCloseTo(1.48, 2);
    const sigma = measuredGrowthRate(factor * 657.5, 32);
    expect(Math.sign(sigma)).toBe(Math.sign(expected));
    expect(relativeError(sigma, expected)).toBeLessThan(0.02);
  });

  it('gets the linear growth rate more accurately on a finer grid (second order)', () => {
    const expected = growthRate(1.1 * 657.5, CRITICAL_WAVENUMBER);
    const [coarse, fine] = [16, 32].map((n) => relativeError(measuredGrowthRate(1.1 * 657.5, n), expected));
    expect(fine).toBeLessThan(coarse / 3);
  });

  it('puts the neutral curve of that growth rate at 27π⁴/4 and wavenumber π/√2', () => {
    expect(growthRate(CRITICAL_RAYLEIGH, CRITICAL_WAVENUMBER)).toBeCloseTo(0, 10);
    expect(growthRate(CRITICAL_RAYLEIGH, 0.9 * CRITICAL_WAVENUMBER)).toBeLessThan(0);
    expect(growthRate(CRITICAL_RAYLEIGH, 1.1 * CRITICAL_WAVENUMBER)).toBeLessThan(0);
  });

  it('settles to pure conduction (Nu = 1, no flow) below onset', () => {
    const steady = runToSteadyState({ rayleigh: 0.9 * 657.5, aspectRatio: CRITICAL_ASPECT, nx: 16, nz: 16, seed: 5 });
    expect(steady.converged).toBe(true);
    expect(steady.nusselt).toBeCloseTo(1, 6);
    expect(steady.vrms).toBeLessThan(1e-3);
  });
});

describe('Blankenbach et al. (1989) case 1a, Ra = 1e4: Nu = 4.884409, Vrms = 42.864947', () => {
  const grids = [32, 64, 128] as const;
  const results = new Map<number, SteadyState>();

  beforeAll(() => {
    // Each finer grid starts from the coarser steady field, resampled spectrally, to keep CI quick.
    let previous: { n: number; state: SteadyState } | undefined;
    for (const n of grids) {
      const state = runToSteadyState({
        rayleigh: CASE_1A.rayleigh,
        aspectRatio: CASE_1A.aspectRatio,
        nx: n,
        nz: n,
        initialTemperature: previous && { nx: previous.n, nz: previous.n, values: previous.state.temperature },
      });
      results.set(n, state);
      previous = { n, state };
    }
  }, 120_000);

  it.each(grids.map((n) => [n, n]))('reaches a steady state on %i × %i cells by its own tolerance, within 1 % of both values', (n) => {
    const state = results.get(n)!;
    expect(state.converged).toBe(true);
    expect(relativeError(state.nusselt, CASE_1A.nusselt)).toBeLessThan(0.01);
    expect(relativeError(state.vrms, CASE_1A.vrms)).toBeLessThan(0.01);
  });

  it('converges at second order: each halving of the cell cuts both errors at least threefold', () => {
    const errors = grids.map((n) => results.get(n)!);
    for (let g = 1; g < errors.length; g++) {
      expect(relativeError(errors[g].nusselt, CASE_1A.nusselt)).toBeLessThan(relativeError(errors[g - 1].nusselt, CASE_1A.nusselt) / 3);
      expect(relativeError(errors[g].vrms, CASE_1A.vrms)).toBeLessThan(relativeError(errors[g - 1].vrms, CASE_1A.vrms) / 3);
    }
  });

  it('carries the same heat through mid-depth (advection + conduction) as through the top', () => {
    const n = 64;
    const sim = createConvection({ ...CASE_1A, nx: n, nz: n, initialTemperature: { nx: n, nz: n, values: results.get(n)!.temperature } });
    const t = sim.temperature;
    const dx = 1 / n;
    let flux = 0;
    for (let i = 0; i < n; i++) {
      const below = t[(n / 2 - 1) * n + i];
      const above = t[(n / 2) * n + i];
      const { w } = sim.velocityAt((i + 0.5) * dx, 0.5);
      flux += (w * 0.5 * (below + above) - (above - below) * n) / n;
    }
    expect(relativeError(flux, sim.nusselt())).toBeLessThan(0.005);
  });

  it('samples velocities whose rms matches vrms(), with no flow through the walls and hot fluid rising', () => {
    const n = 64;
    const sim = createConvection({ ...CASE_1A, nx: n, nz: n, initialTemperature: { nx: n, nz: n, values: results.get(n)!.temperature } });
    let sum = 0;
    const samples = 200;
    for (let a = 0; a < samples; a++) {
      for (let b = 0; b < samples; b++) {
        const { u, w } = sim.velocityAt((a + 0.5) / samples, (b + 0.5) / samples);
        sum += u * u + w * w;
      }
    }
    expect(relativeError(Math.sqrt(sum / samples ** 2), sim.vrms())).toBeLessThan(0.01);
    for (const s of [0.1, 0.5, 0.9]) {
      expect(Math.abs(sim.velocityAt(0, s).u)).toBe(0);
      expect(Math.abs(sim.velocityAt(1, s).u)).toBe(0);
      expect(Math.abs(sim.velocityAt(s, 0).w)).toBe(0);
      expect(Math.abs(sim.velocityAt(s, 1).w)).toBe(0);
    }
    // The side whose mid-depth is warmer is the side where the flow goes up.
    const t = sim.temperature;
    const midRow = (n / 2) * n;
    const warmLeft = t[midRow + 1] > t[midRow + n - 2];
    expect(sim.velocityAt(0.05, 0.5).w > 0).toBe(warmLeft);
    expect(sim.velocityAt(0.95, 0.5).w < 0).toBe(warmLeft);
  });
});

describe('createConvection', () => {
  it('keeps temperature within [0, 1] through a vigorous start (TVD advection)', () => {
    const sim = createConvection({ rayleigh: 1e6, aspectRatio: 2, nx: 64, nz: 32, seed: 3 });
    let [lowest, highest] = [Infinity, -Infinity];
    for (let frame = 0; frame < 60; frame++) {
      sim.step(20);
      for (const value of sim.temperature) {
        lowest = Math.min(lowest, value);
        highest = Math.max(highest, value);
      }
    }
    expect(sim.nusselt()).toBeGreaterThan(5);
    expect(lowest).toBeGreaterThanOrEqual(-1e-3);
    expect(highest).toBeLessThanOrEqual(1 + 1e-3);
  });

  it('keeps each step within the Courant limit and counts time and steps', () => {
    const sim = createConvection({ rayleigh: 1e5, aspectRatio: 1, nx: 32, nz: 32, seed: 2, courant: 0.5 });
    let time = 0;
    for (let s = 0; s < 50; s++) {
      // Courant number |u| dt/dx + |w| dt/dz at each cell centre, with the velocity the step starts from.
      let fastest = 0;
      for (let a = 0; a < 32; a++) {
        for (let b = 0; b < 32; b++) {
          const { u, w } = sim.velocityAt((a + 0.5) / 32, (b + 0.5) / 32);
          fastest = Math.max(fastest, Math.abs(u) * 32 + Math.abs(w) * 32);
        }
      }
      sim.step();
      time += sim.lastTimeStep;
      expect(sim.lastTimeStep * fastest).toBeLessThanOrEqual(0.5 + 1e-12);
    }
    expect(sim.steps).toBe(50);
    expect(sim.time).toBeCloseTo(time, 12);
  });

  it('lays temperature out row-major with row 0 at the bottom', () => {
    const sim = createConvection({ rayleigh: 1e3, aspectRatio: 2, nx: 16, nz: 8, perturbation: 0 });
    const t = sim.temperature;
    expect(t).toHaveLength(16 * 8);
    // Pure conduction: T = 1 − z at the cell centres z = (j + ½)/8.
    expect(t[0]).toBeCloseTo(1 - 0.5 / 8, 12);
    expect(t[7 * 16 + 15]).toBeCloseTo(0.5 / 8, 12);
    expect(sim.streamFunction).toHaveLength(16 * 8);
  });

  it('starts the same for the same seed and differently for another', () => {
    const run = (seed: number) => {
      const sim = createConvection({ rayleigh: 1e5, aspectRatio: 1.5, nx: 32, nz: 16, seed });
      sim.step(10);
      return sim.temperature.slice();
    };
    expect(run(4)).toEqual(run(4));
    expect(run(4)).not.toEqual(run(5));
  });

  it('resamples a starting field from another grid, keeping its heat flow', () => {
    const coarse = createConvection({ rayleigh: 1e4, aspectRatio: 1, nx: 32, nz: 32 });
    coarse.step(300);
    const field = { nx: 32, nz: 32, values: coarse.temperature.slice() };
    const same = createConvection({ rayleigh: 1e4, aspectRatio: 1, nx: 32, nz: 32, initialTemperature: field });
    const fine = createConvection({ rayleigh: 1e4, aspectRatio: 1, nx: 64, nz: 64, initialTemperature: field });
    expect(Array.from(same.temperature).every((v, k) => Math.abs(v - field.values[k]) < 1e-12)).toBe(true);
    expect(fine.nusselt()).toBeCloseTo(coarse.nusselt(), 10);
    expect(fine.vrms()).toBeCloseTo(coarse.vrms(), 1);
  });

  it.each([
    [{ nx: 48 }, /nx must be a power of two/],
    [{ nz: 4 }, /nz must be a power of two from 8 to 1024/],
    [{ rayleigh: -1 }, /Rayleigh number/],
    [{ aspectRatio: 0 }, /Aspect ratio/],
    [{ courant: 1.5 }, /Courant number/],
  ])('refuses %o', (override, message) => {
    expect(() => createConvection({ rayleigh: 1e4, aspectRatio: 1, nx: 32, nz: 32, ...override })).toThrow(message);
  });
});
