import { publicationExpired, toReportText, type HeartbeatBody } from '@mantlepiece/shared/kiosk';
import type { KioskApi } from '../app/kiosk-api';
import type { KioskStore } from '../storage/kiosk-store';

/** Storage the kiosk's origin uses, or null where the browser will not say. */
async function storageUsed(): Promise<number | null> {
  try {
    const estimate = await navigator.storage?.estimate?.();
    return estimate?.usage ?? null;
  } catch {
    return null;
  }
}

/**
 * The kiosk's status for the Fleet page (issue 8): what it plays, how long it has run, what went
 * wrong, and the publication it follows, expired or not by its own clock (issue 11).
 */
export async function heartbeatBody(store: KioskStore, playing: number | null, appVersion: string, startedAt: number, now: number): Promise<HeartbeatBody> {
  const [lastError, publication] = await Promise.all([store.meta('lastError'), store.meta('publication')]);
  return {
    releaseId: playing,
    appVersion,
    uptimeS: Math.round((now - startedAt) / 1000),
    storageUsedBytes: await storageUsed(),
    // The server takes only plain text; the kiosk's messages can quote what it was sent.
    lastError: lastError === null ? null : toReportText(lastError),
    publicationSequence: publication?.sequence ?? null,
    publicationExpiresAt: publication?.expiresAt ?? null,
    publicationExpired: publication ? publicationExpired(publication.expiresAt, new Date(now)) : false,
  };
}

/** Sends one heartbeat; a server that is away is simply told next time. */
export async function sendHeartbeat(api: KioskApi, body: HeartbeatBody): Promise<boolean> {
  try {
    await api.heartbeat(body);
    return true;
  } catch {
    return false;
  }
}
