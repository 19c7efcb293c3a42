import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { PushDevice, PushDeviceListResponse, PushPublicKey, PushTestResponse } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { AlertScheduler } from '../alert/alert.scheduler.js';
import { fieldError } from '../common/validation.js';
import { APP_CONFIG, DEFAULT_PUSH_CONFIG, type AppConfig } from '../config.js';
import type { CreatePushSubscriptionDto } from './dto/push.dto.js';
import { pushEndpointProblem } from './push-endpoint.js';
import { PushKeys } from './push-keys.js';
import { PushRepository, type PushSubscriptionRow } from './push.repository.js';
import { PushSender } from './push.sender.js';

function toDevice(row: PushSubscriptionRow): PushDevice {
  return {
    id: row.id,
    label: row.label,
    createdAt: row.createdAt.toISOString(),
    lastSentAt: row.lastSentAt?.toISOString() ?? null,
    lastError: row.lastError,
  };
}

/** A short device name from the User-Agent, for the list ("Firefox on Android"). */
export function deviceLabel(userAgent: string | undefined): string {
  const ua = userAgent ?? '';
  const browser = /Edg\//.test(ua)
    ? 'Edge'
    : /Firefox\//.test(ua)
      ? 'Firefox'
      : /Chrom(e|ium)\//.test(ua)
        ? 'Chrome'
        : /Safari\//.test(ua)
          ? 'Safari'
          : 'A browser';
  const system = /Android/.test(ua)
    ? 'Android'
    : /iPhone|iPad/.test(ua)
      ? 'iOS'
      : /Mac OS X/.test(ua)
        ? 'macOS'
        : /Windows/.test(ua)
          ? 'Windows'
          : /Linux/.test(ua)
            ? 'Linux'
            : null;
  return system ? `${browser} on ${system}` : browser;
}

/** The signed-in baker's devices for push alerts. Another account's device answers 404. */
@Injectable()
export class PushService {
  private readonly allowPrivate: boolean;

  constructor(
    private readonly keys: PushKeys,
    private readonly repo: PushRepository,
    private readonly sender: PushSender,
    private readonly alerts: AlertScheduler,
    @Inject(APP_CONFIG) config: AppConfig,
  ) {
    this.allowPrivate = (config.push ?? DEFAULT_PUSH_CONFIG).allowPrivateEndpoints;
  }

  async publicKey(): Promise<PushPublicKey> {
    return { publicKey: (await this.keys.keys()).publicKey };
  }

  async subscribe(account: AccountRecord, body: CreatePushSubscriptionDto, userAgent?: string): Promise<PushDevice> {
    const problem = pushEndpointProblem(body.endpoint, this.allowPrivate);
    if (problem) throw fieldError('endpoint', problem);
    const row = await this.repo.upsert(account.id, {
      endpoint: body.endpoint,
      p256dh: body.keys.p256dh,
      auth: body.keys.auth,
      label: body.label?.trim() || deviceLabel(userAgent),
    });
    // Pending alerts were planned without push while there was no device: plan them again.
    await this.alerts.refreshAccount(account.id);
    return toDevice(row);
  }

  async list(account: AccountRecord): Promise<PushDeviceListResponse> {
    return { items: (await this.repo.listFor(account.id)).map(toDevice) };
  }

  async remove(account: AccountRecord, id: string): Promise<void> {
    if (!(await this.repo.deleteOwned(account.id, id))) throw new NotFoundException('No device of yours with this id.');
  }

  /** "Send a test": the baker sees at once whether this device really gets notifications. */
  async test(account: AccountRecord, id: string): Promise<PushTestResponse> {
    const device = await this.repo.findOwned(account.id, id);
    if (!device) throw new NotFoundException('No device of yours with this id.');
    const outcome = await this.sender.toDevice(
      device,
      {
        title: 'Peakwise notifications are on',
        body: 'Alerts you chose will appear here, like this one.',
        url: '/account/alerts',
        tag: `test:${device.id}`,
      },
      300,
    );
    if (outcome === 'delivered') return { delivered: true };
    if (outcome === 'gone')
      return { delivered: false, problem: 'The browser ended this subscription; turn notifications on again there.' };
    return { delivered: false, problem: outcome.error };
  }
}
