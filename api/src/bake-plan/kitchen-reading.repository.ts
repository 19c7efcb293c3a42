import { Inject, Injectable } from '@nestjs/common';
import type { KitchenReading } from '@peakwise/shared';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';

/** Writes of a plan's kitchen series; the live plan reads it through BakePlanRepository.log. */
@Injectable()
export class KitchenReadingRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  /** Times the plan already has are skipped; returns how many were new. */
  async insertMany(planId: string, readings: readonly KitchenReading[]): Promise<number> {
    const rows = await this.db
      .insertInto('kitchenReading')
      .values(readings.map((r) => ({ planId, takenAt: r.takenAt, temperatureC: r.temperatureC })))
      .onConflict((oc) => oc.columns(['planId', 'takenAt']).doNothing())
      .returning('takenAt')
      .execute();
    return rows.length;
  }

  async count(planId: string): Promise<number> {
    const row = await this.db
      .selectFrom('kitchenReading')
      .select((eb) => eb.fn.countAll<string>().as('n'))
      .where('planId', '=', planId)
      .executeTakeFirstOrThrow();
    return Number(row.n);
  }

  async deleteAll(planId: string): Promise<void> {
    await this.db.deleteFrom('kitchenReading').where('planId', '=', planId).execute();
  }
}
