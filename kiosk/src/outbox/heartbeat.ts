import type { HeartbeatBody } from '@mantlepiece/shared';
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

/** The kiosk's status for the Fleet page (issue 8): what it plays, how long it has run, what went wrong. */
export async function heartbeatBody(store: KioskStore, playing: number | null, appVersion: string, startedAt: number, now: number): Promise<HeartbeatBody> {
  return {
    releaseId: playing,
    appVersion,
    uptimeS: Math.round((now - startedAt) / 1000),
    storageUsedBytes: await storageUsed(),
    lastError: await store.meta('lastError'),
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
