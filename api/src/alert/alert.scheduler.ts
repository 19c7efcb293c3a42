import { Injectable, Logger } from '@nestjs/common';
import {
  channelsFor,
  cultureAlerts,
  defaultAlertPreferences,
  deliveryFor,
  planAlerts,
  type AlertChannel,
  type AlertPreferences,
  type WantedAlert,
} from '@peakwise/shared';
import { livePlan } from '../bake-plan/bake-plan.live.js';
import { BakePlanRepository } from '../bake-plan/bake-plan.repository.js';
import { computeSummary } from '../culture/culture-summary.compute.js';
import { CultureSummaryRepository } from '../culture/culture-summary.repository.js';
import { toCulture } from '../culture/culture.mapper.js';
import { CultureRepository } from '../culture/culture.repository.js';
import { AlertClock } from './alert.clock.js';
import { historyOf } from './alert.history.js';
import { AlertQueue } from './alert.queue.js';
import { AlertRepository, type DeliveryPlan } from './alert.repository.js';

/** Channels this build delivers (push goes to every device the baker turned it on for). */
export const DELIVERED_CHANNELS: readonly AlertChannel[] = ['in-app', 'email', 'push'];

/**
 * Keeps the stored alerts equal to what the rules want: new ones are inserted, moved ones keep
 * their row with the new time, ones no longer wanted are cancelled. Called after every write that
 * can change a prediction (feeding, rise check, temperature, plan). Never throws to the caller:
 * a failed refresh is logged, and the write the baker made stands.
 */
@Injectable()
export class AlertScheduler {
  private readonly logger = new Logger('AlertScheduler');

  constructor(
    private readonly alerts: AlertRepository,
    private readonly queue: AlertQueue,
    private readonly clock: AlertClock,
    private readonly cultures: CultureRepository,
    private readonly history: CultureSummaryRepository,
    private readonly plans: BakePlanRepository,
  ) {}

  /**
   * After a change that moves alerts without a logbook write: lead time, quiet hours, channels,
   * time zone. Every culture and active plan is refreshed, and every pending alert's deliveries
   * are planned again even where the alert itself stands (quiet hours move only the e-mail).
   */
  async refreshAccount(accountId: string): Promise<void> {
    let subjects: { cultureIds: string[]; planIds: string[] };
    try {
      subjects = await this.alerts.alertSubjects(accountId);
    } catch (error) {
      this.logger.error(`Alert refresh of account ${accountId} failed: ${messageOf(error)}`);
      return;
    }
    for (const id of subjects.cultureIds) await this.refreshCulture(id, true);
    for (const id of subjects.planIds) await this.refreshPlan(id, true);
  }

  /** Before a temperature reading is deleted; refresh this culture once it is gone. */
  readingCulture(readingId: string): Promise<string | undefined> {
    return this.alerts.temperatureReadingCulture(readingId);
  }

  async refreshCulture(cultureId: string, replan = false): Promise<void> {
    await this.guard(`culture ${cultureId}`, async () => {
      const accountId = await this.alerts.cultureOwner(cultureId);
      if (!accountId) return;
      const row = await this.cultures.findOwned(accountId, cultureId);
      if (!row) return;
      const now = this.clock.now();
      const prefs = await this.preferencesOf(accountId);
      const summary = computeSummary(toCulture(row), historyOf(await this.history.history(cultureId)), now);
      const timeZone = (await this.alerts.recipient(accountId))?.timeZone ?? 'UTC';
      const wanted = cultureAlerts({
        accountId,
        summary,
        leadMinutes: prefs.leadMinutes,
        now: now.toISOString(),
        timeZone,
      });
      await this.sync(accountId, { cultureId }, wanted, prefs, replan);
    });
  }

  /** After a change to one feeding's rise checks or readings. */
  async refreshFeeding(feedingId: string): Promise<void> {
    const cultureId = await this.alerts.feedingCulture(feedingId);
    if (cultureId) await this.refreshCulture(cultureId);
  }

  async refreshPlan(planId: string, replan = false): Promise<void> {
    await this.guard(`plan ${planId}`, async () => {
      const accountId = await this.alerts.planOwner(planId);
      if (!accountId) return;
      const row = await this.plans.findOwned(accountId, planId);
      if (!row) return;
      const now = this.clock.now();
      const steps = row.status === 'active' ? livePlan(row, await this.plans.log(planId), now).steps : [];
      const wanted = planAlerts({
        accountId,
        plan: { id: row.id, name: row.name, status: row.status, steps },
        now: now.toISOString(),
      });
      await this.sync(accountId, { planId }, wanted, await this.preferencesOf(accountId), replan);
    });
  }

  private async preferencesOf(accountId: string): Promise<AlertPreferences> {
    return (await this.alerts.preferences(accountId)) ?? defaultAlertPreferences();
  }

  private async sync(
    accountId: string,
    subject: { cultureId: string } | { planId: string },
    wanted: WantedAlert[],
    prefs: AlertPreferences,
    replan: boolean,
  ): Promise<void> {
    const [recipient, pushOn] = await Promise.all([
      this.alerts.recipient(accountId),
      this.alerts.hasPushDevice(accountId),
    ]);
    const timeZone = recipient?.timeZone ?? 'UTC';
    // No device, no push delivery; turning one on re-plans the account (PushService).
    const channels = DELIVERED_CHANNELS.filter((c) => c !== 'push' || pushOn);
    for (const alert of wanted) {
      const alertId = await this.alerts.upsertWanted(accountId, alert, replan);
      if (!alertId) continue;
      const plans: DeliveryPlan[] = channelsFor(prefs, alert.kind)
        .filter((c) => channels.includes(c))
        .map((channel) => {
          const d = deliveryFor({
            channel,
            dueAt: alert.dueAt,
            staleAt: alert.staleAt,
            quietHours: prefs.quietHours,
            timeZone,
          });
          return d.action === 'send'
            ? { channel, sendAfter: new Date(d.at), dropped: false }
            : { channel, sendAfter: new Date(alert.dueAt), dropped: true };
        });
      for (const delivery of await this.alerts.planDeliveries(alertId, plans)) {
        await this.queue.schedule(delivery.id, alert.slotKey, delivery.sendAfter);
      }
    }
    await this.alerts.cancelPending(
      accountId,
      subject,
      wanted.map((w) => w.slotKey),
    );
  }

  private async guard(what: string, work: () => Promise<void>): Promise<void> {
    try {
      await work();
    } catch (error) {
      this.logger.error(`Alert refresh of ${what} failed: ${messageOf(error)}`);
    }
  }
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
