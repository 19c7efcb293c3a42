import { Inject, Injectable } from '@nestjs/common';
import { IDEMPOTENCY_KEY_TTL_DAYS } from '@peakwise/shared';
import { sql, type Selectable } from 'kysely';
import { DATABASE } from '../../db/database.module.js';
import type { Database } from '../../db/database.js';
import type { IdempotencyKey } from '../../db/types.js';

export type IdempotencyRecord = Selectable<IdempotencyKey>;

/** What makes two requests "the same request" for one key. */
export interface RequestFingerprint {
  method: string;
  path: string;
  requestHash: string;
}

/**
 * A claim that never completed (the process died mid-request) blocks its key for this long, then
 * a retry may run again. Far longer than any write here takes.
 */
const ABANDONED_AFTER = '2 minutes';
const EXPIRES_AFTER = `${IDEMPOTENCY_KEY_TTL_DAYS} days`;
const expired = sql<boolean>`created_at < now() - ${EXPIRES_AFTER}::interval`;

/** The only place SQL about idempotency keys is written. Times are the database's clock. */
@Injectable()
export class IdempotencyRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /** Drops this one key if it has expired, so a claim never meets a row the sweep has not reached. */
  async deleteIfExpired(accountId: string, key: string): Promise<void> {
    await this.db
      .deleteFrom('idempotencyKey')
      .where('accountId', '=', accountId)
      .where('key', '=', key)
      .where(expired)
      .execute();
  }

  /**
   * Deletes up to `limit` expired keys of any account (the sweep); answers how many. Batched so
   * a large backlog never holds one long transaction; created_at is indexed (sql/0013).
   */
  async deleteExpiredBatch(limit: number): Promise<number> {
    const result = await sql`
      DELETE FROM idempotency_key
      WHERE (account_id, key) IN (
        SELECT account_id, key FROM idempotency_key WHERE ${expired} LIMIT ${limit}
      )`.execute(this.db);
    return Number(result.numAffectedRows ?? 0n);
  }

  /** Claims the key for a request about to run; false when the key already has a row. */
  async insert(accountId: string, key: string, request: RequestFingerprint): Promise<boolean> {
    const row = await this.db
      .insertInto('idempotencyKey')
      .values({ accountId, key, ...request })
      .onConflict((oc) => oc.columns(['accountId', 'key']).doNothing())
      .returning('key')
      .executeTakeFirst();
    return row !== undefined;
  }

  find(accountId: string, key: string): Promise<IdempotencyRecord | undefined> {
    return this.db
      .selectFrom('idempotencyKey')
      .selectAll()
      .where('accountId', '=', accountId)
      .where('key', '=', key)
      .executeTakeFirst();
  }

  /** Takes over an abandoned claim of the same request; one statement, so only one retry wins. */
  async reclaimAbandoned(accountId: string, key: string, request: RequestFingerprint): Promise<boolean> {
    const row = await this.db
      .updateTable('idempotencyKey')
      .set({ createdAt: sql<Date>`now()` })
      .where('accountId', '=', accountId)
      .where('key', '=', key)
      .where('completedAt', 'is', null)
      .where('createdAt', '<', sql<Date>`now() - ${ABANDONED_AFTER}::interval`)
      .where('method', '=', request.method)
      .where('path', '=', request.path)
      .where('requestHash', '=', request.requestHash)
      .returning('key')
      .executeTakeFirst();
    return row !== undefined;
  }

  async complete(accountId: string, key: string, statusCode: number, responseJson: string): Promise<void> {
    await this.db
      .updateTable('idempotencyKey')
      .set({ statusCode, responseBody: responseJson, completedAt: sql<Date>`now()` })
      .where('accountId', '=', accountId)
      .where('key', '=', key)
      .execute();
  }

  /** Gives the key back after a failed request, so a corrected retry can use it. */
  async release(accountId: string, key: string): Promise<void> {
    await this.db
      .deleteFrom('idempotencyKey')
      .where('accountId', '=', accountId)
      .where('key', '=', key)
      .where('completedAt', 'is', null)
      .execute();
  }
}
