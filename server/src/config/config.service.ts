import path from 'node:path';
import { Injectable } from '@nestjs/common';
import type { S3Settings } from '../media/s3-media-store.js';

/** Settings from the environment, read once, each with the default a single-machine start needs. */
@Injectable()
export class ConfigService {
  readonly nodeEnv = process.env.NODE_ENV ?? 'development';
  readonly host = process.env.HOST ?? '127.0.0.1';
  readonly port = intFromEnv('PORT', 4310);
  readonly publicUrl = (process.env.PUBLIC_URL ?? `http://${this.host}:${this.port}`).replace(/\/+$/, '');
  /** Express `trust proxy`: which hops may tell us the client's address (X-Forwarded-For). */
  readonly trustProxy = process.env.TRUST_PROXY ?? 'loopback';

  readonly smtpHost = process.env.SMTP_HOST ?? '127.0.0.1';
  readonly smtpPort = intFromEnv('SMTP_PORT', 2525);
  readonly smtpSecure = process.env.SMTP_SECURE === 'true';
  readonly smtpUser = process.env.SMTP_USER;
  readonly smtpPassword = process.env.SMTP_PASSWORD;
  readonly mailFrom = process.env.MAIL_FROM ?? 'Mantlepiece <mantlepiece@localhost>';
  readonly mailDir = process.env.MAIL_DIR;
  /** 0 turns the outbox worker's timer off (tests drive it by hand). */
  readonly mailPollIntervalMs = intFromEnv('MAIL_POLL_INTERVAL_MS', 2000);
  /** How often assignment mail and stale-unit digests are looked for; 0 turns the timer off (tests drive it). */
  readonly translationNoticeIntervalMs = intFromEnv('TRANSLATION_NOTICE_INTERVAL_MS', 60_000);

  readonly accessTokenTtlSeconds = Math.min(intFromEnv('ACCESS_TOKEN_TTL_SECONDS', 900), 900);
  readonly refreshTokenTtlDays = intFromEnv('REFRESH_TOKEN_TTL_DAYS', 14);
  readonly invitationTtlHours = intFromEnv('INVITATION_TTL_HOURS', 72);
  readonly passwordResetTtlMinutes = intFromEnv('PASSWORD_RESET_TTL_MINUTES', 60);
  /** Two refreshes with one refresh token this close together (two tabs) get the same new pair instead of a sign-out. */
  readonly refreshReuseGraceSeconds = intFromEnv('REFRESH_REUSE_GRACE_SECONDS', 10);
  readonly signInWindowMinutes = intFromEnv('SIGN_IN_WINDOW_MINUTES', 15);
  /** Wrong passwords for one account from one client address before that address is locked out of it. */
  readonly signInMaxFailuresPerAccountAndAddress = intFromEnv('SIGN_IN_MAX_FAILURES_PER_ACCOUNT_AND_ADDRESS', 5);
  /** Wrong passwords from one client address, whichever accounts, before it is locked out. */
  readonly signInMaxFailuresPerAddress = intFromEnv('SIGN_IN_MAX_FAILURES_PER_ADDRESS', 30);
  /** Wrong passwords for one account, from anywhere, before each further try waits twice as long as the last. */
  readonly signInFreeFailuresPerAccount = intFromEnv('SIGN_IN_FREE_FAILURES_PER_ACCOUNT', 10);
  readonly passwordResetsPerAccountPerHour = intFromEnv('PASSWORD_RESETS_PER_ACCOUNT_PER_HOUR', 3);
  readonly passwordResetsPerAddressPerHour = intFromEnv('PASSWORD_RESETS_PER_ADDRESS_PER_HOUR', 10);
  /** Pairing codes one client address may ask for per quarter hour (a kiosk asks once per code, every 10 minutes). */
  readonly pairingStartsPerAddress = intFromEnv('PAIRING_STARTS_PER_ADDRESS', 60);

  /**
   * Bounded waits on the database, so a stalled MariaDB costs a request seconds and a 503, never an
   * endless wait: opening a connection, waiting for a free one in the pool, and one statement
   * (MariaDB's max_statement_time; 0 lifts that limit). Migrations through the CLI are not bounded.
   */
  readonly dbConnectTimeoutMs = intFromEnv('DB_CONNECT_TIMEOUT_MS', 5000);
  readonly dbAcquireTimeoutMs = intFromEnv('DB_ACQUIRE_TIMEOUT_MS', 5000);
  readonly dbStatementTimeoutMs = intFromEnv('DB_STATEMENT_TIMEOUT_MS', 5000);
  /** How long `GET /api/health` waits for the database before it answers `db: down`. */
  readonly healthDbTimeoutMs = intFromEnv('HEALTH_DB_TIMEOUT_MS', 1000);

  readonly studioDist = process.env.STUDIO_DIST;
  readonly kioskDist = process.env.KIOSK_DIST;
  readonly demoPassword = process.env.DEMO_PASSWORD ?? 'mantlepiece-demo';

  /** Everything this installation keeps (MariaDB's files, media, releases, mail, secrets); `npm start` sets it. */
  readonly dataDir = path.resolve(process.env.DATA_DIR ?? '.data');
  /** Uploaded images, their renditions and release files, content-addressed: in the data folder, so its backup has them. */
  readonly mediaDir = path.resolve(process.env.MEDIA_DIR ?? path.join(this.dataDir, 'media'));
  /**
   * With S3_BUCKET set, media and release files live in that S3-compatible bucket instead of MEDIA_DIR,
   * so several server instances share them; the SDK finds credentials itself when the keys are unset.
   */
  readonly objectStorage = objectStorageOf(process.env);

  /** How long a kiosk's redirect to a presigned bucket URL holds; 0 streams kiosk files through the server (a CDN in front). */
  readonly presignedUrlSeconds = intFromEnv('S3_PRESIGNED_URL_SECONDS', 300);
  readonly mediaMaxBytes = intFromEnv('MEDIA_MAX_BYTES', 25 * 1024 * 1024);
  /** Width × height above which an upload is refused before it is decoded (decompression bombs). */
  readonly mediaMaxPixels = intFromEnv('MEDIA_MAX_PIXELS', 100_000_000);

  /** How often the renditions worker looks for uploaded images to make WebP renditions of; 0 turns its timer off (tests drive it by hand). */
  readonly renditionPollIntervalMs = intFromEnv('RENDITION_POLL_INTERVAL_MS', 1000);
  /** 0 turns the release worker's timer off (tests drive builds by hand). */
  readonly releasePollIntervalMs = intFromEnv('RELEASE_POLL_INTERVAL_MS', 1000);
  /** How long a signed publication record holds; it is signed again once half of that has passed. */
  readonly publicationLifetimeDays = Math.max(intFromEnv('PUBLICATION_LIFETIME_DAYS', 30), 1);

  /** How often kiosks send a heartbeat; two missed make a kiosk stale on the Fleet page. */
  readonly heartbeatIntervalS = Math.max(intFromEnv('HEARTBEAT_INTERVAL_S', 30), 1);
  /** Silence after which a kiosk is offline and its venue's technicians get a mail. */
  readonly kioskOfflineAfterS = intFromEnv('KIOSK_OFFLINE_AFTER_S', 300);
  /** How often the silent-kiosk watcher looks; 0 turns its timer off (tests call it by hand). */
  readonly fleetWatchIntervalMs = intFromEnv('FLEET_WATCH_INTERVAL_MS', 15_000);
  /** How often deleted panels and images past their grace are purged; 0 turns its timer off (tests purge by hand). */
  readonly deletedItemsIntervalMs = intFromEnv('DELETED_ITEMS_INTERVAL_MS', 60_000);

  get isProduction(): boolean {
    return this.nodeEnv === 'production';
  }

  /**
   * MariaDB replicas (comma-separated URLs, same user and database as DATABASE_URL): reads that may
   * lag a little go to them. Unset: every query goes to DATABASE_URL.
   */
  readonly databaseReplicaUrls = (process.env.DATABASE_REPLICA_URLS ?? '').split(',').map((url) => url.trim()).filter(Boolean);
  /** How far a replica may trail the primary: for this long after a client writes, its reads stay on the primary. */
  readonly replicaLagAllowanceSeconds = intFromEnv('REPLICA_LAG_ALLOWANCE_SECONDS', 10);
  /**
   * How long a paired kiosk's device-token read may answer that kiosk's later requests. 0, the
   * default: every request is answered from a read that began after it arrived, so a revocation or
   * a publication counts at the kiosk's next request. A venue network with many kiosks may allow,
   * say, 1000: a revocation or a publication then counts within that long on every instance, and
   * the manifest poll stops waiting on the database (server/bench/REPORT.md).
   */
  readonly pairedKioskRecheckMs = intFromEnv('PAIRED_KIOSK_RECHECK_MS', 0);

  get databaseUrl(): string {
    return required('DATABASE_URL');
  }

  get jwtSecret(): string {
    return required('JWT_SECRET');
  }

  /**
   * What venue signing keys are encrypted under. Outside production it falls back to JWT_SECRET,
   * so a development machine needs no second secret; production must set its own.
   */
  get signingKeySecret(): string {
    const own = process.env.SIGNING_KEY_SECRET;
    if (own) return own;
    if (this.isProduction) return required('SIGNING_KEY_SECRET');
    return this.jwtSecret;
  }

  /** People reach us over HTTPS (else over plain HTTP on a venue's own network). */
  get overHttps(): boolean {
    return this.publicUrl.startsWith('https:');
  }

  /** Cookies go out as Secure only when people reach us over HTTPS. */
  get secureCookies(): boolean {
    return this.overHttps;
  }
}

function required(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set`);
  return value;
}

function intFromEnv(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < 0) throw new Error(`${name} must be a whole number, got "${raw}"`);
  return value;
}

/** The S3-compatible bucket an environment names (S3_*), null without S3_BUCKET. */
export function objectStorageOf(env: NodeJS.ProcessEnv): S3Settings | null {
  return env.S3_BUCKET
    ? {
        bucket: env.S3_BUCKET,
        endpoint: env.S3_ENDPOINT || undefined,
        region: env.S3_REGION || 'us-east-1',
        accessKeyId: env.S3_ACCESS_KEY_ID || undefined,
        secretAccessKey: env.S3_SECRET_ACCESS_KEY || undefined,
        forcePathStyle: env.S3_FORCE_PATH_STYLE === 'true',
      }
    : null;
}
