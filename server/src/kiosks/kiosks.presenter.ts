import type { KioskPublicationView, KioskView } from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import type { Release } from '../releases/models/release.model.js';
import type { Gallery } from '../venues/models/gallery.model.js';
import type { Station } from '../venues/models/station.model.js';
import { kioskCan } from './kiosk-policy.js';
import type { Kiosk } from './models/kiosk.model.js';

const releaseRef = (release: Release | undefined) => (release ? { id: release.id, number: release.number } : null);

type PublicationReport = Pick<Kiosk, 'publicationSequence' | 'publicationExpiresAt' | 'publicationExpired'>;

/** What a kiosk or one of its heartbeats said of its publication; null from kiosks that do not say. */
export const publicationReport = (report: PublicationReport): KioskPublicationView | null =>
  report.publicationSequence === null || report.publicationExpiresAt === null
    ? null
    : { sequence: report.publicationSequence, expiresAt: report.publicationExpiresAt.toISOString(), expired: Boolean(report.publicationExpired) };

/** `kiosk` with its station and gallery; releases by id, for what it plays and what is Live; what `person` may do to it. */
export const toKioskView = (kiosk: Kiosk & { station: Station & { gallery: Gallery } }, releases: Map<number, Release>, live: Map<number, Release>, person: Person): KioskView => ({
  id: kiosk.id,
  station: { id: kiosk.station.id, name: kiosk.station.name },
  gallery: { id: kiosk.station.gallery.id, name: kiosk.station.gallery.name },
  pairedAt: kiosk.pairedAt.toISOString(),
  revokedAt: kiosk.revokedAt?.toISOString() ?? null,
  lastHeartbeatAt: kiosk.lastHeartbeatAt?.toISOString() ?? null,
  appVersion: kiosk.appVersion,
  uptimeS: kiosk.uptimeS,
  storageUsedBytes: kiosk.storageUsedBytes === null ? null : Number(kiosk.storageUsedBytes),
  lastError: kiosk.lastError,
  demo: kiosk.demo,
  releasePlaying: releaseRef(kiosk.lastReleaseId === null ? undefined : releases.get(kiosk.lastReleaseId)),
  releaseLive: releaseRef(live.get(kiosk.station.galleryId)),
  publication: publicationReport(kiosk),
  can: kioskCan(person, kiosk),
});
