import { Injectable } from '@nestjs/common';
import type { CultureSummary, Feeding } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { toFeeding } from '../feeding/feeding.mapper.js';
import { computeSummary, type FeedingHistory } from './culture-summary.compute.js';
import { CultureSummaryRepository, type SummaryHistoryRows } from './culture-summary.repository.js';
import { toCulture } from './culture.mapper.js';
import { CultureService } from './culture.service.js';

/** Where "now" comes from for the summary; tests replace `now` to look at a culture at set times. */
@Injectable()
export class SummaryClock {
  now(): Date {
    return new Date();
  }
}

function groupByFeeding<T extends { feedingId: string }>(rows: T[]): Map<string, T[]> {
  const byFeeding = new Map<string, T[]>();
  for (const row of rows) {
    const list = byFeeding.get(row.feedingId);
    if (list) list.push(row);
    else byFeeding.set(row.feedingId, [row]);
  }
  return byFeeding;
}

/** Stored rows → each feeding with its rise checks and temperature readings, newest feeding first. */
export function toHistory(rows: SummaryHistoryRows): FeedingHistory[] {
  const checks = groupByFeeding(rows.riseChecks);
  const temperatures = groupByFeeding(rows.temperatures);
  return rows.feedings.map((row) => {
    const feeding: Feeding = toFeeding(row);
    return {
      feeding,
      riseChecks: (checks.get(row.id) ?? []).map((r) => ({
        at: r.takenAt.toISOString(),
        heightMm: r.heightMm,
        temperatureC: r.temperatureC,
      })),
      temperatures: (temperatures.get(row.id) ?? []).map((r) => ({ at: r.takenAt.toISOString(), c: r.temperatureC })),
    };
  });
}

@Injectable()
export class CultureSummaryService {
  constructor(
    private readonly cultures: CultureService,
    private readonly repository: CultureSummaryRepository,
    private readonly clock: SummaryClock,
  ) {}

  /** The owner's culture summary; another account's id is a 404 (requireOwned). */
  async summary(account: AccountRecord, id: string): Promise<CultureSummary> {
    const row = await this.cultures.requireOwned(account, id);
    const rows = await this.repository.history(row.id);
    return computeSummary(toCulture(row), toHistory(rows), this.clock.now());
  }
}
