import { Inject, Injectable } from '@nestjs/common';
import type { Insertable, Selectable } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { TemperatureReading } from '../db/types.js';

export type TemperatureReadingRow = Selectable<TemperatureReading>;

/** The only place SQL about temperature readings is written. */
@Injectable()
export class TemperatureRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  async list(feedingId: string, page: { limit: number; offset: number }) {
    const [items, count] = await Promise.all([
      this.db
        .selectFrom('temperatureReading')
        .selectAll()
        .where('feedingId', '=', feedingId)
        .orderBy('takenAt')
        .orderBy('id')
        .limit(page.limit)
        .offset(page.offset)
        .execute(),
      this.db
        .selectFrom('temperatureReading')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .where('feedingId', '=', feedingId)
        .executeTakeFirstOrThrow(),
    ]);
    return { items, total: Number(count.n) };
  }

  /** One statement, so a batch is stored whole or not at all; PostgreSQL returns VALUES rows in order. */
  insertMany(readings: Insertable<TemperatureReading>[]): Promise<TemperatureReadingRow[]> {
    return this.db.insertInto('temperatureReading').values(readings).returningAll().execute();
  }

  async delete(accountId: string, id: string): Promise<boolean> {
    const result = await this.db
      .deleteFrom('temperatureReading')
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
