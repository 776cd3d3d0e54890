import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Exhibit } from '../exhibits/models/exhibit.model.js';
import { PanelsService } from '../panels/panels.service.js';
import { Story } from '../stories/models/story.model.js';
import { User } from '../users/models/user.model.js';
import { VenueMembership } from '../users/models/venue-membership.model.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { DEMO_SECOND_GALLERY } from './demo-scenario.js';
import { doc, heading, paragraph } from './demo-stories.js';

/** The second venue's invented exhibit and its one story, short and text only. */
export const DEMO_SECOND_EXHIBIT = { name: 'Where Volcanoes Grow', plannedStart: '2027-05-01', plannedEnd: '2027-10-31' };

export const DEMO_SECOND_STORY = {
  title: 'Volcanoes Along the Plate Edges',
  panels: [
    doc(
      heading('Where the plates meet'),
      paragraph('Most volcanoes stand where two plates meet. Where plates pull apart, hot rock rises and melts. Where one plate sinks under another, it carries water down, and that water helps the rock above it melt.'),
    ),
    doc(
      heading('A ring of fire'),
      paragraph('Around the Pacific Ocean, old sea floor sinks under the plates around it. That is why a long ring of volcanoes circles this ocean.'),
    ),
  ],
};

/**
 * The second demo venue's exhibit and story, written by its own curator through the panel service
 * (the review is the demo reviews' job), so a first start shows two venues' work side by side.
 */
@Injectable()
export class DemoSecondVenue {
  constructor(
    @InjectModel(Gallery) private readonly galleries: typeof Gallery,
    @InjectModel(Exhibit) private readonly exhibits: typeof Exhibit,
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(User) private readonly users: typeof User,
    private readonly panels: PanelsService,
  ) {}

  async seed(curatorEmail: string): Promise<void> {
    const gallery = await this.galleries.findOne({ where: { name: DEMO_SECOND_GALLERY.name } });
    const curator = await this.users.findOne({ where: { email: curatorEmail }, include: [VenueMembership] });
    if (!gallery || !curator) throw new Error('the second demo gallery and its curator must exist before its story');
    const exhibit = await this.exhibits.create({ ...DEMO_SECOND_EXHIBIT, galleryId: gallery.id });
    const story = await this.stories.create({
      title: DEMO_SECOND_STORY.title, audience: 'family', sourceLocale: 'en', state: 'draft',
      venueId: gallery.venueId, exhibitId: exhibit.id, createdById: curator.id,
    });
    for (const panel of DEMO_SECOND_STORY.panels) await this.panels.addPanel(story.id, { doc: panel }, curator);
  }
}
