import { createConvection, type ConvectionSimulation } from '../widgets/convection-cell/solver.js';

/** Messages between the convection cell on the page and the solver that runs it (in a Web Worker when there is one). */
export interface StartRequest {
  kind: 'start';
  /** Counts restarts, so a frame of an older simulation is never drawn after the params changed. */
  generation: number;
  rayleigh: number;
  aspectRatio: number;
  nx: number;
  nz: number;
  seed?: number;
}
export interface AdvanceRequest {
  kind: 'advance';
  generation: number;
  steps: number;
}
export type HostRequest = StartRequest | AdvanceRequest;

export interface HostFrame {
  kind: 'frame';
  generation: number;
  steps: number;
  time: number;
  nusselt: number;
  vrms: number;
  nx: number;
  nz: number;
  aspectRatio: number;
  /** Row 0 at the bottom, as the solver lays it out. */
  temperature: Float64Array;
  streamFunction: Float64Array;
  /** Flow arrows: x, z, u, w for each sample point. */
  arrows: Float32Array;
  /** Drifting particles: x, z for each. */
  particles: Float32Array;
}
export interface HostError {
  kind: 'error';
  generation: number;
  message: string;
}
export type HostMessage = HostFrame | HostError;

const PARTICLES = 180;
const ARROW_ROWS = 7;

/** Evenly spread starting points, nudged by a fixed pattern so they do not line up with the arrows. */
function seedParticles(aspectRatio: number): Float32Array {
  const columns = Math.ceil(Math.sqrt(PARTICLES * aspectRatio));
  const rows = Math.ceil(PARTICLES / columns);
  const particles = new Float32Array(rows * columns * 2);
  for (let r = 0; r < rows; r += 1) {
    for (let c = 0; c < columns; c += 1) {
      const k = (r * columns + c) * 2;
      particles[k] = ((c + 0.5 + 0.3 * Math.sin(r * 1.7)) / columns) * aspectRatio;
      particles[k + 1] = (r + 0.5 + 0.3 * Math.cos(c * 2.3)) / rows;
    }
  }
  return particles;
}

/** Moves each particle with the flow over `dt` (midpoint rule), kept inside the box. */
function driftParticles(sim: ConvectionSimulation, particles: Float32Array, dt: number) {
  for (let k = 0; k < particles.length; k += 2) {
    const x = particles[k]!;
    const z = particles[k + 1]!;
    const first = sim.velocityAt(x, z);
    const middle = sim.velocityAt(x + first.u * dt * 0.5, z + first.w * dt * 0.5);
    particles[k] = Math.min(Math.max(x + middle.u * dt, 0), sim.aspectRatio);
    particles[k + 1] = Math.min(Math.max(z + middle.w * dt, 0), 1);
  }
}

function sampleArrows(sim: ConvectionSimulation): Float32Array {
  const columns = Math.max(2, Math.round(ARROW_ROWS * sim.aspectRatio));
  const arrows = new Float32Array(columns * ARROW_ROWS * 4);
  for (let r = 0; r < ARROW_ROWS; r += 1) {
    for (let c = 0; c < columns; c += 1) {
      const x = ((c + 0.5) / columns) * sim.aspectRatio;
      const z = (r + 0.5) / ARROW_ROWS;
      const { u, w } = sim.velocityAt(x, z);
      arrows.set([x, z, u, w], (r * columns + c) * 4);
    }
  }
  return arrows;
}

/**
 * The solver side of the convection cell: one simulation, advanced on request, answering each
 * request with one frame. The page asks for the next frame only after drawing the last, so
 * frames never queue up behind a slow device.
 */
export function createConvectionHost(send: (message: HostMessage, transfer: Transferable[]) => void): (request: HostRequest) => void {
  let sim: ConvectionSimulation | undefined;
  let particles: Float32Array = new Float32Array(0);
  let generation = -1;

  const sendFrame = () => {
    if (!sim) return;
    const temperature = sim.temperature.slice();
    const streamFunction = sim.streamFunction.slice();
    const arrows = sampleArrows(sim);
    const particleCopy = particles.slice();
    send(
      {
        kind: 'frame',
        generation,
        steps: sim.steps,
        time: sim.time,
        nusselt: sim.nusselt(),
        vrms: sim.vrms(),
        nx: sim.nx,
        nz: sim.nz,
        aspectRatio: sim.aspectRatio,
        temperature,
        streamFunction,
        arrows,
        particles: particleCopy,
      },
      [temperature.buffer, streamFunction.buffer, arrows.buffer, particleCopy.buffer],
    );
  };

  return (request) => {
    try {
      if (request.kind === 'start') {
        generation = request.generation;
        const { rayleigh, aspectRatio, nx, nz, seed } = request;
        sim = createConvection({ rayleigh, aspectRatio, nx, nz, ...(seed === undefined ? {} : { seed }) });
        particles = seedParticles(aspectRatio);
        sendFrame();
        return;
      }
      if (!sim || request.generation !== generation) return;
      for (let s = 0; s < request.steps; s += 1) {
        const before = sim.time;
        sim.step();
        driftParticles(sim, particles, sim.time - before);
      }
      sendFrame();
    } catch (error) {
      send({ kind: 'error', generation, message: error instanceof Error ? error.message : String(error) }, []);
    }
  };
}
