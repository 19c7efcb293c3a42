import { Inject, Injectable } from '@nestjs/common';
import { sql } from 'kysely';
import { DATABASE } from '../../db/database.module.js';
import type { Database } from '../../db/database.js';

export interface ThrottleCount {
  hits: number;
  /** Seconds until the window closes and the count starts again (at least 0). */
  secondsToExpire: number;
  /** Seconds until a block ends; 0 when not blocked. */
  secondsBlocked: number;
}

/** Unlikely to matter, but a row per address a day adds up: rows this long past their window go. */
const PRUNE_AFTER = '1 hour';

/** The only place SQL about sign-in brakes is written (sql/0012). */
@Injectable()
export class AuthThrottleRepository {
  private lastPrune = 0;

  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /**
   * Counts one hit in a fixed window of `ttlMs`, in one statement, so concurrent requests on any
   * process add up exactly (the row lock of ON CONFLICT serialises them). Once the count passes
   * `limit` the key is blocked for `blockMs`; a block runs its course even if the window ends.
   */
  async hit(key: string, ttlMs: number, limit: number, blockMs: number): Promise<ThrottleCount> {
    const ttl = sql`make_interval(secs => ${ttlMs / 1000})`;
    const block = sql`make_interval(secs => ${blockMs / 1000})`;
    const result = await sql<{ hits: number; secondsToExpire: number; secondsBlocked: number }>`
      WITH counted AS (
        INSERT INTO auth_throttle AS t (key, hits, expires_at, blocked_until)
        VALUES (${key}, 1, now() + ${ttl}, CASE WHEN 1 > ${limit}::int THEN now() + ${block} END)
        ON CONFLICT (key) DO UPDATE SET
          hits = CASE WHEN t.expires_at <= now() THEN 1 ELSE t.hits + 1 END,
          expires_at = CASE WHEN t.expires_at <= now() THEN now() + ${ttl} ELSE t.expires_at END,
          blocked_until = CASE
            WHEN t.blocked_until > now() THEN t.blocked_until
            WHEN (CASE WHEN t.expires_at <= now() THEN 1 ELSE t.hits + 1 END) > ${limit}::int THEN now() + ${block}
          END
        RETURNING hits, expires_at, blocked_until
      )
      SELECT hits,
        greatest(0, ceil(extract(epoch FROM expires_at - now())))::int AS seconds_to_expire,
        CASE WHEN blocked_until > now() THEN ceil(extract(epoch FROM blocked_until - now()))::int ELSE 0 END
          AS seconds_blocked
      FROM counted`.execute(this.db);
    void this.pruneNowAndThen();
    return result.rows[0]!;
  }

  /** The live count of a key without adding to it; zero hits when its window has closed. */
  async peek(key: string): Promise<ThrottleCount> {
    const row = await this.db
      .selectFrom('authThrottle')
      .select([
        'hits',
        sql<number>`greatest(0, ceil(extract(epoch FROM expires_at - now())))::int`.as('secondsToExpire'),
        sql<number>`CASE WHEN blocked_until > now() THEN ceil(extract(epoch FROM blocked_until - now()))::int ELSE 0 END`.as(
          'secondsBlocked',
        ),
      ])
      .where('key', '=', key)
      .where('expiresAt', '>', sql<Date>`now()`)
      .executeTakeFirst();
    return row ?? { hits: 0, secondsToExpire: 0, secondsBlocked: 0 };
  }

  async isKnownAddress(email: string, address: string): Promise<boolean> {
    const row = await this.db
      .selectFrom('signInAddress')
      .innerJoin('account', 'account.id', 'signInAddress.accountId')
      .select('signInAddress.accountId')
      .where('account.email', '=', email)
      .where('signInAddress.address', '=', address)
      .executeTakeFirst();
    return row !== undefined;
  }

  /** Remembers a successful sign-in's address; addresses unused for 180 days are forgotten. */
  async rememberAddress(accountId: string, address: string): Promise<void> {
    await this.db
      .insertInto('signInAddress')
      .values({ accountId, address })
      .onConflict((oc) => oc.columns(['accountId', 'address']).doUpdateSet({ lastSignedInAt: sql`now()` }))
      .execute();
    await this.db
      .deleteFrom('signInAddress')
      .where('accountId', '=', accountId)
      .where('lastSignedInAt', '<', sql<Date>`now() - interval '180 days'`)
      .execute();
  }

  /** At most once a minute per process: drops counters long past their window and block. */
  private async pruneNowAndThen(): Promise<void> {
    if (Date.now() - this.lastPrune < 60_000) return;
    this.lastPrune = Date.now();
    try {
      await this.db
        .deleteFrom('authThrottle')
        .where('expiresAt', '<', sql<Date>`now() - ${sql.raw(`interval '${PRUNE_AFTER}'`)}`)
        .where((eb) =>
          eb.or([
            eb('blockedUntil', 'is', null),
            eb('blockedUntil', '<', sql<Date>`now() - ${sql.raw(`interval '${PRUNE_AFTER}'`)}`),
          ]),
        )
        .execute();
    } catch {
      // A failed prune is retried a minute later; the counts themselves are unaffected.
    }
  }
}
