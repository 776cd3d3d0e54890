/** How a kiosk looks from its heartbeats (issue 8): reporting, late, or gone quiet. */
export const KIOSK_STATES = ['online', 'stale', 'offline'] as const;
export type KioskState = (typeof KIOSK_STATES)[number];

export interface KioskStateThresholds {
  /** Silence, in seconds, after which a kiosk is late: it has missed a heartbeat or two. */
  staleAfterS: number;
  /** Silence, in seconds, after which a kiosk counts as gone (and technicians are told). */
  offlineAfterS: number;
}

/**
 * Thresholds from the heartbeat interval: two missed heartbeats make a kiosk stale, since one can
 * be lost to a busy network; offline is a venue's choice, but never sooner than stale.
 */
export function kioskStateThresholds(heartbeatIntervalS: number, offlineAfterS: number): KioskStateThresholds {
  const staleAfterS = 2 * heartbeatIntervalS;
  return { staleAfterS, offlineAfterS: Math.max(offlineAfterS, staleAfterS) };
}

/** A kiosk that never reported is offline: nothing says it is showing anything. */
export function kioskState(lastHeartbeatAt: Date | string | null, now: Date, { staleAfterS, offlineAfterS }: KioskStateThresholds): KioskState {
  if (lastHeartbeatAt === null) return 'offline';
  const silentMs = now.getTime() - new Date(lastHeartbeatAt).getTime();
  if (silentMs >= offlineAfterS * 1000) return 'offline';
  if (silentMs >= staleAfterS * 1000) return 'stale';
  return 'online';
}

/** Whether a kiosk may still call the server, for the Fleet's filter: a revoked kiosk's access has ended for good. */
export const KIOSK_ACCESS = ['active', 'revoked'] as const;
export type KioskAccess = (typeof KIOSK_ACCESS)[number];
