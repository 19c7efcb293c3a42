import type { Culture } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** GET /api/classes/:classId/cultures/:cultureId → a student's Culture, read-only, for the instructor. */
export function getClassCulture(classId: string, cultureId: string): Promise<Culture> {
  return api.get<Culture>(`${classPath(classId)}/cultures/${encodeURIComponent(cultureId)}`);
}

export const classCultureQueryOptions = (classId: string, cultureId: string) =>
  queryOptions({
    queryKey: [...classKeys.logs(classId), 'culture', cultureId] as const,
    queryFn: () => getClassCulture(classId, cultureId),
  });

export function useClassCulture(classId: string, cultureId: string) {
  return useQuery(classCultureQueryOptions(classId, cultureId));
}
