// The local fake S3 service as its own process, for `npm start` and `npm test` (scripts/*.mjs
// spawn it after the build): node api/dist/src/dev/fake-s3.main.js
//   FAKE_S3_PORT (2528), FAKE_S3_DIR (.data/fake-s3: the objects, kept across restarts),
//   FAKE_S3_BUCKET (peakwise-photos).
import { join } from 'node:path';
import { repoRoot } from '../repo-root.js';
import { startFakeS3 } from './fake-s3.js';

const port = Number(process.env.FAKE_S3_PORT ?? 2528);
if (!Number.isInteger(port) || port < 0 || port > 65_535) throw new Error('FAKE_S3_PORT must be a port number');
const server = await startFakeS3({
  port,
  directory: process.env.FAKE_S3_DIR || join(repoRoot(), '.data', 'fake-s3'),
  bucket: process.env.FAKE_S3_BUCKET || 'peakwise-photos',
});
process.stdout.write(`fake S3 on ${server.endpoint}, bucket ${server.bucket}\n`);

let closing = false;
const stop = (): void => {
  if (closing) return;
  closing = true;
  void server.close().then(() => process.exit(0));
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
