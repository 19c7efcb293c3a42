import { TEMPERATURE_READINGS_MAX_PER_REQUEST, type TemperatureReadingListResponse } from '@peakwise/shared';
import { api } from '@/lib/api-client';

/**
 * GET /api/feedings/:feedingId/temperatures → the instants (ms) already stored, so importing the
 * same file twice adds nothing the second time. One page of the list's largest size: an import
 * adds at most 577 readings (48 h at one per 5 min), so more than that were not imported.
 */
export async function getReadingTimes(feedingId: string): Promise<Set<number>> {
  const list = await api.get<TemperatureReadingListResponse>(
    `/feedings/${encodeURIComponent(feedingId)}/temperatures?limit=${TEMPERATURE_READINGS_MAX_PER_REQUEST}`,
  );
  return new Set(list.items.map((r) => Date.parse(r.takenAt)));
}
