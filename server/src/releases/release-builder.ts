import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { serializeManifest, type ReleaseManifest } from '@mantlepiece/shared';
import { Clock } from '../clock/clock.service.js';
import type { ClaimQueue } from '../jobs/claim-queue.js';
import { Revision } from '../revisions/models/revision.model.js';
import { Story } from '../stories/models/story.model.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { ReleaseStory } from './models/release-story.model.js';
import type { Release } from './models/release.model.js';
import { ReleaseBuildFaults } from './release-build-faults.js';
import { ReleaseContentService, type ChosenRevision } from './release-content.service.js';
import { ReleaseFileStore, sha256Of } from './release-file-store.js';
import { VenueSigningKeysService } from './venue-signing-keys.service.js';

/** How long a worker holds a build's claim between two steps before it counts as dead. */
export const BUILD_LEASE_MS = 60_000;

/** The build lost its claim (it ran out and the build was failed): stop, change nothing. */
export class BuildLeaseLost extends Error {}

/**
 * Builds one claimed release: manifest, files by hash, signature, then Ready. Each step pushes the
 * claim on and records its phase, so the Releases page shows progress and a dead worker is noticed.
 */
@Injectable()
export class ReleaseBuilder {
  constructor(
    @InjectModel(ReleaseStory) private readonly releaseStories: typeof ReleaseStory,
    @InjectModel(Revision) private readonly revisions: typeof Revision,
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(Gallery) private readonly galleries: typeof Gallery,
    private readonly content: ReleaseContentService,
    private readonly files: ReleaseFileStore,
    private readonly keys: VenueSigningKeysService,
    private readonly faults: ReleaseBuildFaults,
    private readonly clock: Clock,
  ) {}

  async build(release: Release, claim: ClaimQueue<Release>): Promise<void> {
    const step = async (phase: string, progress: number) => {
      if (!(await claim.extend(release.id, { phase, progress }))) throw new BuildLeaseLost();
    };
    await step('Collecting stories and translations', 0.05);
    const gallery = await this.galleries.findByPk(release.galleryId, { include: [Venue] });
    const venue = gallery?.venue;
    if (!venue) throw new Error('The gallery or its venue no longer exists.');
    const chosen = await this.chosenOf(release);
    const { content, renditions } = await this.content.manifestContent(venue, chosen);

    for (const [index, rendition] of renditions.entries()) {
      await step(`Storing files (${index + 1} of ${renditions.length})`, 0.1 + 0.75 * (index / renditions.length));
      await this.files.copy(release.id, { sha256: rendition.sha256, size: rendition.bytes, mime: 'image/webp' }, rendition.storeKey);
    }
    await this.faults.reach('files-stored');

    await step('Signing the manifest', 0.9);
    const manifest: ReleaseManifest = {
      ...content,
      releaseId: release.id,
      number: release.number,
      galleryId: release.galleryId,
      createdAt: release.createdAt.toISOString(),
    };
    const text = serializeManifest(manifest);
    const signature = await this.keys.signText(venue.id, text);
    await this.faults.reach('signed');

    await step('Checking every file is stored', 0.95);
    const missing = await this.files.missing(release.id);
    if (missing.length) throw new Error(`${missing.length} file(s) did not reach the store.`);

    const ready = await claim.settle(release.id, {
      state: 'ready', progress: 1, phase: 'Ready to publish', readyAt: this.clock.now(),
      manifest: text, signature, manifestSha256: sha256Of(Buffer.from(text, 'utf8')),
      fileCount: content.files.length, bytes: content.files.reduce((sum, file) => sum + file.size, 0),
    });
    if (!ready) throw new BuildLeaseLost();
  }

  /** The revisions fixed when the release was asked for, in menu order. */
  private async chosenOf(release: Release): Promise<ChosenRevision[]> {
    const rows = await this.releaseStories.findAll({ where: { releaseId: release.id }, order: [['position', 'ASC']] });
    const revisions = new Map((await this.revisions.findAll({ where: { id: rows.map((r) => r.revisionId) } })).map((r) => [r.id, r]));
    const stories = new Map((await this.stories.findAll({ where: { id: rows.map((r) => r.storyId) } })).map((s) => [s.id, s]));
    return rows.map((row) => ({ story: stories.get(row.storyId)!, revision: revisions.get(row.revisionId)! }));
  }
}
