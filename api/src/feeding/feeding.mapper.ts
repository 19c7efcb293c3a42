import type { Feeding } from '@peakwise/shared';
import type { FeedingRow } from './feeding.repository.js';

export function toFeeding(row: FeedingRow): Feeding {
  return {
    id: row.id,
    cultureId: row.cultureId,
    fedAt: row.fedAt.toISOString(),
    starterG: row.starterG,
    flourG: row.flourG,
    waterG: row.waterG,
    flour: row.flour,
    waterTemperatureC: row.waterTemperatureC,
    temperatureC: row.temperatureC,
    initialHeightMm: row.initialHeightMm,
    notes: row.notes,
    observations: row.observations,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
