import { Inject, Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { channelsFor, defaultAlertPreferences, deliveryFor } from '@peakwise/shared';
import { APP_CONFIG, type AppConfig } from '../config.js';
import { MailService } from '../mail/mail.service.js';
import { renderMail } from '../mail/mail.template.js';
import { AlertClock } from './alert.clock.js';
import { AlertQueue, type AlertDueJob } from './alert.queue.js';
import { AlertRepository, type AlertRecipient, type ClaimedDelivery } from './alert.repository.js';
import { PushSender } from '../push/push.sender.js';

/**
 * A claim older than this is taken to belong to a worker that died mid-send and may be taken over.
 * Five minutes is far above one SMTP exchange; the price is the one window that cannot be closed:
 * a message the server accepted just before the crash is sent again (with the same Message-ID).
 */
export const CLAIM_TIMEOUT_SECONDS = 300;

/** Delivers one channel of one alert when its job comes due, exactly once per (alert, channel). */
@Injectable()
export class AlertWorker implements OnModuleInit {
  private readonly logger = new Logger('AlertWorker');

  constructor(
    private readonly alerts: AlertRepository,
    private readonly queue: AlertQueue,
    private readonly clock: AlertClock,
    private readonly mail: MailService,
    private readonly push: PushSender,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  onModuleInit(): void {
    this.queue.onWork(
      (job) => this.deliver(job),
      () => this.scheduleOpen(),
    );
  }

  /**
   * On start: a job for every delivery still open. One may exist already; the claim makes the
   * spare a no-op. This is what makes the promise survive a queue that was down or wiped.
   */
  async scheduleOpen(): Promise<void> {
    const open = await this.alerts.openDeliveries();
    await this.queue.scheduleMany(open.map((d) => ({ deliveryId: d.id, slotKey: d.slotKey, at: d.sendAfter })));
  }

  /** Claim, then send; a delivery someone else holds, already sent, or not yet due is left alone. */
  async deliver(job: AlertDueJob): Promise<void> {
    const now = this.clock.now();
    const claimed = await this.alerts.claim(job.deliveryId, now, CLAIM_TIMEOUT_SECONDS);
    if (!claimed) return;
    try {
      if (claimed.channel === 'in-app') return await this.alerts.markSent(claimed, now);
      if (claimed.channel === 'email') return await this.sendEmail(claimed, now);
      await this.sendPush(claimed, now);
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      await this.alerts.release(claimed.deliveryId, { lastError: message.slice(0, 2000) });
      this.logger.warn(`Alert delivery ${claimed.deliveryId} failed: ${message}`);
      throw error; // pg-boss retries the job with back-off
    }
  }

  /**
   * Preferences are read again at send time: quiet hours or a switched-off channel apply now.
   * Answers the recipient when the message should go out now; otherwise it has been dropped or
   * held (released with a later time and a new job) and answers null.
   */
  private async gate(claimed: ClaimedDelivery, now: Date, channel: 'email' | 'push'): Promise<AlertRecipient | null> {
    const [prefs, recipient] = await Promise.all([
      this.alerts.preferences(claimed.accountId),
      this.alerts.recipient(claimed.accountId),
    ]);
    const preferences = prefs ?? defaultAlertPreferences();
    if (!recipient || !channelsFor(preferences, claimed.kind).includes(channel)) {
      await this.alerts.markDropped(claimed.deliveryId);
      return null;
    }
    const decision = deliveryFor({
      channel,
      dueAt: claimed.dueAt.toISOString(),
      staleAt: claimed.staleAt.toISOString(),
      quietHours: preferences.quietHours,
      timeZone: recipient.timeZone,
      notBefore: now.toISOString(),
    });
    if (decision.action === 'drop') {
      await this.alerts.markDropped(claimed.deliveryId);
      return null;
    }
    const at = new Date(decision.at);
    if (at.getTime() > now.getTime()) {
      // Quiet hours began since it was planned: hold it until they end.
      await this.alerts.release(claimed.deliveryId, { sendAfter: at });
      await this.queue.schedule(claimed.deliveryId, claimed.slotKey, at);
      return null;
    }
    return recipient;
  }

  /**
   * To every device the baker turned on. One delivery covers all devices: once any device took it
   * (or every device is gone), it is recorded, so a device that failed is not retried at the cost
   * of a second copy on the others. Only when no device took it and one failed is it retried.
   */
  private async sendPush(claimed: ClaimedDelivery, now: Date): Promise<void> {
    if (!(await this.gate(claimed, now, 'push'))) return;
    const round = await this.push.toAccount(
      claimed.accountId,
      { title: claimed.title, body: claimed.body, url: claimed.linkPath, tag: claimed.slotKey },
      Math.max(60, Math.round((claimed.staleAt.getTime() - now.getTime()) / 1000)),
    );
    if (round.delivered > 0) return this.alerts.markSent(claimed, new Date());
    if (round.failed.length > 0) throw new Error(round.failed[0]);
    await this.alerts.markDropped(claimed.deliveryId); // no device, or every one gone
  }

  private async sendEmail(claimed: ClaimedDelivery, now: Date): Promise<void> {
    const recipient = await this.gate(claimed, now, 'email');
    if (!recipient) return;
    const when = new Intl.DateTimeFormat('en-GB', {
      timeZone: recipient.timeZone,
      weekday: 'short',
      hour: '2-digit',
      minute: '2-digit',
    }).format(claimed.dueAt);
    const rendered = renderMail(
      {
        heading: claimed.title,
        // A comment is news, not a reminder: it has no time of its own to announce.
        paragraphs:
          claimed.kind === 'comment' ? [claimed.body] : [claimed.body, `Due ${when} (${recipient.timeZone}).`],
        action: { label: 'Open in Peakwise', path: claimed.linkPath },
        note: 'You get this because e-mail is on for this kind of alert.',
      },
      this.config.mail.publicUrl,
    );
    // The slot key names the alert, so a resend after a crash carries the same Message-ID.
    await this.mail.send({
      to: recipient.email,
      subject: claimed.title,
      ...rendered,
      key: `alert:${claimed.slotKey}:email`,
    });
    await this.alerts.markSent(claimed, new Date());
  }
}
