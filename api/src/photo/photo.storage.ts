import {
  Inject,
  Injectable,
  Logger,
  NotFoundException,
  ServiceUnavailableException,
  type OnModuleDestroy,
} from '@nestjs/common';
import {
  DeleteObjectsCommand,
  GetObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import { APP_CONFIG, type AppConfig, type StorageConfig } from '../config.js';

/** Every photo object lives under this prefix; the orphan sweep looks nowhere else. */
export const PHOTO_PREFIX = 'photo/';

export interface StoredObject {
  body: Readable;
  length: number | undefined;
}

export interface ListedObject {
  key: string;
  lastModified: Date | undefined;
}

/**
 * The bucket, through the S3 SDK. Objects are private (no ACL, no public URL): the API reads them
 * and serves them after its own access check. Keys are random, so they say nothing of the baker,
 * the culture or the file's name.
 */
@Injectable()
export class PhotoStorage implements OnModuleDestroy {
  private readonly logger = new Logger(PhotoStorage.name);
  private readonly client: S3Client | null;
  private readonly bucket: string;

  constructor(@Inject(APP_CONFIG) config: AppConfig) {
    this.client = config.storage ? createClient(config.storage) : null;
    this.bucket = config.storage?.bucket ?? '';
  }

  get configured(): boolean {
    return this.client !== null;
  }

  newKey(): string {
    return `${PHOTO_PREFIX}${randomUUID()}`;
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.require().send(
      new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: body, ContentType: contentType }),
    );
  }

  async get(key: string): Promise<StoredObject> {
    const object = await this.require()
      .send(new GetObjectCommand({ Bucket: this.bucket, Key: key }))
      .catch((error: Error) => {
        // A row whose object went missing (restored database, emptied bucket): nothing to show.
        if (error.name === 'NoSuchKey') throw new NotFoundException('This photo is no longer stored.');
        throw error;
      });
    return { body: object.Body as Readable, length: object.ContentLength };
  }

  /** Removes the objects (missing ones count as removed); answers the keys that failed. */
  async remove(keys: string[]): Promise<string[]> {
    if (!keys.length) return [];
    if (!this.client) return keys;
    const failed: string[] = [];
    // DeleteObjects takes at most 1,000 keys a request.
    for (let i = 0; i < keys.length; i += 1000) {
      const batch = keys.slice(i, i + 1000);
      try {
        const result = await this.client.send(
          new DeleteObjectsCommand({
            Bucket: this.bucket,
            Delete: { Objects: batch.map((Key) => ({ Key })), Quiet: true },
          }),
        );
        failed.push(...(result.Errors ?? []).map((e) => e.Key ?? '').filter(Boolean));
      } catch (error) {
        this.logger.warn(`could not remove ${batch.length} photo objects: ${(error as Error).message}`);
        failed.push(...batch);
      }
    }
    return failed;
  }

  /** Every photo object, a page at a time. */
  async *list(): AsyncGenerator<ListedObject[]> {
    let token: string | undefined;
    do {
      const page = await this.require().send(
        new ListObjectsV2Command({ Bucket: this.bucket, Prefix: PHOTO_PREFIX, ContinuationToken: token }),
      );
      yield (page.Contents ?? []).map((o) => ({ key: o.Key ?? '', lastModified: o.LastModified }));
      token = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (token);
  }

  onModuleDestroy(): void {
    this.client?.destroy();
  }

  private require(): S3Client {
    if (!this.client) throw new ServiceUnavailableException('Photo storage is not set up on this server.');
    return this.client;
  }
}

function createClient(config: StorageConfig): S3Client {
  return new S3Client({
    region: config.region,
    ...(config.endpoint ? { endpoint: config.endpoint } : {}),
    // Buckets as a path (http://host/bucket/key): local and most S3-compatible stores need it.
    forcePathStyle: true,
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
    // Checksums only where S3 demands them: several S3-compatible stores reject the newer headers.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}
