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
  /** @format date-time */
  createdAt: string;
  /** @format date-time */
  readyAt: string | null;
  /** @format date-time */
  publishedAt: string | null;
  /** Files listed in the manifest, and their total size in bytes. */
  files: number;
  bytes: number;
  stories: ReleaseStoryView[];
  can: ReleaseCan;
}

/** GET /api/galleries/:id/releases: a page, and whether the signed-in person may build a release. */
export type ReleasePage = Page<ReleaseView> & { can: Can<'releases'> };

/**
 * What a technician may do with a story whose translations are missing or out of date: leave it
 * out of the release, or, where the venue allows it, show its untranslated texts in the source language.
 */
export const MISSING_TRANSLATION_CHOICES = ['leave-out', 'show-in-source'] as const;
export type MissingTranslationChoice = (typeof MISSING_TRANSLATION_CHOICES)[number];

/** A target locale in which a story's texts are not all translated from the revision released. */
export interface TranslationGapView {
  locale: string;
  /** Texts of the story: title, panel texts, alt texts, widget labels. */
  total: number;
  untranslated: number;
  /** Translated from an older source text. */
  stale: number;
}

export interface ReleasePreviewStory extends ReleaseStoryView {
  /** Empty when the story is translated into every target locale. */
  missing: TranslationGapView[];
  /** What may be chosen for it; empty when nothing is missing. */
  choices: MissingTranslationChoice[];
  /** What a build with these choices does with it; null while a choice is still needed. */
  choice: MissingTranslationChoice | null;
}

/**
 * `GET /api/galleries/:id/releases/preview`: what a build with the given revisions and choices
 * would carry, what is missing, what stops it, and whether it would equal the Live release.
 */
export interface ReleasePreview {
  galleryId: number;
  /** The venue's language, in which untranslated texts are shown where the venue allows it. */
  sourceLocale: string;
  /** The venue's rule: may a kiosk show a text not yet translated in the source language. */
  fallbackToSource: boolean;
  /** Every story the release could carry, in menu order, those left out included. */
  stories: ReleasePreviewStory[];
  /** What stops the build apart from missing translations (preflight, images), each with its path. */
  problems: { path: (string | number)[]; message: string }[];
  /** The Live release the build would equal, same revisions, translations and files: building it changes nothing on screen. */
  sameAsLive: { id: number; number: number } | null;
  /** Whether the server would take a build with these choices. */
  buildable: boolean;
}

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
  /** @format date-time */
  pairedAt: string;
  /** @format date-time */
  revokedAt: string | null;
  /** @format date-time */
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
  /** @format date-time */
  expiresAt: string;
  /** Past `expiresAt` by the kiosk's clock: it plays on, but has had no fresh word from the server. */
  expired: boolean;
}
