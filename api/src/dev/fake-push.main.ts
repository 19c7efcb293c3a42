// The local fake push service as its own process, for `npm start` and `npm test` (scripts/*.mjs
// spawn it after the build): node api/dist/src/dev/fake-push.main.js
//   FAKE_PUSH_PORT (2527), FAKE_PUSH_CERT_FILE (.data/fake-push-cert.pem: the self-signed
//   certificate, written at each start, for the API's PUSH_CA_FILE), FAKE_PUSH_FILE
//   (.data/fake-push.json: devices and messages; empty keeps them in memory), FAKE_PUSH_MAX (200 kept).
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { repoRoot } from '../repo-root.js';
import { stopOnSignal } from './stop-on-signal.js';
import { startFakePush } from './fake-push.js';

const port = Number(process.env.FAKE_PUSH_PORT ?? 2527);
if (!Number.isInteger(port) || port < 0 || port > 65_535) throw new Error('FAKE_PUSH_PORT must be a port number');
const certFile = process.env.FAKE_PUSH_CERT_FILE || join(repoRoot(), '.data', 'fake-push-cert.pem');
const file = process.env.FAKE_PUSH_FILE ?? join(repoRoot(), '.data', 'fake-push.json');
const server = await startFakePush({ port, max: Number(process.env.FAKE_PUSH_MAX ?? 200), file: file || null });
writeFileSync(certFile, server.certificate);
process.stdout.write(`fake push service on ${server.url} (certificate in ${certFile})\n`);

stopOnSignal(() => server.close());
