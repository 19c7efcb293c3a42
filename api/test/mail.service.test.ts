import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startFakeSmtp, type FakeSmtp } from '../src/dev/fake-smtp.js';
import { MailService } from '../src/mail/mail.service.js';
import { mailConfig, startTestMailbox } from './mail-fixture.js';
import { testConfig } from './test-app.js';

let mailbox: FakeSmtp;
let mail: MailService;
beforeAll(async () => {
  mailbox = await startTestMailbox();
  mail = new MailService(testConfig({ ...mailConfig(mailbox, 'https://peakwise.example') }));
});
afterAll(async () => {
  mail.onModuleDestroy();
  await mailbox.close();
});
beforeEach(() => mailbox.clear());

function message(key: string, to = 'theo@example.com') {
  const body = mail.compose({
    heading: 'Your starter will be ready from 14:20',
    paragraphs: ['The rye culture <Rosa> is rising; its ready window starts at 14:20.'],
    action: { label: 'Open the culture', path: '/cultures/1' },
  });
  return { to, subject: 'Ready from 14:20', key, ...body };
}

describe('MailService through the fake SMTP server', () => {
  it('delivers one message with text, HTML, subject and recipient', async () => {
    const sent = await mail.send(message('alert:1'));
    const received = mailbox.messages();
    expect(received).toHaveLength(1);
    expect(received[0]!.to).toEqual(['theo@example.com']);
    expect(received[0]!.subject).toBe('Ready from 14:20');
    expect(received[0]!.messageId).toBe(sent.messageId);
    expect(received[0]!.text).toContain('Open the culture: https://peakwise.example/cultures/1');
    expect(received[0]!.text).toContain('Alert settings: https://peakwise.example/account/alerts');
    // Escaped, never markup; and no remote images anywhere.
    expect(received[0]!.html).toContain('&lt;Rosa&gt;');
    expect(received[0]!.html).toContain('href="https://peakwise.example/account/alerts"');
    expect(received[0]!.html).not.toMatch(/<img/i);
  });

  it('gives a resend under the same key the same Message-ID, and another key another', async () => {
    const first = await mail.send(message('alert:42'));
    const again = await mail.send(message('alert:42'));
    const other = await mail.send(message('alert:43'));
    expect(again.messageId).toBe(first.messageId);
    expect(other.messageId).not.toBe(first.messageId);
    expect(first.messageId).toMatch(/^<[0-9a-f]{40}@peakwise\.invalid>$/);
    const ids = mailbox.messages().map((m) => m.messageId);
    expect(ids).toEqual([other.messageId, first.messageId, first.messageId]);
  });

  it('rejects when no SMTP server answers', async () => {
    const nowhere = new MailService(testConfig());
    await expect(nowhere.send(message('alert:lost'))).rejects.toThrow();
    nowhere.onModuleDestroy();
  });
});

describe('the fake SMTP server', () => {
  it('keeps messages in its file across a restart and drops the oldest beyond its cap', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'peakwise-mail-'));
    const file = join(dir, 'mail.json');
    try {
      const first = await startFakeSmtp({ smtpPort: 0, httpPort: 0, file, max: 2 });
      const sender = new MailService(testConfig(mailConfig(first)));
      for (const n of [1, 2, 3]) await sender.send({ ...message(`k${n}`), subject: `number ${n}` });
      sender.onModuleDestroy();
      await first.close();

      const second = await startFakeSmtp({ smtpPort: 0, httpPort: 0, file, max: 2 });
      try {
        const res = await fetch(`${second.httpUrl}/messages`);
        const body = (await res.json()) as { items: { subject: string }[] };
        expect(body.items.map((m) => m.subject)).toEqual(['number 3', 'number 2']);
      } finally {
        await second.close();
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
