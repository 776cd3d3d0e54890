import {
  MY_WORK_LIST_LENGTH, type CommentWorkItem, type FleetKioskView, type InvitationWorkItem, type KioskWorkItem, type LicenceWorkItem, type MediaView,
  type ReleaseWorkItem, type ReviewQueueItem, type ReviewWorkItem, type StoryView, type StoryWorkItem, type TranslationWorkItem, type TranslationWorklistItem, type WorkList,
} from '@mantlepiece/shared';
import type { Release } from '../releases/models/release.model.js';
import type { Invitation } from '../users/models/invitation.model.js';
import type { Gallery } from '../venues/models/gallery.model.js';

const DAY_MS = 86_400_000;

/** The first items of an already ordered list, with its full count. */
export const workList = <T>(all: T[]): WorkList<T> => ({ items: all.slice(0, MY_WORK_LIST_LENGTH), total: all.length });

export const toStoryWork = (story: StoryView): StoryWorkItem => ({
  storyId: story.id, title: story.title, updatedAt: story.updatedAt, link: `/stories/${story.id}`,
});

export interface OpenCommentsRow {
  storyId: number;
  title: string;
  revisionId: number;
  openComments: number | string;
  latestAt: Date | string;
}

/** Comments are answered where the writing happens: in the story's editor. */
export const toCommentWork = (row: OpenCommentsRow): CommentWorkItem => ({
  storyId: row.storyId, title: row.title, revisionId: row.revisionId, openComments: Number(row.openComments),
  latestAt: new Date(row.latestAt).toISOString(), link: `/stories/${row.storyId}`,
});

export const toReviewWork = (item: ReviewQueueItem, now: Date): ReviewWorkItem => ({
  revisionId: item.revisionId, storyId: item.storyId, title: item.storyTitle, revisionNumber: item.number, submittedAt: item.submittedAt,
  submittedBy: item.submittedBy?.name ?? null, waitingS: Math.max(0, Math.floor((now.getTime() - Date.parse(item.submittedAt)) / 1000)),
  link: `/reviews/${item.revisionId}`,
});

export const toTranslationWork = (item: TranslationWorklistItem): TranslationWorkItem => ({
  storyId: item.storyId, title: item.storyTitle, locale: item.locale, untranslated: item.total - item.translated - item.stale, stale: item.stale,
  link: `/translations/${item.storyId}/${item.locale}`,
});

export const toKioskWork = (kiosk: FleetKioskView): KioskWorkItem => ({
  kioskId: kiosk.id, station: kiosk.station.name, gallery: kiosk.gallery.name, state: kiosk.state as KioskWorkItem['state'],
  lastHeartbeatAt: kiosk.lastHeartbeatAt, demo: kiosk.demo, link: `/fleet/${kiosk.id}`,
});

export const toReleaseWork = (release: Release & { gallery?: Gallery }): ReleaseWorkItem => ({
  releaseId: release.id, number: release.number, gallery: release.gallery?.name ?? '', state: release.state as ReleaseWorkItem['state'],
  at: (release.state === 'ready' ? (release.readyAt ?? release.createdAt) : release.createdAt).toISOString(), failure: release.failure,
  link: `/releases?gallery=${release.galleryId}&build=${release.id}`,
});

export const toInvitationWork = (invitation: Invitation): InvitationWorkItem => ({
  invitationId: invitation.id, email: invitation.email, name: invitation.name, roles: invitation.roles, expiresAt: invitation.expiresAt.toISOString(),
  link: '/people',
});

/** Days left counted between UTC dates, so a licence ending today has 0 and one ended yesterday −1. */
export const toLicenceWork = (asset: MediaView, now: Date): LicenceWorkItem => {
  const expiresOn = asset.licenceExpiresOn!;
  const today = Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate());
  return {
    mediaId: asset.id, filename: asset.filename, expiresOn, daysLeft: Math.round((Date.parse(`${expiresOn}T00:00:00Z`) - today) / DAY_MS), link: `/media/${asset.id}`,
  };
};
