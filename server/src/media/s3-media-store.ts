import { Readable } from 'node:stream';
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, S3Client, type S3ClientConfig } from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { checkedKey, type ByteRange, type MediaStore, type OpenedObject, type PresignOptions } from './media-store.js';

export interface S3Settings {
  bucket: string;
  endpoint?: string;
  region: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  forcePathStyle: boolean;
}

/** Parts of a multipart upload: S3's smallest part, so a stream costs the server at most a few of these in memory. */
const PART_BYTES = 5 * 1024 * 1024;

/**
 * Media in one bucket of an S3-compatible store, so every server instance sees the same files.
 * S3 itself makes a put whole or nothing. Without keys in the settings the SDK finds its own
 * (environment, instance role).
 */
export class S3MediaStore implements MediaStore {
  private readonly client: S3Client;
  private readonly bucket: string;

  constructor(settings: S3Settings) {
    const config: S3ClientConfig = {
      region: settings.region,
      endpoint: settings.endpoint,
      forcePathStyle: settings.forcePathStyle,
      // Checksums only where S3 requires them: many S3-compatible stores refuse the newer trailing ones.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    };
    if (settings.accessKeyId && settings.secretAccessKey) config.credentials = { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey };
    this.client = new S3Client(config);
    this.bucket = settings.bucket;
  }

  async put(key: string, data: Buffer | Readable, contentType?: string): Promise<void> {
    const upload = new Upload({
      client: this.client,
      params: { Bucket: this.bucket, Key: checkedKey(key), Body: data, ContentType: contentType ?? 'application/octet-stream' },
      partSize: PART_BYTES,
      queueSize: 2,
    });
    await upload.done();
  }

  async get(key: string): Promise<Buffer | null> {
    const object = await this.open(key);
    if (!object) return null;
    const chunks: Buffer[] = [];
    for await (const chunk of object.body) chunks.push(chunk as Buffer);
    return Buffer.concat(chunks);
  }

  async open(key: string, range?: ByteRange): Promise<OpenedObject | null> {
    const answer = await absentAsNull(() =>
      this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: checkedKey(key), Range: range ? `bytes=${range.start}-${range.end}` : undefined })),
    );
    if (!answer?.Body) return null;
    // With a range, the whole size is the figure after the slash of Content-Range.
    const size = range ? Number(answer.ContentRange?.split('/')[1]) : answer.ContentLength;
    if (size === undefined || !Number.isSafeInteger(size)) throw new Error(`the store gave no size for ${key}`);
    return { size, body: answer.Body as Readable, range };
  }

  async size(key: string): Promise<number | null> {
    const head = await absentAsNull(() => this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: checkedKey(key) })));
    return head?.ContentLength ?? null;
  }

  async exists(key: string): Promise<boolean> {
    return (await this.size(key)) !== null;
  }

  async remove(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: checkedKey(key) }));
  }

  presignedUrl(key: string, options: PresignOptions): Promise<string> {
    const command = new GetObjectCommand({ Bucket: this.bucket, Key: checkedKey(key), ResponseContentType: options.contentType });
    return getSignedUrl(this.client, command, { expiresIn: options.expiresInS });
  }
}

async function absentAsNull<T>(request: () => Promise<T>): Promise<T | null> {
  try {
    return await request();
  } catch (error) {
    const { name, $metadata } = error as { name?: string; $metadata?: { httpStatusCode?: number } };
    if (name === 'NoSuchKey' || name === 'NotFound' || $metadata?.httpStatusCode === 404) return null;
    throw error;
  }
}
