/** Timings a venue may tune per screen, from the launch URL (`/kiosk/?idle=120&warning=30`, seconds). */
export interface KioskConfig {
  /** Quiet time before the "Still there?" warning. */
  idleMs: number;
  /** How long the warning counts down before the reset; never under 20 s (WCAG 2.2, 2.2.1 Timing Adjustable). */
  warningMs: number;
  /** Each story highlight of the attract loop stays this long. */
  attractMs: number;
  manifestPollMs: number;
  heartbeatMs: number;
  eventUploadMs: number;
}

export const DEFAULT_CONFIG: KioskConfig = {
  idleMs: 90_000,
  warningMs: 30_000,
  attractMs: 10_000,
  manifestPollMs: 60_000,
  heartbeatMs: 30_000,
  eventUploadMs: 60_000,
};

/** WCAG 2.2 success criterion 2.2.1 lets a warning stand in for a longer limit if it gives at least 20 s. */
export const MIN_WARNING_MS = 20_000;

const PARAMS: Record<string, keyof KioskConfig> = {
  idle: 'idleMs',
  warning: 'warningMs',
  attract: 'attractMs',
  poll: 'manifestPollMs',
  heartbeat: 'heartbeatMs',
  upload: 'eventUploadMs',
};

export function readKioskConfig(search: string): KioskConfig {
  const config = { ...DEFAULT_CONFIG };
  const query = new URLSearchParams(search);
  for (const [param, key] of Object.entries(PARAMS)) {
    const seconds = Number(query.get(param));
    if (query.has(param) && Number.isFinite(seconds) && seconds > 0) config[key] = seconds * 1000;
  }
  config.warningMs = Math.max(config.warningMs, MIN_WARNING_MS);
  return config;
}
