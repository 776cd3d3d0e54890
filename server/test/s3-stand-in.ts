import type { S3Settings } from '../src/media/s3-media-store.js';

/**
 * The S3 stand-in `npm test` started (scripts/lib/s3-stand-in.mjs). A suite about object storage
 * fails when it is missing rather than vanishing from the count.
 */
export function s3StandInSettings(): S3Settings {
  const endpoint = process.env.S3_STAND_IN_ENDPOINT;
  if (!endpoint) throw new Error('S3_STAND_IN_ENDPOINT is not set: run this suite through `node scripts/test.mjs server`, which starts the S3 stand-in');
  const key = process.env.S3_STAND_IN_KEY ?? 'S3RVER';
  return { bucket: process.env.S3_STAND_IN_BUCKET ?? 'mantlepiece', endpoint, region: 'us-east-1', accessKeyId: key, secretAccessKey: key, forcePathStyle: true };
}

/** The same, as the environment a server instance reads (for `createTestApp({ env })`). */
export function s3StandInEnv(): Record<string, string> {
  const settings = s3StandInSettings();
  return {
    S3_BUCKET: settings.bucket,
    S3_ENDPOINT: settings.endpoint!,
    S3_REGION: settings.region,
    S3_ACCESS_KEY_ID: settings.accessKeyId!,
    S3_SECRET_ACCESS_KEY: settings.secretAccessKey!,
    S3_FORCE_PATH_STYLE: 'true',
  };
}
