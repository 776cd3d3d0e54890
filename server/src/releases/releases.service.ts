import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { ManifestResponse, ReleaseComparison, ReleasePage, ReleaseStoryView, ReleaseView } from '@mantlepiece/shared';
import { AuditService } from '../audit/audit.service.js';
import { personAt, type Member, type Person } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { pageWindow, toPage } from '../common/page.js';
import { actingAt, withinReach } from '../common/venue-boundary.js';
import { Revision } from '../revisions/models/revision.model.js';
import { Story } from '../stories/models/story.model.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Venue } from '../venues/models/venue.model.js';
import type { ListReleasesQuery, RequestReleaseDto } from './dto/release.dto.js';
import { ReleasePanel } from './models/release-panel.model.js';
import { ReleaseStory } from './models/release-story.model.js';
import { Release } from './models/release.model.js';
import { ReleaseChoicesService } from './release-choices.js';
import { releaseRefusal, ReleaseContentService } from './release-content.service.js';
import { isPublishable, PUBLISHERS, releasesCan } from './release-policy.js';
import { PublicationsService } from './publications.service.js';
import { toReleaseView } from './releases.presenter.js';
import { ReleasesWorker } from './releases.worker.js';

@Injectable()
export class ReleasesService {
  constructor(
    @InjectModel(Release) private readonly releases: typeof Release,
    @InjectModel(ReleaseStory) private readonly releaseStories: typeof ReleaseStory,
    @InjectModel(Gallery) private readonly galleries: typeof Gallery,
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(Revision) private readonly revisions: typeof Revision,
    @InjectModel(ReleasePanel) private readonly releasePanels: typeof ReleasePanel,
    private readonly content: ReleaseContentService,
    private readonly choices: ReleaseChoicesService,
    private readonly publications: PublicationsService,
    private readonly worker: ReleasesWorker,
    private readonly audit: AuditService,
    private readonly clock: Clock,
    private readonly sequelize: Sequelize,
  ) {}

  /**
   * Checks the rules on the revisions the release will carry, stories left out as asked (see
   * `ReleaseChoicesService` for missing translations), then queues its build: the answer
   * comes at once, the build runs in the worker. The revisions are fixed here, so the release is
   * exactly what was checked.
   */
  async requestRelease(galleryId: number, dto: RequestReleaseDto, user: Member): Promise<{ id: number; state: 'building' }> {
    const release = await this.sequelize.transaction(async (transaction) => {
      // Locking the gallery numbers its releases one after another.
      const gallery = await this.galleries.findByPk(galleryId, { include: [Venue], transaction, lock: transaction.LOCK.UPDATE });
      const { venueId, venue } = withinReach(user, gallery, 'There is no such gallery.');
      actingAt(user, venueId, PUBLISHERS);
      const candidates = await this.content.chooseRevisions(galleryId, dto.revisionIds, transaction);
      const { kept: chosen, unanswered } = await this.choices.plan(venue!, candidates, dto);
      const problems = [...unanswered, ...(await this.content.problemsOf(chosen, transaction))];
      if (problems.length) throw releaseRefusal('This release cannot be built yet.', problems);

      const last = (await this.releases.max<number, Release>('number', { where: { galleryId }, transaction })) ?? 0;
      const created = await this.releases.create(
        { galleryId, number: last + 1, state: 'building', progress: 0, phase: 'Waiting for the build worker', createdById: user.id },
        { transaction },
      );
      await this.releaseStories.bulkCreate(
        chosen.map(({ story, revision }, position) => ({ releaseId: created.id, storyId: story.id, revisionId: revision.id, position })),
        { transaction },
      );
      await this.releasePanels.bulkCreate(
        chosen.flatMap(({ story, revision }) => revision.snapshot.panels.map((panel) => ({ releaseId: created.id, storyId: story.id, panelId: panel.id }))),
        { transaction },
      );
      await this.audit.record({
        actorId: user.id, action: 'release.requested', targetType: 'release', targetId: created.id, venueId,
        detail: { galleryId, number: created.number, revisionIds: chosen.map((c) => c.revision.id), leftOut: dto.leaveOut ?? [] },
      }, transaction);
      return created;
    });
    this.worker.kick();
    return { id: release.id, state: 'building' };
  }

  /** The release as a member sees it, at one of their venues. */
  async read(id: number, member: Member): Promise<ReleaseView> {
    const release = await this.find(id, member);
    return toReleaseView(release, await this.storiesOf(release.id), personAt(member, release.gallery!.venueId));
  }

  /** The release as the server reads it for itself (the demo seed), `person` being whose `can` it carries. */
  async get(id: number, person: Person): Promise<ReleaseView> {
    const release = await this.releases.findByPk(id);
    if (!release) throw new NotFoundException('There is no such release.');
    return toReleaseView(release, await this.storiesOf(release.id), person);
  }

  /** Newest first. */
  async listForGallery(galleryId: number, query: ListReleasesQuery, member: Member): Promise<ReleasePage> {
    const gallery = withinReach(member, await this.galleries.findByPk(galleryId, { attributes: ['id', 'venueId'] }), 'There is no such gallery.');
    const person = personAt(member, gallery.venueId);
    const { rows, count } = await this.releases.findAndCountAll({
      where: { galleryId },
      attributes: { exclude: ['manifest'] },
      order: [['number', 'DESC']],
      ...pageWindow(query),
    });
    const items = await Promise.all(rows.map(async (release) => toReleaseView(release, await this.storiesOf(release.id), person)));
    return { ...toPage(items, count, query), can: releasesCan(person) };
  }

  /** The signed manifest as a kiosk receives it, for staff to read. */
  async signedManifest(id: number, member: Member): Promise<ManifestResponse> {
    const release = await this.find(id, member);
    if (!release.manifest || !release.signature) throw new ConflictException('This release has no signed manifest: it is still building, or it failed.');
    return { manifest: release.manifest, signature: release.signature };
  }

  /**
   * Makes the release Live for its gallery and the Live one before it Superseded, in one
   * transaction, as the gallery's next publication. Publishing a Superseded release is the
   * rollback: a new, higher publication pointing at older content, so kiosks follow it.
   */
  async publish(id: number, user: Member): Promise<ReleaseView> {
    // A release never changes gallery, so its gallery is read before the transaction: the gallery's
    // row must be the transaction's first read, a locking one (see below).
    const { galleryId, gallery } = await this.find(id, user);
    const { venueId } = gallery!;
    actingAt(user, venueId, PUBLISHERS);
    const publication = await this.sequelize.transaction(async (transaction) => {
      // Every publish of a gallery, on any server instance, queues on the gallery's row, so one
      // release is Live and one next sequence is taken at a time; taken before any plain read, so
      // the transaction's snapshot already holds what the publish before it committed.
      await this.galleries.findByPk(galleryId, { attributes: ['id'], transaction, lock: transaction.LOCK.UPDATE });
      const release = await this.releases.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!release) throw new NotFoundException('There is no such release.');
      if (!isPublishable(release.state)) {
        throw new ConflictException(`Release ${release.number} is ${release.state}; only a Ready or Superseded release can go Live.`);
      }
      const previous = await this.releases.findOne({ where: { liveGalleryId: release.galleryId }, transaction, lock: transaction.LOCK.UPDATE });
      if (previous) await previous.update({ state: 'superseded', liveGalleryId: null }, { transaction });
      const now = this.clock.now();
      const rollback = release.state === 'superseded';
      await release.update({ state: 'live', liveGalleryId: release.galleryId, publishedAt: now, publishedById: user.id }, { transaction });
      await this.markStoriesReleased(release.id, now, transaction);
      const published = await this.publications.record(release, rollback ? 'rollback' : 'publish', user, now, transaction);
      await this.audit.record({
        actorId: user.id, action: rollback ? 'release.rolled-back' : 'release.published', targetType: 'release', targetId: release.id, venueId,
        detail: { galleryId: release.galleryId, number: release.number, previousReleaseId: previous?.id ?? null, sequence: published.sequence },
      }, transaction);
      return published;
    });
    await this.publications.sign(publication);
    return this.read(id, user);
  }

  /** What changed from release `a` to release `b`, story by story. */
  async compare(aId: number, bId: number, member: Member): Promise<ReleaseComparison> {
    const [a, b] = await Promise.all([this.find(aId, member), this.find(bId, member)]);
    const [before, after] = await Promise.all([this.storiesOf(a.id), this.storiesOf(b.id)]);
    const beforeById = new Map(before.map((s) => [s.storyId, s]));
    const afterIds = new Set(after.map((s) => s.storyId));
    const comparison: ReleaseComparison = {
      a: { id: a.id, number: a.number }, b: { id: b.id, number: b.number }, added: [], removed: before.filter((s) => !afterIds.has(s.storyId)), changed: [], unchanged: [],
    };
    for (const story of after) {
      const old = beforeById.get(story.storyId);
      if (!old) comparison.added.push(story);
      else if (old.revisionId !== story.revisionId) comparison.changed.push({ storyId: story.storyId, title: story.title, from: old, to: story });
      else comparison.unchanged.push(story);
    }
    return comparison;
  }

  /** The release Live for a gallery, if any. */
  liveFor(galleryId: number): Promise<Release | null> {
    return this.releases.findOne({ where: { liveGalleryId: galleryId } });
  }

  private async markStoriesReleased(releaseId: number, now: Date, transaction: Transaction): Promise<void> {
    const storyIds = (await this.releaseStories.findAll({ where: { releaseId }, attributes: ['storyId'], transaction })).map((r) => r.storyId);
    await this.stories.update({ releasedAt: now }, { where: { id: { [Op.in]: storyIds }, releasedAt: null }, transaction });
  }

  private async storiesOf(releaseId: number): Promise<ReleaseStoryView[]> {
    const rows = await this.releaseStories.findAll({ where: { releaseId }, order: [['position', 'ASC']] });
    const revisions = new Map(
      (await this.revisions.findAll({ where: { id: rows.map((r) => r.revisionId) }, attributes: ['id', 'number', 'snapshot'] })).map((r) => [r.id, r]),
    );
    return rows.map((row) => {
      const revision = revisions.get(row.revisionId);
      return { storyId: row.storyId, revisionId: row.revisionId, revisionNumber: revision?.number ?? 0, title: revision?.snapshot.story.title ?? '' };
    });
  }

  /** The release with its gallery, if the member holds a role at its venue. */
  private async find(id: number, member: Member): Promise<Release> {
    const release = await this.releases.findByPk(id, { include: [{ model: Gallery, attributes: ['id', 'venueId'] }] });
    withinReach(member, release?.gallery, 'There is no such release.');
    return release!;
  }
}
