import type { QueryInterface } from 'sequelize';
import * as usersAndSignIn from './0001-users-and-sign-in.js';
import * as mailOutbox from './0002-mail-outbox.js';
import * as auditEvents from './0003-audit-events.js';
import * as venues from './0004-venues.js';
import * as exhibitsStoriesPanels from './0100-exhibits-stories-panels.js';
import * as media from './0101-media.js';
import * as review from './0200-review.js';
import * as translations from './0300-translations.js';
import * as venueSigningKeys from './0400-venue-signing-keys.js';
import * as releases from './0401-releases.js';
import * as kiosks from './0402-kiosks.js';
import * as fleetWatch from './0500-fleet-watch.js';
import * as rateLimitsAndSessions from './0610-rate-limits-and-sessions.js';
import * as releasePanels from './0620-release-panels.js';
import * as publications from './0621-publications.js';
import * as livingStory from './0650-living-story.js';
import * as demoKiosk from './0660-demo-kiosk.js';
import * as backgroundJobs from './0730-background-jobs.js';
import * as queuedRenditions from './0731-queued-renditions.js';
import * as venueBoundaries from './0800-venue-boundaries.js';
import * as venueTimeZones from './0810-venue-time-zones.js';
import * as canonicalLanguageTags from './0820-canonical-language-tags.js';
import * as restorableDeletions from './0830-restorable-deletions.js';

interface MigrationModule {
  up(qi: QueryInterface): Promise<void>;
  down(qi: QueryInterface): Promise<void>;
}

/** In order. Listed here rather than globbed so the built server and the tests run the same set. */
const modules: [string, MigrationModule][] = [
  ['0001-users-and-sign-in', usersAndSignIn],
  ['0002-mail-outbox', mailOutbox],
  ['0003-audit-events', auditEvents],
  ['0004-venues', venues],
  ['0100-exhibits-stories-panels', exhibitsStoriesPanels],
  ['0101-media', media],
  ['0200-review', review],
  ['0300-translations', translations],
  ['0400-venue-signing-keys', venueSigningKeys],
  ['0401-releases', releases],
  ['0402-kiosks', kiosks],
  ['0500-fleet-watch', fleetWatch],
  ['0610-rate-limits-and-sessions', rateLimitsAndSessions],
  ['0620-release-panels', releasePanels],
  ['0621-publications', publications],
  ['0650-living-story', livingStory],
  ['0660-demo-kiosk', demoKiosk],
  ['0730-background-jobs', backgroundJobs],
  ['0731-queued-renditions', queuedRenditions],
  ['0800-venue-boundaries', venueBoundaries],
  ['0810-venue-time-zones', venueTimeZones],
  ['0820-canonical-language-tags', canonicalLanguageTags],
  ['0830-restorable-deletions', restorableDeletions],
];

export const migrations = modules.map(([name, m]) => ({
  name,
  up: ({ context }: { context: QueryInterface }) => m.up(context),
  down: ({ context }: { context: QueryInterface }) => m.down(context),
}));
