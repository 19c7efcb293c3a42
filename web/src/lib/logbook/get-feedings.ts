import type { FeedingListQuery, FeedingListResponse } from '@peakwise/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { logbookKeys } from './query-keys';

/** GET /api/cultures/:cultureId/feedings → Paged<Feeding>, by fedAt (newest first by default). */
export function getFeedings(cultureId: string, query: FeedingListQuery): Promise<FeedingListResponse> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined) params.set(key, String(value));
  }
  return api.get<FeedingListResponse>(`/cultures/${encodeURIComponent(cultureId)}/feedings?${params.toString()}`);
}

export const feedingsQueryOptions = (cultureId: string, query: FeedingListQuery) =>
  queryOptions({
    queryKey: logbookKeys.feedings(cultureId, { ...query }),
    queryFn: () => getFeedings(cultureId, query),
    placeholderData: keepPreviousData,
  });

export function useFeedings(cultureId: string, query: FeedingListQuery) {
  return useQuery(feedingsQueryOptions(cultureId, query));
}
