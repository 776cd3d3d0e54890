import 'reflect-metadata';
import { apiDatabaseUrl } from './api-database.js';

// The app under test talks to the suites' own database; its background jobs (outbox, releases, renditions, notices, fleet watch, deleted items) are driven by hand.
process.env.DATABASE_URL = apiDatabaseUrl();
process.env.MAIL_POLL_INTERVAL_MS = '0';
process.env.RELEASE_POLL_INTERVAL_MS = '0';
process.env.RENDITION_POLL_INTERVAL_MS = '0';
process.env.TRANSLATION_NOTICE_INTERVAL_MS = '0';
process.env.FLEET_WATCH_INTERVAL_MS = '0';
process.env.DELETED_ITEMS_INTERVAL_MS = '0';
process.env.JWT_SECRET ??= 'secret-for-the-server-suites';
