import type { RiseCheck } from '@peakwise/shared';
import type { RiseCheckRow } from './rise-check.repository.js';

export function toRiseCheck(row: RiseCheckRow): RiseCheck {
  return {
    id: row.id,
    feedingId: row.feedingId,
    takenAt: row.takenAt.toISOString(),
    heightMm: row.heightMm,
    temperatureC: row.temperatureC,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
