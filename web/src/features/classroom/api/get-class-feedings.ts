import type { FeedingListQuery, FeedingListResponse } from '@peakwise/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath, searchOf } from './query-keys';

/** GET /api/classes/:classId/cultures/:cultureId/feedings → a student culture's feedings, newest first. */
export function getClassFeedings(
  classId: string,
  cultureId: string,
  query: FeedingListQuery,
): Promise<FeedingListResponse> {
  return api.get<FeedingListResponse>(
    `${classPath(classId)}/cultures/${encodeURIComponent(cultureId)}/feedings${searchOf(query)}`,
  );
}

export const classFeedingsQueryKey = (classId: string, cultureId: string, query: FeedingListQuery) =>
  [...classKeys.logs(classId), 'culture', cultureId, 'feedings', { ...query }] as const;

export const classFeedingsQueryOptions = (classId: string, cultureId: string, query: FeedingListQuery) =>
  queryOptions({
    queryKey: classFeedingsQueryKey(classId, cultureId, query),
    queryFn: () => getClassFeedings(classId, cultureId, query),
    placeholderData: keepPreviousData,
  });

export function useClassFeedings(classId: string, cultureId: string, query: FeedingListQuery) {
  return useQuery(classFeedingsQueryOptions(classId, cultureId, query));
}
