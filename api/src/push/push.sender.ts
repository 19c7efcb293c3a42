import { createHash } from 'node:crypto';
import { Agent } from 'node:https';
import { rootCertificates } from 'node:tls';
import { Inject, Injectable } from '@nestjs/common';
import type { PushPayload } from '@peakwise/shared';
import webpush, { WebPushError } from 'web-push';
import { APP_CONFIG, DEFAULT_PUSH_CONFIG, type AppConfig } from '../config.js';
import { PushKeys } from './push-keys.js';
import { PushRepository, type PushSubscriptionRow } from './push.repository.js';

export type PushOutcome = 'delivered' | 'gone' | { error: string };

export interface PushRound {
  delivered: number;
  gone: number;
  failed: string[];
}

/** A push service that keeps a message longer than this would show a stale reminder. */
const DEFAULT_TTL_SECONDS = 6 * 3600;
const REQUEST_TIMEOUT_MS = 10_000;

/** Sends through the browsers' push services with web-push (VAPID-signed, aes128gcm-encrypted). */
@Injectable()
export class PushSender {
  private readonly agent: Agent | undefined;
  private readonly subject: string;

  constructor(
    private readonly keys: PushKeys,
    private readonly subscriptions: PushRepository,
    @Inject(APP_CONFIG) config: AppConfig,
  ) {
    const push = config.push ?? DEFAULT_PUSH_CONFIG;
    this.subject = push.subject;
    // The system's CAs plus, in development, the fake push service's self-signed certificate.
    this.agent = push.extraCa ? new Agent({ ca: [...rootCertificates, push.extraCa] }) : undefined;
  }

  /** To every device of the account; a device the service reports gone is forgotten. */
  async toAccount(accountId: string, payload: PushPayload, ttlSeconds = DEFAULT_TTL_SECONDS): Promise<PushRound> {
    const round: PushRound = { delivered: 0, gone: 0, failed: [] };
    for (const device of await this.subscriptions.listFor(accountId)) {
      const outcome = await this.toDevice(device, payload, ttlSeconds);
      if (outcome === 'delivered') round.delivered += 1;
      else if (outcome === 'gone') round.gone += 1;
      else round.failed.push(outcome.error);
    }
    return round;
  }

  async toDevice(
    device: PushSubscriptionRow,
    payload: PushPayload,
    ttlSeconds = DEFAULT_TTL_SECONDS,
  ): Promise<PushOutcome> {
    const vapid = await this.keys.keys();
    try {
      await webpush.sendNotification(
        { endpoint: device.endpoint, keys: { p256dh: device.p256dh, auth: device.auth } },
        JSON.stringify(payload),
        {
          vapidDetails: { subject: this.subject, publicKey: vapid.publicKey, privateKey: vapid.privateKey },
          TTL: ttlSeconds,
          urgency: 'high',
          // RFC 8030 §5.4: a message with the same topic replaces one the service still holds, so a
          // resend after a crash does not reach the phone twice if the first is still queued.
          topic: topicOf(payload.tag),
          timeout: REQUEST_TIMEOUT_MS,
          ...(this.agent ? { agent: this.agent } : {}),
        },
      );
      await this.subscriptions.recordOutcome(device.id, null);
      return 'delivered';
    } catch (error) {
      if (error instanceof WebPushError && (error.statusCode === 404 || error.statusCode === 410)) {
        await this.subscriptions.deleteGone(device.id);
        return 'gone';
      }
      const message =
        error instanceof WebPushError
          ? `The push service answered ${error.statusCode}: ${error.body.slice(0, 200)}`
          : error instanceof Error
            ? error.message
            : String(error);
      await this.subscriptions.recordOutcome(device.id, message);
      return { error: message };
    }
  }
}

/** Topics are at most 32 base64url characters (RFC 8030 §5.4): a digest of the tag fits. */
export function topicOf(tag: string): string {
  return createHash('sha256').update(tag).digest('base64url').slice(0, 32);
}
