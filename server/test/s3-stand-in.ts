import { s3StandInEnv } from '../../scripts/lib/stack.mjs';
import { objectStorageOf } from '../src/config/config.service.js';
import type { S3Settings } from '../src/media/s3-media-store.js';

/**
 * The S3 stand-in `npm test` started (scripts/lib/s3-stand-in.mjs), as a server instance reads it
 * (for `createTestApp({ env })`). A suite about object storage fails when it is missing rather than
 * vanishing from the count.
 */
export { s3StandInEnv };

/** The same, as the settings of an S3 media store. */
export const s3StandInSettings = (): S3Settings => objectStorageOf(s3StandInEnv())!;
