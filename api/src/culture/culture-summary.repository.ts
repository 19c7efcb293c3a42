import { Inject, Injectable } from '@nestjs/common';
import type { Selectable } from 'kysely';
import type { FeedingRow } from '../feeding/feeding.repository.js';
import { DATABASE } from '../db/database.module.js';
import type { Database } from '../db/database.js';
import type { RiseCheck, TemperatureReading } from '../db/types.js';

/** Feedings the summary looks at: the latest ones, enough for kinetics with recency weights. */
export const SUMMARY_HISTORY_LIMIT = 200;

export type SummaryRiseCheckRow = Pick<Selectable<RiseCheck>, 'feedingId' | 'takenAt' | 'heightMm' | 'temperatureC'>;
export type SummaryTemperatureRow = Pick<Selectable<TemperatureReading>, 'feedingId' | 'takenAt' | 'temperatureC'>;

export interface SummaryHistoryRows {
  /** Newest first. */
  feedings: FeedingRow[];
  riseChecks: SummaryRiseCheckRow[];
  temperatures: SummaryTemperatureRow[];
}

/**
 * The SQL behind GET /api/cultures/:id/summary: three queries, whatever the number of feedings.
 * The caller has already checked that the account owns the culture.
 */
@Injectable()
export class CultureSummaryRepository {
  constructor(@Inject(DATABASE) private readonly db: Database) {}

  async history(cultureId: string, limit = SUMMARY_HISTORY_LIMIT): Promise<SummaryHistoryRows> {
    const latest = this.db
      .selectFrom('feeding')
      .select('feeding.id')
      .where('feeding.cultureId', '=', cultureId)
      .orderBy('feeding.fedAt', 'desc')
      .orderBy('feeding.id', 'desc')
      .limit(limit);
    const [feedings, riseChecks, temperatures] = await Promise.all([
      this.db
        .selectFrom('feeding')
        .selectAll()
        .where('cultureId', '=', cultureId)
        .orderBy('fedAt', 'desc')
        .orderBy('id', 'desc')
        .limit(limit)
        .$castTo<FeedingRow>()
        .execute(),
      this.db
        .selectFrom('riseCheck')
        .select(['feedingId', 'takenAt', 'heightMm', 'temperatureC'])
        .where('feedingId', 'in', latest)
        .orderBy('takenAt')
        .execute(),
      this.db
        .selectFrom('temperatureReading')
        .select(['feedingId', 'takenAt', 'temperatureC'])
        .where('feedingId', 'in', latest)
        .orderBy('takenAt')
        .execute(),
    ]);
    return { feedings, riseChecks, temperatures };
  }
}
