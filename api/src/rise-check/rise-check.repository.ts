import { IDEMPOTENCY_KEY_TTL_DAYS } from '@peakwise/shared';
import { Inject, Injectable } from '@nestjs/common';
import { sql, type Insertable, type Selectable, type Updateable } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { RiseCheck } from '../db/types.js';

export type RiseCheckRow = Selectable<RiseCheck>;

/** A rise check with what its feeding contributes to validating a change. */
export interface OwnedRiseCheck extends RiseCheckRow {
  fedAt: Date;
  initialHeightMm: number | null;
}

/** The only place SQL about rise checks is written. Reads are scoped to the owning account. */
@Injectable()
export class RiseCheckRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  findOwned(accountId: string, id: string): Promise<OwnedRiseCheck | undefined> {
    return this.db
      .selectFrom('riseCheck')
      .innerJoin('feeding', 'feeding.id', 'riseCheck.feedingId')
      .innerJoin('culture', 'culture.id', 'feeding.cultureId')
      .selectAll('riseCheck')
      .select(['feeding.fedAt', 'feeding.initialHeightMm'])
      .where('riseCheck.id', '=', id)
      .where('culture.accountId', '=', accountId)
      .executeTakeFirst();
  }

  async list(feedingId: string, page: { limit: number; offset: number }) {
    const [items, count] = await Promise.all([
      this.db
        .selectFrom('riseCheck')
        .selectAll()
        .where('feedingId', '=', feedingId)
        .orderBy('takenAt')
        .orderBy('id')
        .limit(page.limit)
        .offset(page.offset)
        .execute(),
      this.db
        .selectFrom('riseCheck')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .where('feedingId', '=', feedingId)
        .executeTakeFirstOrThrow(),
    ]);
    return { items, total: Number(count.n) };
  }

  /** With an idempotencyKey the feeding has had on a check within the key's lifetime, that check comes back (WriteKey). */
  async insert(check: Insertable<RiseCheck>): Promise<RiseCheckRow> {
    if (check.idempotencyKey) {
      const earlier = await this.db
        .selectFrom('riseCheck')
        .selectAll()
        .where('feedingId', '=', check.feedingId)
        .where('idempotencyKey', '=', check.idempotencyKey)
        .where('createdAt', '>', sql<Date>`now() - make_interval(days => ${IDEMPOTENCY_KEY_TTL_DAYS})`)
        .executeTakeFirst();
      if (earlier) return earlier;
    }
    return this.db.insertInto('riseCheck').values(check).returningAll().executeTakeFirstOrThrow();
  }

  update(id: string, changes: Omit<Updateable<RiseCheck>, 'id' | 'feedingId'>): Promise<RiseCheckRow> {
    return this.db
      .updateTable('riseCheck')
      .set({ ...changes, updatedAt: sql<Date>`now()` })
      .where('id', '=', id)
      .returningAll()
      .executeTakeFirstOrThrow();
  }

  async delete(accountId: string, id: string): Promise<boolean> {
    const result = await this.db
      .deleteFrom('riseCheck')
      .where('id', '=', id)
      .where('feedingId', 'in', (eb) =>
        eb
          .selectFrom('feeding')
          .innerJoin('culture', 'culture.id', 'feeding.cultureId')
          .select('feeding.id')
          .where('culture.accountId', '=', accountId),
      )
      .executeTakeFirst();
    return result.numDeletedRows > 0n;
  }
}
