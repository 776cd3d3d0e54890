import type { components } from '../api/openapi.js';

/** Bodies of the kiosk routes (issue 7 contract), shared so the server and the kiosk cannot drift. */

export interface PairStartResponse {
  /** Six characters from an unambiguous alphabet, shown large on the screen. */
  pairingCode: string;
  pollToken: string;
  /** ISO 8601. @format date-time */
  expiresAt: string;
}

export interface PairCompleteWaiting {
  status: 'waiting';
}

export interface KioskCredential {
  deviceToken: string;
  kioskId: number;
  galleryId: number;
  stationId: number;
  /** The venue's Ed25519 public key, base64 SPKI DER. */
  publicKey: string;
}

export interface ManifestResponse {
  /** The manifest as a JSON string: the exact bytes (UTF-8) the signature covers. */
  manifest: string;
  /** Base64 Ed25519 signature. */
  signature: string;
}

/** A publication record as the venue key signed it (see publication.ts). */
export interface SignedPublication {
  /** The record as a JSON string: the exact bytes (UTF-8) the signature covers. */
  record: string;
  /** Base64 Ed25519 signature. */
  signature: string;
}

/** `GET /api/kiosk/manifest`: the Live release's manifest with the gallery's latest publication record. */
export interface KioskManifestResponse extends ManifestResponse {
  publication: SignedPublication;
}

/** `POST /api/kiosk/heartbeat`: which release plays, the kiosk's health, and the publication it follows. */
export type HeartbeatBody = components['schemas']['HeartbeatDto'];

/** What visitors do, anonymously: no event names a person or a device. */
export const KIOSK_EVENT_TYPES = ['story_opened', 'panel_viewed', 'widget_touched', 'language_chosen', 'switch_used'] as const;
export type KioskEventType = (typeof KIOSK_EVENT_TYPES)[number];

export const KIOSK_SWITCHES = ['large_text', 'high_contrast', 'reduced_motion'] as const;
export type KioskSwitch = (typeof KIOSK_SWITCHES)[number];

/** One thing a visitor did; its random UUID `id` lets a retried upload be stored once. */
export type KioskEvent = components['schemas']['KioskEventDto'];

/** `POST /api/kiosk/events`. */
export type EventsBody = components['schemas']['KioskEventsDto'];

export interface EventsResponse {
  stored: number;
  duplicates: number;
  /** Events naming a story or panel that no published release of the kiosk's gallery carries: not stored. */
  dropped: number;
}
