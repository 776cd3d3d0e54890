import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import { parseManifest, releaseContentOf, serializeReleaseContent, type ReleaseContent, type ReleasePreview } from '@mantlepiece/shared';
import type { Member } from '../auth/policy.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Venue } from '../venues/models/venue.model.js';
import type { ReleasePreviewQuery } from './dto/release.dto.js';
import { Release } from './models/release.model.js';
import { ReleaseChoicesService } from './release-choices.js';
import { ReleaseContentService } from './release-content.service.js';
import { PUBLISHERS } from './release-policy.js';

/**
 * What a build would carry, read before asking for it: the same rules the build request applies
 * (`ReleasesService.requestRelease`), without writing anything, and the content compared with the
 * Live release's, so a build that would change nothing on screen is said to be one.
 */
@Injectable()
export class ReleasePreviewService {
  constructor(
    @InjectModel(Gallery) private readonly galleries: typeof Gallery,
    @InjectModel(Release) private readonly releases: typeof Release,
    private readonly content: ReleaseContentService,
    private readonly choices: ReleaseChoicesService,
    private readonly sequelize: Sequelize,
  ) {}

  async preview(galleryId: number, query: ReleasePreviewQuery, member: Member): Promise<ReleasePreview> {
    // One snapshot, so the stories, their translations and the Live release agree with each other.
    return this.sequelize.transaction(async (transaction) => {
      const gallery = await this.galleries.findByPk(galleryId, { include: [Venue], transaction });
      const { venueId, venue } = withinReach(member, gallery, 'There is no such gallery.');
      actingAt(member, venueId, PUBLISHERS);
      const candidates = await this.content.chooseRevisions(galleryId, query.revisionIds, transaction);
      const plan = await this.choices.plan(venue!, candidates, query);
      const problems = await this.content.problemsOf(plan.kept, transaction);
      const live = await this.releases.findOne({ where: { liveGalleryId: galleryId }, attributes: ['id', 'number', 'manifest'], transaction });
      const { content } = await this.content.manifestContent(venue!, plan.kept);
      return {
        galleryId,
        sourceLocale: venue!.sourceLocale,
        fallbackToSource: venue!.fallbackToSource,
        stories: plan.stories.map(({ story, revision, missing, choices, choice }) => ({
          storyId: story.id, revisionId: revision.id, revisionNumber: revision.number, title: revision.snapshot.story.title, missing, choices, choice,
        })),
        problems,
        sameAsLive: live && sameContent(live, content) ? { id: live.id, number: live.number } : null,
        buildable: plan.unanswered.length === 0 && problems.length === 0,
      };
    });
  }
}

/** Whether the release's signed manifest carries exactly `content`. */
function sameContent(release: Release, content: ReleaseContent): boolean {
  if (!release.manifest) return false;
  const parsed = parseManifest(release.manifest);
  return parsed.ok && serializeReleaseContent(releaseContentOf(parsed.manifest)) === serializeReleaseContent(content);
}
