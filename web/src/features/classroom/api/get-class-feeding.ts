import type { Feeding } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** GET /api/classes/:classId/feedings/:feedingId → a student's Feeding, read-only, for the instructor. */
export function getClassFeeding(classId: string, feedingId: string): Promise<Feeding> {
  return api.get<Feeding>(`${classPath(classId)}/feedings/${encodeURIComponent(feedingId)}`);
}

export const classFeedingQueryOptions = (classId: string, feedingId: string) =>
  queryOptions({
    queryKey: [...classKeys.logs(classId), 'feeding', feedingId] as const,
    queryFn: () => getClassFeeding(classId, feedingId),
  });

export function useClassFeeding(classId: string, feedingId: string) {
  return useQuery(classFeedingQueryOptions(classId, feedingId));
}
