// The local fake S3 service (api/src/dev/fake-s3.main.ts) as a child process of `npm start` and
// `npm test`, standing in for an S3-compatible object store where photos are kept.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { stopChild, waitForChild } from './child.mjs';
import { root } from './project.mjs';

export const fakeS3Entry = join(root, 'api', 'dist', 'src', 'dev', 'fake-s3.main.js');

/**
 * Resolves with the environment to hand to the API (S3_*) and a stop(); rejects if it exits
 * early. `directory` holds the objects (npm start: .data/fake-s3; npm test: a throw-away folder).
 */
export async function startFakeS3({ port, directory, bucket = 'peakwise-photos', quiet = false }) {
  const child = spawn('node', [fakeS3Entry], {
    cwd: root,
    stdio: ['ignore', quiet ? 'ignore' : 'inherit', 'inherit'],
    env: { ...process.env, FAKE_S3_PORT: String(port), FAKE_S3_DIR: directory, FAKE_S3_BUCKET: bucket },
  });
  const endpoint = `http://127.0.0.1:${port}`;
  // The bucket is made before it listens, so any answer means it is ready.
  await waitForChild(child, async () => Boolean(await fetch(endpoint)), { name: 'fake S3 service', ports: [port] });
  return {
    child,
    env: {
      S3_ENDPOINT: endpoint,
      S3_BUCKET: bucket,
      S3_REGION: 'us-east-1',
      // s3rver's own fixed key pair; it refuses any other.
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
    },
    stop: () => stopChild(child),
  };
}
