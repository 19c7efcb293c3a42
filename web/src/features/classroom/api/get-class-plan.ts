import type { BakePlanView } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys, classPath } from './query-keys';

/** GET /api/classes/:classId/plans/:planId → a student's bake (BakePlanView, re-planned now), read-only. */
export function getClassPlan(classId: string, planId: string): Promise<BakePlanView> {
  return api.get<BakePlanView>(`${classPath(classId)}/plans/${encodeURIComponent(planId)}`);
}

// A live bake moves with the clock, as on the owner's page: fetched again every few minutes.
export const classPlanQueryOptions = (classId: string, planId: string) =>
  queryOptions({
    queryKey: [...classKeys.logs(classId), 'plan', planId] as const,
    queryFn: () => getClassPlan(classId, planId),
    refetchInterval: 5 * 60_000,
  });

export function useClassPlan(classId: string, planId: string) {
  return useQuery(classPlanQueryOptions(classId, planId));
}
