import { Inject, Injectable } from '@nestjs/common';
import {
  CULTURE_ALERT_KINDS,
  PLAN_ALERT_KINDS,
  type AlertChannel,
  type AlertKind,
  type AlertPreferences,
  type AlertSubjectType,
  type WantedAlert,
} from '@peakwise/shared';
import { sql, type Selectable } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { Alert as AlertTable } from '../db/types.js';

export type AlertRow = Selectable<AlertTable> & { kind: AlertKind; subjectType: AlertSubjectType };

/** A delivery this worker now holds, with what it needs to send. */
export interface ClaimedDelivery {
  deliveryId: string;
  channel: AlertChannel;
  sendAfter: Date;
  alertId: string;
  accountId: string;
  kind: AlertKind;
  slotKey: string;
  dueAt: Date;
  staleAt: Date;
  title: string;
  body: string;
  linkPath: string;
}

export interface AlertRecipient {
  email: string;
  displayName: string;
  timeZone: string;
}

export interface DeliveryPlan {
  channel: AlertChannel;
  sendAfter: Date;
  dropped: boolean;
}

/** The only place SQL about alerts is written. */
@Injectable()
export class AlertRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /**
   * Insert the alert, or move / revive the stored one with the same slot key. Answers the id when
   * something changed (so deliveries and jobs follow), undefined when it stood as it was or was
   * already sent (a sent alert is history and never moves). `replan` answers the id of a pending
   * alert even when it stands as it was, for changes that move its deliveries only (preferences).
   */
  async upsertWanted(accountId: string, wanted: WantedAlert, replan = false): Promise<string | undefined> {
    const row = await this.db
      .insertInto('alert')
      .values({
        accountId,
        kind: wanted.kind,
        subjectType: wanted.subjectType,
        cultureId: wanted.subjectType === 'culture' ? wanted.subjectId : null,
        planId: wanted.subjectType === 'bake-plan' ? wanted.subjectId : null,
        feedingId: wanted.feedingId,
        slotKey: wanted.slotKey,
        dueAt: new Date(wanted.dueAt),
        staleAt: new Date(wanted.staleAt),
        title: wanted.title,
        body: wanted.body,
        linkPath: wanted.linkPath,
      })
      .onConflict((oc) =>
        oc
          .columns(['accountId', 'slotKey'])
          .doUpdateSet({
            dueAt: (eb) => eb.ref('excluded.dueAt'),
            staleAt: (eb) => eb.ref('excluded.staleAt'),
            title: (eb) => eb.ref('excluded.title'),
            body: (eb) => eb.ref('excluded.body'),
            status: 'pending',
            cancelledAt: null,
            movedAt: sql`CASE WHEN alert.due_at <> excluded.due_at THEN now() ELSE alert.moved_at END`,
            updatedAt: sql`now()`,
          })
          .where('alert.status', '<>', 'sent')
          .where((eb) =>
            eb.or([
              eb('alert.status', '=', 'cancelled'),
              eb('alert.dueAt', '<>', eb.ref('excluded.dueAt')),
              eb('alert.staleAt', '<>', eb.ref('excluded.staleAt')),
              eb('alert.title', '<>', eb.ref('excluded.title')),
              // Local times in the words change with the baker's time zone.
              eb('alert.body', '<>', eb.ref('excluded.body')),
              ...(replan ? [eb('alert.status', '=', 'pending')] : []),
            ]),
          ),
      )
      .returning('id')
      .executeTakeFirst();
    return row?.id;
  }

  /** Set each channel's delivery; an unsent one takes the new time; channels not listed are dropped. */
  async planDeliveries(
    alertId: string,
    plans: DeliveryPlan[],
  ): Promise<{ id: string; channel: AlertChannel; sendAfter: Date }[]> {
    return this.db.transaction().execute(async (trx) => {
      await trx
        .updateTable('alertDelivery')
        .set({ droppedAt: sql`now()`, updatedAt: sql`now()` })
        .where('alertId', '=', alertId)
        .where('sentAt', 'is', null)
        .where('droppedAt', 'is', null)
        .$if(plans.length > 0, (q) =>
          q.where(
            'channel',
            'not in',
            plans.map((p) => p.channel),
          ),
        )
        .execute();
      if (plans.length === 0) return [];
      const rows = await trx
        .insertInto('alertDelivery')
        .values(
          plans.map((p) => ({
            alertId,
            channel: p.channel,
            sendAfter: p.sendAfter,
            droppedAt: p.dropped ? sql<Date>`now()` : null,
          })),
        )
        .onConflict((oc) =>
          oc
            .columns(['alertId', 'channel'])
            .doUpdateSet({
              sendAfter: (eb) => eb.ref('excluded.sendAfter'),
              droppedAt: (eb) => eb.ref('excluded.droppedAt'),
              updatedAt: sql`now()`,
            })
            .where('alertDelivery.sentAt', 'is', null),
        )
        .returning(['id', 'channel', 'sendAfter', 'droppedAt'])
        .execute();
      return rows.filter((r) => r.droppedAt === null) as { id: string; channel: AlertChannel; sendAfter: Date }[];
    });
  }

  /**
   * Cancel pending alerts of a culture or plan whose slot is not in `keep`; their deliveries are
   * dropped. Only kinds the rules produce for that subject: other alerts about it (a comment) are
   * not the refresh's to cancel.
   */
  async cancelPending(
    accountId: string,
    subject: { cultureId: string } | { planId: string },
    keep: string[],
  ): Promise<number> {
    return this.db.transaction().execute(async (trx) => {
      const cancelled = await trx
        .updateTable('alert')
        .set({ status: 'cancelled', cancelledAt: sql`now()`, updatedAt: sql`now()` })
        .where('accountId', '=', accountId)
        .where('status', '=', 'pending')
        .where('kind', 'in', 'cultureId' in subject ? CULTURE_ALERT_KINDS : PLAN_ALERT_KINDS)
        .$if('cultureId' in subject, (q) => q.where('cultureId', '=', (subject as { cultureId: string }).cultureId))
        .$if('planId' in subject, (q) => q.where('planId', '=', (subject as { planId: string }).planId))
        .$if(keep.length > 0, (q) => q.where('slotKey', 'not in', keep))
        .returning('id')
        .execute();
      if (cancelled.length > 0) {
        await trx
          .updateTable('alertDelivery')
          .set({ droppedAt: sql`now()`, updatedAt: sql`now()` })
          .where(
            'alertId',
            'in',
            cancelled.map((c) => c.id),
          )
          .where('sentAt', 'is', null)
          .execute();
      }
      return cancelled.length;
    });
  }

  /**
   * The exactly-once gate: take the delivery only if it is due, unsent, not dropped, its alert not
   * cancelled, and no live claim holds it. Two workers racing here get one row between them.
   */
  async claim(deliveryId: string, now: Date, claimTimeoutSeconds: number): Promise<ClaimedDelivery | undefined> {
    const result = await sql<ClaimedDelivery>`
      UPDATE alert_delivery d
         SET claimed_at = ${now}, attempts = d.attempts + 1, updated_at = now()
        FROM alert a
       WHERE d.id = ${deliveryId}
         AND a.id = d.alert_id
         AND a.status <> 'cancelled'
         AND d.sent_at IS NULL
         AND d.dropped_at IS NULL
         AND d.send_after <= ${now}
         AND (d.claimed_at IS NULL OR d.claimed_at < ${now}::timestamptz - make_interval(secs => ${claimTimeoutSeconds}))
      RETURNING d.id AS delivery_id, d.channel, d.send_after, a.id AS alert_id, a.account_id, a.kind, a.slot_key,
                a.due_at, a.stale_at, a.title, a.body, a.link_path`.execute(this.db);
    return result.rows[0];
  }

  /** Record the send; an in-app delivery also makes the alert visible (status sent). */
  async markSent(claimed: ClaimedDelivery, now: Date): Promise<void> {
    await this.db.transaction().execute(async (trx) => {
      await trx
        .updateTable('alertDelivery')
        .set({ sentAt: now, lastError: null, updatedAt: sql`now()` })
        .where('id', '=', claimed.deliveryId)
        .execute();
      if (claimed.channel === 'in-app') {
        await trx
          .updateTable('alert')
          .set({ status: 'sent', sentAt: now, updatedAt: sql`now()` })
          .where('id', '=', claimed.alertId)
          .where('status', '=', 'pending')
          .execute();
      }
    });
  }

  async markDropped(deliveryId: string): Promise<void> {
    await this.db
      .updateTable('alertDelivery')
      .set({ droppedAt: sql`now()`, claimedAt: null, updatedAt: sql`now()` })
      .where('id', '=', deliveryId)
      .execute();
  }

  /** Give the claim back with a later time (held by quiet hours) or the error of a failed attempt. */
  async release(deliveryId: string, changes: { sendAfter?: Date; lastError?: string }): Promise<void> {
    await this.db
      .updateTable('alertDelivery')
      .set({ claimedAt: null, updatedAt: sql`now()`, ...changes })
      .where('id', '=', deliveryId)
      .execute();
  }

  /** Deliveries not sent, not dropped, of alerts not cancelled. */
  openDeliveries(): Promise<{ id: string; slotKey: string; sendAfter: Date }[]> {
    return this.db
      .selectFrom('alertDelivery as d')
      .innerJoin('alert as a', 'a.id', 'd.alertId')
      .select(['d.id', 'a.slotKey', 'd.sendAfter'])
      .where('d.sentAt', 'is', null)
      .where('d.droppedAt', 'is', null)
      .where('a.status', '<>', 'cancelled')
      .execute();
  }

  /** The account has at least one browser subscribed to push. */
  async hasPushDevice(accountId: string): Promise<boolean> {
    const row = await this.db
      .selectFrom('pushSubscription')
      .select('id')
      .where('accountId', '=', accountId)
      .limit(1)
      .executeTakeFirst();
    return row !== undefined;
  }

  recipient(accountId: string): Promise<AlertRecipient | undefined> {
    return this.db
      .selectFrom('account')
      .select(['email', 'displayName', 'timeZone'])
      .where('id', '=', accountId)
      .executeTakeFirst();
  }

  // ---- preferences

  async preferences(accountId: string): Promise<AlertPreferences | undefined> {
    const row = await this.db
      .selectFrom('alertPreference')
      .selectAll()
      .where('accountId', '=', accountId)
      .executeTakeFirst();
    if (!row) return undefined;
    return {
      leadMinutes: row.leadMinutes,
      quietHours:
        row.quietFrom !== null && row.quietUntil !== null ? { from: row.quietFrom, until: row.quietUntil } : null,
      channels: row.channels as AlertPreferences['channels'],
    };
  }

  async savePreferences(accountId: string, prefs: AlertPreferences): Promise<void> {
    const values = {
      leadMinutes: prefs.leadMinutes,
      quietFrom: prefs.quietHours?.from ?? null,
      quietUntil: prefs.quietHours?.until ?? null,
      channels: JSON.stringify(prefs.channels),
    };
    await this.db
      .insertInto('alertPreference')
      .values({ accountId, ...values })
      .onConflict((oc) => oc.column('accountId').doUpdateSet({ ...values, updatedAt: sql`now()` }))
      .execute();
  }

  /** The culture's and the plan's owner, for refreshes that start from an id. */
  async planOwner(planId: string): Promise<string | undefined> {
    const row = await this.db.selectFrom('bakePlan').select('accountId').where('id', '=', planId).executeTakeFirst();
    return row?.accountId;
  }

  async feedingCulture(feedingId: string): Promise<string | undefined> {
    const row = await this.db.selectFrom('feeding').select('cultureId').where('id', '=', feedingId).executeTakeFirst();
    return row?.cultureId;
  }

  /** Read before the reading is deleted: its culture's alerts are refreshed after. */
  async temperatureReadingCulture(readingId: string): Promise<string | undefined> {
    const row = await this.db
      .selectFrom('temperatureReading as t')
      .innerJoin('feeding as f', 'f.id', 't.feedingId')
      .select('f.cultureId')
      .where('t.id', '=', readingId)
      .executeTakeFirst();
    return row?.cultureId;
  }

  /** Everything of an account that has alerts: its cultures and its active plans. */
  async alertSubjects(accountId: string): Promise<{ cultureIds: string[]; planIds: string[] }> {
    const [cultures, plans] = await Promise.all([
      this.db.selectFrom('culture').select('id').where('accountId', '=', accountId).execute(),
      this.db
        .selectFrom('bakePlan')
        .select('id')
        .where('accountId', '=', accountId)
        .where('status', '=', 'active')
        .execute(),
    ]);
    return { cultureIds: cultures.map((c) => c.id), planIds: plans.map((p) => p.id) };
  }

  async cultureOwner(cultureId: string): Promise<string | undefined> {
    const row = await this.db.selectFrom('culture').select('accountId').where('id', '=', cultureId).executeTakeFirst();
    return row?.accountId;
  }
}
