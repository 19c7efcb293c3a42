import type { BakePlanListResponse, PageQuery } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath, searchOf } from './query-keys';

/** GET /api/classes/:classId/students/:studentId/plans → a student's bakes, read-only. */
export function getStudentPlans(classId: string, studentId: string, query: PageQuery): Promise<BakePlanListResponse> {
  return api.get<BakePlanListResponse>(
    `${classPath(classId)}/students/${encodeURIComponent(studentId)}/plans${searchOf(query)}`,
  );
}

export const studentPlansQueryOptions = (classId: string, studentId: string, query: PageQuery) =>
  queryOptions({
    queryKey: [...classKeys.logs(classId), 'student', studentId, 'plans', { ...query }] as const,
    queryFn: () => getStudentPlans(classId, studentId, query),
  });

export function useStudentPlans(classId: string, studentId: string, query: PageQuery) {
  return useQuery(studentPlansQueryOptions(classId, studentId, query));
}
