import type { ClassListResponse } from '@peakwise/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** GET /api/classes → the classes the viewer teaches or is a current member of. */
export function getClasses(): Promise<ClassListResponse> {
  return api.get<ClassListResponse>('/classes');
}

// Under the classroom's root key, so joining or leaving a class refreshes it.
export const classMembershipsQueryOptions = () =>
  queryOptions({
    queryKey: ['classes', 'memberships'] as const,
    queryFn: getClasses,
    staleTime: 5 * 60_000,
  });

/** Whether the viewer is a student in any class (so an instructor may comment on their logs). */
export function useIsClassStudent(): boolean | undefined {
  const classes = useQuery(classMembershipsQueryOptions());
  if (classes.isError) return false;
  return classes.data?.items.some((c) => c.role === 'student');
}
