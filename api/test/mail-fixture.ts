import type { AppConfig } from '../src/config.js';
import { startFakeSmtp, type FakeSmtp } from '../src/dev/fake-smtp.js';

/** A fake SMTP server on free loopback ports, in this test process, keeping mail in memory only. */
export function startTestMailbox(): Promise<FakeSmtp> {
  return startFakeSmtp({ smtpPort: 0, httpPort: 0, file: null });
}

/** Config overrides that point the app's mail (and /api/dev/mail) at `mailbox`. */
export function mailConfig(mailbox: FakeSmtp, publicUrl = 'http://127.0.0.1:3000'): Pick<AppConfig, 'mail'> {
  return {
    mail: {
      smtpUrl: mailbox.smtpUrl,
      from: 'Peakwise <no-reply@peakwise.invalid>',
      publicUrl,
      devMailUrl: mailbox.httpUrl,
    },
  };
}
