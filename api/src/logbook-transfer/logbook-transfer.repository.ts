import { Inject, Injectable } from '@nestjs/common';
import type { Insertable } from 'kysely';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { RiseCheck } from '../db/types.js';
import type { FeedingRow, NewFeeding } from '../feeding/feeding.repository.js';
import type { RiseCheckRow } from '../rise-check/rise-check.repository.js';
import type { TemperatureReadingRow } from '../temperature/temperature.repository.js';

/** A feeding to import with the checks that belong to it. */
export interface ImportFeeding {
  /** Set when the feeding is already in the logbook: only its new checks are written. */
  existingId?: string;
  feeding: Omit<NewFeeding, 'cultureId'>;
  checks: Array<Omit<Insertable<RiseCheck>, 'feedingId'>>;
}

/** The only place SQL for export and import is written. Callers have checked ownership. */
@Injectable()
export class LogbookTransferRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  feedingsOfCulture(cultureId: string): Promise<FeedingRow[]> {
    return this.db
      .selectFrom('feeding')
      .selectAll()
      .where('cultureId', '=', cultureId)
      .orderBy('fedAt')
      .orderBy('id')
      .$castTo<FeedingRow>()
      .execute();
  }

  checksOfCulture(cultureId: string): Promise<RiseCheckRow[]> {
    return this.db
      .selectFrom('riseCheck')
      .innerJoin('feeding', 'feeding.id', 'riseCheck.feedingId')
      .selectAll('riseCheck')
      .where('feeding.cultureId', '=', cultureId)
      .orderBy('riseCheck.takenAt')
      .orderBy('riseCheck.id')
      .execute();
  }

  feedingsOfAccount(accountId: string): Promise<FeedingRow[]> {
    return this.db
      .selectFrom('feeding')
      .innerJoin('culture', 'culture.id', 'feeding.cultureId')
      .selectAll('feeding')
      .where('culture.accountId', '=', accountId)
      .orderBy('feeding.fedAt')
      .orderBy('feeding.id')
      .$castTo<FeedingRow>()
      .execute();
  }

  checksOfAccount(accountId: string): Promise<RiseCheckRow[]> {
    return this.db
      .selectFrom('riseCheck')
      .innerJoin('feeding', 'feeding.id', 'riseCheck.feedingId')
      .innerJoin('culture', 'culture.id', 'feeding.cultureId')
      .selectAll('riseCheck')
      .where('culture.accountId', '=', accountId)
      .orderBy('riseCheck.takenAt')
      .orderBy('riseCheck.id')
      .execute();
  }

  readingsOfAccount(accountId: string): Promise<TemperatureReadingRow[]> {
    return this.db
      .selectFrom('temperatureReading')
      .innerJoin('feeding', 'feeding.id', 'temperatureReading.feedingId')
      .innerJoin('culture', 'culture.id', 'feeding.cultureId')
      .selectAll('temperatureReading')
      .where('culture.accountId', '=', accountId)
      .orderBy('temperatureReading.takenAt')
      .orderBy('temperatureReading.id')
      .execute();
  }

  /** Writes all feedings and checks in one transaction: all of them or none. */
  async importAll(cultureId: string, items: ImportFeeding[]): Promise<void> {
    await this.db.transaction().execute(async (trx) => {
      for (const item of items) {
        let feedingId = item.existingId;
        if (!feedingId) {
          const row = await trx
            .insertInto('feeding')
            .values({ ...item.feeding, cultureId })
            .returning('id')
            .executeTakeFirstOrThrow();
          feedingId = row.id;
        }
        if (item.checks.length) {
          await trx
            .insertInto('riseCheck')
            .values(item.checks.map((check) => ({ ...check, feedingId })))
            .execute();
        }
      }
    });
  }
}
