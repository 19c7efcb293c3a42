// The local fake mail server (api/src/dev/fake-smtp.main.ts) as a child process of `npm start`
// and `npm test`. It is part of the built API, so start it only after the build step.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { root } from './project.mjs';

export const fakeMailEntry = join(root, 'api', 'dist', 'src', 'dev', 'fake-smtp.main.js');

/**
 * Starts the fake server and waits until its HTTP side answers. Resolves with the URLs to hand to
 * the API (SMTP_URL, DEV_MAIL_URL) and a stop() that ends the child; rejects if it exits early.
 */
export function startFakeMail({ smtpPort, httpPort, file, quiet = false }) {
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
    /** Resolves once the child has gone (at once if it already has). */
    stop() {
      if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
      return new Promise((resolve) => {
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
        setTimeout(() => child.kill('SIGKILL'), 5_000).unref();
      });
    },
  };
  return new Promise((resolve, reject) => {
    let settled = false;
    const early = (code) => {
      if (settled) return;
      settled = true;
      reject(new Error(`the fake mail server exited early (${code}); is port ${smtpPort} or ${httpPort} taken?`));
    };
    child.once('error', (error) => early(error.message));
    child.once('exit', early);
    const deadline = Date.now() + 15_000;
    const poll = async () => {
      if (settled) return;
      try {
        if ((await fetch(`${handle.httpUrl}/messages`)).ok) {
          settled = true;
          child.off('exit', early);
          return resolve(handle);
        }
      } catch {
        // not listening yet
      }
      if (Date.now() > deadline) {
        settled = true;
        void handle.stop();
        return reject(new Error('the fake mail server did not answer within 15 s'));
      }
      setTimeout(poll, 150);
    };
    void poll();
  });
}
