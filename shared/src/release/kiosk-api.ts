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

export interface HeartbeatBody {
  releaseId: number | null;
  appVersion: string;
  uptimeS: number;
  storageUsedBytes: number | null;
  /** Letters, digits, punctuation, symbols and spaces only (see `reportText`). */
  lastError: string | null;
  /**
   * The publication the kiosk follows and whether its `expiresAt` had passed by the kiosk's clock
   * (it still plays, but has had no fresh word from the server). Kiosks older than issue 11 leave
   * these out.
   */
  publicationSequence?: number | null;
  /** @format date-time */
  publicationExpiresAt?: string | null;
  publicationExpired?: boolean;
}

/** What visitors do, anonymously: no event names a person or a device. */
export const KIOSK_EVENT_TYPES = ['story_opened', 'panel_viewed', 'widget_touched', 'language_chosen', 'switch_used'] as const;
export type KioskEventType = (typeof KIOSK_EVENT_TYPES)[number];

export const KIOSK_SWITCHES = ['large_text', 'high_contrast', 'reduced_motion'] as const;
export type KioskSwitch = (typeof KIOSK_SWITCHES)[number];

export interface KioskEvent {
  /** A random UUID, so an upload that is retried is stored once. */
  id: string;
  type: KioskEventType;
  /** ISO 8601. */
  at: string;
  storyId?: number;
  panelId?: number;
  widgetType?: string;
  /** The widget param the visitor moved. */
  param?: string;
  locale?: string;
  dwellMs?: number;
  switch?: KioskSwitch;
}

export interface EventsBody {
  events: KioskEvent[];
}

export interface EventsResponse {
  stored: number;
  duplicates: number;
  /** Events naming a story or panel that no published release of the kiosk's gallery carries: not stored. */
  dropped: number;
}
