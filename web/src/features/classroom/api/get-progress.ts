import type { ClassProgressResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** GET /api/classes/:classId/progress → each student culture's normalised time to peak over time. */
export function getProgress(classId: string): Promise<ClassProgressResponse> {
  return api.get<ClassProgressResponse>(`${classPath(classId)}/progress`);
}

export const progressQueryOptions = (classId: string) =>
  queryOptions({ queryKey: classKeys.progress(classId), queryFn: () => getProgress(classId) });

export function useProgress(classId: string) {
  return useQuery(progressQueryOptions(classId));
}
