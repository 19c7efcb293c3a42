import type { CultureSummary } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** GET /api/classes/:classId/cultures/:cultureId/summary → the same CultureSummary the student sees. */
export function getClassCultureSummary(classId: string, cultureId: string): Promise<CultureSummary> {
  return api.get<CultureSummary>(`${classPath(classId)}/cultures/${encodeURIComponent(cultureId)}/summary`);
}

export const classCultureSummaryQueryOptions = (classId: string, cultureId: string) =>
  queryOptions({
    queryKey: [...classKeys.logs(classId), 'culture', cultureId, 'summary'] as const,
    queryFn: () => getClassCultureSummary(classId, cultureId),
    refetchInterval: 5 * 60_000,
    retry: 1,
  });

export function useClassCultureSummary(classId: string, cultureId: string) {
  return useQuery(classCultureSummaryQueryOptions(classId, cultureId));
}
