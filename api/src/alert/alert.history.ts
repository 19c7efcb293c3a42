// Stored rows → the summary's FeedingHistory. The culture module has the same mapping in its
// service, but importing that service from here would close an import cycle (culture.service →
// alert.scheduler → culture-summary.service → culture.service), so the few lines live here too.
import type { FeedingHistory } from '../culture/culture-summary.compute.js';
import type { SummaryHistoryRows } from '../culture/culture-summary.repository.js';
import { toFeeding } from '../feeding/feeding.mapper.js';

export function historyOf(rows: SummaryHistoryRows): FeedingHistory[] {
  return rows.feedings.map((row) => ({
    feeding: toFeeding(row),
    riseChecks: rows.riseChecks
      .filter((r) => r.feedingId === row.id)
      .map((r) => ({ at: r.takenAt.toISOString(), heightMm: r.heightMm, temperatureC: r.temperatureC })),
    temperatures: rows.temperatures
      .filter((r) => r.feedingId === row.id)
      .map((r) => ({ at: r.takenAt.toISOString(), c: r.temperatureC })),
  }));
}
