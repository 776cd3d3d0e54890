import type { ConfigService } from '../config/config.service.js';
import { LocalMediaStore } from './local-media-store.js';
import type { MediaStore } from './media-store.js';
import { S3MediaStore } from './s3-media-store.js';

/** The bucket when S3_BUCKET is set, else the local disk (one machine, the default). */
export function mediaStoreOf(config: ConfigService): MediaStore {
  return config.objectStorage ? new S3MediaStore(config.objectStorage) : new LocalMediaStore(config.mediaDir);
}
