import { mkdirSync } from 'node:fs';
import S3rver from 's3rver';

/**
 * A stand-in for an S3-compatible object store, for development and tests only: s3rver on
 * loopback, keeping objects as files under `directory`, with the bucket made at start. It accepts
 * s3rver's fixed key pair (below) and path-style URLs only (the client sets `forcePathStyle`).
 */
export interface FakeS3Options {
  /** 0 picks a free port (tests). */
  port?: number;
  host?: string;
  /** Where objects are kept (npm start: .data/fake-s3; tests: a temporary folder). */
  directory: string;
  bucket: string;
}

export interface FakeS3 {
  endpoint: string;
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
  close(): Promise<void>;
}

// s3rver's built-in account; any other key pair is refused with InvalidAccessKeyId.
const ACCESS_KEY_ID = 'S3RVER';
const SECRET_ACCESS_KEY = 'S3RVER';

export async function startFakeS3(options: FakeS3Options): Promise<FakeS3> {
  const host = options.host ?? '127.0.0.1';
  mkdirSync(options.directory, { recursive: true });
  const server = new S3rver({
    address: host,
    port: options.port ?? 2528,
    directory: options.directory,
    silent: true,
    configureBuckets: [{ name: options.bucket }],
  });
  const address = await server.run();
  return {
    endpoint: `http://${host}:${address.port}`,
    bucket: options.bucket,
    region: 'us-east-1',
    accessKeyId: ACCESS_KEY_ID,
    secretAccessKey: SECRET_ACCESS_KEY,
    close: () => server.close(),
  };
}
