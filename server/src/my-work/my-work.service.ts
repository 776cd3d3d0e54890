import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, QueryTypes } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { MY_WORK_LIST_LENGTH, PAGE_SIZE, type MyWorkView, type Role, type StoryState, type WorkList } from '@mantlepiece/shared';
import { rolesAnywhere, scopeWhere, venueScope } from '../auth/policy.js';
import { Clock } from '../clock/clock.service.js';
import { KioskStates } from '../fleet/kiosk-states.service.js';
import { KiosksService } from '../kiosks/kiosks.service.js';
import { MediaService } from '../media/media.service.js';
import { Release } from '../releases/models/release.model.js';
import { ReviewsService } from '../reviews/reviews.service.js';
import { StoriesService } from '../stories/stories.service.js';
import { TranslationsService } from '../translations/translations.service.js';
import { Invitation } from '../users/models/invitation.model.js';
import type { User } from '../users/models/user.model.js';
import { Gallery } from '../venues/models/gallery.model.js';
import {
  toCommentWork, toInvitationWork, toKioskWork, toLicenceWork, toReleaseWork, toReviewWork, toStoryWork, toTranslationWork, workList, type OpenCommentsRow,
} from './my-work.presenter.js';

const DAY_MS = 86_400_000;
/** Licences ending this soon are the admin's to renew or replace. */
export const LICENCE_WARNING_DAYS = 60;
/** A failed build stays on the technician's list this long; after that it is history on the Releases page. */
const FAILED_RELEASE_DAYS = 14;
const FIRST_PAGE = { page: 1, pageSize: MY_WORK_LIST_LENGTH };
/** Lists filtered after reading take the largest page, so the filter rarely has too few to choose from. */
const WIDE_PAGE = { page: 1, pageSize: PAGE_SIZE.max };

/**
 * What is waiting for one person, per role they hold at any venue, from the venues where they hold it. Each list comes from the query its own area
 * already runs (the stories table, the review queue, the translator's worklist, the fleet, the
 * media library), so the home page never disagrees with the page its link opens.
 */
@Injectable()
export class MyWorkService {
  constructor(
    private readonly stories: StoriesService,
    private readonly reviews: ReviewsService,
    private readonly translations: TranslationsService,
    private readonly kiosks: KiosksService,
    private readonly kioskStates: KioskStates,
    private readonly media: MediaService,
    @InjectModel(Release) private readonly releases: typeof Release,
    @InjectModel(Invitation) private readonly invitations: typeof Invitation,
    private readonly clock: Clock,
    private readonly sequelize: Sequelize,
  ) {}

  async workOf(user: User): Promise<MyWorkView> {
    const held = rolesAnywhere(user);
    const has = (role: Role) => held.includes(role);
    const [curator, educator, translator, technician, admin] = await Promise.all([
      has('curator') ? this.curatorWork(user) : undefined,
      has('educator') ? this.educatorWork(user) : undefined,
      has('translator') ? this.translatorWork(user) : undefined,
      has('technician') ? this.technicianWork(user) : undefined,
      has('admin') ? this.adminWork(user) : undefined,
    ]);
    return { ...(curator && { curator }), ...(educator && { educator }), ...(translator && { translator }), ...(technician && { technician }), ...(admin && { admin }) };
  }

  /** Their own stories: drafts to finish, changes an educator asked for, comments still open. */
  private async curatorWork(user: User): Promise<NonNullable<MyWorkView['curator']>> {
    const own = async (state: StoryState) => {
      const page = await this.stories.list({ ...WIDE_PAGE, state, sort: '-updatedAt' }, user);
      return workList(page.items.filter((story) => story.createdBy?.id === user.id).map(toStoryWork));
    };
    const [drafts, changesRequested, openComments] = await Promise.all([own('draft'), own('changes_requested'), this.openComments(user)]);
    return { drafts, changesRequested, openComments };
  }

  /**
   * Open comment threads on the newest revision of each of their stories: comments are carried to
   * a newer revision, so older revisions' copies would count twice.
   */
  private async openComments(user: User): Promise<WorkList<ReturnType<typeof toCommentWork>>> {
    const scope = venueScope(user);
    if (!scope.every && scope.venueIds.length === 0) return workList([]);
    const rows = await this.sequelize.query<OpenCommentsRow>(
      `SELECT s.id AS storyId, s.title, r.id AS revisionId, COUNT(*) AS openComments, MAX(c.created_at) AS latestAt
       FROM comments c
       JOIN revisions r ON r.id = c.revision_id
       JOIN stories s ON s.id = r.story_id
       WHERE s.created_by_id = :userId AND c.parent_id IS NULL AND c.resolved_at IS NULL${scope.every ? '' : ' AND s.venue_id IN (:venueIds)'}
         AND r.id = (SELECT MAX(newest.id) FROM revisions newest WHERE newest.story_id = s.id)
       GROUP BY s.id, s.title, r.id
       ORDER BY latestAt DESC, s.id`,
      { replacements: { userId: user.id, venueIds: scope.every ? [] : scope.venueIds }, type: QueryTypes.SELECT },
    );
    return workList(rows.map(toCommentWork));
  }

  /** The review queue of the venues where they review, longest waiting first. */
  private async educatorWork(user: User): Promise<NonNullable<MyWorkView['educator']>> {
    const queue = await this.reviews.queue({ ...FIRST_PAGE, sort: 'submittedAt' }, user);
    const now = this.clock.now();
    return { reviewQueue: { items: queue.items.map((item) => toReviewWork(item, now)), total: queue.total } };
  }

  /** Each story and locale of theirs with units untranslated or stale. */
  private async translatorWork(user: User): Promise<NonNullable<MyWorkView['translator']>> {
    const worklist = await this.translations.worklist(user, WIDE_PAGE);
    return { translations: workList(worklist.items.filter((item) => item.translated < item.total).map(toTranslationWork)) };
  }

  /** Kiosks that stopped reporting, and releases waiting to be published or that failed to build. */
  private async technicianWork(user: User): Promise<NonNullable<MyWorkView['technician']>> {
    const [fleet, releases] = await Promise.all([
      this.kiosks.list({ ...WIDE_PAGE }, user),
      this.releases.findAll({
        where: {
          [Op.or]: [{ state: 'ready' }, { state: 'failed', createdAt: { [Op.gte]: this.clock.fromNow(-FAILED_RELEASE_DAYS * DAY_MS) } }],
        },
        attributes: { exclude: ['manifest'] },
        include: [{ model: Gallery, attributes: ['id', 'name'], where: scopeWhere(venueScope(user, ['technician'])) }],
        order: [['createdAt', 'DESC'], ['id', 'DESC']],
      }),
    ]);
    const silent = fleet.items.map((kiosk) => this.kioskStates.present(kiosk)).filter((kiosk) => !kiosk.revokedAt && kiosk.state !== 'online');
    return { kiosks: workList(silent.map(toKioskWork)), releases: workList(releases.map(toReleaseWork)) };
  }

  /** Invitations nobody has accepted yet, newest first, and media licences that end within 60 days (or have ended), soonest first. */
  private async adminWork(user: User): Promise<NonNullable<MyWorkView['admin']>> {
    const now = this.clock.now();
    const [invitations, licences] = await Promise.all([
      this.invitations.findAndCountAll({
        where: { acceptedAt: null, expiresAt: { [Op.gt]: now } },
        order: [['createdAt', 'DESC'], ['id', 'DESC']],
        limit: MY_WORK_LIST_LENGTH,
      }),
      this.media.list({ ...FIRST_PAGE, expiringWithinDays: LICENCE_WARNING_DAYS, sort: 'licenceExpiresOn' }, user),
    ]);
    return {
      invitations: { items: invitations.rows.map(toInvitationWork), total: invitations.count },
      licences: { items: licences.items.map((asset) => toLicenceWork(asset, now)), total: licences.total },
    };
  }
}
