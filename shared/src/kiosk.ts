/**
 * The kiosk's entry to the shared package: what a gallery screen needs to check, store and play a
 * release, and nothing of the studio's. Each name comes from its own module rather than a barrel,
 * so the editor (Tiptap, ProseMirror), XLIFF, diff and preflight code never reach the kiosk's
 * bundle (`npm run bench -w kiosk` holds its main chunk to a budget).
 */
export { matchUiLanguage, UI_LANGUAGE_CODES, type UiLanguage } from './languages/ui-languages.js';
export { canonicalLanguageTag, lookupLanguage, lookupText } from './languages/language-tags.js';
export { translationGaps, type Translated } from './i18n/plural-forms.js';
export type { PanelDocJSON } from './panel/panel-json.js';
export { directionOf, layoutOfScreen, type PanelLayout } from './panel/panel-presentation.js';
export { mediaIdsIn, widgetsIn } from './panel/panel-queries.js';
export { sha256Hex } from './review/revision-snapshot.js';
export { toReportText } from './fleet/report-text.js';
export {
  missingFiles, parseManifest, RELEASE_FORMAT, serializeManifest,
  type ReleaseFile, type ReleaseManifest, type ReleaseMedia, type ReleasePanel, type ReleaseStory,
} from './release/manifest.js';
export { checkPublication, laterPublication, publicationExpired, PUBLICATION_FORMAT, serializePublication, type FollowedPublication } from './release/publication.js';
export { sha256HexOfBytes, verifyManifest } from './release/verify.js';
export type {
  EventsBody, EventsResponse, HeartbeatBody, KioskCredential, KioskEvent, KioskManifestResponse, KioskSwitch, PairCompleteWaiting, PairStartResponse,
} from './release/kiosk-api.js';
export { PanelView } from './react/panel/PanelView.js';
export { MoreBelowCue, useMoreBelow, type MoreBelowLook } from './react/more-below.js';
export { PanelFrame } from './react/panel/PanelFrame.js';
export type { ResolveMedia } from './react/panel/panel-media.js';
export { useReducedMotion } from './react/use-reduced-motion.js';
