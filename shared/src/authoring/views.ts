import { PANEL_LAYOUTS, type PanelLayout } from '../panel/panel-presentation.js';
import type { Page } from '../auth/views.js';
import type { Can, MediaCan, StationCan, StoryCan } from '../auth/can.js';
import type { PanelDocJSON } from '../panel/panel-json.js';

/** The views of issue 4 (authoring) as the API sends them; studio and server both code against these. */

export const AUDIENCES = ['family', 'school', 'adult'] as const;
export type Audience = (typeof AUDIENCES)[number];

export const STORY_STATES = ['draft', 'in_review', 'changes_requested', 'approved', 'retired'] as const;
export type StoryState = (typeof STORY_STATES)[number];

export interface StoryView {
  id: number;
  title: string;
  audience: Audience;
  /** BCP 47 tag of the language the panels are written in. */
  sourceLocale: string;
  state: StoryState;
  exhibitId: number | null;
  exhibitName: string | null;
  panelCount: number;
  /** @format date-time */
  createdAt: string;
  /** @format date-time */
  updatedAt: string;
  createdBy: { id: number; name: string } | null;
  /**
   * The story's latest approved revision, which releases carry; it stays so while a newer draft
   * is written and reviewed ("Approved · draft in progress"). Null before the first approval.
   */
  approvedRevision: { id: number; number: number } | null;
  /** What the signed-in person may do to it, as the server decides. */
  can: StoryCan;
}

/** GET /api/stories: a page, and whether the signed-in person may start a new story. */
export type StoryPage = Page<StoryView> & { can: Can<'stories'> };

export interface PanelView {
  id: number;
  storyId: number;
  position: number;
  /** Compare-and-set token: send it back with the next PUT. */
  version: number;
  /** Tiptap JSON of the story's source locale. */
  doc: PanelDocJSON;
  wordBudget: number;
  /** @format date-time */
  updatedAt: string;
}

export type StoryDetailView = StoryView & { panels: PanelView[] };

/** PUT /api/panels/:id answers 409 with this when someone else saved first. */
export interface PanelConflictBody {
  statusCode: 409;
  message: string;
  currentVersion: number;
  doc: PanelDocJSON;
}

export type MediaLicence = { kind: 'spdx'; id: string } | { kind: 'all-rights-reserved'; holder: string };

export interface MediaRenditionView {
  width: number;
  /** Public, immutable: `/media/<sha256>/<width>.webp`. */
  url: string;
}

export interface MediaUsageView {
  storyId: number;
  storyTitle: string;
  panelId: number;
  /** The panel's place in its story, counted from 1 as people do. */
  panelNumber: number;
}

export const RENDITION_STATES = ['pending', 'ready', 'failed'] as const;
export type RenditionState = (typeof RENDITION_STATES)[number];

/** Whether an image's WebP renditions are made: pending while a worker makes them (progress 0 to 1), failed with the reason why. */
export interface RenditionStatus {
  state: RenditionState;
  progress: number;
  failure: string | null;
}

export interface MediaView {
  /** A panel image refers to the asset by `String(id)` in its `mediaId` attribute. */
  id: number;
  sha256: string;
  filename: string;
  width: number;
  height: number;
  mime: string;
  bytes: number;
  /** Empty until `renditionStatus` is ready. */
  renditions: MediaRenditionView[];
  renditionStatus: RenditionStatus;
  /** A data: URI of a tiny blurred WebP, drawn while the rendition loads. */
  placeholder: string;
  credit: string | null;
  licence: MediaLicence | null;
  /** @format date */
  licenceExpiresOn: string | null;
  /** Alt text per BCP 47 locale. */
  alt: { [locale: string]: string };
  /**
   * The languages the image needs alt text in, canonical: its venue's source and target languages
   * and those of the stories that show it. Alt text in one serves others by RFC 4647 lookup
   * (en serves en-GB), which `lookupText` tells.
   */
  altLocales: string[];
  /** @format date-time */
  createdAt: string;
  usedIn: MediaUsageView[];
  can: MediaCan;
}

/** GET /api/media: a page, and whether the signed-in person may upload. */
export type MediaPage = Page<MediaView> & { can: Can<'mediaLibrary'> };

/** GET /api/media/licences: the SPDX identifiers a licence may name, in the order to suggest them. */
export interface LicenceIdsView {
  ids: readonly string[];
}

export const MEDIA_MISSING_FILTERS = ['alt', 'credit'] as const;
export type MediaMissingFilter = (typeof MEDIA_MISSING_FILTERS)[number];

/** A station's screen orientation: one of the two layouts a panel is written for. */
export type Orientation = PanelLayout;
export const ORIENTATIONS = Object.keys(PANEL_LAYOUTS) as Orientation[];

export interface VenueView {
  id: number;
  name: string;
  /** The venue's key in URLs and release bundles. */
  slug: string;
  sourceLocale: string;
  targetLocales: string[];
  /** Whether a release may show the source text where a target locale is incomplete or stale. */
  fallbackToSource: boolean;
  /** How many different educators must approve a revision: 1 or 2. */
  requiredApprovals: number;
  /** IANA time zone name (`Pacific/Auckland`): the venue's days, for Insights, licence expiry, preflight, mail and exports. */
  timeZone: string;
  /** @format date-time */
  createdAt: string;
}

export interface GalleryView {
  id: number;
  venueId: number;
  name: string;
}

export interface StationView {
  id: number;
  galleryId: number;
  name: string;
  screenWidthPx: number;
  screenHeightPx: number;
  orientation: Orientation;
  mountingHeightMm: number;
  can: StationCan;
}

export interface ExhibitView {
  id: number;
  galleryId: number;
  name: string;
  plannedStart: string | null;
  plannedEnd: string | null;
}
