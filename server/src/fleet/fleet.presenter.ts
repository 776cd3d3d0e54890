import type { HeartbeatView } from '@mantlepiece/shared';
import { publicationReport } from '../kiosks/kiosks.presenter.js';
import type { KioskHeartbeat } from '../kiosks/models/kiosk-heartbeat.model.js';
import type { Release } from '../releases/models/release.model.js';

/** `releases` by id: a heartbeat names a release that may since have been deleted with a failed build. */
export const toHeartbeatView = (heartbeat: KioskHeartbeat, releases: Map<number, Release>): HeartbeatView => {
  const release = heartbeat.releaseId === null ? undefined : releases.get(heartbeat.releaseId);
  return {
    id: Number(heartbeat.id),
    receivedAt: heartbeat.receivedAt.toISOString(),
    release: release ? { id: release.id, number: release.number } : null,
    appVersion: heartbeat.appVersion,
    uptimeS: heartbeat.uptimeS,
    storageUsedBytes: heartbeat.storageUsedBytes === null ? null : Number(heartbeat.storageUsedBytes),
    lastError: heartbeat.lastError,
    publication: publicationReport(heartbeat),
  };
};
