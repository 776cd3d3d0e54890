/** Bodies of the kiosk routes (issue 7 contract), shared so the server and the kiosk cannot drift. */

export interface PairStartResponse {
  /** Six characters from an unambiguous alphabet, shown large on the screen. */
  pairingCode: string;
  pollToken: string;
  /** ISO 8601. */
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

export interface HeartbeatBody {
  releaseId: number | null;
  appVersion: string;
  uptimeS: number;
  storageUsedBytes: number | null;
  lastError: string | null;
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
}
