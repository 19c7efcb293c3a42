import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DeleteObjectsCommand, ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import type { AppConfig } from '../src/config.js';
import { startFakeS3, type FakeS3 } from '../src/dev/fake-s3.js';

export interface TestBucket extends FakeS3 {
  /** Every key in the bucket, sorted. */
  keys(): Promise<string[]>;
  /** Removes every object (between tests: TRUNCATE does not fire the trash trigger). */
  clear(): Promise<void>;
  /** Stops the server and removes its folder. */
  stop(): Promise<void>;
}

/** A fake S3 on a free loopback port, in this test process, with its objects in a temporary folder. */
export async function startTestBucket(): Promise<TestBucket> {
  const directory = mkdtempSync(join(tmpdir(), 'peakwise-s3-'));
  const s3 = await startFakeS3({ port: 0, directory, bucket: 'photos-test' });
  const client = new S3Client({
    endpoint: s3.endpoint,
    region: s3.region,
    forcePathStyle: true,
    credentials: { accessKeyId: s3.accessKeyId, secretAccessKey: s3.secretAccessKey },
  });
  const keys = async () => {
    const page = await client.send(new ListObjectsV2Command({ Bucket: s3.bucket }));
    return (page.Contents ?? []).map((o) => o.Key ?? '').sort();
  };
  return {
    ...s3,
    keys,
    clear: async () => {
      const all = await keys();
      if (all.length) {
        await client.send(
          new DeleteObjectsCommand({ Bucket: s3.bucket, Delete: { Objects: all.map((Key) => ({ Key })) } }),
        );
      }
    },
    stop: async () => {
      client.destroy();
      await s3.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}

/** Config overrides that point the app's photo storage at `bucket` (no sweep at start: tests call it). */
export function storageConfig(bucket: FakeS3): Pick<AppConfig, 'storage'> {
  return {
    storage: {
      endpoint: bucket.endpoint,
      bucket: bucket.bucket,
      region: bucket.region,
      accessKeyId: bucket.accessKeyId,
      secretAccessKey: bucket.secretAccessKey,
      sweep: false,
    },
  };
}
