// The local fake mail server (api/src/dev/fake-smtp.main.ts) as a child process of `npm start`
// and `npm test`. It is part of the built API, so start it only after the build step.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { stopChild, waitForChild } from './child.mjs';
import { root } from './project.mjs';

export const fakeMailEntry = join(root, 'api', 'dist', 'src', 'dev', 'fake-smtp.main.js');

/**
 * Starts the fake server and waits until its HTTP side answers. Resolves with the URLs to hand to
 * the API (SMTP_URL, DEV_MAIL_URL) and a stop() that ends the child; rejects if it exits early.
 */
export async function startFakeMail({ smtpPort, httpPort, file, quiet = false }) {
  const child = spawn('node', [fakeMailEntry], {
    cwd: root,
    stdio: ['ignore', quiet ? 'ignore' : 'inherit', 'inherit'],
    env: {
      ...process.env,
      FAKE_SMTP_PORT: String(smtpPort),
      FAKE_SMTP_HTTP_PORT: String(httpPort),
      // An empty name keeps the messages in memory only (npm test).
      FAKE_SMTP_FILE: file ?? '',
    },
  });
  const handle = {
    child,
    smtpUrl: `smtp://127.0.0.1:${smtpPort}`,
    httpUrl: `http://127.0.0.1:${httpPort}`,
    stop: () => stopChild(child),
  };
  await waitForChild(child, async () => (await fetch(`${handle.httpUrl}/messages`)).ok, {
    name: 'fake mail server',
    ports: [smtpPort, httpPort],
  });
  return handle;
}
