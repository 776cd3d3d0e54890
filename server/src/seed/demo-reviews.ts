import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { ReviewsService } from '../reviews/reviews.service.js';
import { Story } from '../stories/models/story.model.js';
import { User } from '../users/models/user.model.js';
import { VenueMembership } from '../users/models/venue-membership.model.js';

/**
 * A demo exhibit's approval trail, made through the review service as its venue's demo curator and
 * educator would make it in the studio, so the demo gallery has approved revisions to release.
 */
@Injectable()
export class DemoReviews {
  constructor(
    @InjectModel(Exhibit) private readonly exhibits: typeof Exhibit,
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(User) private readonly users: typeof User,
    private readonly reviews: ReviewsService,
  ) {}

  async seed(exhibitName: string, curatorEmail: string, educatorEmail: string): Promise<void> {
    const exhibit = await this.exhibits.findOne({ where: { name: exhibitName } });
    const curator = await this.users.findOne({ where: { email: curatorEmail }, include: [VenueMembership] });
    const educator = await this.users.findOne({ where: { email: educatorEmail }, include: [VenueMembership] });
    if (!exhibit || !curator || !educator) throw new Error('the demo exhibit, curator and educator must exist before the demo reviews');
    const stories = await this.stories.findAll({ where: { exhibitId: exhibit.id }, order: [['id', 'ASC']] });
    for (const story of stories) {
      const { revisionId } = await this.reviews.submitForReview(story.id, curator);
      await this.reviews.recordVerdict(revisionId, educator, { verdict: 'approve', note: 'Checked against the exhibit brief: accurate and pitched for families.' });
    }
  }
}
