// One progress line per phase of `npm start` / `npm test`, and a failure that names the phase.
export class PhaseError extends Error {
  constructor(phase, message) {
    super(`${phase}: ${message}`);
    this.phase = phase;
  }
}

export function phase(name, detail = '') {
  const stamp = new Date().toISOString().slice(11, 19);
  console.log(`[${stamp}] ▸ ${name}${detail ? ` — ${detail}` : ''}`);
}
