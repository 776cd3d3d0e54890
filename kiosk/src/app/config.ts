/**
 * What a venue sets per screen in the launch URL: timings in seconds (`/kiosk/?idle=120&warning=30`)
 * and the venue an unpaired screen shows (`?venue=<slug>`, the install URL a technician opens).
 */
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
  /** The venue's key; a paired kiosk shows its own venue whatever this says. */
  venueSlug: string | null;
}

export const DEFAULT_CONFIG: KioskConfig = {
  idleMs: 90_000,
  warningMs: 30_000,
  attractMs: 10_000,
  manifestPollMs: 60_000,
  heartbeatMs: 30_000,
  eventUploadMs: 60_000,
  venueSlug: null,
};

/** WCAG 2.2 success criterion 2.2.1 lets a warning stand in for a longer limit if it gives at least 20 s. */
export const MIN_WARNING_MS = 20_000;

const PARAMS: Record<string, Exclude<keyof KioskConfig, 'venueSlug'>> = {
  idle: 'idleMs',
  warning: 'warningMs',
  attract: 'attractMs',
  poll: 'manifestPollMs',
  heartbeat: 'heartbeatMs',
  upload: 'eventUploadMs',
};

export function readKioskConfig(search: string): KioskConfig {
  const query = new URLSearchParams(search);
  const config = { ...DEFAULT_CONFIG, venueSlug: query.get('venue') || null };
  for (const [param, key] of Object.entries(PARAMS)) {
    const seconds = Number(query.get(param));
    if (query.has(param) && Number.isFinite(seconds) && seconds > 0) config[key] = seconds * 1000;
  }
  config.warningMs = Math.max(config.warningMs, MIN_WARNING_MS);
  return config;
}
