import 'reflect-metadata';
import { apiDatabaseUrl } from './api-database.js';

// The app under test talks to the suites' own database; its outbox worker, release worker, notice job and fleet watcher are driven by hand.
process.env.DATABASE_URL = apiDatabaseUrl();
process.env.MAIL_POLL_INTERVAL_MS = '0';
process.env.RELEASE_POLL_INTERVAL_MS = '0';
process.env.TRANSLATION_NOTICE_INTERVAL_MS = '0';
process.env.FLEET_WATCH_INTERVAL_MS = '0';
process.env.JWT_SECRET ??= 'secret-for-the-server-suites';
