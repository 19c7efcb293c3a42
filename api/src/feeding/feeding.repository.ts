import { IDEMPOTENCY_KEY_TTL_DAYS } from '@peakwise/shared';
import { Inject, Injectable } from '@nestjs/common';
import type { FeedingObservation, SortOrder } from '@peakwise/shared';
import { sql, type Insertable, type Selectable, type Updateable } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { Feeding } from '../db/types.js';

export type FeedingRow = Omit<Selectable<Feeding>, 'observations'> & { observations: FeedingObservation[] };
export type NewFeeding = Omit<Insertable<Feeding>, 'observations'> & { observations?: FeedingObservation[] };
export type FeedingChanges = Omit<Updateable<Feeding>, 'observations' | 'id' | 'cultureId'> & {
  observations?: FeedingObservation[];
};

/** The only place SQL about feedings is written. Reads are scoped to the owning account. */
@Injectable()
export class FeedingRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  findOwned(accountId: string, id: string): Promise<FeedingRow | undefined> {
    return this.db
      .selectFrom('feeding')
      .innerJoin('culture', 'culture.id', 'feeding.cultureId')
      .selectAll('feeding')
      .where('feeding.id', '=', id)
      .where('culture.accountId', '=', accountId)
      .$castTo<FeedingRow>()
      .executeTakeFirst();
  }

  async list(
    cultureId: string,
    page: { order: SortOrder; limit: number; offset: number },
  ): Promise<{ items: FeedingRow[]; total: number }> {
    const [items, count] = await Promise.all([
      this.db
        .selectFrom('feeding')
        .selectAll()
        .where('cultureId', '=', cultureId)
        .orderBy('fedAt', page.order)
        .orderBy('id', page.order)
        .limit(page.limit)
        .offset(page.offset)
        .$castTo<FeedingRow>()
        .execute(),
      this.db
        .selectFrom('feeding')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .where('cultureId', '=', cultureId)
        .executeTakeFirstOrThrow(),
    ]);
    return { items, total: Number(count.n) };
  }

  /**
   * With an idempotencyKey the culture has had on a feeding for less than the key's lifetime,
   * nothing is inserted and that feeding comes back: the same write run a second time (WriteKey).
   * No race: the Idempotency-Key claim lets only one request with a key run at a time.
   */
  async insert(feeding: NewFeeding): Promise<FeedingRow> {
    if (feeding.idempotencyKey) {
      const earlier = await this.db
        .selectFrom('feeding')
        .selectAll()
        .where('cultureId', '=', feeding.cultureId)
        .where('idempotencyKey', '=', feeding.idempotencyKey)
        .where('createdAt', '>', sql<Date>`now() - make_interval(days => ${IDEMPOTENCY_KEY_TTL_DAYS})`)
        .$castTo<FeedingRow>()
        .executeTakeFirst();
      if (earlier) return earlier;
    }
    return this.db.insertInto('feeding').values(feeding).returningAll().$castTo<FeedingRow>().executeTakeFirstOrThrow();
  }

  update(id: string, changes: FeedingChanges): Promise<FeedingRow> {
    return this.db
      .updateTable('feeding')
      .set({ ...changes, updatedAt: sql<Date>`now()` })
      .where('id', '=', id)
      .returningAll()
      .$castTo<FeedingRow>()
      .executeTakeFirstOrThrow();
  }

  /** The earliest rise check or temperature reading of a feeding: fedAt may not move past it. */
  async earliestReadingAt(feedingId: string): Promise<Date | null> {
    const { rows } = await sql<{ at: Date | null }>`
      SELECT least(
        (SELECT min(taken_at) FROM rise_check WHERE feeding_id = ${feedingId}),
        (SELECT min(taken_at) FROM temperature_reading WHERE feeding_id = ${feedingId})
      ) AS at`.execute(this.db);
    return rows[0]?.at ?? null;
  }

  /** Deletes the feeding with its rise checks and readings, if the account owns it. */
  async delete(accountId: string, id: string): Promise<boolean> {
    const result = await this.db
      .deleteFrom('feeding')
      .where('id', '=', id)
      .where('cultureId', 'in', (eb) => eb.selectFrom('culture').select('id').where('accountId', '=', accountId))
      .executeTakeFirst();
    return result.numDeletedRows > 0n;
  }
}
