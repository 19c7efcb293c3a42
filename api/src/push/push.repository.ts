import { Inject, Injectable } from '@nestjs/common';
import { sql, type Selectable } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { PushSubscription as PushSubscriptionTable } from '../db/types.js';

export type PushSubscriptionRow = Selectable<PushSubscriptionTable>;

export interface NewPushSubscription {
  endpoint: string;
  p256dh: string;
  auth: string;
  label: string;
}

/** The only place SQL about push subscriptions is written. */
@Injectable()
export class PushRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /**
   * One row per endpoint: the same browser subscribing again (new keys, or now signed in as
   * someone else) takes the row over, so it never receives another account's alerts.
   */
  upsert(accountId: string, sub: NewPushSubscription): Promise<PushSubscriptionRow> {
    return this.db
      .insertInto('pushSubscription')
      .values({ accountId, ...sub })
      .onConflict((oc) =>
        oc.column('endpoint').doUpdateSet({
          accountId,
          p256dh: sub.p256dh,
          auth: sub.auth,
          label: sub.label,
          lastError: null,
        }),
      )
      .returningAll()
      .executeTakeFirstOrThrow();
  }

  listFor(accountId: string): Promise<PushSubscriptionRow[]> {
    return this.db
      .selectFrom('pushSubscription')
      .selectAll()
      .where('accountId', '=', accountId)
      .orderBy('createdAt', 'desc')
      .orderBy('id')
      .execute();
  }

  findOwned(accountId: string, id: string): Promise<PushSubscriptionRow | undefined> {
    return this.db
      .selectFrom('pushSubscription')
      .selectAll()
      .where('accountId', '=', accountId)
      .where('id', '=', id)
      .executeTakeFirst();
  }

  async deleteOwned(accountId: string, id: string): Promise<boolean> {
    const result = await this.db
      .deleteFrom('pushSubscription')
      .where('accountId', '=', accountId)
      .where('id', '=', id)
      .executeTakeFirst();
    return result.numDeletedRows > 0n;
  }

  /** The push service said the subscription is gone (404/410): it will never deliver again. */
  async deleteGone(id: string): Promise<void> {
    await this.db.deleteFrom('pushSubscription').where('id', '=', id).execute();
  }

  async recordOutcome(id: string, error: string | null): Promise<void> {
    await this.db
      .updateTable('pushSubscription')
      .set(error === null ? { lastSentAt: sql`now()`, lastError: null } : { lastError: error.slice(0, 2000) })
      .where('id', '=', id)
      .execute();
  }
}
