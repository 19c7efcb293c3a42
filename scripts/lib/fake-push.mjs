// The local fake push service (api/src/dev/fake-push.main.ts) as a child process of `npm start`
// and `npm test`, standing in for the browser vendors' push services. It serves https with a
// certificate it makes at each start and writes to `certFile`; the API trusts it (PUSH_CA_FILE).
import { spawn } from 'node:child_process';
import { existsSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { stopChild, waitForChild } from './child.mjs';
import { root } from './project.mjs';

export const fakePushEntry = join(root, 'api', 'dist', 'src', 'dev', 'fake-push.main.js');

/** Resolves with the service's URL, the certificate file and a stop(); rejects if it exits early. */
export async function startFakePush({ port, certFile, file, quiet = false }) {
  // The file appears once the service listens: that is the sign it is ready.
  rmSync(certFile, { force: true });
  const child = spawn('node', [fakePushEntry], {
    cwd: root,
    stdio: ['ignore', quiet ? 'ignore' : 'inherit', 'inherit'],
    env: {
      ...process.env,
      FAKE_PUSH_PORT: String(port),
      FAKE_PUSH_CERT_FILE: certFile,
      // An empty name keeps devices and messages in memory only (npm test).
      FAKE_PUSH_FILE: file ?? '',
    },
  });
  await waitForChild(child, async () => existsSync(certFile), { name: 'fake push service', ports: [port] });
  return { child, url: `https://127.0.0.1:${port}`, certFile, stop: () => stopChild(child) };
}
