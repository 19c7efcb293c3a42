// The local fake mail server as its own process, for `npm start` and `npm test` (scripts/*.mjs
// spawn it after the build): node api/dist/src/dev/fake-smtp.main.js
//   FAKE_SMTP_PORT (2525), FAKE_SMTP_HTTP_PORT (2526), FAKE_SMTP_FILE (.data/fake-mail.json;
//   empty keeps messages in memory only), FAKE_SMTP_MAX (200 messages kept).
import { join } from 'node:path';
import { repoRoot } from '../repo-root.js';
import { stopOnSignal } from './stop-on-signal.js';
import { startFakeSmtp } from './fake-smtp.js';

function port(name: string, fallback: number): number {
  const value = Number(process.env[name] ?? fallback);
  if (!Number.isInteger(value) || value < 0 || value > 65_535) throw new Error(`${name} must be a port number`);
  return value;
}

const file = process.env.FAKE_SMTP_FILE ?? join(repoRoot(), '.data', 'fake-mail.json');
const server = await startFakeSmtp({
  smtpPort: port('FAKE_SMTP_PORT', 2525),
  httpPort: port('FAKE_SMTP_HTTP_PORT', 2526),
  file: file || null,
  max: Number(process.env.FAKE_SMTP_MAX ?? 200),
});
process.stdout.write(`fake SMTP on ${server.smtpUrl}, messages at ${server.httpUrl}/messages\n`);

stopOnSignal(() => server.close());
