import type { TemperatureReadingListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { feedingKey } from './get-feeding';

/** GET /api/feedings/:feedingId/temperatures → Paged<TemperatureReading>, oldest first. */
export function getTemperatures(feedingId: string): Promise<TemperatureReadingListResponse> {
  return api.get<TemperatureReadingListResponse>(`/feedings/${encodeURIComponent(feedingId)}/temperatures?limit=200`);
}

export const temperaturesQueryOptions = (feedingId: string) =>
  queryOptions({
    queryKey: [...feedingKey(feedingId), 'temperatures'] as const,
    queryFn: () => getTemperatures(feedingId),
  });

export function useTemperatures(feedingId: string) {
  return useQuery(temperaturesQueryOptions(feedingId));
}
