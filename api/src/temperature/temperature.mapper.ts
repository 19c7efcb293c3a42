import type { TemperatureReading } from '@peakwise/shared';
import type { TemperatureReadingRow } from './temperature.repository.js';

export function toTemperatureReading(row: TemperatureReadingRow): TemperatureReading {
  return {
    id: row.id,
    feedingId: row.feedingId,
    takenAt: row.takenAt.toISOString(),
    temperatureC: row.temperatureC,
    createdAt: row.createdAt.toISOString(),
  };
}
