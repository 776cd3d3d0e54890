import type { ReleaseStoryView, ReleaseView } from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import type { Release } from './models/release.model.js';
import { releaseCan } from './release-policy.js';

export const manifestUrlOf = (release: Release): string | null => (release.manifest ? `/api/releases/${release.id}/manifest` : null);

export const toReleaseView = (release: Release, stories: ReleaseStoryView[], person: Person): ReleaseView => ({
  id: release.id,
  galleryId: release.galleryId,
  number: release.number,
  state: release.state,
  progress: release.progress,
  phase: release.phase,
  failure: release.failure,
  manifestUrl: manifestUrlOf(release),
  createdAt: release.createdAt.toISOString(),
  readyAt: release.readyAt?.toISOString() ?? null,
  publishedAt: release.publishedAt?.toISOString() ?? null,
  files: release.fileCount,
  bytes: Number(release.bytes),
  stories,
  can: releaseCan(person, release),
});
