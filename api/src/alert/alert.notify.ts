import { Inject, Injectable, Logger } from '@nestjs/common';
import { channelsFor, defaultAlertPreferences, deliveryFor, type AlertKind } from '@peakwise/shared';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import { AlertClock } from './alert.clock.js';
import { AlertQueue } from './alert.queue.js';
import { AlertRepository, type DeliveryPlan } from './alert.repository.js';
import { DELIVERED_CHANNELS } from './alert.scheduler.js';

const HOUR_MS = 3_600_000;
/** E-mail or push about something someone wrote is still worth sending within a day. */
export const IMMEDIATE_ALERT_STALE_HOURS = 24;

/** An alert about something that just happened (a comment): due now, not computed from a model. */
export interface ImmediateAlert {
  /** The recipient. */
  accountId: string;
  kind: AlertKind;
  subject: { cultureId: string } | { planId: string };
  /** The comment it tells of: deleting the comment takes the alert (and its deliveries) with it. */
  commentId: string | null;
  slotKey: string;
  title: string;
  body: string;
  linkPath: string;
}

/**
 * Records an immediate alert and plans its deliveries through the same channels, quiet hours and
 * queue as the scheduled ones (AlertScheduler.sync), so the worker delivers it like any other.
 * Never throws to the caller: the write that caused it stands, a failure is logged.
 */
@Injectable()
export class AlertNotifier {
  private readonly logger = new Logger('AlertNotifier');

  constructor(
    @Inject(DATABASE) private readonly db: Database,
    private readonly alerts: AlertRepository,
    private readonly queue: AlertQueue,
    private readonly clock: AlertClock,
  ) {}

  /** The alert's id, or undefined when one with this slot key exists already (or it failed). */
  async notify(alert: ImmediateAlert): Promise<string | undefined> {
    try {
      return await this.record(alert);
    } catch (error) {
      this.logger.error(
        `Alert ${alert.slotKey} was not recorded: ${error instanceof Error ? error.message : String(error)}`,
      );
      return undefined;
    }
  }

  private async record(alert: ImmediateAlert): Promise<string | undefined> {
    const now = this.clock.now();
    const staleAt = new Date(now.getTime() + IMMEDIATE_ALERT_STALE_HOURS * HOUR_MS);
    const cultureId = 'cultureId' in alert.subject ? alert.subject.cultureId : null;
    const planId = 'planId' in alert.subject ? alert.subject.planId : null;
    const row = await this.db
      .insertInto('alert')
      .values({
        accountId: alert.accountId,
        kind: alert.kind,
        subjectType: cultureId ? 'culture' : 'bake-plan',
        cultureId,
        planId,
        commentId: alert.commentId,
        slotKey: alert.slotKey,
        dueAt: now,
        staleAt,
        // The table's limits; the caller's words are cut rather than the alert lost.
        title: clip(alert.title, 200),
        body: clip(alert.body, 1000),
        linkPath: alert.linkPath,
      })
      // One alert per occurrence: a repeated call (a retried request) records nothing new.
      .onConflict((oc) => oc.columns(['accountId', 'slotKey']).doNothing())
      .returning('id')
      .executeTakeFirst();
    if (!row) return undefined;

    const prefs = (await this.alerts.preferences(alert.accountId)) ?? defaultAlertPreferences();
    const timeZone = (await this.alerts.recipient(alert.accountId))?.timeZone ?? 'UTC';
    const pushOn = await this.alerts.hasPushDevice(alert.accountId);
    const plans: DeliveryPlan[] = channelsFor(prefs, alert.kind)
      .filter((c) => DELIVERED_CHANNELS.includes(c) && (c !== 'push' || pushOn))
      .map((channel) => {
        const d = deliveryFor({
          channel,
          dueAt: now.toISOString(),
          staleAt: staleAt.toISOString(),
          quietHours: prefs.quietHours,
          timeZone,
        });
        return d.action === 'send'
          ? { channel, sendAfter: new Date(d.at), dropped: false }
          : { channel, sendAfter: now, dropped: true };
      });
    for (const delivery of await this.alerts.planDeliveries(row.id, plans)) {
      await this.queue.schedule(delivery.id, alert.slotKey, delivery.sendAfter);
    }
    return row.id;
  }
}

/** At most `max` characters (code points), with an ellipsis when cut. */
export function clip(text: string, max: number): string {
  const chars = [...text];
  return chars.length <= max ? text : `${chars.slice(0, max - 1).join('')}…`;
}
