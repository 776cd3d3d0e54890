import type { Page } from '../auth/views.js';
import type { Can, KioskCan, ReleaseCan } from '../auth/can.js';

/** Release and kiosk views of the staff API (issue 7), shared by the server and the studio. */
export type ReleaseState = 'building' | 'ready' | 'live' | 'superseded' | 'failed';

export interface ReleaseStoryView {
  storyId: number;
  revisionId: number;
  revisionNumber: number;
  title: string;
}

export interface ReleaseView {
  id: number;
  galleryId: number;
  number: number;
  state: ReleaseState;
  /** 0 to 1 while building; 1 once built. */
  progress: number;
  /** What the build is doing or last did, in words. */
  phase: string;
  /** Why a build failed; null otherwise. */
  failure: string | null;
  /** Where staff read the signed manifest; null until it is signed. */
  manifestUrl: string | null;
  createdAt: string;
  readyAt: string | null;
  publishedAt: string | null;
  /** Files listed in the manifest, and their total size in bytes. */
  files: number;
  bytes: number;
  stories: ReleaseStoryView[];
  can: ReleaseCan;
}

/** GET /api/galleries/:id/releases: a page, and whether the signed-in person may build a release. */
export type ReleasePage = Page<ReleaseView> & { can: Can<'releases'> };

export interface ReleaseComparison {
  a: { id: number; number: number };
  b: { id: number; number: number };
  added: ReleaseStoryView[];
  removed: ReleaseStoryView[];
  changed: { storyId: number; title: string; from: ReleaseStoryView; to: ReleaseStoryView }[];
  unchanged: ReleaseStoryView[];
}

export interface KioskView {
  id: number;
  station: { id: number; name: string };
  gallery: { id: number; name: string };
  pairedAt: string;
  revokedAt: string | null;
  lastHeartbeatAt: string | null;
  appVersion: string | null;
  uptimeS: number | null;
  storageUsedBytes: number | null;
  lastError: string | null;
  /** The demo venue's invented kiosk, whose heartbeats and visitor events are made up. */
  demo: boolean;
  /** What the kiosk said it plays in its last heartbeat. */
  releasePlaying: { id: number; number: number } | null;
  /** What is Live for its gallery now. */
  releaseLive: { id: number; number: number } | null;
  /** The publication it said it follows in its last heartbeat; null before it reported one. */
  publication: KioskPublicationView | null;
  can: KioskCan;
}

/** A kiosk's word on the publication it follows (issue 11). */
export interface KioskPublicationView {
  sequence: number;
  expiresAt: string;
  /** Past `expiresAt` by the kiosk's clock: it plays on, but has had no fresh word from the server. */
  expired: boolean;
}
