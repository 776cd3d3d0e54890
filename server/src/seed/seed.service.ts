import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import { AuditService } from '../audit/audit.service.js';
import { RenditionsWorker } from '../media/renditions.worker.js';
import { User } from '../users/models/user.model.js';
import { VenueMembership } from '../users/models/venue-membership.model.js';
import { PasswordHasher } from '../users/password-hasher.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { Station } from '../venues/models/station.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { DemoFleet } from './demo-fleet.js';
import { DemoReviews } from './demo-reviews.js';
import { DEMO_SECOND_EXHIBIT, DemoSecondVenue } from './demo-second-venue.js';
import { DEMO_EXHIBIT, DemoStories } from './demo-stories.js';
import { DemoTranslations } from './demo-translations.js';
import { DEMO_ACCOUNTS, DEMO_GALLERY, DEMO_SECOND_GALLERY, DEMO_SECOND_VENUE, DEMO_STATION, DEMO_VENUE } from './demo-scenario.js';

@Injectable()
export class SeedService {
  constructor(
    @InjectModel(User) private readonly users: typeof User,
    @InjectModel(VenueMembership) private readonly memberships: typeof VenueMembership,
    @InjectModel(Venue) private readonly venues: typeof Venue,
    @InjectModel(Gallery) private readonly galleries: typeof Gallery,
    @InjectModel(Station) private readonly stations: typeof Station,
    private readonly sequelize: Sequelize,
    private readonly hasher: PasswordHasher,
    private readonly audit: AuditService,
    private readonly demoStories: DemoStories,
    private readonly demoSecondVenue: DemoSecondVenue,
    private readonly demoTranslations: DemoTranslations,
    private readonly demoReviews: DemoReviews,
    private readonly demoFleet: DemoFleet,
    private readonly renditions: RenditionsWorker,
  ) {}

  /** Seeds the demo on a database that has nobody in it yet; returns false when it left it alone. */
  async seedDemo(password: string): Promise<boolean> {
    if ((await this.users.count()) > 0) return false;
    const hashes = await Promise.all(DEMO_ACCOUNTS.map(() => this.hasher.hash(password)));
    await this.sequelize.transaction(async (transaction) => {
      const venue = await this.venues.create(DEMO_VENUE, { transaction });
      const gallery = await this.galleries.create({ ...DEMO_GALLERY, venueId: venue.id }, { transaction });
      await this.stations.create({ ...DEMO_STATION, galleryId: gallery.id }, { transaction });
      const second = await this.venues.create(DEMO_SECOND_VENUE, { transaction });
      await this.galleries.create({ ...DEMO_SECOND_GALLERY, venueId: second.id }, { transaction });
      const venueIds = { first: venue.id, second: second.id };
      for (const [i, { memberships, ...account }] of DEMO_ACCOUNTS.entries()) {
        const user = await this.users.create({ ...account, passwordHash: hashes[i], uiLanguage: 'en', active: true }, { transaction });
        await this.memberships.bulkCreate(
          memberships.map(({ venue: key, ...grant }) => ({ ...grant, userId: user.id, venueId: venueIds[key] })),
          { transaction },
        );
      }
    });
    await this.demoStories.seed('curator@demo.test');
    await this.demoSecondVenue.seed('curator2@demo.test');
    // The demo release is asked for below: its images' renditions must be made first.
    await this.renditions.makeAllPending();
    await this.demoTranslations.seed('translator@demo.test');
    await this.demoReviews.seed(DEMO_EXHIBIT.name, 'curator@demo.test', 'educator@demo.test');
    await this.demoReviews.seed(DEMO_SECOND_EXHIBIT.name, 'curator2@demo.test', 'educator@demo.test');
    await this.demoFleet.seed('technician@demo.test');
    return true;
  }

  /** Production's first admin, from the command line. */
  async createAdmin(email: string, name: string, password: string): Promise<User> {
    const address = email.trim().toLowerCase();
    if (await this.users.findOne({ where: { email: address } })) throw new Error(`${address} already has an account`);
    const passwordHash = await this.hasher.hash(password);
    return this.sequelize.transaction(async (transaction) => {
      const user = await this.users.create(
        { email: address, name, passwordHash, roles: ['admin'], locales: [], uiLanguage: 'en', active: true },
        { transaction },
      );
      await this.audit.record({ actorId: null, action: 'user.created', targetType: 'user', targetId: user.id, detail: { via: 'cli', roles: ['admin'] } }, transaction);
      return user;
    });
  }
}
