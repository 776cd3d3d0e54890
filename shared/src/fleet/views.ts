import type { Page } from '../auth/views.js';
import type { KioskPublicationView, KioskView } from '../release/views.js';
import type { KioskState } from './kiosk-state.js';

/** One kiosk on the Fleet page: what it reported, and what that means now. */
export interface FleetKioskView extends KioskView {
  state: KioskState;
  /** Whether it plays the release that is Live for its gallery (false when either is missing). */
  playsLiveRelease: boolean;
}

export interface HeartbeatView {
  id: number;
  /** @format date-time */
  receivedAt: string;
  /** The release it said it played. */
  release: { id: number; number: number } | null;
  appVersion: string;
  uptimeS: number;
  storageUsedBytes: number | null;
  lastError: string | null;
  publication: KioskPublicationView | null;
}

/** The thresholds the server judges states by, so the studio can explain them. */
export interface FleetThresholdsView {
  heartbeatIntervalS: number;
  staleAfterS: number;
  offlineAfterS: number;
}

/** `GET /api/kiosks/:id`: the kiosk and a page of its heartbeats, newest first. */
export interface FleetKioskDetail extends FleetKioskView {
  heartbeats: Page<HeartbeatView>;
}

/** `GET /api/kiosks`: a page of the fleet, with the thresholds its states were judged by. */
export interface FleetPage extends Page<FleetKioskView> {
  thresholds: FleetThresholdsView;
}
