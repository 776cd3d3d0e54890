// Convection cell solver in Node: step rate, step cost against an FFT floor, time to a steady state.
// Runs against the built package (npm run build -w shared), so it measures what ships.
import FFT from 'fft.js';
import { createConvection, runToSteadyState } from '../dist/widgets/convection-cell/solver.js';

/** Blankenbach et al. (1989, Geophys. J. Int. 98, 23–38), case 1a. */
const CASE_1A = { rayleigh: 1e4, aspectRatio: 1, nusselt: 4.884409, vrms: 42.864947 };

/**
 * Best-of-rounds time per call of each function, in ms, the rounds of all of them interleaved so
 * that load from other processes on a shared machine falls on each alike.
 */
function timePerCall(fns, repeats, rounds = 15) {
  const best = fns.map(() => Infinity);
  for (let r = 0; r < rounds; r++) {
    fns.forEach((fn, f) => {
      const start = performance.now();
      for (let k = 0; k < repeats; k++) fn();
      best[f] = Math.min(best[f], (performance.now() - start) / repeats);
    });
  }
  return best;
}

/**
 * One forward and one inverse two-dimensional real FFT of an n × n grid with fft.js, the way its
 * API offers: realTransform on the rows, complex transforms on the n/2 + 1 spectral columns, and
 * back with inverseTransform (fft.js has no inverse real transform, so rows go back as complex).
 */
function fftRoundTrip(n) {
  const fft = new FFT(n);
  const half = n / 2 + 1;
  const grid = Float64Array.from({ length: n * n }, (_, k) => Math.sin(k));
  const spectrum = new Float64Array(n * half * 2);
  const row = new Float64Array(n);
  const out = new Float64Array(2 * n);
  const column = new Float64Array(2 * n);
  return () => {
    for (let j = 0; j < n; j++) {
      fft.realTransform(out, grid.subarray(j * n, (j + 1) * n));
      spectrum.set(out.subarray(0, 2 * half), j * half * 2);
    }
    for (let c = 0; c < half; c++) {
      for (let j = 0; j < n; j++) {
        column[2 * j] = spectrum[(j * half + c) * 2];
        column[2 * j + 1] = spectrum[(j * half + c) * 2 + 1];
      }
      fft.transform(out, column);
      for (let j = 0; j < n; j++) {
        spectrum[(j * half + c) * 2] = out[2 * j];
        spectrum[(j * half + c) * 2 + 1] = out[2 * j + 1];
      }
    }
    for (let c = 0; c < half; c++) {
      for (let j = 0; j < n; j++) {
        column[2 * j] = spectrum[(j * half + c) * 2];
        column[2 * j + 1] = spectrum[(j * half + c) * 2 + 1];
      }
      fft.inverseTransform(out, column);
      for (let j = 0; j < n; j++) {
        spectrum[(j * half + c) * 2] = out[2 * j];
        spectrum[(j * half + c) * 2 + 1] = out[2 * j + 1];
      }
    }
    for (let j = 0; j < n; j++) {
      column.set(spectrum.subarray(j * half * 2, (j + 1) * half * 2));
      fft.completeSpectrum(column);
      fft.inverseTransform(out, column);
      for (let i = 0; i < n; i++) row[i] = out[2 * i];
      grid.set(row, j * n);
    }
  };
}

/** ms per step of a developed case-1a flow, and per fft.js forward + inverse pair, same grid. */
function stepAndFloor(n) {
  const sim = createConvection({ rayleigh: CASE_1A.rayleigh, aspectRatio: CASE_1A.aspectRatio, nx: n, nz: n });
  sim.step(500);
  return timePerCall([() => sim.step(), fftRoundTrip(n)], Math.max(10, Math.round(200_000 / (n * n))));
}

function steadyState(n) {
  const start = performance.now();
  const state = runToSteadyState({ rayleigh: CASE_1A.rayleigh, aspectRatio: CASE_1A.aspectRatio, nx: n, nz: n });
  return {
    wallSeconds: (performance.now() - start) / 1000,
    ...state,
    nusseltError: state.nusselt / CASE_1A.nusselt - 1,
    vrmsError: state.vrms / CASE_1A.vrms - 1,
  };
}

const percent = (x) => `${(100 * x).toFixed(3)} %`;

export async function run() {
  const stepRows = [64, 128].map((n) => {
    const [stepMs, fftMs] = stepAndFloor(n);
    return [`${n} × ${n}`, (1000 / stepMs).toFixed(0), stepMs.toFixed(3), fftMs.toFixed(3), (stepMs / fftMs).toFixed(2)];
  });
  const steadyRows = [32, 64].map((n) => {
    const s = steadyState(n);
    return [
      `${n} × ${n}`,
      s.wallSeconds.toFixed(2),
      String(s.steps),
      s.time.toFixed(3),
      `${s.nusselt.toFixed(5)} (${percent(s.nusseltError)})`,
      `${s.vrms.toFixed(4)} (${percent(s.vrmsError)})`,
    ];
  });
  return {
    title: 'Convection cell solver, Node',
    tables: [
      {
        caption: 'Steps at Ra = 1e4, A = 1, developed flow (best of 15 interleaved rounds)',
        columns: ['grid', 'steps/s', 'ms/step', 'fft.js 2-D real FFT forward + inverse, ms', 'step / FFT pair'],
        rows: stepRows,
      },
      {
        caption: 'Blankenbach et al. (1989) case 1a to a steady state, runToSteadyState defaults, from the built-in start',
        columns: ['grid', 'wall time, s', 'steps', 'model time', 'Nu (error)', 'Vrms (error)'],
        rows: steadyRows,
      },
    ],
    notes: [
      'A step does three 2-D fast transforms (cell-centre cosine/sine analysis and synthesis of T, corner sine synthesis of ψ), each one complex FFT per pair of lines, plus three finite-volume advection stages.',
      'The FFT pair is fft.js realTransform on the rows and complex transforms on the spectral columns, then back with inverseTransform (fft.js has no inverse real transform).',
      'Timings are the best of interleaved rounds, so other work on a shared machine inflates step and FFT alike; the 1 % case-1a grid is 32 × 32 (errors shrink about fourfold per halving of the cell, see solver.test.ts).',
      'Reference values: Nu = 4.884409, Vrms = 42.864947 (Blankenbach et al. 1989, Geophys. J. Int. 98, 23–38).',
    ],
  };
}
